// The scipy impulse fixtures (scripts/reference/impulse-fixtures.py) and the impulse responses they describe, regenerated
// here from the stored second-order sections with a direct-form difference equation (the fixture stores a few of
// scipy.signal.sosfilt's own samples so the regeneration is checked against scipy).
import fixture from '../fixtures/impulse-scipy.json';

export interface ImpulseCase {
  readonly name: string;
  readonly description: string;
  readonly delaySamples: number;
  /** Rows [b0, b1, b2, 1, a1, a2] (scipy's convention). */
  readonly sos: readonly (readonly number[])[];
  /** numpy.argmax(|h|) of scipy's impulse response. */
  readonly peakSample: number;
  /** [index, scipy.signal.sosfilt value]. */
  readonly sampleChecks: readonly (readonly number[])[];
  readonly magnitudeDb: readonly number[];
  readonly phaseDeg: readonly number[];
}

export const impulseFixture = fixture as {
  readonly sampleRateHz: number;
  readonly lengthSamples: number;
  readonly frequencyHz: readonly number[];
  readonly cases: readonly ImpulseCase[];
};

export function impulseCase(name: string): ImpulseCase {
  const found = impulseFixture.cases.find((c) => c.name === name);
  if (!found) throw new Error(`no fixture case ${name}`);
  return found;
}

/**
 * The impulse response of a cascade of biquads to a unit impulse at `delaySamples`, lengthSamples long:
 * y[n] = b0·x[n] + b1·x[n−1] + b2·x[n−2] − a1·y[n−1] − a2·y[n−2] per section (direct form I).
 */
export function sosImpulse(sos: readonly (readonly number[])[], delaySamples: number, lengthSamples: number): Float64Array {
  let signal = new Float64Array(lengthSamples);
  signal[delaySamples] = 1;
  for (const row of sos) {
    const [b0, b1, b2, , a1, a2] = row as [number, number, number, number, number, number];
    const out = new Float64Array(lengthSamples);
    let x1 = 0, x2 = 0, y1 = 0, y2 = 0;
    for (let n = 0; n < lengthSamples; n++) {
      const x0 = signal[n] as number;
      const y0 = b0 * x0 + b1 * x1 + b2 * x2 - a1 * y1 - a2 * y2;
      out[n] = y0;
      x2 = x1; x1 = x0; y2 = y1; y1 = y0;
    }
    signal = out;
  }
  return signal;
}
