import { assertTemperature } from '../internal/guards';

/**
 * Speed of sound in dry air, m/s: c = 331.3·√(1 + T/273.15) (Kinsler et al., "Fundamentals of Acoustics", 4th ed., 2000).
 * @example speedOfSoundMps(20) // 343.21…
 */
export function speedOfSoundMps(temperatureC: number): number {
  assertTemperature('temperatureC', temperatureC);
  return 331.3 * Math.sqrt(1 + temperatureC / 273.15);
}
