import { describe, expect, it } from 'vitest';
import { arrivalTimeMs } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('arrivalTimeMs', () => {
  it('1 m at 20 °C is 2.914 ms (published: Kinsler et al. 2000)', () => {
    assertInDelta(arrivalTimeMs({ distanceM: 1, temperatureC: 20 }), 2.914, 0.0005);
  });
  it('1 m at 20 °C is 83.9° of phase at 80 Hz (published: Kinsler et al. 2000)', () => {
    assertInDelta((360 * 80 * arrivalTimeMs({ distanceM: 1, temperatureC: 20 })) / 1000, 83.9, 0.05);
  });
  it('throws RangeError naming distanceM for negative or NaN distance', () => {
    expect(() => arrivalTimeMs({ distanceM: -1, temperatureC: 20 })).toThrow(/distanceM/);
    expect(() => arrivalTimeMs({ distanceM: NaN, temperatureC: 20 })).toThrow(RangeError);
  });
});
