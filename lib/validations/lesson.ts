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

const durationS = num(1, 60, 's', 'durationS').default(6);

/** One parameter animated between two values over `durationS` seconds. */
export const sweepSchema = z.discriminatedUnion('parameter', [
  z.object({ parameter: z.literal('subDelayMs'), from: num(0, 100, 'ms', 'from'), to: num(0, 100, 'ms', 'to'), durationS }),
  z.object({ parameter: z.literal('subPolarity'), from: z.enum(['normal', 'inverted']), to: z.enum(['normal', 'inverted']), durationS }),
  z.object({ parameter: z.literal('crossoverHz'), from: num(20, 300, 'Hz', 'from'), to: num(20, 300, 'Hz', 'to'), durationS }),
  z.object({ parameter: z.literal('filter'), from: z.enum(FILTER_CHOICES), to: z.enum(FILTER_CHOICES), durationS }),
  z.object({ parameter: z.literal('subDistanceM'), from: num(0.1, 100, 'm', 'from'), to: num(0.1, 100, 'm', 'to'), durationS }),
  z.object({ parameter: z.literal('mainsGainDb'), from: num(-30, 30, 'dB', 'from'), to: num(-30, 30, 'dB', 'to'), durationS }),
]);
export type Sweep = z.infer<typeof sweepSchema>;
export type SweepParameter = Sweep['parameter'];
export const SWEEP_PARAMETERS: SweepParameter[] = ['subDelayMs', 'subPolarity', 'crossoverHz', 'filter', 'subDistanceM', 'mainsGainDb'];

export const lessonTitleSchema = z.string({ error: 'title is required' }).trim().min(1, 'title is required').max(200, 'title must be at most 200 characters');
const descriptionSchema = z.string().max(4000, 'description must be at most 4000 characters');
const revisionSchema = z.number({ error: 'revision must be the revision you last read' }).int('revision must be a whole number').min(1);

export const stepFieldsSchema = z.object({
  title: z.string({ error: 'title is required' }).trim().min(1, 'title is required').max(200, 'title must be at most 200 characters'),
  /** Talking points: plain text with paragraphs, "- " bullets, **bold** and *italic*. */
  points: z.string().max(8000, 'points must be at most 8000 characters').default(''),
  panel: z.enum(LESSON_PANELS, { error: `panel must be one of ${LESSON_PANELS.join(', ')}` }),
  traces: z.array(z.enum(LESSON_TRACES)).max(LESSON_TRACES.length).default(DEFAULT_TRACES).transform((t) => [...new Set(t)]),
  sweep: sweepSchema.nullable().default(null),
});

/** A new Step: the snapshot as a document, or copied from a saved System (`fromSystemId`). */
export const stepCreateSchema = z
  .object({
    step: stepFieldsSchema.extend({ document: systemDocumentSchema.optional(), fromSystemId: uuidField('fromSystemId must be a System id').optional() }),
    /** Optional: when given, a stale revision is a 409. Appending without it is always safe. */
    revision: revisionSchema.optional(),
    /** 1-based place to insert at (default: the end). */
    position: z.number().int().min(1).optional(),
  })
  .superRefine((v, ctx) => {
    if (!v.step.document === !v.step.fromSystemId) {
      ctx.addIssue({ code: 'custom', path: ['step', 'document'], message: 'send either step.document (a System document) or step.fromSystemId' });
    }
  });

export const stepUpdateSchema = z.object({
  revision: revisionSchema,
  step: stepFieldsSchema.partial().extend({ document: systemDocumentSchema.optional() }),
});

export const stepReorderSchema = z.object({
  revision: revisionSchema,
  stepIds: z.array(uuidField('stepIds must be Step ids')).min(1, 'stepIds must list every Step').max(200),
});

export const lessonCreateSchema = z.object({
  title: lessonTitleSchema,
  description: descriptionSchema.default(''),
  workspaceId: uuidField('workspaceId must be a workspace id').optional(),
});

export const lessonUpdateSchema = z.object({ title: lessonTitleSchema, description: descriptionSchema.default(''), revision: revisionSchema });

export const lessonListQuerySchema = z.object({ workspaceId: uuidField('workspaceId must be a workspace id').optional() });
export const revisionQuerySchema = z.object({ revision: z.coerce.number({ error: 'revision must be a whole number' }).int().min(1, 'revision must be the revision you last read') });

export type StepCreateInput = z.infer<typeof stepCreateSchema>;
export type StepUpdateInput = z.infer<typeof stepUpdateSchema>;
