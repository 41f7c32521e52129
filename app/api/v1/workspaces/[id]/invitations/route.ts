import { requireCaller } from '@/lib/auth';
import { createInvitation, listPendingInvitations } from '@/lib/data/invitations';
import { assertUuid } from '@/lib/data/ids';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { invitationCreateSchema } from '@/lib/validations/workspace';

type Ctx = { params: Promise<{ id: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  assertUuid(id, 'That workspace');
  return json({ items: await listPendingInvitations(caller, id) });
});

export const POST = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  assertUuid(id, 'That workspace');
  const { email, role } = await parseJson(request, invitationCreateSchema, BODY_LIMIT_BYTES.form);
  return json(await createInvitation(caller, id, email, role), 201);
});
