import { compilePath } from '../blend/path-plan';
import { speedOfSoundMps } from '../air/speed-of-sound';
import { RAD_TO_DEG, wrapDeg } from '../internal/angles';
import { assertPositive } from '../internal/guards';
import { alignmentGrid, pathComplex } from './alignment-grid';
import { flatnessAt, scanRelativeDelay, searchRelativeDelay, type DelayLevels, type DelayScanInput } from './delay-scan';
import type { AlignmentResult, AlignSubToMainsOptions } from './timing-types';

/** Validated maxDelayMs / stepMs. */
export function delaySearchLimits(maxDelayMs = 20, stepMs = 0.05): { maxDelayS: number; stepS: number } {
  assertPositive('maxDelayMs', maxDelayMs);
  assertPositive('stepMs', stepMs);
  if (maxDelayMs > 1000) throw new RangeError(`maxDelayMs must be at most 1000 (got ${maxDelayMs})`);
  if (maxDelayMs / stepMs > 100_000) throw new RangeError('stepMs is too small for maxDelayMs (more than 100000 steps)');
  return { maxDelayS: maxDelayMs / 1000, stepS: stepMs / 1000 };
}

/**
 * Turns a scan input (A = mains, B = sub with its current polarity) into the Timing recommendation.
 * `subInverted` is the sub's current polarity setting.
 */
export function alignmentFromScanInput(input: DelayScanInput, subInverted: boolean, maxDelayS: number, stepS: number): AlignmentResult {
  const { coarse, best } = searchRelativeDelay(input, maxDelayS, stepS);
  const x = input.crossoverIndex;
  const phaseOf = (re: number, im: number): number => Math.atan2(im, re) * RAD_TO_DEG;
  const phaseDifferenceDeg = wrapDeg(phaseOf(input.aRe[x] as number, input.aIm[x] as number) - phaseOf(input.bRe[x] as number, input.bIm[x] as number));
  const w = input.omega[x] as number;
  const phaseDifferenceAfterDeg = wrapDeg(phaseDifferenceDeg + w * best.delayS * RAD_TO_DEG + (best.flipped ? 180 : 0));
  const after = scanRelativeDelay(input, best.delayS, stepS, 1);
  const crossoverLevelDb = (best.flipped ? after.levelFlippedDb[0] : after.levelSameDb[0]) as number;
  const windowMs = timingWindowMs(coarse, best.flipped, best.delayS, crossoverLevelDb);
  const invertSub = best.flipped ? !subInverted : subInverted;
  const delayMs = Float64Array.from(coarse.delayS, (d) => d * 1000);
  const normalDb = subInverted ? coarse.levelFlippedDb : coarse.levelSameDb;
  const invertedDb = subInverted ? coarse.levelSameDb : coarse.levelFlippedDb;
  const relativeDelayMs = best.delayS * 1000;
  return {
    addTo: relativeDelayMs >= 0 ? 'sub' : 'mains',
    delayMs: Math.abs(relativeDelayMs),
    relativeDelayMs,
    invertSub,
    flipPolarity: best.flipped,
    phaseDifferenceDeg,
    phaseDifferenceAfterDeg,
    flatnessBeforeDb: flatnessAt(input, 0, false),
    flatnessDb: best.flatnessDb,
    crossoverLevelDb,
    windowMs,
    levelVersusDelay: { delayMs, normalDb, invertedDb },
  };
}

function timingWindowMs(scan: DelayLevels, flipped: boolean, bestDelayS: number, levelDb: number): [number, number] {
  const level = flipped ? scan.levelFlippedDb : scan.levelSameDb;
  const d = scan.delayS;
  const n = d.length;
  let k = 0;
  for (let i = 0; i < n; i++) if (Math.abs((d[i] as number) - bestDelayS) < Math.abs((d[k] as number) - bestDelayS)) k = i;
  let lo = k;
  let hi = k;
  while (lo > 0 && Math.abs((level[lo - 1] as number) - levelDb) <= 1) lo--;
  while (hi < n - 1 && Math.abs((level[hi + 1] as number) - levelDb) <= 1) hi++;
  return [Math.min(d[lo] as number, bestDelayS) * 1000, Math.max(d[hi] as number, bestDelayS) * 1000];
}

/**
 * Timing: the extra delay (added to the sub or to the mains, never negative) and sub polarity that make the blend
 * flattest across ±1 octave of the crossover, with the Timing window and the level at the crossover versus delay.
 * Arrival times (distanceM / c) and the filters' own phase are included (Linkwitz 1976; common practice).
 * @example alignSubToMains({ temperatureC: 20, crossoverHz: 80, mains, sub }).delayMs
 */
export function alignSubToMains(options: AlignSubToMainsOptions): AlignmentResult {
  assertPositive('crossoverHz', options.crossoverHz);
  const speed = speedOfSoundMps(options.temperatureC);
  const { maxDelayS, stepS } = delaySearchLimits(options.maxDelayMs, options.stepMs);
  const mains = compilePath(options.mains, speed, 'mains');
  const sub = compilePath(options.sub, speed, 'sub');
  const grid = alignmentGrid(options.crossoverHz);
  const a = pathComplex(mains, grid.omega);
  const b = pathComplex(sub, grid.omega);
  const input: DelayScanInput = {
    omega: grid.omega,
    aRe: a.re,
    aIm: a.im,
    bRe: b.re,
    bIm: b.im,
    bandCount: grid.bandCount,
    refIndex: grid.refIndex,
    crossoverIndex: grid.crossoverIndex,
  };
  return alignmentFromScanInput(input, options.sub.invert, maxDelayS, stepS);
}
