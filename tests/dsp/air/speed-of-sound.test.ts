import { describe, expect, it } from 'vitest';
import { speedOfSoundMps } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('speedOfSoundMps', () => {
  it('is 343.21 m/s at 20 °C (published: Kinsler et al., Fundamentals of Acoustics, 4th ed., 2000)', () => {
    assertInDelta(speedOfSoundMps(20), 343.21, 0.005);
  });
  it('is 331.3 m/s at 0 °C (published: same formula)', () => {
    assertInDelta(speedOfSoundMps(0), 331.3, 1e-12);
  });
  it('throws RangeError naming temperatureC for NaN, Infinity and below absolute zero', () => {
    for (const bad of [NaN, Infinity, -300]) expect(() => speedOfSoundMps(bad)).toThrow(/temperatureC/);
    expect(() => speedOfSoundMps(NaN)).toThrow(RangeError);
  });
});
