import { requireSiteAdmin } from '@/lib/access';
import { getCaller } from '@/lib/auth';
import { setSiteRole } from '@/lib/data/site-roles';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { siteRoleUpdateSchema } from '@/lib/validations/site-role';

type Context = { params: Promise<{ id: string }> };

/** PATCH /api/v1/admin/users/{id} — a site administrator sets an account's site role (documented in lib/openapi/operations). */
export const PATCH = route<Context>(async (request, { params }) => {
  const caller = await getCaller();
  requireSiteAdmin(caller); // before the body: anyone else learns nothing about this route's fields
  const { id } = await params;
  const { siteRole } = await parseJson(request, siteRoleUpdateSchema, BODY_LIMIT_BYTES.form);
  return json(await setSiteRole(caller, id, siteRole));
});
