import { describe, expect, it } from 'vitest';
import { ADVICE_RULES, assessBlend, groupTimingAdvice, subTimingAdvice, systemPaths, type SystemModel } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

// How the advice is proven on random Systems is in advice-proven.test.ts; here, small Systems whose answer is known:
// 1 m of air is 2.914 ms at 20 °C (published: Kinsler et al. 2000), an aligned LR4 pair sums flat (published:
// Linkwitz 1976), and a change under 0.5 dB is not worth making (common practice).

const lr4 = { family: 'linkwitz-riley' as const, order: 4 };
const system = (subs: SystemModel['subs']): SystemModel => ({
  temperatureC: 20,
  crossoverHz: 80,
  mainsHighpass: lr4,
  subLowpass: lr4,
  mains: { name: 'L', distanceM: 3, delayMs: 0, gainDb: 0, invert: false },
  subs,
});
const sub = (name: string, distanceM: number, gainDb = 0) => ({ name, distanceM, delayMs: 0, gainDb, invert: false });
const assess = (m: SystemModel) => assessBlend({ temperatureC: m.temperatureC, paths: systemPaths(m), crossoverHz: m.crossoverHz });

describe('subTimingAdvice', () => {
  it('a sub 1 m farther: delay the mains by 2.91 ms, no flip; applied, the system is what the advice says and ≥ 0.5 dB flatter', () => {
    const model = system([sub('Sub', 4)]);
    const a = subTimingAdvice(model, 0);
    expect(a.keep).toBe(false);
    expect(a.subIndex).toBe(0);
    assertInDelta(a.shiftMs, -2.91, 0.011);
    expect(a.flip).toBe(false);
    assertInDelta(a.model.mains.delayMs, 2.91, 0.011);
    assertInDelta(assess(a.model).flatnessDb, a.after.flatnessDb, 1e-12);
    expect(a.after.flatnessDb).toBeLessThanOrEqual(a.present.flatnessDb - ADVICE_RULES.audibleGainDb);
    expect(a.comparison.worthIt).toBe(true);
    expect(a.windowMs[0]).toBeLessThanOrEqual(a.shiftMs);
    expect(a.windowMs[1]).toBeGreaterThanOrEqual(a.shiftMs);
  });
  it('the Timing window holds the shifts whose flatness stays within 1 dB of the advice’s, contiguous around it', () => {
    const a = subTimingAdvice(system([sub('Sub', 4)]), 0);
    const { shiftMs, normalDb } = a.curve;
    shiftMs.forEach((s, k) => {
      if (s >= a.windowMs[0] && s <= a.windowMs[1]) expect(normalDb[k] as number, `${s} ms`).toBeLessThanOrEqual(a.after.flatnessDb + 1 + 1e-9);
    });
    // Just outside each end the flatness is more than 1 dB off (or the scan ends there).
    const lo = shiftMs.findIndex((s) => s >= a.windowMs[0]);
    const hi = shiftMs.findIndex((s) => s > a.windowMs[1]);
    if (lo > 0) expect(normalDb[lo - 1] as number).toBeGreaterThan(a.after.flatnessDb + 1);
    if (hi > 0) expect(normalDb[hi] as number).toBeGreaterThan(a.after.flatnessDb + 1);
    expect(a.windowMs[1] - a.windowMs[0]).toBeGreaterThan(0.5);
  });
  it('an aligned sub, or one 5 cm off (0.15 ms, under 0.5 dB to gain), is kept as it is', () => {
    for (const distanceM of [3, 3.05]) {
      const model = system([sub('Sub', distanceM)]);
      const a = subTimingAdvice(model, 0);
      expect(a.keep, `${distanceM} m`).toBe(true);
      expect(a.model).toBe(model);
      expect([a.shiftMs, a.flip]).toEqual([0, false]);
      expect(a.after).toBe(a.present);
      expect(a.present.flatnessDb - a.flattestDb).toBeLessThan(ADVICE_RULES.audibleGainDb);
    }
  });
});

describe('groupTimingAdvice', () => {
  it('two half-level subs, one 1.5 m farther than the other: the advice, applied, is ≥ 0.5 dB flatter and keeps the bass', () => {
    // Each sub at −6.02 dB: aligned, the two add up to the level of one (published: +20·log10 2 in phase).
    const model = system([sub('Sub A', 3, -6.0206), sub('Sub B', 4.5, -6.0206)]);
    const a = groupTimingAdvice(model);
    expect(a.keep).toBe(false);
    assertInDelta(assess(a.model).flatnessDb, a.after.flatnessDb, 1e-12);
    expect(a.after.flatnessDb).toBeLessThanOrEqual(a.present.flatnessDb - ADVICE_RULES.audibleGainDb);
    expect(a.comparison.keepsBass).toBe(true);
    expect(a.flattestDb).toBeLessThanOrEqual(a.after.flatnessDb + 1e-9);
    // Sub B, the later one, gets no more delay than Sub A: the advice moves them toward each other (1.5 m = 4.37 ms).
    expect(a.model.subs[0]!.delayMs - a.model.subs[1]!.delayMs).toBeGreaterThan(2);
  });
  it('an aligned system is kept as it is', () => {
    const model = system([sub('Sub A', 3, -6.0206), sub('Sub B', 3, -6.0206)]);
    const a = groupTimingAdvice(model);
    expect(a.keep).toBe(true);
    expect(a.model).toBe(model);
    expect(a.after).toBe(a.present);
  });
});
