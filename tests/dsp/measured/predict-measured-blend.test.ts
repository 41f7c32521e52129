import { describe, it } from 'vitest';
import { blendResponse, logFrequencyGridHz, predictMeasuredBlend, type PathSpec } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const grid = logFrequencyGridHz({ startHz: 10, stopHz: 1000, pointsPerOctave: 24 });
const flat = new Float64Array(grid.length);
const mains: PathSpec = { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false };
const sub: PathSpec = { name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 1.5, invert: false };

describe('predictMeasuredBlend', () => {
  it('flat measurements reproduce the modelled blend (model consistency)', () => {
    const r = predictMeasuredBlend({ frequencyHz: grid, temperatureC: 20, measured: [{ magnitudeDb: flat, phaseDeg: flat, path: mains }, { magnitudeDb: flat, phaseDeg: flat, path: sub }] });
    assertInDelta(r.sum.magnitudeDb, blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [mains, sub] }).sum.magnitudeDb, 1e-9);
  });
});
