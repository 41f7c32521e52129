import { describe, expect, it } from 'vitest';
import { crossoverSweep } from '@/dsp';

describe('crossoverSweep', () => {
  const base = {
    temperatureC: 20,
    mainsRolloff: { kind: 'sealed' as const, cornerHz: 60, q: 0.707 },
    subRolloff: { kind: 'none' as const },
    mainsFilter: { family: 'linkwitz-riley' as const, order: 4 },
    subFilter: { family: 'linkwitz-riley' as const, order: 4 },
  };
  it('ranks candidates by flatness, best first, with ranks 1..n', () => {
    const { rows } = crossoverSweep({ ...base, candidatesHz: [40, 60, 80, 100, 120, 150] });
    expect(rows.map((r) => r.rank)).toEqual([1, 2, 3, 4, 5, 6]);
    for (let i = 1; i < rows.length; i++) expect(rows[i]!.score).toBeGreaterThanOrEqual(rows[i - 1]!.score);
    for (const r of rows) expect(r.bestSubDelayMs * r.bestMainsDelayMs).toBe(0);
  });
  it('crossing far above a sealed main’s 60 Hz corner leaves less low bass in the mains (common practice)', () => {
    const { rows } = crossoverSweep({ ...base, candidatesHz: [60, 120] });
    const at = (hz: number) => rows.find((r) => r.crossoverHz === hz)!;
    expect(at(120).mainsLowBassDb).toBeLessThan(-20);
    expect(at(60).flatnessDb).toBeGreaterThan(at(120).flatnessDb);
  });
  it('with no roll-offs an LR4 pair is flat at any candidate with no delay (published: Linkwitz 1976)', () => {
    const { rows } = crossoverSweep({ ...base, mainsRolloff: { kind: 'none' }, candidatesHz: [50, 90] });
    for (const r of rows) {
      expect(r.flatnessDb).toBeLessThan(1e-6);
      expect(r.bestSubDelayMs + r.bestMainsDelayMs).toBeLessThan(1e-9);
      expect(r.invertSub).toBe(false);
    }
  });
  it('throws RangeError naming candidatesHz[i]', () => {
    expect(() => crossoverSweep({ ...base, candidatesHz: [80, -1] })).toThrow(/candidatesHz\[1\]/);
    expect(() => crossoverSweep({ ...base, candidatesHz: [] })).toThrow(/candidatesHz/);
  });
});
