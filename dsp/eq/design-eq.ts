import { eqBiquad } from '../filters/cookbook-biquads';
import { EQ_LIMITS } from '../filters/eq-sections';
import type { Biquad } from '../filters/filter-types';
import { assertSampleRate } from '../filters/sample-rate';
import { assertFiniteArray, assertInRange, assertIntegerInRange, assertSameLength, curveFrequencies } from '../internal/guards';
import { biquadLevelDb, halfAngleSines } from './biquad-level';
import { eqResidual, logShareWeights, type EqResidual } from './eq-residual';
import { eqTargetDb, type EqTarget } from './eq-target';
import { DEFAULT_NULL_DEPTH_DB, findNulls, type EqNull } from './find-nulls';
import type { PeakingEq, PeakingFitProblem } from './fit-peaking-filters';
import { greedyPeakingFilters, pruneFilters } from './greedy-peaking';
import { peakingBandHz, qForOctaves } from './peaking-band';

/** The designer's defaults (issue 16): 5 filters on 20–120 Hz, boosts up to +3 dB, cuts to −15 dB, Q 0.5–10, 48 kHz. */
export const EQ_DESIGN_DEFAULTS = {
  band: { startHz: 20, stopHz: 120 },
  maxFilters: 5,
  maxBoostDb: 3,
  maxCutDb: 15,
  q: { min: 0.5, max: 10 },
  sampleRateHz: 48000,
  nullDepthDb: DEFAULT_NULL_DEPTH_DB,
} as const;

/** The designer's limits on its options. */
export const EQ_DESIGN_LIMITS = { maxFilters: 10, maxBoostDb: 12, maxCutDb: EQ_LIMITS.gainDb.max, minNullDepthDb: 3, maxNullDepthDb: 40 } as const;

/** A filter's gain below this does nothing worth setting on a processor (common practice: about 0.5 dB), dB. */
const MIN_FILTER_GAIN_DB = 0.5;

/** Options of {@link designEq}. */
export interface EqDesignOptions {
  /** Ascending, each below the Nyquist frequency (usually log-spaced). */
  readonly frequencyHz: Float64Array | readonly number[];
  /** The response the EQ will act on, dB (whatever the output plays through already in it). */
  readonly magnitudeDb: Float64Array | readonly number[];
  /** A shape added to the target, dB (e.g. the crossover low-pass, so the EQ does not fight it). */
  readonly targetShapeDb?: Float64Array | readonly number[];
  /** Default flat. */
  readonly target?: EqTarget;
  readonly band?: { readonly startHz: number; readonly stopHz: number };
  /** 1–10, default 5. */
  readonly maxFilters?: number;
  /** Largest gain of any filter, dB (0–12, default 3). */
  readonly maxBoostDb?: number;
  /** Deepest cut, dB below 0 (0–24, default 15). */
  readonly maxCutDb?: number;
  readonly q?: { readonly min: number; readonly max: number };
  readonly sampleRateHz?: number;
  /** A dip this far below the level around it is a null (see findNulls), dB; default 8. */
  readonly nullDepthDb?: number;
  /**
   * Where the target sits, in the response's units, dB; default the median of (response − shape) over the band outside
   * the nulls. Give a design's own levelOffsetDb to measure a curve against that design's target (a check after Apply).
   */
  readonly targetLevelDb?: number;
}

/** The answer of {@link designEq}. */
export interface EqDesign {
  /** Rounded as a processor takes them: 0.1 Hz, 0.1 dB, Q to 0.01. Fewer than maxFilters, or none. */
  readonly filters: PeakingEq[];
  /** The filters as the processor's biquads at sampleRateHz (eqBiquad). */
  readonly sections: Biquad[];
  readonly frequencyHz: Float64Array;
  readonly inputDb: Float64Array;
  /** The target: its shape plus levelOffsetDb. */
  readonly targetDb: Float64Array;
  /** The EQ's own level (the filters' biquads, exact), dB. */
  readonly eqDb: Float64Array;
  readonly correctedDb: Float64Array;
  /** Where the target sits: the median of (response − shape) over the band's points outside the nulls, dB. */
  readonly levelOffsetDb: number;
  /** Before and after, from the rounded filters (see RESIDUAL_DEFINITION). */
  readonly residual: { readonly before: EqResidual; readonly after: EqResidual };
  readonly nulls: EqNull[];
  readonly band: { readonly startHz: number; readonly stopHz: number };
  readonly sampleRateHz: number;
}

const round = (v: number, decimals: number) => {
  const k = 10 ** decimals;
  const r = Math.round(v * k) / k;
  return r === 0 ? 0 : r;
};

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 === 1 ? (s[m] as number) : ((s[m - 1] as number) + (s[m] as number)) / 2;
}

/** True unless the filter is a boost whose cookbook bandwidth (peakingBandHz), widened by `margin`, reaches a null's extent. */
function boostClearOfNulls(filter: PeakingEq, nulls: readonly EqNull[], margin: number): boolean {
  if (filter.gainDb <= 0) return true;
  const { lowHz, highHz } = peakingBandHz(filter.centerHz, filter.q);
  return nulls.every((n) => lowHz / margin > n.highHz || highHz * margin < n.lowHz);
}

/** The filters rounded as a processor takes them, kept within the limits. */
function rounded(filters: readonly PeakingEq[], o: { maxBoostDb: number; maxCutDb: number; qMin: number; qMax: number }): PeakingEq[] {
  return filters.map((f) => {
    let gainDb = round(f.gainDb, 1);
    if (gainDb > o.maxBoostDb) gainDb = Math.floor(o.maxBoostDb * 10) / 10;
    if (gainDb < -o.maxCutDb) gainDb = Math.ceil(-o.maxCutDb * 10) / 10;
    let q = round(f.q, 2);
    if (q < o.qMin) q = Math.ceil(o.qMin * 100) / 100;
    if (q > o.qMax) q = Math.floor(o.qMax * 100) / 100;
    return { kind: 'peaking', centerHz: round(f.centerHz, 1), gainDb, q };
  });
}

/**
 * Designs up to `maxFilters` peaking filters that bring a response toward a target over a band, cut first:
 * 1. the target is its shape (flat or the house curve, plus targetShapeDb) placed at the median of (response − shape)
 *    over the band outside the nulls, so about half the band lies above it and is cut;
 * 2. nulls (findNulls) are left alone: no boost's cookbook bandwidth may reach one, and their extents are left out of the
 *    fit and the residual;
 * 3. greedy: the region with the largest area (dB × octaves) above the target gets a cut first, then, when nothing above
 *    is worth a filter, the largest area below gets a boost ≤ maxBoostDb; each new filter is fitted alone, then all
 *    together (Levenberg–Marquardt on the weighted RMS error in dB, refinePeakingFilters); Q stays within q.min…q.max
 *    and below what two grid steps resolve (a narrower filter could hide between the points);
 * 4. filters under 0.5 dB or whose removal costs under 0.01 dB of RMS are dropped, the rest rounded (0.1 Hz, 0.1 dB,
 *    Q 0.01) and the residual recomputed from the rounded filters' biquads; if that is not better than before, no filters.
 * The filters are the processor's biquads at sampleRateHz (the cookbook's, eqBiquad), evaluated exactly. Deterministic.
 * @example designEq({ frequencyHz: grid, magnitudeDb: response }).filters // [{ kind: 'peaking', centerHz: 43.2, gainDb: -7.9, q: 4.12 }, …]
 */
export function designEq(options: EqDesignOptions): EqDesign {
  const f = curveFrequencies(options.frequencyHz, options.magnitudeDb);
  const n = f.length;
  const input = Float64Array.from(options.magnitudeDb);
  const d = EQ_DESIGN_DEFAULTS;
  const band = options.band ?? d.band;
  const maxFilters = options.maxFilters ?? d.maxFilters;
  const maxBoostDb = options.maxBoostDb ?? d.maxBoostDb;
  const maxCutDb = options.maxCutDb ?? d.maxCutDb;
  const q = options.q ?? d.q;
  const sampleRateHz = options.sampleRateHz ?? d.sampleRateHz;
  assertSampleRate(sampleRateHz);
  assertIntegerInRange('maxFilters', maxFilters, 1, EQ_DESIGN_LIMITS.maxFilters);
  assertInRange('maxBoostDb', maxBoostDb, 0, EQ_DESIGN_LIMITS.maxBoostDb);
  assertInRange('maxCutDb', maxCutDb, 0, EQ_DESIGN_LIMITS.maxCutDb);
  assertInRange('q.min', q.min, EQ_LIMITS.q.min, EQ_LIMITS.q.max);
  assertInRange('q.max', q.max, q.min, EQ_LIMITS.q.max);
  if (!(band.stopHz > band.startHz) || !(band.startHz > 0)) throw new RangeError(`band must have 0 < startHz < stopHz (got ${band.startHz}–${band.stopHz} Hz)`);
  if ((f[n - 1] as number) >= sampleRateHz / 2) throw new RangeError(`frequencyHz[${n - 1}] must be below the Nyquist frequency, ${sampleRateHz / 2} Hz`);
  if (band.stopHz >= sampleRateHz / 2) throw new RangeError(`band.stopHz must be below the Nyquist frequency, ${sampleRateHz / 2} Hz`);
  const shape = eqTargetDb(options.target ?? { kind: 'flat' }, f);
  if (options.targetShapeDb !== undefined) {
    assertSameLength('targetShapeDb', options.targetShapeDb, n);
    assertFiniteArray('targetShapeDb', options.targetShapeDb);
    for (let i = 0; i < n; i++) shape[i] = (shape[i] as number) + (options.targetShapeDb[i] as number);
  }
  const deviation = Float64Array.from(input, (v, i) => v - (shape[i] as number));
  const nulls = findNulls({ frequencyHz: f, deviationDb: deviation, startHz: band.startHz, stopHz: band.stopHz, depthDb: options.nullDepthDb ?? d.nullDepthDb });
  let lo = 0;
  while (lo < n && (f[lo] as number) < band.startHz) lo++;
  let hi = n - 1;
  while (hi >= 0 && (f[hi] as number) > band.stopHz) hi--;
  if (hi - lo + 1 < 3) throw new RangeError(`band (${band.startHz}–${band.stopHz} Hz) must hold at least 3 points of frequencyHz`);
  const inNull = (i: number) => nulls.some((x) => (f[i] as number) >= x.lowHz && (f[i] as number) <= x.highHz);
  const keep = (i: number) => !inNull(i);
  const kept: number[] = [];
  for (let i = lo; i <= hi; i++) if (keep(i)) kept.push(deviation[i] as number);
  if (options.targetLevelDb !== undefined && !Number.isFinite(options.targetLevelDb)) throw new RangeError(`targetLevelDb must be a finite number (got ${String(options.targetLevelDb)})`);
  const levelOffsetDb = options.targetLevelDb ?? median(kept.length > 0 ? kept : Array.from(deviation.subarray(lo, hi + 1)));
  const weights = logShareWeights(f, lo, hi, keep);
  // A filter narrower than two grid steps could hide between the points: Q is held to what the grid resolves.
  let stepOctaves = 0;
  for (let i = lo; i < hi; i++) stepOctaves = Math.max(stepOctaves, Math.log2((f[i + 1] as number) / (f[i] as number)));
  const qMax = Math.max(q.min, Math.min(q.max, qForOctaves(2 * stepOctaves)));
  const bandHz = f.slice(lo, hi + 1);
  const problem: PeakingFitProblem = {
    phi: halfAngleSines(bandHz, sampleRateHz),
    baseErrorDb: Float64Array.from(deviation.subarray(lo, hi + 1), (v) => v - levelOffsetDb),
    sqrtWeight: weights.map(Math.sqrt),
    sampleRateHz,
    minHz: band.startHz,
    maxHz: band.stopHz,
    minGainDb: -maxCutDb,
    maxGainDb: maxBoostDb,
    minQ: q.min,
    maxQ: qMax,
    // A 2 % margin while searching, so rounding cannot carry a boost onto a null.
    allowed: (filter) => boostClearOfNulls(filter, nulls, 1.02),
  };
  const before = eqResidual(problem.baseErrorDb, weights);
  let found = before.maxDb < MIN_FILTER_GAIN_DB ? [] : greedyPeakingFilters(problem, bandHz, weights, maxFilters);
  found = pruneFilters(problem, found);
  let filters = rounded(found, { maxBoostDb, maxCutDb, qMin: q.min, qMax }).filter((x) => Math.abs(x.gainDb) >= MIN_FILTER_GAIN_DB && boostClearOfNulls(x, nulls, 1));
  const eqBand = new Float64Array(bandHz.length);
  const phiAll = halfAngleSines(f, sampleRateHz);
  let sections = filters.map((x) => eqBiquad(x, sampleRateHz));
  const bandPhi = phiAll.subarray(lo, hi + 1);
  for (const s of sections) biquadLevelDb(s, bandPhi, eqBand, true);
  let after = eqResidual(Float64Array.from(problem.baseErrorDb, (v, k) => v + (eqBand[k] as number)), weights);
  if (!(after.rmsDb < before.rmsDb)) {
    filters = [];
    sections = [];
    after = before;
  }
  const eqDb = new Float64Array(n);
  for (const s of sections) biquadLevelDb(s, phiAll, eqDb, true);
  return {
    filters,
    sections,
    frequencyHz: Float64Array.from(f),
    inputDb: input,
    targetDb: Float64Array.from(shape, (v) => v + levelOffsetDb),
    eqDb,
    correctedDb: Float64Array.from(input, (v, i) => v + (eqDb[i] as number)),
    levelOffsetDb,
    residual: { before, after },
    nulls,
    band: { startHz: band.startHz, stopHz: band.stopHz },
    sampleRateHz,
  };
}
