import { requireCaller } from '@/lib/auth';
import { restoreRevision } from '@/lib/data/systems';
import { notFound } from '@/lib/errors';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { revisionParamSchema, revisionRestoreSchema } from '@/lib/validations/library';

type Ctx = { params: Promise<{ id: string; revision: string }> };

/** Saves revision n again as a new revision; body `{ revision }` is the current one (stale → 409). */
export const POST = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id, revision } = await params;
  const n = revisionParamSchema.safeParse(revision);
  if (!n.success) throw notFound('That revision');
  const body = await parseJson(request, revisionRestoreSchema, BODY_LIMIT_BYTES.form);
  return json(await restoreRevision(caller, id, n.data, body.revision));
});
