import { describe, expect, it } from 'vitest';
import { butterworthQ } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('butterworthQ', () => {
  it('order 2 → 0.7071, order 3 → 1.0, order 4 → 0.5412 and 1.3066 (published: Self, The Design of Active Crossovers, 2011, from memory of its tables)', () => {
    assertInDelta(butterworthQ(2), [Math.SQRT1_2], 1e-12);
    assertInDelta(butterworthQ(3), [1], 1e-12);
    assertInDelta(butterworthQ(4), [0.541196, 1.306563], 1e-6);
  });
  it('gives floor(n/2) sections for n = 1..8', () => {
    for (let n = 1; n <= 8; n++) expect(butterworthQ(n).length).toBe(Math.floor(n / 2));
  });
  it('throws RangeError naming order outside 1..8', () => {
    expect(() => butterworthQ(9)).toThrow(/order/);
  });
});
