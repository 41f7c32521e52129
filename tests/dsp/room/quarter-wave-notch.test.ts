import { describe, expect, it } from 'vitest';
import { quarterWaveNotchHz } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('quarterWaveNotchHz', () => {
  it('0.5 m from the wall → 171.6 Hz (published: Allison, JAES 22(5), 1974)', () => {
    assertInDelta(quarterWaveNotchHz({ distanceM: 0.5, temperatureC: 20 }), 171.6, 0.05);
  });
  it('throws RangeError naming distanceM', () => {
    expect(() => quarterWaveNotchHz({ distanceM: 0, temperatureC: 20 })).toThrow(/distanceM/);
  });
});
