import { describe, expect, it } from 'vitest';
import { ADVICE_RULES, assessBlend, compareAssessments, retimeSources, searchTiming, smallestChange, systemPaths, type AssessedMove, type BlendAssessment, type SystemModel } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const lr4 = { family: 'linkwitz-riley' as const, order: 4 };
/** An LR4 main at 3 m and one sub at `subDistanceM`, no processor delay (invented example). */
const system = (subDistanceM: number, invert = false): SystemModel => ({
  temperatureC: 20,
  crossoverHz: 80,
  mainsHighpass: lr4,
  subLowpass: lr4,
  mains: { name: 'L', distanceM: 3, delayMs: 0, gainDb: 0, invert: false },
  subs: [{ name: 'Sub', distanceM: subDistanceM, delayMs: 0, gainDb: 0, invert }],
});
const assess = (m: SystemModel) => assessBlend({ temperatureC: m.temperatureC, paths: systemPaths(m), crossoverHz: m.crossoverHz });

describe('searchTiming', () => {
  it('a sub 1 m farther than the mains: the mains get its 2.914 ms (1 m at 343.21 m/s, Kinsler et al. 2000), then the LR4 pair sums flat (Linkwitz 1976)', () => {
    const r = searchTiming(system(4), [0]);
    assertInDelta(r.best.shiftMs, -2.91, 0.011);
    expect(r.best.flip).toBe(false);
    // Applied: the sub's shift becomes delay on the mains, the smallest delay is 0.
    assertInDelta(r.best.model.mains.delayMs, -r.best.shiftMs, 1e-12);
    expect(r.best.model.subs[0]!.delayMs).toBe(0);
    expect(r.best.assessment.flatnessDb).toBeLessThan(0.05);
    expect(r.present.flatnessDb).toBeGreaterThan(1);
    assertInDelta(r.flattest.shiftMs, -2.91, 0.011);
  });
  it('every candidate is its move applied to the model and assessed again, flattest first, and keeps the bass', () => {
    const r = searchTiming(system(4.6), [0], { maxShiftMs: 10 });
    expect(r.candidates.length).toBeGreaterThan(1);
    for (let k = 0; k < r.candidates.length; k++) {
      const c = r.candidates[k]!;
      // Sub 1.6 m farther: a shift s makes the sub's delay s and the mains' 0, or the mains' −s and the sub's 0.
      expect([c.model.mains.delayMs, c.model.subs[0]!.delayMs]).toEqual(c.shiftMs < 0 ? [-c.shiftMs, 0] : [0, c.shiftMs]);
      expect(c.model.subs[0]!.invert).toBe(c.flip);
      assertInDelta(c.assessment.flatnessDb, assess(c.model).flatnessDb, 1e-12);
      expect(c.comparison.keepsBass).toBe(true);
      expect(Math.abs(c.shiftMs)).toBeLessThanOrEqual(10);
      expect(Math.round(c.shiftMs * 100) / 100).toBe(c.shiftMs);
      if (k > 0) expect(c.assessment.flatnessDb).toBeGreaterThanOrEqual(r.candidates[k - 1]!.assessment.flatnessDb);
    }
    expect(r.candidates.some((c) => c.shiftMs === 0 && !c.flip)).toBe(true);
  });
  it('one sub of two moved against the main and the other: as flat as a brute-force search over every 0.05 ms and both polarities (the definition)', () => {
    const model: SystemModel = {
      ...system(3),
      subs: [
        { name: 'Sub A', distanceM: 3.5, delayMs: 1, gainDb: -4, invert: false },
        { name: 'Sub B', distanceM: 5, delayMs: 0, gainDb: -5, invert: true },
      ],
    };
    const r = searchTiming(model, [1], { maxShiftMs: 10 });
    // Brute force: apply every shift of Sub B (Sub A stays) and assess the whole system; keep what keeps the bass.
    let brute = Infinity;
    for (let k = -200; k <= 200; k++) {
      for (const flip of [false, true]) {
        const a = assess(retimeSources(model, [{ shiftMs: 0, flip: false }, { shiftMs: k * 0.05, flip }]));
        if (compareAssessments(r.present, a).keepsBass) brute = Math.min(brute, a.flatnessDb);
      }
    }
    expect(r.candidates[0]!.assessment.flatnessDb).toBeLessThanOrEqual(brute + 0.01);
    expect(r.best.assessment.flatnessDb).toBeLessThanOrEqual(brute + ADVICE_RULES.nearEqualDb + 0.01);
    expect(r.best.model.subs[0]!.invert).toBe(false);
  });
  it('an aligned pair keeps its setting: no shift, no flip, the present assessment', () => {
    const r = searchTiming(system(3), [0]);
    expect([r.best.shiftMs, r.best.flip]).toEqual([0, false]);
    assertInDelta(r.best.assessment.flatnessDb, 0, 1e-9);
  });
  it('the curve of flatness against shift reads the same measure as assessBlend: at 0 ms the present setting, flipped the sub inverted', () => {
    const r = searchTiming(system(4), [0], { maxShiftMs: 5, stepMs: 0.1 });
    const curve = r.curve!;
    expect(curve.shiftMs.length).toBe(101);
    assertInDelta(curve.shiftMs[0] as number, -5, 1e-12);
    assertInDelta(curve.shiftMs[100] as number, 5, 1e-9);
    const zero = 50;
    assertInDelta(curve.normalDb[zero] as number, assess(system(4)).flatnessDb, 1e-6);
    assertInDelta(curve.flippedDb[zero] as number, assess(system(4, true)).flatnessDb, 1e-6);
    expect(searchTiming(system(4), [0], { withCurve: false }).curve).toBeNull();
  });
  it('throws RangeError naming maxShiftMs, stepMs and moved', () => {
    expect(() => searchTiming(system(4), [0], { maxShiftMs: 0 })).toThrow(/maxShiftMs/);
    expect(() => searchTiming(system(4), [0], { maxShiftMs: 1001 })).toThrow(/maxShiftMs/);
    expect(() => searchTiming(system(4), [0], { stepMs: 0 })).toThrow(/stepMs/);
    expect(() => searchTiming(system(4), [])).toThrow(/moved/);
    expect(() => searchTiming(system(4), [1])).toThrow(/moved/);
    expect(() => searchTiming(system(4), [0.5])).toThrow(/moved/);
  });
});

describe('smallestChange', () => {
  const move = (shiftMs: number, flip: boolean, flatnessDb: number): AssessedMove =>
    ({ shiftMs, flip, assessment: { flatnessDb } as BlendAssessment, model: system(3), comparison: {} as AssessedMove['comparison'] }) as AssessedMove;
  it('among the moves no less flat than the ceiling: the least delay moved, then no flip, then the flatter', () => {
    const moves = [move(-3, false, 0.1), move(1.2, true, 0.4), move(-1.2, false, 0.5), move(1.2, false, 0.45), move(0.5, false, 2)];
    expect(smallestChange(moves, 0.5)).toBe(moves[3]);
    expect(smallestChange(moves, 0.42)).toBe(moves[1]);
    expect(smallestChange(moves, 0.2)).toBe(moves[0]);
    expect(smallestChange(moves, 0.05)).toBeNull();
    // The same |delay| and polarity: the flatter, in either order.
    expect(smallestChange([move(2, false, 1), move(-2, false, 0.8)], 1)?.assessment.flatnessDb).toBe(0.8);
    expect(smallestChange([move(-2, false, 0.8), move(2, false, 1)], 1)?.assessment.flatnessDb).toBe(0.8);
  });
});
