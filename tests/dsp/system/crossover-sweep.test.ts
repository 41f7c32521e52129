import { describe, expect, it } from 'vitest';
import { ADVICE_RULES, assessBlend, crossoverSweep, rankSweepRows, systemPaths, type RankableSweepRow, type SystemModel } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const lr4 = { family: 'linkwitz-riley' as const, order: 4 };
const bw2 = { family: 'butterworth' as const, order: 2 };
const model = (over: Partial<SystemModel> = {}): SystemModel => ({
  temperatureC: 20,
  crossoverHz: 80,
  mainsHighpass: lr4,
  subLowpass: lr4,
  mains: { name: 'L', distanceM: 3, delayMs: 0, gainDb: 0, invert: false },
  subs: [{ name: 'Sub', distanceM: 3.8, delayMs: 0, gainDb: 0, invert: false }],
  ...over,
});
const assess = (m: SystemModel) => assessBlend({ temperatureC: m.temperatureC, paths: systemPaths(m), crossoverHz: m.crossoverHz });

describe('crossoverSweep', () => {
  it('one row per candidate and pairing plus the present one; every row is its setting applied and assessed, the first never worse than the present', () => {
    const m = model();
    const r = crossoverSweep({ model: m, pairings: [{ mainsFilter: lr4, subFilter: lr4 }, { mainsFilter: bw2, subFilter: lr4 }], candidatesHz: [60, 80, 100] });
    expect(r.rows.length).toBe(7);
    expect(r.rows.map((row) => row.rank)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    const present = r.rows.filter((row) => row.present);
    expect(present.length).toBe(1);
    expect(present[0]!.model).toBe(m);
    expect([present[0]!.shiftMs, present[0]!.flip, present[0]!.worthIt]).toEqual([0, false, false]);
    for (const row of r.rows) {
      expect(row.model.crossoverHz).toBe(row.crossoverHz);
      expect(row.model.mainsHighpass).toEqual(row.mainsFilter);
      expect(row.model.subLowpass).toEqual(row.subFilter);
      assertInDelta(row.flatnessDb, assess(row.model).flatnessDb, 1e-12);
    }
    const first = r.rows[0]!;
    expect(first.flatnessDb).toBeLessThanOrEqual(present[0]!.flatnessDb + 1e-9);
    expect(first.keepsBass).toBe(true);
    // The sub is 0.8 m farther (2.33 ms): at 80 Hz LR4 the top row puts it right, ≥ 0.5 dB flatter (common practice).
    expect(first.present).toBe(false);
    expect(first.flatnessDb).toBeLessThanOrEqual(present[0]!.flatnessDb - ADVICE_RULES.audibleGainDb);
  });
  it('mains level an octave below the crossover against two octaves above: LR4 −24.6 dB, BW2 −12.3 dB (by hand from |H|², Butterworth 1930)', () => {
    // BW2 high-pass |H|² = x⁴/(1 + x⁴): x = 1/2 → 1/17, x = 4 → 256/257; LR4 is that squared (Linkwitz 1976).
    const bw2Db = 10 * Math.log10(1 / 17) - 10 * Math.log10(256 / 257);
    const r = crossoverSweep({ model: model(), pairings: [{ mainsFilter: lr4, subFilter: lr4 }, { mainsFilter: bw2, subFilter: lr4 }], candidatesHz: [80] });
    const row = (f: typeof lr4 | typeof bw2) => r.rows.find((x) => !x.present && x.mainsFilter === f)!;
    assertInDelta(row(bw2).mainsLowBassDb, bw2Db, 1e-9);
    assertInDelta(row(lr4).mainsLowBassDb, 2 * bw2Db, 1e-9);
    assertInDelta(bw2Db, -12.29, 0.01);
  });
  it('mains with a vented 50 Hz roll-off: −3 dB at 50.03 Hz, clear of it from 70.75 Hz (+ half an octave, common practice)', () => {
    const m = model({ mains: { name: 'L', distanceM: 3, delayMs: 0, gainDb: 0, invert: false, rolloff: { kind: 'vented', cornerHz: 50 } } });
    const r = crossoverSweep({ model: m, pairings: [{ mainsFilter: lr4, subFilter: lr4 }], candidatesHz: [60, 80] });
    // B4: x⁸/(1 + x⁸) = 10^(−0.3) at x = 1.000593 (Thiele 1971, by hand).
    assertInDelta(r.mainsMinus3DbHz as number, 50.0296, 0.05);
    assertInDelta(r.lowestClearHz as number, (r.mainsMinus3DbHz as number) * Math.SQRT2, 1e-9);
    expect(r.rows.find((x) => x.crossoverHz === 60)!.nearMainsRolloff).toBe(true);
    expect(r.rows.filter((x) => x.crossoverHz === 80).every((x) => !x.nearMainsRolloff)).toBe(true);
    expect(crossoverSweep({ model: model(), pairings: [{ mainsFilter: lr4, subFilter: lr4 }], candidatesHz: [80] }).mainsMinus3DbHz).toBeNull();
  });
  it('throws RangeError naming candidatesHz, pairings and model.subs', () => {
    const pairings = [{ mainsFilter: lr4, subFilter: lr4 }];
    expect(() => crossoverSweep({ model: model(), pairings, candidatesHz: [] })).toThrow(/candidatesHz/);
    expect(() => crossoverSweep({ model: model(), pairings, candidatesHz: Array(201).fill(80) })).toThrow(/candidatesHz/);
    expect(() => crossoverSweep({ model: model(), pairings, candidatesHz: [80, -1] })).toThrow(/candidatesHz\[1\]/);
    expect(() => crossoverSweep({ model: model(), pairings: [], candidatesHz: [80] })).toThrow(/pairings/);
    expect(() => crossoverSweep({ model: model({ subs: [] }), pairings, candidatesHz: [80] })).toThrow(/model\.subs/);
  });
});

describe('rankSweepRows (rows written by hand)', () => {
  const row = (over: Partial<RankableSweepRow> & { id: string }): RankableSweepRow & { id: string } => ({
    present: false,
    worthIt: false,
    keepsBass: true,
    nearMainsRolloff: false,
    flatnessDb: 3,
    crossoverHz: 80,
    shiftMs: 0,
    flip: false,
    ...over,
  });
  it('worth-it rows first (clear of the roll-off first; within 0.5 dB of the flattest the smallest change), then the present, then the rest', () => {
    const rows = [
      row({ id: 'rest-loses-bass', keepsBass: false, flatnessDb: 0.1 }),
      row({ id: 'rest-near', nearMainsRolloff: true, flatnessDb: 1 }),
      row({ id: 'rest', flatnessDb: 2.5 }),
      row({ id: 'present', present: true, flatnessDb: 3 }),
      row({ id: 'worth-near', worthIt: true, nearMainsRolloff: true, flatnessDb: 0.2 }),
      row({ id: 'worth-flattest', worthIt: true, flatnessDb: 0.5, crossoverHz: 120, shiftMs: 2 }),
      row({ id: 'worth-small-change', worthIt: true, flatnessDb: 0.9, crossoverHz: 80, shiftMs: 1.5 }),
      row({ id: 'worth-smaller-change', worthIt: true, flatnessDb: 0.95, crossoverHz: 80, shiftMs: 0.5, flip: true }),
      row({ id: 'worth-far', worthIt: true, flatnessDb: 1.2, crossoverHz: 80, shiftMs: 0 }),
    ];
    const ranked = rankSweepRows(rows, 80);
    // 0.5 + 0.5 dB: the three within reach of the flattest go smallest change first (crossover moved, then delay, then flip).
    expect(ranked.map((r) => r.id)).toEqual([
      'worth-smaller-change',
      'worth-small-change',
      'worth-flattest',
      'worth-far',
      'worth-near',
      'present',
      'rest',
      'rest-near',
      'rest-loses-bass',
    ]);
    expect(ranked.map((r) => r.rank)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9]);
    expect(rows[0]).not.toHaveProperty('rank');
  });
  it('with nothing worth changing to, the present row is first; a second copy of it (merged partial answers) is dropped', () => {
    const ranked = rankSweepRows([row({ id: 'a', flatnessDb: 1 }), row({ id: 'present', present: true, flatnessDb: 3 })], 80);
    expect(ranked[0]!.id).toBe('present');
    const merged = rankSweepRows([row({ id: 'present', present: true }), row({ id: 'a', flatnessDb: 1 }), row({ id: 'present', present: true })], 80);
    expect(merged.map((r) => r.id)).toEqual(['present', 'a']);
  });
});
