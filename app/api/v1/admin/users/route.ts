import { requireSiteAdmin } from '@/lib/access';
import { getCaller } from '@/lib/auth';
import { listUsers } from '@/lib/data/users';
import { json, route } from '@/lib/http';

export const GET = route(async () => {
  requireSiteAdmin(await getCaller());
  return json({ items: await listUsers() });
});
