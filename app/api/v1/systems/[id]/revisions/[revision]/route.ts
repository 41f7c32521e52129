import { requireCaller } from '@/lib/auth';
import { getRevision } from '@/lib/data/systems';
import { notFound } from '@/lib/errors';
import { json, route } from '@/lib/http';
import { revisionParamSchema } from '@/lib/validations/library';

type Ctx = { params: Promise<{ id: string; revision: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id, revision } = await params;
  const n = revisionParamSchema.safeParse(revision);
  if (!n.success) throw notFound('That revision');
  return json(await getRevision(caller, id, n.data));
});
