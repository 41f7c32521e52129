/**
 * Reads a multipart/form-data measurement upload with a byte limit (413 beyond it, without
 * buffering more), then hands the fields and the file's bytes to the caller. 415 for a body that
 * is not multipart or a file whose declared type is clearly not text.
 */
import { AppError, invalid, unsupportedMedia } from '@/lib/errors';
import { readBodyBytes } from '@/lib/http';
import { isTextMediaType, MAX_MEASUREMENT_BYTES } from './parse-measurement';

/** Room for the multipart boundaries and the text fields around a file of the largest size. */
const MULTIPART_OVERHEAD_BYTES = 64 * 1024;

const tooLargeFile = () => new AppError(413, 'too_large', `The file is larger than ${MAX_MEASUREMENT_BYTES / 1024 / 1024} MB; split it or thin it out to at most 2 MB.`);

export interface MeasurementUpload {
  /** Every text field of the form (the file excluded). */
  fields: Record<string, string>;
  fileName: string;
  fileType: string;
  bytes: Uint8Array;
}

export async function readMeasurementUpload(request: Request): Promise<MeasurementUpload> {
  const type = request.headers.get('content-type') ?? '';
  if (!/^multipart\/form-data\b/i.test(type)) throw unsupportedMedia('multipart/form-data with the measurement in the field "file"');
  const body = await readBodyBytes(request, MAX_MEASUREMENT_BYTES + MULTIPART_OVERHEAD_BYTES, tooLargeFile);
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
  if (file.size > MAX_MEASUREMENT_BYTES) throw tooLargeFile();
  if (!isTextMediaType(file.type)) throw unsupportedMedia(`a plain-text or CSV file (the file was sent as ${file.type})`);
  return { fields, fileName: file.name, fileType: file.type, bytes: new Uint8Array(await file.arrayBuffer()) };
}
