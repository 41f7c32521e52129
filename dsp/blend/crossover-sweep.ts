import { speedOfSoundMps } from '../air/speed-of-sound';
import type { FilterShape, RolloffChain } from '../filters/filter-types';
import { LN_POWER_TO_DB } from '../internal/angles';
import { assertFinite, assertPositive } from '../internal/guards';
import { delaySearchLimits } from '../timing/align-sub-to-mains';
import { alignmentGrid, pathComplex } from '../timing/alignment-grid';
import { searchRelativeDelay } from '../timing/delay-scan';
import { compilePath } from './path-plan';

/** Options of {@link crossoverSweep}. */
export interface CrossoverSweepOptions {
  readonly temperatureC: number;
  /** The mains' natural roll-off(s). */
  readonly mainsRolloff: RolloffChain;
  /** The sub's natural roll-off(s), e.g. [low roll-off, upper roll-off]. */
  readonly subRolloff: RolloffChain;
  readonly mainsFilter: FilterShape;
  readonly subFilter: FilterShape;
  /** Candidate crossover points, Hz (the product's default: 40–150 Hz). */
  readonly candidatesHz: readonly number[];
  readonly delaySearch?: { readonly maxDelayMs?: number; readonly stepMs?: number };
  readonly mainsGainDb?: number;
  readonly subGainDb?: number;
}

/** One ranked candidate. */
export interface CrossoverSweepRow {
  readonly rank: number;
  readonly crossoverHz: number;
  /** Best extra sub delay, ms ≥ 0 (0 when the mains get the delay). */
  readonly bestSubDelayMs: number;
  readonly bestMainsDelayMs: number;
  readonly invertSub: boolean;
  /** Largest |sum − reference| within ±1 octave, dB (reference: the sum two octaves above the crossover). */
  readonly flatnessDb: number;
  /** Lowest level within ±1 octave relative to the reference, dB, and where. */
  readonly deepestDipDb: number;
  readonly dipHz: number;
  /** Mains level (filter × roll-off) one octave below the crossover relative to their level two octaves above it, dB. */
  readonly mainsLowBassDb: number;
  /** Ranking score, lower is better: flatnessDb (ties broken by the shallower dip). */
  readonly score: number;
}

/** Result of {@link crossoverSweep}: rows sorted best first. */
export interface CrossoverSweepResult {
  readonly rows: CrossoverSweepRow[];
}

/**
 * Crossover sweep: for each candidate point, the mains high-pass and sub low-pass at that corner with their natural
 * roll-offs, the best relative delay and polarity (flattest ±1 octave), the dip and how much low bass the mains
 * still carry; ranked by flatness.
 * @example crossoverSweep({ temperatureC: 20, mainsRolloff: { kind: 'sealed', cornerHz: 60, q: 0.707 }, subRolloff: { kind: 'none' }, mainsFilter: { family: 'linkwitz-riley', order: 4 }, subFilter: { family: 'linkwitz-riley', order: 4 }, candidatesHz: [60, 80, 100] }).rows[0].crossoverHz
 */
export function crossoverSweep(options: CrossoverSweepOptions): CrossoverSweepResult {
  const speed = speedOfSoundMps(options.temperatureC);
  const { maxDelayS, stepS } = delaySearchLimits(options.delaySearch?.maxDelayMs, options.delaySearch?.stepMs);
  if (!Array.isArray(options.candidatesHz) || options.candidatesHz.length === 0) throw new RangeError('candidatesHz must hold at least one frequency');
  if (options.candidatesHz.length > 200) throw new RangeError('candidatesHz must hold at most 200 frequencies');
  const mainsGainDb = options.mainsGainDb ?? 0;
  const subGainDb = options.subGainDb ?? 0;
  assertFinite('mainsGainDb', mainsGainDb);
  assertFinite('subGainDb', subGainDb);
  const rows = options.candidatesHz.map((crossoverHz, k) => {
    assertPositive(`candidatesHz[${k}]`, crossoverHz);
    const mains = compilePath(
      { name: 'mains', filter: { ...options.mainsFilter, response: 'highpass', cornerHz: crossoverHz }, rolloff: options.mainsRolloff, gainDb: mainsGainDb, delayMs: 0, invert: false },
      speed,
      'mains',
    );
    const sub = compilePath(
      { name: 'sub', filter: { ...options.subFilter, response: 'lowpass', cornerHz: crossoverHz }, rolloff: options.subRolloff, gainDb: subGainDb, delayMs: 0, invert: false },
      speed,
      'sub',
    );
    const grid = alignmentGrid(crossoverHz);
    const a = pathComplex(mains, grid.omega);
    const b = pathComplex(sub, grid.omega);
    const input = { omega: grid.omega, aRe: a.re, aIm: a.im, bRe: b.re, bIm: b.im, bandCount: grid.bandCount, refIndex: grid.refIndex, crossoverIndex: grid.crossoverIndex };
    const { best } = searchRelativeDelay(input, maxDelayS, stepS, false);
    // Dip at the chosen setting.
    const sign = best.flipped ? -1 : 1;
    const power = (i: number): number => {
      const w = grid.omega[i] as number;
      const c = Math.cos(w * best.delayS);
      const s = -Math.sin(w * best.delayS);
      const br = (b.re[i] as number) * c - (b.im[i] as number) * s;
      const bi = (b.re[i] as number) * s + (b.im[i] as number) * c;
      const sr = (a.re[i] as number) + sign * br;
      const si = (a.im[i] as number) + sign * bi;
      return sr * sr + si * si + 1e-300;
    };
    const ref = power(grid.refIndex);
    let deepestDipDb = Infinity;
    let dipHz = crossoverHz;
    for (let i = 0; i < grid.bandCount; i++) {
      const d = LN_POWER_TO_DB * Math.log(power(i) / ref);
      if (d < deepestDipDb) {
        deepestDipDb = d;
        dipHz = grid.frequencyHz[i] as number;
      }
    }
    const mainsPower = (i: number): number => (a.re[i] as number) ** 2 + (a.im[i] as number) ** 2 + 1e-300;
    const mainsLowBassDb = LN_POWER_TO_DB * Math.log(mainsPower(0) / mainsPower(grid.refIndex));
    return {
      rank: 0,
      crossoverHz,
      bestSubDelayMs: Math.max(0, best.delayS) * 1000,
      bestMainsDelayMs: Math.max(0, -best.delayS) * 1000,
      invertSub: best.flipped,
      flatnessDb: best.flatnessDb,
      deepestDipDb,
      dipHz,
      mainsLowBassDb,
      score: best.flatnessDb,
    };
  });
  rows.sort((p, q) => p.score - q.score || q.deepestDipDb - p.deepestDipDb || p.crossoverHz - q.crossoverHz);
  return { rows: rows.map((r, i) => ({ ...r, rank: i + 1 })) };
}
