/**
 * Unwraps a phase curve in degrees: each step is taken as the one within ±180° (common practice).
 * @example unwrapDeg([170, -170]) // [170, 190]
 */
export function unwrapDeg(phaseDeg: ArrayLike<number>): Float64Array {
  const out = new Float64Array(phaseDeg.length);
  if (phaseDeg.length === 0) return out;
  out[0] = phaseDeg[0] as number;
  for (let i = 1; i < phaseDeg.length; i++) {
    const step = (phaseDeg[i] as number) - (phaseDeg[i - 1] as number);
    out[i] = (out[i - 1] as number) + step - 360 * Math.round(step / 360);
  }
  return out;
}
