import { z } from 'zod';
import { num, uuidField } from './common';
import { pathEqSchema } from './compute-blend';
import { temperatureCSchema } from './compute-common';
import { filterFamilySchema, refineSlopeOrder } from './slope';
import { measuredCurveSchema } from './measured-curve';

/**
 * Measurements: the text fields of an upload, the list query, and the body of
 * POST /api/v1/measured/predict. The file itself is checked by lib/measurements/parse-measurement.
 */

/** `mains`, `sub`, `sum` or another channel label (L, C, SL…). */
export const measurementRoleSchema = z
  .string()
  .trim()
  .regex(/^[A-Za-z0-9 _+-]{1,20}$/, 'role must be 1–20 letters, digits, spaces, +, - or _ (e.g. mains, sub, L)');

/** A run's label: what was different this time ("treble +2", "near-wall switch on", "after moving the sub"). */
export const runLabelSchema = z.string().trim().min(1, 'runLabel must not be empty').max(80, 'runLabel must be at most 80 characters');
const seatSchema = z.string().trim().min(1, 'seat must not be empty').max(60, 'seat must be at most 60 characters');
const measurementNameSchema = z.string().trim().min(1, 'name must not be empty').max(120, 'name must be at most 120 characters');

/** A number sent as a form field (multipart fields are text). */
const formNumber = (min: number, max: number, what: string) =>
  z
    .string()
    .trim()
    .regex(/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/, `${what} must be a number`)
    .transform(Number)
    .pipe(z.number().min(min, `${what} must be at least ${min}`).max(max, `${what} must be at most ${max}`));

export const measurementUploadFieldsSchema = z.strictObject({
  name: measurementNameSchema.optional(),
  systemId: uuidField('systemId must be an id').optional(),
  workspaceId: uuidField('workspaceId must be an id').optional(),
  seat: seatSchema.optional(),
  role: measurementRoleSchema.optional(),
  runLabel: runLabelSchema.optional(),
  /** An impulse response (WAV) only: the window's start from the file's first sample, ms (default: the peak − 20 ms). */
  windowStartMs: formNumber(0, 10_000, 'windowStartMs').optional(),
  /** An impulse response (WAV) only: the window's length, ms (default 500 ms, clamped to the file's end). */
  windowLengthMs: formNumber(1, 10_000, 'windowLengthMs').optional(),
});
export type MeasurementUploadFields = z.infer<typeof measurementUploadFieldsSchema>;

/** PATCH /api/v1/measurements/{id}: the labels only (the points never change); null clears seat, role or runLabel. */
export const measurementLabelsSchema = z
  .strictObject({
    name: measurementNameSchema.optional(),
    seat: seatSchema.nullable().optional(),
    role: measurementRoleSchema.nullable().optional(),
    runLabel: runLabelSchema.nullable().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'send at least one of name, seat, role, runLabel' });

export const measurementListQuerySchema = z.object({
  workspaceId: uuidField('workspaceId must be an id').optional(),
  systemId: uuidField('systemId must be an id').optional(),
  /** Only this seat and this role (each an exact match, ignoring case). */
  seat: z.string().trim().min(1, 'seat must not be empty').max(60, 'seat must be at most 60 characters').optional(),
  role: measurementRoleSchema.optional(),
});
export type MeasurementListQuery = z.infer<typeof measurementListQuerySchema>;

const settingsSchema = {
  gainDb: num(-60, 60, 'dB'),
  delayMs: num(0, 1000, 'ms'),
  invert: z.boolean({ error: 'must be true or false' }),
  /** The processor's EQ on this output, applied to the curve (a speaker's voicing switch is already in a measurement). */
  processorEq: pathEqSchema.optional(),
};

export const predictRequestSchema = z.strictObject({
  temperatureC: temperatureCSchema,
  crossoverHz: num(20, 300, 'Hz'),
  mainsHighpass: z.strictObject({ family: filterFamilySchema, order: num(1, 8).int('must be a whole number') }),
  subLowpass: z.strictObject({ family: filterFamilySchema, order: num(1, 8).int('must be a whole number') }),
  mains: z.strictObject({ name: z.string().trim().min(1).max(60).default('mains'), curve: measuredCurveSchema, ...settingsSchema }),
  sub: z.strictObject({ name: z.string().trim().min(1).max(60).default('sub'), curve: measuredCurveSchema, ...settingsSchema }),
  /** Display smoothing of every returned curve: 0 (none) or N of 1/N octave. */
  smoothingFraction: num(0, 48).int('must be a whole number').default(0),
  /** Points per octave of the shared grid the curves are resampled to. */
  pointsPerOctave: num(6, 96).int('must be a whole number').default(48),
  maxDelayMs: num(1, 50, 'ms').default(20),
}).superRefine((r, ctx) => {
  refineSlopeOrder(r.mainsHighpass, ctx, ['mainsHighpass', 'order']);
  refineSlopeOrder(r.subLowpass, ctx, ['subLowpass', 'order']);
});
export type PredictRequest = z.infer<typeof predictRequestSchema>;
export type PredictRequestInput = z.input<typeof predictRequestSchema>;
