import { describe, expect, it } from 'vitest';
import { delaysAndTrims } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('delaysAndTrims (processor convention; inverse-square trims, published: Kinsler et al. 2000)', () => {
  it('the farthest gets 0 ms and 0 dB; 1 m nearer waits 2.914 ms at 20 °C; half the distance trims −6.02 dB', () => {
    const r = delaysAndTrims({ distancesM: [4, 3, 2], temperatureC: 20 });
    expect(r.farthestIndex).toBe(0);
    assertInDelta(r.delaysMs, [0, 2.9137, 5.8274], 0.0005);
    assertInDelta(r.trimsDb[2] as number, -6.0206, 1e-4);
  });
  it('throws RangeError naming distancesM[i]', () => {
    expect(() => delaysAndTrims({ distancesM: [3, 0], temperatureC: 20 })).toThrow(/distancesM\[1\]/);
  });
});
