import { describe, expect, it } from 'vitest';
import { applyPathToMeasured, blendResponse, filterResponse, logFrequencyGridHz, type PathSpec } from '@/dsp';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';

const grid = logFrequencyGridHz({ startHz: 10, stopHz: 1000, pointsPerOctave: 24 });
const sub: PathSpec = { name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: -2, delayMs: 3, invert: true, distanceM: 2 };

describe('applyPathToMeasured', () => {
  it('a flat 0 dB / 0° measurement becomes the path itself without its distance (model consistency with blendResponse)', () => {
    const r = applyPathToMeasured({ frequencyHz: grid, magnitudeDb: new Float64Array(grid.length), phaseDeg: new Float64Array(grid.length), path: sub, temperatureC: 20 });
    const model = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [{ ...sub, distanceM: 0 }] }).paths[0]!;
    assertInDelta(r.magnitudeDb, model.magnitudeDb, 1e-9);
    grid.forEach((_, i) => assertInDelta(angleDiffDeg(r.phaseDeg[i] as number, model.phaseDeg[i] as number), 0, 1e-6));
    expect(r.phaseEstimated).toBe(false);
  });
  it('without phase it estimates minimum phase and says so', () => {
    const m = filterResponse({ filter: { family: 'butterworth', order: 2, response: 'highpass', cornerHz: 30 }, frequencyHz: grid });
    const r = applyPathToMeasured({ frequencyHz: grid, magnitudeDb: m.magnitudeDb, path: { ...sub, filter: { ...sub.filter, response: 'none' } }, temperatureC: 20 });
    expect(r.phaseEstimated).toBe(true);
  });
});
