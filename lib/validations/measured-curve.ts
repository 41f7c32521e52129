import { z } from 'zod';
import { num, uuidField } from './common';
import { MAX_ABS_MAGNITUDE_DB, MAX_ABS_PHASE_DEG, MIN_MEASUREMENT_POINTS } from '@/lib/measurements/parse-measurement';

/**
 * A measured curve in a compute request: a stored measurement the caller may read (`{ measurementId }`) or the points
 * themselves. Used by the measured routes and by Timing and the Crossover sweep run on measurements.
 */

/** Most points of an inline curve sent to the predict route. */
const MAX_INLINE_POINTS = 20_000;

/** A curve sent inline; the same limits as an uploaded file. */
export const inlineCurveSchema = z
  .strictObject({
    frequencyHz: z
      .array(num(1e-6, 1e6, 'Hz'))
      .min(MIN_MEASUREMENT_POINTS, `must hold at least ${MIN_MEASUREMENT_POINTS} points`)
      .max(MAX_INLINE_POINTS, `must hold at most ${MAX_INLINE_POINTS} points`)
      .meta({ description: `The frequencies, ${MIN_MEASUREMENT_POINTS}–${MAX_INLINE_POINTS} points, strictly increasing.`, 'x-unit': 'Hz' }),
    magnitudeDb: z
      .array(num(-MAX_ABS_MAGNITUDE_DB, MAX_ABS_MAGNITUDE_DB, 'dB'))
      .meta({ description: `The level at each frequency, |magnitude| ≤ ${MAX_ABS_MAGNITUDE_DB} dB; as many values as frequencyHz.`, 'x-unit': 'dB' }),
    phaseDeg: z
      .array(num(-MAX_ABS_PHASE_DEG, MAX_ABS_PHASE_DEG, '°'))
      .nullable()
      .optional()
      .meta({ description: `The phase at each frequency, |phase| ≤ ${MAX_ABS_PHASE_DEG}°; as many values as frequencyHz. Null or absent when not measured.`, 'x-unit': '°' }),
  })
  .superRefine((c, ctx) => {
    if (c.magnitudeDb.length !== c.frequencyHz.length) ctx.addIssue({ code: 'custom', path: ['magnitudeDb'], message: `must hold as many values as frequencyHz (${c.frequencyHz.length})` });
    if (c.phaseDeg && c.phaseDeg.length !== c.frequencyHz.length) ctx.addIssue({ code: 'custom', path: ['phaseDeg'], message: `must hold as many values as frequencyHz (${c.frequencyHz.length})` });
    for (let i = 1; i < c.frequencyHz.length; i++) {
      if ((c.frequencyHz[i] as number) <= (c.frequencyHz[i - 1] as number)) {
        ctx.addIssue({ code: 'custom', path: ['frequencyHz', i], message: 'frequencies must strictly increase' });
        break;
      }
    }
  });

/** A stored measurement named by its id, described. */
export const measurementIdSchema = uuidField('measurementId must be an id').meta({
  description: 'A stored measurement the caller may read (needs a session: 401 signed out, 404 outside the workspace).',
});

/** A measured curve: a stored measurement the caller may read, or the points themselves. */
export const measuredCurveSchema = z
  .union([z.strictObject({ measurementId: measurementIdSchema }), inlineCurveSchema.meta({ description: 'The points inline (no session needed).' })], {
    error: 'must be { measurementId } or { frequencyHz, magnitudeDb, phaseDeg? }',
  })
  .meta({ description: 'A measured curve: { measurementId } of a stored measurement, or the points inline { frequencyHz, magnitudeDb, phaseDeg? }.' });

export type MeasuredCurveInput = z.infer<typeof measuredCurveSchema>;
