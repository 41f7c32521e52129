/**
 * An independent oracle for the EQ designer's tests: the cookbook peaking filter written here from its formulae and
 * evaluated as H(e^jw) with complex.js (reference library), and the residual computed from its definition.
 * Source: R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad filter coefficients" (the Audio EQ Cookbook; W3C
 * Audio Working Group note, 2021): w0 = 2π·f0/fs, α = sin(w0)/(2Q), A = 10^(gainDb/40),
 * b = [1 + αA, −2cos w0, 1 − αA], a = [1 + α/A, −2cos w0, 1 − α/A].
 */
import Complex from 'complex.js';

export interface Peaking {
  centerHz: number;
  gainDb: number;
  q: number;
}

/** |H(e^jw)| of the cookbook peaking filter at fHz, dB, by complex arithmetic on z⁻¹ = e^(−jw). */
export function peakingDb(p: Peaking, sampleRateHz: number, fHz: number): number {
  const w0 = (2 * Math.PI * p.centerHz) / sampleRateHz;
  const alpha = Math.sin(w0) / (2 * p.q);
  const a = Math.pow(10, p.gainDb / 40);
  const zi = new Complex({ abs: 1, arg: (-2 * Math.PI * fHz) / sampleRateHz });
  const zi2 = zi.mul(zi);
  const num = new Complex(1 + alpha * a).add(zi.mul(-2 * Math.cos(w0))).add(zi2.mul(1 - alpha * a));
  const den = new Complex(1 + alpha / a).add(zi.mul(-2 * Math.cos(w0))).add(zi2.mul(1 - alpha / a));
  return 20 * Math.log10(num.div(den).abs());
}

/** The level of several peaking filters in cascade at each frequency, dB. */
export function cascadeDb(filters: readonly Peaking[], sampleRateHz: number, frequencyHz: ArrayLike<number>): number[] {
  return Array.from(frequencyHz, (f) => filters.reduce((s, p) => s + peakingDb(p, sampleRateHz, f), 0));
}

/**
 * The residual as the designer defines it: over the grid points in the band outside the nulls' extents, the RMS of
 * (curve − target) with each point weighted by half the log distance to each neighbouring band point, and the largest
 * |curve − target|.
 */
export function residualOf(frequencyHz: ArrayLike<number>, curveDb: ArrayLike<number>, targetDb: ArrayLike<number>, band: { startHz: number; stopHz: number }, nulls: readonly { lowHz: number; highHz: number }[]): { rmsDb: number; maxDb: number } {
  const idx: number[] = [];
  for (let i = 0; i < frequencyHz.length; i++) if (frequencyHz[i]! >= band.startHz && frequencyHz[i]! <= band.stopHz) idx.push(i);
  let sum = 0;
  let weights = 0;
  let max = 0;
  idx.forEach((i, k) => {
    const f = frequencyHz[i]!;
    if (nulls.some((n) => f >= n.lowHz && f <= n.highHz)) return;
    const left = k > 0 ? Math.log(f / frequencyHz[idx[k - 1]!]!) / 2 : 0;
    const right = k < idx.length - 1 ? Math.log(frequencyHz[idx[k + 1]!]! / f) / 2 : 0;
    const e = curveDb[i]! - targetDb[i]!;
    sum += (left + right) * e * e;
    weights += left + right;
    max = Math.max(max, Math.abs(e));
  });
  return { rmsDb: Math.sqrt(sum / weights), maxDb: max };
}

/** The cookbook's bandwidth of a peaking filter, octaves: 1/Q = 2·sinh(ln 2 / 2 · BW), between its half-gain frequencies. */
export function bandwidthOctaves(q: number): number {
  return (2 / Math.LN2) * Math.asinh(1 / (2 * q));
}
