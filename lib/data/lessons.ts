import { Op, type Transaction } from 'sequelize';
import { callerWorkspaces, requireMembership, type Caller } from '@/lib/access';
import { db } from '@/lib/db';
import { conflict, notFound } from '@/lib/errors';
import { DEFAULT_TRACES, LESSON_PANELS, stepFieldsSchema, sweepSchema, type LessonPanel, type LessonTrace, type Sweep } from '@/lib/validations/lesson';
import { systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';
import { Lesson, LessonStep, User, Workspace } from '@/models';
import { assertUuid } from './ids';
import { personalWorkspaceId } from './systems';

export interface AppLessonStep {
  id: string;
  /** 1-based. */
  position: number;
  title: string;
  points: string;
  panel: LessonPanel;
  traces: LessonTrace[];
  sweep: Sweep | null;
  document: SystemDocument;
  updatedAt: string;
}

export interface AppLessonSummary {
  id: string;
  workspaceId: string;
  workspaceName: string;
  title: string;
  description: string;
  revision: number;
  stepCount: number;
  ownerName: string;
  lastEditorName: string;
  updatedAt: string;
  role: 'owner' | 'editor' | 'viewer';
}

export interface AppLesson extends AppLessonSummary {
  steps: AppLessonStep[];
}

/** What a student sees through a share link: no ids of the workspace, no people. */
export interface SharedLesson {
  title: string;
  description: string;
  sharedAt: string;
  steps: Omit<AppLessonStep, 'id' | 'updatedAt'>[];
}

/** A Lesson's share link as the API answers it (lib/data/share-links.ts makes and reads them). */
export interface AppLessonShareLink {
  token: string;
  url: string;
  lessonId: string;
  createdAt: string;
  revokedAt: string | null;
}

type LessonRow = Lesson & { owner?: User | null; lastEditor?: User | null; workspace?: Workspace | null };

const include = [
  { model: User, as: 'owner', attributes: ['id', 'name'] },
  { model: User, as: 'lastEditor', attributes: ['id', 'name'] },
  { model: Workspace, as: 'workspace', attributes: ['id', 'name'] },
];

/** Stored rows are re-validated on the way out, so nothing malformed reaches a page. */
export function toStep(s: LessonStep): AppLessonStep {
  const panel = (LESSON_PANELS as readonly string[]).includes(s.panel) ? (s.panel as LessonPanel) : 'blend';
  const traces = stepFieldsSchema.shape.traces.safeParse(s.traces);
  const sweep = s.sweep == null ? null : sweepSchema.safeParse(s.sweep);
  return {
    id: s.id,
    position: s.position,
    title: s.title,
    points: s.points,
    panel,
    traces: traces.success ? traces.data : [...DEFAULT_TRACES],
    sweep: sweep && sweep.success ? sweep.data : null,
    document: systemDocumentSchema.parse(s.document),
    updatedAt: s.updatedAt.toISOString(),
  };
}

function toSummary(l: LessonRow, role: AppLessonSummary['role'], stepCount: number): AppLessonSummary {
  return {
    id: l.id,
    workspaceId: l.workspaceId,
    workspaceName: l.workspace?.name ?? '',
    title: l.title,
    description: l.description,
    revision: l.revision,
    stepCount,
    ownerName: l.owner?.name ?? 'a former member',
    lastEditorName: l.lastEditor?.name ?? 'a former member',
    updatedAt: l.updatedAt.toISOString(),
    role,
  };
}

async function findLive(id: string, transaction?: Transaction): Promise<LessonRow> {
  db();
  assertUuid(id, 'That Lesson');
  const l = (await Lesson.findByPk(id, { include, transaction })) as LessonRow | null;
  if (!l || l.deletedAt) throw notFound('That Lesson');
  return l;
}

/** A Lesson's Step rows in order (no access check: for the data layer's own use after one). */
export async function stepsOf(lessonId: string, transaction?: Transaction): Promise<LessonStep[]> {
  return LessonStep.findAll({ where: { lessonId }, order: [['position', 'ASC']], transaction });
}

/** The caller's Lessons across their workspaces (or one workspace), newest change first. */
export async function listLessons(caller: Caller, query: { workspaceId?: string } = {}): Promise<AppLessonSummary[]> {
  const workspaces = await callerWorkspaces(caller);
  let ids = [...workspaces.keys()];
  if (query.workspaceId) {
    await requireMembership(caller, query.workspaceId, 'viewer', 'That workspace');
    ids = [query.workspaceId];
  }
  if (!ids.length) return [];
  const rows = (await Lesson.findAll({ where: { workspaceId: { [Op.in]: ids }, deletedAt: null }, include, order: [['updatedAt', 'DESC'], ['id', 'ASC']] })) as LessonRow[];
  const counts = new Map<string, number>();
  if (rows.length) {
    const grouped = (await LessonStep.count({ where: { lessonId: { [Op.in]: rows.map((r) => r.id) } }, group: ['lessonId'] })) as unknown as { lessonId: string; count: number }[];
    for (const g of grouped) counts.set(g.lessonId, Number(g.count));
  }
  return rows.map((r) => toSummary(r, workspaces.get(r.workspaceId) ?? 'viewer', counts.get(r.id) ?? 0));
}

export async function getLesson(caller: Caller | null, id: string): Promise<AppLesson> {
  const l = await findLive(id);
  const role = await requireMembership(caller, l.workspaceId, 'viewer', 'That Lesson');
  const steps = (await stepsOf(id)).map(toStep);
  return { ...toSummary(l, role, steps.length), steps };
}

export async function createLesson(caller: Caller, input: { title: string; description?: string; workspaceId?: string }): Promise<AppLesson> {
  const workspaceId = input.workspaceId ?? (await personalWorkspaceId(caller));
  await requireMembership(caller, workspaceId, 'editor', 'That workspace');
  const l = await Lesson.create({ workspaceId, ownerId: caller.id, lastEditorId: caller.id, title: input.title, description: input.description ?? '', revision: 1 });
  return getLesson(caller, l.id);
}

/**
 * Every write runs here: the lesson row locked, the caller's role checked, the revision compared
 * (when `revision` is given; a stale one is 409 with `currentRevision` and nothing changes), the
 * change applied, and the revision bumped, all in one transaction.
 */
export async function writeLesson(caller: Caller, id: string, revision: number | undefined, change: (lesson: Lesson, t: Transaction) => Promise<void>): Promise<AppLesson> {
  const first = await findLive(id);
  await requireMembership(caller, first.workspaceId, 'editor', 'That Lesson');
  await db().transaction(async (t) => {
    const lesson = await Lesson.findByPk(id, { transaction: t, lock: t.LOCK.UPDATE });
    if (!lesson || lesson.deletedAt) throw notFound('That Lesson');
    if (revision !== undefined && lesson.revision !== revision) {
      throw conflict(`Someone changed this Lesson since you opened it (it is now at revision ${lesson.revision}). Nothing was changed: reload it and make your change again.`, {
        currentRevision: lesson.revision,
      });
    }
    await change(lesson, t);
    lesson.revision = lesson.revision + 1;
    lesson.lastEditorId = caller.id;
    await lesson.save({ transaction: t });
  });
  return getLesson(caller, id);
}

export async function updateLesson(caller: Caller, id: string, input: { title: string; description: string; revision: number }): Promise<AppLesson> {
  return writeLesson(caller, id, input.revision, async (lesson) => {
    lesson.title = input.title;
    lesson.description = input.description;
  });
}

/** Soft delete; the Lesson's share links stop answering at once. */
export async function deleteLesson(caller: Caller, id: string): Promise<void> {
  const l = await findLive(id);
  await requireMembership(caller, l.workspaceId, 'editor', 'That Lesson');
  await Lesson.update({ deletedAt: new Date() }, { where: { id, deletedAt: null } });
}

/** For the demo seed: the lesson with this title in the workspace, created with its Steps when missing. */
export async function ensureLesson(
  workspaceId: string,
  ownerId: string,
  lesson: { title: string; description: string; steps: { title: string; points: string; panel: LessonPanel; traces: LessonTrace[]; sweep: Sweep | null; document: SystemDocument }[] },
): Promise<boolean> {
  const sequelize = db();
  if (await Lesson.findOne({ where: { workspaceId, title: lesson.title, deletedAt: null } })) return false;
  await sequelize.transaction(async (t) => {
    const l = await Lesson.create({ workspaceId, ownerId, lastEditorId: ownerId, title: lesson.title, description: lesson.description, revision: 1 }, { transaction: t });
    let position = 1;
    for (const s of lesson.steps) {
      const document = systemDocumentSchema.parse(s.document);
      const sweep = s.sweep ? sweepSchema.parse(s.sweep) : null;
      await LessonStep.create({ lessonId: l.id, position: position++, title: s.title, points: s.points, panel: s.panel, traces: s.traces, sweep, document }, { transaction: t });
    }
  });
  return true;
}
