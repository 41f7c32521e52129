import { Op, type WhereOptions } from 'sequelize';
import { callerWorkspaces, requireMembership, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { notFound } from '@/lib/errors';
import { profileFieldsSchema, type ProfileFields, type ProfileListQuery } from '@/lib/validations/profile';
import { SpeakerProfileRow, User, Workspace } from '@/models';
import { assertUuid } from './ids';
import { personalWorkspaceId } from './systems';

export interface AppProfile extends ProfileFields {
  id: string;
  workspaceId: string;
  workspaceName: string;
  createdByName: string | null;
  createdAt: string;
  updatedAt: string;
}

type Row = SpeakerProfileRow & { workspace?: Workspace; createdBy?: User | null };

const include = [
  { model: Workspace, as: 'workspace', attributes: ['id', 'name'] },
  { model: User, as: 'createdBy', attributes: ['id', 'name'] },
];

function toApp(r: Row): AppProfile {
  // Stored fields are re-validated on the way out; name and kind come from their columns.
  const fields = profileFieldsSchema.parse({ ...(r.document as object), name: r.name, kind: r.kind });
  return {
    ...fields,
    id: r.id,
    workspaceId: r.workspaceId,
    workspaceName: r.workspace?.name ?? '',
    createdByName: r.createdBy?.name ?? null,
    createdAt: r.createdAt.toISOString(),
    updatedAt: r.updatedAt.toISOString(),
  };
}

function escapeLike(s: string) {
  return s.replace(/[\\%_]/g, (c) => `\\${c}`);
}

/** Profiles of every workspace the caller belongs to (or one), main speakers first, by name. */
export async function listProfiles(caller: Caller, query: ProfileListQuery): Promise<{ items: AppProfile[]; total: number }> {
  const workspaces = await callerWorkspaces(caller);
  let ids = [...workspaces.keys()];
  if (query.workspaceId) ids = ids.filter((id) => id === query.workspaceId);
  if (!ids.length) return { items: [], total: 0 };
  const where: WhereOptions = {
    workspaceId: { [Op.in]: ids },
    ...(query.kind ? { kind: query.kind } : {}),
    ...(query.q ? { name: { [Op.iLike]: `%${escapeLike(query.q)}%` } } : {}),
  };
  const rows = (await SpeakerProfileRow.findAll({ where, include, order: [['kind', 'ASC'], ['name', 'ASC'], ['id', 'ASC']], limit: 500 })) as Row[];
  return { items: rows.map(toApp), total: rows.length };
}

async function findRow(id: string): Promise<Row> {
  db();
  assertUuid(id, 'That Speaker profile');
  const r = (await SpeakerProfileRow.findByPk(id, { include })) as Row | null;
  if (!r) throw notFound('That Speaker profile');
  return r;
}

function split(fields: ProfileFields) {
  const { name, kind, ...document } = fields;
  return { name, kind, document };
}

export async function getProfile(caller: Caller, id: string): Promise<AppProfile> {
  const r = await findRow(id);
  await requireMembership(caller, r.workspaceId, 'viewer', 'That Speaker profile');
  return toApp(r);
}

export async function createProfile(caller: Caller, input: ProfileFields & { workspaceId?: string }): Promise<AppProfile> {
  const { workspaceId: requested, ...fields } = input;
  const workspaceId = requested ?? (await personalWorkspaceId(caller));
  await requireMembership(caller, workspaceId, 'editor', 'That workspace');
  const created = await SpeakerProfileRow.create({ workspaceId, createdById: caller.id, ...split(fields) });
  return toApp(await findRow(created.id));
}

export async function updateProfile(caller: Caller, id: string, fields: ProfileFields): Promise<AppProfile> {
  const r = await findRow(id);
  await requireMembership(caller, r.workspaceId, 'editor', 'That Speaker profile');
  await SpeakerProfileRow.update(split(fields), { where: { id } });
  return toApp(await findRow(id));
}

/** Deletes a Library profile. Systems keep their own copy of any profile they use, so none changes. */
export async function deleteProfile(caller: Caller, id: string): Promise<void> {
  const r = await findRow(id);
  await requireMembership(caller, r.workspaceId, 'editor', 'That Speaker profile');
  await SpeakerProfileRow.destroy({ where: { id } });
}

/** For the demo seed: adds a profile to a workspace unless one of that name and kind is there. */
export async function ensureProfile(workspaceId: string, createdById: string | null, fields: ProfileFields): Promise<boolean> {
  db();
  const parsed = profileFieldsSchema.parse(fields);
  const existing = await SpeakerProfileRow.findOne({ where: { workspaceId, name: parsed.name, kind: parsed.kind } });
  if (existing) return false;
  await SpeakerProfileRow.create({ workspaceId, createdById, ...split(parsed) });
  return true;
}
