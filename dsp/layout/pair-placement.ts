import { DEG_TO_RAD, RAD_TO_DEG } from '../internal/angles';
import { assertFinite, assertPositive } from '../internal/guards';
import type { PointM } from '../room/room-types';
import { includedAngleDeg } from './included-angle';
import { assertPoint } from './speaker-angles';

/** Options of {@link pairPlacement}: the listener, the distance to each speaker and one of spacing, included angle or azimuth. */
export interface PairPlacementOptions {
  readonly listenerM: PointM;
  /** Straight-line distance from the listener's ears to each speaker of the pair, m (what a tape or a laser measures). */
  readonly distanceM: number;
  /** Distance across between the two speakers, square to the listener's centre line, m. */
  readonly spacingM?: number;
  /** Angle between the two speakers seen from the listener in the floor plan, deg, (0, 180]. */
  readonly includedAngleDeg?: number;
  /** Each speaker's angle from straight ahead in the floor plan, deg, (0, 180) (a surround pair at ±110°: 110). */
  readonly azimuthDeg?: number;
  /** Heights of the left and right speakers, m; kept as they are. */
  readonly leftZM: number;
  readonly rightZM: number;
  /** Height of a centre speaker to place on the centre line at the same distance, m (none when absent). */
  readonly centreZM?: number;
}

/** Result of {@link pairPlacement}. */
export interface PairPlacement {
  readonly leftM: PointM;
  readonly rightM: PointM;
  readonly centreM: PointM | null;
  /** Angle between the pair seen from the listener in the floor plan, deg 0..180 (what the layout checks use). */
  readonly includedAngleDeg: number;
  /**
   * Angle between the pair seen from the listener's ears, in space, deg 0..180: 2·asin(s / 2d) for the spacing s and
   * distance d measured. Equals includedAngleDeg when the speakers are at ear height.
   */
  readonly earAngleDeg: number;
  /** Distance across between the pair, m. */
  readonly spacingM: number;
}

/** The angle at `o` between the rays to `a` and `b` in space, deg 0..180 (geometry: atan2(|u×v|, u·v), accurate near 0° and 180°). */
function angleBetweenDeg(o: PointM, a: PointM, b: PointM): number {
  const u = [a.x - o.x, a.y - o.y, a.z - o.z] as const;
  const v = [b.x - o.x, b.y - o.y, b.z - o.z] as const;
  const cross = Math.hypot(u[1] * v[2] - u[2] * v[1], u[2] * v[0] - u[0] * v[2], u[0] * v[1] - u[1] * v[0]);
  return Math.atan2(cross, u[0] * v[0] + u[1] * v[1] + u[2] * v[2]) * RAD_TO_DEG;
}

/** The distance in the floor plan to a speaker `distanceM` away at height `zM`, with the parameter named when impossible. */
function floorDistanceM(name: string, distanceM: number, listenerZM: number, zM: number): number {
  assertFinite(name, zM);
  const dz = zM - listenerZM;
  if (Math.abs(dz) >= distanceM) throw new RangeError(`distanceM (${distanceM} m) must be more than the height difference between the listener and ${name} (${Math.abs(dz)} m)`);
  return Math.sqrt(distanceM * distanceM - dz * dz);
}

/**
 * A pair of speakers placed symmetrically about the listener's centre line (the line straight ahead, toward the front
 * wall) from what is measured on site: the distance from the listener to each and either the spacing between them,
 * the included angle, or each one's angle from straight ahead; heights are kept (geometry: with spacing s and floor
 * distance d, each is asin(s / 2d) off the centre line, so 123.5 in apart and 122 in away is 2·asin(61.75/122) = 60.82°).
 * Azimuth as in speakerAngles: the left speaker is at x − d·sin θ, the right at x + d·sin θ, both at y − d·cos θ.
 * @example pairPlacement({ listenerM: { x: 2, y: 4, z: 1.2 }, distanceM: 2, includedAngleDeg: 60, leftZM: 1.2, rightZM: 1.2 }).leftM // { x: 1, y: 2.268, z: 1.2 }
 */
export function pairPlacement({ listenerM, distanceM, spacingM, includedAngleDeg: angleDeg, azimuthDeg, leftZM, rightZM, centreZM }: PairPlacementOptions): PairPlacement {
  assertPoint('listenerM', listenerM);
  assertPositive('distanceM', distanceM);
  const given = [spacingM, angleDeg, azimuthDeg].filter((v) => v !== undefined).length;
  if (given !== 1) throw new RangeError('give exactly one of spacingM, includedAngleDeg and azimuthDeg');
  const floorM = { left: floorDistanceM('leftZM', distanceM, listenerM.z, leftZM), right: floorDistanceM('rightZM', distanceM, listenerM.z, rightZM) };
  const place = (side: 'left' | 'right', zM: number): PointM => {
    const d = floorM[side];
    let theta: number;
    if (spacingM !== undefined) {
      assertPositive('spacingM', spacingM);
      if (spacingM / 2 > d + 1e-12) throw new RangeError(`spacingM (${spacingM} m) must be at most twice the floor distance to the ${side} speaker (${2 * d} m)`);
      theta = Math.asin(Math.min(1, spacingM / 2 / d));
    } else if (angleDeg !== undefined) {
      assertFinite('includedAngleDeg', angleDeg);
      if (angleDeg <= 0 || angleDeg > 180) throw new RangeError(`includedAngleDeg must be more than 0 and at most 180 (got ${angleDeg})`);
      theta = (angleDeg / 2) * DEG_TO_RAD;
    } else {
      assertFinite('azimuthDeg', azimuthDeg!);
      if (azimuthDeg! <= 0 || azimuthDeg! >= 180) throw new RangeError(`azimuthDeg must be more than 0 and less than 180 (got ${azimuthDeg})`);
      theta = azimuthDeg! * DEG_TO_RAD;
    }
    const across = d * Math.sin(theta);
    const clean = (v: number) => (Math.abs(v) < 1e-12 ? 0 : v);
    return { x: listenerM.x + (side === 'left' ? -across : across), y: clean(listenerM.y - d * Math.cos(theta)), z: zM };
  };
  const leftM = place('left', leftZM);
  const rightM = place('right', rightZM);
  const centreM = centreZM === undefined ? null : { x: listenerM.x, y: listenerM.y - floorDistanceM('centreZM', distanceM, listenerM.z, centreZM), z: centreZM };
  return {
    leftM,
    rightM,
    centreM,
    includedAngleDeg: includedAngleDeg({ listenerM, aM: leftM, bM: rightM }),
    earAngleDeg: angleBetweenDeg(listenerM, leftM, rightM),
    spacingM: rightM.x - leftM.x,
  };
}
