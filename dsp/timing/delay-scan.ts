import { LN_POWER_TO_DB } from '../internal/angles';
import { sinCos } from '../internal/fast-math';

/**
 * Two complex responses A (mains) and B (sub) on a set of points, and the scan of the sum |A ± B·e^(−jωd)| over a
 * uniform range of relative delays d (positive: the sub is delayed more). The points are the ±1-octave band;
 * flatness at each d is the largest |level − reference| over the band, the reference being the sum at refIndex
 * or, when referencePower is given, that per-point power.
 */
export interface DelayScanInput {
  readonly omega: Float64Array;
  readonly aRe: Float64Array;
  readonly aIm: Float64Array;
  readonly bRe: Float64Array;
  readonly bIm: Float64Array;
  /** Points [0, bandCount) form the band; further points are only used as reference or crossover. */
  readonly bandCount: number;
  readonly refIndex: number;
  readonly crossoverIndex: number;
  readonly referencePower?: Float64Array;
}

/** Scan output: index k is delay firstS + k·stepS. "same" keeps B's polarity, "flipped" inverts it. */
export interface DelayScan {
  readonly delayS: Float64Array;
  readonly flatnessSameDb: Float64Array;
  readonly flatnessFlippedDb: Float64Array;
  readonly levelSameDb: Float64Array;
  readonly levelFlippedDb: Float64Array;
}

const TINY = 1e-300;

/**
 * Scans `steps` relative delays firstS + k·stepS. Inside the band the two powers are formed as
 * |A ± B·Φ|² = (|A|² + |B|²) ± 2·Re(conj(A)·B·Φ), with Z = 2·conj(A)·B·Φ carried by a complex rotation per step
 * (re-anchored every 64 steps), so each point and step costs one complex product and two additions. The reference
 * and crossover points keep the direct form. `withLevels` = false leaves the crossover levels at 0 (the sweep).
 */
export function scanRelativeDelay(input: DelayScanInput, firstS: number, stepS: number, steps: number, withLevels = true): DelayScan {
  const { omega, aRe, aIm, bRe, bIm, bandCount, refIndex, crossoverIndex, referencePower } = input;
  const rotRe = new Float64Array(bandCount);
  const rotIm = new Float64Array(bandCount);
  const zRe = new Float64Array(bandCount);
  const zIm = new Float64Array(bandCount);
  const kRe = new Float64Array(bandCount);
  const kIm = new Float64Array(bandCount);
  const base = new Float64Array(bandCount);
  const sc = new Float64Array(2);
  const scale = new Float64Array(bandCount);
  for (let i = 0; i < bandCount; i++) {
    const ar = aRe[i] as number;
    const ai = aIm[i] as number;
    const br = bRe[i] as number;
    const bi = bIm[i] as number;
    base[i] = ar * ar + ai * ai + br * br + bi * bi + TINY;
    kRe[i] = 2 * (ar * br + ai * bi);
    kIm[i] = 2 * (ar * bi - ai * br);
    scale[i] = referencePower ? 1 / (referencePower[i] as number) : 1;
    const w = omega[i] as number;
    sinCos(-w * stepS, sc, 0);
    rotRe[i] = sc[1] as number;
    rotIm[i] = sc[0] as number;
  }
  // Direct phasors of the reference and crossover points (same recurrence as the band's, kept apart).
  const special = [refIndex, crossoverIndex];
  const sRotRe = new Float64Array(2);
  const sRotIm = new Float64Array(2);
  const sPhRe = new Float64Array(2);
  const sPhIm = new Float64Array(2);
  for (let j = 0; j < 2; j++) {
    const w = omega[special[j] as number] as number;
    sinCos(-w * stepS, sc, 0);
    sRotRe[j] = sc[1] as number;
    sRotIm[j] = sc[0] as number;
  }
  const anchor = (k: number): void => {
    const d = k === 0 ? firstS : firstS + k * stepS;
    for (let i = 0; i < bandCount; i++) {
      sinCos(-(omega[i] as number) * d, sc, 0);
      const pr = sc[1] as number;
      const pi = sc[0] as number;
      const kr = kRe[i] as number;
      const ki = kIm[i] as number;
      zRe[i] = kr * pr - ki * pi;
      zIm[i] = kr * pi + ki * pr;
    }
    for (let j = 0; j < 2; j++) {
      sinCos(-(omega[special[j] as number] as number) * d, sc, 0);
      sPhRe[j] = sc[1] as number;
      sPhIm[j] = sc[0] as number;
    }
  };
  const direct = (idx: number, j: number, sign: number): number => {
    const pr = sPhRe[j] as number;
    const pi = sPhIm[j] as number;
    const b = bRe[idx] as number;
    const c = bIm[idx] as number;
    const sr = (aRe[idx] as number) + sign * (b * pr - c * pi);
    const si = (aIm[idx] as number) + sign * (b * pi + c * pr);
    return sr * sr + si * si + TINY;
  };
  const delayS = new Float64Array(steps);
  const flatnessSameDb = new Float64Array(steps);
  const flatnessFlippedDb = new Float64Array(steps);
  const levelSameDb = new Float64Array(steps);
  const levelFlippedDb = new Float64Array(steps);
  anchor(0);
  for (let k = 0; k < steps; k++) {
    // Re-anchor the recurrence now and then so rounding cannot drift.
    if (k > 0 && k % 64 === 0) anchor(k);
    let minSame = Infinity;
    let maxSame = 0;
    let minFlipped = Infinity;
    let maxFlipped = 0;
    for (let i = 0; i < bandCount; i++) {
      const zr = zRe[i] as number;
      const zi = zIm[i] as number;
      const p = base[i] as number;
      const f = scale[i] as number;
      // Rounding can leave a deep null at or below zero here; floor it like the direct form's TINY.
      const ps = (p + zr > TINY ? p + zr : TINY) * f;
      const pf = (p - zr > TINY ? p - zr : TINY) * f;
      if (ps < minSame) minSame = ps;
      if (ps > maxSame) maxSame = ps;
      if (pf < minFlipped) minFlipped = pf;
      if (pf > maxFlipped) maxFlipped = pf;
      const rr = rotRe[i] as number;
      const ri = rotIm[i] as number;
      zRe[i] = zr * rr - zi * ri;
      zIm[i] = zr * ri + zi * rr;
    }
    if (referencePower) {
      flatnessSameDb[k] = LN_POWER_TO_DB * Math.log(Math.max(maxSame, 1 / minSame));
      flatnessFlippedDb[k] = LN_POWER_TO_DB * Math.log(Math.max(maxFlipped, 1 / minFlipped));
    } else {
      const refSame = direct(refIndex, 0, 1);
      const refFlipped = direct(refIndex, 0, -1);
      flatnessSameDb[k] = LN_POWER_TO_DB * Math.log(Math.max(maxSame / refSame, refSame / minSame));
      flatnessFlippedDb[k] = LN_POWER_TO_DB * Math.log(Math.max(maxFlipped / refFlipped, refFlipped / minFlipped));
    }
    if (withLevels) {
      levelSameDb[k] = LN_POWER_TO_DB * Math.log(direct(crossoverIndex, 1, 1));
      levelFlippedDb[k] = LN_POWER_TO_DB * Math.log(direct(crossoverIndex, 1, -1));
    }
    delayS[k] = firstS + k * stepS;
    for (let j = 0; j < 2; j++) {
      const pr = sPhRe[j] as number;
      const pi = sPhIm[j] as number;
      const rr = sRotRe[j] as number;
      const ri = sRotIm[j] as number;
      sPhRe[j] = pr * rr - pi * ri;
      sPhIm[j] = pr * ri + pi * rr;
    }
  }
  return { delayS, flatnessSameDb, flatnessFlippedDb, levelSameDb, levelFlippedDb };
}

/**
 * Flatness at one relative delay and polarity by the direct form |A ± B·e^(−jωd)|² at every band point (what a
 * scan approximates to rounding); used to report the chosen setting.
 */
const FLATNESS_SC = new Float64Array(2);

export function flatnessAt(input: DelayScanInput, delayS: number, flipped: boolean): number {
  const { omega, aRe, aIm, bRe, bIm, bandCount, refIndex, referencePower } = input;
  const sc = FLATNESS_SC;
  const sign = flipped ? -1 : 1;
  const power = (i: number): number => {
    sinCos(-(omega[i] as number) * delayS, sc, 0);
    const pr = sc[1] as number;
    const pi = sc[0] as number;
    const b = bRe[i] as number;
    const c = bIm[i] as number;
    const sr = (aRe[i] as number) + sign * (b * pr - c * pi);
    const si = (aIm[i] as number) + sign * (b * pi + c * pr);
    return sr * sr + si * si + TINY;
  };
  let min = Infinity;
  let max = 0;
  for (let i = 0; i < bandCount; i++) {
    let p = power(i);
    if (referencePower) p /= referencePower[i] as number;
    if (p < min) min = p;
    if (p > max) max = p;
  }
  if (referencePower) return LN_POWER_TO_DB * Math.max(Math.log(max), -Math.log(min));
  const ref = power(refIndex);
  return LN_POWER_TO_DB * Math.max(Math.log(max / ref), Math.log(ref / min));
}

/** The best (flattest) entry of a scan; ties go to the smaller |delay|. */
export interface ScanBest {
  readonly index: number;
  readonly flipped: boolean;
  readonly delayS: number;
  readonly flatnessDb: number;
}

export function bestOfScan(scan: DelayScan): ScanBest {
  let best: ScanBest = { index: 0, flipped: false, delayS: scan.delayS[0] as number, flatnessDb: Infinity };
  const consider = (k: number, flipped: boolean, value: number): void => {
    const d = scan.delayS[k] as number;
    if (value < best.flatnessDb - 1e-9 || (Math.abs(value - best.flatnessDb) <= 1e-9 && Math.abs(d) < Math.abs(best.delayS))) {
      best = { index: k, flipped, delayS: d, flatnessDb: value };
    }
  };
  for (let k = 0; k < scan.delayS.length; k++) {
    consider(k, false, scan.flatnessSameDb[k] as number);
    consider(k, true, scan.flatnessFlippedDb[k] as number);
  }
  return best;
}

/** Every band point whose index is a multiple of this (plus the band's last point) bounds the flatness from below. */
const BOUND_STRIDE = 4;

/** The scan input restricted to a subset of the band (then the reference and crossover points). */
function subsetInput(input: DelayScanInput, stride: number): DelayScanInput {
  const picks: number[] = [];
  for (let i = 0; i < input.bandCount; i += stride) picks.push(i);
  if (picks[picks.length - 1] !== input.bandCount - 1) picks.push(input.bandCount - 1);
  const bandCount = picks.length;
  picks.push(input.refIndex, input.crossoverIndex);
  const take = (a: Float64Array): Float64Array => Float64Array.from(picks, (i) => a[i] as number);
  return {
    omega: take(input.omega),
    aRe: take(input.aRe),
    aIm: take(input.aIm),
    bRe: take(input.bRe),
    bIm: take(input.bIm),
    bandCount,
    refIndex: bandCount,
    crossoverIndex: bandCount + 1,
    referencePower: input.referencePower ? Float64Array.from(picks.slice(0, bandCount), (i) => input.referencePower?.[i] as number) : undefined,
  };
}

/** The coarse scan's delays and the sum's level at the crossover for both polarities (what Timing plots). */
export interface DelayLevels {
  readonly delayS: Float64Array;
  readonly levelSameDb: Float64Array;
  readonly levelFlippedDb: Float64Array;
}

/**
 * Coarse scan (stepS over ±maxDelayS), then a fine scan ±1 coarse step around the coarse best; returns the fine best
 * (its flatness re-evaluated by the direct form) and the coarse delays with the crossover levels.
 *
 * The coarse best is found by branch and bound with the same answer as evaluating every coarse delay: flatness (the
 * largest |level − reference| over the band) is at least the same quantity over a subset of the band, so every delay
 * and polarity first gets that lower bound from every 4th band point; then, starting from the smallest bound, the
 * full band is evaluated until the bound exceeds the best full value found (+1e-9 dB, the tie tolerance).
 * `withLevels` = false skips the crossover levels (the sweep does not need them).
 */
export function searchRelativeDelay(input: DelayScanInput, maxDelayS: number, stepS: number, withLevels = true): { coarse: DelayLevels; best: ScanBest } {
  const half = Math.round(maxDelayS / stepS);
  const steps = 2 * half + 1;
  const first = -stepS * half;
  const bounds = scanRelativeDelay(subsetInput(input, BOUND_STRIDE), first, stepS, steps, withLevels);
  const bound = new Float64Array(2 * steps);
  let start = 0;
  for (let k = 0; k < steps; k++) {
    const same = bounds.flatnessSameDb[k] as number;
    const flipped = bounds.flatnessFlippedDb[k] as number;
    bound[2 * k] = Number.isNaN(same) ? -Infinity : same;
    bound[2 * k + 1] = Number.isNaN(flipped) ? -Infinity : flipped;
    if ((bound[2 * k] as number) < (bound[start] as number)) start = 2 * k;
    if ((bound[2 * k + 1] as number) < (bound[start] as number)) start = 2 * k + 1;
  }
  // Same rule as bestOfScan: strictly flatter by more than 1e-9 dB, or as flat within 1e-9 dB and a smaller |delay|
  // (equal |delay|: the earlier delay, then the same polarity). Start from the smallest bound, then every delay and
  // polarity whose bound could still win.
  let rough: ScanBest = { index: 0, flipped: false, delayS: bounds.delayS[0] as number, flatnessDb: Infinity };
  const consider = (code: number): void => {
    const k = code >> 1;
    const flipped = (code & 1) === 1;
    const d = bounds.delayS[k] as number;
    const value = flatnessAt(input, d, flipped);
    const tie = Math.abs(value - rough.flatnessDb) <= 1e-9;
    const closer = Math.abs(d) < Math.abs(rough.delayS) || (Math.abs(d) === Math.abs(rough.delayS) && (k < rough.index || (k === rough.index && !flipped && rough.flipped)));
    if (value < rough.flatnessDb - 1e-9 || (tie && closer)) rough = { index: k, flipped, delayS: d, flatnessDb: value };
  };
  consider(start);
  for (let code = 0; code < 2 * steps; code++) {
    if (code !== start && (bound[code] as number) <= rough.flatnessDb + 1e-9) consider(code);
  }
  const fineSteps = 41;
  const fineStep = (2 * stepS) / (fineSteps - 1);
  const lo = Math.max(first, rough.delayS - stepS);
  const fine = scanRelativeDelay(input, lo, fineStep, fineSteps, false);
  const polished = bestOfScan(fine);
  const chosen = polished.flatnessDb <= rough.flatnessDb ? polished : rough;
  const best = { ...chosen, flatnessDb: flatnessAt(input, chosen.delayS, chosen.flipped) };
  return { coarse: { delayS: bounds.delayS, levelSameDb: bounds.levelSameDb, levelFlippedDb: bounds.levelFlippedDb }, best };
}
