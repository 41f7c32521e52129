import { db } from './db';
import { forbidden, notFound, unauthorized } from './errors';
import { Membership, type WorkspaceRole } from '@/models';

export const ROLE_RANK: Record<WorkspaceRole, number> = { viewer: 1, editor: 2, owner: 3 };

export interface Caller {
  id: string;
  siteRole: 'admin' | 'member';
}

/**
 * The one access rule for workspace content. Not a member → 404 (an outsider learns nothing,
 * not even that it exists); a member below `minimumRole` → 403; no caller → 401.
 * Site admins manage users; they get no implicit access to workspace content.
 */
export async function requireMembership(caller: Caller | null, workspaceId: string, minimumRole: WorkspaceRole, what = 'That'): Promise<WorkspaceRole> {
  if (!caller) throw unauthorized();
  db();
  const membership = await Membership.findOne({ where: { workspaceId, userId: caller.id } });
  if (!membership) throw notFound(what);
  if (ROLE_RANK[membership.role] < ROLE_RANK[minimumRole]) {
    throw forbidden(minimumRole === 'owner' ? 'Only a workspace owner can do this.' : 'Viewers can look but not change anything in this workspace.');
  }
  return membership.role;
}

export function requireSiteAdmin(caller: Caller | null): void {
  if (!caller) throw unauthorized();
  if (caller.siteRole !== 'admin') throw notFound('That page');
}

/** Workspace ids the caller belongs to, with their role. */
export async function callerWorkspaces(caller: Caller): Promise<Map<string, WorkspaceRole>> {
  db();
  const rows = await Membership.findAll({ where: { userId: caller.id } });
  return new Map(rows.map((m) => [m.workspaceId, m.role]));
}
