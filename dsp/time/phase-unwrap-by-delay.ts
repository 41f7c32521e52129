/** How many of the previous steps' group delays the prediction takes the median of. */
const PREDICTION_STEPS = 5;

/** The median of a short list (the mean of the middle two for an even count). */
function medianOf(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? (sorted[mid] as number) : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

/** A phase curve unwrapped along its group delay. */
export interface PhaseUnwrappedByDelay {
  /** Continuous phase, degrees (the first point keeps its given value). */
  readonly unwrappedDeg: Float64Array;
  /** Group delay at the bottom of the grid: the median over the first few steps, seconds (0 for a one-point curve). */
  readonly bottomGroupDelayS: number;
  /** Group delay at the top of the grid: the median over the last few steps, seconds (0 for a one-point curve). */
  readonly topGroupDelayS: number;
}

/**
 * Unwraps a phase curve on a sparse (e.g. log-spaced) grid, where a plain unwrap fails as soon as a delay turns the
 * phase more than 180° from one point to the next (5 ms at 48 points per octave does above ≈ 7 kHz). Each step is
 * predicted from the group delay of the steps before it (the median of the last five, so one jump at a null does not
 * mislead the next), −360·Δf·τ, and the wrapped remainder is added to the prediction: a pure delay unwraps exactly on
 * any grid. Frequencies ascending, Hz; phase in degrees, wrapped or not. Our own method, stated here (the plain unwrap
 * it extends is common practice).
 * @example phaseUnwrapByDelay([100, 200, 400], [-180, 0, 0]).unwrappedDeg // [−180, −360, −720] (a 5 ms delay)
 */
export function phaseUnwrapByDelay(frequencyHz: ArrayLike<number>, phaseDeg: ArrayLike<number>): PhaseUnwrappedByDelay {
  const n = phaseDeg.length;
  const unwrappedDeg = new Float64Array(n);
  if (n === 0) return { unwrappedDeg, bottomGroupDelayS: 0, topGroupDelayS: 0 };
  unwrappedDeg[0] = phaseDeg[0] as number;
  const stepDelaysS: number[] = [];
  for (let i = 1; i < n; i++) {
    const deltaHz = (frequencyHz[i] as number) - (frequencyHz[i - 1] as number);
    const predictedS = stepDelaysS.length === 0 ? 0 : medianOf(stepDelaysS.slice(-PREDICTION_STEPS));
    const predictedDeg = -360 * deltaHz * predictedS;
    const rawDeg = (phaseDeg[i] as number) - (phaseDeg[i - 1] as number);
    const offDeg = rawDeg - predictedDeg;
    const stepDeg = predictedDeg + offDeg - 360 * Math.round(offDeg / 360);
    unwrappedDeg[i] = (unwrappedDeg[i - 1] as number) + stepDeg;
    stepDelaysS.push(-stepDeg / (360 * deltaHz));
  }
  if (stepDelaysS.length === 0) return { unwrappedDeg, bottomGroupDelayS: 0, topGroupDelayS: 0 };
  return {
    unwrappedDeg,
    bottomGroupDelayS: medianOf(stepDelaysS.slice(0, PREDICTION_STEPS)),
    topGroupDelayS: medianOf(stepDelaysS.slice(-PREDICTION_STEPS)),
  };
}
