import { describe, expect, it } from 'vitest';
import { exposureMinutes } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('exposureMinutes', () => {
  it('85 dBA → 480 min, 100 dBA → 15 min (published: NIOSH 1998)', () => {
    assertInDelta(exposureMinutes({ levelDba: 85 }), 480, 1e-9);
    assertInDelta(exposureMinutes({ levelDba: 100 }), 15, 1e-9);
  });
  it('every 3 dB halves the time, every 3 dB less doubles it (published: NIOSH 1998, 3 dB exchange rate)', () => {
    assertInDelta(exposureMinutes({ levelDba: 88 }), 240, 1e-9);
    assertInDelta(exposureMinutes({ levelDba: 94 }), 60, 1e-9);
    assertInDelta(exposureMinutes({ levelDba: 82 }), 960, 1e-9);
  });
  it('throws RangeError naming levelDba', () => {
    expect(() => exposureMinutes({ levelDba: NaN })).toThrow(/levelDba/);
    expect(() => exposureMinutes({ levelDba: Infinity })).toThrow(RangeError);
  });
});
