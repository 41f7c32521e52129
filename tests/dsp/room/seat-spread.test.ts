import { describe, expect, it } from 'vitest';
import { seatSpreadDb } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('seatSpreadDb (common practice: loudest minus quietest seat)', () => {
  it('gives max − min per frequency with its mean and maximum', () => {
    const r = seatSpreadDb({ frequencyHz: [40, 50, 60], seatsMagnitudeDb: [[0, 1, 2], [-3, 2, 2], [1, 1, -4]] });
    assertInDelta(r.spreadDb, [4, 1, 6], 1e-12);
    assertInDelta(r.meanSpreadDb, 11 / 3, 1e-12);
    expect(r.maxSpreadHz).toBe(60);
  });
  it('throws RangeError naming seatsMagnitudeDb for a single seat or wrong length', () => {
    expect(() => seatSpreadDb({ frequencyHz: [40], seatsMagnitudeDb: [[0]] })).toThrow(/seatsMagnitudeDb/);
    expect(() => seatSpreadDb({ frequencyHz: [40, 50], seatsMagnitudeDb: [[0], [1, 2]] })).toThrow(/seatsMagnitudeDb\[0\]/);
  });
});
