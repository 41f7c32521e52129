import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { spatialAverageDb } from '@/dsp/measured/spatial-average';
import { assertInDelta } from '../../helpers/assert-in-delta';

// Spatial average: the power average of the seats' magnitudes (common practice; REFERENCES.md "Several subs over
// several seats").
describe('spatialAverageDb (common practice: power average over the seats)', () => {
  it('identical seats average to each seat (property, 1–8 seats)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -120, max: 40, noNaN: true }), { minLength: 1, maxLength: 60 }),
        fc.integer({ min: 1, max: 8 }),
        (curve, seats) => {
          const average = spatialAverageDb({ seatsMagnitudeDb: Array.from({ length: seats }, () => curve) });
          assertInDelta(average, curve, 1e-9);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('averages power, not dB (worked by hand): 0 dB with a near-silent seat → −3.01 dB; 0, 0 and +6.02 dB (powers 1, 1, 4) → +3.01 dB', () => {
    const two = spatialAverageDb({ seatsMagnitudeDb: [[0, 0], [-400, 0]] });
    assertInDelta(two[0] as number, 10 * Math.log10(1 / 2), 1e-9);
    assertInDelta(two[1] as number, 0, 1e-12);
    const three = spatialAverageDb({ seatsMagnitudeDb: [[0], [0], [20 * Math.log10(2)]] });
    assertInDelta(three[0] as number, 10 * Math.log10(2), 1e-9); // (1 + 1 + 4) / 3 = 2; the dB mean would be 2.01 dB
  });

  it('does not underflow at very low levels (−900 dB seats average to −900 dB)', () => {
    assertInDelta(spatialAverageDb({ seatsMagnitudeDb: [[-900], [-900]] })[0] as number, -900, 1e-9);
  });

  it('refuses no seats, unequal lengths and non-finite levels, naming the seat', () => {
    expect(() => spatialAverageDb({ seatsMagnitudeDb: [] })).toThrow(/at least one seat/);
    expect(() => spatialAverageDb({ seatsMagnitudeDb: [[]] })).toThrow(/at least one point/);
    expect(() => spatialAverageDb({ seatsMagnitudeDb: [[0, 0], [0]] })).toThrow(/seatsMagnitudeDb\[1\] must have 2 points/);
    expect(() => spatialAverageDb({ seatsMagnitudeDb: [[0, 0], [0, Number.POSITIVE_INFINITY]] })).toThrow(/seatsMagnitudeDb\[1\]\[1\]/);
  });
});
