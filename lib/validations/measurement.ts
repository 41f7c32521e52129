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

const ROLE_WORDS = '"mains", "sub", "sum" or another channel label (L, C, SL…): 1–20 letters, digits, spaces, +, - or _';

export const measurementUploadFieldsSchema = z.strictObject({
  name: measurementNameSchema.optional().meta({ description: 'The measurement’s name, 1–120 characters; default: the file name without its extension.' }),
  systemId: uuidField('systemId must be an id')
    .optional()
    .meta({ description: 'The System it was measured for; the measurement goes to that System’s workspace (an editor or owner there).' }),
  workspaceId: uuidField('workspaceId must be an id')
    .optional()
    .meta({ description: 'Without systemId: the workspace to keep it in (an editor or owner there); default: the caller’s personal workspace.' }),
  seat: seatSchema.optional().meta({ description: 'Where it was measured, 1–60 characters, e.g. "Row 1 centre (MLP)".' }),
  role: measurementRoleSchema.optional().meta({ description: `Which source it is: ${ROLE_WORDS}.` }),
  runLabel: runLabelSchema.optional().meta({ description: 'What was different in this run, 1–80 characters, e.g. "treble +2", "near-wall switch on", "after moving the sub".' }),
  /** An impulse response (WAV) only: the window's start from the file's first sample, ms (default: the peak − 20 ms). */
  windowStartMs: formNumber(0, 10_000, 'windowStartMs')
    .optional()
    .meta({
      description:
        'WAV only: where the window starts, ms from the file’s first sample (0…10 000; at or before the peak), sent as text. Default: 20 ms before the peak, or the first sample when the peak is earlier. A half-Hann fade-in covers min(10 ms, half the time from the start to the peak); none when the window starts at the first sample. Sent with a text file: 400.',
      'x-unit': 'ms',
    }),
  /** An impulse response (WAV) only: the window's length, ms (default 500 ms, clamped to the file's end). */
  windowLengthMs: formNumber(1, 10_000, 'windowLengthMs')
    .optional()
    .meta({
      description:
        'WAV only: the window’s length, ms (1…10 000; it must reach past the peak and end within the file), sent as text. Default: 500 ms, or to the end of the file when that comes first. A half-Hann fade-out covers min(20 % of the length, half the time from the peak to the end). Sent with a text file: 400.',
      'x-unit': 'ms',
    }),
});
export type MeasurementUploadFields = z.infer<typeof measurementUploadFieldsSchema>;

/** The WAV formats an impulse response may come in (lib/measurements/read-wav.ts). */
const WAV_FORMATS = 'RIFF/WAVE, 16-, 24- or 32-bit integer PCM or 32-bit float (plain or WAVE_FORMAT_EXTENSIBLE), mono or the first channel of several, 8–192 kHz, at most 10 s, at most 16 MB';

/**
 * POST /api/v1/measurements as a form, for the API's description: the text fields above and the file. The handler reads
 * the file itself (lib/measurements/read-upload.ts) and checks the text fields with `measurementUploadFieldsSchema`.
 */
export const measurementUploadFormSchema = measurementUploadFieldsSchema.extend({
  file: z.string().meta({
    format: 'binary',
    description: `The measurement, exactly one file. Text (text/plain or CSV, at most 2 MB): two or three numeric columns per line: frequency (Hz), magnitude (dB), optional phase (°), separated by commas, semicolons, tabs or spaces; leading lines that do not begin with a number (notes, a header row) are skipped and counted; lines starting with # or ; are comments anywhere; decimal point, or decimal comma when the columns are not comma-separated. Or an impulse response as a WAV file (${WAV_FORMATS}): read as WAV when its first bytes are a RIFF header, whatever type it was sent as (audio/wav, audio/x-wav, audio/wave, application/octet-stream…); it is cut with the window, transformed with an FFT and stored as its complex response on a log grid, 10 Hz to 20 kHz (never above 0.45 × the sample rate), 48 points per octave: magnitude in dB re full scale (an impulse of 1.0 reads 0 dB) and the true phase in degrees, including the delay from the file’s first sample to the peak, wrapped to (−180, 180].`,
  }),
});

/** PATCH /api/v1/measurements/{id}: the labels only (the points never change); null clears seat, role or runLabel. */
export const measurementLabelsSchema = z
  .strictObject({
    name: measurementNameSchema.optional().meta({ description: 'The new name, 1–120 characters.' }),
    seat: seatSchema.nullable().optional().meta({ description: 'Where it was measured, 1–60 characters; null clears it.' }),
    role: measurementRoleSchema.nullable().optional().meta({ description: `Which source it is: ${ROLE_WORDS}; null clears it.` }),
    runLabel: runLabelSchema.nullable().optional().meta({ description: 'What was different in this run, 1–80 characters; null clears it.' }),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'send at least one of name, seat, role, runLabel' })
  .meta({ description: 'The labels to change: at least one of name, seat, role, runLabel; any other field is a 400. Text is trimmed; the points never change.', minProperties: 1 });

export const measurementListQuerySchema = z.object({
  workspaceId: uuidField('workspaceId must be an id').optional().meta({ description: 'Only this workspace.' }),
  systemId: uuidField('systemId must be an id').optional().meta({ description: 'Only those uploaded for this System.' }),
  /** Only this seat and this role (each an exact match, ignoring case). */
  seat: z
    .string()
    .trim()
    .min(1, 'seat must not be empty')
    .max(60, 'seat must be at most 60 characters')
    .optional()
    .meta({ description: 'Only those measured at this seat, 1–60 characters: the same text ignoring case ("row 1 centre (mlp)" finds "Row 1 centre (MLP)").' }),
  role: measurementRoleSchema.optional().meta({ description: 'Only those of this source ("mains", "sub", "L"…): the same text ignoring case.' }),
});
export type MeasurementListQuery = z.infer<typeof measurementListQuerySchema>;

const settingsSchema = {
  gainDb: num(-60, 60, 'dB').meta({ description: 'The processor’s gain on this output, −60…60 dB.', 'x-unit': 'dB' }),
  delayMs: num(0, 1000, 'ms').meta({ description: 'The processor’s delay on this output, 0…1000 ms.', 'x-unit': 'ms' }),
  invert: z.boolean({ error: 'must be true or false' }).meta({ description: 'True: polarity inverted.' }),
  /** The processor's EQ on this output, applied to the curve (a speaker's voicing switch is already in a measurement). */
  processorEq: pathEqSchema
    .optional()
    .meta({ description: 'The processor’s EQ on this output, applied to the curve (a speaker’s voicing switches are already in a measurement); as paths[].eq of /api/v1/blend.' }),
};
const predictSlope = (which: string) =>
  z
    .strictObject({
      family: filterFamilySchema.meta({ description: 'butterworth or linkwitz-riley.' }),
      order: num(1, 8).int('must be a whole number').meta({ description: 'Butterworth 1–8, Linkwitz–Riley 2, 4 or 8.' }),
    })
    .meta({ description: `The ${which} slope at crossoverHz.` });
const predictSource = (name: string) =>
  z
    .strictObject({
      name: z.string().trim().min(1).max(60).default(name).meta({ description: `The trace’s name, 1–60 characters (default "${name}").` }),
      curve: measuredCurveSchema,
      ...settingsSchema,
    })
    .meta({ description: `The ${name} curve and the processor settings to apply to it. The measurement is taken as holding the speaker’s own roll-off, its voicing switches and the distance, so none of them is added.` });

export const predictRequestSchema = z.strictObject({
  temperatureC: temperatureCSchema.meta({ description: 'Air temperature, −20…50 °C (the speed of sound of the delay scan).', 'x-unit': '°C' }),
  crossoverHz: num(20, 300, 'Hz').meta({ description: 'The crossover, 20…300 Hz: the corner of both filters.', 'x-unit': 'Hz' }),
  mainsHighpass: predictSlope('mains’ high-pass'),
  subLowpass: predictSlope('sub’s low-pass'),
  mains: predictSource('mains'),
  sub: predictSource('sub'),
  /** Display smoothing of every returned curve: 0 (none) or N of 1/N octave. */
  smoothingFraction: num(0, 48).int('must be a whole number').default(0).meta({ description: 'Display smoothing of every returned magnitude: 0 (none, the default) or N of 1/N octave (1…48).' }),
  /** Points per octave of the shared grid the curves are resampled to. */
  pointsPerOctave: num(6, 96).int('must be a whole number').default(48).meta({ description: 'Points per octave of the shared grid both curves are resampled to, 6…96 (default 48).' }),
  maxDelayMs: num(1, 50, 'ms').default(20).meta({ description: 'The widest delay the search tries on either side, 1…50 ms (default 20).', 'x-unit': 'ms' }),
}).superRefine((r, ctx) => {
  refineSlopeOrder(r.mainsHighpass, ctx, ['mainsHighpass', 'order']);
  refineSlopeOrder(r.subLowpass, ctx, ['subLowpass', 'order']);
});
export type PredictRequest = z.infer<typeof predictRequestSchema>;
export type PredictRequestInput = z.input<typeof predictRequestSchema>;
