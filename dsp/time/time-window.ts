import { assertFinite, assertInRange } from '../internal/guards';

/**
 * Defaults of every time view: 8 kHz — four times 2 kHz, the top of what bass work looks at — gives 0.125 ms samples;
 * the window runs from 20 ms before the response's time origin to 300 ms after it.
 */
export const TIME_VIEW_DEFAULTS = { sampleRateHz: 8000, startMs: -20, stopMs: 300 } as const;
/** By default the FFT spans at least this long, s (and at least four windows), so the circular wrap lands far outside the window. */
const MIN_FFT_SPAN_S = 4;
/** The longest window, ms. */
const MAX_WINDOW_MS = 1000;

/** Options of {@link timeWindow}. */
export interface TimeWindowOptions {
  /** 1 kHz … 48 kHz; default 8 kHz. */
  readonly sampleRateHz?: number;
  /** Window start, ms from the response's time origin (may be negative); default −20 ms. */
  readonly startMs?: number;
  /** Window end, ms; default 300 ms; at most 1000 ms after startMs. */
  readonly stopMs?: number;
  /** The shortest span of the FFT, s (0.25 … 4; default 4): what comes later than this wraps round into the window. */
  readonly minSpanS?: number;
}

/** A checked window of time and the FFT that reaches it. */
export interface TimeWindow {
  readonly sampleRateHz: number;
  readonly startMs: number;
  readonly stopMs: number;
  /** A power of two spanning at least 4 s and four times the window's reach from 0. */
  readonly fftSize: number;
}

function nextPowerOfTwo(n: number): number {
  let p = 16;
  while (p < n) p *= 2;
  return p;
}

/**
 * The window of a time view with its defaults filled in and checked (RangeError naming the option), and the FFT length
 * that shows it without the circular wrap reaching in: at least minSpanS (default 4 s: 0.25 Hz bins at most) and four
 * times (|startMs| + |stopMs|). Our own choices, stated here.
 * @example timeWindow({}).fftSize // 32768 (4.1 s at 8 kHz)
 */
export function timeWindow(options: TimeWindowOptions = {}): TimeWindow {
  const sampleRateHz = options.sampleRateHz ?? TIME_VIEW_DEFAULTS.sampleRateHz;
  const startMs = options.startMs ?? TIME_VIEW_DEFAULTS.startMs;
  const stopMs = options.stopMs ?? TIME_VIEW_DEFAULTS.stopMs;
  assertInRange('sampleRateHz', sampleRateHz, 1000, 48_000);
  assertFinite('startMs', startMs);
  assertFinite('stopMs', stopMs);
  if (!(stopMs > startMs)) throw new RangeError(`stopMs must be after startMs (got ${stopMs} ≤ ${startMs})`);
  if (stopMs - startMs > MAX_WINDOW_MS) throw new RangeError(`stopMs − startMs must be at most ${MAX_WINDOW_MS} ms (got ${stopMs - startMs})`);
  const minSpanS = options.minSpanS ?? MIN_FFT_SPAN_S;
  assertInRange('minSpanS', minSpanS, 0.25, MIN_FFT_SPAN_S);
  const spanSamples = Math.max(minSpanS * sampleRateHz, (4 * (Math.abs(startMs) + Math.abs(stopMs)) * sampleRateHz) / 1000);
  return { sampleRateHz, startMs, stopMs, fftSize: nextPowerOfTwo(spanSamples) };
}
