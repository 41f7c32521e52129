import { requireCaller } from '@/lib/auth';
import { createProfile, listProfiles } from '@/lib/data/profiles';
import { BODY_LIMIT_BYTES, json, parseJson, parseQuery, route } from '@/lib/http';
import { profileCreateSchema, profileListQuerySchema } from '@/lib/validations/profile';

/** Speaker profiles of the caller's workspaces: `?kind=main|sub&q=&workspaceId=` → `{ items, total }`. */
export const GET = route(async (request) => {
  const caller = await requireCaller();
  return json(await listProfiles(caller, parseQuery(request, profileListQuerySchema)));
});

export const POST = route(async (request) => {
  const caller = await requireCaller();
  const input = await parseJson(request, profileCreateSchema, BODY_LIMIT_BYTES.profile);
  return json(await createProfile(caller, input), 201);
});
