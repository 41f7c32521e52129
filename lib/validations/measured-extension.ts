import { z } from 'zod';
import { num, uuidField } from './common';
import { COMPUTE_LIMITS } from './compute-common';
import { inlineCurveSchema } from './measured-curve';

/** The body of POST /api/v1/measured/extension: one source's curves at 1–40 seats, a band and an optional crossover. */

/** Limits of the extension route, answered 400 with the field named. */
const EXTENSION_LIMITS = { maxCurves: 40, minBandOctaves: 1 } as const;

const curveNameSchema = z.string({ error: 'must be text' }).trim().min(1, 'must not be empty').max(60, 'must be at most 60 characters');

/** One seat's curve: a stored measurement the caller may read, or the points inline (a phase column is accepted and not used). */
const extensionCurveSchema = z.union(
  [z.strictObject({ name: curveNameSchema.optional(), measurementId: uuidField('measurementId must be an id') }), inlineCurveSchema.extend({ name: curveNameSchema.optional() })],
  { error: 'must be { measurementId, name? } or { frequencyHz, magnitudeDb, name? }' },
);
export type ExtensionCurveInput = z.infer<typeof extensionCurveSchema>;

export const extensionRequestSchema = z.strictObject({
  curves: z
    .array(extensionCurveSchema)
    .min(1, 'must hold at least one curve')
    .max(EXTENSION_LIMITS.maxCurves, `must hold at most ${EXTENSION_LIMITS.maxCurves} curves (one per seat)`),
  /** The band the mean level is taken over; default 200 Hz–2 kHz (common practice). */
  band: z
    .strictObject({ startHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz'), stopHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz') })
    .superRefine((b, ctx) => {
      if (b.stopHz < b.startHz * 2 ** EXTENSION_LIMITS.minBandOctaves) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be at least an octave above startHz' });
    })
    .optional(),
  /** A crossover to judge against the −3 and −6 dB points. */
  crossoverHz: num(20, 300, 'Hz').optional(),
});
export type ExtensionRequest = z.infer<typeof extensionRequestSchema>;
