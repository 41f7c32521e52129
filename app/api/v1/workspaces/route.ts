import { requireCaller } from '@/lib/auth';
import { createWorkspace, listWorkspaces } from '@/lib/data/workspaces';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { workspaceCreateSchema } from '@/lib/validations/workspace';

export const GET = route(async () => {
  const caller = await requireCaller();
  return json({ items: await listWorkspaces(caller) });
});

export const POST = route(async (request) => {
  const caller = await requireCaller();
  const { name } = await parseJson(request, workspaceCreateSchema, BODY_LIMIT_BYTES.form);
  return json(await createWorkspace(caller, name), 201);
});
