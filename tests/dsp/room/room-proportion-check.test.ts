import { describe, expect, it } from 'vitest';
import { roomProportionCheck } from '@/dsp';

describe('roomProportionCheck (published: ITU-R BS.1116-3, 2015)', () => {
  it('6.4 × 4.9 × 2.7 passes', () => {
    expect(roomProportionCheck({ lengthM: 6.4, widthM: 4.9, heightM: 2.7 }).passes).toBe(true);
  });
  it('5 × 5 × 2.5 fails the first criterion (1.1·w/h ≤ l/h … 4.5·w/h − 4)', () => {
    const r = roomProportionCheck({ lengthM: 5, widthM: 5, heightM: 2.5 });
    expect(r.passes).toBe(false);
    expect(r.criteria[0]!.passes).toBe(false);
  });
  it('8 × 4 × 2.4 fails l/h < 3', () => {
    const r = roomProportionCheck({ lengthM: 8, widthM: 4, heightM: 2.4 });
    expect(r.passes).toBe(false);
    expect(r.criteria.find((c) => c.name === 'l/h < 3')!.passes).toBe(false);
  });
  it('throws RangeError naming heightM', () => {
    expect(() => roomProportionCheck({ lengthM: 5, widthM: 4, heightM: 0 })).toThrow(/heightM/);
  });
});
