import { requireCaller } from '@/lib/auth';
import { acceptInvitation, previewInvitation } from '@/lib/data/invitations';
import { json, route } from '@/lib/http';

type Ctx = { params: Promise<{ token: string }> };

export const GET = route<Ctx>(async (_request, { params }) => {
  const { token } = await params;
  return json(await previewInvitation(token));
});

/** Accepting needs the invitee signed in with the invited address. */
export const POST = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { token } = await params;
  return json(await acceptInvitation(caller, token));
});
