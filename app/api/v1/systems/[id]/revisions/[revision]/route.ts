import { requireCaller } from '@/lib/auth';
import { getRevision, setRevisionNote } from '@/lib/data/systems';
import { notFound } from '@/lib/errors';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { revisionNoteUpdateSchema, revisionParamSchema } from '@/lib/validations/library';

type Ctx = { params: Promise<{ id: string; revision: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id, revision } = await params;
  const n = revisionParamSchema.safeParse(revision);
  if (!n.success) throw notFound('That revision');
  return json(await getRevision(caller, id, n.data));
});

/** Changes revision n's note, `{ note }` (trimmed, at most 200 characters; empty removes it). Editors and owners. */
export const PATCH = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id, revision } = await params;
  const n = revisionParamSchema.safeParse(revision);
  if (!n.success) throw notFound('That revision');
  const { note } = await parseJson(request, revisionNoteUpdateSchema, BODY_LIMIT_BYTES.form);
  return json(await setRevisionNote(caller, id, n.data, note));
});
