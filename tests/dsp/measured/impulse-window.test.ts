import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { impulseWindow } from '@/dsp/measured/impulse-window';
import { assertInDelta } from '../../helpers/assert-in-delta';

const fs = 48000;

/** A Gaussian pulse of height `height` centred on a fractional sample. */
function pulse(length: number, centreSample: number, sigmaSamples: number, height = 1): Float64Array {
  return Float64Array.from({ length }, (_, i) => height * Math.exp(-0.5 * ((i - centreSample) / sigmaSamples) ** 2));
}

describe('impulseWindow: the arrival is the peak (largest |x|), refined by a parabola (from memory)', () => {
  it('a Gaussian pulse at a fractional sample: the arrival lies within 0.1 sample of its centre, either polarity (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 50, max: 150, noNaN: true }), fc.double({ min: 2, max: 8, noNaN: true }), fc.boolean(), (centre, sigma, inverted) => {
        const w = impulseWindow({ samples: pulse(400, centre, sigma, inverted ? -0.7 : 0.7), sampleRateHz: fs });
        expect(Math.abs(w.peakSample - centre)).toBeLessThan(0.1);
        assertInDelta(w.arrivalMs, (w.peakSample * 1000) / fs, 1e-12);
      }),
      { numRuns: 200 },
    );
  });

  it('refines toward the larger neighbour and never by more than half a sample', () => {
    const w = impulseWindow({ samples: [0, 0, 1, 0.5, 0.25, 0, 0, 0], sampleRateHz: 1000 });
    // Parabola through (−1, 0), (0, 1), (1, 0.5): vertex at 0.5·(0 − 0.5)/(0 − 2 + 0.5) = 1/6 (worked by hand).
    assertInDelta(w.peakSample, 2 + 1 / 6, 1e-12);
    expect(impulseWindow({ samples: [0, 1, 1, 0], sampleRateHz: 1000 }).peakSample).toBe(1.5);
  });
});

describe('impulseWindow defaults: 20 ms before the arrival, 500 ms long, half-Hann fades', () => {
  const samples = pulse(fs, 14400, 20); // 1 s, peak at 300 ms
  const w = impulseWindow({ samples, sampleRateHz: fs });

  it('starts 20 ms before the peak, lasts 500 ms, fades in over 10 ms and out over the last 100 ms (20 %)', () => {
    expect(w.startSample).toBe(13440); // 300 ms − 20 ms at 48 kHz
    expect(w.lengthSamples).toBe(24000);
    assertInDelta(w.startMs, 280, 1e-9);
    assertInDelta(w.lengthMs, 500, 1e-9);
    expect(w.fadeInSamples).toBe(480);
    expect(w.fadeOutSamples).toBe(4800);
    expect(w.windowedSamples.length).toBe(w.lengthSamples);
  });

  it('leaves the samples between the fades untouched and shapes the fades as half-Hann (0.5 at their middle)', () => {
    for (let i = w.fadeInSamples; i < w.lengthSamples - w.fadeOutSamples; i++) {
      if (w.windowedSamples[i] !== samples[w.startSample + i]) expect.fail(`sample ${i} changed`);
    }
    const constant = impulseWindow({ samples: new Float64Array(fs).fill(0.25).fill(1, 24000, 24001), sampleRateHz: fs });
    const gain = (i: number) => (constant.windowedSamples[i] as number) / 0.25;
    expect(gain(0)).toBeLessThan(0.001);
    const n = constant.fadeInSamples;
    assertInDelta((gain(n / 2 - 1) + gain(n / 2)) / 2, 0.5, 1e-9, 'fade-in middle');
    // Half-Hann at a quarter of the fade: 0.5·(1 − cos(π/4)) = 0.146 (Hann window; F. J. Harris, "On the Use of Windows
    // for Harmonic Analysis with the Discrete Fourier Transform", Proc. IEEE 66(1), 1978) — a linear ramp would give 0.25.
    assertInDelta(gain(n / 4), 0.5 * (1 - Math.cos(Math.PI / 4)), 0.005, 'fade-in quarter');
    expect(gain(constant.lengthSamples - 1)).toBeLessThan(0.001);
    for (let i = 1; i < constant.fadeInSamples; i++) expect(gain(i)).toBeGreaterThan(gain(i - 1));
  });

  it('clamps to the signal: a peak near the start begins at sample 0 with no fade-in; a short signal ends at its end', () => {
    const short = impulseWindow({ samples: pulse(9600, 100, 5), sampleRateHz: fs }); // 200 ms
    expect(short.startSample).toBe(0);
    expect(short.fadeInSamples).toBe(0);
    expect(short.lengthSamples).toBe(9600);
  });

  it('takes the caller’s start and length (ms, to the nearest sample)', () => {
    const custom = impulseWindow({ samples, sampleRateHz: fs, startMs: 295, lengthMs: 100 });
    expect(custom.startSample).toBe(14160);
    expect(custom.lengthSamples).toBe(4800);
    expect(custom.fadeInSamples).toBe(120); // half the 5 ms (240 samples) before the peak
    expect(custom.fadeOutSamples).toBe(960); // 20 % of 100 ms
  });
});

describe('impulseWindow refusals', () => {
  const samples = pulse(fs, 14400, 20);
  it('refuses windows outside the signal, naming startMs or lengthMs', () => {
    expect(() => impulseWindow({ samples, sampleRateHz: fs, startMs: -1 })).toThrow(/startMs must lie within the signal/);
    expect(() => impulseWindow({ samples, sampleRateHz: fs, startMs: 1000 })).toThrow(/startMs must lie within the signal/);
    expect(() => impulseWindow({ samples, sampleRateHz: fs, startMs: 200, lengthMs: 900 })).toThrow(/lengthMs reaches past the end/);
    expect(() => impulseWindow({ samples, sampleRateHz: fs, startMs: 200, lengthMs: 0.5 })).toThrow(/lengthMs must be at least 1 ms/);
  });
  it('refuses windows that miss the arrival', () => {
    expect(() => impulseWindow({ samples, sampleRateHz: fs, startMs: 310 })).toThrow(/startMs must be at or before the arrival/);
    expect(() => impulseWindow({ samples, sampleRateHz: fs, startMs: 100, lengthMs: 150 })).toThrow(/lengthMs must reach past the arrival/);
  });
  it('refuses silence, non-finite samples, too few samples and a bad rate', () => {
    expect(() => impulseWindow({ samples: new Float64Array(100), sampleRateHz: fs })).toThrow(/silent/);
    expect(() => impulseWindow({ samples: [0, Number.NaN, 1], sampleRateHz: fs })).toThrow(/samples\[1\]/);
    expect(() => impulseWindow({ samples: [1], sampleRateHz: fs })).toThrow(/at least 2 samples/);
    expect(() => impulseWindow({ samples, sampleRateHz: 0 })).toThrow(/sampleRateHz/);
    expect(() => impulseWindow({ samples, sampleRateHz: fs, startMs: Number.NaN })).toThrow(/startMs/);
  });
});
