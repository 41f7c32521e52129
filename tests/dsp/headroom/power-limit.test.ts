import { describe, expect, it } from 'vitest';
import { powerLimit } from '@/dsp';

describe('powerLimit: the lower of the amplifier and the speaker rating binds (common practice: never past the maker’s rating)', () => {
  it('a 200 W amplifier on a 120 W speaker: the speaker binds at 120 W', () => {
    expect(powerLimit({ amplifierPowerW: 200, ratedPowerW: 120 })).toEqual({ usablePowerW: 120, binding: 'speaker' });
  });
  it('a 100 W amplifier on a 150 W speaker, an equal pair, or no rating: the amplifier binds', () => {
    expect(powerLimit({ amplifierPowerW: 100, ratedPowerW: 150 })).toEqual({ usablePowerW: 100, binding: 'amplifier' });
    expect(powerLimit({ amplifierPowerW: 120, ratedPowerW: 120 })).toEqual({ usablePowerW: 120, binding: 'amplifier' });
    expect(powerLimit({ amplifierPowerW: 300 })).toEqual({ usablePowerW: 300, binding: 'amplifier' });
  });
  it('throws RangeError naming amplifierPowerW and ratedPowerW', () => {
    expect(() => powerLimit({ amplifierPowerW: 0, ratedPowerW: 100 })).toThrow(/amplifierPowerW/);
    expect(() => powerLimit({ amplifierPowerW: 100, ratedPowerW: -1 })).toThrow(/ratedPowerW/);
    expect(() => powerLimit({ amplifierPowerW: 100, ratedPowerW: NaN })).toThrow(/ratedPowerW/);
  });
});
