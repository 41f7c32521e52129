import { fitCost, peakingLevelsDb, refinePeakingFilters, type PeakingEq, type PeakingFitProblem } from './fit-peaking-filters';
import { qForOctaves } from './peaking-band';

/** Filters below this gain are dropped, dB (the same floor as the designer's MIN_FILTER_GAIN_DB). */
const MIN_GAIN_DB = 0.5;
/** A new filter must lower the weighted RMS error by at least this much to be kept, dB. */
const MIN_IMPROVEMENT_DB = 0.01;
/** How many regions of each sign are tried for each new filter. */
const TRIES_PER_SIGN = 3;

/** A run of adjacent points on one side of the target. */
interface Region {
  /** +1 above the target (a cut), −1 below (a boost). */
  readonly sign: 1 | -1;
  readonly from: number;
  readonly to: number;
  /** Where |error| is largest. */
  readonly peak: number;
  /** Σ weight·|error|, dB × (share of the band). */
  readonly area: number;
}

/** The runs of same-signed error among the kept points (weight > 0), each with its area, largest first within each sign. */
function regions(errorDb: Float64Array, weights: Float64Array): Region[] {
  const out: Region[] = [];
  let k = 0;
  const m = errorDb.length;
  while (k < m) {
    const e = errorDb[k] as number;
    if ((weights[k] as number) <= 0 || e === 0) {
      k++;
      continue;
    }
    const sign = e > 0 ? 1 : -1;
    let to = k;
    let peak = k;
    let area = 0;
    while (to < m && (weights[to] as number) > 0 && (errorDb[to] as number) * sign > 0) {
      area += (weights[to] as number) * Math.abs(errorDb[to] as number);
      if (Math.abs(errorDb[to] as number) > Math.abs(errorDb[peak] as number)) peak = to;
      to++;
    }
    out.push({ sign, from: k, to: to - 1, peak, area });
    k = to;
  }
  const worth = out.filter((r) => Math.abs(errorDb[r.peak] as number) >= MIN_GAIN_DB);
  const bySize = (a: Region, b: Region) => b.area - a.area || a.from - b.from;
  return [...worth.filter((r) => r.sign > 0).sort(bySize).slice(0, TRIES_PER_SIGN), ...worth.filter((r) => r.sign < 0).sort(bySize).slice(0, TRIES_PER_SIGN)];
}

/**
 * A first guess for a region: centre at its largest error, gain the opposite of that error (within the box), Q from
 * the width where the error is above half its peak (the cookbook's bandwidth, qForOctaves). A boost that may not be
 * used is narrowed (Q × 1.25 up to maxQ) until it may; null if it never may.
 */
function firstGuess(problem: PeakingFitProblem, bandHz: Float64Array, errorDb: Float64Array, r: Region): PeakingEq | null {
  const peakDb = errorDb[r.peak] as number;
  let a = r.peak;
  let b = r.peak;
  while (a > r.from && Math.abs(errorDb[a - 1] as number) >= Math.abs(peakDb) / 2) a--;
  while (b < r.to && Math.abs(errorDb[b + 1] as number) >= Math.abs(peakDb) / 2) b++;
  // One grid step more than the points' span, so a one-point peak gets a finite width.
  const step = Math.log2((bandHz[Math.min(b + 1, bandHz.length - 1)] as number) / (bandHz[Math.max(a - 1, 0)] as number)) / Math.max(2, b - a + 2);
  const octaves = Math.log2((bandHz[b] as number) / (bandHz[a] as number)) + step;
  const gainDb = Math.min(problem.maxGainDb, Math.max(problem.minGainDb, -peakDb));
  if (Math.abs(gainDb) < MIN_GAIN_DB) return null;
  let q = Math.min(problem.maxQ, Math.max(problem.minQ, qForOctaves(octaves)));
  const centerHz = bandHz[r.peak] as number;
  for (;;) {
    const guess: PeakingEq = { kind: 'peaking', centerHz, gainDb, q };
    if (gainDb < 0 || problem.allowed(guess)) return guess;
    if (q >= problem.maxQ) return null;
    q = Math.min(problem.maxQ, q * 1.25);
  }
}

/** The error (response + filters − target) at the band's points. */
function errorAfter(problem: PeakingFitProblem, filters: readonly PeakingEq[]): Float64Array {
  const e = Float64Array.from(problem.baseErrorDb);
  const level = new Float64Array(e.length);
  for (const f of filters) {
    peakingLevelsDb(problem, f, level);
    for (let i = 0; i < e.length; i++) e[i] = (e[i] as number) + (level[i] as number);
  }
  return e;
}

const rms = (problem: PeakingFitProblem, filters: readonly PeakingEq[]) => Math.sqrt(fitCost(problem, filters));

/**
 * Cut-first greedy placement with joint refinement: for each new filter, the regions above the target (largest area
 * first), then those below, are tried in turn; the first whose filter, fitted alone, lowers the RMS error by
 * MIN_IMPROVEMENT_DB is refitted with all the others and kept. Stops at maxFilters or when no region helps.
 */
export function greedyPeakingFilters(problem: PeakingFitProblem, bandHz: Float64Array, weights: Float64Array, maxFilters: number): PeakingEq[] {
  let filters: PeakingEq[] = [];
  let current = rms(problem, filters);
  while (filters.length < maxFilters) {
    const errorDb = errorAfter(problem, filters);
    let added = false;
    for (const r of regions(errorDb, weights)) {
      const guess = firstGuess(problem, bandHz, errorDb, r);
      if (!guess) continue;
      // Fitted alone first; only a filter that helps alone is refitted with all the others.
      const alone = refinePeakingFilters(problem, [...filters, guess], [filters.length], 30);
      if (rms(problem, alone) > current - MIN_IMPROVEMENT_DB) continue;
      const together = refinePeakingFilters(problem, alone, alone.map((_, i) => i), 40);
      const next = rms(problem, together);
      if (next <= current - MIN_IMPROVEMENT_DB) {
        filters = together;
        current = next;
        added = true;
        break;
      }
    }
    if (!added) break;
  }
  return filters;
}

/**
 * Drops filters under MIN_GAIN_DB and any whose removal raises the RMS error by less than MIN_IMPROVEMENT_DB, then refits
 * the rest together;
 * repeated until nothing more goes (at most three rounds).
 */
export function pruneFilters(problem: PeakingFitProblem, start: readonly PeakingEq[]): PeakingEq[] {
  let filters = [...start];
  for (let round = 0; round < 3 && filters.length > 0; round++) {
    let kept = filters.filter((f) => Math.abs(f.gainDb) >= MIN_GAIN_DB);
    const order = kept.map((f, i) => ({ f, i })).sort((a, b) => Math.abs(a.f.gainDb) - Math.abs(b.f.gainDb));
    for (const { f } of order) {
      const without = kept.filter((x) => x !== f);
      if (rms(problem, without) <= rms(problem, kept) + MIN_IMPROVEMENT_DB) kept = without;
    }
    if (kept.length === filters.length) break;
    filters = refinePeakingFilters(problem, kept, kept.map((_, i) => i), 40);
  }
  return filters;
}
