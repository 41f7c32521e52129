import { impulseWindow } from '@/dsp/measured/impulse-window';
import { MAX_MEASUREMENT_BYTES, parseMeasurementBytes, type ParsedMeasurement } from '@/lib/measurements/parse-measurement';
import { MAX_WAV_BYTES, readWav, type WavImpulse } from '@/lib/measurements/read-wav';
import { peakIndex, type RecordingFacts, type WindowChoice } from './impulse-plot-data';


/** A WAV file read in the browser: its samples, where its peak lies and the default window. */
export interface LoadedWav {
  wav: WavImpulse;
  rec: RecordingFacts;
  /** The peak's |x| (the plot shows amplitude relative to it). */
  peakAbs: number;
  /** The peak, ms from the file's first sample (refined between samples). */
  arrivalMs: number;
  /** The window the dsp takes when none is given (20 ms before the peak, 500 ms long, clamped to the file). */
  defaults: WindowChoice;
}

export type FileStage =
  | { kind: 'refused'; fileName: string; message: string; issues: { path: string; message: string }[]; totalIssues: number }
  | { kind: 'preview'; file: File; parsed: ParsedMeasurement }
  | { kind: 'wav'; file: File; loaded: LoadedWav };

const megabytes = (bytes: number) => `${(bytes / 1024 / 1024).toFixed(1)} MB`;

/** RIFF/WAVE by its first bytes ("RIFF", size, "WAVE"), or a .wav/.wave name (then the reader says what is wrong). */
export function isWavFile(bytes: Uint8Array, fileName: string): boolean {
  const tag = (from: number) => String.fromCharCode(...bytes.subarray(from, from + 4));
  return (bytes.length >= 12 && tag(0) === 'RIFF' && tag(8) === 'WAVE') || /\.wave?$/i.test(fileName);
}

const refused = (fileName: string, message: string): FileStage => ({ kind: 'refused', fileName, message, issues: [], totalIssues: 0 });

/** The refusal of a clipped recording: what is wrong and what to do. */
export const CLIPPED_MESSAGE =
  'The recording is clipped: samples of the first channel sit at full scale, so the peak and the response it gives are wrong. Record it again with the level lower — turn the recording input or the test signal down by 6 dB or more (lower levels are also kinder to ears and speakers).';

/** An impulse response read from WAV bytes, with its peak and default window; refusals in words. */
function loadWav(bytes: Uint8Array): { ok: true; loaded: LoadedWav } | { ok: false; message: string } {
  let wav: WavImpulse;
  try {
    wav = readWav(bytes);
  } catch (e) {
    return { ok: false, message: e instanceof Error ? e.message : 'The WAV file could not be read.' };
  }
  if (wav.clipped) return { ok: false, message: CLIPPED_MESSAGE };
  try {
    const first = impulseWindow({ samples: wav.samples, sampleRateHz: wav.sampleRateHz });
    const defaults = { startMs: first.startMs, lengthMs: first.lengthMs };
    // The editor sends the window explicitly, so the default must pass as given (a file under 1 ms does not).
    impulseWindow({ samples: wav.samples, sampleRateHz: wav.sampleRateHz, ...defaults });
    const index = peakIndex(wav.samples);
    return {
      ok: true,
      loaded: {
        wav,
        rec: { sampleRateHz: wav.sampleRateHz, sampleCount: wav.samples.length, peakIndex: index },
        peakAbs: Math.abs(wav.samples[index] as number),
        arrivalMs: first.arrivalMs,
        defaults,
      },
    };
  } catch (e) {
    return { ok: false, message: `The impulse response cannot be windowed: ${e instanceof Error ? e.message : 'unknown reason'}.` };
  }
}

/** Reads a dropped or picked file in the browser: a WAV impulse response or a delimited text file, or why it is refused. */
export async function readMeasurementFile(file: File): Promise<FileStage> {
  if (file.size > MAX_WAV_BYTES) return refused(file.name, `The file is ${megabytes(file.size)}; a WAV impulse response may be at most ${megabytes(MAX_WAV_BYTES)} and a text file at most ${megabytes(MAX_MEASUREMENT_BYTES)}.`);
  const bytes = new Uint8Array(await file.arrayBuffer());
  if (isWavFile(bytes, file.name)) {
    const result = loadWav(bytes);
    return result.ok ? { kind: 'wav', file, loaded: result.loaded } : refused(file.name, result.message);
  }
  if (file.size > MAX_MEASUREMENT_BYTES) return refused(file.name, `The file is larger than ${megabytes(MAX_MEASUREMENT_BYTES)} (${megabytes(file.size)}); a text file may be at most ${megabytes(MAX_MEASUREMENT_BYTES)}: thin it out.`);
  const result = parseMeasurementBytes(bytes);
  if (!result.ok) return { kind: 'refused', fileName: file.name, message: result.message, issues: result.issues, totalIssues: result.totalIssues };
  return { kind: 'preview', file, parsed: result.measurement };
}
