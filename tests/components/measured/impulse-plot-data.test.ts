import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { clampWindow, hzWords, impulseTrace, lowestResolvedHz, peakIndex, snapToSampleMs, viewSpanMs, windowGainPoints, windowLimits } from '@/components/measured/impulse-plot-data';
import { impulseWindow } from '@/dsp/measured/impulse-window';

// The impulse window editor's pure helpers (issue 17). Expected values are worked by hand, or the dsp's own
// impulseWindow is the judge (it refuses a window outside the recording, before the peak or too short).

describe('windowLimits(rec, startMs)', () => {
  it('at 1 kHz, 1000 samples, peak at sample 100, start 40 ms: start up to 100 ms, length from 61 ms (one sample past the peak) to 960 ms (hand-worked)', () => {
    expect(windowLimits({ sampleRateHz: 1000, sampleCount: 1000, peakIndex: 100 }, 40)).toEqual({ maxStartMs: 100, minLengthMs: 61, maxLengthMs: 960 });
  });

  it('never asks for less than 1 ms, even when the start sits on the peak', () => {
    expect(windowLimits({ sampleRateHz: 48_000, sampleCount: 48_000, peakIndex: 1440 }, 30).minLengthMs).toBe(1);
  });

  it('keeps the start 1 ms before the end when the peak is in the last millisecond (1 kHz: the start at most sample 998 of 1000)', () => {
    expect(windowLimits({ sampleRateHz: 1000, sampleCount: 1000, peakIndex: 999 }, 999).maxStartMs).toBe(998);
  });
});

describe('clampWindow(rec, choice)', () => {
  it('moves a start after the peak back to the peak and a length past the end back to the end (hand-worked)', () => {
    const rec = { sampleRateHz: 1000, sampleCount: 1000, peakIndex: 100 };
    expect(clampWindow(rec, { startMs: 250, lengthMs: 5000 })).toEqual({ startMs: 100, lengthMs: 900 });
    expect(clampWindow(rec, { startMs: -3, lengthMs: 20 })).toEqual({ startMs: 0, lengthMs: 101 });
  });

  it('gives a window the dsp accepts, for any recording and any choice (judge: impulseWindow refuses what is out of bounds)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 100, max: 4000 }), // at least 1 ms at 96 kHz: a shorter file cannot hold the shortest window
        fc.constantFrom(8000, 44_100, 48_000, 96_000),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: -100, max: 2000, noNaN: true }),
        fc.double({ min: -100, max: 2000, noNaN: true }),
        (n, fs, peakAt, startMs, lengthMs) => {
          const peak = Math.min(n - 1, Math.floor(peakAt * n));
          const samples = Array.from({ length: n }, (_, i) => (i === peak ? 1 : 0.01 * Math.sin(i)));
          const rec = { sampleRateHz: fs, sampleCount: n, peakIndex: peakIndex(samples) };
          expect(rec.peakIndex).toBe(peak);
          const w = clampWindow(rec, { startMs, lengthMs });
          const cut = impulseWindow({ samples, sampleRateHz: fs, ...w });
          expect(cut.startSample).toBeLessThanOrEqual(peak);
          expect(cut.startSample + cut.lengthSamples).toBeLessThanOrEqual(n);
        },
      ),
      { numRuns: 300, seed: 17 },
    );
  });
});

describe('snapToSampleMs', () => {
  it('rounds to the nearest sample: 10.01 ms at 48 kHz is sample 480 (10 ms), 10.02 ms is sample 481 (hand-worked)', () => {
    expect(snapToSampleMs(10.01, 48_000)).toBe(10);
    expect(snapToSampleMs(10.02, 48_000)).toBeCloseTo(481 / 48, 12);
  });
});

describe('viewSpanMs(view, facts)', () => {
  const facts = { durationMs: 1000, arrivalMs: 30, window: { startMs: 10, lengthMs: 500 } };
  it('the peak close-up runs 25 ms before to 75 ms after the peak, clipped at 0 (hand-worked)', () => {
    expect(viewSpanMs('peak', facts)).toEqual([5, 105]);
    expect(viewSpanMs('peak', { ...facts, arrivalMs: 10 })).toEqual([0, 85]);
  });
  it('the window view adds a tenth of the length either side, within the file; the file view is all of it', () => {
    expect(viewSpanMs('window', facts)).toEqual([0, 560]);
    expect(viewSpanMs('window', { ...facts, window: { startMs: 600, lengthMs: 390 } })).toEqual([561, 1000]);
    expect(viewSpanMs('file', facts)).toEqual([0, 1000]);
  });
});

describe('impulseTrace(samples, fs, span, columns)', () => {
  const samples = Array.from({ length: 10_000 }, (_, i) => Math.sin(i * 0.37) * Math.exp(-i / 3000) + (i === 4321 ? 2 : 0));

  it('keeps every sample as a line when there are at most two per column', () => {
    const t = impulseTrace(samples, 1000, [100, 199], 60);
    expect(t.kind).toBe('line');
    if (t.kind === 'line') {
      expect(t.value).toEqual(samples.slice(100, 200));
      expect(t.timeMs[0]).toBe(100);
    }
  });

  it('thins many samples to each column’s lowest and highest, losing no extreme (brute force over the span)', () => {
    const t = impulseTrace(samples, 1000, [0, 9999], 300, 0.5);
    expect(t.kind).toBe('band');
    if (t.kind === 'band') {
      expect(t.high).toHaveLength(300);
      expect(Math.max(...t.high)).toBe(0.5 * Math.max(...samples));
      expect(Math.min(...t.low)).toBe(0.5 * Math.min(...samples));
      t.low.forEach((lo, c) => expect(lo).toBeLessThanOrEqual(t.high[c] as number));
    }
  });
});

describe('windowGainPoints(window)', () => {
  it('lies on the gain the dsp applied: windowed ÷ signal at every fade point and at both ends of the flat top', () => {
    const fs = 48_000;
    const samples = Array.from({ length: 48_000 }, (_, i) => (i === 2400 ? 1 : 0.1));
    for (const choice of [{}, { startMs: 30, lengthMs: 300 }, { startMs: 0, lengthMs: 100 }]) {
      const w = impulseWindow({ samples, sampleRateHz: fs, ...choice });
      const points = windowGainPoints(w);
      // The first and last points close the shape at 0 on the window's edges; the rest are gains of real samples.
      for (const [ms, gain] of points.slice(1, -1)) {
        const sample = Math.round((ms * fs) / 1000);
        const applied = (w.windowedSamples[sample - w.startSample] as number) / (samples[sample] as number);
        expect(gain).toBeCloseTo(applied, 12);
      }
      expect(points[0]).toEqual([w.startMs, 0]);
      expect(points.at(-1)?.[0]).toBeCloseTo(((w.startSample + w.lengthSamples - 1) * 1000) / fs, 9);
    }
  });
});

describe('lowestResolvedHz and hzWords', () => {
  it('a 500 ms window resolves about 2 Hz, 300 ms about 3.3 Hz, 20 ms about 50 Hz (1 / length; common practice)', () => {
    expect(hzWords(lowestResolvedHz(500))).toBe('2');
    expect(hzWords(lowestResolvedHz(300))).toBe('3.3');
    expect(hzWords(lowestResolvedHz(20))).toBe('50');
  });
});
