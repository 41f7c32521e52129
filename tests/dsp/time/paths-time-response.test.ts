import { describe, expect, it } from 'vitest';
import type { PathSpec } from '@/dsp/blend/blend-types';
import { gaussianBandLimit, gaussianBandLimitMinus3DbHz } from '@/dsp/time/gaussian-band-limit';
import { impulseFromBins } from '@/dsp/time/impulse-from-bins';
import { pathsTimeResponse } from '@/dsp/time/paths-time-response';
import { timeWindow } from '@/dsp/time/time-window';
import fixture from '../fixtures/time-view-scipy.json';
import { assertInDelta } from '../../helpers/assert-in-delta';

const sampleMs = 1000 / 8000;
/** Milliseconds of air path per metre at 20 °C: 1000 / (331.3·√(1 + 20/273.15)) m/s (Kinsler et al. 2000). */
const MS_PER_METRE_20C = 1000 / (331.3 * Math.sqrt(1 + 20 / 273.15));

const lr4 = (response: 'highpass' | 'lowpass', cornerHz = 80) => ({ family: 'linkwitz-riley', order: 4, response, cornerHz }) as const;
const path = (name: string, filter: PathSpec['filter'], patch: Partial<PathSpec> = {}): PathSpec => ({ name, filter, gainDb: 0, delayMs: 0, invert: false, ...patch });

function peakIndex(values: Float64Array): number {
  let best = 0;
  values.forEach((v, i) => {
    if (Math.abs(v) > Math.abs(values[best] as number)) best = i;
  });
  return best;
}

describe('impulseFromBins and timeWindow (the inverse DFT of a flat spectrum is a unit sample: Oppenheim and Schafer, published)', () => {
  it('all bins 1: h = fs at t = 0 and 0 elsewhere (to 1e-9), the step 0 before and 1 after (trapezoid: ½ at the sample)', () => {
    const window = timeWindow({ startMs: -1, stopMs: 1 });
    expect(window.fftSize).toBe(32768); // 4 s at 8 kHz, the next power of two
    const half = window.fftSize / 2 + 1;
    const view = impulseFromBins({ re: new Float64Array(half).fill(1), im: new Float64Array(half), window });
    view.timeMs.forEach((t, i) => assertInDelta(view.impulsePerS[i] as number, Math.abs(t) < 1e-9 ? 8000 : 0, 1e-9, `h at ${t} ms`));
    view.timeMs.forEach((t, i) => assertInDelta(view.step[i] as number, t < -1e-9 ? 0 : t > 1e-9 ? 1 : 0.5, 1e-12, `step at ${t} ms`));
  });

  it('the Gaussian band limit: e^(−½) at σ = 4000/4.3 Hz, 1e-4 at 4 kHz, −3 dB at σ·√ln2 (hand-computed)', () => {
    const sigmaHz = 4000 / 4.3;
    assertInDelta(gaussianBandLimit(sigmaHz, 8000), Math.exp(-0.5), 1e-15, 'at σ');
    assertInDelta(gaussianBandLimit(4000, 8000), Math.exp(-0.5 * 4.3 * 4.3), 1e-18, 'at fs/2');
    expect(gaussianBandLimit(4000, 8000)).toBeLessThan(1e-4);
    assertInDelta(gaussianBandLimit(gaussianBandLimitMinus3DbHz(8000), 8000), Math.SQRT1_2, 1e-12, 'at the −3 dB point');
    assertInDelta(20 * Math.log10(gaussianBandLimit(300, 8000)), -0.452, 0.001, 'dB at 300 Hz');
  });

  it('refuses a bad window or a spectrum of the wrong length, naming it', () => {
    expect(() => timeWindow({ startMs: 5, stopMs: 5 })).toThrow(/stopMs/);
    expect(() => timeWindow({ sampleRateHz: 100 })).toThrow(/sampleRateHz/);
    expect(() => impulseFromBins({ re: [1, 2], im: [0, 0], window: timeWindow({}) })).toThrow(/re/);
  });
});

describe('pathsTimeResponse: every path and the sum in time', () => {
  it('a path that only delays (a 1st-order high-pass at 1 Hz: a unit impulse then a tail 1/8000 as tall) peaks at its processor delay plus air path — 12.3 ms + 1 m at 20 °C = 15.21 ms — within one sample', () => {
    const r = pathsTimeResponse({ paths: [path('wire', { family: 'butterworth', order: 1, response: 'highpass', cornerHz: 1 }, { delayMs: 12.3, distanceM: 1 })], temperatureC: 20 });
    const p = r.paths[0]!;
    assertInDelta(p.arrivalMs, 12.3 + MS_PER_METRE_20C, 1e-9, 'arrival');
    assertInDelta(r.timeMs[peakIndex(p.impulsePerS)] as number, 12.3 + MS_PER_METRE_20C, sampleMs, 'impulse peak');
  });

  it('linearity: the sum’s impulse and step are the paths’ sum sample by sample (to 1e-9 /s and 1e-12), three paths with delays, gains, polarity and roll-offs', () => {
    const paths = [
      path('L', lr4('highpass'), { distanceM: 3, delayMs: 1.2, rolloff: { kind: 'sealed', cornerHz: 50, q: 0.7 } }),
      path('Sub A', lr4('lowpass'), { distanceM: 4, gainDb: -3.5, rolloff: [{ kind: 'vented', cornerHz: 20 }, { kind: 'lowpass', cornerHz: 180, q: 0.7 }] }),
      path('Sub B', { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, { distanceM: 5, delayMs: 7, invert: true }),
    ];
    const r = pathsTimeResponse({ paths, temperatureC: 20 });
    r.timeMs.forEach((t, i) => {
      const impulse = r.paths.reduce((s, p) => s + (p.impulsePerS[i] as number), 0);
      const step = r.paths.reduce((s, p) => s + (p.step[i] as number), 0);
      assertInDelta(r.sum.impulsePerS[i] as number, impulse, 1e-9, `sum h at ${t} ms`);
      assertInDelta(r.sum.step[i] as number, step, 1e-12, `sum step at ${t} ms`);
    });
  });

  const pair = fixture.pairs[0]!;
  // The Gaussian band limit smears by σt = 0.17 ms: on the high-pass's fast fall just after its jump that moves the step
  // by at most ½·σt²·|step''| ≈ 0.011 (|step''| ≈ 3·ω0² there), and by far less from 3 ms on.
  it(`against scipy.signal.step (reference library; scripts/reference/time-view-fixtures.py): ${pair.description} — the sub's step within 0.002 over 0–300 ms and its peak within one sample; the mains' and the sum's within 0.015 over 1–3 ms and 0.005 after`, () => {
    const r = pathsTimeResponse({ paths: [path('mains', lr4('highpass', pair.cornerHz)), path('sub', lr4('lowpass', pair.cornerHz), { delayMs: pair.subDelayMs })], temperatureC: 20 });
    const at = (ms: number) => Math.round((ms - (r.timeMs[0] as number)) / sampleMs);
    const [mains, sub] = r.paths;
    pair.timeMs.forEach((t, i) => {
      if (t < 1) return; // the band-limited view rounds the high-pass's jump from 0 to 1 over a fraction of a millisecond
      const delta = t < 3 ? 0.015 : 0.005;
      assertInDelta(mains!.step[at(t)] as number, pair.mainsStep[i] as number, delta, `mains step at ${t} ms`);
      assertInDelta(r.sum.step[at(t)] as number, pair.sumStep[i] as number, delta, `sum step at ${t} ms`);
    });
    pair.timeMs.forEach((t, i) => assertInDelta(sub!.step[at(t)] as number, pair.subStep[i] as number, 0.002, `sub step at ${t} ms`));
    assertInDelta(r.timeMs[peakIndex(sub!.step)] as number, pair.subStepPeakMs, sampleMs, 'sub step peak');
    assertInDelta(r.timeMs[peakIndex(mains!.step)] as number, pair.mainsStepPeakMs, 0.5, 'mains step peak (the jump, band-limited)');
  });

  it('nothing rings before a path arrives: a pure delay (1st-order high-pass at 1 Hz) 1 ms or more before its arrival stays below 0.01 % of its peak (a Gaussian’s transform is a Gaussian; common practice)', () => {
    const r = pathsTimeResponse({ paths: [path('wire', { family: 'butterworth', order: 1, response: 'highpass', cornerHz: 1 }, { delayMs: 20 })] });
    const p = r.paths[0]!;
    const peak = Math.max(...p.impulsePerS);
    r.timeMs.forEach((t, i) => {
      if (t <= 19) expect(Math.abs(p.impulsePerS[i] as number), `h at ${t} ms`).toBeLessThan(1e-4 * peak);
    });
  });

  it('refuses no paths or an impossible temperature, naming it', () => {
    expect(() => pathsTimeResponse({ paths: [] })).toThrow(/paths/);
    expect(() => pathsTimeResponse({ paths: [path('x', lr4('lowpass'))], temperatureC: -300 })).toThrow(/temperatureC/);
  });
});
