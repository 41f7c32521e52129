import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { withoutCommonDelayMs } from '@/dsp';

/**
 * Oracle: the definition worked by hand — the smallest delay becomes 0 ms, every other keeps its distance from it, and
 * a delay shared by all sources is what is removed (processor convention, common practice).
 */
describe('withoutCommonDelayMs: processor delays are positive, the common delay taken out', () => {
  it('[2.5, 1, 4] ms → [1.5, 0, 3] ms (1 ms shared by all)', () => {
    expect(withoutCommonDelayMs([2.5, 1, 4])).toEqual([1.5, 0, 3]);
  });

  it('a negative delay lifts every other one: [0, −2] ms → [2, 0] ms', () => {
    expect(withoutCommonDelayMs([0, -2])).toEqual([2, 0]);
  });

  it('already starting at 0 ms: unchanged, and a single source is 0 ms', () => {
    expect(withoutCommonDelayMs([0, 3.2, 0.75])).toEqual([0, 3.2, 0.75]);
    expect(withoutCommonDelayMs([7])).toEqual([0]);
  });

  it('no sources: no delays', () => {
    expect(withoutCommonDelayMs([])).toEqual([]);
  });

  it('never mutates its input', () => {
    const input = [3, 5];
    withoutCommonDelayMs(input);
    expect(input).toEqual([3, 5]);
  });

  it('refuses a non-finite delay, naming it', () => {
    expect(() => withoutCommonDelayMs([1, Number.NaN])).toThrow(/delaysMs\[1\]/);
    expect(() => withoutCommonDelayMs([Infinity])).toThrow(RangeError);
  });

  it('property: the smallest is 0, none is negative, every difference is kept (whole hundredths of a ms)', () => {
    const hundredths = fc.integer({ min: -10_000, max: 10_000 }).map((v) => v / 100);
    fc.assert(
      fc.property(fc.array(hundredths, { minLength: 1, maxLength: 9 }), (delays) => {
        const out = withoutCommonDelayMs(delays);
        expect(out).toHaveLength(delays.length);
        expect(Math.min(...out)).toBe(0);
        out.forEach((d, i) => {
          expect(d).toBeGreaterThanOrEqual(0);
          // Differences to the first source are kept (within floating-point rounding of a subtraction).
          expect(d - (out[0] as number)).toBeCloseTo((delays[i] as number) - (delays[0] as number), 9);
        });
      }),
    );
  });
});
