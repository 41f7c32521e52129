import { QueryTypes } from 'sequelize';
import { requireSessionCaller, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { conflict, invalid, unauthorized, type IssueDetail } from '@/lib/errors';
import { verifyPassword } from '@/lib/passwords';
import { assertSignInAllowed, recordFailedSignIn } from '@/lib/rate-limit';
import type { AccountDeleteInput } from '@/lib/validations/account';
import { AccessToken, Invitation, Membership, PasswordResetToken, User, Workspace } from '@/models';
import { contentCounts, isLastSiteAdmin, LAST_SITE_ADMIN, membershipsOf, type WorkspaceContentCounts } from './account-deletion-plan';

/** What happened to one of the account's workspaces. */
export interface DeletedAccountWorkspace {
  workspaceId: string;
  name: string;
  /** 'transferred' (handed to `toUserId`), 'deleted' (with everything in it) or 'left' (it had other owners). */
  outcome: 'transferred' | 'deleted' | 'left';
  toUserId: string | null;
  toName: string | null;
  /** What went with a deleted workspace; null otherwise. */
  removed: WorkspaceContentCounts | null;
}

export interface AccountDeletionResult {
  deleted: true;
  workspaces: DeletedAccountWorkspace[];
  accessTokens: number;
  pendingInvitationsWithdrawn: number;
}

type Memberships = Awaited<ReturnType<typeof membershipsOf>>;
const quoted = (name: string) => `“${name}”`;

/** The decisions checked against the account's workspaces as they are now (locked): every problem at once, as 400 issues. */
function checkDecisions(input: AccountDeleteInput, workspaces: Memberships): IssueDetail[] {
  const issues: IssueDetail[] = [];
  const seen = new Set<string>();
  input.workspaces.forEach((d, i) => {
    const w = workspaces.find((x) => x.workspaceId === d.workspaceId);
    if (seen.has(d.workspaceId)) issues.push({ path: `workspaces.${i}.workspaceId`, message: 'this workspace is decided twice' });
    else if (!w || !w.onlyOwner) issues.push({ path: `workspaces.${i}.workspaceId`, message: 'not a workspace you are the only owner of: nothing to decide (you simply leave the workspaces others own too)' });
    else if (d.action === 'transfer' && !w.otherMembers.some((m) => m.userId === d.toUserId)) {
      issues.push({ path: `workspaces.${i}.toUserId`, message: `not a member of ${quoted(w.name)}: hand it to one of its members` });
    }
    seen.add(d.workspaceId);
  });
  for (const w of workspaces) {
    if (w.onlyOwner && !seen.has(w.workspaceId)) issues.push({ path: 'workspaces', message: `decide what happens to ${quoted(w.name)} (${w.workspaceId}): you are its only owner — hand it to a member, or delete it` });
  }
  return issues;
}

/**
 * Deletes the caller's account (a browser session only), in one transaction: each workspace they alone own is handed to
 * the member they chose (who becomes an owner) or deleted with everything in it; the others are simply left. Their
 * access tokens, password-reset links, pending invitations they sent, failed-sign-in counts and (development) mail go;
 * the account row goes last, so what they saved in the workspaces that stay is kept, attributed to nobody ("a former
 * member"). The password is asked again and a wrong one counts as a failed sign-in (the sign-in limits apply).
 */
export async function deleteAccount(caller: Caller | null, input: AccountDeleteInput, clientAddress: string): Promise<AccountDeletionResult> {
  requireSessionCaller(caller, 'Deleting an account');
  const sequelize = db();
  const found = await User.findByPk(caller.id);
  if (!found) throw unauthorized();
  await assertSignInAllowed(found.email, clientAddress);
  if (!(await verifyPassword(input.password, found.passwordHash))) {
    await recordFailedSignIn(found.email, clientAddress);
    throw invalid('That is not your password; nothing was deleted.', [{ path: 'password', message: 'that is not your password' }]);
  }

  return sequelize.transaction(async (transaction) => {
    const user = await User.findByPk(found.id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw unauthorized();
    if (await isLastSiteAdmin(user, transaction)) throw conflict(LAST_SITE_ADMIN);
    const workspaces = await membershipsOf(user.id, transaction);
    const issues = checkDecisions(input, workspaces);
    if (issues.length) throw invalid(issues.length > 1 ? `${issues[0]!.path}: ${issues[0]!.message} (and ${issues.length - 1} more)` : `${issues[0]!.path}: ${issues[0]!.message}`, issues);

    // First what is theirs alone (so the counts include what a deleted workspace would take with it).
    const accessTokens = await AccessToken.destroy({ where: { userId: user.id }, transaction });
    const pendingInvitationsWithdrawn = await Invitation.destroy({ where: { invitedById: user.id, acceptedAt: null }, transaction });
    const decisions = new Map(input.workspaces.map((d) => [d.workspaceId, d]));
    const toDelete = input.workspaces.filter((d) => d.action === 'delete').map((d) => d.workspaceId);
    const counts = await contentCounts(toDelete, transaction);
    const outcomes: DeletedAccountWorkspace[] = [];
    for (const w of workspaces) {
      const d = decisions.get(w.workspaceId);
      if (d?.action === 'transfer') {
        await Membership.update({ role: 'owner' }, { where: { workspaceId: w.workspaceId, userId: d.toUserId }, transaction });
        // A personal workspace is made with its account; handed over, it is an ordinary shared one.
        if (w.personal) await Workspace.update({ personal: false }, { where: { id: w.workspaceId }, transaction });
        const to = w.otherMembers.find((m) => m.userId === d.toUserId);
        outcomes.push({ workspaceId: w.workspaceId, name: w.name, outcome: 'transferred', toUserId: d.toUserId, toName: to?.name ?? null, removed: null });
      } else if (d?.action === 'delete') {
        // Everything in it goes by the schema's ON DELETE CASCADE: memberships, Systems and revisions, Lessons and Steps,
        // profiles, measurements, share links, invitations and access tokens for it.
        await Workspace.destroy({ where: { id: w.workspaceId }, transaction });
        outcomes.push({ workspaceId: w.workspaceId, name: w.name, outcome: 'deleted', toUserId: null, toName: null, removed: counts.get(w.workspaceId) ?? null });
      } else {
        outcomes.push({ workspaceId: w.workspaceId, name: w.name, outcome: 'left', toUserId: null, toName: null, removed: null });
      }
    }

    await PasswordResetToken.destroy({ where: { userId: user.id }, transaction });
    await sequelize.query('DELETE FROM rate_limits WHERE key = :key', { replacements: { key: `signin-email:${user.email}` }, type: QueryTypes.DELETE, transaction });
    await sequelize.query('DELETE FROM dev_messages WHERE lower(mail_to) = :email', { replacements: { email: user.email.toLowerCase() }, type: QueryTypes.DELETE, transaction });
    // Their memberships go; Systems, revisions, Lessons, profiles, measurements and share links they
    // made in the workspaces that stay lose their author (SET NULL) and are shown as by "a former member".
    await Membership.destroy({ where: { userId: user.id }, transaction });
    await user.destroy({ transaction });
    return { deleted: true as const, workspaces: outcomes, accessTokens, pendingInvitationsWithdrawn };
  });
}
