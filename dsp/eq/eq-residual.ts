/** How far a curve lies from its target over the points the EQ works on. */
export interface EqResidual {
  /** Root mean square of (curve − target), each point weighted by its share of log frequency, dB. */
  readonly rmsDb: number;
  /** Largest |curve − target|, dB. */
  readonly maxDb: number;
}

/** The residual's definition in words, for the answer and the API page. */
export const RESIDUAL_DEFINITION =
  'over the grid points within the band, leaving out the nulls’ extents (EQ cannot fill them): rmsDb is the root mean square of corrected − target, each point weighted by its share of log frequency (half the log distance to each neighbouring band point, so equal weights on a log grid but half at the band’s two ends), maxDb the largest |corrected − target|';

/**
 * Each point's share of log frequency among the band's points lo…hi (half the log distance to each neighbour within
 * the band; common practice, as bandPowerAverageDb weighs a curve), normalised to sum to 1 over the points kept.
 * `keep[i]` false leaves point i out (a null's extent); its share is not given to others.
 */
export function logShareWeights(frequencyHz: ArrayLike<number>, lo: number, hi: number, keep: (i: number) => boolean): Float64Array {
  const w = new Float64Array(hi - lo + 1);
  let total = 0;
  if (hi === lo) {
    if (keep(lo)) w[0] = 1;
    return w;
  }
  for (let i = lo; i <= hi; i++) {
    if (!keep(i)) continue;
    const left = i > lo ? Math.log((frequencyHz[i] as number) / (frequencyHz[i - 1] as number)) / 2 : 0;
    const right = i < hi ? Math.log((frequencyHz[i + 1] as number) / (frequencyHz[i] as number)) / 2 : 0;
    w[i - lo] = left + right;
    total += left + right;
  }
  if (total > 0) for (let k = 0; k < w.length; k++) w[k] = (w[k] as number) / total;
  return w;
}

/** The residual of `errorDb` (curve − target at the band's points, index k ↔ weights[k]) with the weights given. */
export function eqResidual(errorDb: ArrayLike<number>, weights: Float64Array): EqResidual {
  let sum = 0;
  let max = 0;
  for (let k = 0; k < weights.length; k++) {
    const w = weights[k] as number;
    if (w <= 0) continue;
    const e = errorDb[k] as number;
    sum += w * e * e;
    max = Math.max(max, Math.abs(e));
  }
  return { rmsDb: Math.sqrt(sum), maxDb: max };
}
