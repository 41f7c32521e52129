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
const orderMeta = { description: 'The total order: Butterworth 1–8, Linkwitz–Riley 2, 4 or 8 (LR4 = 24 dB/octave).' };

/** A crossover slope without its corner: Butterworth 1–8, Linkwitz–Riley 2, 4, 8. */
export const filterShapeSchema = z
  .strictObject({ family: filterFamilySchema, order: wholeOrder.meta(orderMeta) })
  .superRefine((s, ctx) => refineSlopeOrder(s, ctx))
  .meta({ id: 'FilterShape', description: "A crossover slope without its corner: family 'butterworth' (order 1–8) or 'linkwitz-riley' (order 2, 4 or 8)." });

/** A crossover filter of one path. With response 'none' the path is a straight wire (family, order, cornerHz ignored but still checked). */
export const filterSpecSchema = z
  .strictObject({
    family: filterFamilySchema,
    order: wholeOrder.meta(orderMeta),
    response: z
      .enum(['lowpass', 'highpass', 'none'], { error: "must be 'lowpass', 'highpass' or 'none'" })
      .meta({ description: "'lowpass', 'highpass', or 'none' (a straight wire: family, order and cornerHz are checked but not used)." }),
    cornerHz: hz().meta({ description: 'Corner frequency, 10…24 000 Hz (−3 dB for Butterworth, −6 dB for Linkwitz–Riley).', 'x-unit': 'Hz' }),
  })
  .superRefine((s, ctx) => refineSlopeOrder(s, ctx))
  .meta({ id: 'CrossoverFilter', description: 'The crossover filter the processor runs on this path.' });

const q = num(0.2, 10).meta({ description: 'Quality factor of the roll-off, 0.2–10 (0.707: Butterworth).' });
const rolloffCornerHz = hz(1, 2000).meta({ description: 'Corner of the roll-off, 1–2000 Hz.', 'x-unit': 'Hz' });
const noRolloff = z.strictObject({ kind: z.literal('none').meta({ description: 'No roll-off (a flat speaker).' }) });
const sealedRolloff = z.strictObject({ kind: z.literal('sealed').meta({ description: 'A sealed box: a second-order high-pass (Small 1972).' }), cornerHz: rolloffCornerHz, q });
const ventedRolloff = z.strictObject({ kind: z.literal('vented').meta({ description: 'A vented box or passive radiator: a fourth-order high-pass (Thiele 1971).' }), cornerHz: rolloffCornerHz });

/** A speaker's natural roll-off (Small 1972 sealed; Thiele 1971 vented; a sub's upper roll-off). */
export const rolloffSchema = z
  .discriminatedUnion(
    'kind',
    [
      noRolloff,
      sealedRolloff,
      ventedRolloff,
      z.strictObject({
        kind: z.literal('lowpass').meta({ description: "A sub's upper roll-off: a second-order low-pass." }),
        cornerHz: hz(10, 24000).meta({ description: 'Corner of the upper roll-off, 10–24 000 Hz.', 'x-unit': 'Hz' }),
        q,
      }),
    ],
    { error: "kind must be 'none', 'sealed', 'vented' or 'lowpass'" },
  )
  .meta({
    id: 'Rolloff',
    description: "A speaker's natural roll-off: { kind: 'none' } | { kind: 'sealed', cornerHz, q } | { kind: 'vented', cornerHz } | { kind: 'lowpass', cornerHz, q } (a sub's upper roll-off).",
  });

/**
 * One roll-off or a chain of up to 4 applied together (e.g. a sub's low and upper roll-offs).
 * Checked by hand so a bad field keeps its exact path (`paths.1.rolloff.q`, `paths.1.rolloff.0.q`); the union after the
 * check is what JSON Schema shows (and passes what the check passed).
 */
function chainOf<T extends z.ZodType>(one: T) {
  const many = z.array(one).min(1, 'must hold at least one roll-off').max(4, 'must hold at most 4 roll-offs');
  const check = (value: unknown, ctx: z.RefinementCtx) => {
    const parsed = Array.isArray(value) ? many.safeParse(value) : one.safeParse(value);
    if (!parsed.success) for (const issue of parsed.error.issues) ctx.addIssue({ ...issue, path: issue.path });
    return value;
  };
  return z.preprocess(check, z.union([one, many]));
}

/** Main speakers roll off at the bottom: none, sealed or vented. */
export const mainsRolloffSchema = z
  .discriminatedUnion('kind', [noRolloff, sealedRolloff, ventedRolloff], { error: "kind must be 'none', 'sealed' or 'vented'" })
  .meta({ id: 'MainsRolloff', description: "A main speaker's natural roll-off: { kind: 'none' } | { kind: 'sealed', cornerHz, q } | { kind: 'vented', cornerHz }." });

const rolloffChainWords = 'One roll-off or a chain of up to 4 applied together';
const nameSchema = z.string({ error: 'must be a string' }).trim().min(1, 'must not be empty').max(60, 'must be at most 60 characters');
const gainDbSchema = num(-60, 60, 'dB');
const delayMsSchema = num(0, 1000, 'ms');
const distanceMSchema = num(0, 200, 'm');
const invertSchema = z.boolean({ error: 'must be true or false' });
/** A path's EQ (Audio EQ Cookbook peaking filters and shelves): a speaker's voicing-switch filters and the processor's EQ on that output. */
export const pathEqSchema = z
  .array(eqFilterSchema)
  .max(MAX_PATH_EQ_FILTERS, `must hold at most ${MAX_PATH_EQ_FILTERS} filters`)
  .readonly()
  .meta({ description: `EQ applied together, at most ${MAX_PATH_EQ_FILTERS} filters: a speaker's voicing-switch filters and the processor's EQ on that output (default none).` });

export const blendPathSchema = z
  .strictObject({
    name: nameSchema.meta({ description: 'The path’s name, 1–60 characters, given back in the answer.' }),
    filter: filterSpecSchema,
    rolloff: chainOf(rolloffSchema)
      .optional()
      .meta({ description: `${rolloffChainWords}: the speaker's natural roll-off (default none).` }),
    eq: pathEqSchema.optional(),
    gainDb: gainDbSchema.meta({ description: 'Gain, −60…60 dB.', 'x-unit': 'dB' }),
    delayMs: delayMsSchema.meta({ description: 'Processor delay, 0…1000 ms.', 'x-unit': 'ms' }),
    invert: invertSchema.meta({ description: 'Polarity inverted.' }),
    distanceM: distanceMSchema
      .optional()
      .meta({ description: 'Air path to the listener, 0…200 m: adds distanceM / c(temperatureC) to the delay, never changes level.', 'x-unit': 'm' }),
  })
  .meta({ id: 'BlendPath', description: 'One path to the listener: crossover filter × natural roll-off × EQ × gain × polarity × delay.' });

/** POST /api/v1/blend, plus an optional crossoverHz for the metrics. */
export const blendRequestSchema = z
  .strictObject({
    temperatureC: temperatureCSchema.meta({ description: 'Air temperature, −20…50 °C; sets the speed of sound for distanceM.' }),
    grid: gridSchema,
    paths: z
      .array(blendPathSchema)
      .min(1, 'must hold at least one path')
      .max(COMPUTE_LIMITS.maxPaths, `must hold at most ${COMPUTE_LIMITS.maxPaths} paths`)
      .meta({ description: `1…${COMPUTE_LIMITS.maxPaths} paths, e.g. the mains first and then each sub.` }),
    crossoverHz: hz()
      .optional()
      .meta({
        description:
          'Where the metrics are read (within the grid). Absent: the geometric mean of the first high-pass and the first low-pass corner (the one corner when only one side is filtered); metrics is null when no path is filtered.',
        'x-unit': 'Hz',
      }),
  })
  .superRefine((b, ctx) => {
    if (b.crossoverHz !== undefined && (b.crossoverHz < b.grid.startHz || b.crossoverHz > b.grid.stopHz)) {
      ctx.addIssue({ code: 'custom', path: ['crossoverHz'], message: `must lie within the grid (${b.grid.startHz}–${b.grid.stopHz} Hz)` });
    }
  })
  .meta({ id: 'BlendRequest' });

export type BlendRequest = z.infer<typeof blendRequestSchema>;

/** The product's default Crossover sweep candidates: 40–150 Hz in 5 Hz steps. */
export const DEFAULT_SWEEP_CANDIDATES_HZ: readonly number[] = Array.from({ length: 23 }, (_, i) => 40 + 5 * i);

const pairingSchema = z
  .strictObject({ mainsFilter: filterShapeSchema.meta({ description: 'The mains high-pass slope to try.' }), subFilter: filterShapeSchema.meta({ description: 'The sub low-pass slope to try.' }) })
  .meta({ description: 'One slope pairing: the mains high-pass and the sub low-pass tried together.' });

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

const measuredWords =
  "Run this source on what was measured at the seat instead of its model: { measurementId } (a stored measurement the caller may read; needs a session or token) or { frequencyHz, magnitudeDb, phaseDeg? } (at most 20 000 points; no phase: a minimum-phase estimate, which holds no arrival time). The measurement holds the speaker's roll-off, voicing switches, air path and room, so such a source must send distanceM 0 and rolloff none, and its eq is the processor's only. The curves must cover fc/2 … 4·fc (mains) and fc/2 … 2·fc (subs) for every crossover point judged, else 400 naming the point.";
const sourceFields = (who: string) => ({
  distanceM: distanceMSchema.meta({ description: `${who} to the main listening position, 0…200 m.`, 'x-unit': 'm' }),
  delayMs: delayMsSchema.default(0).meta({ description: `Processor delay on ${who === 'Main speaker' ? 'the main channel' : 'this sub'} now, 0…1000 ms (default 0).`, 'x-unit': 'ms' }),
  eq: pathEqSchema.optional(),
  measured: measuredCurveSchema.optional().meta({ description: measuredWords }),
});

const timingMainsSchema = z
  .strictObject({
    name: nameSchema.default('mains').meta({ description: 'Label of the main channel, 1–60 characters (default "mains").' }),
    ...sourceFields('Main speaker'),
    gainDb: gainDbSchema.default(0).meta({ description: 'Main channel level at the seat relative to level-matched, −60…60 dB (default 0).', 'x-unit': 'dB' }),
    rolloff: chainOf(mainsRolloffSchema)
      .default({ kind: 'none' })
      .meta({ description: `${rolloffChainWords}: the main speaker's natural roll-off (default none).` }),
  })
  .superRefine(measuredSourceRefine)
  .meta({ id: 'SystemMains', description: 'The main channel as the processor runs it now.' });

const timingSubSchema = z
  .strictObject({
    name: nameSchema.meta({ description: 'The sub’s name, 1–60 characters, given back in the answer.' }),
    ...sourceFields('Sub'),
    gainDb: gainDbSchema.default(0).meta({ description: "This sub's level at the seat, −60…60 dB (default 0).", 'x-unit': 'dB' }),
    invert: invertSchema.default(false).meta({ description: 'Polarity inverted now (default false).' }),
    rolloff: chainOf(rolloffSchema)
      .default({ kind: 'none' })
      .meta({ description: `${rolloffChainWords}: the sub's natural roll-off and upper roll-off (default none).` }),
  })
  .superRefine(measuredSourceRefine)
  .meta({ id: 'SystemSub', description: 'One sub as the processor runs it now.' });

const maxDelayMsSchema = (who: string) =>
  num(1, 50, 'ms')
    .default(20)
    .meta({ description: `Largest shift of ${who} delay tried either way, 1…50 ms (default 20).`, 'x-unit': 'ms' });

/** The whole system a Timing or Crossover sweep request describes: one main channel and every sub, as the processor runs them. */
const systemShape = (crossoverWords: string) => ({
  temperatureC: temperatureCSchema.default(20).meta({ description: 'Air temperature, −20…50 °C (default 20); sets the speed of sound c = 331.3·√(1 + T/273.15).' }),
  crossoverHz: hz(20, 300).meta({ description: crossoverWords, 'x-unit': 'Hz' }),
  mainsHighpass: filterShapeSchema.meta({ description: 'The mains high-pass the processor runs now.' }),
  subLowpass: filterShapeSchema.meta({ description: 'The sub low-pass the processor runs now (the same slope on every sub).' }),
  mains: timingMainsSchema,
  subs: z
    .array(timingSubSchema)
    .min(1, 'must hold at least one sub')
    .max(8, 'must hold at most 8 subs')
    .meta({ description: '1–8 subs: every sub of the system, in the order the answer gives them back.' }),
});

/** POST /api/v1/timing. */
export const timingRequestSchema = z
  .strictObject({
    ...systemShape('The crossover the processor runs now, 20…300 Hz.'),
    maxDelayMs: maxDelayMsSchema("a sub's"),
    stepMs: num(0.01, 1, 'ms')
      .default(0.05)
      .meta({ description: 'Scan step, 0.01…1 ms (default 0.05); candidates are refined and rounded to 0.01 ms as a processor takes them.', 'x-unit': 'ms' }),
  })
  .meta({ id: 'TimingRequest' });

/** POST /api/v1/crossover-sweep: the system as it is (its crossover and slopes are the present row), and what to try. */
export const crossoverSweepRequestSchema = z
  .strictObject({
    ...systemShape('The crossover the processor runs now, 20…300 Hz: with mainsHighpass and subLowpass it is the present row.'),
    pairings: z
      .array(pairingSchema)
      .min(1, 'must hold at least one pairing')
      .max(SWEEP_LIMITS.maxPairings, `must hold at most ${SWEEP_LIMITS.maxPairings} pairings`)
      .meta({ description: `1–${SWEEP_LIMITS.maxPairings} slope pairings to try.` }),
    candidatesHz: z
      .array(hz(SWEEP_LIMITS.minHz, SWEEP_LIMITS.maxHz).meta({ description: 'A candidate crossover point, 20…300 Hz.', 'x-unit': 'Hz' }))
      .min(1, 'must hold at least one frequency')
      .max(SWEEP_LIMITS.maxCandidates, `must hold at most ${SWEEP_LIMITS.maxCandidates} frequencies`)
      .optional()
      .meta({
        description: `Candidate crossover points, 20…300 Hz, 1–${SWEEP_LIMITS.maxCandidates} of them (default 40–150 Hz in 5 Hz steps). Candidates × pairings ≤ ${SWEEP_LIMITS.maxRows} rows: the default 23 candidates allow 5 pairings, 20 or fewer allow 6; a refusal says how many pairings fit.`,
        'x-unit': 'Hz',
      }),
    maxDelayMs: maxDelayMsSchema("the subs'"),
  })
  .superRefine((b, ctx) => {
    const problem = sweepRowsProblem(b.candidatesHz?.length ?? DEFAULT_SWEEP_CANDIDATES_HZ.length, b.pairings.length);
    if (problem) ctx.addIssue({ code: 'custom', path: ['candidatesHz'], message: problem });
  })
  .meta({ id: 'CrossoverSweepRequest' });

export type CrossoverSweepRequest = z.infer<typeof crossoverSweepRequestSchema>;
export type TimingRequest = z.infer<typeof timingRequestSchema>;

/** What a client may send (before defaults and roll-off chains are filled in). */
export type BlendRequestInput = z.input<typeof blendRequestSchema>;
export type TimingRequestInput = z.input<typeof timingRequestSchema>;
