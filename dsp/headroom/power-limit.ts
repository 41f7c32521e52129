import { assertPositive } from '../internal/guards';

/** Options of {@link powerLimit}. */
export interface PowerLimitOptions {
  /** The amplifier's power per unit, W. */
  readonly amplifierPowerW: number;
  /** The speaker's rated power, W (the maker's figure); absent when unknown. */
  readonly ratedPowerW?: number;
}

/** Result of {@link powerLimit}. */
export interface PowerLimitResult {
  /** The power the speaker may be driven with: the lower of the amplifier's power and the speaker's rating, W. */
  readonly usablePowerW: number;
  /** Which limit binds: the amplifier (it is at or below the rating, or no rating is known) or the speaker's rating. */
  readonly binding: 'amplifier' | 'speaker';
}

/**
 * The power a speaker may be driven with: min(amplifier, rating) (common practice: never drive past the maker's rating;
 * an amplifier above it is a limit only the rating keeps). A tie is the amplifier's.
 * @example powerLimit({ amplifierPowerW: 200, ratedPowerW: 120 }) // { usablePowerW: 120, binding: 'speaker' }
 */
export function powerLimit({ amplifierPowerW, ratedPowerW }: PowerLimitOptions): PowerLimitResult {
  assertPositive('amplifierPowerW', amplifierPowerW);
  if (ratedPowerW !== undefined) assertPositive('ratedPowerW', ratedPowerW);
  return ratedPowerW === undefined || amplifierPowerW <= ratedPowerW ? { usablePowerW: amplifierPowerW, binding: 'amplifier' } : { usablePowerW: ratedPowerW, binding: 'speaker' };
}
