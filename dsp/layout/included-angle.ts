import { RAD_TO_DEG } from '../internal/angles';
import type { PointM } from '../room/room-types';
import { pointOffsetM } from './speaker-angles';

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
  const a = pointOffsetM('listenerM', listenerM, 'aM', aM);
  const b = pointOffsetM('listenerM', listenerM, 'bM', bM);
  if (Math.hypot(a.x, a.y) === 0 || Math.hypot(b.x, b.y) === 0) throw new RangeError('aM and bM must differ from listenerM in the floor plan');
  return Math.abs(Math.atan2(a.x * b.y - a.y * b.x, a.x * b.x + a.y * b.y)) * RAD_TO_DEG;
}
