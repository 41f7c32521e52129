import { z } from 'zod';
import { measuredCurveSchema } from './measured-curve';
import { MAX_PATH_EQ_FILTERS } from '@/dsp';
import { num } from './common';
import { COMPUTE_LIMITS, gridSchema, temperatureCSchema } from './compute-common';
import { eqFilterSchema } from './eq-filter';
import { filterFamilySchema, refineSlopeOrder } from './slope';

/**
 * Request bodies of POST /api/v1/blend, /api/v1/crossover-sweep and /api/v1/timing (fields on the API page /docs/api).
 * Every number finite and in range; a bad field is answered 400 with its path
 * (e.g. `paths.1.filter.order`). Unknown keys are refused so a misspelt field never passes
 * silently.
 */

const hz = (min: number = COMPUTE_LIMITS.minHz, max: number = COMPUTE_LIMITS.maxHz) => num(min, max, 'Hz');
const wholeOrder = num(1, 8).int('must be a whole number');

/** A crossover slope without its corner: Butterworth 1–8, Linkwitz–Riley 2, 4, 8. */
export const filterShapeSchema = z.strictObject({ family: filterFamilySchema, order: wholeOrder }).superRefine((s, ctx) => refineSlopeOrder(s, ctx));

/** A crossover filter of one path. With response 'none' the path is a straight wire (family, order, cornerHz ignored but still checked). */
export const filterSpecSchema = z
  .strictObject({
    family: filterFamilySchema,
    order: wholeOrder,
    response: z.enum(['lowpass', 'highpass', 'none'], { error: "must be 'lowpass', 'highpass' or 'none'" }),
    cornerHz: hz(),
  })
  .superRefine((s, ctx) => refineSlopeOrder(s, ctx));

const q = num(0.2, 10);

/** A speaker's natural roll-off (Small 1972 sealed; Thiele 1971 vented; a sub's upper roll-off). */
export const rolloffSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('none') }),
    z.strictObject({ kind: z.literal('sealed'), cornerHz: hz(1, 2000), q }),
    z.strictObject({ kind: z.literal('vented'), cornerHz: hz(1, 2000) }),
    z.strictObject({ kind: z.literal('lowpass'), cornerHz: hz(10, 24000), q }),
  ],
  { error: "kind must be 'none', 'sealed', 'vented' or 'lowpass'" },
);

/**
 * One roll-off or a chain of up to 4 applied together (e.g. a sub's low and upper roll-offs).
 * Checked by hand so a bad field keeps its exact path (`paths.1.rolloff.q`, `paths.1.rolloff.0.q`).
 */
function chainOf<T extends z.ZodType>(one: T) {
  const many = z.array(one).min(1, 'must hold at least one roll-off').max(4, 'must hold at most 4 roll-offs');
  return z.unknown().transform((value, ctx): z.output<T> | z.output<T>[] => {
    const parsed = Array.isArray(value) ? many.safeParse(value) : one.safeParse(value);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) ctx.addIssue({ code: 'custom', message: issue.message, path: issue.path });
      return z.NEVER;
    }
    return parsed.data as z.output<T> | z.output<T>[];
  });
}

/** Main speakers roll off at the bottom: none, sealed or vented. */
export const mainsRolloffSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('none') }),
    z.strictObject({ kind: z.literal('sealed'), cornerHz: hz(1, 2000), q }),
    z.strictObject({ kind: z.literal('vented'), cornerHz: hz(1, 2000) }),
  ],
  { error: "kind must be 'none', 'sealed' or 'vented'" },
);

const nameSchema = z.string({ error: 'must be a string' }).trim().min(1, 'must not be empty').max(60, 'must be at most 60 characters');
const gainDbSchema = num(-60, 60, 'dB');
const delayMsSchema = num(0, 1000, 'ms');
const distanceMSchema = num(0, 200, 'm');
const invertSchema = z.boolean({ error: 'must be true or false' });
/** A path's EQ (Audio EQ Cookbook peaking filters and shelves): a speaker's voicing-switch filters and the processor's EQ on that output. */
export const pathEqSchema = z.array(eqFilterSchema).max(MAX_PATH_EQ_FILTERS, `must hold at most ${MAX_PATH_EQ_FILTERS} filters`).readonly();

export const blendPathSchema = z.strictObject({
  name: nameSchema,
  filter: filterSpecSchema,
  rolloff: chainOf(rolloffSchema).optional(),
  eq: pathEqSchema.optional(),
  gainDb: gainDbSchema,
  delayMs: delayMsSchema,
  invert: invertSchema,
  distanceM: distanceMSchema.optional(),
});

/** POST /api/v1/blend, plus an optional crossoverHz for the metrics. */
export const blendRequestSchema = z
  .strictObject({
    temperatureC: temperatureCSchema,
    grid: gridSchema,
    paths: z.array(blendPathSchema).min(1, 'must hold at least one path').max(COMPUTE_LIMITS.maxPaths, `must hold at most ${COMPUTE_LIMITS.maxPaths} paths`),
    crossoverHz: hz().optional(),
  })
  .superRefine((b, ctx) => {
    if (b.crossoverHz !== undefined && (b.crossoverHz < b.grid.startHz || b.crossoverHz > b.grid.stopHz)) {
      ctx.addIssue({ code: 'custom', path: ['crossoverHz'], message: `must lie within the grid (${b.grid.startHz}–${b.grid.stopHz} Hz)` });
    }
  });

export type BlendRequest = z.infer<typeof blendRequestSchema>;

/** The product's default Crossover sweep candidates: 40–150 Hz in 5 Hz steps. */
export const DEFAULT_SWEEP_CANDIDATES_HZ: readonly number[] = Array.from({ length: 23 }, (_, i) => 40 + 5 * i);

const pairingSchema = z.strictObject({ mainsFilter: filterShapeSchema, subFilter: filterShapeSchema });

/**
 * Most candidate points × slope pairings one sweep request may try. The row cap stays at 120: each row is a whole-system
 * timing search (about 20 ms on one core), so 120 rows are a few seconds of server time; six pairings fit it only with
 * 20 candidate points or fewer (the default 23 allow five).
 */
export const SWEEP_LIMITS = { maxCandidates: 60, maxPairings: 6, maxRows: 120, minHz: 20, maxHz: 300 } as const;

/** How many slope pairings fit the row cap with `candidateCount` candidate points (at most maxPairings; 0 when even one does not). */
export function sweepPairingsThatFit(candidateCount: number): number {
  if (!(candidateCount > 0)) return SWEEP_LIMITS.maxPairings;
  return Math.min(SWEEP_LIMITS.maxPairings, Math.floor(SWEEP_LIMITS.maxRows / candidateCount));
}

/** Why candidates × pairings is too many rows, in the words the Crossover sweep and the API both use; null when it fits. */
export function sweepRowsProblem(candidateCount: number, pairingCount: number): string | null {
  const rows = candidateCount * pairingCount;
  if (rows <= SWEEP_LIMITS.maxRows) return null;
  const fit = sweepPairingsThatFit(candidateCount);
  const advice = fit > 0 ? `with ${candidateCount} candidate points at most ${fit} slope pairing${fit === 1 ? '' : 's'} fit` : `${candidateCount} candidate points alone are too many`;
  return `${candidateCount} candidate points × ${pairingCount} slope pairings gives ${rows} rows; at most ${SWEEP_LIMITS.maxRows} are allowed: ${advice} (widen the step or narrow the range to try more)`;
}


/**
 * A source run on what was measured at the seat: the measurement holds the speaker's roll-off, its voicing switches,
 * the air path and the room, so such a source has distanceM 0 and no roll-off, and its `eq` is the processor's only.
 */
const measuredSourceRefine = (s: { distanceM: number; rolloff: unknown; measured?: unknown }, ctx: z.RefinementCtx) => {
  if (s.measured === undefined) return;
  if (s.distanceM !== 0) ctx.addIssue({ code: 'custom', path: ['distanceM'], message: 'must be 0 with measured (the measurement already holds the air path)' });
  const chain = Array.isArray(s.rolloff) ? s.rolloff : [s.rolloff];
  if (chain.some((r) => (r as { kind: string }).kind !== 'none')) ctx.addIssue({ code: 'custom', path: ['rolloff'], message: "must be { kind: 'none' } with measured (the measurement already holds the speaker's roll-off)" });
};

const timingMainsSchema = z
  .strictObject({
    name: nameSchema.default('mains'),
    distanceM: distanceMSchema,
    delayMs: delayMsSchema.default(0),
    gainDb: gainDbSchema.default(0),
    rolloff: chainOf(mainsRolloffSchema).default({ kind: 'none' }),
    eq: pathEqSchema.optional(),
    /** Run this source on its measurement at the seat instead of its model. */
    measured: measuredCurveSchema.optional(),
  })
  .superRefine(measuredSourceRefine);

const timingSubSchema = z
  .strictObject({
    name: nameSchema,
    distanceM: distanceMSchema,
    delayMs: delayMsSchema.default(0),
    gainDb: gainDbSchema.default(0),
    invert: invertSchema.default(false),
    rolloff: chainOf(rolloffSchema).default({ kind: 'none' }),
    eq: pathEqSchema.optional(),
    measured: measuredCurveSchema.optional(),
  })
  .superRefine(measuredSourceRefine);

/** The whole system a Timing or Crossover sweep request describes: one main channel and every sub, as the processor runs them. */
const systemShape = {
  temperatureC: temperatureCSchema.default(20),
  crossoverHz: hz(20, 300),
  mainsHighpass: filterShapeSchema,
  subLowpass: filterShapeSchema,
  mains: timingMainsSchema,
  subs: z.array(timingSubSchema).min(1, 'must hold at least one sub').max(8, 'must hold at most 8 subs'),
};

/** POST /api/v1/timing. */
export const timingRequestSchema = z.strictObject({
  ...systemShape,
  maxDelayMs: num(1, 50, 'ms').default(20),
  stepMs: num(0.01, 1, 'ms').default(0.05),
});

/** POST /api/v1/crossover-sweep: the system as it is (its crossover and slopes are the present row), and what to try. */
export const crossoverSweepRequestSchema = z
  .strictObject({
    ...systemShape,
    pairings: z.array(pairingSchema).min(1, 'must hold at least one pairing').max(SWEEP_LIMITS.maxPairings, `must hold at most ${SWEEP_LIMITS.maxPairings} pairings`),
    candidatesHz: z
      .array(hz(SWEEP_LIMITS.minHz, SWEEP_LIMITS.maxHz))
      .min(1, 'must hold at least one frequency')
      .max(SWEEP_LIMITS.maxCandidates, `must hold at most ${SWEEP_LIMITS.maxCandidates} frequencies`)
      .optional(),
    maxDelayMs: num(1, 50, 'ms').default(20),
  })
  .superRefine((b, ctx) => {
    const problem = sweepRowsProblem(b.candidatesHz?.length ?? DEFAULT_SWEEP_CANDIDATES_HZ.length, b.pairings.length);
    if (problem) ctx.addIssue({ code: 'custom', path: ['candidatesHz'], message: problem });
  });

export type CrossoverSweepRequest = z.infer<typeof crossoverSweepRequestSchema>;
export type TimingRequest = z.infer<typeof timingRequestSchema>;

/** What a client may send (before defaults and roll-off chains are filled in). */
export type BlendRequestInput = z.input<typeof blendRequestSchema>;
export type TimingRequestInput = z.input<typeof timingRequestSchema>;
