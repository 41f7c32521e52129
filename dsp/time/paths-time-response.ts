import { speedOfSoundMps } from '../air/speed-of-sound';
import type { PathSpec } from '../blend/blend-types';
import { compilePath } from '../blend/path-plan';
import { pathResponse } from '../blend/path-response';
import { assertTemperature } from '../internal/guards';
import { gaussianBandLimit, gaussianBandLimitMinus3DbHz } from './gaussian-band-limit';
import { impulseFromBins, type TimeSignal } from './impulse-from-bins';
import { timeWindow, type TimeWindowOptions } from './time-window';

/** The frequency the 0 Hz bin is read at, as a share of the bin spacing: low enough that a delay turns no phase there. */
const DC_PROBE_SHARE = 1e-4;
/**
 * The FFT spans at least 2 s (0.5 Hz bins): a model's paths — crossover filters, roll-offs, EQ — have rung down long
 * before (even a Q 10 filter at 20 Hz decays to e^(−2π·20·2/(2·10)) ≈ 4e-6 by then), and half the span of a measured
 * room's is half the work a sweep does every frame.
 */
const MODEL_SPAN_S = 2;

/**
 * The last few paths' weighted spectra, by path, FFT and temperature: a Lesson sweep changes one path a frame (a sub's
 * distance, a polarity), so the others are not evaluated again. Read only, never changed once made.
 */
const SPECTRA = new Map<string, { re: Float64Array; im: Float64Array }>();
const SPECTRA_KEPT = 12;
function recall(key: string) {
  const hit = SPECTRA.get(key);
  if (hit) {
    SPECTRA.delete(key);
    SPECTRA.set(key, hit);
  }
  return hit;
}
function remember(key: string, spectrum: { re: Float64Array; im: Float64Array }) {
  SPECTRA.set(key, spectrum);
  if (SPECTRA.size > SPECTRA_KEPT) SPECTRA.delete(SPECTRA.keys().next().value as string);
  return spectrum;
}

/** The bins 1 … N/2 − 1 of an FFT and their band-limit weights, made once per size (a sweep reuses them every frame). */
const BINS = new Map<string, { binsHz: Float64Array; weights: Float64Array }>();
function binsOf(fftSize: number, sampleRateHz: number) {
  const key = `${fftSize}@${sampleRateHz}`;
  let bins = BINS.get(key);
  if (!bins) {
    const count = fftSize / 2 - 1;
    const binsHz = new Float64Array(count);
    const weights = new Float64Array(count);
    for (let i = 0; i < count; i++) {
      binsHz[i] = ((i + 1) * sampleRateHz) / fftSize;
      weights[i] = gaussianBandLimit(binsHz[i] as number, sampleRateHz);
    }
    bins = { binsHz, weights };
    BINS.set(key, bins);
  }
  return bins;
}

/** Options of {@link pathsTimeResponse}. */
export interface PathsTimeResponseOptions extends TimeWindowOptions {
  /** The paths as every evaluation sums them (dsp systemPaths). At least one. */
  readonly paths: readonly PathSpec[];
  /** Air temperature for the air paths, °C; default 20. */
  readonly temperatureC?: number;
}

/** One path in time, and when its sound arrives. */
export interface PathTimeSignal extends TimeSignal {
  readonly name: string;
  /** Its pure delay — processor delay plus air path — ms from the time origin (where its first sound can arrive). */
  readonly arrivalMs: number;
}

/** Every path and their sum in time, from one time origin: the signal entering the processor. */
export interface PathsTimeResponse {
  /** Sample times, ms (every path's and the sum's). */
  readonly timeMs: Float64Array;
  readonly paths: readonly PathTimeSignal[];
  /** The complex sum of the paths, in time: sample by sample the sum of theirs. */
  readonly sum: TimeSignal;
  readonly sampleRateHz: number;
  readonly fftSize: number;
  /** Where the Gaussian band limit every response is seen through is −3 dB, Hz ({@link gaussianBandLimit}). */
  readonly bandLimitMinus3DbHz: number;
}

/**
 * The impulse and step response of each path and of their sum, from the exact complex response of each path
 * ({@link pathResponse}: filter, roll-offs, EQ, gain, polarity, processor delay and air path, the same plan Blend sums)
 * evaluated on the FFT's own bins — no interpolation — and seen through a Gaussian band limit ({@link gaussianBandLimit}:
 * −0.45 dB at 300 Hz, −3 dB at 775 Hz at 8 kHz), which never rings, so nothing shows before a path's sound arrives but a
 * fraction of a millisecond's smear; the 0 Hz bin is the real part of the response a ten-thousandth of a bin above 0 Hz. The sum's
 * spectrum is the bins' complex sum, and the inverse FFT ({@link impulseFromBins}) is linear, so the sum in time is the
 * paths' sum sample by sample. Every time is from the signal entering the processor: a path's impulse comes at its
 * processor delay plus its air path plus its filters' own delay. Our own composition of the pieces named.
 * @example pathsTimeResponse({ paths: systemPaths(model), temperatureC: 20 }).paths[1].arrivalMs // the sub's delay + air path, ms
 */
export function pathsTimeResponse(options: PathsTimeResponseOptions): PathsTimeResponse {
  const { paths } = options;
  const temperatureC = options.temperatureC ?? 20;
  assertTemperature('temperatureC', temperatureC);
  if (!Array.isArray(paths) || paths.length === 0) throw new RangeError('paths must hold at least one path');
  const window = timeWindow({ minSpanS: MODEL_SPAN_S, ...options });
  const { fftSize, sampleRateHz } = window;
  const half = fftSize / 2;
  const binHz = sampleRateHz / fftSize;
  // Bins 1 … half − 1 (the band limit is 1e-4 at sampleRateHz/2: that bin is left at 0), each with its weight.
  const { binsHz, weights } = binsOf(fftSize, sampleRateHz);
  const speedMps = speedOfSoundMps(temperatureC);

  const sumRe = new Float64Array(half + 1);
  const sumIm = new Float64Array(half + 1);
  const out = paths.map((path, p): PathTimeSignal => {
    const { delayS } = compilePath(path, speedMps, `paths[${p}]`);
    const key = `${fftSize}@${sampleRateHz}|${temperatureC}|${JSON.stringify(path)}`;
    let spectrum = recall(key);
    if (!spectrum) {
      const r = pathResponse(path, binsHz, temperatureC);
      const re = new Float64Array(half + 1);
      const im = new Float64Array(half + 1);
      re[0] = pathResponse(path, [DC_PROBE_SHARE * binHz], temperatureC).re[0] as number;
      for (let k = 1; k < half; k++) {
        const w = weights[k - 1] as number;
        re[k] = w * (r.re[k - 1] as number);
        im[k] = w * (r.im[k - 1] as number);
      }
      spectrum = remember(key, { re, im });
    }
    const { re, im } = spectrum;
    for (let k = 0; k <= half; k++) {
      sumRe[k] = (sumRe[k] as number) + (re[k] as number);
      sumIm[k] = (sumIm[k] as number) + (im[k] as number);
    }
    return { name: path.name, arrivalMs: delayS * 1000, ...impulseFromBins({ re, im, window }) };
  });
  const sum = impulseFromBins({ re: sumRe, im: sumIm, window });
  return { timeMs: sum.timeMs, paths: out, sum, sampleRateHz, fftSize, bandLimitMinus3DbHz: gaussianBandLimitMinus3DbHz(sampleRateHz) };
}
