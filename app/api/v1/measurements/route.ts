import { requireCaller } from '@/lib/auth';
import { createMeasurement, listMeasurements, uploadTarget } from '@/lib/data/measurements';
import { AppError, fromZod, invalid } from '@/lib/errors';
import { json, parseQuery, route } from '@/lib/http';
import { impulseMeasurement } from '@/lib/measurements/impulse-measurement';
import { parseMeasurementBytes } from '@/lib/measurements/parse-measurement';
import { readMeasurementUpload } from '@/lib/measurements/read-upload';
import { measurementListQuerySchema, measurementUploadFieldsSchema, type MeasurementUploadFields } from '@/lib/validations/measurement';

export const GET = route(async (request) => {
  const caller = await requireCaller();
  return json(await listMeasurements(caller, parseQuery(request, measurementListQuerySchema)));
});

/** A text file's points and how it was read; window fields belong to impulse responses only. */
function textPoints(bytes: Uint8Array, fields: MeasurementUploadFields) {
  for (const field of ['windowStartMs', 'windowLengthMs'] as const) {
    if (fields[field] !== undefined) {
      const message = 'applies to an impulse response (a WAV file) only; this file is text';
      throw invalid(`${field}: ${message}.`, [{ path: field, message }]);
    }
  }
  const result = parseMeasurementBytes(bytes);
  if (!result.ok) {
    throw new AppError(400, 'invalid', result.message, result.issues.map(({ path, message }) => ({ path, message })), { totalIssues: result.totalIssues });
  }
  const { skippedLines, firstDataLine } = result.measurement;
  return { points: result.measurement, extra: { skippedLines, firstDataLine } };
}

/** An impulse response's complex response through its window, and what the answer says about the file and the window. */
function wavPoints(bytes: Uint8Array, fields: MeasurementUploadFields) {
  const { points, details } = impulseMeasurement(bytes, fields);
  return { points, extra: { impulse: details } };
}

/**
 * Upload (multipart/form-data): `file` (delimited text, or an impulse response as WAV: decided by its first bytes),
 * optional `name`, `systemId` or `workspaceId`, `seat`, `role`, `runLabel`, and for a WAV `windowStartMs`,
 * `windowLengthMs`. Every check runs before the one INSERT, so a refused file stores nothing. A text answer says how
 * many leading lines were skipped (`skippedLines`); a WAV answer describes the file and the window (`impulse`).
 */
export const POST = route(async (request) => {
  const caller = await requireCaller();
  const upload = await readMeasurementUpload(request);
  const parsedFields = measurementUploadFieldsSchema.safeParse(upload.fields);
  if (!parsedFields.success) throw fromZod(parsedFields.error);
  const fields = parsedFields.data;
  const target = await uploadTarget(caller, fields);
  const read = upload.format === 'wav' ? wavPoints(upload.bytes, fields) : textPoints(upload.bytes, fields);
  const name = fields.name ?? (upload.fileName.replace(/\.[A-Za-z0-9]{1,5}$/, '').trim().slice(0, 120) || 'Measurement');
  const created = await createMeasurement(caller, target, { name, seat: fields.seat, role: fields.role, runLabel: fields.runLabel }, read.points);
  return json({ ...created, ...read.extra }, 201);
});
