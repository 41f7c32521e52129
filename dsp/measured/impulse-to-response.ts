import FFT from 'fft.js';
import { logFrequencyGridHz } from '../grid/log-frequency-grid';
import { RAD_TO_DEG, LN_POWER_TO_DB, wrapDeg } from '../internal/angles';
import { assertPositive } from '../internal/guards';
import type { ImpulseWindow } from './impulse-window';

/** Default grid of the complex response: 10 Hz–20 kHz, 48 points per octave, kept below 0.45·fs. */
export const IMPULSE_GRID_DEFAULTS = { startHz: 10, stopHz: 20_000, pointsPerOctave: 48 } as const;
/** Highest frequency of the grid as a share of the sample rate (clear of the anti-alias filter's roll-off). */
export const MAX_SHARE_OF_SAMPLE_RATE = 0.45;
/** Magnitudes below this (a bin of exact zeros) are reported at this level, dB. */
export const MAGNITUDE_FLOOR_DB = -200;

/** Options of {@link impulseToResponse}. */
export interface ImpulseToResponseOptions {
  /** The windowed impulse response ({@link impulseWindow}). */
  readonly window: ImpulseWindow;
  readonly startHz?: number;
  readonly stopHz?: number;
  readonly pointsPerOctave?: number;
}

/** The complex response of an impulse response on a log grid. */
export interface ImpulseResponseCurve {
  readonly frequencyHz: Float64Array;
  /** 20·log10|H|, dB re the impulse's units (a unit impulse → 0 dB). */
  readonly magnitudeDb: Float64Array;
  /** True phase, including the arrival delay from the signal's first sample, wrapped to (−180, 180], degrees. */
  readonly phaseDeg: Float64Array;
  /** The arrival (the peak), ms from the signal's first sample. */
  readonly arrivalMs: number;
  /** The FFT's length after zero-padding (a power of two, at least twice the window). */
  readonly fftSize: number;
  /** sampleRateHz / window length: the finest detail the window can show, Hz. */
  readonly frequencyResolutionHz: number;
}

function nextPowerOfTwo(n: number): number {
  let p = 16;
  while (p < n) p *= 2;
  return p;
}

/**
 * The complex response H(f) = Σ x[n]·e^(−j2πf·n/fs) of a windowed impulse response on a log grid (default 10 Hz–20 kHz,
 * 48 points per octave, only up to 0.45·fs). The window is zero-padded to a power of two at least twice its length and
 * transformed with fft.js (a real FFT). Each grid point interpolates the two nearest FFT bins linearly in their real and
 * imaginary parts after the arrival delay is taken out (each bin times e^(+j2πk·τ/N), τ the peak's place in the window),
 * so the phase between bins is not smeared; the delay from the signal's first sample to the peak is then put back, so
 * the phase is the true phase. Discrete Fourier transform: A. V. Oppenheim and R. W. Schafer, "Discrete-Time Signal
 * Processing" (published); interpolation: our own, stated here.
 * @example impulseToResponse({ window: impulseWindow({ samples: [1, 0, 0, 0], sampleRateHz: 48000 }) }).magnitudeDb[0] // 0 (a unit impulse)
 */
export function impulseToResponse({ window, startHz, stopHz, pointsPerOctave }: ImpulseToResponseOptions): ImpulseResponseCurve {
  const fs = window.sampleRateHz;
  assertPositive('sampleRateHz', fs);
  const lowHz = startHz ?? IMPULSE_GRID_DEFAULTS.startHz;
  const topHz = Math.min(stopHz ?? IMPULSE_GRID_DEFAULTS.stopHz, MAX_SHARE_OF_SAMPLE_RATE * fs);
  assertPositive('startHz', lowHz);
  if (stopHz !== undefined) assertPositive('stopHz', stopHz);
  if (!(topHz > lowHz)) {
    throw new RangeError(`startHz must be below stopHz and below ${MAX_SHARE_OF_SAMPLE_RATE}·fs = ${MAX_SHARE_OF_SAMPLE_RATE * fs} Hz (got ${lowHz} Hz)`);
  }
  const frequencyHz = logFrequencyGridHz({ startHz: lowHz, stopHz: topHz, pointsPerOctave: pointsPerOctave ?? IMPULSE_GRID_DEFAULTS.pointsPerOctave });

  const x = window.windowedSamples;
  const size = nextPowerOfTwo(2 * x.length);
  const input = new Float64Array(size);
  input.set(x);
  const fft = new FFT(size);
  const spectrum = fft.createComplexArray() as number[];
  fft.realTransform(spectrum, input);

  const peakInWindow = window.peakSample - window.startSample;
  // The bin k with the peak's delay taken out: X[k]·e^(+j2πk·τ/N).
  const aligned = (k: number): [number, number] => {
    const re = spectrum[2 * k] as number;
    const im = spectrum[2 * k + 1] as number;
    const angle = (2 * Math.PI * k * peakInWindow) / size;
    const c = Math.cos(angle);
    const s = Math.sin(angle);
    return [re * c - im * s, re * s + im * c];
  };

  const magnitudeDb = new Float64Array(frequencyHz.length);
  const phaseDeg = new Float64Array(frequencyHz.length);
  for (let i = 0; i < frequencyHz.length; i++) {
    const f = frequencyHz[i] as number;
    const bin = (f * size) / fs;
    const k0 = Math.floor(bin);
    const t = bin - k0;
    const [re0, im0] = aligned(k0);
    const [re1, im1] = aligned(k0 + 1);
    const re = re0 + t * (re1 - re0);
    const im = im0 + t * (im1 - im0);
    const power = re * re + im * im;
    magnitudeDb[i] = power > 0 ? Math.max(MAGNITUDE_FLOOR_DB, LN_POWER_TO_DB * Math.log(power)) : MAGNITUDE_FLOOR_DB;
    // Put the delay from the signal's first sample to the peak back: the true phase.
    const delayDeg = (-360 * f * window.peakSample) / fs;
    phaseDeg[i] = wrapDeg(Math.atan2(im, re) * RAD_TO_DEG + wrapDeg(delayDeg));
  }
  return {
    frequencyHz,
    magnitudeDb,
    phaseDeg,
    arrivalMs: window.arrivalMs,
    fftSize: size,
    frequencyResolutionHz: fs / window.lengthSamples,
  };
}
