import { Op } from 'sequelize';
import { effectiveRole, requireMembership, requireSessionCaller, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { conflict, notFound } from '@/lib/errors';
import { Membership, User, Workspace, type WorkspaceRole } from '@/models';

export interface AppWorkspace {
  id: string;
  name: string;
  personal: boolean;
  role: WorkspaceRole;
  memberCount: number;
}

export interface AppMember {
  userId: string;
  name: string;
  email: string;
  role: WorkspaceRole;
  since: string;
}

export async function listWorkspaces(caller: Caller): Promise<AppWorkspace[]> {
  db();
  const where = caller.token ? { userId: caller.id, workspaceId: caller.token.workspaceId } : { userId: caller.id };
  const memberships = await Membership.findAll({ where, include: [{ model: Workspace, as: 'workspace' }] });
  const ids = memberships.map((m) => m.workspaceId);
  const counts = new Map<string, number>();
  if (ids.length) {
    const all = await Membership.findAll({ where: { workspaceId: { [Op.in]: ids } }, attributes: ['workspaceId'] });
    for (const m of all) counts.set(m.workspaceId, (counts.get(m.workspaceId) ?? 0) + 1);
  }
  return memberships
    .map((m) => {
      const w = (m as unknown as { workspace: Workspace }).workspace;
      return { id: w.id, name: w.name, personal: w.personal, role: effectiveRole(caller, m.role), memberCount: counts.get(w.id) ?? 1 };
    })
    .sort((a, b) => Number(b.personal) - Number(a.personal) || a.name.localeCompare(b.name));
}

export async function getWorkspace(caller: Caller, workspaceId: string): Promise<AppWorkspace> {
  const role = await requireMembership(caller, workspaceId, 'viewer', 'That workspace');
  const w = await Workspace.findByPk(workspaceId);
  if (!w) throw notFound('That workspace');
  const memberCount = await Membership.count({ where: { workspaceId } });
  return { id: w.id, name: w.name, personal: w.personal, role, memberCount };
}

export async function createWorkspace(caller: Caller, name: string): Promise<AppWorkspace> {
  requireSessionCaller(caller, 'Creating a workspace');
  const sequelize = db();
  return sequelize.transaction(async (transaction) => {
    const w = await Workspace.create({ name, personal: false }, { transaction });
    await Membership.create({ workspaceId: w.id, userId: caller.id, role: 'owner' }, { transaction });
    return { id: w.id, name: w.name, personal: false, role: 'owner' as const, memberCount: 1 };
  });
}

export async function renameWorkspace(caller: Caller, workspaceId: string, name: string): Promise<AppWorkspace> {
  await requireMembership(caller, workspaceId, 'owner', 'That workspace');
  await Workspace.update({ name }, { where: { id: workspaceId } });
  return getWorkspace(caller, workspaceId);
}

export async function listMembers(caller: Caller, workspaceId: string): Promise<AppMember[]> {
  await requireMembership(caller, workspaceId, 'viewer', 'That workspace');
  const rows = await Membership.findAll({ where: { workspaceId }, include: [{ model: User, as: 'user' }], order: [['createdAt', 'ASC']] });
  return rows.map((m) => {
    const u = (m as unknown as { user: User }).user;
    return { userId: u.id, name: u.name, email: u.email, role: m.role, since: m.createdAt.toISOString() };
  });
}

/** Changes a member's role or removes them; the last owner can be neither demoted nor removed. */
export async function changeMember(caller: Caller, workspaceId: string, userId: string, change: { role: WorkspaceRole } | 'remove'): Promise<void> {
  const self = caller.id === userId;
  // Anyone may leave (remove themselves) from a browser session; everything else needs an owner (which no token is).
  await requireMembership(caller, workspaceId, self && change === 'remove' && !caller.token ? 'viewer' : 'owner', 'That workspace');
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    // Lock the workspace's owner rows so two concurrent demotions cannot leave it without an owner.
    const owners = await Membership.findAll({ where: { workspaceId, role: 'owner' }, transaction, lock: transaction.LOCK.UPDATE });
    const target = await Membership.findOne({ where: { workspaceId, userId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!target) throw notFound('That member');
    const losesOwner = target.role === 'owner' && (change === 'remove' || change.role !== 'owner');
    if (losesOwner && owners.length <= 1) {
      throw conflict(
        self
          ? `A workspace needs at least one owner, and you are its only one: make another member an owner before you ${change === 'remove' ? 'leave' : 'step down'}.`
          : 'A workspace needs at least one owner. Make someone else an owner first.',
      );
    }
    if (change === 'remove') await target.destroy({ transaction });
    else await target.update({ role: change.role }, { transaction });
  });
}

export async function addMember(workspaceId: string, userId: string, role: WorkspaceRole): Promise<void> {
  db();
  const existing = await Membership.findOne({ where: { workspaceId, userId } });
  if (existing) {
    if (existing.role !== role) await existing.update({ role });
    return;
  }
  await Membership.create({ workspaceId, userId, role });
}

