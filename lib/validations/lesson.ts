import { z } from 'zod';
import { num, uuidField } from './common';
import { systemDocumentSchema } from './system';

/** Panels a Step can open on (the System editor's panels that a class is shown; 'time': impulse and step responses, opened in the editor on Timing). */
export const LESSON_PANELS = ['blend', 'timing', 'modes', 'layout', 'headroom', 'time'] as const;
export type LessonPanel = (typeof LESSON_PANELS)[number];
export const isLessonPanel = (s: unknown): s is LessonPanel => typeof s === 'string' && (LESSON_PANELS as readonly string[]).includes(s);

/** Traces a Step can show on its plot. */
export const LESSON_TRACES = ['mains', 'subs', 'sum', 'target', 'phase'] as const;
export type LessonTrace = (typeof LESSON_TRACES)[number];
export const DEFAULT_TRACES: LessonTrace[] = ['mains', 'subs', 'sum', 'target'];

/**
 * Slope choices of a 'filter' sweep, from gentlest to steepest; a sweep steps through the ones
 * between `from` and `to` and applies each to both the mains high-pass and the sub low-pass.
 */
export const FILTER_CHOICES = [
  'butterworth-1',
  'butterworth-2',
  'linkwitz-riley-2',
  'butterworth-3',
  'butterworth-4',
  'linkwitz-riley-4',
  'butterworth-5',
  'butterworth-6',
  'butterworth-7',
  'butterworth-8',
  'linkwitz-riley-8',
] as const;
export type FilterChoice = (typeof FILTER_CHOICES)[number];

export function filterChoiceSlope(choice: FilterChoice): { family: 'butterworth' | 'linkwitz-riley'; order: number } {
  const order = Number(choice.slice(choice.lastIndexOf('-') + 1));
  return { family: choice.startsWith('linkwitz') ? 'linkwitz-riley' : 'butterworth', order };
}

/** "LR4", "BW2": the trade's short names of a slope. */
export function filterChoiceLabel(choice: FilterChoice): string {
  const { family, order } = filterChoiceSlope(choice);
  return `${family === 'linkwitz-riley' ? 'LR' : 'BW'}${order}`;
}

const durationS = num(1, 60, 's', 'durationS').default(6).meta({ description: 'How long the sweep takes, 1–60 s (default 6).', 'x-unit': 's' });

/** A sweep's `from` and `to`, described; `unit` is the parameter's own unit ('' for a choice). */
const ends = <P extends string, S extends z.ZodType>(parameter: P, from: S, to: S, range: string, unit = '') => ({
  parameter: z.literal(parameter).meta({ description: `The parameter swept: ${parameter}.` }),
  from: from.meta({ description: `The value it starts from: ${range}.`, ...(unit ? { 'x-unit': unit } : {}) }),
  to: to.meta({ description: `The value it ends at: ${range}.`, ...(unit ? { 'x-unit': unit } : {}) }),
  durationS,
});
const polarity = () => z.enum(['normal', 'inverted']);
const filterChoice = () => z.enum(FILTER_CHOICES);

/** One parameter animated between two values over `durationS` seconds. */
export const sweepSchema = z
  .discriminatedUnion('parameter', [
    z.object(ends('subDelayMs', num(0, 100, 'ms', 'from'), num(0, 100, 'ms', 'to'), 'every sub’s delay, 0–100 ms', 'ms')),
    z.object(ends('subPolarity', polarity(), polarity(), 'the subs’ polarity, normal or inverted')),
    z.object(ends('crossoverHz', num(20, 300, 'Hz', 'from'), num(20, 300, 'Hz', 'to'), 'the crossover frequency, 20–300 Hz', 'Hz')),
    z.object(ends('filter', filterChoice(), filterChoice(), `a slope applied to both the mains high-pass and the sub low-pass, stepping through the choices between (${FILTER_CHOICES.join(', ')})`)),
    z.object(ends('subDistanceM', num(0.1, 100, 'm', 'from'), num(0.1, 100, 'm', 'to'), 'the subs’ distance set on the processor, 0.1–100 m', 'm')),
    z.object(ends('mainsGainDb', num(-30, 30, 'dB', 'from'), num(-30, 30, 'dB', 'to'), 'the mains’ gain, −30–30 dB', 'dB')),
  ])
  .meta({ id: 'LessonSweep', description: 'One parameter animated between two values over durationS seconds while the plot follows.' });
export type Sweep = z.infer<typeof sweepSchema>;
export type SweepParameter = Sweep['parameter'];
export const SWEEP_PARAMETERS: SweepParameter[] = ['subDelayMs', 'subPolarity', 'crossoverHz', 'filter', 'subDistanceM', 'mainsGainDb'];

export const lessonTitleSchema = z
  .string({ error: 'title is required' })
  .trim()
  .min(1, 'title is required')
  .max(200, 'title must be at most 200 characters')
  .meta({ description: 'The Lesson’s title, 1–200 characters (trimmed).' });
const descriptionSchema = z.string().max(4000, 'description must be at most 4000 characters');
const revisionSchema = z.number({ error: 'revision must be the revision you last read' }).int('revision must be a whole number').min(1);
const lastRead = revisionSchema.meta({ description: 'The Lesson revision you last read; a stale one is 409 with currentRevision, changing nothing.' });

export const stepFieldsSchema = z.object({
  title: z.string({ error: 'title is required' }).trim().min(1, 'title is required').max(200, 'title must be at most 200 characters').meta({ description: 'The Step’s title, 1–200 characters.' }),
  /** Talking points: plain text with paragraphs, "- " bullets, **bold** and *italic*. */
  points: z
    .string()
    .max(8000, 'points must be at most 8000 characters')
    .default('')
    .meta({ description: 'Talking points, up to 8000 characters: plain text with paragraphs, "- " bullets, **bold** and *italic* (rendered as text, never as HTML).' }),
  panel: z
    .enum(LESSON_PANELS, { error: `panel must be one of ${LESSON_PANELS.join(', ')}` })
    .meta({ description: 'The panel the Step opens on; "time" shows the impulse and step responses of the mains, each sub and the sum (opened in the editor on Timing).' }),
  traces: z
    .array(z.enum(LESSON_TRACES))
    .max(LESSON_TRACES.length)
    .default(DEFAULT_TRACES)
    .transform((t) => [...new Set(t)])
    .meta({ description: `The traces shown on the plot (default ${DEFAULT_TRACES.join(', ')}); a repeated trace counts once.` }),
  sweep: sweepSchema.nullable().default(null).meta({ description: 'A sweep the Step plays, or null (the default).' }),
});

/** A new Step: the snapshot as a document, or copied from a saved System (`fromSystemId`). */
export const stepCreateSchema = z
  .object({
    step: stepFieldsSchema
      .extend({
        document: systemDocumentSchema.optional(),
        fromSystemId: uuidField('fromSystemId must be a System id')
          .optional()
          .meta({ description: 'Copy a saved System’s current document instead (the caller must be able to read it); later saves of that System do not change the Step.' }),
      })
      .meta({ description: 'The new Step: its fields and its snapshot, either document (a System document) or fromSystemId, exactly one of the two.' }),
    /** Optional: when given, a stale revision is a 409. Appending without it is always safe. */
    revision: revisionSchema.optional().meta({ description: 'The Lesson revision you last read; optional: when given, a stale one is 409. Appending without it is always safe.' }),
    /** 1-based place to insert at (default: the end). */
    position: z.number().int().min(1).optional().meta({ description: '1-based place to insert at (default: the end; a larger number appends).' }),
  })
  .superRefine((v, ctx) => {
    if (!v.step.document === !v.step.fromSystemId) {
      ctx.addIssue({ code: 'custom', path: ['step', 'document'], message: 'send either step.document (a System document) or step.fromSystemId' });
    }
  });

export const stepUpdateSchema = z.object({
  revision: lastRead,
  step: stepFieldsSchema
    .partial()
    .extend({ document: systemDocumentSchema.optional() })
    .meta({ description: 'The fields to change (any of them; absent fields keep their value); document replaces the snapshot.' }),
});

export const stepReorderSchema = z.object({
  revision: lastRead,
  stepIds: z
    .array(uuidField('stepIds must be Step ids'))
    .min(1, 'stepIds must list every Step')
    .max(200)
    .meta({ description: 'Every Step id of the Lesson exactly once, in the order wanted (400 otherwise).' }),
});

const lessonDescription = descriptionSchema.default('').meta({ description: 'What the Lesson is about, up to 4000 characters (default empty).' });

export const lessonCreateSchema = z.object({
  title: lessonTitleSchema,
  description: lessonDescription,
  workspaceId: uuidField('workspaceId must be a workspace id').optional().meta({ description: 'Where to create it (an editor or owner there); default: the caller’s personal workspace.' }),
});

export const lessonUpdateSchema = z.object({ title: lessonTitleSchema, description: lessonDescription, revision: lastRead });

export const lessonListQuerySchema = z.object({ workspaceId: uuidField('workspaceId must be a workspace id').optional().meta({ description: 'Only this workspace (a member of it; otherwise 404).' }) });
export const revisionQuerySchema = z.object({
  revision: z.coerce
    .number({ error: 'revision must be a whole number' })
    .int()
    .min(1, 'revision must be the revision you last read')
    .meta({ description: 'The Lesson revision you last read; a stale one is 409 with currentRevision, changing nothing.' }),
});

export type StepCreateInput = z.infer<typeof stepCreateSchema>;
export type StepUpdateInput = z.infer<typeof stepUpdateSchema>;
