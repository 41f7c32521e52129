import { describe, expect, it } from 'vitest';
import { crossoverAgainstExtension } from '@/dsp/measured/crossover-against-extension';
import { assertInDelta } from '../../helpers/assert-in-delta';

// Rule (common practice, REFERENCES.md "Common practice"): keep the crossover at least half an octave above the mains'
// in-room −3 dB point. Octaves are log2 of the ratio, worked by hand below.
describe('crossoverAgainstExtension (common practice: half an octave above the in-room −3 dB point)', () => {
  it('80 Hz against a −6 dB point at 40 Hz sits one octave above it; 0.515 octave above a −3 dB point at 56 Hz: clear', () => {
    const r = crossoverAgainstExtension({ crossoverHz: 80, extension: { minus3DbHz: 56, minus6DbHz: 40 }, lowestMeasuredHz: 10 });
    assertInDelta(r.octavesAboveMinus6Db as number, 1, 1e-12);
    assertInDelta(r.octavesAboveMinus3Db as number, 0.5146, 1e-4); // log2(80/56)
    expect(r.clearance).toBe('clear');
    expect(r.rule).toMatch(/half an octave above .* −3 dB point \(common practice\)/);
  });

  it('a −3 dB point at 60 Hz is only 0.415 octave below an 80 Hz crossover: too close; below the point: negative octaves', () => {
    expect(crossoverAgainstExtension({ crossoverHz: 80, extension: { minus3DbHz: 60, minus6DbHz: 45 }, lowestMeasuredHz: 10 }).clearance).toBe('too-close');
    const below = crossoverAgainstExtension({ crossoverHz: 60, extension: { minus3DbHz: 120, minus6DbHz: 90 }, lowestMeasuredHz: 10 });
    assertInDelta(below.octavesAboveMinus3Db as number, -1, 1e-12);
    expect(below.clearance).toBe('too-close');
  });

  it('exactly half an octave (80 Hz and 80/√2 Hz) is clear', () => {
    expect(crossoverAgainstExtension({ crossoverHz: 80, extension: { minus3DbHz: 80 / Math.SQRT2 - 1e-9, minus6DbHz: null }, lowestMeasuredHz: 10 }).clearance).toBe('clear');
  });

  it('a −3 dB point below the data: clear only when the crossover is half an octave above the lowest measured frequency', () => {
    const none = { minus3DbHz: null, minus6DbHz: null };
    const low = crossoverAgainstExtension({ crossoverHz: 80, extension: none, lowestMeasuredHz: 20 });
    expect(low.clearance).toBe('clear');
    expect(low.octavesAboveMinus3Db).toBeNull();
    expect(crossoverAgainstExtension({ crossoverHz: 80, extension: none, lowestMeasuredHz: 70 }).clearance).toBe('unknown');
  });

  it('refuses a non-positive crossover or lowest frequency, naming it', () => {
    expect(() => crossoverAgainstExtension({ crossoverHz: 0, extension: { minus3DbHz: 50, minus6DbHz: 40 }, lowestMeasuredHz: 10 })).toThrow(/crossoverHz/);
    expect(() => crossoverAgainstExtension({ crossoverHz: 80, extension: { minus3DbHz: 50, minus6DbHz: 40 }, lowestMeasuredHz: Number.NaN })).toThrow(/lowestMeasuredHz/);
  });
});
