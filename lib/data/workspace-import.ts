import type { Transaction } from 'sequelize';
import type { z } from 'zod';
import { requireMembership, requireSessionCaller, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { AppError, conflict, notFound, zodIssues } from '@/lib/errors';
import {
  SYSTEM_FILE_FORMAT,
  systemFileSchema,
  TRANSFER_VERSION,
  WORKSPACE_FILE_FORMAT,
  workspaceFileSchema,
  type SystemFile,
  type WorkspaceFile,
} from '@/lib/validations/workspace-transfer';
import { Lesson, Measurement, Membership, SpeakerProfileRow, System, User, Workspace, type WorkspaceRole } from '@/models';
import { assertUuid } from './ids';
import { writeParts, type ImportParts, type ImportWritten } from './workspace-import-rows';

/**
 * Bringing a transfer file in (lib/validations/workspace-transfer.ts). The whole file is validated first, every part
 * with the schema the app uses for it; a refusal is a 400 naming the part and field and nothing is written. Then
 * everything is created in one transaction with fresh ids. Members are never added from a file: the answer lists them
 * (and whether each is a member here) so an owner can invite the others.
 */

export interface TransferImportAnswer extends ImportWritten {
  workspaceId: string;
  workspaceName: string;
  /** The exported workspace's members, and whether each is already a member of the workspace imported into. */
  members: { email: string; role: WorkspaceRole; alreadyMember: boolean }[];
  /** People the file credits (authors, uploaders, owners) who are not members here: their work shows "a former member". */
  formerMembers: string[];
}

/** Most issues one refusal lists (`totalIssues` counts them all). */
const MAX_LISTED_ISSUES = 50;

const FORMAT_HINT: Record<string, string> = {
  [WORKSPACE_FILE_FORMAT]: 'This is a whole-workspace file: import it as a workspace (POST /api/v1/workspaces/import, or "Import a workspace file" on the Team page).',
  [SYSTEM_FILE_FORMAT]: 'This is a System file: import it into a workspace (POST /api/v1/workspaces/{id}/systems/import, or "Import a System file" on the Team page).',
};

function refuse(issues: { path: string; message: string }[], hint = ''): never {
  const first = issues[0] ?? { path: '(body)', message: 'not valid' };
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : '';
  const message = `The file was refused and nothing was changed: ${first.path}: ${first.message}${more}.${hint ? ` ${hint}` : ''}`;
  throw new AppError(400, 'invalid', message, issues.slice(0, MAX_LISTED_ISSUES), { totalIssues: issues.length });
}

/** The file checked whole: its format and version first (so a file of another version is not read field by field), then every part. */
function validated<S extends z.ZodType>(schema: S, raw: unknown, format: string): z.output<S> {
  const head = raw && typeof raw === 'object' && !Array.isArray(raw) ? (raw as { format?: unknown; version?: unknown }) : null;
  if (!head) refuse([{ path: '(body)', message: 'must be a JSON object: a Seamline transfer file' }]);
  if (head.format !== format) {
    const hint = typeof head.format === 'string' ? FORMAT_HINT[head.format] : undefined;
    refuse([{ path: 'format', message: `must be "${format}"` }], hint);
  }
  if (head.version !== TRANSFER_VERSION) refuse([{ path: 'version', message: `must be ${TRANSFER_VERSION}: this Seamline reads version ${TRANSFER_VERSION} files (the file says ${JSON.stringify(head.version ?? null)})` }]);
  const parsed = schema.safeParse(raw);
  if (!parsed.success) refuse(zodIssues(parsed.error));
  return parsed.data;
}

/** Members of the workspace by e-mail (inside the transaction, so a workspace made by it counts its owner). */
async function membersByEmail(workspaceId: string, t: Transaction): Promise<Map<string, string>> {
  const rows = await Membership.findAll({ where: { workspaceId }, include: [{ model: User, as: 'user', attributes: ['id', 'email'] }], transaction: t });
  return new Map(rows.map((m) => [(m as unknown as { user: User }).user.email, m.userId]));
}

/** E-mails the parts credit that are not members here. */
function notMembers(parts: ImportParts, people: Map<string, string>): string[] {
  const named = [
    ...parts.profiles.map((p) => p.createdByEmail),
    ...parts.systems.flatMap((s) => s.revisions.map((r) => r.authorEmail)),
    ...parts.measurements.map((m) => m.createdByEmail),
    ...parts.lessons.map((l) => l.ownerEmail),
  ];
  return [...new Set(named.filter((e): e is string => e !== null && !people.has(e)))].sort();
}

/** An existing workspace may take a whole-workspace file only while it holds nothing (deleted Systems and Lessons included). */
async function assertEmpty(workspaceId: string, t: Transaction): Promise<void> {
  const where = { workspaceId };
  const [systems, lessons, profiles, measurements] = await Promise.all([
    System.count({ where, transaction: t }),
    Lesson.count({ where, transaction: t }),
    SpeakerProfileRow.count({ where, transaction: t }),
    Measurement.count({ where, transaction: t }),
  ]);
  if (systems + lessons + profiles + measurements > 0) {
    throw conflict(
      `That workspace is not empty (${systems} Systems, ${lessons} Lessons, ${profiles} Speaker profiles, ${measurements} measurements, deleted ones included): import the file as a new workspace, or into one that holds nothing. Nothing was changed.`,
    );
  }
}

/**
 * A whole-workspace file, as a new workspace the caller owns (named as in the file) or, with `workspaceId`, into an
 * existing empty workspace the caller owns. A browser session only: a file can carry a whole team's work.
 */
export async function importWorkspaceFile(caller: Caller, raw: unknown, options: { workspaceId?: string } = {}): Promise<TransferImportAnswer> {
  requireSessionCaller(caller, 'Importing a workspace');
  if (options.workspaceId) {
    assertUuid(options.workspaceId, 'That workspace');
    await requireMembership(caller, options.workspaceId, 'owner', 'That workspace');
  }
  const file: WorkspaceFile = validated(workspaceFileSchema, raw, WORKSPACE_FILE_FORMAT);
  return db().transaction(async (t) => {
    let workspace: Workspace;
    if (options.workspaceId) {
      const existing = await Workspace.findByPk(options.workspaceId, { transaction: t, lock: t.LOCK.UPDATE });
      if (!existing) throw notFound('That workspace');
      await assertEmpty(existing.id, t);
      workspace = existing;
    } else {
      workspace = await Workspace.create({ name: file.workspace.name, personal: false }, { transaction: t });
      await Membership.create({ workspaceId: workspace.id, userId: caller.id, role: 'owner' }, { transaction: t });
    }
    const people = await membersByEmail(workspace.id, t);
    const empty = { systems: new Set<string>(), profiles: new Set<string>(), lessons: new Set<string>() };
    const written = await writeParts(t, { workspaceId: workspace.id, callerId: caller.id, people, taken: empty }, file);
    return {
      workspaceId: workspace.id,
      workspaceName: workspace.name,
      ...written,
      members: file.members.map((m) => ({ ...m, alreadyMember: people.has(m.email) })),
      formerMembers: notMembers(file, people),
    };
  });
}

/**
 * A System file into a workspace where the caller is an editor or owner: the System with its history, its profiles and
 * its measurements. A System or profile name the workspace already has gets " (imported)"; the measurements belong to
 * the new System alone, so their names (shown within that System) are kept as they are.
 */
export async function importSystemFile(caller: Caller, workspaceId: string, raw: unknown): Promise<TransferImportAnswer> {
  assertUuid(workspaceId, 'That workspace');
  await requireMembership(caller, workspaceId, 'editor', 'That workspace');
  const file: SystemFile = validated(systemFileSchema, raw, SYSTEM_FILE_FORMAT);
  const parts: ImportParts = { profiles: file.profiles, systems: [file.system], measurements: file.measurements, lessons: [] };
  return db().transaction(async (t) => {
    const workspace = await Workspace.findByPk(workspaceId, { transaction: t });
    if (!workspace) throw notFound('That workspace');
    const [systems, profiles] = await Promise.all([
      System.findAll({ where: { workspaceId, deletedAt: null }, attributes: ['name'], transaction: t }),
      SpeakerProfileRow.findAll({ where: { workspaceId }, attributes: ['name', 'kind'], transaction: t }),
    ]);
    const taken = { systems: new Set(systems.map((s) => s.name)), profiles: new Set(profiles.map((p) => `${p.kind}:${p.name}`)), lessons: new Set<string>() };
    const people = await membersByEmail(workspaceId, t);
    const written = await writeParts(t, { workspaceId, callerId: caller.id, people, taken }, parts);
    return { workspaceId, workspaceName: workspace.name, ...written, members: [], formerMembers: notMembers(parts, people) };
  });
}
