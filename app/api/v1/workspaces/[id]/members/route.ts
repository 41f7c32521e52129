import { requireCaller } from '@/lib/auth';
import { assertUuid } from '@/lib/data/ids';
import { listMembers } from '@/lib/data/workspaces';
import { json, route } from '@/lib/http';

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  assertUuid(id, 'That workspace');
  return json({ items: await listMembers(caller, id) });
});
