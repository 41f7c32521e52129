import { requireCaller } from '@/lib/auth';
import { deleteMeasurement, getMeasurement, updateMeasurementLabels } from '@/lib/data/measurements';
import { json, parseJson, route } from '@/lib/http';
import { measurementLabelsSchema } from '@/lib/validations/measurement';

type Ctx = { params: Promise<{ id: string }> };

/** One measurement with every point: `frequencyHz`, `magnitudeDb`, `phaseDeg` (or null), `pointCount`. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json(await getMeasurement(caller, id));
});

/** Relabels a measurement: `name`, `seat`, `role`, `runLabel` (null clears the last three); its points never change. */
export const PATCH = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const labels = await parseJson(request, measurementLabelsSchema);
  return json(await updateMeasurementLabels(caller, id, labels));
});

export const DELETE = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  await deleteMeasurement(caller, id);
  return json({ id, deleted: true });
});
