import { assertPositive } from '../internal/guards';

/** Options of {@link schroederFrequencyHz}. */
export interface SchroederOptions {
  readonly volumeM3: number;
  readonly rt60S: number;
}

/**
 * Schroeder frequency f_s ≈ 2000·√(T60 / V), Hz (Schroeder, J. Acoust. Soc. Am. 99(5), 1996).
 * @example schroederFrequencyHz({ volumeM3: 84.67, rt60S: 0.4 }) // 137.5…
 */
export function schroederFrequencyHz({ volumeM3, rt60S }: SchroederOptions): number {
  assertPositive('volumeM3', volumeM3);
  assertPositive('rt60S', rt60S);
  return 2000 * Math.sqrt(rt60S / volumeM3);
}
