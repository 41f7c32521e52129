import { describe, expect, it } from 'vitest';
import { alignSubs, type PathSpec } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const lp = (name: string, distanceM: number): PathSpec => ({ name, filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: -6.0206, delayMs: 0, invert: false, distanceM });
const mains: PathSpec = { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false, distanceM: 3 };

describe('alignSubs', () => {
  it('two subs at 3 m and 5 m: the nearer waits (5 − 3)/c = 5.83 ms and the pair then meets the mains at 3 m (common practice; c from Kinsler et al.)', () => {
    const r = alignSubs({ temperatureC: 20, crossoverHz: 80, mains, subs: [lp('front', 3), lp('back', 5)] });
    assertInDelta(r.subs[0]!.addDelayMs - r.subs[1]!.addDelayMs, 5.827, 0.01);
    assertInDelta(Math.min(r.subs[1]!.addDelayMs, r.mainsAddDelayMs), 0, 1e-9);
    assertInDelta(r.mainsAddDelayMs, 5.827, 0.01);
    expect(r.flatnessDb).toBeLessThan(0.05);
    expect(r.flatnessDb).toBeLessThanOrEqual(r.flatnessBeforeDb);
    for (const s of r.subs) expect(s.addDelayMs).toBeGreaterThanOrEqual(0);
  });
  it('throws RangeError naming subs when empty', () => {
    expect(() => alignSubs({ temperatureC: 20, crossoverHz: 80, mains, subs: [] })).toThrow(/subs/);
  });
});
