import { requireCaller } from '@/lib/auth';
import { deleteSystem, getSystem, renameSystem, updateSystem } from '@/lib/data/systems';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { systemRenameSchema, systemUpdateSchema } from '@/lib/validations/library';

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json(await getSystem(caller, id));
});

/** Saves `{ name, document, revision }`; a stale revision is 409 with `currentRevision`, changing nothing. */
export const PUT = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const input = await parseJson(request, systemUpdateSchema);
  return json(await updateSystem(caller, id, input));
});

/** Renames `{ name, revision }` (a new revision, like any save). */
export const PATCH = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const { name, revision } = await parseJson(request, systemRenameSchema, BODY_LIMIT_BYTES.form);
  return json(await renameSystem(caller, id, name, revision));
});

/** Soft delete: restorable from the Library's "Recently deleted" for 30 days. */
export const DELETE = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  await deleteSystem(caller, id);
  return json({ id, deleted: true });
});
