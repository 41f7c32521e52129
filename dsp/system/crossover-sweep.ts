import { blendSumResponse } from '../blend/blend-sum';
import type { FilterShape } from '../filters/filter-types';
import { assertPositive } from '../internal/guards';
import { compareAssessments, ADVICE_RULES, type AdviceComparison } from './advice-rules';
import { assessBlend, type BlendAssessment } from './blend-assessment';
import { rolloffMinus3DbHz } from './rolloff-minus3';
import { systemPaths, type SystemModel } from './system-model';
import { searchTiming } from './timing-search';

/** Options of {@link crossoverSweep}. */
export interface CrossoverSweepOptions {
  /** The system as it is now (its crossover and slopes are the present row). */
  readonly model: SystemModel;
  /** Slope pairings to try (mains high-pass / sub low-pass). */
  readonly pairings: readonly { readonly mainsFilter: FilterShape; readonly subFilter: FilterShape }[];
  /** Candidate crossover points, Hz (the product's default: 40–150 Hz). */
  readonly candidatesHz: readonly number[];
  /** Largest sub delay shift tried either way, ms (default 20). */
  readonly maxShiftMs?: number;
  /**
   * The mains' own −3 dB point, Hz, when it is known otherwise than from their roll-off (measured in the room); null:
   * unknown. Default: from model.mains.rolloff.
   */
  readonly mainsMinus3DbHz?: number | null;
}

/** One row: a crossover point and pairing at its best delay shift and polarity of the subs, on the whole system. */
export interface CrossoverSweepRow extends RankableSweepRow {
  readonly rank: number;
  /** The present setting, as it is (no change). */
  readonly present: boolean;
  readonly crossoverHz: number;
  readonly mainsFilter: FilterShape;
  readonly subFilter: FilterShape;
  /** Every sub's delay moved by this, ms (negative: the mains get the delay); 0 for the present row. */
  readonly shiftMs: number;
  /** Every sub's polarity flipped. */
  readonly flip: boolean;
  readonly model: SystemModel;
  readonly assessment: BlendAssessment;
  /** Against the present setting. */
  readonly comparison: AdviceComparison;
  /** The flatness measure at this setting, dB (assessment.flatnessDb). */
  readonly flatnessDb: number;
  /** comparison.keepsBass. */
  readonly keepsBass: boolean;
  /** Mains level (filter × roll-off) one octave below the crossover relative to two octaves above it, dB. */
  readonly mainsLowBassDb: number;
  /** The crossover lies below the mains' own −3 dB point plus half an octave (common practice: keep clear of it). */
  readonly nearMainsRolloff: boolean;
  /** Worth changing to: keeps the bass, no less flat, and ≥ 0.5 dB flatter or clear of the mains' roll-off where the present is not. */
  readonly worthIt: boolean;
}

/** Result of {@link crossoverSweep}: rows best first; the first is the present setting when nothing is worth the change. */
export interface CrossoverSweepResult {
  readonly rows: CrossoverSweepRow[];
  /** The mains' own −3 dB point from their roll-off, Hz (null: no roll-off given). */
  readonly mainsMinus3DbHz: number | null;
  /** Lowest crossover clear of the mains' roll-off (−3 dB point + half an octave), Hz. */
  readonly lowestClearHz: number | null;
}

function mainsLowBass(model: SystemModel): number {
  const fc = model.crossoverHz;
  const { sum } = blendSumResponse({ temperatureC: model.temperatureC, frequencyHz: [fc / 2, 4 * fc], paths: [systemPaths(model)[0]!] });
  return (sum.magnitudeDb[0] as number) - (sum.magnitudeDb[1] as number);
}

/** What ranking a sweep row needs (the dsp rows and the API's rows both have it). */
export interface RankableSweepRow {
  readonly present: boolean;
  readonly worthIt: boolean;
  readonly keepsBass: boolean;
  readonly nearMainsRolloff: boolean;
  readonly flatnessDb: number;
  readonly crossoverHz: number;
  readonly shiftMs: number;
  readonly flip: boolean;
}

const byFlatness = (p: RankableSweepRow, q: RankableSweepRow): number => p.flatnessDb - q.flatnessDb;

/**
 * The sweep's ranking, best first: (1) the rows worth changing to — clear of the mains' roll-off first; among those
 * within ADVICE_RULES.audibleGainDb of the flattest (no listener could tell them apart) the smallest change
 * (octaves of crossover from the present, then delay moved, then no flip); then the rest by flatness — (2) the
 * present setting, (3) every other row: keeping the bass first, clear of the mains' roll-off first, then by flatness.
 * So the first row is never worse than the present. Returns new objects with `rank` set; duplicates of the present
 * row (from merged partial answers) are dropped.
 */
export function rankSweepRows<T extends RankableSweepRow>(rows: readonly T[], presentHz: number): (T & { rank: number })[] {
  const present = rows.find((r) => r.present);
  const worth: T[] = [];
  for (const near of [false, true]) {
    const group = rows.filter((r) => !r.present && r.worthIt && r.nearMainsRolloff === near).sort(byFlatness);
    const flattest = group[0]?.flatnessDb ?? 0;
    const alike = group.filter((r) => r.flatnessDb <= flattest + ADVICE_RULES.audibleGainDb + 1e-9);
    const size = (r: T): [number, number, number] => [Math.abs(Math.log2(r.crossoverHz / presentHz)), Math.abs(r.shiftMs), Number(r.flip)];
    alike.sort((p, q) => {
      const a = size(p);
      const b = size(q);
      return a[0] - b[0] || a[1] - b[1] || a[2] - b[2] || byFlatness(p, q);
    });
    worth.push(...alike, ...group.filter((r) => !alike.includes(r)));
  }
  const others = rows
    .filter((r) => !r.present && !r.worthIt)
    .sort((p, q) => Number(!p.keepsBass) - Number(!q.keepsBass) || Number(p.nearMainsRolloff) - Number(q.nearMainsRolloff) || byFlatness(p, q));
  return [...worth, ...(present ? [present] : []), ...others].map((r, i) => ({ ...r, rank: i + 1 }));
}

/**
 * Crossover sweep on the whole system: for each candidate point and slope pairing, the System's main channel and
 * every sub with that crossover, at the best shift and polarity of all subs together (searchTiming, keeping the bass
 * of the present setting), judged by the one flatness measure. Ranked: the settings worth changing to (rankWorthRows),
 * then the present setting, then the rest (those clear of the mains' roll-off first, those losing bass last); so the
 * first row is never worse than the present.
 * @example crossoverSweep({ model, pairings: [{ mainsFilter: lr4, subFilter: lr4 }], candidatesHz: [60, 80, 100] }).rows[0]
 */
export function crossoverSweep({ model, pairings, candidatesHz, maxShiftMs = 20, ...options }: CrossoverSweepOptions): CrossoverSweepResult {
  if (!Array.isArray(candidatesHz) || candidatesHz.length === 0) throw new RangeError('candidatesHz must hold at least one frequency');
  if (candidatesHz.length > 200) throw new RangeError('candidatesHz must hold at most 200 frequencies');
  if (!Array.isArray(pairings) || pairings.length === 0) throw new RangeError('pairings must hold at least one pairing');
  if (model.subs.length === 0) throw new RangeError('model.subs must hold at least one sub');
  candidatesHz.forEach((f, k) => assertPositive(`candidatesHz[${k}]`, f));
  const mainsMinus3DbHz = options.mainsMinus3DbHz !== undefined ? options.mainsMinus3DbHz : rolloffMinus3DbHz(model.mains.rolloff);
  if (mainsMinus3DbHz !== null) assertPositive('mainsMinus3DbHz', mainsMinus3DbHz);
  const lowestClearHz = mainsMinus3DbHz === null ? null : mainsMinus3DbHz * Math.SQRT2;
  const nearRolloff = (fc: number) => lowestClearHz !== null && fc < lowestClearHz - 1e-9;
  const present = assessBlend({ temperatureC: model.temperatureC, paths: systemPaths(model), crossoverHz: model.crossoverHz });
  const presentNear = nearRolloff(model.crossoverHz);
  const presentRow: CrossoverSweepRow = {
    rank: 0,
    present: true,
    crossoverHz: model.crossoverHz,
    mainsFilter: model.mainsHighpass,
    subFilter: model.subLowpass,
    shiftMs: 0,
    flip: false,
    model,
    assessment: present,
    comparison: compareAssessments(present, present),
    flatnessDb: present.flatnessDb,
    keepsBass: true,
    mainsLowBassDb: mainsLowBass(model),
    nearMainsRolloff: presentNear,
    worthIt: false,
  };
  const rows: CrossoverSweepRow[] = [];
  for (const pairing of pairings) {
    for (const crossoverHz of candidatesHz) {
      const trial: SystemModel = { ...model, crossoverHz, mainsHighpass: pairing.mainsFilter, subLowpass: pairing.subFilter };
      const r = searchTiming(trial, model.subs.map((_, k) => k), { maxShiftMs, baseline: present, withCurve: false });
      const near = nearRolloff(crossoverHz);
      const c = r.best.comparison;
      const clearsRolloff = presentNear && !near;
      rows.push({
        rank: 0,
        present: false,
        crossoverHz,
        mainsFilter: pairing.mainsFilter,
        subFilter: pairing.subFilter,
        shiftMs: r.best.shiftMs,
        flip: r.best.flip,
        model: r.best.model,
        assessment: r.best.assessment,
        comparison: c,
        flatnessDb: r.best.assessment.flatnessDb,
        keepsBass: c.keepsBass,
        mainsLowBassDb: mainsLowBass(trial),
        nearMainsRolloff: near,
        worthIt: c.notWorse && !(near && !presentNear) && (c.worthIt || clearsRolloff),
      });
    }
  }
  return { rows: rankSweepRows([...rows, presentRow], model.crossoverHz), mainsMinus3DbHz, lowestClearHz };
}
