import { LN_POWER_TO_DB } from '../internal/angles';
import { assertIntegerInRange, curveFrequencies } from '../internal/guards';

/** Options of {@link smoothFractionalOctave}. */
export interface SmoothOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  /** N of 1/N octave, 1..48. */
  readonly fraction: number;
}

/** The smoothed curve on the input grid. */
export interface SmoothedCurve {
  readonly frequencyHz: Float64Array;
  readonly magnitudeDb: Float64Array;
}

/**
 * 1/N-octave smoothing: each point becomes the power average of the input points within f·2^(±1/(2N))
 * (common practice; band definition as in IEC 61260-1 but base two). O(n) with prefix sums.
 * @example smoothFractionalOctave({ frequencyHz: grid, magnitudeDb: curve, fraction: 3 }).magnitudeDb
 */
export function smoothFractionalOctave({ frequencyHz, magnitudeDb, fraction }: SmoothOptions): SmoothedCurve {
  const f = curveFrequencies(frequencyHz, magnitudeDb);
  assertIntegerInRange('fraction', fraction, 1, 48);
  const n = f.length;
  // Prefix sums of linear power (normalized by the peak to stay in range).
  let peak = -Infinity;
  for (let i = 0; i < n; i++) peak = Math.max(peak, magnitudeDb[i] as number);
  const prefix = new Float64Array(n + 1);
  for (let i = 0; i < n; i++) prefix[i + 1] = (prefix[i] as number) + Math.pow(10, ((magnitudeDb[i] as number) - peak) / 10);
  const half = Math.pow(2, 1 / (2 * fraction));
  const out = new Float64Array(n);
  let lo = 0;
  let hi = 0;
  for (let i = 0; i < n; i++) {
    const fi = f[i] as number;
    const fLo = fi / half;
    const fHi = fi * half;
    while ((f[lo] as number) < fLo * (1 - 1e-12)) lo++;
    if (hi < i) hi = i;
    while (hi + 1 < n && (f[hi + 1] as number) <= fHi * (1 + 1e-12)) hi++;
    let total = (prefix[hi + 1] as number) - (prefix[lo] as number);
    if (total < 1e-6 * (prefix[hi + 1] as number)) {
      // Far below the peak the prefix difference loses digits: add the window directly.
      total = 0;
      for (let j = lo; j <= hi; j++) total += Math.pow(10, ((magnitudeDb[j] as number) - peak) / 10);
    }
    const mean = total / (hi - lo + 1);
    out[i] = peak + LN_POWER_TO_DB * Math.log(mean);
  }
  return { frequencyHz: Float64Array.from(f), magnitudeDb: out };
}
