import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { pathResponse } from '@/dsp/blend/path-response';
import { filterResponse } from '@/dsp/filters/filter-response';
import { logFrequencyGridHz } from '@/dsp/grid/log-frequency-grid';
import { impulseFromResponse, TIME_VIEW_DEFAULTS } from '@/dsp/time/impulse-from-response';
import fixture from '../fixtures/time-view-scipy.json';
import { assertInDelta } from '../../helpers/assert-in-delta';

const gridHz = logFrequencyGridHz({ startHz: 10, stopHz: 20_000, pointsPerOctave: 48 });
const sampleMs = 1000 / TIME_VIEW_DEFAULTS.sampleRateHz;
const lr4LowPass80 = { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 } as const;

function delayedFlat(delayMs: number, frequencyHz: Float64Array = gridHz) {
  // A pure delay: flat magnitude, phase −360·f·d, given wrapped (as a measured curve would be).
  const phaseDeg = Float64Array.from(frequencyHz, (f) => {
    const p = -360 * f * delayMs * 1e-3;
    return p - 360 * Math.round(p / 360);
  });
  return { frequencyHz, magnitudeDb: new Float64Array(frequencyHz.length), phaseDeg };
}

function peakMs(view: { timeMs: Float64Array; impulsePerS: Float64Array }): number {
  let best = 0;
  view.impulsePerS.forEach((v, i) => {
    if (Math.abs(v) > Math.abs(view.impulsePerS[best] as number)) best = i;
  });
  return view.timeMs[best] as number;
}

function valueAtMs(view: { timeMs: Float64Array }, values: Float64Array, ms: number): number {
  const i = Math.round((ms - (view.timeMs[0] as number)) / sampleMs);
  return values[i] as number;
}

describe('impulseFromResponse: a pure delay (common practice: the shift theorem, Oppenheim and Schafer, "Discrete-Time Signal Processing")', () => {
  for (const delayMs of [0, 5, 12.3, 150]) {
    it(`flat 0 dB delayed ${delayMs} ms (wrapped phase on a 48-per-octave grid to 20 kHz): the impulse peaks at ${delayMs} ms within one sample, the step rises there and ends at 1 within 1 %`, () => {
      const view = impulseFromResponse(delayedFlat(delayMs));
      expect(view.timeMs[0]).toBeCloseTo(-20, 9);
      expect(view.timeMs[view.timeMs.length - 1]).toBeCloseTo(300, 9);
      assertInDelta(peakMs(view), delayMs, sampleMs, 'peak');
      view.timeMs.forEach((t, i) => {
        if (t <= delayMs - 1) expect(Math.abs(view.step[i] as number), `step at ${t} ms`).toBeLessThan(0.05);
        if (t >= delayMs + 1) assertInDelta(view.step[i] as number, 1, 0.05, `step at ${t} ms`);
      });
      assertInDelta(view.step[view.step.length - 1] as number, 1, 0.01, 'step at 300 ms');
    });
  }

  it('the half-Hann taper above the band keeps the band edge from ringing: 2 ms or more from the peak, |h| stays below 0.5 % of the peak (a brick wall at 2 kHz would leave sinc tails of ≈ 8 %; common practice)', () => {
    const view = impulseFromResponse(delayedFlat(5));
    const peak = Math.max(...view.impulsePerS);
    view.timeMs.forEach((t, i) => {
      if (Math.abs(t - 5) >= 2) expect(Math.abs(view.impulsePerS[i] as number), `h at ${t} ms`).toBeLessThan(0.005 * peak);
    });
  });

  it('property: any delay 0–250 ms on grids of 12–96 points per octave peaks at the delay within one sample', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 250, noNaN: true }), fc.constantFrom(12, 24, 48, 96), (delayMs, pointsPerOctave) => {
        const frequencyHz = logFrequencyGridHz({ startHz: 10, stopHz: 20_000, pointsPerOctave });
        assertInDelta(peakMs(impulseFromResponse(delayedFlat(delayMs, frequencyHz))), delayMs, sampleMs, `peak (${pointsPerOctave}/oct)`);
      }),
      { numRuns: 25, seed: 17 },
    );
  });
});

describe('impulseFromResponse against scipy.signal analog impulse and step responses (reference library; scripts/reference/time-view-fixtures.py)', () => {
  const filters = {
    'lr4-lowpass-80': lr4LowPass80,
    'butterworth2-lowpass-120': { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 120 },
  } as const;
  for (const c of fixture.cases) {
    // At t = 0 a 2nd-order low-pass's h(t) has a corner (0 before, slope ω0² after) that the 2 kHz band limit rounds
    // off: 3 % of the peak there, so that one sample gets 5 %.
    it(`${c.description}: peak time within one sample and 3 % of scipy's, h(t) within 0.5 % of its peak (5 % at t = 0) and the step within 0.005 over 0–300 ms`, () => {
      const response = filterResponse({ filter: filters[c.name as keyof typeof filters], frequencyHz: gridHz });
      const view = impulseFromResponse(response);
      const peak = peakMs(view);
      assertInDelta(peak, c.peakMs, sampleMs, 'peak vs scipy (one sample)');
      assertInDelta(peak, c.peakMs, 0.03 * c.peakMs, 'peak vs scipy (3 %)');
      const scipyPeak = Math.max(...c.impulsePerS);
      c.timeMs.forEach((t, i) => {
        assertInDelta(valueAtMs(view, view.impulsePerS, t), c.impulsePerS[i] as number, (t > 0 ? 0.005 : 0.05) * scipyPeak, `h at ${t} ms`);
        assertInDelta(valueAtMs(view, view.step, t), c.step[i] as number, 0.005, `step at ${t} ms`);
      });
    });
  }
});

describe('impulseFromResponse on a blend path (dsp pathResponse; expected shift: the delay, common practice)', () => {
  it('an LR4 80 Hz sub path delayed by 5 ms peaks 5 ms (within one sample) after the undelayed one, and is that impulse shifted', () => {
    const path = { name: 'sub', filter: lr4LowPass80, gainDb: 0, delayMs: 0, invert: false };
    const asCurve = (delayMs: number) => {
      const r = pathResponse({ ...path, delayMs }, gridHz);
      return { frequencyHz: r.frequencyHz, magnitudeDb: r.magnitudeDb, phaseDeg: Float64Array.from(r.re, (x, i) => (Math.atan2(r.im[i] as number, x) * 180) / Math.PI) };
    };
    const undelayed = impulseFromResponse(asCurve(0));
    const delayed = impulseFromResponse(asCurve(5));
    assertInDelta(peakMs(delayed) - peakMs(undelayed), 5, sampleMs, 'peak difference');
    const shift = Math.round(5 / sampleMs);
    const scale = Math.max(...undelayed.impulsePerS);
    for (let i = 0; i + shift < delayed.impulsePerS.length; i++) {
      assertInDelta(delayed.impulsePerS[i + shift] as number, undelayed.impulsePerS[i] as number, 1e-3 * scale, `h at ${delayed.timeMs[i + shift]} ms`);
    }
  });

  it('an inverted path gives the negated impulse and a step ending at −1', () => {
    const r = pathResponse({ name: 'sub', filter: lr4LowPass80, gainDb: 0, delayMs: 2, invert: true }, gridHz);
    const phaseDeg = Float64Array.from(r.re, (x, i) => (Math.atan2(r.im[i] as number, x) * 180) / Math.PI);
    const inverted = impulseFromResponse({ frequencyHz: gridHz, magnitudeDb: r.magnitudeDb, phaseDeg });
    const plain = impulseFromResponse({ frequencyHz: gridHz, magnitudeDb: r.magnitudeDb, phaseDeg: phaseDeg.map((p) => p + 180) });
    const scale = Math.max(...plain.impulsePerS);
    inverted.impulsePerS.forEach((v, i) => assertInDelta(v, -(plain.impulsePerS[i] as number), 1e-6 * scale, `h[${i}]`));
    assertInDelta(inverted.step[inverted.step.length - 1] as number, -1, 0.01, 'final step');
  });
});

describe('impulseFromResponse: input checks (RangeError naming the parameter)', () => {
  const flat = delayedFlat(0);
  it.each([
    [{ ...flat, phaseDeg: flat.phaseDeg.subarray(1) }, 'phaseDeg'],
    [{ ...flat, sampleRateHz: 100 }, 'sampleRateHz'],
    [{ ...flat, startMs: 10, stopMs: 10 }, 'stopMs'],
    [{ ...flat, startMs: -500, stopMs: 600 }, 'stopMs'],
    [{ frequencyHz: [100], magnitudeDb: [0], phaseDeg: [0] }, 'frequencyHz'],
    [{ ...flat, magnitudeDb: flat.magnitudeDb.map((v, i) => (i === 3 ? Number.NaN : v)) }, 'magnitudeDb'],
  ])('refuses %#', (options, name) => {
    expect(() => impulseFromResponse(options)).toThrow(RangeError);
    expect(() => impulseFromResponse(options)).toThrow(name);
  });
});
