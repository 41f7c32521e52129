import { describe, expect, it } from 'vitest';
import { modeCountsPerThirdOctave, roomModes } from '@/dsp';

describe('modeCountsPerThirdOctave', () => {
  it('counts every mode between the first lower edge and the last upper edge exactly once', () => {
    const { modes } = roomModes({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, maxHz: 250, temperatureC: 20 });
    const bands = modeCountsPerThirdOctave(modes, { startHz: 25, stopHz: 200 });
    const lo = bands[0]!.lowerHz;
    const hi = bands[bands.length - 1]!.upperHz;
    expect(bands.reduce((s, b) => s + b.count, 0)).toBe(modes.filter((m) => m.frequencyHz >= lo && m.frequencyHz < hi).length);
    expect(bands[0]!.modes[0]!.indices).toEqual([1, 0, 0]);
  });
});
