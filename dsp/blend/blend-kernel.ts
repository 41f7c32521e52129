import { LN_POWER_TO_DB, RAD_TO_DEG } from '../internal/angles';
import * as fastMath from '../internal/fast-math';
import { positiveFrequencies } from '../internal/guards';
import { evaluatePlanOnGrid, type PlanValues } from '../internal/section-plan';
import type { ResponseCurves } from './blend-types';
import { SILENCE_DB } from './blend-types';
import type { CompiledPath } from './path-plan';

// The hot loops of a blend: the analog sections of every path are evaluated by the one section evaluator
// (internal/section-plan, product rule for H′), the relative delay is one polynomial sin/cos pair per point
// (internal/fast-math), and the curves of a path and of the sum come from one finishing loop with one log and one atan2
// per point. Nothing is allocated per point; with a BlendGrid nothing is allocated per call beyond the result object.

// Local binding: some loaders turn imports into getter calls, which hot loops should not pay for.
const { fastAtan2, sinCos } = fastMath;

const SILENT_POWER = Math.pow(10, SILENCE_DB / 10);
const TWO_PI = 2 * Math.PI;
const INV_TWO_PI = 1 / TWO_PI;
const INV_360 = 1 / 360;
/** sin and cos of ωΔ for the point in hand (calls are synchronous, so one pair serves every call). */
const SIN_COS = new Float64Array(2);

/**
 * A validated frequency grid prepared for repeated blends: ω = 2πf computed once and scratch buffers reused by
 * every call (calls are synchronous, so one grid may serve any number of calls in turn). Do not mutate its arrays.
 */
export interface BlendGrid {
  readonly kind: 'blend-grid';
  /** A private copy of the validated grid, Hz. */
  readonly frequencyHz: Float64Array;
  /** 2π·frequencyHz, rad/s. */
  readonly omega: Float64Array;
  /** Internal scratch (S, S′ and one path's H and H′/H per point). */
  readonly scratch: Float64Array;
  /** Views of scratch rows 4..7 where a path's sections are evaluated (Re H, Im H, Re H′/H, Im H′/H). */
  readonly rows: PlanValues;
}

/**
 * Validates a grid once and precomputes ω for {@link blendSumResponse} / blendResponse.
 * @example const g = blendGrid(logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 48 })); // g.omega.length 527
 */
export function blendGrid(frequencyHz: Float64Array | readonly number[]): BlendGrid {
  const f = Float64Array.from(positiveFrequencies('frequencyHz', frequencyHz));
  const omega = new Float64Array(f.length);
  for (let i = 0; i < f.length; i++) omega[i] = TWO_PI * (f[i] as number);
  const n = f.length;
  const scratch = new Float64Array(8 * n);
  const rows: PlanValues = { re: scratch.subarray(4 * n, 5 * n), im: scratch.subarray(5 * n, 6 * n), dIm: scratch.subarray(6 * n, 7 * n), dRe: scratch.subarray(7 * n, 8 * n) };
  return { kind: 'blend-grid', frequencyHz: f, omega, scratch, rows };
}

/** True when `value` is a grid made by {@link blendGrid}. */
export function isBlendGrid(value: unknown): value is BlendGrid {
  return typeof value === 'object' && value !== null && (value as { kind?: unknown }).kind === 'blend-grid' && (value as BlendGrid).omega instanceof Float64Array;
}

/** The grid of a call: a prepared BlendGrid as is, else a fresh one (validated). */
export function toBlendGrid(frequencyHz: Float64Array | readonly number[] | BlendGrid): BlendGrid {
  return isBlendGrid(frequencyHz) ? frequencyHz : blendGrid(frequencyHz);
}

/**
 * Adds one path to the running sum, relative to the earliest path (G = H·e^(−jωΔ), G′ = G·(H′/H − jΔ)); the path's
 * own H and H′/H stay in scratch rows 4..7 for finishPath. Scratch rows: 0 Re S, 1 Im S, 2 Re S′, 3 Im S′, 4 Re H,
 * 5 Im H, 6 Im H′/H, 7 Re H′/H. `first` overwrites the sum instead of adding to it.
 */
export function accumulatePath(path: CompiledPath, delta: number, grid: BlendGrid, first: boolean): void {
  const omega = grid.omega;
  const n = omega.length;
  const s = grid.scratch;
  // The path's H and H′/H at every point: the one evaluation of a section product (internal/section-plan), into
  // scratch rows 4 (Re H), 5 (Im H), 7 (Re H′/H) and 6 (Im H′/H).
  evaluatePlanOnGrid(path.plan, omega, grid.rows);
  const rotate = delta !== 0;
  for (let i = 0; i < n; i++) {
    const w = omega[i] as number;
    const hr = s[4 * n + i] as number;
    const hi = s[5 * n + i] as number;
    const dr = s[7 * n + i] as number;
    const di = s[6 * n + i] as number;
    let gr = hr;
    let gi = hi;
    let gdi = di;
    if (rotate) {
      sinCos(w * delta, SIN_COS, 0);
      const sn = SIN_COS[0] as number;
      const cs = SIN_COS[1] as number;
      gr = hr * cs + hi * sn;
      gi = hi * cs - hr * sn;
      gdi = di - delta;
    }
    if (first) {
      s[i] = gr;
      s[n + i] = gi;
      s[2 * n + i] = gr * dr - gi * gdi;
      s[3 * n + i] = gr * gdi + gi * dr;
    } else {
      s[i] = (s[i] as number) + gr;
      s[n + i] = (s[n + i] as number) + gi;
      s[2 * n + i] = (s[2 * n + i] as number) + gr * dr - gi * gdi;
      s[3 * n + i] = (s[3 * n + i] as number) + gr * gdi + gi * dr;
    }
  }
}

/** Writes one path's curves from scratch rows 4..6 (its H and Im H′/H) and its total delay tau, seconds. */
export function finishPath(grid: BlendGrid, tau: number, mag: Float64Array, ph: Float64Array, un: Float64Array, gd: Float64Array): void {
  writeCurves(grid, tau, mag, ph, un, gd, false);
}

/** Writes the sum's curves from scratch rows 0..3 (S and S′ relative to the earliest path, whose delay is tau0). */
export function finishSum(grid: BlendGrid, tau0: number, out: ResponseCurves): void {
  writeCurves(grid, tau0, out.magnitudeDb, out.phaseDeg, out.unwrappedPhaseDeg, out.groupDelayMs, true);
}

/**
 * The one finishing loop of finishPath (ofSum false: H in rows 4, 5, Im H′/H in row 6, tau the path's delay) and
 * finishSum (ofSum true: S and S′ in rows 0..3, group delay −Im(S′/S), tau the earliest path's delay; a silent point's
 * group delay reads 0). The phase is unwrapped by following the group delay: each step's expected change is the
 * trapezoid −½(τg₁ + τg₂)·Δω, and only the remainder is taken to the nearest turn (common practice). The delay tau is
 * then added arithmetically (−ωτ), so the unwrapped phase holds exactly −360·f·τ for it.
 */
function writeCurves(grid: BlendGrid, tau: number, mag: Float64Array, ph: Float64Array, un: Float64Array, gd: Float64Array, ofSum: boolean): void {
  const omega = grid.omega;
  const n = omega.length;
  const s = grid.scratch;
  const row = ofSum ? 0 : 4 * n;
  let prevWrapped = 0;
  let prevUnwrapped = 0;
  let prevGroup = 0;
  let prevOmega = 0;
  for (let i = 0; i < n; i++) {
    const w = omega[i] as number;
    const r = s[row + i] as number;
    const m = s[row + n + i] as number;
    const p = r * r + m * m;
    const audible = p > SILENT_POWER;
    let phase = 0;
    let group = ofSum ? 0 : -(s[6 * n + i] as number);
    if (audible) {
      mag[i] = LN_POWER_TO_DB * Math.log(p);
      phase = fastAtan2(m, r);
      // −Im(S′/S) = −(S′_im·S_re − S′_re·S_im)/|S|²
      if (ofSum) group = -((s[3 * n + i] as number) * r - (s[2 * n + i] as number) * m) / p;
    } else {
      mag[i] = SILENCE_DB;
    }
    let unwrapped = phase;
    if (i > 0) {
      const predicted = -0.5 * (prevGroup + group) * (w - prevOmega);
      const step = phase - prevWrapped - predicted;
      unwrapped = prevUnwrapped + predicted + step - TWO_PI * Math.round(step * INV_TWO_PI);
    }
    prevWrapped = phase;
    prevUnwrapped = unwrapped;
    prevGroup = group;
    prevOmega = w;
    const delayRad = w * tau;
    const deg = RAD_TO_DEG * (phase - delayRad);
    let wrapped = deg - 360 * Math.round(deg * INV_360);
    if (wrapped <= -180) wrapped += 360;
    ph[i] = wrapped;
    un[i] = RAD_TO_DEG * (unwrapped - delayRad);
    gd[i] = audible || !ofSum ? 1000 * (group + tau) : 0;
  }
}

/** Fresh curves of length n in one allocation. */
export function newCurves(n: number): ResponseCurves {
  const b = new Float64Array(4 * n);
  return { magnitudeDb: b.subarray(0, n), phaseDeg: b.subarray(n, 2 * n), unwrappedPhaseDeg: b.subarray(2 * n, 3 * n), groupDelayMs: b.subarray(3 * n, 4 * n) };
}

