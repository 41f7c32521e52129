import { describe, expect, it } from 'vitest';
import { bestMeasuredAlignment, blendResponse, logFrequencyGridHz, type PathSpec } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const grid = logFrequencyGridHz({ startHz: 10, stopHz: 2000, pointsPerOctave: 48 });
const none = { family: 'butterworth' as const, order: 2, response: 'none' as const, cornerHz: 80 };

describe('bestMeasuredAlignment', () => {
  it('finds the 2 ms by which a measured sub lags its LR4 partner (model consistency; Linkwitz 1976)', () => {
    const measuredMains = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [{ name: 'm', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false }] }).paths[0]!;
    const measuredSub = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [{ name: 's', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 2, invert: false }] }).paths[0]!;
    const path = (name: string): PathSpec => ({ name, filter: none, gainDb: 0, delayMs: 0, invert: false });
    const r = bestMeasuredAlignment({
      frequencyHz: grid,
      crossoverHz: 80,
      temperatureC: 20,
      mains: { magnitudeDb: measuredMains.magnitudeDb, phaseDeg: measuredMains.phaseDeg, path: path('mains') },
      sub: { magnitudeDb: measuredSub.magnitudeDb, phaseDeg: measuredSub.phaseDeg, path: path('sub') },
    });
    expect(r.addTo).toBe('mains');
    assertInDelta(r.delayMs, 2, 0.01);
    expect(r.invertSub).toBe(false);
  });
});
