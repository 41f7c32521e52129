import { requireCaller } from '@/lib/auth';
import { assertUuid } from '@/lib/data/ids';
import { changeMember } from '@/lib/data/workspaces';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { memberUpdateSchema } from '@/lib/validations/workspace';

type Ctx = { params: Promise<{ id: string; userId: string }> };

export const PATCH = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id, userId } = await params;
  assertUuid(id, 'That workspace');
  assertUuid(userId, 'That member');
  const { role } = await parseJson(request, memberUpdateSchema, BODY_LIMIT_BYTES.form);
  await changeMember(caller, id, userId, { role });
  return json({ ok: true });
});

/** Removes a member (owners), or leaves the workspace (anyone, for themselves). */
export const DELETE = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id, userId } = await params;
  assertUuid(id, 'That workspace');
  assertUuid(userId, 'That member');
  await changeMember(caller, id, userId, 'remove');
  return json({ ok: true });
});
