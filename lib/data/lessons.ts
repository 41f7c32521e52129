import { Op, type Transaction } from 'sequelize';
import { callerWorkspaces, requireMembership, type Caller } from '@/lib/access';
import { config } from '@/lib/config';
import { db } from '@/lib/db';
import { conflict, invalid, notFound } from '@/lib/errors';
import { newToken } from '@/lib/tokens';
import { DEFAULT_TRACES, LESSON_PANELS, stepFieldsSchema, sweepSchema, type LessonPanel, type LessonTrace, type StepCreateInput, type StepUpdateInput, type Sweep } from '@/lib/validations/lesson';
import { systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';
import { Lesson, LessonStep, ShareLink, User, Workspace } from '@/models';
import { getSystem, personalWorkspaceId } from './systems';

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

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{16,64}$/;

/** Stored rows are re-validated on the way out, so nothing malformed reaches a page. */
function toStep(s: LessonStep): AppLessonStep {
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
  if (!UUID.test(id)) throw notFound('That Lesson');
  const l = (await Lesson.findByPk(id, { include, transaction })) as LessonRow | null;
  if (!l || l.deletedAt) throw notFound('That Lesson');
  return l;
}

async function stepsOf(lessonId: string, transaction?: Transaction): Promise<LessonStep[]> {
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
async function writeLesson(caller: Caller, id: string, revision: number | undefined, change: (lesson: Lesson, t: Transaction) => Promise<void>): Promise<AppLesson> {
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

/** Positions 1…n in the given order (the unique constraint is deferred to the commit). */
async function renumber(steps: LessonStep[], t: Transaction): Promise<void> {
  for (let i = 0; i < steps.length; i++) {
    const step = steps[i] as LessonStep;
    if (step.position !== i + 1) await LessonStep.update({ position: i + 1 }, { where: { id: step.id }, transaction: t });
  }
}

/** Adds a Step (a copy of the document, or of a saved System's current document) at `position` or the end. */
export async function addStep(caller: Caller, id: string, input: StepCreateInput): Promise<AppLesson> {
  const { fromSystemId, document, ...fields } = input.step;
  // The copy is taken now: later saves of that System do not reach the Step.
  const snapshot = fromSystemId ? (await getSystem(caller, fromSystemId)).document : document;
  if (!snapshot) throw invalid('step.document: send a System document or fromSystemId', [{ path: 'step.document', message: 'send a System document or fromSystemId' }]);
  return writeLesson(caller, id, input.revision, async (lesson, t) => {
    const steps = await stepsOf(lesson.id, t);
    if (steps.length >= 200) throw invalid('A Lesson holds at most 200 Steps.', [{ path: 'step', message: 'a Lesson holds at most 200 Steps' }]);
    const at = Math.min(input.position ?? steps.length + 1, steps.length + 1);
    const created = await LessonStep.create(
      { lessonId: lesson.id, position: steps.length + 1, title: fields.title, points: fields.points, panel: fields.panel, traces: fields.traces, sweep: fields.sweep, document: snapshot },
      { transaction: t },
    );
    if (at <= steps.length) {
      const order = [...steps];
      order.splice(at - 1, 0, created);
      await renumber(order, t);
    }
  });
}

async function stepOf(lessonId: string, stepId: string, t: Transaction): Promise<LessonStep> {
  if (!UUID.test(stepId)) throw notFound('That Step');
  const step = await LessonStep.findOne({ where: { id: stepId, lessonId }, transaction: t });
  if (!step) throw notFound('That Step');
  return step;
}

export async function updateStep(caller: Caller, id: string, stepId: string, input: StepUpdateInput): Promise<AppLesson> {
  return writeLesson(caller, id, input.revision, async (lesson, t) => {
    const step = await stepOf(lesson.id, stepId, t);
    const s = input.step;
    await step.update(
      {
        ...(s.title !== undefined ? { title: s.title } : {}),
        ...(s.points !== undefined ? { points: s.points } : {}),
        ...(s.panel !== undefined ? { panel: s.panel } : {}),
        ...(s.traces !== undefined ? { traces: s.traces } : {}),
        ...(s.sweep !== undefined ? { sweep: s.sweep } : {}),
        ...(s.document !== undefined ? { document: s.document } : {}),
      },
      { transaction: t },
    );
  });
}

export async function deleteStep(caller: Caller, id: string, stepId: string, revision: number): Promise<AppLesson> {
  return writeLesson(caller, id, revision, async (lesson, t) => {
    const step = await stepOf(lesson.id, stepId, t);
    await step.destroy({ transaction: t });
    await renumber((await stepsOf(lesson.id, t)).filter((s) => s.id !== stepId), t);
  });
}

/** `stepIds` must name every Step of the Lesson exactly once, in the new order. */
export async function reorderSteps(caller: Caller, id: string, input: { revision: number; stepIds: string[] }): Promise<AppLesson> {
  return writeLesson(caller, id, input.revision, async (lesson, t) => {
    const steps = await stepsOf(lesson.id, t);
    const byId = new Map(steps.map((s) => [s.id, s]));
    const unique = new Set(input.stepIds);
    if (unique.size !== input.stepIds.length || unique.size !== steps.length || input.stepIds.some((s) => !byId.has(s))) {
      throw invalid(`stepIds must list each of this Lesson's ${steps.length} Steps exactly once.`, [{ path: 'stepIds', message: `must list each of the ${steps.length} Steps exactly once` }]);
    }
    await renumber(input.stepIds.map((s) => byId.get(s) as LessonStep), t);
  });
}

/** The public address of a lesson's share link (the student view). */
export function lessonShareUrl(token: string): string {
  return `${config.appUrl}/s/${token}`;
}

const toLink = (l: ShareLink): AppLessonShareLink => ({ token: l.token, url: lessonShareUrl(l.token), lessonId: l.targetId, createdAt: l.createdAt.toISOString(), revokedAt: l.revokedAt ? l.revokedAt.toISOString() : null });

/** An editor creates a read-only link to a Lesson (256-bit token from the CSPRNG). */
export async function createLessonShareLink(caller: Caller | null, lessonId: string): Promise<AppLessonShareLink> {
  const l = await findLive(lessonId);
  await requireMembership(caller, l.workspaceId, 'editor', 'That Lesson');
  const link = await ShareLink.create({ token: newToken(), targetType: 'lesson', targetId: l.id, workspaceId: l.workspaceId, createdById: caller!.id });
  return toLink(link);
}

/** The Lesson's live links (editors: a token is as good as read access for anyone holding it). */
export async function listLessonShareLinks(caller: Caller | null, lessonId: string): Promise<AppLessonShareLink[]> {
  const l = await findLive(lessonId);
  await requireMembership(caller, l.workspaceId, 'editor', 'That Lesson');
  const rows = await ShareLink.findAll({ where: { targetType: 'lesson', targetId: l.id, revokedAt: null }, order: [['createdAt', 'DESC']] });
  return rows.map(toLink);
}

/** Revokes one of the Lesson's links; twice is harmless; a token of another Lesson is 404. */
export async function revokeLessonShareLink(caller: Caller | null, lessonId: string, token: string): Promise<AppLessonShareLink> {
  const l = await findLive(lessonId);
  await requireMembership(caller, l.workspaceId, 'editor', 'That Lesson');
  if (!TOKEN_SHAPE.test(token)) throw notFound('That share link');
  const link = await ShareLink.findOne({ where: { token, targetType: 'lesson', targetId: l.id } });
  if (!link) throw notFound('That share link');
  if (!link.revokedAt) await link.update({ revokedAt: new Date() });
  return toLink(link);
}

/** The Lesson behind a live link, for anyone holding the token; null when unknown, revoked or deleted. */
export async function getLessonByShareToken(token: string): Promise<SharedLesson | null> {
  db();
  if (!TOKEN_SHAPE.test(token)) return null;
  const link = await ShareLink.findOne({ where: { token, targetType: 'lesson', revokedAt: null } });
  if (!link) return null;
  const lesson = await Lesson.findByPk(link.targetId);
  if (!lesson || lesson.deletedAt) return null;
  const steps = (await stepsOf(lesson.id)).map(toStep).map((s) => ({ position: s.position, title: s.title, points: s.points, panel: s.panel, traces: s.traces, sweep: s.sweep, document: s.document }));
  return { title: lesson.title, description: lesson.description, sharedAt: link.createdAt.toISOString(), steps };
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
