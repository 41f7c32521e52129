import { describe, expect, it } from 'vitest';
import { filterResponse, logFrequencyGridHz, minimumPhaseDeg, type FilterSpec } from '@/dsp';
import { angleDiffDeg } from '../../helpers/assert-in-delta';

const grid = logFrequencyGridHz({ startHz: 2, stopHz: 20000, pointsPerOctave: 24 });

describe('minimumPhaseDeg (published: Bode 1945 gain–phase relation; Oppenheim & Schafer, Discrete-Time Signal Processing)', () => {
  const filters: FilterSpec[] = [];
  for (const response of ['lowpass', 'highpass'] as const) {
    for (const order of [1, 2, 3, 4, 8]) filters.push({ family: 'butterworth', order, response, cornerHz: 80 });
    for (const order of [2, 4, 8]) filters.push({ family: 'linkwitz-riley', order, response, cornerHz: 80 });
  }
  for (const filter of filters) {
    it(`${filter.family} ${filter.order} ${filter.response}: the phase comes back within 3° of the analytic phase in band (10 Hz–2 kHz)`, () => {
      const r = filterResponse({ filter, frequencyHz: grid });
      const est = minimumPhaseDeg({ frequencyHz: grid, magnitudeDb: r.magnitudeDb });
      let worst = 0;
      grid.forEach((f, i) => {
        if (f < 10 || f > 2000) return;
        worst = Math.max(worst, Math.abs(angleDiffDeg(est.phaseDeg[i] as number, r.phaseDeg[i] as number)));
      });
      expect(worst).toBeLessThan(3);
    });
  }
  it('throws RangeError naming magnitudeDb for NaN values and frequencyHz for unsorted grids', () => {
    expect(() => minimumPhaseDeg({ frequencyHz: [10, 20], magnitudeDb: [0, NaN] })).toThrow(/magnitudeDb/);
    expect(() => minimumPhaseDeg({ frequencyHz: [20, 10], magnitudeDb: [0, 0] })).toThrow(/frequencyHz/);
  });
});
