import { z } from 'zod';
import { num } from './common';
import { COMPUTE_LIMITS } from './compute-common';
import { inlineCurveSchema, measurementIdSchema } from './measured-curve';

/** The body of POST /api/v1/measured/compare: a reference run, 1–12 others, smoothing and an optional level-matching band. */

/** Limits of the compare route, answered 400 with the field named. */
export const COMPARE_LIMITS = { maxOthers: 12, minBandOctaves: 1 / 3 } as const;

const runNameSchema = z
  .string({ error: 'must be text' })
  .trim()
  .min(1, 'must not be empty')
  .max(120, 'must be at most 120 characters')
  .meta({ description: 'The run’s name, 1–120 characters (default: the stored name, else "Reference" or "Run N").' });

/** One run: a stored measurement the caller may read, or the points inline (a phase column is accepted and not used). */
const compareCurveSchema = z.union(
  [z.strictObject({ name: runNameSchema.optional(), measurementId: measurementIdSchema }), inlineCurveSchema.extend({ name: runNameSchema.optional() })],
  { error: 'must be { measurementId, name? } or { frequencyHz, magnitudeDb, name? }' },
).meta({
  description:
    'A run: { measurementId, name? } of a stored measurement the caller may read (needs a session), or the points inline { frequencyHz, magnitudeDb, phaseDeg?, name? } (8–20 000 points, strictly increasing frequencies, |magnitude| ≤ 300 dB, |phase| ≤ 3600°). A phase column is accepted and not used.',
});
export type CompareCurveInput = z.infer<typeof compareCurveSchema>;

export const compareRequestSchema = z.strictObject({
  reference: compareCurveSchema.meta({ description: 'The run the others are compared with.' }),
  others: z
    .array(compareCurveSchema)
    .min(1, 'must hold at least one run')
    .max(COMPARE_LIMITS.maxOthers, `must hold at most ${COMPARE_LIMITS.maxOthers} runs`)
    .meta({ description: `1–${COMPARE_LIMITS.maxOthers} runs, each shown as (run − reference) in dB; they must share at least an octave with the reference (else 400 naming others).` }),
  /** 0 (none) or N of 1/N octave, applied to each run before the difference. */
  smoothingFraction: num(0, 48)
    .int('must be a whole number')
    .default(0)
    .meta({
      description:
        '0 (none, default) or N of 1/N octave (1…48). Each run is smoothed on its own points (the power average over 1/N octave around each point; common practice) before the difference, so a difference that is the same at every frequency stays exactly that.',
    }),
  /** Points per octave of the common grid. */
  pointsPerOctave: num(6, 96).int('must be a whole number').default(48).meta({ description: 'Points per octave of the common log grid every run is resampled to (linear in log-frequency), 6…96 (default 48).' }),
  /** When given, every other run is moved to the reference's power average over this band (level matching). */
  matchLevelBandHz: z
    .strictObject({
      startHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz').meta({ description: 'Lowest frequency, 10…24 000 Hz.', 'x-unit': 'Hz' }),
      stopHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz').meta({ description: 'Highest frequency, at least a third of an octave above startHz.', 'x-unit': 'Hz' }),
    })
    .superRefine((b, ctx) => {
      if (b.stopHz < b.startHz * 2 ** COMPARE_LIMITS.minBandOctaves * (1 - 1e-9)) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be at least a third of an octave above startHz' });
    })
    .optional()
    .meta({
      description:
        'When given, within the runs’ common range: each other run is moved so its power average over the band (each point weighted by its share of log-frequency, on its own unsmoothed points) equals the reference’s. Without it no level is changed (levels as measured).',
      'x-unit': 'Hz',
    }),
});
export type CompareRequest = z.infer<typeof compareRequestSchema>;
