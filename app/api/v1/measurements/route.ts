import { requireCaller } from '@/lib/auth';
import { createMeasurement, listMeasurements, uploadTarget } from '@/lib/data/measurements';
import { AppError, fromZod } from '@/lib/errors';
import { json, parseQuery, route } from '@/lib/http';
import { parseMeasurementBytes } from '@/lib/measurements/parse-measurement';
import { readMeasurementUpload } from '@/lib/measurements/read-upload';
import { measurementListQuerySchema, measurementUploadFieldsSchema } from '@/lib/validations/measurement';

export const GET = route(async (request) => {
  const caller = await requireCaller();
  return json(await listMeasurements(caller, parseQuery(request, measurementListQuerySchema)));
});

/**
 * Upload (multipart/form-data): `file`, optional `name`, `systemId` or `workspaceId`, `seat`, `role`. A refused file stores
 * nothing. The answer says how many leading lines that do not begin with a number were skipped (`skippedLines`).
 */
export const POST = route(async (request) => {
  const caller = await requireCaller();
  const upload = await readMeasurementUpload(request);
  const parsedFields = measurementUploadFieldsSchema.safeParse(upload.fields);
  if (!parsedFields.success) throw fromZod(parsedFields.error);
  const fields = parsedFields.data;
  const target = await uploadTarget(caller, fields);
  const result = parseMeasurementBytes(upload.bytes);
  if (!result.ok) {
    throw new AppError(400, 'invalid', result.message, result.issues.map(({ path, message }) => ({ path, message })), { totalIssues: result.totalIssues });
  }
  const name = fields.name ?? (upload.fileName.replace(/\.[A-Za-z0-9]{1,5}$/, '').trim().slice(0, 120) || 'Measurement');
  const created = await createMeasurement(caller, target, { name, seat: fields.seat, role: fields.role }, result.measurement);
  const { skippedLines, firstDataLine } = result.measurement;
  return json({ ...created, skippedLines, firstDataLine }, 201);
});
