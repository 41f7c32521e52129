import { requireCaller } from '@/lib/auth';
import { restoreSystem } from '@/lib/data/systems';
import { json, route } from '@/lib/http';

type Ctx = { params: Promise<{ id: string }> };

/** Brings a deleted System back (within 30 days of its deletion). */
export const POST = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json(await restoreSystem(caller, id));
});
