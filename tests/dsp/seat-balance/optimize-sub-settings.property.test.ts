/**
 * Properties of optimizeSubSettings over random rooms, subs and seats (modal model, modal-problem.ts): the answer keeps
 * its limits and the output floor, is never worse than doing nothing or than a start that keeps the limits, does not
 * depend on the order the subs are listed in, and is repeatable. The measuring stick is the evaluator, whose own
 * oracle tests are in seat-balance-evaluator.test.ts. Budgets are small where the property does not need a good answer.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { optimizeSubSettings, SEAT_BALANCE_RESOLUTION, type SeatBalanceLimits, type SubSetting } from '@/dsp';
import { evaluatorOf, modalProblemArb, type ModalProblem, type Point } from './modal-problem';

type Limits = Omit<SeatBalanceLimits, 'maxOutputLossDb'>;

const limitsArb: fc.Arbitrary<Limits> = fc.record({
  maxDelayMs: fc.double({ min: 0, max: 20, noNaN: true }),
  minGainDb: fc.double({ min: -12, max: 0, noNaN: true }),
  maxGainDb: fc.double({ min: 0, max: 6, noNaN: true }),
  allowInvert: fc.boolean(),
});
const floorArb = fc.double({ min: 0, max: 6, noNaN: true });
const problemArb = modalProblemArb({ min: 2, max: 4 }, { min: 2, max: 5 });

/** A whole number of steps, to 1e-9 of a step. */
const onStep = (value: number, step: number) => Math.abs(value / step - Math.round(value / step)) < 1e-6;

function timed<T>(label: string, run: () => T): T {
  const t0 = performance.now();
  const out = run();
  console.log(`${label}: ${((performance.now() - t0) / 1000).toFixed(2)} s`);
  return out;
}

describe('optimizeSubSettings: limits, floor and “never worse” over random rooms (fast-check)', () => {
  it('keeps 0…maxDelayMs, minGainDb…maxGainDb, no inversion when not allowed, 0.01 ms / 0.1 dB steps; the floor holds; never worse than neutral', () => {
    timed('limits property (25 runs)', () =>
      fc.assert(
        fc.property(problemArb, limitsArb, floorArb, fc.integer({ min: 1, max: 1000 }), (p, limits, floorDb, seed) => {
          const evaluator = evaluatorOf(p, { maxOutputLossDb: floorDb });
          const r = optimizeSubSettings({ evaluator, limits, seed, maxEvaluations: 1500 });
          const what = JSON.stringify({ limits, floorDb, settings: r.settings, source: r.source });
          expect(r.settings, what).toHaveLength(p.subsM.length);
          for (const s of r.settings) {
            expect(s.delayMs, what).toBeGreaterThanOrEqual(0);
            expect(s.delayMs, what).toBeLessThanOrEqual(limits.maxDelayMs);
            expect(s.gainDb, what).toBeGreaterThanOrEqual(limits.minGainDb);
            expect(s.gainDb, what).toBeLessThanOrEqual(limits.maxGainDb);
            if (!limits.allowInvert) expect(s.invert, what).toBe(false);
            expect(onStep(s.delayMs, SEAT_BALANCE_RESOLUTION.delayMs), `${what}: delay on 0.01 ms`).toBe(true);
            expect(onStep(s.gainDb, SEAT_BALANCE_RESOLUTION.gainDb), `${what}: gain on 0.1 dB`).toBe(true);
          }
          // The answer is measured as given: re-measuring its settings gives its `after`.
          const again = evaluator.measure(r.settings);
          expect(again.meanSpreadDb, what).toBeCloseTo(r.after.meanSpreadDb, 12);
          expect(r.after.meanSpreadDb, what).toBeLessThanOrEqual(r.before.meanSpreadDb + 1e-12);
          expect(r.after.meanLevelDb, what).toBeGreaterThanOrEqual(-floorDb - 1e-9);
          expect(r.before.meanLevelDb).toBe(0);
        }),
        { numRuns: 25, seed: 1501 },
      ),
    );
  });

  it('with one seat, or with every seat at the same place, the spread is 0 before and after', () => {
    const sameSeatArb = problemArb.chain((p) => fc.constantFrom<ModalProblem>({ ...p, seatsM: [p.seatsM[0]!] }, { ...p, seatsM: [p.seatsM[0]!, p.seatsM[0]!, p.seatsM[0]!] }));
    timed('one seat / identical seats (15 runs)', () =>
      fc.assert(
        fc.property(sameSeatArb, (p) => {
          const r = optimizeSubSettings({ evaluator: evaluatorOf(p), maxEvaluations: 300 });
          expect(r.before.meanSpreadDb).toBe(0);
          expect(r.after.meanSpreadDb).toBe(0);
          expect(r.after.maxSpreadDb).toBe(0);
        }),
        { numRuns: 15, seed: 1502 },
      ),
    );
  });

  it('never worse than a start that keeps the limits and the floor', () => {
    const startArb = (n: number, limits: Limits) =>
      fc.array(
        fc.record({ delayMs: fc.double({ min: 0, max: limits.maxDelayMs, noNaN: true }), gainDb: fc.double({ min: limits.minGainDb, max: limits.maxGainDb, noNaN: true }), invert: limits.allowInvert ? fc.boolean() : fc.constant(false) }),
        { minLength: n, maxLength: n },
      );
    const caseArb = fc.tuple(problemArb, limitsArb).chain(([p, limits]) => fc.tuple(fc.constant(p), fc.constant(limits), startArb(p.subsM.length, limits)));
    let compared = 0;
    timed('starts property (20 runs)', () =>
      fc.assert(
        fc.property(caseArb, ([p, limits, start]) => {
          const evaluator = evaluatorOf(p, { maxOutputLossDb: 6 });
          // A budget of 2 leaves the search almost nothing: the start has to be compared for the property to hold.
          const r = optimizeSubSettings({ evaluator, limits, maxEvaluations: 2, starts: [start] });
          const s = evaluator.measure(start);
          if (s.withinFloor) {
            compared++;
            expect(r.after.objectiveDb, JSON.stringify({ start, source: r.source })).toBeLessThanOrEqual(s.objectiveDb + 1e-9);
          }
          expect(r.after.withinFloor).toBe(true);
        }),
        { numRuns: 20, seed: 1503 },
      ),
    );
    expect(compared, 'starts within the floor').toBeGreaterThan(10);
  });

  it('never worse than a better start off the processor’s steps (a searched answer refined here by a finer descent), which it keeps as it is', () => {
    let keptStart = 0;
    timed('refined starts property (15 runs)', () =>
      fc.assert(
        fc.property(problemArb, (p) => {
          const evaluator = evaluatorOf(p, { maxOutputLossDb: 6 });
          const searched = optimizeSubSettings({ evaluator, maxEvaluations: 800 }).settings;
          const start = refine(evaluator, searched);
          const m = evaluator.measure(start);
          fc.pre(m.objectiveDb < evaluator.measure(searched).objectiveDb - 1e-9);
          const r = optimizeSubSettings({ evaluator, maxEvaluations: 2, starts: [start] });
          if (r.source === 'start') keptStart++;
          expect(r.after.objectiveDb, JSON.stringify({ start, got: r.settings })).toBeLessThanOrEqual(m.objectiveDb + 1e-9);
        }),
        { numRuns: 15, seed: 1506 },
      ),
    );
    // Rounding a refined optimum to the steps costs a little: the answer is the start itself.
    expect(keptStart, 'answers that kept the start').toBeGreaterThan(0);
  });
});

/** A coordinate descent of each sub's delay and gain in steps of 0.008 ms / 0.08 dB down to 1/64 of that, within the default limits and the floor. */
function refine(evaluator: ReturnType<typeof evaluatorOf>, settings: SubSetting[]): SubSetting[] {
  let best = settings.map((s) => ({ ...s }));
  let bestDb = evaluator.measure(best).objectiveDb;
  for (let scale = 1; scale >= 1 / 64; scale /= 2) {
    for (let k = 0; k < best.length; k++) {
      for (const [key, step, lo, hi] of [['delayMs', 0.008, 0, 20], ['gainDb', 0.08, -12, 6]] as const) {
        for (const sign of [1, -1]) {
          const trial = best.map((s, j) => (j === k ? { ...s, [key]: Math.min(hi, Math.max(lo, s[key] + sign * step * scale)) } : s));
          const m = evaluator.measure(trial);
          if (m.withinFloor && m.objectiveDb < bestDb) {
            best = trial;
            bestDb = m.objectiveDb;
          }
        }
      }
    }
  }
  return best;
}

describe('optimizeSubSettings: order and seed', () => {
  it('swapping two subs swaps their settings (distinct positions), and the measures stay the same', () => {
    const apartM = (a: Point, b: Point) => Math.hypot(a.x - b.x, a.y - b.y, a.z - b.z);
    const distinctArb = problemArb.filter((p) => p.subsM.every((a, i) => p.subsM.every((b, j) => i === j || apartM(a, b) > 0.3)));
    const caseArb = distinctArb.chain((p) => fc.tuple(fc.constant(p), fc.integer({ min: 0, max: p.subsM.length - 1 }), fc.integer({ min: 0, max: p.subsM.length - 1 })));
    timed('swap property (15 runs)', () =>
      fc.assert(
        fc.property(caseArb, ([p, a, b]) => {
          fc.pre(a !== b);
          const swapped = [...p.subsM];
          [swapped[a], swapped[b]] = [swapped[b]!, swapped[a]!];
          const one = optimizeSubSettings({ evaluator: evaluatorOf(p), maxEvaluations: 1200, seed: 4 });
          const two = optimizeSubSettings({ evaluator: evaluatorOf({ ...p, subsM: swapped }), maxEvaluations: 1200, seed: 4 });
          const expected: SubSetting[] = [...one.settings];
          [expected[a], expected[b]] = [expected[b]!, expected[a]!];
          expect(two.settings).toEqual(expected);
          expect(two.after.meanSpreadDb).toBeCloseTo(one.after.meanSpreadDb, 9);
        }),
        { numRuns: 15, seed: 1504 },
      ),
    );
  });

  it('the same seed gives the same answer; progress is reported up to the budget', () => {
    timed('seed property (15 runs)', () =>
      fc.assert(
        fc.property(problemArb, fc.integer({ min: 0, max: 2 ** 31 - 1 }), (p, seed) => {
          const calls: number[][] = [];
          const first = optimizeSubSettings({ evaluator: evaluatorOf(p), seed, maxEvaluations: 1000, onProgress: (done, total) => calls.push([done, total]) });
          const second = optimizeSubSettings({ evaluator: evaluatorOf(p), seed, maxEvaluations: 1000 });
          expect(second).toEqual(first);
          expect(calls.length).toBeGreaterThan(0);
          expect(calls.every(([done, total]) => total === 1000 && done! <= 1000 + 64)).toBe(true);
          expect(first.evaluated).toBeLessThanOrEqual(1000 + 64);
        }),
        { numRuns: 15, seed: 1505 },
      ),
    );
  });

  it('refuses bad limits and budgets with a RangeError naming them', () => {
    const evaluator = evaluatorOf(fc.sample(problemArb, { numRuns: 1, seed: 2 })[0]!);
    expect(() => optimizeSubSettings({ evaluator, limits: { maxDelayMs: -1 } })).toThrow(/limits\.maxDelayMs/);
    expect(() => optimizeSubSettings({ evaluator, limits: { minGainDb: 1 } })).toThrow(/minGainDb/);
    expect(() => optimizeSubSettings({ evaluator, limits: { maxGainDb: NaN } })).toThrow(/limits\.maxGainDb/);
    expect(() => optimizeSubSettings({ evaluator, maxEvaluations: 0 })).toThrow(/maxEvaluations/);
    expect(() => optimizeSubSettings({ evaluator, maxEvaluations: 1.5 })).toThrow(RangeError);
  });
});
