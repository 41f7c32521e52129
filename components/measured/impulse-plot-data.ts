/**
 * Pure helpers of the impulse window editor: where the window may lie in a recording (so the dsp's impulseWindow
 * accepts it), the plot's time spans, a min/max trace of the samples thinned to the plot's width, and the
 * window's gain shape (the same half-Hann fades as dsp/measured/impulse-window.ts) as points to draw.
 */

/** A window as the user sets it: start from the file's first sample and length, ms. */
export interface WindowChoice {
  startMs: number;
  lengthMs: number;
}

/** What the editor knows of a recording. */
export interface RecordingFacts {
  sampleRateHz: number;
  sampleCount: number;
  /** The sample of largest |x| (the first if tied): the window must start at or before it and end after it. */
  peakIndex: number;
}

/** Shortest window the dsp accepts, ms. */
const MIN_WINDOW_MS = 1;

/** Index of the largest |x|, the first if tied (the dsp's arrival, before its sub-sample refinement). */
export function peakIndex(samples: ArrayLike<number>): number {
  let index = 0;
  let largest = -1;
  for (let i = 0; i < samples.length; i++) {
    const a = Math.abs(samples[i] as number);
    if (a > largest) {
      largest = a;
      index = i;
    }
  }
  return index;
}

/** The ms value of a whole number of samples. */
const msOf = (samples: number, sampleRateHz: number) => (samples * 1000) / sampleRateHz;

/** The last sample a window may start on: the peak's, and no later than leaves 1 ms (and 2 samples) before the end. */
const lastStartSample = (rec: RecordingFacts) => Math.max(0, Math.min(rec.peakIndex, rec.sampleCount - Math.max(2, Math.round((MIN_WINDOW_MS * rec.sampleRateHz) / 1000))));

/**
 * The limits of a window in this recording: the start from 0 to the peak's sample (and 1 ms before the end); the
 * length from what reaches one sample past the peak (and at least 1 ms and 2 samples) to the file's last sample.
 * @example windowLimits({ sampleRateHz: 1000, sampleCount: 1000, peakIndex: 100 }, 40) → { maxStartMs: 100, minLengthMs: 61, maxLengthMs: 960 }
 */
export function windowLimits(rec: RecordingFacts, startMs: number): { maxStartMs: number; minLengthMs: number; maxLengthMs: number } {
  const last = lastStartSample(rec);
  const startSample = Math.max(0, Math.min(last, Math.round((startMs * rec.sampleRateHz) / 1000)));
  const minSamples = Math.max(2, rec.peakIndex - startSample + 1);
  return {
    maxStartMs: msOf(last, rec.sampleRateHz),
    minLengthMs: Math.max(MIN_WINDOW_MS, msOf(minSamples, rec.sampleRateHz)),
    maxLengthMs: msOf(rec.sampleCount - startSample, rec.sampleRateHz),
  };
}

/** The nearest window within {@link windowLimits}; the start is clamped first, then the length for that start. */
export function clampWindow(rec: RecordingFacts, choice: WindowChoice): WindowChoice {
  const startMs = Math.max(0, Math.min(msOf(lastStartSample(rec), rec.sampleRateHz), choice.startMs));
  const limits = windowLimits(rec, startMs);
  return { startMs, lengthMs: Math.max(limits.minLengthMs, Math.min(limits.maxLengthMs, choice.lengthMs)) };
}

/** A time in ms rounded to the nearest sample. */
export const snapToSampleMs = (ms: number, sampleRateHz: number) => msOf(Math.round((ms * sampleRateHz) / 1000), sampleRateHz);

export type ImpulseView = 'peak' | 'window' | 'file';

/** Span shown around the peak in the close-up, ms before and after it. */
export const PEAK_VIEW_MS = { before: 25, after: 75 } as const;

/**
 * The time span a view shows, ms: `peak` a close-up (25 ms before the peak to 75 ms after it), `window` the window
 * with a tenth of its length either side, `file` every sample; always within the file.
 */
export function viewSpanMs(view: ImpulseView, facts: { durationMs: number; arrivalMs: number; window: WindowChoice }): [number, number] {
  const { durationMs, arrivalMs, window } = facts;
  let from = 0;
  let to = durationMs;
  if (view === 'peak') {
    from = arrivalMs - PEAK_VIEW_MS.before;
    to = arrivalMs + PEAK_VIEW_MS.after;
  } else if (view === 'window') {
    const margin = 0.1 * window.lengthMs;
    from = window.startMs - margin;
    to = window.startMs + window.lengthMs + margin;
  }
  from = Math.max(0, from);
  to = Math.min(durationMs, to);
  return to > from ? [from, to] : [0, durationMs];
}

/** The samples in a span, thinned for drawing: every sample when they are few, else each column's lowest and highest. */
export type ImpulseTrace = { kind: 'line'; timeMs: number[]; value: number[] } | { kind: 'band'; timeMs: number[]; low: number[]; high: number[] };

/**
 * The samples from `fromMs` to `toMs` (scaled by `scale`, e.g. 1 / the peak's |x|): as a line through every sample
 * when there are at most two per column, otherwise one lowest–highest pair per column (so no peak is lost).
 */
export function impulseTrace(samples: ArrayLike<number>, sampleRateHz: number, span: readonly [number, number], columns: number, scale = 1): ImpulseTrace {
  const perMs = sampleRateHz / 1000;
  const first = Math.max(0, Math.floor(span[0] * perMs));
  const last = Math.min(samples.length - 1, Math.ceil(span[1] * perMs));
  const count = last - first + 1;
  const cols = Math.max(1, Math.floor(columns));
  if (count <= 2 * cols) {
    const timeMs: number[] = [];
    const value: number[] = [];
    for (let i = first; i <= last; i++) {
      timeMs.push(i / perMs);
      value.push((samples[i] as number) * scale);
    }
    return { kind: 'line', timeMs, value };
  }
  const timeMs: number[] = [];
  const low: number[] = [];
  const high: number[] = [];
  for (let c = 0; c < cols; c++) {
    const a = first + Math.floor((c * count) / cols);
    const b = first + Math.floor(((c + 1) * count) / cols);
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = a; i < b; i++) {
      const x = samples[i] as number;
      if (x < lo) lo = x;
      if (x > hi) hi = x;
    }
    timeMs.push((a + b - 1) / 2 / perMs);
    low.push(lo * scale);
    high.push(hi * scale);
  }
  return { kind: 'band', timeMs, low, high };
}

/** Half-Hann rise over n samples, as dsp/measured/impulse-window.ts fades: 0.5·(1 − cos(π·(i + 0.5)/n)). */
const rise = (i: number, n: number) => 0.5 * (1 - Math.cos((Math.PI * (i + 0.5)) / n));

/** Points of a fade drawn with at most this many steps. */
const FADE_STEPS = 32;

/**
 * The window's gain (0…1) against time, ms, as points for a line: 0 before the start, the half-Hann fade-in, 1, the
 * fade-out, 0 after the end. The sample counts come from the dsp's window (fadeInSamples, fadeOutSamples).
 */
export function windowGainPoints(w: { sampleRateHz: number; startSample: number; lengthSamples: number; fadeInSamples: number; fadeOutSamples: number }): [number, number][] {
  const ms = (sample: number) => msOf(sample, w.sampleRateHz);
  const end = w.startSample + w.lengthSamples - 1;
  const points: [number, number][] = [[ms(w.startSample), 0]];
  const fade = (n: number, at: (k: number) => number, gain: (k: number) => number) => {
    const steps = Math.min(n, FADE_STEPS);
    for (let s = 0; s < steps; s++) {
      const k = Math.round((s * (n - 1)) / Math.max(1, steps - 1));
      points.push([ms(at(k)), gain(k)]);
    }
  };
  fade(w.fadeInSamples, (k) => w.startSample + k, (k) => rise(k, w.fadeInSamples));
  points.push([ms(w.startSample + w.fadeInSamples), 1], [ms(end - w.fadeOutSamples), 1]);
  fade(w.fadeOutSamples, (k) => end - w.fadeOutSamples + 1 + k, (k) => rise(w.fadeOutSamples - 1 - k, w.fadeOutSamples));
  points.push([ms(end), 0]);
  return points;
}

/** The lowest frequency a window of this length resolves, ≈ 1 / length, Hz (common practice). */
export const lowestResolvedHz = (lengthMs: number) => 1000 / lengthMs;

/** "2", "3.3", "50": a frequency written for a sentence (two significant figures below 10 Hz, whole hertz above). */
export const hzWords = (hz: number) => (hz < 10 ? String(Number(hz.toPrecision(2))) : String(Math.round(hz)));
