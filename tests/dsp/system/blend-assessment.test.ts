import { describe, expect, it } from 'vitest';
import { assessBlend, bandLevelDb, blendResponse, FLATNESS_DEFINITION, logFrequencyGridHz, type PathSpec } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const path = (response: 'highpass' | 'lowpass', family: 'butterworth' | 'linkwitz-riley', order: number, invert = false, cornerHz = 80): PathSpec => ({ name: response, filter: { family, order, response, cornerHz }, gainDb: 0, delayMs: 0, invert });

/** The measure as its definition states it, computed independently by brute force on a dense grid (1/480 octave). */
function flatnessByDefinition(paths: PathSpec[], fc: number): number {
  const band = logFrequencyGridHz({ startHz: fc * FLATNESS_DEFINITION.bandLowRatio, stopHz: fc * FLATNESS_DEFINITION.bandHighRatio * (1 + 1e-12), pointsPerOctave: 480 });
  const r = blendResponse({ temperatureC: 20, frequencyHz: [...band, 4 * fc], paths });
  const ref = r.sum.magnitudeDb[band.length] as number;
  let worst = 0;
  for (let i = 0; i < band.length; i++) worst = Math.max(worst, Math.abs((r.sum.magnitudeDb[i] as number) - ref));
  return worst;
}

describe('assessBlend: the one flatness measure', () => {
  it('LR4 pair: flat within 1e-9 dB, no −3 dB point above 5 Hz (published: Linkwitz 1976)', () => {
    const a = assessBlend({ temperatureC: 20, paths: [path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 4)], crossoverHz: 80 });
    assertInDelta(a.flatnessDb, 0, 1e-9);
    expect(a.minus3DbHz).toBeNull();
    assertInDelta([...a.bandHz], [40, 160], 1e-9);
    assertInDelta(a.referenceHz, 320, 1e-9);
  });
  it('BW4 same polarity: the +3.01 dB bump at the crossover is the largest deviation (published: Self 2011)', () => {
    const a = assessBlend({ temperatureC: 20, paths: [path('highpass', 'butterworth', 4), path('lowpass', 'butterworth', 4)], crossoverHz: 80 });
    assertInDelta(a.maxDeviationDb, 3.0103 - a.referenceLevelDb, 0.01);
    assertInDelta(a.maxDeviationHz, 80, 1);
  });
  it('LR4 inverted: the deepest dip is a null at the crossover (published: Linkwitz 1976)', () => {
    const a = assessBlend({ temperatureC: 20, paths: [path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 4, true)], crossoverHz: 80 });
    expect(a.deepestDipDb).toBeLessThan(-100);
    assertInDelta(a.deepestDipHz, 80, 1e-6);
  });
  it('the −3 dB point of a BW2 high-pass alone is its corner (published: Butterworth 1930)', () => {
    const a = assessBlend({ temperatureC: 20, paths: [path('highpass', 'butterworth', 2)], crossoverHz: 80 });
    assertInDelta(a.minus3DbHz as number, 80, 0.3);
  });
  it('equals the definition computed by brute force on a 10× denser grid, for every slope pairing and polarity', () => {
    for (const [family, order] of [['butterworth', 1], ['butterworth', 2], ['butterworth', 3], ['butterworth', 4], ['linkwitz-riley', 2], ['linkwitz-riley', 4], ['linkwitz-riley', 8]] as const) {
      for (const invert of [false, true]) {
        const paths = [path('highpass', family, order), { ...path('lowpass', family, order, invert), delayMs: 1.3 }];
        // The 48-point grid can only miss a peak between its points: never larger, and within 0.05 dB here.
        const coarse = assessBlend({ temperatureC: 20, paths, crossoverHz: 80 }).flatnessDb;
        const dense = flatnessByDefinition(paths, 80);
        expect(coarse).toBeLessThanOrEqual(dense + 1e-9);
        expect(dense - coarse).toBeLessThan(0.05);
      }
    }
  });
  it('bandLevelDb: a flat sum reads 0 dB in any band; a BW2 high-pass alone reads between its band edges', () => {
    const flat = assessBlend({ temperatureC: 20, paths: [path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 4)], crossoverHz: 80 });
    assertInDelta(bandLevelDb(flat, 20, 40), 0, 1e-9);
    const hp = assessBlend({ temperatureC: 20, paths: [path('highpass', 'butterworth', 2)], crossoverHz: 80 });
    // |H|² of a BW2 high-pass = x⁴/(1 + x⁴), x = f/80 (Butterworth 1930): 0.0039 at 20 Hz, 0.0588 at 40 Hz.
    const level = bandLevelDb(hp, 20, 40);
    expect(level).toBeGreaterThan(10 * Math.log10(0.0039));
    expect(level).toBeLessThan(10 * Math.log10(0.0588));
  });
  it('throws RangeError naming crossoverHz', () => {
    expect(() => assessBlend({ temperatureC: 20, paths: [path('highpass', 'butterworth', 2)], crossoverHz: 0 })).toThrow(/crossoverHz/);
  });
});
