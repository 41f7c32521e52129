import { speedOfSoundMps } from '../air/speed-of-sound';
import { assertPositive } from '../internal/guards';

/** Options of {@link quarterWaveNotchHz}. */
export interface QuarterWaveNotchOptions {
  /** Distance from the source's acoustic centre to the wall behind it, m. */
  readonly distanceM: number;
  readonly temperatureC: number;
}

/**
 * First front-wall cancellation of a source d metres from the wall: f = c / (4d), Hz
 * (Allison, J. Audio Eng. Soc. 22(5), 1974).
 * @example quarterWaveNotchHz({ distanceM: 0.5, temperatureC: 20 }) // 171.6…
 */
export function quarterWaveNotchHz({ distanceM, temperatureC }: QuarterWaveNotchOptions): number {
  assertPositive('distanceM', distanceM);
  return speedOfSoundMps(temperatureC) / (4 * distanceM);
}
