import { z } from 'zod';
import { num, uuidField } from './common';
import { COMPUTE_LIMITS } from './compute-common';
import { inlineCurveSchema } from './measured-curve';

/** The body of POST /api/v1/measured/compare: a reference run, 1–12 others, smoothing and an optional level-matching band. */

/** Limits of the compare route, answered 400 with the field named. */
export const COMPARE_LIMITS = { maxOthers: 12, minBandOctaves: 1 / 3 } as const;

const runNameSchema = z.string({ error: 'must be text' }).trim().min(1, 'must not be empty').max(120, 'must be at most 120 characters');

/** One run: a stored measurement the caller may read, or the points inline (a phase column is accepted and not used). */
const compareCurveSchema = z.union(
  [z.strictObject({ name: runNameSchema.optional(), measurementId: uuidField('measurementId must be an id') }), inlineCurveSchema.extend({ name: runNameSchema.optional() })],
  { error: 'must be { measurementId, name? } or { frequencyHz, magnitudeDb, name? }' },
);
export type CompareCurveInput = z.infer<typeof compareCurveSchema>;

export const compareRequestSchema = z.strictObject({
  reference: compareCurveSchema,
  others: z.array(compareCurveSchema).min(1, 'must hold at least one run').max(COMPARE_LIMITS.maxOthers, `must hold at most ${COMPARE_LIMITS.maxOthers} runs`),
  /** 0 (none) or N of 1/N octave, applied to each run before the difference. */
  smoothingFraction: num(0, 48).int('must be a whole number').default(0),
  /** Points per octave of the common grid. */
  pointsPerOctave: num(6, 96).int('must be a whole number').default(48),
  /** When given, every other run is moved to the reference's power average over this band (level matching). */
  matchLevelBandHz: z
    .strictObject({ startHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz'), stopHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz') })
    .superRefine((b, ctx) => {
      if (b.stopHz < b.startHz * 2 ** COMPARE_LIMITS.minBandOctaves * (1 - 1e-9)) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be at least a third of an octave above startHz' });
    })
    .optional(),
});
export type CompareRequest = z.infer<typeof compareRequestSchema>;
