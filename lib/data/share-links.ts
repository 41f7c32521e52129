import { requireMembership, type Caller } from '@/lib/access';
import { config } from '@/lib/config';
import { db } from '@/lib/db';
import { notFound, unauthorized } from '@/lib/errors';
import { newToken } from '@/lib/tokens';
import { isShareToken } from '@/lib/validations/share-link';
import { Lesson, ShareLink, System, User } from '@/models';
import { assertUuid } from './ids';
import { systemMeasurementsUnchecked, type SharedMeasurement } from './measurements';
import { stepsOf, toStep, type AppLessonShareLink, type SharedLesson } from './lessons';
import { createSystem, getSystemUnchecked, type AppSystem } from './systems';

/**
 * Share links: read-only links to a System or a Lesson for anyone holding the token (256 bits from the CSPRNG). One
 * token rule, one page address and one answer shape per target, for Systems and Lessons alike.
 */

/** A System's share link as the API answers it. */
export interface AppShareLink {
  token: string;
  systemId: string;
  createdByName: string | null;
  createdAt: string;
  revokedAt: string | null;
  url: string;
}

type Target = 'system' | 'lesson';

const WHAT: Record<Target, string> = { system: 'That System', lesson: 'That Lesson' };

/** The public address of a share link's page, /s/{token} (Systems and Lessons alike). */
export function shareUrl(token: string): string {
  return `${config.appUrl}/s/${token}`;
}

const isoOrNull = (d: Date | null) => (d ? d.toISOString() : null);

function toSystemLink(l: ShareLink, createdByName: string | null): AppShareLink {
  return { token: l.token, systemId: l.targetId, createdByName, createdAt: l.createdAt.toISOString(), revokedAt: isoOrNull(l.revokedAt), url: shareUrl(l.token) };
}

function toLessonLink(l: ShareLink): AppLessonShareLink {
  return { token: l.token, url: shareUrl(l.token), lessonId: l.targetId, createdAt: l.createdAt.toISOString(), revokedAt: isoOrNull(l.revokedAt) };
}

/** The live (not deleted) System or Lesson a link points at, once the caller is an editor of its workspace; 404 otherwise. */
async function editableTarget(caller: Caller | null, type: Target, id: string): Promise<{ id: string; workspaceId: string }> {
  db();
  assertUuid(id, WHAT[type]);
  const attributes = ['id', 'workspaceId', 'deletedAt'];
  const row = type === 'system' ? await System.findByPk(id, { attributes }) : await Lesson.findByPk(id, { attributes });
  if (!row || row.deletedAt) throw notFound(WHAT[type]);
  // Editors only: a token is as good as read access for anyone holding it, so viewers (clients, students) do not hand it on.
  await requireMembership(caller, row.workspaceId, 'editor', WHAT[type]);
  return row;
}

async function createLink(caller: Caller | null, type: Target, id: string): Promise<ShareLink> {
  const target = await editableTarget(caller, type, id);
  return ShareLink.create({ token: newToken(), targetType: type, targetId: target.id, workspaceId: target.workspaceId, createdById: caller!.id });
}

async function openLinks(caller: Caller | null, type: Target, id: string): Promise<ShareLink[]> {
  const target = await editableTarget(caller, type, id);
  return ShareLink.findAll({ where: { targetType: type, targetId: target.id, revokedAt: null }, order: [['createdAt', 'DESC']] });
}

/** Revoking twice is harmless: the first revocation time stays. */
async function revoke(link: ShareLink): Promise<void> {
  if (!link.revokedAt) await link.update({ revokedAt: new Date() });
}

/** The live link with this token to a `type` target; null when unknown, revoked, or not a token at all. */
async function liveLink(token: string, type: Target): Promise<ShareLink | null> {
  db();
  if (!isShareToken(token)) return null;
  return ShareLink.findOne({ where: { token, targetType: type, revokedAt: null } });
}

/** An editor creates a read-only link to a System. */
export async function createShareLink(caller: Caller | null, systemId: string): Promise<AppShareLink> {
  const link = await createLink(caller, 'system', systemId);
  const me = await User.findByPk(caller!.id, { attributes: ['name'] });
  return toSystemLink(link, me?.name ?? null);
}

/** The System's open links, newest first (editors). */
export async function listShareLinks(caller: Caller | null, systemId: string): Promise<AppShareLink[]> {
  const rows = await openLinks(caller, 'system', systemId);
  const authorIds = [...new Set(rows.map((r) => r.createdById).filter((x): x is string => !!x))];
  const authors = new Map((authorIds.length ? await User.findAll({ where: { id: authorIds }, attributes: ['id', 'name'] }) : []).map((u) => [u.id, u.name]));
  return rows.map((r) => toSystemLink(r, r.createdById ? (authors.get(r.createdById) ?? null) : null));
}

/** Revokes a link by its token (editors of its workspace); an unknown token is 404. */
export async function revokeShareLink(caller: Caller | null, token: string): Promise<AppShareLink> {
  db();
  if (!isShareToken(token)) throw notFound('That share link');
  const link = await ShareLink.findOne({ where: { token } });
  if (!link) throw notFound('That share link');
  await requireMembership(caller, link.workspaceId, 'editor', 'That share link');
  await revoke(link);
  return toSystemLink(link, null);
}

/** An editor creates a read-only student link to a Lesson. */
export async function createLessonShareLink(caller: Caller | null, lessonId: string): Promise<AppLessonShareLink> {
  return toLessonLink(await createLink(caller, 'lesson', lessonId));
}

/** The Lesson's open links, newest first (editors). */
export async function listLessonShareLinks(caller: Caller | null, lessonId: string): Promise<AppLessonShareLink[]> {
  return (await openLinks(caller, 'lesson', lessonId)).map(toLessonLink);
}

/** Revokes one of the Lesson's links; a token of another Lesson is 404. */
export async function revokeLessonShareLink(caller: Caller | null, lessonId: string, token: string): Promise<AppLessonShareLink> {
  const lesson = await editableTarget(caller, 'lesson', lessonId);
  if (!isShareToken(token)) throw notFound('That share link');
  const link = await ShareLink.findOne({ where: { token, targetType: 'lesson', targetId: lesson.id } });
  if (!link) throw notFound('That share link');
  await revoke(link);
  return toLessonLink(link);
}

/** The System behind a live link, for anyone holding the token; null when unknown, revoked or deleted. */
export async function getSharedSystem(token: string): Promise<(AppSystem & { sharedAt: string }) | null> {
  const link = await liveLink(token, 'system');
  if (!link) return null;
  const system = await getSystemUnchecked(link.targetId);
  return system ? { ...system, sharedAt: link.createdAt.toISOString() } : null;
}

/**
 * The measurements of the System behind a live link, read-only, for anyone holding the token: only those uploaded for
 * that System in its own workspace (never another System's or the rest of the workspace's); null when the link is
 * unknown, revoked or its System deleted.
 */
export async function getSharedMeasurements(token: string): Promise<{ items: SharedMeasurement[]; omitted: number } | null> {
  const link = await liveLink(token, 'system');
  if (!link) return null;
  const system = await System.findByPk(link.targetId, { attributes: ['id', 'workspaceId', 'deletedAt'] });
  if (!system || system.deletedAt) return null;
  return systemMeasurementsUnchecked(system.id, system.workspaceId);
}

/** The Lesson behind a live link, for anyone holding the token; null when unknown, revoked or deleted. */
export async function getLessonByShareToken(token: string): Promise<SharedLesson | null> {
  const link = await liveLink(token, 'lesson');
  if (!link) return null;
  const lesson = await Lesson.findByPk(link.targetId);
  if (!lesson || lesson.deletedAt) return null;
  const steps = (await stepsOf(lesson.id)).map(toStep).map((s) => ({ position: s.position, title: s.title, points: s.points, panel: s.panel, traces: s.traces, sweep: s.sweep, document: s.document }));
  return { title: lesson.title, description: lesson.description, sharedAt: link.createdAt.toISOString(), steps };
}

/** A signed-in visitor copies a shared System into a workspace where they are an editor. */
export async function copySharedSystem(caller: Caller | null, token: string, input: { workspaceId: string; name?: string }): Promise<AppSystem> {
  if (!caller) throw unauthorized('Sign in to copy this System into your Library.');
  const shared = await getSharedSystem(token);
  if (!shared) throw notFound('That share link');
  await requireMembership(caller, input.workspaceId, 'editor', 'That workspace');
  return createSystem(caller, {
    name: input.name ?? `${shared.name} (copy)`,
    document: shared.document,
    workspaceId: input.workspaceId,
    note: `copied from a share link (revision ${shared.revision})`,
  });
}
