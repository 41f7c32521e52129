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

/** |A ± B·phasor|² at one point. */
function sumPower(input: DelayScanInput, phRe: Float64Array, phIm: Float64Array, idx: number, sign: number): number {
  const pr = phRe[idx] as number;
  const pi = phIm[idx] as number;
  const b = input.bRe[idx] as number;
  const c = input.bIm[idx] as number;
  const sr = (input.aRe[idx] as number) + sign * (b * pr - c * pi);
  const si = (input.aIm[idx] as number) + sign * (b * pi + c * pr);
  return sr * sr + si * si + TINY;
}

export function scanRelativeDelay(input: DelayScanInput, firstS: number, stepS: number, steps: number): DelayScan {
  const { omega, aRe, aIm, bRe, bIm, bandCount, refIndex, crossoverIndex, referencePower } = input;
  const n = omega.length;
  const rotRe = new Float64Array(n);
  const rotIm = new Float64Array(n);
  const phRe = new Float64Array(n);
  const phIm = new Float64Array(n);
  const sc = new Float64Array(2);
  for (let i = 0; i < n; i++) {
    const w = omega[i] as number;
    sinCos(-w * stepS, sc, 0);
    rotRe[i] = sc[1] as number;
    rotIm[i] = sc[0] as number;
    sinCos(-w * firstS, sc, 0);
    phRe[i] = sc[1] as number;
    phIm[i] = sc[0] as number;
  }
  const delayS = new Float64Array(steps);
  const flatnessSameDb = new Float64Array(steps);
  const flatnessFlippedDb = new Float64Array(steps);
  const levelSameDb = new Float64Array(steps);
  const levelFlippedDb = new Float64Array(steps);
  for (let k = 0; k < steps; k++) {
    if (k > 0 && k % 64 === 0) {
      // Re-anchor the recurrence now and then so rounding cannot drift.
      for (let i = 0; i < n; i++) {
        sinCos(-(omega[i] as number) * (firstS + k * stepS), sc, 0);
        phRe[i] = sc[1] as number;
        phIm[i] = sc[0] as number;
      }
    }
    const refSame = sumPower(input, phRe, phIm, refIndex, 1);
    const refFlipped = sumPower(input, phRe, phIm, refIndex, -1);
    let minSame = Infinity;
    let maxSame = 0;
    let minFlipped = Infinity;
    let maxFlipped = 0;
    for (let i = 0; i < bandCount; i++) {
      const pr = phRe[i] as number;
      const pi = phIm[i] as number;
      const br = (bRe[i] as number) * pr - (bIm[i] as number) * pi;
      const bi = (bRe[i] as number) * pi + (bIm[i] as number) * pr;
      const ar = aRe[i] as number;
      const ai = aIm[i] as number;
      let ps = (ar + br) * (ar + br) + (ai + bi) * (ai + bi) + TINY;
      let pf = (ar - br) * (ar - br) + (ai - bi) * (ai - bi) + TINY;
      if (referencePower) {
        const r = referencePower[i] as number;
        ps /= r;
        pf /= r;
      }
      if (ps < minSame) minSame = ps;
      if (ps > maxSame) maxSame = ps;
      if (pf < minFlipped) minFlipped = pf;
      if (pf > maxFlipped) maxFlipped = pf;
    }
    if (referencePower) {
      flatnessSameDb[k] = LN_POWER_TO_DB * Math.max(Math.log(maxSame), -Math.log(minSame));
      flatnessFlippedDb[k] = LN_POWER_TO_DB * Math.max(Math.log(maxFlipped), -Math.log(minFlipped));
    } else {
      flatnessSameDb[k] = LN_POWER_TO_DB * Math.max(Math.log(maxSame / refSame), Math.log(refSame / minSame));
      flatnessFlippedDb[k] = LN_POWER_TO_DB * Math.max(Math.log(maxFlipped / refFlipped), Math.log(refFlipped / minFlipped));
    }
    levelSameDb[k] = LN_POWER_TO_DB * Math.log(sumPower(input, phRe, phIm, crossoverIndex, 1));
    levelFlippedDb[k] = LN_POWER_TO_DB * Math.log(sumPower(input, phRe, phIm, crossoverIndex, -1));
    delayS[k] = firstS + k * stepS;
    for (let i = 0; i < n; i++) {
      const pr = phRe[i] as number;
      const pi = phIm[i] as number;
      const rr = rotRe[i] as number;
      const ri = rotIm[i] as number;
      phRe[i] = pr * rr - pi * ri;
      phIm[i] = pr * ri + pi * rr;
    }
  }
  return { delayS, flatnessSameDb, flatnessFlippedDb, levelSameDb, levelFlippedDb };
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

/** Coarse scan, then a fine scan ±1 coarse step around the best; returns the fine best and the coarse scan. */
export function searchRelativeDelay(input: DelayScanInput, maxDelayS: number, stepS: number): { coarse: DelayScan; best: ScanBest } {
  const steps = 2 * Math.round(maxDelayS / stepS) + 1;
  const first = -stepS * Math.round(maxDelayS / stepS);
  const coarse = scanRelativeDelay(input, first, stepS, steps);
  const rough = bestOfScan(coarse);
  const fineSteps = 41;
  const fineStep = (2 * stepS) / (fineSteps - 1);
  const lo = Math.max(first, rough.delayS - stepS);
  const fine = scanRelativeDelay(input, lo, fineStep, fineSteps);
  const polished = bestOfScan(fine);
  const best = polished.flatnessDb <= rough.flatnessDb ? polished : rough;
  return { coarse, best };
}
