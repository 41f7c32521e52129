import { speedOfSoundMps } from '../air/speed-of-sound';
import { compilePath } from '../blend/path-plan';
import { MAX_PATHS } from '../blend/blend-types';
import { assertPositive } from '../internal/guards';
import { alignmentGrid, pathComplex } from './alignment-grid';
import { delaySearchLimits } from './align-sub-to-mains';
import { flatnessAt, searchRelativeDelay, type DelayScanInput } from './delay-scan';
import type { AlignSubsOptions, AlignSubsResult } from './timing-types';

/**
 * Several subs: each sub is first aligned to the first one (delay and polarity that keep their sum closest to the
 * fully coherent |A| + |B| over fc/2…2fc), then the aligned group to the mains as in alignSubToMains; all delays are
 * then shifted so none is negative (common practice).
 * @example alignSubs({ temperatureC: 20, crossoverHz: 80, mains, subs: [front, back] }).subs[1].addDelayMs
 */
export function alignSubs(options: AlignSubsOptions): AlignSubsResult {
  assertPositive('crossoverHz', options.crossoverHz);
  if (!Array.isArray(options.subs) || options.subs.length === 0) throw new RangeError('subs must hold at least one sub');
  if (options.subs.length > MAX_PATHS - 1) throw new RangeError(`subs must hold at most ${MAX_PATHS - 1} subs`);
  const speed = speedOfSoundMps(options.temperatureC);
  const { maxDelayS, stepS } = delaySearchLimits(options.maxDelayMs, options.stepMs);
  const grid = alignmentGrid(options.crossoverHz);
  const n = grid.omega.length;
  const mains = pathComplex(compilePath(options.mains, speed, 'mains'), grid.omega);
  const subs = options.subs.map((s, k) => pathComplex(compilePath(s, speed, `subs[${k}]`), grid.omega));
  const first = subs[0] as { re: Float64Array; im: Float64Array };
  const groupRe = Float64Array.from(first.re);
  const groupIm = Float64Array.from(first.im);
  const relDelayS: number[] = [0];
  const flipped: boolean[] = [false];
  for (let k = 1; k < subs.length; k++) {
    const b = subs[k] as { re: Float64Array; im: Float64Array };
    const referencePower = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const sum = Math.hypot(first.re[i] as number, first.im[i] as number) + Math.hypot(b.re[i] as number, b.im[i] as number);
      referencePower[i] = sum * sum + 1e-300;
    }
    const input: DelayScanInput = { omega: grid.omega, aRe: first.re, aIm: first.im, bRe: b.re, bIm: b.im, bandCount: grid.bandCount, refIndex: grid.refIndex, crossoverIndex: grid.crossoverIndex, referencePower };
    const { best } = searchRelativeDelay(input, maxDelayS, stepS, false);
    relDelayS.push(best.delayS);
    flipped.push(best.flipped);
    const sign = best.flipped ? -1 : 1;
    for (let i = 0; i < n; i++) {
      const w = grid.omega[i] as number;
      const c = Math.cos(w * best.delayS);
      const s = -Math.sin(w * best.delayS);
      groupRe[i] = (groupRe[i] as number) + sign * ((b.re[i] as number) * c - (b.im[i] as number) * s);
      groupIm[i] = (groupIm[i] as number) + sign * ((b.re[i] as number) * s + (b.im[i] as number) * c);
    }
  }
  const toMains: DelayScanInput = { omega: grid.omega, aRe: mains.re, aIm: mains.im, bRe: groupRe, bIm: groupIm, bandCount: grid.bandCount, refIndex: grid.refIndex, crossoverIndex: grid.crossoverIndex };
  const { best } = searchRelativeDelay(toMains, maxDelayS, stepS, false);
  // Before: the subs as they are, summed with the mains.
  const beforeRe = new Float64Array(n);
  const beforeIm = new Float64Array(n);
  for (const s of subs) for (let i = 0; i < n; i++) {
    beforeRe[i] = (beforeRe[i] as number) + (s.re[i] as number);
    beforeIm[i] = (beforeIm[i] as number) + (s.im[i] as number);
  }
  const extras = relDelayS.map((d) => d + best.delayS);
  const shift = Math.max(0, -Math.min(...extras));
  const result = options.subs.map((s, k) => {
    const addDelayMs = ((extras[k] as number) + shift) * 1000;
    const invert = (flipped[k] as boolean) !== best.flipped ? !s.invert : s.invert;
    return { name: String(s.name), addDelayMs, delayMs: s.delayMs + addDelayMs, invert };
  });
  return { subs: result, mainsAddDelayMs: shift * 1000, flatnessBeforeDb: flatnessAt({ ...toMains, bRe: beforeRe, bIm: beforeIm }, 0, false), flatnessDb: best.flatnessDb };
}
