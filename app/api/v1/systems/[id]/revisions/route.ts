import { requireCaller } from '@/lib/auth';
import { listRevisions } from '@/lib/data/systems';
import { json, route } from '@/lib/http';

type Ctx = { params: Promise<{ id: string }> };

/** Every saved revision, newest first: who, when, and a note (created, renamed, restored revision n). */
export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json({ items: await listRevisions(caller, id) });
});
