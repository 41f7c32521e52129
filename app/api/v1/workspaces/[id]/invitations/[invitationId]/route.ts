import { requireCaller } from '@/lib/auth';
import { revokeInvitation } from '@/lib/data/invitations';
import { assertUuid } from '@/lib/data/ids';
import { json, route } from '@/lib/http';

type Ctx = { params: Promise<{ id: string; invitationId: string }> };

export const DELETE = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id, invitationId } = await params;
  assertUuid(id, 'That workspace');
  assertUuid(invitationId, 'That invitation');
  await revokeInvitation(caller, id, invitationId);
  return json({ ok: true });
});
