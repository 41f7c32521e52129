/**
 * Reads a multipart/form-data measurement upload with a byte limit (413 beyond it, without buffering more), then hands
 * the fields and the file's bytes to the caller with the file's format: `wav` when its first bytes are a RIFF header
 * (or its declared type is a WAV type), else `text`. A WAV file may be up to 16 MB, a text file up to 2 MB. 415 for a
 * body that is not multipart or a file declared as a type that is neither text nor WAV.
 */
import { AppError, invalid } from '@/lib/errors';
import { readBodyBytes } from '@/lib/http';
import { isTextMediaType, MAX_MEASUREMENT_BYTES } from './parse-measurement';
import { MAX_WAV_BYTES } from './read-wav';


/** Room for the multipart boundaries and the text fields around a file of the largest size. */
const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

/** Media types browsers and tools give WAV files (application/octet-stream and an empty type are judged by the bytes). */
const WAV_TYPES = new Set(['audio/wav', 'audio/x-wav', 'audio/wave', 'audio/vnd.wave']);

/** First four bytes of a RIFF file (and of its big-endian and 64-bit cousins, which the WAV reader names and refuses). */
const RIFF_IDS = ['RIFF', 'RIFX', 'RF64'];

const MB = 1024 * 1024;
const ACCEPTED = 'a measured response as plain text or CSV (frequency, magnitude, optional phase) or an impulse response as a WAV file';

export type UploadFormat = 'text' | 'wav';

export interface MeasurementUpload {
  /** Every text field of the form (the file excluded). */
  fields: Record<string, string>;
  fileName: string;
  fileType: string;
  /** How the file is read: `wav` (an impulse response) or `text` (delimited columns). */
  format: UploadFormat;
  bytes: Uint8Array;
}

const tooLargeBody = () =>
  new AppError(413, 'too_large', `The upload is larger than ${MAX_WAV_BYTES / MB} MB. An impulse response (WAV) may be at most ${MAX_WAV_BYTES / MB} MB and a text file at most ${MAX_MEASUREMENT_BYTES / MB} MB.`);

const tooLargeFile = (format: UploadFormat, size: number) =>
  format === 'wav'
    ? new AppError(413, 'too_large', `The WAV file is ${(size / MB).toFixed(1)} MB; an impulse response may be at most ${MAX_WAV_BYTES / MB} MB (trim it to 10 s or less, or send the one channel).`)
    : new AppError(413, 'too_large', `The file is larger than ${MAX_MEASUREMENT_BYTES / MB} MB; split it or thin it out to at most ${MAX_MEASUREMENT_BYTES / MB} MB.`);

const mediaType = (type: string) => type.split(';')[0]!.trim().toLowerCase();

/** True when the bytes begin like a RIFF file. */
function startsLikeRiff(bytes: Uint8Array): boolean {
  if (bytes.length < 4) return false;
  const id = String.fromCharCode(bytes[0]!, bytes[1]!, bytes[2]!, bytes[3]!);
  return RIFF_IDS.includes(id);
}

/**
 * The format a file is read as: its first bytes decide (a RIFF header → `wav`, whatever type the browser gave it);
 * a file declared as a WAV type is read as WAV too (so a mislabelled file is refused with the WAV reader's reason).
 * Null when the declared type is neither text nor WAV.
 */
export function uploadFormat(type: string, bytes: Uint8Array): UploadFormat | null {
  const t = mediaType(type);
  if (WAV_TYPES.has(t)) return 'wav';
  if (!isTextMediaType(t)) return null;
  return startsLikeRiff(bytes) ? 'wav' : 'text';
}

export async function readMeasurementUpload(request: Request): Promise<MeasurementUpload> {
  const type = request.headers.get('content-type') ?? '';
  if (!/^multipart\/form-data\b/i.test(type)) {
    throw new AppError(415, 'unsupported_media_type', `Send the body as multipart/form-data with the measurement in the field "file" (${ACCEPTED}).`);
  }
  const body = await readBodyBytes(request, MAX_WAV_BYTES + MULTIPART_OVERHEAD_BYTES, tooLargeBody);
  let form: FormData;
  try {
    form = await new Response(body as BodyInit, { headers: { 'content-type': type } }).formData();
  } catch {
    throw invalid('The body is not valid multipart/form-data.', [{ path: '(body)', message: 'not valid multipart/form-data' }]);
  }
  const fields: Record<string, string> = {};
  let file: File | null = null;
  for (const [key, value] of form.entries()) {
    if (key === 'file') {
      if (typeof value === 'string') throw invalid('file: send the measurement as a file, not as a text field.', [{ path: 'file', message: 'must be a file' }]);
      if (file) throw invalid('file: send one file per upload.', [{ path: 'file', message: 'only one file per upload' }]);
      file = value;
    } else if (typeof value === 'string') fields[key] = value;
    else throw invalid(`${key}: only the field "file" may hold a file.`, [{ path: key, message: 'must be text' }]);
  }
  if (!file) throw invalid('file: a measurement file is required.', [{ path: 'file', message: 'is required' }]);
  if (file.size > MAX_WAV_BYTES) throw tooLargeFile(startsLikeRiff(new Uint8Array(await file.slice(0, 4).arrayBuffer())) ? 'wav' : 'text', file.size);
  const bytes = new Uint8Array(await file.arrayBuffer());
  const format = uploadFormat(file.type, bytes);
  if (!format) {
    throw new AppError(415, 'unsupported_media_type', `The file was sent as ${mediaType(file.type)}; send ${ACCEPTED} (audio/wav, audio/x-wav, audio/wave or application/octet-stream).`, [
      { path: 'file', message: `${mediaType(file.type)} is not accepted: send text/plain, text/csv or a WAV file` },
    ]);
  }
  if (format === 'text' && bytes.length > MAX_MEASUREMENT_BYTES) throw tooLargeFile('text', bytes.length);
  return { fields, fileName: file.name, fileType: file.type, format, bytes };
}
