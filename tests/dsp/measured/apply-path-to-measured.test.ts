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
    // The estimate is the minimum phase of a BW2 high-pass, its own analytic phase 180° − atan2(√2·x, 1 − x²), x = f/30
    // (published: Butterworth 1930; minimum phase per Oppenheim & Schafer), plus the path's 180° and −360·f·3 ms:
    // within 3° away from the grid's ends (as minimum-phase.test.ts allows).
    let worst = 0;
    grid.forEach((f, i) => {
      if (f < 20 || f > 500) return;
      const x = f / 30;
      const expected = 180 - (180 / Math.PI) * Math.atan2(Math.SQRT2 * x, 1 - x * x) + 180 - 360 * f * 0.003;
      worst = Math.max(worst, Math.abs(angleDiffDeg(r.phaseDeg[i] as number, expected)));
    });
    expect(worst).toBeLessThan(3);
    assertInDelta(r.magnitudeDb, Float64Array.from(m.magnitudeDb, (v) => v - 2), 1e-9);
  });
});
