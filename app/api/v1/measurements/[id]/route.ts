import { requireCaller } from '@/lib/auth';
import { deleteMeasurement, getMeasurement } from '@/lib/data/measurements';
import { json, route } from '@/lib/http';

type Ctx = { params: Promise<{ id: string }> };

/** One measurement with every point: `frequencyHz`, `magnitudeDb`, `phaseDeg` (or null), `pointCount`. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json(await getMeasurement(caller, id));
});

export const DELETE = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  await deleteMeasurement(caller, id);
  return json({ id, deleted: true });
});
