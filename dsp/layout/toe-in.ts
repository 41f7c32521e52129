import { RAD_TO_DEG, wrapDeg } from '../internal/angles';
import { assertFinite } from '../internal/guards';
import type { PointM } from '../room/room-types';
import { pointOffsetM } from './speaker-angles';

/** Options of {@link toeInDeg}. */
export interface ToeInOptions {
  readonly speakerM: PointM;
  /** The point to aim at (the MLP or another point). */
  readonly aimM: PointM;
  /** Heading of the cabinet before toe-in in the floor plan, deg: 0 = straight into the room (+y), positive toward +x. Default 0. */
  readonly facingDeg?: number;
}

/** Result of {@link toeInDeg}. */
export interface ToeInResult {
  /** Size of the horizontal turn from facingDeg to the aim line, deg ≥ 0. */
  readonly toeInDeg: number;
  /** The same turn signed: positive toward +x, (−180, 180]. */
  readonly rotationDeg: number;
  /** Heading of the aim line, deg, same convention as facingDeg. */
  readonly aimHeadingDeg: number;
  /** Vertical tilt toward the aim point, deg, positive up. */
  readonly tiltDeg: number;
}

/**
 * Toe-in that aims a speaker at a point: the floor-plan angle between its heading and the line to the aim (geometry).
 * @example toeInDeg({ speakerM: { x: 1, y: 0.5, z: 1 }, aimM: { x: 2.5, y: 3.1, z: 1 } }).toeInDeg // 30.0
 */
export function toeInDeg({ speakerM, aimM, facingDeg = 0 }: ToeInOptions): ToeInResult {
  const { x: dx, y: dy, z: dz } = pointOffsetM('speakerM', speakerM, 'aimM', aimM);
  assertFinite('facingDeg', facingDeg);
  const horizontal = Math.hypot(dx, dy);
  if (horizontal === 0) throw new RangeError('aimM must differ from speakerM in the floor plan');
  const aimHeadingDeg = Math.atan2(dx, dy) * RAD_TO_DEG;
  const rotationDeg = wrapDeg(aimHeadingDeg - facingDeg);
  return { toeInDeg: Math.abs(rotationDeg), rotationDeg, aimHeadingDeg, tiltDeg: Math.atan2(dz, horizontal) * RAD_TO_DEG };
}
