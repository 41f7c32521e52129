import { RAD_TO_DEG } from '../internal/angles';
import { assertFinite } from '../internal/guards';
import type { PointM } from '../room/room-types';

/** Options of {@link speakerAngles}. */
export interface SpeakerAnglesOptions {
  readonly listenerM: PointM;
  readonly speakerM: PointM;
}

/** Direction and distance of a speaker seen from the listener. */
export interface SpeakerAngles {
  /** 0° straight ahead (toward the front wall, y decreasing), positive to the listener's left (x decreasing), (−180, 180]. */
  readonly azimuthDeg: number;
  /** Positive above ear height, −90..90. */
  readonly elevationDeg: number;
  readonly distanceM: number;
  readonly horizontalDistanceM: number;
}

/** Throws unless `p` is a point with finite x, y, z. */
export function assertPoint(name: string, p: PointM): void {
  if (p === null || typeof p !== 'object') throw new RangeError(`${name} must be a point {x, y, z}`);
  assertFinite(`${name}.x`, p.x);
  assertFinite(`${name}.y`, p.y);
  assertFinite(`${name}.z`, p.z);
}

/** The vector from one point to another, m, after checking both (each named in any error, `fromName` first). */
export function pointOffsetM(fromName: string, from: PointM, toName: string, to: PointM): PointM {
  assertPoint(fromName, from);
  assertPoint(toName, to);
  return { x: to.x - from.x, y: to.y - from.y, z: to.z - from.z };
}

/**
 * Azimuth, elevation and distance of a speaker from the listening position (geometry; azimuth sign as in
 * ITU-R BS.2051: positive to the left).
 * @example speakerAngles({ listenerM: { x: 2, y: 3, z: 1.2 }, speakerM: { x: 1, y: 3 - Math.sqrt(3), z: 1.2 } }).azimuthDeg // 30
 */
export function speakerAngles({ listenerM, speakerM }: SpeakerAnglesOptions): SpeakerAngles {
  const { x: dx, y: dy, z: dz } = pointOffsetM('listenerM', listenerM, 'speakerM', speakerM);
  const horizontalDistanceM = Math.hypot(dx, dy);
  const distanceM = Math.hypot(dx, dy, dz);
  if (distanceM === 0) throw new RangeError('speakerM must differ from listenerM');
  let azimuthDeg = horizontalDistanceM === 0 ? 0 : Math.atan2(-dx, -dy) * RAD_TO_DEG;
  if (azimuthDeg <= -180) azimuthDeg += 360;
  const elevationDeg = Math.atan2(dz, horizontalDistanceM) * RAD_TO_DEG;
  return { azimuthDeg, elevationDeg, distanceM, horizontalDistanceM };
}
