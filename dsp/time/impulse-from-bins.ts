import FFT from 'fft.js';
import { assertFiniteArray, assertSameLength } from '../internal/guards';
import { stepFromImpulse } from './step-from-impulse';
import type { TimeWindow } from './time-window';

/**
 * An fft.js instance and two scratch arrays for each size: building the instance computes its tables and zeroing 2·N
 * doubles twice costs as much as a transform (a Lesson sweep runs several a frame). Safe to reuse: the work is
 * synchronous and every entry is written before it is read. Typed arrays: fft.js indexes them like its own.
 */
const WORKSPACES = new Map<number, { fft: FFT; spectrum: Float64Array; signal: Float64Array }>();
function workspaceOfSize(size: number) {
  let w = WORKSPACES.get(size);
  if (!w) {
    w = { fft: new FFT(size), spectrum: new Float64Array(2 * size), signal: new Float64Array(2 * size) };
    WORKSPACES.set(size, w);
  }
  return w;
}

/** Options of {@link impulseFromBins}. */
export interface ImpulseFromBinsOptions {
  /** Bins k = 0 … fftSize/2 of a real signal's spectrum, at k·sampleRateHz/fftSize Hz (im[0] and im[fftSize/2] ignored). */
  readonly re: Float64Array | readonly number[];
  readonly im: Float64Array | readonly number[];
  /** The window to read and the FFT's length ({@link timeWindow}). */
  readonly window: TimeWindow;
}

/** Impulse and step response over a window of time. */
export interface TimeSignal {
  /** Sample times, ms from the response's time origin, 1000/sampleRateHz apart. */
  readonly timeMs: Float64Array;
  /** The impulse response h(t), 1/s (a flat 0 dB response band-limited to B Hz peaks near 2B). */
  readonly impulsePerS: Float64Array;
  /** The step response (running integral of h from the window's start), dimensionless: a flat 0 dB response's step ends at 1. */
  readonly step: Float64Array;
}

/**
 * The impulse and step response of one half of a real signal's spectrum on an FFT's bins: fft.js's inverse FFT of the
 * Hermitian-completed spectrum, h[n] = (1/N)·Σ_k H_k·e^(j2πkn/N) (A. V. Oppenheim and R. W. Schafer, "Discrete-Time
 * Signal Processing", published), scaled by fs to a sampled h(t) in 1/s and read over the window — the negative times
 * from the end of the circular result. Linear in the bins: the response of a sum of spectra is the sum of their
 * responses. The step is {@link stepFromImpulse} from the window's start.
 * @example impulseFromBins({ re: ones, im: zeros, window: timeWindow({}) }).impulsePerS // fs at t = 0: a unit sample
 */
export function impulseFromBins({ re, im, window }: ImpulseFromBinsOptions): TimeSignal {
  const { fftSize, sampleRateHz, startMs, stopMs } = window;
  const bins = fftSize / 2 + 1;
  assertSameLength('re', re, bins);
  assertSameLength('im', im, bins);
  assertFiniteArray('re', re);
  assertFiniteArray('im', im);

  const { fft, spectrum, signal } = workspaceOfSize(fftSize);
  for (let k = 0; k < bins; k++) {
    spectrum[2 * k] = re[k] as number;
    // Real at 0 Hz and at the Nyquist frequency.
    spectrum[2 * k + 1] = k === 0 || k === bins - 1 ? 0 : (im[k] as number);
  }
  fft.completeSpectrum(spectrum);
  fft.inverseTransform(signal, spectrum); // divides by N

  const first = Math.ceil((startMs * sampleRateHz) / 1000 - 1e-9);
  const lastSample = Math.floor((stopMs * sampleRateHz) / 1000 + 1e-9);
  const count = lastSample - first + 1;
  const timeMs = new Float64Array(count);
  const impulsePerS = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    const n = first + i;
    const index = ((n % fftSize) + fftSize) % fftSize;
    timeMs[i] = (n * 1000) / sampleRateHz;
    impulsePerS[i] = (signal[2 * index] as number) * sampleRateHz;
  }
  return { timeMs, impulsePerS, step: stepFromImpulse({ impulsePerS, sampleRateHz }) };
}
