import { assertFiniteArray, assertPositive } from '../internal/guards';

/** Options of {@link stepFromImpulse}. */
export interface StepFromImpulseOptions {
  /** Impulse response samples, 1/s (a continuous h(t) sampled: its sum times dt is the level at 0 Hz). */
  readonly impulsePerS: Float64Array | readonly number[];
  readonly sampleRateHz: number;
}

/**
 * The step response, the running integral of the impulse response from the first sample, by the trapezoid rule:
 * step[0] = 0, step[n] = step[n−1] + (impulse[n−1] + impulse[n])·dt/2, dt = 1/fs (common practice; a plain running
 * sum Σ impulse·dt would lead the integral by half a sample, 1 % of the step on an 80 Hz LR4's rise at 8 kHz).
 * Dimensionless: a flat 0 dB response's step ends at 1 (its level at 0 Hz, as a gain).
 * @example stepFromImpulse({ impulsePerS: [0, 1000, 1000], sampleRateHz: 2000 }) // [0, 0.25, 0.75]
 */
export function stepFromImpulse({ impulsePerS, sampleRateHz }: StepFromImpulseOptions): Float64Array {
  assertPositive('sampleRateHz', sampleRateHz);
  assertFiniteArray('impulsePerS', impulsePerS);
  const sampleIntervalS = 1 / sampleRateHz;
  const step = new Float64Array(impulsePerS.length);
  for (let n = 1; n < impulsePerS.length; n++) {
    step[n] = (step[n - 1] as number) + (((impulsePerS[n - 1] as number) + (impulsePerS[n] as number)) * sampleIntervalS) / 2;
  }
  return step;
}
