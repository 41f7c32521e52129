import { Op } from 'sequelize';
import { requireMembership, requireSessionCaller, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { invalid, notFound } from '@/lib/errors';
import { hashToken, newToken } from '@/lib/tokens';
import { ACCESS_TOKEN_PREFIX, ACCESS_TOKEN_SHAPE } from '@/lib/validations/access-token';
import { AccessToken, User, Workspace, type TokenScope } from '@/models';
import { assertUuid } from './ids';

/** A token as its owner sees it in the list: never the secret, nor its hash. */
export interface AppAccessToken {
  id: string;
  name: string;
  workspaceId: string;
  workspaceName: string;
  scope: TokenScope;
  /** The secret's first characters followed by "…", to tell tokens apart. */
  hint: string;
  createdAt: string;
  expiresAt: string | null;
  lastUsedAt: string | null;
  revokedAt: string | null;
  /** 'active', 'expired' or 'revoked', as of the answer. */
  status: 'active' | 'expired' | 'revoked';
}

const HINT_LENGTH = ACCESS_TOKEN_PREFIX.length + 4;
const DAY_MS = 86_400_000;
/** Last use is written at most once a minute per token, so a busy program does not write on every call. */
const LAST_USED_RESOLUTION_MS = 60_000;

function toApp(t: AccessToken, workspaceName: string, now = Date.now()): AppAccessToken {
  const status = t.revokedAt ? 'revoked' : t.expiresAt && t.expiresAt.getTime() <= now ? 'expired' : 'active';
  return {
    id: t.id,
    name: t.name,
    workspaceId: t.workspaceId,
    workspaceName,
    scope: t.scope,
    hint: `${t.hint}…`,
    createdAt: t.createdAt.toISOString(),
    expiresAt: t.expiresAt?.toISOString() ?? null,
    lastUsedAt: t.lastUsedAt?.toISOString() ?? null,
    revokedAt: t.revokedAt?.toISOString() ?? null,
    status,
  };
}

const workspaceName = (t: AccessToken) => (t as unknown as { workspace?: Workspace }).workspace?.name ?? '';

/** How long a revoked or expired token stays in its owner's list, days. */
export const ENDED_TOKENS_LISTED_DAYS = 30;

/**
 * The caller's tokens, newest first: every active one, and the revoked and expired ones for ENDED_TOKENS_LISTED_DAYS
 * after they ended (so the list says what happened to them, without growing for ever). Older ones stay in the
 * database, refused as before, and leave with the account.
 */
export async function listAccessTokens(caller: Caller): Promise<AppAccessToken[]> {
  requireSessionCaller(caller, 'Managing access tokens');
  db();
  const since = new Date(Date.now() - ENDED_TOKENS_LISTED_DAYS * DAY_MS);
  const rows = await AccessToken.findAll({
    where: {
      userId: caller.id,
      [Op.or]: [{ revokedAt: { [Op.gt]: since } }, { revokedAt: null, [Op.or]: [{ expiresAt: null }, { expiresAt: { [Op.gt]: since } }] }],
    },
    include: [{ model: Workspace, as: 'workspace', attributes: ['name'] }],
    order: [['createdAt', 'DESC']],
  });
  return rows.map((t) => toApp(t, workspaceName(t)));
}

/** Makes a token; the answer holds the secret, which is never shown again (only its SHA-256 is stored). */
export async function createAccessToken(
  caller: Caller,
  input: { name: string; workspaceId: string; scope: TokenScope; expiresInDays?: number | null },
): Promise<AppAccessToken & { token: string }> {
  requireSessionCaller(caller, 'Making an access token');
  const role = await requireMembership(caller, input.workspaceId, 'viewer', 'That workspace');
  if (input.scope === 'write' && role === 'viewer') {
    throw invalid('You are a viewer in that workspace: a write token could not change anything there. Make a read token.', [
      { path: 'scope', message: 'a viewer can only make read tokens' },
    ]);
  }
  const secret = `${ACCESS_TOKEN_PREFIX}${newToken()}`;
  const expiresAt = input.expiresInDays ? new Date(Date.now() + input.expiresInDays * DAY_MS) : null;
  const row = await AccessToken.create({
    userId: caller.id,
    workspaceId: input.workspaceId,
    name: input.name,
    scope: input.scope,
    tokenHash: hashToken(secret),
    hint: secret.slice(0, HINT_LENGTH),
    expiresAt,
  });
  const workspace = await Workspace.findByPk(input.workspaceId, { attributes: ['name'] });
  return { ...toApp(row, workspace?.name ?? ''), token: secret };
}

/** Revokes one of the caller's tokens at once (idempotent: revoking a revoked token keeps its first date). */
export async function revokeAccessToken(caller: Caller, id: string): Promise<AppAccessToken> {
  requireSessionCaller(caller, 'Revoking an access token');
  assertUuid(id, 'That access token');
  db();
  const row = await AccessToken.findOne({ where: { id, userId: caller.id }, include: [{ model: Workspace, as: 'workspace', attributes: ['name'] }] });
  if (!row) throw notFound('That access token');
  if (!row.revokedAt) await row.update({ revokedAt: new Date() });
  return toApp(row, workspaceName(row));
}

/** The user a bearer secret acts for, or null when it is malformed, unknown, revoked or expired (the caller says 401 alike). */
export async function callerForAccessToken(secret: string): Promise<(Caller & { email: string; name: string }) | null> {
  if (!ACCESS_TOKEN_SHAPE.test(secret)) return null;
  db();
  const row = await AccessToken.findOne({
    where: { tokenHash: hashToken(secret), revokedAt: null, [Op.or]: [{ expiresAt: null }, { expiresAt: { [Op.gt]: new Date() } }] },
    include: [{ model: User, as: 'user', attributes: ['id', 'email', 'name'] }],
  });
  const user = row ? (row as unknown as { user?: User }).user : undefined;
  if (!row || !user) return null;
  const now = Date.now();
  if (!row.lastUsedAt || now - row.lastUsedAt.getTime() > LAST_USED_RESOLUTION_MS) {
    await AccessToken.update({ lastUsedAt: new Date(now) }, { where: { id: row.id } });
  }
  // A token never carries site-admin rights, whatever its owner's.
  return { id: user.id, email: user.email, name: user.name, siteRole: 'member', token: { id: row.id, workspaceId: row.workspaceId, scope: row.scope } };
}
