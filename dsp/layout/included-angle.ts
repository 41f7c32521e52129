import { RAD_TO_DEG } from '../internal/angles';
import type { PointM } from '../room/room-types';
import { assertPoint } from './speaker-angles';

/** Options of {@link includedAngleDeg}. */
export interface IncludedAngleOptions {
  readonly listenerM: PointM;
  readonly aM: PointM;
  readonly bM: PointM;
}

/**
 * Angle between two speakers seen from the listener in the floor plan, degrees 0..180 (geometry;
 * an equilateral listening triangle gives 60°).
 * @example includedAngleDeg({ listenerM: { x: 0, y: 0, z: 0 }, aM: { x: -1, y: -1.732, z: 0 }, bM: { x: 1, y: -1.732, z: 0 } }) // ≈ 60
 */
export function includedAngleDeg({ listenerM, aM, bM }: IncludedAngleOptions): number {
  assertPoint('listenerM', listenerM);
  assertPoint('aM', aM);
  assertPoint('bM', bM);
  const ax = aM.x - listenerM.x;
  const ay = aM.y - listenerM.y;
  const bx = bM.x - listenerM.x;
  const by = bM.y - listenerM.y;
  if (Math.hypot(ax, ay) === 0 || Math.hypot(bx, by) === 0) throw new RangeError('aM and bM must differ from listenerM in the floor plan');
  return Math.abs(Math.atan2(ax * by - ay * bx, ax * bx + ay * by)) * RAD_TO_DEG;
}
