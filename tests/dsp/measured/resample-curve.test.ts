import { describe, expect, it } from 'vitest';
import { resampleCurve } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('resampleCurve', () => {
  it('interpolates linearly in log-frequency and unwraps phase across ±180°', () => {
    const r = resampleCurve({ frequencyHz: [10, 100], magnitudeDb: [0, 20], phaseDeg: [170, -170], targetHz: [Math.sqrt(1000), 5, 200] });
    assertInDelta(r.magnitudeDb[0] as number, 10, 1e-9);
    assertInDelta(r.phaseDeg![0] as number, 180, 1e-9);
    expect(r.outsideCount).toBe(2);
  });
  it('throws RangeError naming magnitudeDb for a length mismatch', () => {
    expect(() => resampleCurve({ frequencyHz: [10, 100], magnitudeDb: [0], targetHz: [20] })).toThrow(/magnitudeDb/);
  });
});
