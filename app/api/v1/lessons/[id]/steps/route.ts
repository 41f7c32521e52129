import { requireCaller } from '@/lib/auth';
import { addStep } from '@/lib/data/lesson-steps';
import { json, parseJson, route } from '@/lib/http';
import { stepCreateSchema } from '@/lib/validations/lesson';

type Ctx = { params: Promise<{ id: string }> };

/** Adds `{ step: { title, points, panel, traces, sweep, document | fromSystemId }, revision?, position? }`: 201 with the Lesson. */
export const POST = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const input = await parseJson(request, stepCreateSchema);
  return json(await addStep(caller, id, input), 201);
});
