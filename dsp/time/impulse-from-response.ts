import FFT from 'fft.js';
import { assertFinite, assertInRange } from '../internal/guards';
import { stepFromImpulse } from './step-from-impulse';
import { uniformSpectrum } from './uniform-spectrum';

/**
 * Defaults of {@link impulseFromResponse}: 8 kHz — four times 2 kHz, the top of what bass work looks at — gives
 * 0.125 ms samples; the window runs from 20 ms before the response's time origin to 300 ms after it.
 */
export const TIME_VIEW_DEFAULTS = { sampleRateHz: 8000, startMs: -20, stopMs: 300 } as const;
/** The FFT spans at least this long, s (and at least four windows), so the circular wrap lands far outside the window. */
const MIN_FFT_SPAN_S = 4;
/** The longest window, ms. */
const MAX_WINDOW_MS = 1000;

/** Options of {@link impulseFromResponse}. */
export interface ImpulseFromResponseOptions {
  /** The response's grid (e.g. a blend's or a measurement's log grid), ascending, Hz. */
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  /** True phase relative to the response's own time origin (so a delayed path shows its delay), degrees. */
  readonly phaseDeg: Float64Array | readonly number[];
  /** 1 kHz … 48 kHz; default 8 kHz. */
  readonly sampleRateHz?: number;
  /** Window start, ms from the time origin (may be negative); default −20 ms. */
  readonly startMs?: number;
  /** Window end, ms; default 300 ms; at most 1000 ms after startMs. */
  readonly stopMs?: number;
}

/** Impulse and step response over a window of time. */
export interface TimeResponse {
  /** Sample times, ms from the response's time origin, 1000/sampleRateHz apart. */
  readonly timeMs: Float64Array;
  /** The impulse response h(t), 1/s (a flat 0 dB response band-limited to B Hz peaks near 2B). */
  readonly impulsePerS: Float64Array;
  /** The step response (running integral of h), dimensionless: a flat 0 dB response's step ends at 1. */
  readonly step: Float64Array;
  readonly sampleRateHz: number;
  readonly fftSize: number;
  /** The response is used as given up to here and tapered to zero over the octave above, Hz. */
  readonly bandTopHz: number;
}

function nextPowerOfTwo(n: number): number {
  let p = 16;
  while (p < n) p *= 2;
  return p;
}

/**
 * Impulse and step response of a complex response given on a grid (a blend's paths or sum, or a measured curve with
 * phase): the response is put on a uniform FFT grid ({@link uniformSpectrum}: band-limited to the curve's top or fs/4
 * with a one-octave half-Hann taper above, the lowest point's level held down to 0 Hz), inverted with fft.js's inverse
 * FFT of the Hermitian-completed spectrum, h[n] = (1/N)·Σ_k H_k·e^(j2πkn/N) (A. V. Oppenheim and R. W. Schafer,
 * "Discrete-Time Signal Processing", published), scaled by fs to a sampled h(t) in 1/s, and read over the window — the
 * negative times from the end of the circular result. The FFT spans at least 4 s (0.25 Hz bins at most). The step is
 * {@link stepFromImpulse} from the window's start.
 * @example impulseFromResponse({ frequencyHz: gridHz, magnitudeDb: gridHz.map(() => 0), phaseDeg: gridHz.map((f) => -360 * f * 0.005) }) // a 5 ms delay: the impulse peaks at timeMs 5, the step ends at 1
 */
export function impulseFromResponse(options: ImpulseFromResponseOptions): TimeResponse {
  const sampleRateHz = options.sampleRateHz ?? TIME_VIEW_DEFAULTS.sampleRateHz;
  const startMs = options.startMs ?? TIME_VIEW_DEFAULTS.startMs;
  const stopMs = options.stopMs ?? TIME_VIEW_DEFAULTS.stopMs;
  assertInRange('sampleRateHz', sampleRateHz, 1000, 48_000);
  assertFinite('startMs', startMs);
  assertFinite('stopMs', stopMs);
  if (!(stopMs > startMs)) throw new RangeError(`stopMs must be after startMs (got ${stopMs} ≤ ${startMs})`);
  if (stopMs - startMs > MAX_WINDOW_MS) throw new RangeError(`stopMs − startMs must be at most ${MAX_WINDOW_MS} ms (got ${stopMs - startMs})`);

  const spanSamples = Math.max(MIN_FFT_SPAN_S * sampleRateHz, (4 * (Math.abs(startMs) + Math.abs(stopMs)) * sampleRateHz) / 1000);
  const fftSize = nextPowerOfTwo(spanSamples);
  const { re, im, bandTopHz } = uniformSpectrum({ ...options, sampleRateHz, fftSize });

  const fft = new FFT(fftSize);
  const spectrum = fft.createComplexArray() as number[];
  for (let k = 0; k < re.length; k++) {
    spectrum[2 * k] = re[k] as number;
    spectrum[2 * k + 1] = im[k] as number;
  }
  fft.completeSpectrum(spectrum);
  const signal = fft.createComplexArray() as number[];
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
  return { timeMs, impulsePerS, step: stepFromImpulse({ impulsePerS, sampleRateHz }), sampleRateHz, fftSize, bandTopHz };
}
