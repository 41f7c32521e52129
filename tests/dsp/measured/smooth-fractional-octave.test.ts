import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz, smoothFractionalOctave } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('smoothFractionalOctave (power average over each 1/N octave; common practice)', () => {
  it('leaves a flat curve flat', () => {
    const f = logFrequencyGridHz({ startHz: 20, stopHz: 2000, pointsPerOctave: 24 });
    const r = smoothFractionalOctave({ frequencyHz: f, magnitudeDb: new Float64Array(f.length).fill(-3), fraction: 3 });
    assertInDelta(r.magnitudeDb, new Float64Array(f.length).fill(-3), 1e-9);
  });
  it('averages power, not dB: 0 dB and a null (−300 dB) average to −3.01 dB', () => {
    const r = smoothFractionalOctave({ frequencyHz: [100, 101], magnitudeDb: [0, -300], fraction: 1 });
    assertInDelta(r.magnitudeDb[0] as number, -3.0103, 1e-4);
  });
  it('throws RangeError naming fraction', () => {
    expect(() => smoothFractionalOctave({ frequencyHz: [100], magnitudeDb: [0], fraction: 0 })).toThrow(/fraction/);
  });
});
