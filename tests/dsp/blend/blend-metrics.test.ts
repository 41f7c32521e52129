import { describe, expect, it } from 'vitest';
import { blendMetrics, blendResponse, logFrequencyGridHz, type PathSpec } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const grid = logFrequencyGridHz({ startHz: 10, stopHz: 1000, pointsPerOctave: 48 });
const path = (response: 'highpass' | 'lowpass', family: 'butterworth' | 'linkwitz-riley', order: number, invert = false): PathSpec => ({ name: response, filter: { family, order, response, cornerHz: 80 }, gainDb: 0, delayMs: 0, invert });

describe('blendMetrics', () => {
  it('LR4 pair: −6.02 dB per path and 0 dB sum at the crossover, 0° phase difference, no deviation (published: Linkwitz 1976)', () => {
    const m = blendMetrics(blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [path('highpass', 'linkwitz-riley', 4), path('lowpass', 'linkwitz-riley', 4)] }), { crossoverHz: 80 });
    assertInDelta(m.pathLevelsDb, [-6.0206, -6.0206], 1e-4);
    assertInDelta(m.sumLevelDb, 0, 1e-6);
    assertInDelta(m.phaseDifferenceDeg, 0, 1e-6);
  });
  it('BW2 high-pass alone: −3.01 dB at its corner and no phase difference to read (published: Butterworth 1930)', () => {
    const m = blendMetrics(blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [path('highpass', 'butterworth', 2)] }), { crossoverHz: 80 });
    assertInDelta(m.sumLevelDb, -3.0103, 1e-3);
    expect(Number.isNaN(m.phaseDifferenceDeg)).toBe(true);
  });
  it('throws RangeError naming crossoverHz outside the grid', () => {
    const r = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [path('highpass', 'butterworth', 2)] });
    expect(() => blendMetrics(r, { crossoverHz: 5000 })).toThrow(/crossoverHz/);
    expect(() => blendMetrics(r, { crossoverHz: 80, subIndex: 3 })).toThrow(/subIndex/);
  });
});
