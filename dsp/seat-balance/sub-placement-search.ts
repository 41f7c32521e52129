import { assertIntegerInRange } from '../internal/guards';
import { seededRandom } from '../internal/seeded-random';
import { optimizeSubSettings } from './optimize-sub-settings';
import { seatBalanceEvaluator, type SeatTransfer } from './seat-balance-evaluator';
import type { SeatBalanceLimits, SeatBalanceMeasures, SubSetting } from './seat-balance-types';

/** Options of {@link subPlacementSearch}. */
export interface SubPlacementSearchOptions {
  readonly frequencyHz: ArrayLike<number>;
  /** transfers[candidate][seat]: each candidate position's response at each seat. */
  readonly candidateTransfers: readonly (readonly SeatTransfer[])[];
  /** Subs to place (N of the K candidates). */
  readonly count: number;
  readonly startHz: number;
  readonly stopHz: number;
  readonly seatWeights?: readonly number[];
  readonly limits?: Partial<SeatBalanceLimits>;
  readonly seed?: number;
  /** Most combinations ranked (default 200); beyond it a seeded sample of that many is ranked, and the answer says so. */
  readonly maxCombinations?: number;
  /** How many of the best are returned, each re-optimised with a full search (default 5). */
  readonly keep?: number;
  /** Evaluations for each combination's first, quick search (default 3000). */
  readonly quickEvaluations?: number;
  /** Evaluations for each finalist's full search (default: optimizeSubSettings's own). */
  readonly finalEvaluations?: number;
  /** Called as combinations are done: (done, total) over the quick pass and the final re-optimisation. */
  readonly onProgress?: (done: number, total: number) => void;
}

/** One ranked combination. */
export interface RankedPlacement {
  /** Candidate indices, ascending. */
  readonly candidates: number[];
  /** Settings per sub, in the order of `candidates`. */
  readonly settings: SubSetting[];
  /** Every sub there at 0 ms / 0 dB / normal polarity, and with its settings. */
  readonly before: SeatBalanceMeasures;
  readonly after: SeatBalanceMeasures;
}

/** Result of {@link subPlacementSearch}. */
export interface SubPlacementSearchResult {
  /** Best first (lowest objective after optimisation). */
  readonly ranked: RankedPlacement[];
  /** Combinations of `count` of the candidates, and how many were ranked (fewer when capped). */
  readonly totalCombinations: number;
  readonly rankedCombinations: number;
  /** Candidate settings evaluated over the whole search. */
  readonly evaluated: number;
}

/** n choose k (exact for the sizes here). */
export function combinationCount(n: number, k: number): number {
  if (k < 0 || k > n) return 0;
  let c = 1;
  for (let i = 1; i <= k; i++) c = (c * (n - k + i)) / i;
  return Math.round(c);
}

/** Every k-subset of 0…n−1 in lexicographic order. */
function allCombinations(n: number, k: number): number[][] {
  const out: number[][] = [];
  const pick: number[] = [];
  const walk = (from: number): void => {
    if (pick.length === k) {
      out.push([...pick]);
      return;
    }
    for (let i = from; i <= n - (k - pick.length); i++) {
      pick.push(i);
      walk(i + 1);
      pick.pop();
    }
  };
  walk(0);
  return out;
}

/** `cap` distinct k-subsets of 0…n−1 drawn with a seeded generator, in lexicographic order. */
function sampledCombinations(n: number, k: number, cap: number, random: () => number): number[][] {
  const seen = new Map<string, number[]>();
  while (seen.size < cap) {
    const pool = Array.from({ length: n }, (_, i) => i);
    for (let i = 0; i < k; i++) {
      const j = i + Math.floor(random() * (n - i));
      [pool[i], pool[j]] = [pool[j] as number, pool[i] as number];
    }
    const combo = pool.slice(0, k).sort((a, b) => a - b);
    seen.set(combo.join(','), combo);
  }
  return [...seen.values()].sort((a, b) => {
    for (let i = 0; i < k; i++) if (a[i] !== b[i]) return (a[i] as number) - (b[i] as number);
    return 0;
  });
}

/**
 * Where to put N subs among K candidate positions: every combination of N (or a seeded sample when there are more than
 * `maxCombinations`) gets a quick optimisation of its delays, gains and polarities (optimizeSubSettings, same objective
 * and output floor); the best `keep` are re-optimised with a full search and returned best first (Welti, "Subwoofers:
 * Optimum Number and Locations", AES 2002: position and number matter as much as the settings).
 * @example subPlacementSearch({ frequencyHz, candidateTransfers, count: 2, startHz: 20, stopHz: 120 }).ranked[0].candidates
 */
export function subPlacementSearch(options: SubPlacementSearchOptions): SubPlacementSearchResult {
  const { frequencyHz, candidateTransfers, count, startHz, stopHz, seatWeights, limits, onProgress } = options;
  const k = candidateTransfers.length;
  assertIntegerInRange('count', count, 1, Math.max(1, k));
  const cap = options.maxCombinations ?? 200;
  assertIntegerInRange('maxCombinations', cap, 1, 100_000);
  const keep = options.keep ?? 5;
  assertIntegerInRange('keep', keep, 1, 100);
  const quick = options.quickEvaluations ?? 3000;
  const seed = options.seed ?? 1;
  const total = combinationCount(k, count);
  const combos = total <= cap ? allCombinations(k, count) : sampledCombinations(k, count, cap, seededRandom(seed));
  const finalists = Math.min(keep, combos.length);
  const steps = combos.length + finalists;
  let evaluated = 0;
  const evaluatorOf = (combo: readonly number[]) =>
    seatBalanceEvaluator({
      frequencyHz,
      transfers: combo.map((c) => candidateTransfers[c] as readonly SeatTransfer[]),
      startHz,
      stopHz,
      ...(seatWeights ? { seatWeights } : {}),
      ...(limits?.maxOutputLossDb !== undefined ? { maxOutputLossDb: limits.maxOutputLossDb } : {}),
    });
  const quickRanked = combos.map((combo, i) => {
    const r = optimizeSubSettings({ evaluator: evaluatorOf(combo), ...(limits ? { limits } : {}), seed, maxEvaluations: quick });
    evaluated += r.evaluated;
    onProgress?.(i + 1, steps);
    return { combo, objectiveDb: r.after.objectiveDb, settings: r.settings };
  });
  quickRanked.sort((a, b) => a.objectiveDb - b.objectiveDb || 0);
  const ranked: RankedPlacement[] = quickRanked.slice(0, finalists).map(({ combo, settings }, i) => {
    // The quick answer is a start, so the full search never leaves a combination worse than its quick result.
    const r = optimizeSubSettings({ evaluator: evaluatorOf(combo), ...(limits ? { limits } : {}), seed, starts: [settings], ...(options.finalEvaluations ? { maxEvaluations: options.finalEvaluations } : {}) });
    evaluated += r.evaluated;
    onProgress?.(combos.length + i + 1, steps);
    return { candidates: [...combo], settings: r.settings, before: r.before, after: r.after };
  });
  ranked.sort((a, b) => a.after.objectiveDb - b.after.objectiveDb);
  return { ranked, totalCombinations: total, rankedCombinations: combos.length, evaluated };
}
