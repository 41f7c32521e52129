import { assertNonNegative } from '../internal/guards';
import { speedOfSoundMps } from './speed-of-sound';

/** Options of {@link arrivalTimeMs}. */
export interface ArrivalTimeOptions {
  readonly distanceM: number;
  readonly temperatureC: number;
}

/**
 * Time for sound to travel `distanceM` metres at `temperatureC`, in ms: 1000·d / c(T).
 * @example arrivalTimeMs({ distanceM: 1, temperatureC: 20 }) // 2.9137…
 */
export function arrivalTimeMs({ distanceM, temperatureC }: ArrivalTimeOptions): number {
  assertNonNegative('distanceM', distanceM);
  return (1000 * distanceM) / speedOfSoundMps(temperatureC);
}
