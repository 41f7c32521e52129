import { z } from 'zod';
import { num } from './common';
import { COMPUTE_LIMITS } from './compute-common';
import { inlineCurveSchema, measurementIdSchema } from './measured-curve';

/** The body of POST /api/v1/measured/extension: one source's curves at 1–40 seats, a band and an optional crossover. */

/** Limits of the extension route, answered 400 with the field named. */
const EXTENSION_LIMITS = { maxCurves: 40, minBandOctaves: 1 } as const;

const curveNameSchema = z
  .string({ error: 'must be text' })
  .trim()
  .min(1, 'must not be empty')
  .max(60, 'must be at most 60 characters')
  .meta({ description: 'The curve’s name, 1–60 characters (default: the stored name, else "Seat N").' });

/** One seat's curve: a stored measurement the caller may read, or the points inline (a phase column is accepted and not used). */
const extensionCurveSchema = z.union(
  [z.strictObject({ name: curveNameSchema.optional(), measurementId: measurementIdSchema }), inlineCurveSchema.extend({ name: curveNameSchema.optional() })],
  { error: 'must be { measurementId, name? } or { frequencyHz, magnitudeDb, name? }' },
).meta({
  description:
    'One seat’s curve: { measurementId, name? } of a stored measurement the caller may read (needs a session), or the points inline { frequencyHz, magnitudeDb, phaseDeg?, name? } (8–20 000 points, strictly increasing frequencies, |magnitude| ≤ 300 dB, |phase| ≤ 3600°). A phase column is accepted and not used.',
});
export type ExtensionCurveInput = z.infer<typeof extensionCurveSchema>;

export const extensionRequestSchema = z.strictObject({
  curves: z
    .array(extensionCurveSchema)
    .min(1, 'must hold at least one curve')
    .max(EXTENSION_LIMITS.maxCurves, `must hold at most ${EXTENSION_LIMITS.maxCurves} curves (one per seat)`)
    .meta({
      description: `1–${EXTENSION_LIMITS.maxCurves} curves of the same source, one per seat. Several curves are power-averaged point by point (the spatial average, 10·log10 of the mean of 10^(L/10); common practice); curves on different grids are first resampled (linear in log-frequency) onto a common 1/96-octave grid over the range they share (at least an octave).`,
    }),
  /** The band the mean level is taken over; default 200 Hz–2 kHz (common practice). */
  band: z
    .strictObject({
      startHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz').meta({ description: 'Lowest frequency, 10…24 000 Hz.', 'x-unit': 'Hz' }),
      stopHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz').meta({ description: 'Highest frequency, at least an octave above startHz.', 'x-unit': 'Hz' }),
    })
    .superRefine((b, ctx) => {
      if (b.stopHz < b.startHz * 2 ** EXTENSION_LIMITS.minBandOctaves) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be at least an octave above startHz' });
    })
    .optional()
    .meta({
      description:
        'The band of the mean level, within the data (default 200–2000 Hz: above the room’s modes, below the tweeter; common practice). The mean level is the power mean over the band, each point weighted by its share of log-frequency.',
    }),
  /** A crossover to judge against the −3 and −6 dB points. */
  crossoverHz: num(20, 300, 'Hz').optional().meta({ description: 'A crossover, 20…300 Hz, to judge against the −3 and −6 dB points.', 'x-unit': 'Hz' }),
});
export type ExtensionRequest = z.infer<typeof extensionRequestSchema>;
