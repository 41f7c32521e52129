import { z } from 'zod';
import type { AppLesson, AppLessonShareLink, AppLessonStep, AppLessonSummary } from '@/lib/data/lessons';
import { LESSON_PANELS, LESSON_TRACES, sweepSchema } from '@/lib/validations/lesson';
import { systemDocumentSchema } from '@/lib/validations/system';
import { callerRole, isoTime, itemsOf, rowId, type Same } from './library-parts';

/** Answers of the Lesson and Step routes and of a Lesson's share links (delete answers `deletedAnswerSchema`). */

const stepAnswerSchema = z
  .strictObject({
    id: rowId('The Step.'),
    position: z.number().int().meta({ description: 'Its place in the Lesson, 1-based (1…n, no gaps).' }),
    title: z.string().meta({ description: 'The Step’s title.' }),
    points: z.string().meta({ description: 'Talking points: plain text with paragraphs, "- " bullets, **bold** and *italic*.' }),
    panel: z.enum(LESSON_PANELS).meta({ description: 'The panel the Step opens on.' }),
    traces: z.array(z.enum(LESSON_TRACES)).meta({ description: 'The traces shown on its plot.' }),
    sweep: sweepSchema.nullable().meta({ description: 'The sweep it plays, or null.' }),
    document: systemDocumentSchema,
    updatedAt: isoTime('Its last change.'),
  })
  .meta({ id: 'LessonStep', description: 'One Step: a System snapshot with its title, talking points, panel, traces and sweep.' });

const summaryShape = {
  id: rowId('The Lesson.'),
  workspaceId: rowId('Its workspace; access follows the workspace role (viewer reads, editor writes, others 404).'),
  workspaceName: z.string().meta({ description: 'That workspace’s name.' }),
  title: z.string().meta({ description: 'Up to 200 characters.' }),
  description: z.string().meta({ description: 'Up to 4000 characters.' }),
  revision: z.number().int().meta({ description: 'Grows by one with every change of the Lesson or any Step; send it back with the next write.' }),
  stepCount: z.number().int().meta({ description: 'How many Steps it has.' }),
  ownerName: z.string().meta({ description: 'Who created it ("a former member" when that account is gone).' }),
  lastEditorName: z.string().meta({ description: 'Who changed it last ("a former member" when that account is gone).' }),
  updatedAt: isoTime('Its last change.'),
  role: callerRole('The caller’s role in the Lesson’s workspace.'),
};

const lessonSummaryAnswerSchema = z.strictObject(summaryShape).meta({ description: 'A Lesson without its Steps.' });

export const lessonListAnswerSchema = itemsOf(lessonSummaryAnswerSchema, 'The Lessons, newest change first, without their Steps.');

export const lessonAnswerSchema = z
  .strictObject({ ...summaryShape, steps: z.array(stepAnswerSchema).meta({ description: 'Its Steps, in order.' }) })
  .meta({ id: 'Lesson', description: 'A Lesson with its Steps in order.' });

export const lessonShareLinkAnswerSchema = z
  .strictObject({
    token: z.string().meta({ description: '43 characters of base64url (256 random bits from the CSPRNG).' }),
    url: z.string().meta({ description: 'The student page /s/{token}: anyone holding it sees the Lesson without signing in.' }),
    lessonId: rowId('The Lesson it shows.'),
    createdAt: isoTime('When it was created.'),
    revokedAt: isoTime('When it was revoked').nullable().meta({ description: 'When it was revoked; null while it is open.' }),
  })
  .meta({ id: 'LessonShareLink', description: 'A read-only student link to a Lesson.' });

export const lessonShareLinkListAnswerSchema = itemsOf(lessonShareLinkAnswerSchema, 'The Lesson’s open (unrevoked) links, newest first.');

// Each answer schema is the type its data function returns, so the two cannot drift apart.
const _step: Same<z.output<typeof stepAnswerSchema>, AppLessonStep> = true;
const _summary: Same<z.output<typeof lessonSummaryAnswerSchema>, AppLessonSummary> = true;
const _lesson: Same<z.output<typeof lessonAnswerSchema>, AppLesson> = true;
const _shareLink: Same<z.output<typeof lessonShareLinkAnswerSchema>, AppLessonShareLink> = true;
void [_step, _summary, _lesson, _shareLink];
