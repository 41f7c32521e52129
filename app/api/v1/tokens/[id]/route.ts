import { requireCaller } from '@/lib/auth';
import { revokeAccessToken } from '@/lib/data/access-tokens';
import { json, route } from '@/lib/http';

type Context = { params: Promise<{ id: string }> };

/** DELETE /api/v1/tokens/{id} — revokes one of the caller's tokens at once. A browser session only. */
export const DELETE = route<Context>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json(await revokeAccessToken(caller, id));
});
