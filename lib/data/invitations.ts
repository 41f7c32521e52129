import { Op } from 'sequelize';
import { requireMembership, requireSessionCaller, type Caller } from '@/lib/access';
import { config } from '@/lib/config';
import { db } from '@/lib/db';
import { invalid, notFound } from '@/lib/errors';
import { sendMail } from '@/lib/mail';
import { hashToken, newToken } from '@/lib/tokens';
import { Invitation, Membership, User, Workspace, type WorkspaceRole } from '@/models';

export const INVITATION_VALID_MS = 7 * 24 * 3600 * 1000;

export interface AppInvitation {
  id: string;
  email: string;
  role: WorkspaceRole;
  expiresAt: string;
  createdAt: string;
}

const toApp = (i: Invitation): AppInvitation => ({ id: i.id, email: i.email, role: i.role, expiresAt: i.expiresAt.toISOString(), createdAt: i.createdAt.toISOString() });

/** An owner invites an e-mail address with a role; the link (valid 7 days) goes by e-mail. */
export async function createInvitation(caller: Caller, workspaceId: string, email: string, role: WorkspaceRole): Promise<AppInvitation> {
  await requireMembership(caller, workspaceId, 'owner', 'That workspace');
  const workspace = await Workspace.findByPk(workspaceId);
  if (!workspace) throw notFound('That workspace');
  const existingUser = await User.findOne({ where: { email } });
  if (existingUser && (await Membership.findOne({ where: { workspaceId, userId: existingUser.id } }))) {
    throw invalid(`${email} is already a member of this workspace.`, [{ path: 'email', message: 'already a member' }]);
  }
  const inviter = await User.findByPk(caller.id);
  const token = newToken();
  const invitation = await Invitation.create({
    workspaceId,
    email,
    role,
    tokenHash: hashToken(token),
    invitedById: caller.id,
    expiresAt: new Date(Date.now() + INVITATION_VALID_MS),
  });
  const link = `${config.appUrl}/invite/${token}`;
  await sendMail({
    to: email,
    subject: `You are invited to ${workspace.name} on Seamline`,
    text: `${inviter?.name ?? 'A colleague'} invited you to the workspace "${workspace.name}" on Seamline as ${role}.\n\nAccept the invitation (the link is valid for 7 days):\n${link}\n\nIf you were not expecting this, ignore this message.`,
  });
  return toApp(invitation);
}

export async function listPendingInvitations(caller: Caller, workspaceId: string): Promise<AppInvitation[]> {
  await requireMembership(caller, workspaceId, 'viewer', 'That workspace');
  const rows = await Invitation.findAll({ where: { workspaceId, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } }, order: [['createdAt', 'DESC']] });
  return rows.map(toApp);
}

export async function revokeInvitation(caller: Caller, workspaceId: string, invitationId: string): Promise<void> {
  await requireMembership(caller, workspaceId, 'owner', 'That workspace');
  const n = await Invitation.destroy({ where: { id: invitationId, workspaceId, acceptedAt: null } });
  if (!n) throw notFound('That invitation');
}

export interface InvitationPreview {
  workspaceName: string;
  email: string;
  role: WorkspaceRole;
}

async function findUsable(token: string): Promise<Invitation> {
  db();
  const invitation = await Invitation.findOne({ where: { tokenHash: hashToken(token) } });
  if (!invitation) throw notFound('That invitation');
  if (invitation.acceptedAt) throw invalid('This invitation has already been accepted.', [{ path: 'token', message: 'already used' }]);
  if (invitation.expiresAt.getTime() < Date.now()) throw invalid('This invitation has expired. Ask the workspace owner for a new one.', [{ path: 'token', message: 'expired' }]);
  return invitation;
}

export async function previewInvitation(token: string): Promise<InvitationPreview> {
  const invitation = await findUsable(token);
  const workspace = await Workspace.findByPk(invitation.workspaceId);
  return { workspaceName: workspace?.name ?? 'a workspace', email: invitation.email, role: invitation.role };
}

/** The signed-in invitee accepts: creates the membership with the invited role, once. */
export async function acceptInvitation(caller: Caller & { email: string }, token: string): Promise<{ workspaceId: string; role: WorkspaceRole }> {
  requireSessionCaller(caller, 'Accepting an invitation');
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    const invitation = await findUsable(token);
    if (invitation.email.toLowerCase() !== caller.email.toLowerCase()) {
      throw invalid(`This invitation is for ${invitation.email}. Sign in with that address to accept it.`, [{ path: 'token', message: 'invitation is for another e-mail' }]);
    }
    const [updated] = await Invitation.update({ acceptedAt: new Date() }, { where: { id: invitation.id, acceptedAt: null }, transaction });
    if (!updated) throw invalid('This invitation has already been accepted.', [{ path: 'token', message: 'already used' }]);
    const existing = await Membership.findOne({ where: { workspaceId: invitation.workspaceId, userId: caller.id }, transaction });
    if (existing) await existing.update({ role: invitation.role }, { transaction });
    else await Membership.create({ workspaceId: invitation.workspaceId, userId: caller.id, role: invitation.role }, { transaction });
    return { workspaceId: invitation.workspaceId, role: invitation.role };
  });
}
