import { eqBiquad } from '../filters/cookbook-biquads';
import { solveSymmetricPositive } from '../internal/solve-symmetric';
import { biquadLevelDb } from './biquad-level';

/** A peaking filter as the designer gives it (the cookbook's; gain at centerHz, width q). */
export interface PeakingEq {
  readonly kind: 'peaking';
  readonly centerHz: number;
  readonly gainDb: number;
  readonly q: number;
}

/** What the fit works on: the band's points, the error before EQ, the weights and the box the filters stay in. */
export interface PeakingFitProblem {
  /** sin²(π·f/fs) at the band's points (halfAngleSines). */
  readonly phi: Float64Array;
  /** Response − target at the band's points before any EQ, dB. */
  readonly baseErrorDb: Float64Array;
  /** √weight of each point (0 leaves it out). */
  readonly sqrtWeight: Float64Array;
  readonly sampleRateHz: number;
  readonly minHz: number;
  readonly maxHz: number;
  readonly minGainDb: number;
  readonly maxGainDb: number;
  readonly minQ: number;
  readonly maxQ: number;
  /** False for a filter the designer may not use (a boost reaching a null); the fit then takes its gain to 0. */
  readonly allowed: (filter: PeakingEq) => boolean;
}

/** The level of one filter at the band's points, dB: the processor's biquad (eqBiquad), evaluated exactly. */
export function peakingLevelsDb(problem: PeakingFitProblem, filter: PeakingEq, out = new Float64Array(problem.phi.length)): Float64Array {
  return biquadLevelDb(eqBiquad(filter, problem.sampleRateHz), problem.phi, out);
}

/** The weighted error after `levels` (each filter's level at the band's points): √w·(base + Σ levels). */
function weightedError(problem: PeakingFitProblem, levels: readonly Float64Array[], out: Float64Array): number {
  let cost = 0;
  for (let i = 0; i < out.length; i++) {
    let e = problem.baseErrorDb[i] as number;
    for (const l of levels) e += l[i] as number;
    const r = (problem.sqrtWeight[i] as number) * e;
    out[i] = r;
    cost += r * r;
  }
  return cost;
}

/** Mean square error (weights sum to 1: the square of the weighted RMS) of a set of filters. */
export function fitCost(problem: PeakingFitProblem, filters: readonly PeakingEq[]): number {
  const levels = filters.map((f) => peakingLevelsDb(problem, f));
  return weightedError(problem, levels, new Float64Array(problem.phi.length));
}

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));

/** The filter for parameters (log2 centre, gain, log2 Q), held in the box. */
function inBox(problem: PeakingFitProblem, log2Hz: number, gainDb: number, log2Q: number): PeakingEq {
  return {
    kind: 'peaking',
    centerHz: clamp(Math.pow(2, log2Hz), problem.minHz, problem.maxHz),
    gainDb: clamp(gainDb, problem.minGainDb, problem.maxGainDb),
    q: clamp(Math.pow(2, log2Q), problem.minQ, problem.maxQ),
  };
}

/** {@link inBox}, and a boost the designer may not use zeroed. */
function project(problem: PeakingFitProblem, log2Hz: number, gainDb: number, log2Q: number): PeakingEq {
  const f = inBox(problem, log2Hz, gainDb, log2Q);
  return f.gainDb > 0 && !problem.allowed(f) ? { ...f, gainDb: 0 } : f;
}

const paramsOf = (f: PeakingEq) => [Math.log2(f.centerHz), f.gainDb, Math.log2(f.q)] as const;
/** Finite-difference steps: 0.07 % in frequency, 0.01 dB, 0.07 % in Q. */
const STEPS = [1e-3, 1e-2, 1e-3] as const;

/**
 * Levenberg–Marquardt (K. Levenberg 1944; D. W. Marquardt, "An Algorithm for Least-Squares Estimation of Nonlinear
 * Parameters", 1963) on the weighted squared error in dB over the band, jointly over the centre (log2 Hz), gain (dB) and
 * Q (log2) of the filters listed in `vary`, the others held; forward-difference Jacobian, diagonal damping, every step
 * projected into the box and taken only when it lowers the error. Deterministic.
 */
export function refinePeakingFilters(problem: PeakingFitProblem, start: readonly PeakingEq[], vary: readonly number[], maxIterations = 40): PeakingEq[] {
  const filters = start.map((f) => ({ ...f }));
  const m = problem.phi.length;
  const levels = filters.map((f) => peakingLevelsDb(problem, f));
  const r = new Float64Array(m);
  let cost = weightedError(problem, levels, r);
  const p = vary.length * 3;
  if (p === 0) return filters;
  const jac = new Float64Array(p * m);
  const trial = new Float64Array(m);
  let lambda = 1e-2;
  for (let iter = 0; iter < maxIterations; iter++) {
    vary.forEach((k, v) => {
      const base = paramsOf(filters[k] as PeakingEq);
      for (let j = 0; j < 3; j++) {
        // A forward step, or a backward one at the box's upper edge.
        let moved = filters[k] as PeakingEq;
        let step = 0;
        for (const sign of [1, -1]) {
          const x = [...base];
          x[j] = (x[j] as number) + sign * (STEPS[j] as number);
          const f = inBox(problem, x[0] as number, x[1] as number, x[2] as number);
          step = (paramsOf(f)[j] as number) - (base[j] as number);
          moved = f;
          if (Math.abs(step) > 0.5 * (STEPS[j] as number)) break;
        }
        const row = (3 * v + j) * m;
        if (step === 0) {
          jac.fill(0, row, row + m);
          continue;
        }
        const lv = peakingLevelsDb(problem, moved);
        const own = levels[k] as Float64Array;
        for (let i = 0; i < m; i++) jac[row + i] = ((problem.sqrtWeight[i] as number) * ((lv[i] as number) - (own[i] as number))) / step;
      }
    });
    const g = new Float64Array(p);
    const h = new Float64Array(p * p);
    for (let a = 0; a < p; a++) {
      let s = 0;
      for (let i = 0; i < m; i++) s += (jac[a * m + i] as number) * (r[i] as number);
      g[a] = -s;
      for (let b = 0; b <= a; b++) {
        let t = 0;
        for (let i = 0; i < m; i++) t += (jac[a * m + i] as number) * (jac[b * m + i] as number);
        h[a * p + b] = t;
        h[b * p + a] = t;
      }
    }
    let accepted = false;
    let gained = 0;
    for (let tries = 0; tries < 8 && !accepted; tries++) {
      const damped = Float64Array.from(h);
      for (let a = 0; a < p; a++) damped[a * p + a] = (h[a * p + a] as number) * (1 + lambda) + 1e-9;
      const delta = solveSymmetricPositive(damped, g, p);
      if (!delta) {
        lambda *= 4;
        continue;
      }
      const moved = vary.map((k, v) => {
        const x = paramsOf(filters[k] as PeakingEq);
        return project(problem, x[0] + (delta[3 * v] as number), x[1] + (delta[3 * v + 1] as number), x[2] + (delta[3 * v + 2] as number));
      });
      const movedLevels = [...levels];
      vary.forEach((k, v) => (movedLevels[k] = peakingLevelsDb(problem, moved[v] as PeakingEq)));
      const c = weightedError(problem, movedLevels, trial);
      if (c < cost) {
        gained = cost - c;
        cost = c;
        r.set(trial);
        vary.forEach((k, v) => {
          filters[k] = moved[v] as PeakingEq;
          levels[k] = movedLevels[k] as Float64Array;
        });
        lambda = Math.max(lambda / 3, 1e-7);
        accepted = true;
      } else {
        lambda *= 4;
      }
    }
    // Converged: the mean square error moved by less than 1e-6 dB² and 0.01 %.
    if (!accepted || gained < 1e-6 + 1e-4 * cost) break;
  }
  return filters;
}
