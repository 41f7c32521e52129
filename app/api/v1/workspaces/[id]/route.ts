import { requireCaller } from '@/lib/auth';
import { assertUuid } from '@/lib/data/ids';
import { getWorkspace, renameWorkspace } from '@/lib/data/workspaces';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
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
  const { name } = await parseJson(request, workspaceCreateSchema, BODY_LIMIT_BYTES.form);
  return json(await renameWorkspace(caller, id, name));
});
