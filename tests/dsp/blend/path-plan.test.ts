import { describe, expect, it } from 'vitest';
import type { PathSpec } from '@/dsp';
import { compilePath } from '@/dsp/blend/path-plan';
import { assertInDelta } from '../../helpers/assert-in-delta';

const path: PathSpec = { name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, rolloff: { kind: 'sealed', cornerHz: 30, q: 0.7 }, gainDb: -6, delayMs: 2.5, invert: true, distanceM: 3.4321 };

describe('compilePath', () => {
  it('total delay = delayMs/1000 + distanceM/c: 2.5 ms + 3.4321 m at 343.21 m/s = 12.5 ms (published: Kinsler et al. 2000 for c; by hand)', () => {
    assertInDelta(compilePath(path, 343.21).delayS, 0.0125, 1e-15);
    assertInDelta(compilePath({ ...path, distanceM: undefined }, 343.21).delayS, 0.0025, 1e-15);
  });
  it('gain 10^(gainDb/20) with the sign of the polarity: −6 dB inverted → −0.5012', () => {
    assertInDelta(compilePath(path, 343).plan.gain, -Math.pow(10, -6 / 20), 1e-15);
    assertInDelta(compilePath({ ...path, invert: false, gainDb: 20 }, 343).plan.gain, 10, 1e-12);
  });
  it('packs the filter’s sections then the roll-off’s: LR4 low-pass = two BW2 sections (Linkwitz 1976) + the sealed box’s high-pass', () => {
    const c = compilePath(path, 343);
    expect(c.name).toBe('sub');
    expect(c.plan.count).toBe(3);
    // Codes: 2 = second-order low-pass, 3 = second-order high-pass; 1/Q of a BW2 section is √2 (Butterworth 1930).
    expect([c.plan.kernel[0], c.plan.kernel[3], c.plan.kernel[6]]).toEqual([2, 2, 3]);
    assertInDelta([c.plan.kernel[2] as number, c.plan.kernel[5] as number, c.plan.kernel[8] as number], [Math.SQRT2, Math.SQRT2, 1 / 0.7], 1e-12);
    assertInDelta([c.plan.kernel[1] as number, c.plan.kernel[7] as number], [1 / (2 * Math.PI * 80), 1 / (2 * Math.PI * 30)], 1e-15);
    expect(c.plan.numeratorPower).toBe(2);
  });
  it('throws RangeError naming the parameter under the given prefix', () => {
    expect(() => compilePath(null as never, 343, 'mains')).toThrow(/^mains must be an object/);
    expect(() => compilePath({ ...path, filter: null as never }, 343, 'mains')).toThrow(/^mains\.filter must be an object/);
    expect(() => compilePath({ ...path, gainDb: NaN }, 343, 'paths[1]')).toThrow(/^paths\[1\]\.gainDb/);
    expect(() => compilePath({ ...path, delayMs: -0.1 }, 343, 'sub')).toThrow(/^sub\.delayMs/);
    expect(() => compilePath({ ...path, distanceM: -1 }, 343, 'sub')).toThrow(/^sub\.distanceM/);
    expect(() => compilePath({ ...path, invert: 'yes' as never }, 343, 'sub')).toThrow(/^sub\.invert must be a boolean/);
    expect(() => compilePath({ ...path, filter: { ...path.filter, order: 3 } }, 343, 'sub')).toThrow(/^sub\.filter\.order/);
    expect(() => compilePath({ ...path, rolloff: { kind: 'sealed', cornerHz: 30, q: 0 } }, 343, 'sub')).toThrow(/^sub\.rolloff\.q/);
    expect(() => compilePath({ ...path, gainDb: NaN }, 343)).toThrow(/^path\.gainDb/);
  });
});
