/**
 * An uploaded impulse response (WAV) → the points a measurement stores: the first channel read by readWav, cut with
 * the window (given, or the default: 20 ms before the peak, 500 ms long, half-Hann fades; dsp/measured/impulse-window)
 * and transformed (fft.js; dsp/measured/impulse-to-response) into the complex response on the default log grid
 * (10 Hz–20 kHz, 48 points per octave, never above 0.45·fs): magnitude in dB re full scale and the true phase, which
 * includes the delay from the file's first sample to the peak, wrapped to (−180, 180] like every phase the API answers
 * (text uploads keep the phase they were given; the curve tools unwrap either). Every refusal is a 400 naming the field
 * (`file`, `windowStartMs` or `windowLengthMs`). Pure: no I/O.
 */
import { impulseToResponse } from '@/dsp/measured/impulse-to-response';
import { impulseWindow } from '@/dsp/measured/impulse-window';
import { invalid } from '@/lib/errors';
import { readWav, WavReadError, type WavImpulse } from './read-wav';

/** The window fields of an upload (ms from the file's first sample); each optional. */
export interface ImpulseWindowFields {
  windowStartMs?: number;
  windowLengthMs?: number;
}

/** The window the impulse was read through, as stored. */
interface UsedWindow {
  startMs: number;
  lengthMs: number;
  fadeInMs: number;
  fadeOutMs: number;
}

/** What the upload answer says about the file and the window, beside the stored summary. */
export interface ImpulseDetails {
  format: WavImpulse['format'];
  bitsPerSample: number;
  channels: number;
  durationS: number;
  /** The loudest sample of the first channel, dB re full scale. */
  peakDbfs: number;
  /** The window, and whether its start and length were the defaults. */
  window: UsedWindow & { startIsDefault: boolean; lengthIsDefault: boolean };
  /** sampleRateHz / window length: the finest detail the window can show, Hz. */
  frequencyResolutionHz: number;
}

/** What an impulse upload stores (lib/data's NewMeasurementPoints) and the details the answer adds. */
export interface ImpulseMeasurement {
  points: {
    sourceFormat: 'wav';
    sampleRateHz: number;
    arrivalMs: number;
    impulseWindow: UsedWindow;
    frequencyHz: number[];
    magnitudeDb: number[];
    phaseDeg: number[];
    pointCount: number;
    startHz: number;
    stopHz: number;
    hasPhase: true;
  };
  details: ImpulseDetails;
}

/** A file clips when more than one sample of its first channel sits at full scale; one alone is a peak normalised to full scale. */
export const MAX_FULL_SCALE_SAMPLES = 1;
/** A recording whose loudest sample is below one step of a 16-bit file (2^−15, −90.3 dBFS) holds no impulse: silence. */
export const MIN_PEAK_FULL_SCALE = 2 ** -15;

const round = (x: number, digits: number) => {
  const p = 10 ** digits;
  return Math.round(x * p) / p;
};
const dbfs = (x: number) => 20 * Math.log10(x);
/** Rounded to 0.001° and kept in (−180, 180]. */
const phaseRounded = (deg: number) => {
  const r = round(deg, 3);
  return r <= -180 ? r + 360 : r;
};

/** Samples at full scale: the largest or smallest integer code (±(2^(n−1) − 1)/2^(n−1) after scaling), or |x| ≥ 1 for float. */
function fullScaleCount(wav: WavImpulse): number {
  const limit = wav.format === 'float' ? 1 : (2 ** (wav.bitsPerSample - 1) - 1) / 2 ** (wav.bitsPerSample - 1);
  let count = 0;
  for (const x of wav.samples) if (Math.abs(x) >= limit) count++;
  return count;
}

function readImpulseFile(bytes: Uint8Array): WavImpulse {
  try {
    return readWav(bytes);
  } catch (error) {
    if (error instanceof WavReadError) throw invalid(error.message, [{ path: 'file', message: `${error.where}: ${error.detail}` }]);
    throw error;
  }
}

function refuseLevel(wav: WavImpulse): number {
  let peak = 0;
  for (const x of wav.samples) peak = Math.max(peak, Math.abs(x));
  const clipped = wav.clipped ? fullScaleCount(wav) : 0;
  if (clipped > MAX_FULL_SCALE_SAMPLES) {
    const detail = `${clipped} samples of the first channel sit at full scale: the recording clipped. Turn the level down and measure again (a peak a few dB below full scale is enough); a file normalised to full scale may touch it with one sample only`;
    throw invalid(`The WAV file was refused: ${detail}.`, [{ path: 'file', message: detail }]);
  }
  if (peak < MIN_PEAK_FULL_SCALE) {
    const detail = `the loudest sample is ${dbfs(peak).toFixed(1).replace('-', '−')} dBFS, below one step of a 16-bit file (−90.3 dBFS): the recording is silent, so it holds no impulse response`;
    throw invalid(`The WAV file was refused: ${detail}.`, [{ path: 'file', message: detail }]);
  }
  return peak;
}

/** impulseWindow names `startMs`/`lengthMs`; the upload's fields are `windowStartMs`/`windowLengthMs`. */
function windowRefusal(error: RangeError): Error {
  const field = /^startMs\b/.test(error.message) ? 'windowStartMs' : /^lengthMs\b/.test(error.message) ? 'windowLengthMs' : 'file';
  const message = error.message.replace(/^(startMs|lengthMs)\b/, field === 'file' ? '$1' : field).replaceAll('the signal', 'the recording');
  return invalid(`${field}: ${message}`, [{ path: field, message }]);
}

/**
 * Reads an impulse response upload and computes what a measurement stores.
 * @example impulseMeasurement(wavBytes, {}).points.arrivalMs // 10.747 (an LR4 low-pass at 80 Hz delayed 5 ms, 48 kHz: its peak is 5.75 ms after its start)
 * @throws AppError 400 naming `file` (not a WAV it can read, clipped, silent, too short) or a window field (outside the recording, not containing the peak)
 */
export function impulseMeasurement(bytes: Uint8Array, fields: ImpulseWindowFields): ImpulseMeasurement {
  const wav = readImpulseFile(bytes);
  const peak = refuseLevel(wav);
  if (wav.samples.length < 2) {
    const detail = `the recording holds ${wav.samples.length} sample; an impulse response needs at least 2`;
    throw invalid(`The WAV file was refused: ${detail}.`, [{ path: 'file', message: detail }]);
  }
  let window;
  try {
    window = impulseWindow({ samples: wav.samples, sampleRateHz: wav.sampleRateHz, startMs: fields.windowStartMs, lengthMs: fields.windowLengthMs });
  } catch (error) {
    if (error instanceof RangeError) throw windowRefusal(error);
    throw error;
  }
  const curve = impulseToResponse({ window });
  const perMs = wav.sampleRateHz / 1000;
  const used: UsedWindow = {
    startMs: round(window.startMs, 6),
    lengthMs: round(window.lengthMs, 6),
    fadeInMs: round(window.fadeInSamples / perMs, 6),
    fadeOutMs: round(window.fadeOutSamples / perMs, 6),
  };
  const frequencyHz = Array.from(curve.frequencyHz, (f) => round(f, 6));
  return {
    points: {
      sourceFormat: 'wav',
      sampleRateHz: wav.sampleRateHz,
      arrivalMs: round(curve.arrivalMs, 6),
      impulseWindow: used,
      frequencyHz,
      magnitudeDb: Array.from(curve.magnitudeDb, (x) => round(x, 4)),
      phaseDeg: Array.from(curve.phaseDeg, phaseRounded),
      pointCount: frequencyHz.length,
      startHz: frequencyHz[0] as number,
      stopHz: frequencyHz[frequencyHz.length - 1] as number,
      hasPhase: true,
    },
    details: {
      format: wav.format,
      bitsPerSample: wav.bitsPerSample,
      channels: wav.channels,
      durationS: round(wav.durationS, 6),
      peakDbfs: round(dbfs(peak), 2),
      window: { ...used, startIsDefault: fields.windowStartMs === undefined, lengthIsDefault: fields.windowLengthMs === undefined },
      frequencyResolutionHz: round(curve.frequencyResolutionHz, 6),
    },
  };
}
