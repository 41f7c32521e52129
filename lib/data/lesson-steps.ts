import type { Transaction } from 'sequelize';
import type { Caller } from '@/lib/access';
import { invalid, notFound } from '@/lib/errors';
import type { StepCreateInput, StepUpdateInput } from '@/lib/validations/lesson';
import { LessonStep } from '@/models';
import { assertUuid } from './ids';
import { stepsOf, writeLesson, type AppLesson } from './lessons';
import { getSystem } from './systems';

/** A Lesson's Steps: add, change, delete and reorder, each one write of the Lesson (see `writeLesson`). */

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
  assertUuid(stepId, 'That Step');
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
