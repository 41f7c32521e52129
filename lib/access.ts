import { db } from './db';
import { forbidden, notFound, unauthorized } from './errors';
import { Membership, type TokenScope, type WorkspaceRole } from '@/models';

export const ROLE_RANK: Record<WorkspaceRole, number> = { viewer: 1, editor: 2, owner: 3 };

export interface Caller {
  id: string;
  siteRole: 'admin' | 'member';
  /** Set when the caller came with a personal access token: it reaches one workspace only, with its scope's cap. */
  token?: { id: string; workspaceId: string; scope: TokenScope };
}

/** The highest role a token's scope allows: a read token is a viewer, a write token at most an editor (never an owner). */
const SCOPE_CAP: Record<TokenScope, WorkspaceRole> = { read: 'viewer', write: 'editor' };

/** The role a caller acts with: their membership's, capped by their token's scope when they came with one. */
export function effectiveRole(caller: Caller, memberRole: WorkspaceRole): WorkspaceRole {
  if (!caller.token) return memberRole;
  const cap = SCOPE_CAP[caller.token.scope];
  return ROLE_RANK[memberRole] <= ROLE_RANK[cap] ? memberRole : cap;
}

/** What a token caller may not do at all (account and workspace management): 403 with the reason. */
export function requireSessionCaller(caller: Caller | null, what: string): asserts caller is Caller {
  if (!caller) throw unauthorized();
  if (caller.token) throw forbidden(`${what} needs a signed-in browser session; an access token cannot do it.`);
}

/**
 * The one access rule for workspace content. Not a member → 404 (an outsider learns nothing,
 * not even that it exists); a member below `minimumRole` → 403; no caller → 401.
 * Site admins manage users; they get no implicit access to workspace content.
 */
export async function requireMembership(caller: Caller | null, workspaceId: string, minimumRole: WorkspaceRole, what = 'That'): Promise<WorkspaceRole> {
  if (!caller) throw unauthorized();
  if (caller.token && caller.token.workspaceId !== workspaceId) throw notFound(what);
  db();
  const membership = await Membership.findOne({ where: { workspaceId, userId: caller.id } });
  if (!membership) throw notFound(what);
  const role = effectiveRole(caller, membership.role);
  if (ROLE_RANK[role] < ROLE_RANK[minimumRole]) {
    if (caller.token && ROLE_RANK[membership.role] >= ROLE_RANK[minimumRole]) {
      throw forbidden(caller.token.scope === 'read' ? 'This access token can only read.' : 'An access token cannot do what only a workspace owner can.');
    }
    throw forbidden(minimumRole === 'owner' ? 'Only a workspace owner can do this.' : 'Viewers can look but not change anything in this workspace.');
  }
  return role;
}

export function requireSiteAdmin(caller: Caller | null): void {
  if (!caller) throw unauthorized();
  if (caller.siteRole !== 'admin' || caller.token) throw notFound('That page');
}

/** Workspace ids the caller belongs to, with their role. */
export async function callerWorkspaces(caller: Caller): Promise<Map<string, WorkspaceRole>> {
  db();
  const where = caller.token ? { userId: caller.id, workspaceId: caller.token.workspaceId } : { userId: caller.id };
  const rows = await Membership.findAll({ where });
  return new Map(rows.map((m) => [m.workspaceId, effectiveRole(caller, m.role)]));
}
