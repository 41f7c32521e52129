import { assertPositive } from '../internal/guards';
import type { RoomDimensions } from './room-types';

/** One criterion of the proportion check. */
export interface ProportionCriterion {
  readonly name: string;
  readonly passes: boolean;
}

/** Result of {@link roomProportionCheck}. */
export interface RoomProportionResult {
  readonly passes: boolean;
  readonly lengthToHeight: number;
  readonly widthToHeight: number;
  readonly criteria: ProportionCriterion[];
}

/**
 * ITU-R BS.1116-3 (2015) listening-room proportions: 1.1·w/h ≤ l/h ≤ 4.5·w/h − 4, l/h < 3, w/h < 3.
 * @example roomProportionCheck({ lengthM: 6.4, widthM: 4.9, heightM: 2.7 }).passes // true
 */
export function roomProportionCheck({ lengthM, widthM, heightM }: RoomDimensions): RoomProportionResult {
  assertPositive('lengthM', lengthM);
  assertPositive('widthM', widthM);
  assertPositive('heightM', heightM);
  const l = lengthM / heightM;
  const w = widthM / heightM;
  const criteria: ProportionCriterion[] = [
    { name: '1.1·w/h ≤ l/h', passes: 1.1 * w <= l },
    { name: 'l/h ≤ 4.5·w/h − 4', passes: l <= 4.5 * w - 4 },
    { name: 'l/h < 3', passes: l < 3 },
    { name: 'w/h < 3', passes: w < 3 },
  ];
  return { passes: criteria.every((c) => c.passes), lengthToHeight: l, widthToHeight: w, criteria };
}
