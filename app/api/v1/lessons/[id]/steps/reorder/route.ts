import { requireCaller } from '@/lib/auth';
import { reorderSteps } from '@/lib/data/lessons';
import { json, parseJson, route } from '@/lib/http';
import { stepReorderSchema } from '@/lib/validations/lesson';

type Ctx = { params: Promise<{ id: string }> };

/** Puts the Steps in the order of `{ stepIds, revision }` (every Step exactly once). */
export const POST = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const input = await parseJson(request, stepReorderSchema, 32 * 1024);
  return json(await reorderSteps(caller, id, input));
});
