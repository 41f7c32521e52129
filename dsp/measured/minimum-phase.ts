import { RAD_TO_DEG, wrapDeg } from '../internal/angles';
import { curveFrequencies } from '../internal/guards';
import { interpolateLogHz } from '../internal/interpolate';
import { logFrequencyGridHz } from '../grid/log-frequency-grid';

/** Options of {@link minimumPhaseDeg}. */
export interface MinimumPhaseOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
}

/** Minimum-phase estimate on the input grid. */
export interface MinimumPhaseResult {
  readonly frequencyHz: Float64Array;
  /** Wrapped to (−180, 180]. */
  readonly phaseDeg: Float64Array;
  readonly unwrappedPhaseDeg: Float64Array;
}

const PI2_8 = (Math.PI * Math.PI) / 8;
const PI2_4 = (Math.PI * Math.PI) / 4;

/** χ2(y) = Σ_{k odd} y^k / k² for 0 ≤ y ≤ 0.5. */
function chi2Series(y: number): number {
  let term = y;
  const y2 = y * y;
  let sum = 0;
  for (let k = 1; k < 200; k += 2) {
    const add = term / (k * k);
    sum += add;
    if (add < 1e-18) break;
    term *= y2;
  }
  return sum;
}

/** J(x) = ∫₀ˣ ln coth(t/2) dt = π²/4 − 2·χ2(e^(−x)), x ≥ 0 (Legendre's chi function and its Landen identity). */
function kernelIntegral(x: number): number {
  if (x === 0) return 0;
  if (x > 40) return PI2_4;
  const y = Math.exp(-x);
  let chi: number;
  if (y <= 0.5) chi = chi2Series(y);
  else {
    const z = Math.tanh(x / 2);
    chi = PI2_8 + 0.5 * x * Math.log(z) - chi2Series(z);
  }
  return PI2_4 - 2 * chi;
}

const K = (u: number): number => (u >= 0 ? kernelIntegral(u) : -kernelIntegral(-u));

/** Points per octave of the internal log grid. */
const INTERNAL_POINTS_PER_OCTAVE = 48;

/**
 * Minimum phase from magnitude by the Hilbert transform in log-frequency (Bode's gain–phase integral,
 * φ(ω₀) = (1/π)∫ dA/du · ln coth(|u|/2) du, u = ln(ω/ω₀), A = ln|H|; H. W. Bode, "Network Analysis and Feedback
 * Amplifier Design", 1945; Oppenheim & Schafer, "Discrete-Time Signal Processing"). The magnitude is taken as
 * piecewise linear in log-frequency on a 48-per-octave grid (integrated exactly) and continued beyond the ends
 * at its end slopes.
 * @example minimumPhaseDeg({ frequencyHz: grid, magnitudeDb: butterworthMagnitudeDb }).phaseDeg
 */
export function minimumPhaseDeg({ frequencyHz, magnitudeDb }: MinimumPhaseOptions): MinimumPhaseResult {
  const f = curveFrequencies(frequencyHz, magnitudeDb);
  if (f.length < 2) throw new RangeError('frequencyHz must hold at least two frequencies');
  const fLo = f[0] as number;
  const fHi = f[f.length - 1] as number;
  const grid = logFrequencyGridHz({ startHz: fLo, stopHz: fHi, pointsPerOctave: INTERNAL_POINTS_PER_OCTAVE });
  const g = grid[grid.length - 1] === fHi ? grid : Float64Array.from([...grid, fHi]);
  const m = g.length;
  const u = new Float64Array(m);
  const a = new Float64Array(m);
  const toNeper = Math.LN10 / 20;
  for (let i = 0; i < m; i++) {
    u[i] = Math.log(g[i] as number);
    a[i] = interpolateLogHz(f, magnitudeDb, g[i] as number) * toNeper;
  }
  const slope = new Float64Array(m - 1);
  for (let i = 0; i < m - 1; i++) slope[i] = ((a[i + 1] as number) - (a[i] as number)) / ((u[i + 1] as number) - (u[i] as number));
  // End slopes: the last octave's average on each side.
  const span = Math.min(m - 1, INTERNAL_POINTS_PER_OCTAVE);
  const slopeLo = ((a[span] as number) - (a[0] as number)) / ((u[span] as number) - (u[0] as number));
  const slopeHi = ((a[m - 1] as number) - (a[m - 1 - span] as number)) / ((u[m - 1] as number) - (u[m - 1 - span] as number));
  const phaseRad = new Float64Array(m);
  const kAt = new Float64Array(m);
  for (let j = 0; j < m; j++) {
    const u0 = u[j] as number;
    for (let i = 0; i < m; i++) kAt[i] = K((u[i] as number) - u0);
    let sum = slopeLo * ((kAt[0] as number) + PI2_4) + slopeHi * (PI2_4 - (kAt[m - 1] as number));
    for (let i = 0; i < m - 1; i++) sum += (slope[i] as number) * ((kAt[i + 1] as number) - (kAt[i] as number));
    phaseRad[j] = sum / Math.PI;
  }
  const unwrappedPhaseDeg = new Float64Array(f.length);
  const phaseDeg = new Float64Array(f.length);
  const internalDeg = phaseRad.map((p) => p * RAD_TO_DEG);
  for (let i = 0; i < f.length; i++) {
    const p = interpolateLogHz(g, internalDeg, f[i] as number);
    unwrappedPhaseDeg[i] = p;
    phaseDeg[i] = wrapDeg(p);
  }
  return { frequencyHz: Float64Array.from(f), phaseDeg, unwrappedPhaseDeg };
}
