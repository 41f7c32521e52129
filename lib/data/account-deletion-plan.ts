import { Op, QueryTypes, type Transaction } from 'sequelize';
import { requireSessionCaller, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { unauthorized } from '@/lib/errors';
import { AccessToken, Invitation, Membership, User, Workspace, type WorkspaceRole } from '@/models';

/** What goes if a workspace is deleted: its rows, counted (trashed Systems and Lessons included; live share links only). */
export interface WorkspaceContentCounts {
  systems: number;
  revisions: number;
  lessons: number;
  steps: number;
  profiles: number;
  measurements: number;
  /** Share links that would stop working (revoked ones aside). */
  shareLinks: number;
  /** The other members, who would lose access. */
  members: number;
}

export interface PlanMember {
  userId: string;
  name: string;
  email: string;
  role: WorkspaceRole;
}

/** One workspace the account belongs to, as deleting the account would treat it. */
export interface PlanWorkspace {
  workspaceId: string;
  name: string;
  personal: boolean;
  role: WorkspaceRole;
  /** True when this account is its only owner: a decision (hand it over, or delete it) is required. Else it is simply left. */
  onlyOwner: boolean;
  otherMembers: PlanMember[];
  ifDeleted: WorkspaceContentCounts;
}

export interface AccountDeletionPlan {
  userId: string;
  name: string;
  email: string;
  /** Why the account cannot be deleted now (the last site admin), or null. */
  blockedReason: string | null;
  /** Access tokens that still work and would stop (all of the account's tokens are deleted). */
  accessTokens: number;
  /** Invitations this account sent that nobody accepted yet: withdrawn. */
  pendingInvitationsSent: number;
  workspaces: PlanWorkspace[];
}

export const LAST_SITE_ADMIN =
  'You are the only site admin. Seamline needs one to manage accounts: make another account a site admin on the Users page first, then delete yours.';

/** The workspaces of one user, with every member of each (locked FOR UPDATE inside a deletion's transaction). */
export async function membershipsOf(userId: string, transaction?: Transaction) {
  const mine = await Membership.findAll({ where: { userId }, order: [['workspaceId', 'ASC']], transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });
  const ids = mine.map((m) => m.workspaceId);
  const everyone = ids.length
    ? await Membership.findAll({ where: { workspaceId: { [Op.in]: ids } }, order: [['workspaceId', 'ASC'], ['createdAt', 'ASC']], transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined })
    : [];
  const workspaces = ids.length ? await Workspace.findAll({ where: { id: { [Op.in]: ids } }, transaction }) : [];
  const userIds = [...new Set(everyone.map((m) => m.userId))];
  const users = userIds.length ? await User.findAll({ where: { id: { [Op.in]: userIds } }, attributes: ['id', 'name', 'email'], transaction }) : [];
  const userById = new Map(users.map((u) => [u.id, u]));
  return mine.map((m) => {
    const members = everyone.filter((e) => e.workspaceId === m.workspaceId);
    const others = members.filter((e) => e.userId !== userId);
    const w = workspaces.find((x) => x.id === m.workspaceId);
    return {
      workspaceId: m.workspaceId,
      name: w?.name ?? '',
      personal: w?.personal ?? false,
      role: m.role,
      onlyOwner: m.role === 'owner' && !others.some((o) => o.role === 'owner'),
      otherMembers: others.map((o) => ({ userId: o.userId, name: userById.get(o.userId)?.name ?? '', email: userById.get(o.userId)?.email ?? '', role: o.role })),
    };
  });
}

const COUNTS_SQL = `
  SELECT w.id,
    (SELECT count(*) FROM systems s WHERE s.workspace_id = w.id)::int AS systems,
    (SELECT count(*) FROM system_revisions r JOIN systems s ON s.id = r.system_id WHERE s.workspace_id = w.id)::int AS revisions,
    (SELECT count(*) FROM lessons l WHERE l.workspace_id = w.id)::int AS lessons,
    (SELECT count(*) FROM lesson_steps st JOIN lessons l ON l.id = st.lesson_id WHERE l.workspace_id = w.id)::int AS steps,
    (SELECT count(*) FROM speaker_profiles p WHERE p.workspace_id = w.id)::int AS profiles,
    (SELECT count(*) FROM measurements m WHERE m.workspace_id = w.id)::int AS measurements,
    (SELECT count(*) FROM share_links sl WHERE sl.workspace_id = w.id AND sl.revoked_at IS NULL)::int AS "shareLinks",
    ((SELECT count(*) FROM memberships ms WHERE ms.workspace_id = w.id) - 1)::int AS members
  FROM workspaces w WHERE w.id IN (:ids)`;

/** What deleting each workspace would remove, by id (one query for them all). */
export async function contentCounts(workspaceIds: string[], transaction?: Transaction): Promise<Map<string, WorkspaceContentCounts>> {
  if (!workspaceIds.length) return new Map();
  const rows = await db().query<WorkspaceContentCounts & { id: string }>(COUNTS_SQL, { replacements: { ids: workspaceIds }, type: QueryTypes.SELECT, transaction });
  return new Map(rows.map(({ id, ...counts }) => [id, counts]));
}

/** True when this user is a site admin and no other account is (locked FOR UPDATE inside a deletion's transaction). */
export async function isLastSiteAdmin(user: Pick<User, 'id' | 'siteRole'>, transaction?: Transaction): Promise<boolean> {
  if (user.siteRole !== 'admin') return false;
  const admins = await User.findAll({ where: { siteRole: 'admin' }, attributes: ['id'], transaction, lock: transaction ? transaction.LOCK.UPDATE : undefined });
  return !admins.some((a) => a.id !== user.id);
}

/** GET /api/v1/account/deletion-plan: what deleting the caller's account would do to each of their workspaces, before anything is done. */
export async function accountDeletionPlan(caller: Caller | null): Promise<AccountDeletionPlan> {
  requireSessionCaller(caller, 'Deleting an account');
  db();
  const user = await User.findByPk(caller.id);
  if (!user) throw unauthorized();
  const workspaces = await membershipsOf(user.id);
  const counts = await contentCounts(workspaces.map((w) => w.workspaceId));
  const empty: WorkspaceContentCounts = { systems: 0, revisions: 0, lessons: 0, steps: 0, profiles: 0, measurements: 0, shareLinks: 0, members: 0 };
  const [accessTokens, pendingInvitationsSent, lastAdmin] = await Promise.all([
    AccessToken.count({ where: { userId: user.id, revokedAt: null, [Op.or]: [{ expiresAt: null }, { expiresAt: { [Op.gt]: new Date() } }] } }),
    Invitation.count({ where: { invitedById: user.id, acceptedAt: null, expiresAt: { [Op.gt]: new Date() } } }),
    isLastSiteAdmin(user),
  ]);
  return {
    userId: user.id,
    name: user.name,
    email: user.email,
    blockedReason: lastAdmin ? LAST_SITE_ADMIN : null,
    accessTokens,
    pendingInvitationsSent,
    workspaces: workspaces
      .map((w) => ({ ...w, ifDeleted: counts.get(w.workspaceId) ?? empty }))
      .sort((a, b) => Number(b.onlyOwner) - Number(a.onlyOwner) || Number(b.personal) - Number(a.personal) || a.name.localeCompare(b.name)),
  };
}
