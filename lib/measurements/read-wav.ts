/**
 * Reads an impulse response from a WAV file (RIFF/WAVE: Microsoft/IBM, "Multimedia Programming Interface and Data
 * Specifications 1.0", 1991): 16-, 24- or 32-bit integer PCM or 32-bit IEEE float, plain or WAVE_FORMAT_EXTENSIBLE,
 * 8–192 kHz, at most 10 s; the first channel, scaled to ±1 (an n-bit integer divided by 2^(n−1), common practice).
 * Every refusal is a {@link WavReadError} (a RangeError, so a route answers it with a 400) naming what is wrong.
 * Pure: no I/O; the upload route (server) and the upload control (browser) can both use it.
 */
import { readWavChunks, WavReadError, type WavFormat } from './wav-chunks';

export { WavReadError, MIN_WAV_SAMPLE_RATE_HZ, MAX_WAV_SAMPLE_RATE_HZ, SUPPORTED_WAV_ENCODINGS } from './wav-chunks';

export const MAX_WAV_DURATION_S = 10;
/** Largest WAV upload, bytes: 10 s × 192 kHz × 4 bytes of one channel, or the first channel of a stereo 96 kHz file (the browser and the server both check it). */
export const MAX_WAV_BYTES = 16 * 1024 * 1024;

export interface WavImpulse {
  sampleRateHz: number;
  /** Channels in the file; only the first is read. */
  channels: number;
  /** The container size of one sample: 16, 24 or 32. */
  bitsPerSample: number;
  format: 'pcm' | 'float';
  /** The first channel, scaled so that integer full scale is ±1. */
  samples: Float64Array;
  durationS: number;
  /** True when a sample of the first channel is at full scale (the largest or smallest integer code; |x| ≥ 1 for float). */
  clipped: boolean;
}

const seconds = (s: number) => `${Number(s.toPrecision(6))} s`;

/** The first channel's samples, scaled to ±1, and whether any sat at full scale. */
function firstChannel(view: DataView, format: WavFormat, offset: number, frames: number): { samples: Float64Array; clipped: boolean } {
  const samples = new Float64Array(frames);
  const step = format.frameBytes;
  let clipped = false;
  if (format.encoding === 'float') {
    for (let i = 0, at = offset; i < frames; i++, at += step) {
      const x = view.getFloat32(at, true);
      if (!Number.isFinite(x)) {
        throw new WavReadError(`data chunk, sample ${i + 1}`, `the value is ${x} (at ${seconds(i / format.sampleRateHz)}); float samples must be finite numbers`);
      }
      if (Math.abs(x) >= 1) clipped = true;
      samples[i] = x;
    }
    return { samples, clipped };
  }
  const fullScale = 2 ** (format.bitsPerSample - 1);
  const smallest = -fullScale;
  const largest = fullScale - 1;
  for (let i = 0, at = offset; i < frames; i++, at += step) {
    let code: number;
    if (format.bitsPerSample === 16) code = view.getInt16(at, true);
    else if (format.bitsPerSample === 32) code = view.getInt32(at, true);
    // 24-bit little-endian: the high byte carries the sign.
    else code = view.getUint8(at) | (view.getUint8(at + 1) << 8) | (view.getInt8(at + 2) * 65536);
    if (code === smallest || code === largest) clipped = true;
    samples[i] = code / fullScale;
  }
  return { samples, clipped };
}

/**
 * Reads a WAV file's first channel as samples scaled to ±1.
 * @example readWav(bytes) → { sampleRateHz: 48000, channels: 2, bitsPerSample: 24, format: 'pcm', samples, durationS: 0.5, clipped: false }
 * @throws {WavReadError} naming the part of the file and what is wrong (format, bit depth, rate, length, silence…)
 */
export function readWav(bytes: Uint8Array): WavImpulse {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const { format, data } = readWavChunks(view);
  const frameBytes = format.frameBytes;
  if (data.bytes % frameBytes !== 0) {
    throw new WavReadError('data chunk', `its ${data.bytes} bytes are not a whole number of ${frameBytes}-byte frames (${format.channels} × ${format.bitsPerSample} bits)`);
  }
  const frames = data.bytes / frameBytes;
  if (frames === 0) throw new WavReadError('data chunk', 'it holds no samples');
  const durationS = frames / format.sampleRateHz;
  if (frames > MAX_WAV_DURATION_S * format.sampleRateHz) {
    throw new WavReadError('data chunk', `the recording is ${seconds(durationS)} long; an impulse response may be at most ${MAX_WAV_DURATION_S} s (trim it)`);
  }
  const { samples, clipped } = firstChannel(view, format, data.offset, frames);
  if (samples.every((x) => x === 0)) {
    const which = format.channels > 1 ? 'the first channel holds' : 'the file holds';
    throw new WavReadError('data chunk', `${which} only zeros (silence); the impulse response must be in the first channel`);
  }
  return {
    sampleRateHz: format.sampleRateHz,
    channels: format.channels,
    bitsPerSample: format.bitsPerSample,
    format: format.encoding,
    samples,
    durationS,
    clipped,
  };
}
