import { LN_POWER_TO_DB } from '../internal/angles';
import type { Biquad } from '../filters/filter-types';

// The level of a biquad in the convention H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²) at z = e^(jw), written
// with φ = sin²(w/2) as the Audio EQ Cookbook writes it (R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad
// filter coefficients", the magnitude formula):
//   |H|² = [(b0 + b1 + b2)² − 4(b0b1 + 4b0b2 + b1b2)·φ + 16·b0b2·φ²] / [(1 + a1 + a2)² − 4(a1 + 4a2 + a1a2)·φ + 16·a2·φ²]
// Unlike |B|² = Σ bk·bl·cos((k − l)w), this keeps its precision at low w/fs, where b0 + b1 + b2 is tiny (a 20 Hz
// filter at 384 kHz).

/** φ = sin²(π·f/fs) at each frequency: the argument {@link biquadLevelDb} takes. */
export function halfAngleSines(frequencyHz: ArrayLike<number>, sampleRateHz: number): Float64Array {
  return Float64Array.from(frequencyHz as ArrayLike<number>, (f) => {
    const s = Math.sin((Math.PI * f) / sampleRateHz);
    return s * s;
  });
}

/**
 * The exact level, dB, of one biquad at the frequencies whose φ = sin²(π·f/fs) are given (see {@link halfAngleSines}),
 * written into `out` (or added to it when `add` is true).
 * @example biquadLevelDb({ b0: 1, b1: 0, b2: 0, a1: 0, a2: 0 }, Float64Array.of(0.1), new Float64Array(1))[0] // 0
 */
export function biquadLevelDb(section: Biquad, phi: Float64Array, out: Float64Array, add = false): Float64Array {
  const { b0, b1, b2, a1, a2 } = section;
  const bs = b0 + b1 + b2;
  const as = 1 + a1 + a2;
  const bs2 = bs * bs;
  const as2 = as * as;
  const bm = 4 * (b0 * b1 + 4 * b0 * b2 + b1 * b2);
  const am = 4 * (a1 + 4 * a2 + a1 * a2);
  const bq = 16 * b0 * b2;
  const aq = 16 * a2;
  for (let i = 0; i < phi.length; i++) {
    const p = phi[i] as number;
    const num = bs2 - p * (bm - bq * p);
    const den = as2 - p * (am - aq * p);
    const db = LN_POWER_TO_DB * Math.log(Math.max(num, 1e-300) / den);
    out[i] = add ? (out[i] as number) + db : db;
  }
  return out;
}
