import { requireCaller } from '@/lib/auth';
import { createSystem, listSystems, listTags } from '@/lib/data/systems';
import { json, parseJson, parseQuery, route } from '@/lib/http';
import { systemCreateSchema, systemListQuerySchema } from '@/lib/validations/library';

/** The caller's Systems across their workspaces: `?q=&tag=&sort=&page=&pageSize=&workspaceId=&deleted=1`. */
export const GET = route(async (request) => {
  const caller = await requireCaller();
  const query = parseQuery(request, systemListQuerySchema);
  const [list, tags] = await Promise.all([listSystems(caller, query), listTags(caller)]);
  return json({ ...list, tags });
});

export const POST = route(async (request) => {
  const caller = await requireCaller();
  const input = await parseJson(request, systemCreateSchema);
  return json(await createSystem(caller, input), 201);
});
