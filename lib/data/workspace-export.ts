import { Op } from 'sequelize';
import { requireMembership, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { notFound } from '@/lib/errors';
import { SYSTEM_FILE_FORMAT, TRANSFER_VERSION, WORKSPACE_FILE_FORMAT, type SystemFile, type WorkspaceFile } from '@/lib/validations/workspace-transfer';
import { Lesson, LessonStep, Measurement, Membership, SpeakerProfileRow, System, SystemRevision, User, Workspace } from '@/models';
import { assertUuid } from './ids';
import { transferDownload, type TransferDownload } from './workspace-export-package';
import { byAge, emailsOf, keysFor, lessonParts, libraryIdsIn, measurementParts, profileParts, systemParts } from './workspace-export-parts';

/**
 * Taking a workspace, or one System with its history, out as a transfer file (lib/validations/workspace-transfer.ts).
 * The file holds content and the members' e-mails and roles; never password hashes, access tokens, invitation or
 * reset tokens, or share links. Systems and Lessons in Recently deleted are left out; a measurement taken for a
 * deleted System is exported without its System.
 */

/** The whole workspace (owners only: the file lists the members' e-mail addresses). */
export async function exportWorkspaceFile(caller: Caller, workspaceId: string): Promise<TransferDownload> {
  assertUuid(workspaceId, 'That workspace');
  await requireMembership(caller, workspaceId, 'owner', 'That workspace');
  db();
  const workspace = await Workspace.findByPk(workspaceId);
  if (!workspace) throw notFound('That workspace');
  const [memberships, profileRows, systemRows, measurementRows, lessonRows] = await Promise.all([
    Membership.findAll({ where: { workspaceId }, include: [{ model: User, as: 'user', attributes: ['email'] }], order: [['createdAt', 'ASC']] }),
    SpeakerProfileRow.findAll({ where: { workspaceId } }),
    System.findAll({ where: { workspaceId, deletedAt: null }, attributes: { exclude: ['document'] } }),
    Measurement.findAll({ where: { workspaceId } }),
    Lesson.findAll({ where: { workspaceId, deletedAt: null } }),
  ]);
  const profiles = byAge(profileRows, (r) => r.name);
  const systems = byAge(systemRows, (r) => r.name);
  const measurements = byAge(measurementRows, (r) => r.name);
  const lessons = byAge(lessonRows, (r) => r.title);
  const [revisions, steps] = await Promise.all([
    systems.length ? SystemRevision.findAll({ where: { systemId: { [Op.in]: systems.map((s) => s.id) } } }) : Promise.resolve([]),
    lessons.length ? LessonStep.findAll({ where: { lessonId: { [Op.in]: lessons.map((l) => l.id) } } }) : Promise.resolve([]),
  ]);
  const emails = await emailsOf([
    ...profiles.map((p) => p.createdById),
    ...revisions.map((r) => r.authorId),
    ...measurements.map((m) => m.createdById),
    ...lessons.map((l) => l.ownerId),
  ]);
  const profileKeys = keysFor(profiles, 'profile');
  const systemKeys = keysFor(systems, 'system');
  const file: WorkspaceFile = {
    format: WORKSPACE_FILE_FORMAT,
    version: TRANSFER_VERSION,
    exportedAt: new Date().toISOString(),
    workspace: { name: workspace.name },
    members: memberships.map((m) => ({ email: (m as unknown as { user: User }).user.email, role: m.role })),
    profiles: profileParts(profiles, profileKeys, emails),
    systems: systemParts(systems, revisions, systemKeys, profileKeys, emails),
    measurements: measurementParts(measurements, keysFor(measurements, 'measurement'), systemKeys, emails),
    lessons: lessonParts(lessons, steps, keysFor(lessons, 'lesson'), profileKeys, emails),
  };
  return transferDownload(file, workspace.name);
}

/**
 * One System with every revision (editors and owners of its workspace), the Library profiles its documents were
 * copied from (of the same workspace) and the measurements uploaded for it.
 */
export async function exportSystemFile(caller: Caller, systemId: string): Promise<TransferDownload> {
  assertUuid(systemId, 'That System');
  db();
  const system = await System.findByPk(systemId, { attributes: { exclude: ['document'] } });
  if (!system || system.deletedAt) throw notFound('That System');
  await requireMembership(caller, system.workspaceId, 'editor', 'That System');
  const [revisions, measurementRows] = await Promise.all([
    SystemRevision.findAll({ where: { systemId } }),
    Measurement.findAll({ where: { systemId, workspaceId: system.workspaceId } }),
  ]);
  const referenced = [...libraryIdsIn(revisions.map((r) => r.document))];
  const profileRows = referenced.length ? await SpeakerProfileRow.findAll({ where: { id: { [Op.in]: referenced }, workspaceId: system.workspaceId } }) : [];
  const profiles = byAge(profileRows, (r) => r.name);
  const measurements = byAge(measurementRows, (r) => r.name);
  const emails = await emailsOf([...profiles.map((p) => p.createdById), ...revisions.map((r) => r.authorId), ...measurements.map((m) => m.createdById)]);
  const profileKeys = keysFor(profiles, 'profile');
  const systemKeys = keysFor([system], 'system');
  const [part] = systemParts([system], revisions, systemKeys, profileKeys, emails);
  const file: SystemFile = {
    format: SYSTEM_FILE_FORMAT,
    version: TRANSFER_VERSION,
    exportedAt: new Date().toISOString(),
    system: part as SystemFile['system'],
    profiles: profileParts(profiles, profileKeys, emails),
    measurements: measurementParts(measurements, keysFor(measurements, 'measurement'), systemKeys, emails),
  };
  return transferDownload(file, system.name);
}
