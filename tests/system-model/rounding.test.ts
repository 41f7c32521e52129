import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { roundAllTo, roundAllToSignificant, roundTo, roundToSignificant } from '@/lib/system-model/rounding';

/** Oracle: decimal arithmetic done by hand; the properties follow from the definition of rounding to a step. */
describe('roundTo: decimals', () => {
  it('roundTo(-3.01234, 2) → −3.01, roundTo(12.3456, 1) → 12.3, roundTo(2.5, 0) → 3', () => {
    expect(roundTo(-3.01234, 2)).toBe(-3.01);
    expect(roundTo(12.3456, 1)).toBe(12.3);
    expect(roundTo(2.5, 0)).toBe(3);
  });

  it('keeps integers, −300 dB silence and non-finite values exactly', () => {
    expect(roundTo(-300, 3)).toBe(-300);
    expect(roundTo(42, 2)).toBe(42);
    expect(roundTo(Infinity, 2)).toBe(Infinity);
    expect(roundTo(-Infinity, 2)).toBe(-Infinity);
    expect(roundTo(Number.NaN, 2)).toBeNaN();
  });

  it('never answers −0: a tiny negative value rounds to plain 0', () => {
    expect(Object.is(roundTo(-0.004, 2), 0)).toBe(true);
    expect(Object.is(roundTo(-0, 3), 0)).toBe(true);
  });

  it('property: within half a step of the value, and rounding twice changes nothing', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: 0, max: 6 }), (v, d) => {
        const r = roundTo(v, d);
        expect(Math.abs(r - v)).toBeLessThanOrEqual(0.5 * 10 ** -d + 1e-9 * Math.max(1, Math.abs(v)));
        expect(roundTo(r, d)).toBe(r);
      }),
    );
  });
});

describe('roundToSignificant: significant digits', () => {
  it('26.8134 to 5 → 26.813; 0.000123456 to 3 → 0.000123; 123456 to 3 → 123000', () => {
    expect(roundToSignificant(26.8134, 5)).toBe(26.813);
    expect(roundToSignificant(0.000123456, 3)).toBe(0.000123);
    expect(roundToSignificant(123456, 3)).toBe(123000);
    expect(roundToSignificant(-343.2146, 4)).toBe(-343.2);
  });

  it('keeps non-finite values and 0', () => {
    expect(roundToSignificant(Infinity, 4)).toBe(Infinity);
    expect(roundToSignificant(Number.NaN, 4)).toBeNaN();
    expect(Object.is(roundToSignificant(-0, 4), 0)).toBe(true);
  });
});

describe('roundAllTo and roundAllToSignificant: every entry, plain arrays out', () => {
  it('a Float64Array [1.234, −0.0001, 5] to 2 decimals → [1.23, 0, 5]', () => {
    const out = roundAllTo(new Float64Array([1.234, -0.0001, 5]), 2);
    expect(Array.isArray(out)).toBe(true);
    expect(out).toEqual([1.23, 0, 5]);
    expect(Object.is(out[1], 0)).toBe(true);
  });

  it('[26.8134, 0.0123456] to 3 significant digits → [26.8, 0.0123]', () => {
    expect(roundAllToSignificant([26.8134, 0.0123456], 3)).toEqual([26.8, 0.0123]);
  });
});

describe('roundAllTo: the same numbers as roundTo, entry by entry', () => {
  // Oracle: roundTo itself (hand-checked above), applied one value at a time; the array form only computes the
  // scale once and fills a plain array, so every entry, −0 and the non-finite ones included, must be identical.
  it('property: a Float64Array or a plain array, any decimals 0–6, including −0, NaN and ±Infinity', () => {
    const value = fc.oneof(fc.double({ min: -1e7, max: 1e7 }), fc.constantFrom(-0, Number.NaN, Infinity, -Infinity, 0.0005, -0.0005, 2.5, -2.5));
    fc.assert(
      fc.property(fc.array(value, { maxLength: 40 }), fc.integer({ min: 0, max: 6 }), fc.boolean(), (values, d, typed) => {
        const out = roundAllTo(typed ? Float64Array.from(values) : values, d);
        expect(out).toHaveLength(values.length);
        out.forEach((r, i) => expect(Object.is(r, roundTo(values[i] as number, d))).toBe(true));
      }),
    );
  });
});
