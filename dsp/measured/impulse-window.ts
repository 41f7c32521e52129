import { assertFiniteArray, assertPositive, assertFinite } from '../internal/guards';

/** Default start of the window: this long before the arrival (the peak), ms; clamped to the signal's first sample. */
export const DEFAULT_PRE_ARRIVAL_MS = 20;
/** Default window length, ms; clamped to the signal's end. */
export const DEFAULT_WINDOW_LENGTH_MS = 500;
/** Longest half-Hann fade-in, ms; it never covers more than the first half of the time from the start to the peak, and is 0 when the window starts at sample 0. */
export const MAX_FADE_IN_MS = 10;
/** Share of the window's length the half-Hann fade-out covers (never more than half the time from the peak to the end). */
export const FADE_OUT_SHARE = 0.2;
/** Shortest window, ms. */
export const MIN_WINDOW_MS = 1;
/** Longest window, samples (2^21: over 10 s at 192 kHz; the transform pads it to at most 2^22). */
export const MAX_WINDOW_SAMPLES = 2 ** 21;

/** Options of {@link impulseWindow}. */
export interface ImpulseWindowOptions {
  /** The impulse response, in its own units (e.g. full scale); sample 0 is time 0. */
  readonly samples: Float64Array | readonly number[];
  readonly sampleRateHz: number;
  /** Window start from the signal's first sample, ms; default: the arrival − 20 ms, clamped to 0. */
  readonly startMs?: number;
  /** Window length, ms; default 500 ms, clamped to the signal's end. */
  readonly lengthMs?: number;
}

/** A windowed impulse response: the samples inside the window, faded, and where the window and the peak lie. */
export interface ImpulseWindow {
  readonly sampleRateHz: number;
  /** The window's samples (signal × window), lengthSamples long; index 0 is the signal's sample startSample. */
  readonly windowedSamples: Float64Array;
  readonly startSample: number;
  readonly lengthSamples: number;
  readonly startMs: number;
  readonly lengthMs: number;
  readonly fadeInSamples: number;
  readonly fadeOutSamples: number;
  /** The sample of largest |x|, refined by a parabola through it and its neighbours (within ±0.5 sample). */
  readonly peakSample: number;
  /** peakSample / sampleRateHz, ms from the signal's first sample. */
  readonly arrivalMs: number;
}

/** Index of the largest |x| (the first if tied) and its parabolic refinement (a fraction of a sample, ±0.5 at most). */
function refinedPeakSample(x: Float64Array | readonly number[]): { index: number; refined: number } {
  let index = 0;
  let largest = -1;
  for (let i = 0; i < x.length; i++) {
    const a = Math.abs(x[i] as number);
    if (a > largest) {
      largest = a;
      index = i;
    }
  }
  if (largest === 0) throw new RangeError('samples are silent (every sample is 0): no arrival to find');
  if (index === 0 || index === x.length - 1) return { index, refined: index };
  // Parabola through the peak and its neighbours (sign-corrected, so a negative peak refines the same way); from memory.
  const s = Math.sign(x[index] as number);
  const left = s * (x[index - 1] as number);
  const mid = s * (x[index] as number);
  const right = s * (x[index + 1] as number);
  const curvature = left - 2 * mid + right;
  const offset = curvature < 0 ? (0.5 * (left - right)) / curvature : 0;
  return { index, refined: index + Math.max(-0.5, Math.min(0.5, offset)) };
}

/** Half-Hann rise over n samples: 0.5·(1 − cos(π·(i + 0.5)/n)), i = 0…n−1 (never exactly 0 or 1). */
function halfHannRise(i: number, n: number): number {
  return 0.5 * (1 - Math.cos((Math.PI * (i + 0.5)) / n));
}

/**
 * The window an impulse response is cut with before its transform. The arrival is the peak: the sample of largest |x|,
 * refined by parabolic interpolation. Defaults (common practice, our own numbers): start 20 ms before the arrival
 * (clamped to the first sample), 500 ms long (clamped to the signal's end). Fades (half-Hann): a fade-in over the first
 * min(10 ms, half the time from the start to the peak) — none when the window starts at the signal's first sample, which
 * cuts nothing off — and a fade-out over the last min(20 % of the length, half the
 * time from the peak to the end), so the samples near the peak are never touched. A window given by the caller must lie
 * within the signal, contain the peak and be at least 1 ms long; otherwise RangeError naming startMs or lengthMs.
 * @example impulseWindow({ samples: [0, 0, 1, 0.5, 0.25, 0, 0, 0], sampleRateHz: 1000 }).peakSample // 2.1666… (sample 2, refined toward its larger neighbour)
 */
export function impulseWindow({ samples, sampleRateHz, startMs, lengthMs }: ImpulseWindowOptions): ImpulseWindow {
  assertPositive('sampleRateHz', sampleRateHz);
  if (samples.length < 2) throw new RangeError(`samples must hold at least 2 samples (got ${samples.length})`);
  assertFiniteArray('samples', samples);
  const n = samples.length;
  const peak = refinedPeakSample(samples);
  const perMs = sampleRateHz / 1000;

  let start: number;
  if (startMs === undefined) {
    start = Math.max(0, Math.round(peak.index - DEFAULT_PRE_ARRIVAL_MS * perMs));
  } else {
    assertFinite('startMs', startMs);
    start = Math.round(startMs * perMs);
    if (start < 0 || start >= n) {
      throw new RangeError(`startMs must lie within the signal, 0 to ${((n - 1) / perMs).toFixed(3)} ms (got ${startMs})`);
    }
    if (start > peak.index) {
      throw new RangeError(`startMs must be at or before the arrival (the peak at ${(peak.refined / perMs).toFixed(3)} ms; got ${startMs})`);
    }
  }
  let length: number;
  if (lengthMs === undefined) {
    length = Math.min(n - start, Math.round(DEFAULT_WINDOW_LENGTH_MS * perMs));
  } else {
    assertFinite('lengthMs', lengthMs);
    length = Math.round(lengthMs * perMs);
    if (lengthMs < MIN_WINDOW_MS) throw new RangeError(`lengthMs must be at least ${MIN_WINDOW_MS} ms (got ${lengthMs})`);
    if (start + length > n) {
      throw new RangeError(`lengthMs reaches past the end of the signal: at most ${((n - start) / perMs).toFixed(3)} ms from this start (got ${lengthMs})`);
    }
  }
  if (length > MAX_WINDOW_SAMPLES) throw new RangeError(`lengthMs gives ${length} samples; at most ${MAX_WINDOW_SAMPLES} are allowed`);
  if (start + length <= peak.index) {
    throw new RangeError(`lengthMs must reach past the arrival (the peak at ${(peak.refined / perMs).toFixed(3)} ms; got ${lengthMs ?? DEFAULT_WINDOW_LENGTH_MS})`);
  }
  if (length < 2) throw new RangeError(`the window holds ${length} sample(s); it needs at least 2`);

  // A window that starts at the signal's first sample cuts nothing off, so it needs no fade-in.
  const fadeIn = start === 0 ? 0 : Math.min(Math.round(MAX_FADE_IN_MS * perMs), Math.floor((peak.index - start) / 2));
  const fadeOut = Math.min(Math.round(FADE_OUT_SHARE * length), Math.floor((start + length - 1 - peak.index) / 2));
  const windowed = new Float64Array(length);
  for (let i = 0; i < length; i++) {
    let w = 1;
    if (i < fadeIn) w = halfHannRise(i, fadeIn);
    else if (i >= length - fadeOut) w = halfHannRise(length - 1 - i, fadeOut);
    windowed[i] = w * (samples[start + i] as number);
  }
  return {
    sampleRateHz,
    windowedSamples: windowed,
    startSample: start,
    lengthSamples: length,
    startMs: start / perMs,
    lengthMs: length / perMs,
    fadeInSamples: fadeIn,
    fadeOutSamples: fadeOut,
    peakSample: peak.refined,
    arrivalMs: peak.refined / perMs,
  };
}
