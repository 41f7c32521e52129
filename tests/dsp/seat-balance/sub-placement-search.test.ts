/**
 * subPlacementSearch: N of K candidate positions. The count of combinations comes from Pascal's triangle built here
 * (common practice); the ranking is judged with optimizeSubSettings run on each combination separately, the same quick
 * budget and seed, as the reference of "every combination's quick result".
 */
import { describe, expect, it } from 'vitest';
import { combinationCount, defaultSubCandidates, optimizeSubSettings, seatBalanceEvaluator, subPlacementSearch, type SeatTransfer } from '@/dsp';
import { COARSE_GRID_HZ, ordinaryProblem, transfersOf } from './modal-problem';

/** C(n, k) from Pascal's triangle. */
function pascal(n: number, k: number): number {
  let row = [1];
  for (let i = 1; i <= n; i++) row = Array.from({ length: i + 1 }, (_, j) => (row[j - 1] ?? 0) + (row[j] ?? 0));
  return row[k] ?? 0;
}

// An invented 6.2 × 4.6 × 2.6 m room, the eight default candidates, three seats on a row.
const room = { lengthM: 6.2, widthM: 4.6, heightM: 2.6 };
const candidates = defaultSubCandidates(room).map((c) => c.positionM);
const seatsM = [1.6, 2.3, 3.0].map((x) => ({ x, y: 3.9, z: 1.1 }));
const candidateTransfers = transfersOf({ room, rt60S: 0.4, subsM: candidates, seatsM });
const base = { frequencyHz: COARSE_GRID_HZ, candidateTransfers, startHz: 20, stopHz: 120, quickEvaluations: 300, seed: 3 };

/** Every k-subset of 0…n−1, written out independently of the code under test. */
function subsets(n: number, k: number): number[][] {
  if (k === 0) return [[]];
  if (n < k) return [];
  return [...subsets(n - 1, k), ...subsets(n - 1, k - 1).map((s) => [...s, n - 1])];
}

describe('combinationCount', () => {
  it('C(8,4) = 70 and agrees with Pascal’s triangle for n ≤ 24; 0 outside 0…n', () => {
    expect(combinationCount(8, 4)).toBe(70);
    for (let n = 0; n <= 24; n++) for (let k = 0; k <= n; k++) expect(combinationCount(n, k), `C(${n},${k})`).toBe(pascal(n, k));
    expect(combinationCount(4, 5)).toBe(0);
    expect(combinationCount(4, -1)).toBe(0);
  });
});

describe('subPlacementSearch', () => {
  it('2 of 8: all 28 combinations ranked; best first, indices ascending, no worse than any combination’s quick result; the front and back wall middles win (Welti, AES 2002)', () => {
    const r = subPlacementSearch({ ...base, count: 2, keep: 4 });
    expect(r.totalCombinations).toBe(28);
    expect(r.rankedCombinations).toBe(28);
    expect(r.ranked).toHaveLength(4);
    for (let i = 1; i < r.ranked.length; i++) expect(r.ranked[i]!.after.objectiveDb).toBeGreaterThanOrEqual(r.ranked[i - 1]!.after.objectiveDb);
    for (const p of r.ranked) {
      expect(p.candidates).toHaveLength(2);
      expect([...p.candidates].sort((a, b) => a - b)).toEqual(p.candidates);
      expect(new Set(p.candidates).size).toBe(2);
      expect(p.settings).toHaveLength(2);
      expect(p.after.withinFloor).toBe(true);
    }
    expect(new Set(r.ranked.map((p) => p.candidates.join(','))).size).toBe(4);
    // The reference: every combination optimised on its own with the same quick budget and seed.
    const quick = subsets(8, 2).map((combo) => {
      const evaluator = seatBalanceEvaluator({ frequencyHz: COARSE_GRID_HZ, transfers: combo.map((c) => candidateTransfers[c] as SeatTransfer[]), startHz: 20, stopHz: 120 });
      return { combo, objectiveDb: optimizeSubSettings({ evaluator, maxEvaluations: 300, seed: 3 }).after.objectiveDb };
    });
    const bestQuick = Math.min(...quick.map((q) => q.objectiveDb));
    console.log(`placement 2 of 8: best ${r.ranked[0]!.after.objectiveDb.toFixed(3)} dB at ${r.ranked[0]!.candidates}; best quick ${bestQuick.toFixed(3)} dB; ${r.evaluated} evaluations`);
    expect(r.ranked[0]!.after.objectiveDb).toBeLessThanOrEqual(bestQuick + 1e-9);
    // Seats on the room's centre line: the two wall midpoints facing each other (candidates 1 and 5) are Welti's best pair.
    expect(r.ranked[0]!.candidates).toEqual([1, 5]);
    // The settings given are the ones measured.
    const top = r.ranked[0]!;
    const again = seatBalanceEvaluator({ frequencyHz: COARSE_GRID_HZ, transfers: top.candidates.map((c) => candidateTransfers[c] as SeatTransfer[]), startHz: 20, stopHz: 120 }).measure(top.settings);
    expect(again.objectiveDb).toBeCloseTo(top.after.objectiveDb, 12);
  });

  it('in ordinary rooms too, the best placement is no worse than any combination’s quick result (the finalists are re-optimised with a full search that starts from their quick answer)', () => {
    for (const seed of [8, 12, 2]) {
      const p = ordinaryProblem(seed, 1, 3);
      const transfers = transfersOf({ ...p, subsM: defaultSubCandidates(p.room).map((c) => c.positionM) });
      const r = subPlacementSearch({ frequencyHz: COARSE_GRID_HZ, candidateTransfers: transfers, count: 2, startHz: 20, stopHz: 120, quickEvaluations: 300, seed, keep: 3 });
      const bestQuick = Math.min(
        ...subsets(8, 2).map((combo) => {
          const evaluator = seatBalanceEvaluator({ frequencyHz: COARSE_GRID_HZ, transfers: combo.map((c) => transfers[c] as SeatTransfer[]), startHz: 20, stopHz: 120 });
          return optimizeSubSettings({ evaluator, maxEvaluations: 300, seed }).after.objectiveDb;
        }),
      );
      expect(r.ranked[0]!.after.objectiveDb, `room ${seed}`).toBeLessThanOrEqual(bestQuick + 1e-9);
    }
  });

  it('4 of 8: C(8,4) = 70 combinations; capped at 20 it ranks a seeded sample of 20 and says so; the same seed, the same answer', () => {
    const progress: [number, number][] = [];
    const capped = subPlacementSearch({ ...base, count: 4, keep: 2, maxCombinations: 20, quickEvaluations: 150, onProgress: (d, t) => progress.push([d, t]) });
    expect(capped.totalCombinations).toBe(70);
    expect(capped.rankedCombinations).toBe(20);
    expect(progress.at(-1)).toEqual([22, 22]);
    expect(progress.map(([d]) => d)).toEqual(Array.from({ length: 22 }, (_, i) => i + 1));
    for (const p of capped.ranked) {
      expect(p.candidates).toHaveLength(4);
      expect([...p.candidates].sort((a, b) => a - b)).toEqual(p.candidates);
    }
    const again = subPlacementSearch({ ...base, count: 4, keep: 2, maxCombinations: 20, quickEvaluations: 150 });
    expect(again.ranked.map((p) => p.candidates)).toEqual(capped.ranked.map((p) => p.candidates));
    expect(again.ranked.map((p) => p.settings)).toEqual(capped.ranked.map((p) => p.settings));
    const other = subPlacementSearch({ ...base, count: 4, keep: 1, maxCombinations: 69, quickEvaluations: 100, seed: 9 });
    expect(other.rankedCombinations).toBe(69);
  });

  it('one sub: every candidate alone, nothing to tune (one sub has no relative setting)', () => {
    const r = subPlacementSearch({ ...base, count: 1, keep: 8 });
    expect(r.totalCombinations).toBe(8);
    expect(r.ranked.map((p) => p.candidates[0]).sort()).toEqual([0, 1, 2, 3, 4, 5, 6, 7]);
    for (const p of r.ranked) expect(p.after.meanSpreadDb).toBeCloseTo(p.before.meanSpreadDb, 12);
  });

  it('throws RangeError naming count, maxCombinations and keep', () => {
    expect(() => subPlacementSearch({ ...base, count: 0 })).toThrow(/count/);
    expect(() => subPlacementSearch({ ...base, count: 9 })).toThrow(/count/);
    expect(() => subPlacementSearch({ ...base, count: 2, maxCombinations: 0 })).toThrow(/maxCombinations/);
    expect(() => subPlacementSearch({ ...base, count: 2, keep: 0 })).toThrow(/keep/);
  });
});
