import { requireCaller } from '@/lib/auth';
import { assertUuid, getWorkspace, renameWorkspace } from '@/lib/data/workspaces';
import { json, parseJson, route } from '@/lib/http';
import { workspaceCreateSchema } from '@/lib/validations/workspace';

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  assertUuid(id, 'That workspace');
  return json(await getWorkspace(caller, id));
});

export const PATCH = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  assertUuid(id, 'That workspace');
  const { name } = await parseJson(request, workspaceCreateSchema, 16 * 1024);
  return json(await renameWorkspace(caller, id, name));
});
