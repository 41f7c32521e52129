import { assertNonNegative, assertPositive } from '../internal/guards';
import type { PointM, RoomDimensions } from '../room/room-types';

/** One place a sub could stand. */
export interface SubCandidate {
  readonly name: string;
  readonly positionM: PointM;
}

/**
 * The usual first places to try a sub (Welti 2002 studied corners and wall midpoints): the four floor corners and the
 * four wall midpoints, each `insetM` (default 0.25 m, about half a sub's depth) from the walls it touches and `heightM`
 * (default 0.25 m) above the floor. x runs across the width from the left wall, y from the front wall.
 * @example defaultSubCandidates({ lengthM: 6, widthM: 4, heightM: 2.5 })[1] // { name: 'Front wall middle', positionM: { x: 2, y: 0.25, z: 0.25 } }
 */
export function defaultSubCandidates(room: RoomDimensions, insetM = 0.25, heightM = 0.25): SubCandidate[] {
  assertPositive('room.lengthM', room.lengthM);
  assertPositive('room.widthM', room.widthM);
  assertPositive('room.heightM', room.heightM);
  assertNonNegative('insetM', insetM);
  assertNonNegative('heightM', heightM);
  const left = Math.min(insetM, room.widthM / 2);
  const right = room.widthM - left;
  const front = Math.min(insetM, room.lengthM / 2);
  const back = room.lengthM - front;
  const z = Math.min(heightM, room.heightM);
  const midX = room.widthM / 2;
  const midY = room.lengthM / 2;
  const at = (name: string, x: number, y: number): SubCandidate => ({ name, positionM: { x, y, z } });
  return [
    at('Front-left corner', left, front),
    at('Front wall middle', midX, front),
    at('Front-right corner', right, front),
    at('Right wall middle', right, midY),
    at('Back-right corner', right, back),
    at('Back wall middle', midX, back),
    at('Back-left corner', left, back),
    at('Left wall middle', left, midY),
  ];
}
