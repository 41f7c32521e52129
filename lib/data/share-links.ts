import { requireMembership, type Caller } from '@/lib/access';
import { config } from '@/lib/config';
import { db } from '@/lib/db';
import { notFound, unauthorized } from '@/lib/errors';
import { newToken } from '@/lib/tokens';
import { ShareLink, System, User } from '@/models';
import { createSystem, getSystemUnchecked, type AppSystem } from './systems';

export interface AppShareLink {
  token: string;
  systemId: string;
  createdByName: string | null;
  createdAt: string;
  revokedAt: string | null;
}

/** Tokens are base64url of 32 CSPRNG bytes; anything else cannot be one (and is simply not found). */
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{16,64}$/;

type LinkRow = ShareLink & { createdBy?: User | null };

function toApp(l: LinkRow, createdByName: string | null = null): AppShareLink {
  return { token: l.token, systemId: l.targetId, createdByName, createdAt: l.createdAt.toISOString(), revokedAt: l.revokedAt ? l.revokedAt.toISOString() : null };
}

async function liveSystemRow(systemId: string): Promise<System> {
  db();
  if (!/^[0-9a-f-]{36}$/i.test(systemId)) throw notFound('That System');
  const s = await System.findByPk(systemId, { attributes: ['id', 'workspaceId', 'deletedAt'] });
  if (!s || s.deletedAt) throw notFound('That System');
  return s;
}

/** An editor creates a read-only link to a System (256-bit token from the CSPRNG). */
export async function createShareLink(caller: Caller | null, systemId: string): Promise<AppShareLink> {
  const s = await liveSystemRow(systemId);
  await requireMembership(caller, s.workspaceId, 'editor', 'That System');
  const link = await ShareLink.create({ token: newToken(), targetType: 'system', targetId: s.id, workspaceId: s.workspaceId, createdById: caller!.id });
  const me = await User.findByPk(caller!.id, { attributes: ['name'] });
  return toApp(link, me?.name ?? null);
}

/**
 * The System's live links. Editors only: a token is as good as read access for anyone holding it,
 * so viewers (clients, students) do not get to hand it on.
 */
export async function listShareLinks(caller: Caller | null, systemId: string): Promise<AppShareLink[]> {
  const s = await liveSystemRow(systemId);
  await requireMembership(caller, s.workspaceId, 'editor', 'That System');
  const rows = await ShareLink.findAll({ where: { targetType: 'system', targetId: s.id, revokedAt: null }, order: [['createdAt', 'DESC']] });
  const authorIds = [...new Set(rows.map((r) => r.createdById).filter((x): x is string => !!x))];
  const authors = new Map((authorIds.length ? await User.findAll({ where: { id: authorIds }, attributes: ['id', 'name'] }) : []).map((u) => [u.id, u.name]));
  return rows.map((r) => toApp(r, r.createdById ? (authors.get(r.createdById) ?? null) : null));
}

/** Revokes a link (editors of its workspace). Revoking twice is harmless; an unknown token is 404. */
export async function revokeShareLink(caller: Caller | null, token: string): Promise<AppShareLink> {
  db();
  if (!TOKEN_SHAPE.test(token)) throw notFound('That share link');
  const link = await ShareLink.findOne({ where: { token } });
  if (!link) throw notFound('That share link');
  await requireMembership(caller, link.workspaceId, 'editor', 'That share link');
  if (!link.revokedAt) await link.update({ revokedAt: new Date() });
  return toApp(link);
}

/** The System behind a live link, for anyone holding the token; null when unknown, revoked or deleted. */
export async function getSharedSystem(token: string): Promise<(AppSystem & { sharedAt: string }) | null> {
  db();
  if (!TOKEN_SHAPE.test(token)) return null;
  const link = await ShareLink.findOne({ where: { token, targetType: 'system', revokedAt: null } });
  if (!link) return null;
  const system = await getSystemUnchecked(link.targetId);
  return system ? { ...system, sharedAt: link.createdAt.toISOString() } : null;
}

/** A signed-in visitor copies a shared System into a workspace where they are an editor. */
export async function copySharedSystem(caller: Caller | null, token: string, input: { workspaceId: string; name?: string }): Promise<AppSystem> {
  if (!caller) throw unauthorized('Sign in to copy this System into your Library.');
  const shared = await getSharedSystem(token);
  if (!shared) throw notFound('That share link');
  await requireMembership(caller, input.workspaceId, 'editor', 'That workspace');
  return createSystem(caller!, {
    name: input.name ?? `${shared.name} (copy)`,
    document: shared.document,
    workspaceId: input.workspaceId,
    note: `copied from a share link (revision ${shared.revision})`,
  });
}

/** The public address of a share link's page. */
export function shareUrl(token: string): string {
  return `${config.appUrl}/s/${token}`;
}
