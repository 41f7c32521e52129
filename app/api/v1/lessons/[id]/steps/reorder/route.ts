import { requireCaller } from '@/lib/auth';
import { reorderSteps } from '@/lib/data/lesson-steps';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { stepReorderSchema } from '@/lib/validations/lesson';

type Ctx = { params: Promise<{ id: string }> };

/** Puts the Steps in the order of `{ stepIds, revision }` (every Step exactly once). */
export const POST = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const input = await parseJson(request, stepReorderSchema, BODY_LIMIT_BYTES.stepOrder);
  return json(await reorderSteps(caller, id, input));
});
