import { col, fn, Op, type OrderItem, type WhereOptions } from 'sequelize';
import { callerWorkspaces, requireMembership, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { conflict, notFound } from '@/lib/errors';
import { isUuid } from '@/lib/validations/common';
import type { SystemListQuery } from '@/lib/validations/library';
import { systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';
import { System, SystemRevision, User, Workspace } from '@/models';

export const RESTORE_WINDOW_DAYS = 30;

export interface AppSystemSummary {
  id: string;
  workspaceId: string;
  workspaceName: string;
  name: string;
  revision: number;
  tags: string[];
  ownerName: string;
  lastEditorName: string;
  updatedAt: string;
  deletedAt: string | null;
}

export interface AppSystem extends AppSystemSummary {
  document: SystemDocument;
  role: 'owner' | 'editor' | 'viewer';
}

export interface AppRevision {
  revision: number;
  name: string;
  authorName: string | null;
  note: string | null;
  createdAt: string;
}

type SystemRow = System & { owner?: User | null; lastEditor?: User | null; workspace?: Workspace };

const include = [
  { model: User, as: 'owner', attributes: ['id', 'name'] },
  { model: User, as: 'lastEditor', attributes: ['id', 'name'] },
  { model: Workspace, as: 'workspace', attributes: ['id', 'name'] },
];

function toSummary(s: SystemRow): AppSystemSummary {
  return {
    id: s.id,
    workspaceId: s.workspaceId,
    workspaceName: s.workspace?.name ?? '',
    name: s.name,
    revision: s.revision,
    tags: s.tags,
    ownerName: s.owner?.name ?? 'a former member',
    lastEditorName: s.lastEditor?.name ?? 'a former member',
    updatedAt: s.updatedAt.toISOString(),
    deletedAt: s.deletedAt ? s.deletedAt.toISOString() : null,
  };
}

/** Stored documents are re-validated on the way out, so nothing malformed reaches a page. */
function readDocument(raw: unknown): SystemDocument {
  return systemDocumentSchema.parse(raw);
}

function escapeLike(s: string) {
  return s.replace(/[\\%_]/g, (c) => `\\${c}`);
}

export async function listSystems(caller: Caller, query: SystemListQuery): Promise<{ items: AppSystemSummary[]; total: number; page: number; pageSize: number }> {
  const workspaces = await callerWorkspaces(caller);
  let ids = [...workspaces.keys()];
  if (query.workspaceId) ids = ids.filter((id) => id === query.workspaceId);
  if (!ids.length) return { items: [], total: 0, page: query.page, pageSize: query.pageSize };
  const since = new Date(Date.now() - RESTORE_WINDOW_DAYS * 86400_000);
  const where: WhereOptions = {
    workspaceId: { [Op.in]: ids },
    deletedAt: query.deleted === '1' ? { [Op.gte]: since } : null,
    ...(query.q ? { name: { [Op.iLike]: `%${escapeLike(query.q)}%` } } : {}),
    ...(query.tag ? { tags: { [Op.contains]: [query.tag] } } : {}),
  };
  const direction = query.sort.startsWith('-') ? 'DESC' : 'ASC';
  // By name: case-insensitive (the database collates bytewise, which would put "alder" after "Cedar").
  const order: OrderItem[] = query.sort.endsWith('name') ? [[fn('lower', col('System.name')), direction]] : [['updatedAt', direction]];
  const { rows, count } = await System.findAndCountAll({
    where,
    include,
    order: [...order, ['id', 'ASC']],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
    attributes: { exclude: ['document'] },
    distinct: true,
  });
  return { items: rows.map((r) => toSummary(r as SystemRow)), total: count, page: query.page, pageSize: query.pageSize };
}

export async function listTags(caller: Caller): Promise<string[]> {
  const ids = [...(await callerWorkspaces(caller)).keys()];
  if (!ids.length) return [];
  const rows = (await db().query('SELECT DISTINCT unnest(tags) AS tag FROM systems WHERE workspace_id IN (:ids) AND deleted_at IS NULL ORDER BY tag', {
    replacements: { ids },
    type: 'SELECT',
  })) as { tag: string }[];
  return rows.map((r) => r.tag);
}

/** The System row with `id`, or null when no System has that id (or the id cannot be one). Database errors are thrown. */
async function findRow(id: string): Promise<SystemRow | null> {
  if (!isUuid(id)) return null;
  db();
  return (await System.findByPk(id, { include })) as SystemRow | null;
}

async function findLive(id: string, { includeDeleted = false } = {}): Promise<SystemRow> {
  const s = await findRow(id);
  if (!s || (s.deletedAt && !includeDeleted)) throw notFound('That System');
  return s;
}

export async function getSystem(caller: Caller, id: string): Promise<AppSystem> {
  const s = await findLive(id);
  const role = await requireMembership(caller, s.workspaceId, 'viewer', 'That System');
  return { ...toSummary(s), document: readDocument(s.document), role };
}

/**
 * For share links: no caller check (the caller has checked the token). Null when no live System has this id; a
 * database error is thrown, so an outage answers 503 rather than passing for a link that does not work.
 */
export async function getSystemUnchecked(id: string): Promise<AppSystem | null> {
  const s = await findRow(id);
  if (!s || s.deletedAt) return null;
  return { ...toSummary(s), document: readDocument(s.document), role: 'viewer' };
}

export async function personalWorkspaceId(caller: Caller): Promise<string> {
  const workspaces = await callerWorkspaces(caller);
  const rows = await Workspace.findAll({ where: { id: { [Op.in]: [...workspaces.keys()] } }, order: [['createdAt', 'ASC']] });
  const writable = rows.filter((w) => workspaces.get(w.id) !== 'viewer');
  const pick = writable.find((w) => w.personal) ?? writable[0];
  if (!pick) throw notFound('A workspace where you can save');
  return pick.id;
}

export async function createSystem(caller: Caller, input: { name: string; document: SystemDocument; workspaceId?: string; note?: string }): Promise<AppSystem> {
  const workspaceId = input.workspaceId ?? (await personalWorkspaceId(caller));
  const role = await requireMembership(caller, workspaceId, 'editor', 'That workspace');
  const sequelize = db();
  const id = await sequelize.transaction(async (transaction) => {
    const s = await System.create(
      { workspaceId, ownerId: caller.id, lastEditorId: caller.id, name: input.name, document: input.document, revision: 1, tags: input.document.tags },
      { transaction },
    );
    await SystemRevision.create({ systemId: s.id, revision: 1, name: s.name, document: input.document, authorId: caller.id, note: input.note || 'created' }, { transaction });
    return s.id;
  });
  const created = await findLive(id);
  return { ...toSummary(created), document: input.document, role };
}

/**
 * Saves a new revision if and only if `revision` is the current one; otherwise 409 with the
 * current revision, changing nothing. The System row and its revision row go in one transaction.
 */
export async function updateSystem(caller: Caller, id: string, input: { name: string; document: SystemDocument; revision: number; note?: string }): Promise<AppSystem> {
  const s = await findLive(id);
  const role = await requireMembership(caller, s.workspaceId, 'editor', 'That System');
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const [count] = await System.update(
      { name: input.name, document: input.document, tags: input.document.tags, revision: input.revision + 1, lastEditorId: caller.id },
      { where: { id, revision: input.revision, deletedAt: null }, transaction },
    );
    if (count !== 1) {
      const current = await System.findByPk(id, { transaction });
      throw conflict(`Someone saved this System since you opened it (it is now at revision ${current?.revision ?? '?'}). Your edits are kept: reload, or save them as a copy.`, {
        currentRevision: current?.revision ?? null,
      });
    }
    await SystemRevision.create({ systemId: id, revision: input.revision + 1, name: input.name, document: input.document, authorId: caller.id, note: input.note || null }, { transaction });
  });
  const saved = await findLive(id);
  return { ...toSummary(saved), document: readDocument(saved.document), role };
}

export async function renameSystem(caller: Caller, id: string, name: string, revision: number): Promise<AppSystem> {
  const current = await getSystem(caller, id);
  return updateSystem(caller, id, { name, document: current.document, revision, note: 'renamed' });
}

export async function duplicateSystem(caller: Caller, id: string, options: { name?: string; workspaceId?: string } = {}): Promise<AppSystem> {
  const source = await getSystem(caller, id);
  return createSystem(caller, { name: options.name ?? `${source.name} (copy)`, document: source.document, workspaceId: options.workspaceId ?? source.workspaceId, note: `copied from revision ${source.revision}` });
}

export async function deleteSystem(caller: Caller, id: string): Promise<void> {
  const s = await findLive(id);
  await requireMembership(caller, s.workspaceId, 'editor', 'That System');
  await System.update({ deletedAt: new Date() }, { where: { id, deletedAt: null } });
}

export async function restoreSystem(caller: Caller, id: string): Promise<AppSystem> {
  const s = await findLive(id, { includeDeleted: true });
  await requireMembership(caller, s.workspaceId, 'editor', 'That System');
  if (s.deletedAt && s.deletedAt.getTime() < Date.now() - RESTORE_WINDOW_DAYS * 86400_000) throw notFound('That System');
  await System.update({ deletedAt: null }, { where: { id } });
  return getSystem(caller, id);
}

export async function listRevisions(caller: Caller, id: string): Promise<AppRevision[]> {
  const s = await findLive(id);
  await requireMembership(caller, s.workspaceId, 'viewer', 'That System');
  const rows = await SystemRevision.findAll({ where: { systemId: id }, include: revisionInclude, order: [['revision', 'DESC']], attributes: { exclude: ['document'] } });
  return rows.map(toRevision);
}

const revisionInclude = [{ model: User, as: 'author', attributes: ['name'] }];

function toRevision(r: SystemRevision): AppRevision {
  return {
    revision: r.revision,
    name: r.name,
    authorName: (r as unknown as { author?: User }).author?.name ?? null,
    note: r.note ?? null,
    createdAt: r.createdAt.toISOString(),
  };
}

export async function getRevision(caller: Caller, id: string, revision: number): Promise<{ revision: number; name: string; note: string | null; document: SystemDocument; createdAt: string }> {
  const s = await findLive(id);
  await requireMembership(caller, s.workspaceId, 'viewer', 'That System');
  const r = await SystemRevision.findOne({ where: { systemId: id, revision } });
  if (!r) throw notFound('That revision');
  return { revision: r.revision, name: r.name, note: r.note ?? null, document: readDocument(r.document), createdAt: r.createdAt.toISOString() };
}

/** The note of one revision (null when it has none), for a page that shows that revision. Viewers may read it. */
export async function getRevisionNote(caller: Caller, id: string, revision: number): Promise<string | null> {
  const s = await findLive(id);
  await requireMembership(caller, s.workspaceId, 'viewer', 'That System');
  const r = await SystemRevision.findOne({ where: { systemId: id, revision }, attributes: ['note'] });
  if (!r) throw notFound('That revision');
  return r.note ?? null;
}

/**
 * Changes the note of a saved revision (editors and owners; an empty note removes it). Only the note changes: the
 * revision's document, name, author and time stay as they were, and no new revision is made.
 */
export async function setRevisionNote(caller: Caller, id: string, revision: number, note: string): Promise<AppRevision> {
  const s = await findLive(id);
  await requireMembership(caller, s.workspaceId, 'editor', 'That System');
  const [count] = await SystemRevision.update({ note: note || null }, { where: { systemId: id, revision } });
  if (count !== 1) throw notFound('That revision');
  const row = await SystemRevision.findOne({ where: { systemId: id, revision }, include: revisionInclude, attributes: { exclude: ['document'] } });
  if (!row) throw notFound('That revision');
  return toRevision(row);
}

/** Restoring an old revision saves it as a new revision (history only grows). */
export async function restoreRevision(caller: Caller, id: string, revision: number, currentRevision: number): Promise<AppSystem> {
  const old = await getRevision(caller, id, revision);
  return updateSystem(caller, id, { name: old.name, document: old.document, revision: currentRevision, note: `restored revision ${revision}` });
}
