import { requireCaller } from '@/lib/auth';
import { createAccessToken, listAccessTokens } from '@/lib/data/access-tokens';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { accessTokenCreateSchema } from '@/lib/validations/access-token';

/** GET /api/v1/tokens — the caller's personal access tokens (never their secrets). A browser session only. */
export const GET = route(async () => {
  const caller = await requireCaller();
  return json({ items: await listAccessTokens(caller) });
});

/** POST /api/v1/tokens — a new token; the answer's `token` is the secret, shown this once. A browser session only. */
export const POST = route(async (request) => {
  const caller = await requireCaller();
  const input = await parseJson(request, accessTokenCreateSchema, BODY_LIMIT_BYTES.form);
  return json(await createAccessToken(caller, input), 201);
});
