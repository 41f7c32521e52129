import { requireCaller } from '@/lib/auth';
import { revokeShareLink } from '@/lib/data/share-links';
import { json, route } from '@/lib/http';

type Ctx = { params: Promise<{ token: string }> };

/** Revokes a share link: its page answers 404 from now on. */
export const DELETE = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { token } = await params;
  return json(await revokeShareLink(caller, token));
});
