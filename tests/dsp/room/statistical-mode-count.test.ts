import { describe, expect, it } from 'vitest';
import { statisticalModeCount } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('statisticalModeCount', () => {
  it('6.4 × 4.9 × 2.7 m at 200 Hz → 107.3 (published: Kuttruff, Room Acoustics, ch. 3)', () => {
    assertInDelta(statisticalModeCount({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, frequencyHz: 200, temperatureC: 20 }), 107.3, 0.05);
  });
  it('throws RangeError naming frequencyHz for 0', () => {
    expect(() => statisticalModeCount({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, frequencyHz: 0, temperatureC: 20 })).toThrow(/frequencyHz/);
  });
});
