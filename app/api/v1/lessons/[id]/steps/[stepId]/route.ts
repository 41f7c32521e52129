import { requireCaller } from '@/lib/auth';
import { deleteStep, updateStep } from '@/lib/data/lesson-steps';
import { json, parseJson, parseQuery, route } from '@/lib/http';
import { revisionQuerySchema, stepUpdateSchema } from '@/lib/validations/lesson';

type Ctx = { params: Promise<{ id: string; stepId: string }> };

/** Changes some of a Step's fields `{ revision, step: { title?, points?, panel?, traces?, sweep?, document? } }`. */
export const PUT = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id, stepId } = await params;
  const input = await parseJson(request, stepUpdateSchema);
  return json(await updateStep(caller, id, stepId, input));
});

/** Removes a Step (`?revision=` the Lesson's revision you last read); the rest close up. */
export const DELETE = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id, stepId } = await params;
  const { revision } = parseQuery(request, revisionQuerySchema);
  return json(await deleteStep(caller, id, stepId, revision));
});
