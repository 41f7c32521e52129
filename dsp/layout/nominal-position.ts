import { DEG_TO_RAD } from '../internal/angles';
import { assertFinite, assertNonNegative, assertPositive } from '../internal/guards';
import type { PointM, RoomDimensions } from '../room/room-types';
import { assertPoint } from './speaker-angles';

/** Options of {@link nominalSpeakerPosition}. */
export interface NominalPositionOptions {
  readonly listenerM: PointM;
  /** Azimuth as in speakerAngles: 0° toward the front wall, positive to the listener's left. */
  readonly azimuthDeg: number;
  /** Elevation above ear height, deg. */
  readonly elevationDeg: number;
  /** Distance from the listener, m. */
  readonly radiusM: number;
  /** When given, a point beyond a wall is pulled back along the same direction to `marginM` inside the room. */
  readonly room?: RoomDimensions;
  /** Clearance from the walls, floor and ceiling, m (default 0.15). */
  readonly marginM?: number;
}

/** Result of {@link nominalSpeakerPosition}. */
export interface NominalPosition {
  readonly positionM: PointM;
  /** Distance actually used: radiusM, or less when a wall was in the way. */
  readonly distanceM: number;
  readonly clamped: boolean;
}

/**
 * The point at a given azimuth, elevation and distance from the listener (geometry, the inverse of speakerAngles),
 * kept inside the room: if the ray leaves the room (less the margin) before radiusM, the point stops at the boundary,
 * so its direction — what the layout checks — is unchanged.
 * @example nominalSpeakerPosition({ listenerM: { x: 2, y: 3, z: 1.2 }, azimuthDeg: 30, elevationDeg: 0, radiusM: 2 }).positionM // { x: 1, y: 1.268, z: 1.2 }
 */
export function nominalSpeakerPosition({ listenerM, azimuthDeg, elevationDeg, radiusM, room, marginM = 0.15 }: NominalPositionOptions): NominalPosition {
  assertPoint('listenerM', listenerM);
  assertFinite('azimuthDeg', azimuthDeg);
  assertFinite('elevationDeg', elevationDeg);
  assertPositive('radiusM', radiusM);
  assertNonNegative('marginM', marginM);
  const az = azimuthDeg * DEG_TO_RAD;
  const el = elevationDeg * DEG_TO_RAD;
  // speakerAngles: azimuth = atan2(−dx, −dy) → dx = −sin(az)·cos(el), dy = −cos(az)·cos(el).
  const ux = -Math.sin(az) * Math.cos(el);
  const uy = -Math.cos(az) * Math.cos(el);
  const uz = Math.sin(el);
  let distanceM = radiusM;
  if (room) {
    assertPositive('room.lengthM', room.lengthM);
    assertPositive('room.widthM', room.widthM);
    assertPositive('room.heightM', room.heightM);
    const limit = (p: number, u: number, size: number): number => {
      const lo = Math.min(marginM, size / 2);
      const hi = Math.max(size - marginM, size / 2);
      if (u > 1e-12) return Math.max(0, (hi - p) / u);
      if (u < -1e-12) return Math.max(0, (lo - p) / u);
      return Infinity;
    };
    distanceM = Math.min(radiusM, limit(listenerM.x, ux, room.widthM), limit(listenerM.y, uy, room.lengthM), limit(listenerM.z, uz, room.heightM));
  }
  const clean = (v: number): number => (Math.abs(v) < 1e-12 ? 0 : v);
  return {
    positionM: { x: clean(listenerM.x + ux * distanceM), y: clean(listenerM.y + uy * distanceM), z: clean(listenerM.z + uz * distanceM) },
    distanceM,
    clamped: distanceM < radiusM - 1e-12,
  };
}
