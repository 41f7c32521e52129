import { describe, expect, it } from 'vitest';
import { schroederFrequencyHz } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('schroederFrequencyHz', () => {
  it('V = 84.67 m³, T60 = 0.4 s → 137.5 Hz (published: Schroeder, JASA 99(5), 1996)', () => {
    assertInDelta(schroederFrequencyHz({ volumeM3: 84.67, rt60S: 0.4 }), 137.5, 0.05);
  });
  it('throws RangeError naming volumeM3 / rt60S', () => {
    expect(() => schroederFrequencyHz({ volumeM3: 0, rt60S: 0.4 })).toThrow(/volumeM3/);
    expect(() => schroederFrequencyHz({ volumeM3: 80, rt60S: -1 })).toThrow(/rt60S/);
  });
});
