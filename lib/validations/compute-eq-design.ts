import { z } from 'zod';
import { EQ_DESIGN_DEFAULTS, EQ_DESIGN_LIMITS, EQ_LIMITS, MAX_HOUSE_RISE_DB, SAMPLE_RATE_LIMITS_HZ, statisticalModeCount } from '@/dsp';
import { num, uuidField } from './common';
import { rolloffSchema } from './compute-blend';
import { positionShape, refineRequestInsideRoom, ROOM_LIMITS, roomDimensionsShape, roomItemNameSchema, temperatureCSchema } from './compute-common';
import { eqFilterSchema, peakingFilterSchema } from './eq-filter';
import { filterFamilySchema, refineSlopeOrder } from './slope';

/**
 * Request bodies of POST /api/v1/eq-design (fields on the API page, lib/api-docs/compute-eq-design.ts): an inline curve,
 * the modal model of a room with its subs, or stored measurements. The design options are common to all three.
 */

const EQ_DESIGN_REQUEST_LIMITS = {
  /** Points of an inline curve. */
  maxCurvePoints: 4000,
  /** Band points the model or measured grid may hold. */
  maxBandPoints: 400,
  maxSeats: ROOM_LIMITS.maxSeats,
  maxSubs: ROOM_LIMITS.maxSubs,
} as const;

/** The grid of the model and measured forms by default: the Modes tab's (15–200 Hz, 48 points per octave). */
const EQ_DESIGN_GRID = { startHz: 15, stopHz: 200, pointsPerOctave: 48 } as const;

const targetSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('flat') }),
    z.object({ kind: z.literal('house'), riseDb: num(0, MAX_HOUSE_RISE_DB, 'dB'), belowHz: num(20, 200, 'Hz') }),
  ],
  { error: "kind must be 'flat' or 'house'" },
);

const bandSchema = z
  .object({ startHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz'), stopHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz') })
  .superRefine((b, ctx) => {
    if (b.stopHz <= b.startHz) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be above startHz' });
  });

const qSchema = z
  .object({ min: num(EQ_LIMITS.q.min, EQ_LIMITS.q.max), max: num(EQ_LIMITS.q.min, EQ_LIMITS.q.max) })
  .superRefine((q, ctx) => {
    if (q.max < q.min) ctx.addIssue({ code: 'custom', path: ['max'], message: 'must be at least min' });
  });

/** The designer's options, common to every form. */
const designShape = {
  target: targetSchema.default({ kind: 'flat' }),
  band: bandSchema.default({ ...EQ_DESIGN_DEFAULTS.band }),
  maxFilters: num(1, EQ_DESIGN_LIMITS.maxFilters).int('must be a whole number').default(EQ_DESIGN_DEFAULTS.maxFilters),
  maxBoostDb: num(0, EQ_DESIGN_LIMITS.maxBoostDb, 'dB').default(EQ_DESIGN_DEFAULTS.maxBoostDb),
  maxCutDb: num(0, EQ_DESIGN_LIMITS.maxCutDb, 'dB').default(EQ_DESIGN_DEFAULTS.maxCutDb),
  q: qSchema.default({ ...EQ_DESIGN_DEFAULTS.q }),
  sampleRateHz: num(SAMPLE_RATE_LIMITS_HZ.min, SAMPLE_RATE_LIMITS_HZ.max, 'Hz').default(EQ_DESIGN_DEFAULTS.sampleRateHz),
  nullDepthDb: num(EQ_DESIGN_LIMITS.minNullDepthDb, EQ_DESIGN_LIMITS.maxNullDepthDb, 'dB').default(EQ_DESIGN_DEFAULTS.nullDepthDb),
  /** Where the target sits (the input's units); default the median in the band. A design's levelOffsetDb checks against its target. */
  targetLevelDb: num(-500, 500, 'dB').optional(),
};

const gridSchema = z.object({ startHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz'), stopHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz'), pointsPerOctave: num(1, 192) });

/** The crossover low-pass the sub outputs run (a digital filter at sampleRateHz, as the processor runs it). */
const lowpassSchema = z.object({ family: filterFamilySchema, order: num(1, 8).int('must be a whole number'), cornerHz: num(10, 500, 'Hz') }).superRefine((s, ctx) => refineSlopeOrder(s, ctx));

const invertSchema = z.boolean({ error: 'must be true or false' });

/** The band inside the grid, not too many points, below the Nyquist frequency. */
function refineGridAndBand(r: { grid: { startHz: number; stopHz: number; pointsPerOctave: number }; band: { startHz: number; stopHz: number }; sampleRateHz: number }, ctx: z.RefinementCtx): void {
  const g = r.grid;
  if (g.stopHz <= g.startHz) ctx.addIssue({ code: 'custom', path: ['grid', 'stopHz'], message: 'must be above startHz' });
  if (r.band.startHz < g.startHz || r.band.stopHz > g.stopHz) ctx.addIssue({ code: 'custom', path: ['band'], message: `must lie within the grid (${g.startHz}–${g.stopHz} Hz)` });
  const points = Math.floor(Math.log2(Math.max(r.band.stopHz / r.band.startHz, 1)) * g.pointsPerOctave) + 1;
  if (points > EQ_DESIGN_REQUEST_LIMITS.maxBandPoints) ctx.addIssue({ code: 'custom', path: ['grid', 'pointsPerOctave'], message: `the band would hold about ${points} points; at most ${EQ_DESIGN_REQUEST_LIMITS.maxBandPoints}` });
  if (points < 3) ctx.addIssue({ code: 'custom', path: ['grid', 'pointsPerOctave'], message: 'the band must hold at least 3 points of the grid' });
}

/** Names unique within a list (case and outer spaces ignored). */
function refineUniqueNames(list: { name: string }[], key: string, ctx: z.RefinementCtx): void {
  const seen = new Set<string>();
  list.forEach((item, i) => {
    const name = item.name.toLowerCase();
    if (seen.has(name)) ctx.addIssue({ code: 'custom', path: [key, i, 'name'], message: `"${item.name}" is named twice; names must differ` });
    seen.add(name);
  });
}

/** An inline curve: the response on any ascending grid, and optionally a shape to add to the target. */
export const eqDesignCurveRequestSchema = z
  .object({
    frequencyHz: z.array(num(1, SAMPLE_RATE_LIMITS_HZ.max / 2, 'Hz')).min(3, 'at least 3 points are needed').max(EQ_DESIGN_REQUEST_LIMITS.maxCurvePoints, `at most ${EQ_DESIGN_REQUEST_LIMITS.maxCurvePoints} points`),
    magnitudeDb: z.array(num(-300, 300, 'dB')),
    targetShapeDb: z.array(num(-100, 100, 'dB')).optional(),
    ...designShape,
  })
  .superRefine((r, ctx) => {
    if (r.magnitudeDb.length !== r.frequencyHz.length) ctx.addIssue({ code: 'custom', path: ['magnitudeDb'], message: `must have one value per frequency (${r.frequencyHz.length})` });
    if (r.targetShapeDb && r.targetShapeDb.length !== r.frequencyHz.length) ctx.addIssue({ code: 'custom', path: ['targetShapeDb'], message: `must have one value per frequency (${r.frequencyHz.length})` });
    const at = r.frequencyHz.findIndex((f, i) => i > 0 && !(f > (r.frequencyHz[i - 1] as number)));
    if (at > 0) ctx.addIssue({ code: 'custom', path: ['frequencyHz', at], message: 'must be above the frequency before it (ascending)' });
    const nyquist = r.frequencyHz.findIndex((f) => f >= r.sampleRateHz / 2);
    if (nyquist >= 0) ctx.addIssue({ code: 'custom', path: ['frequencyHz', nyquist], message: `must be below the Nyquist frequency (${r.sampleRateHz / 2} Hz)` });
    const inBand = r.frequencyHz.filter((f) => f >= r.band.startHz && f <= r.band.stopHz).length;
    if (inBand < 3 && r.band.stopHz > r.band.startHz) ctx.addIssue({ code: 'custom', path: ['band'], message: `must hold at least 3 points of frequencyHz (it holds ${inBand})` });
  });
export type EqDesignCurveRequest = z.infer<typeof eqDesignCurveRequestSchema>;

/** The modal model: a room, seats and subs with their present processor settings, the crossover low-pass. */
export const eqDesignModelRequestSchema = z
  .object({
    room: z.object({ ...roomDimensionsShape, rt60S: num(0.05, 10, 's'), temperatureC: temperatureCSchema }),
    seats: z.array(z.object({ name: roomItemNameSchema, ...positionShape })).min(1, 'at least one seat is needed').max(EQ_DESIGN_REQUEST_LIMITS.maxSeats, `at most ${EQ_DESIGN_REQUEST_LIMITS.maxSeats} seats`),
    /** 'average' (the power average over the seats) or one seat's name. */
    at: z.string({ error: 'must be "average" or a seat’s name' }).trim().min(1, 'is required').max(60).default('average'),
    subs: z
      .array(
        z.object({
          name: roomItemNameSchema,
          ...positionShape,
          gainDb: num(-30, 30, 'dB').default(0),
          delayMs: num(0, 100, 'ms').default(0),
          invert: invertSchema.default(false),
          rolloffs: z.array(rolloffSchema).max(4, 'at most 4 roll-offs').default([]),
          /** The filters of the sub's own back-panel switches (Voicing options), as analog prototypes. */
          voicing: z.array(eqFilterSchema).max(16, 'at most 16 filters').default([]),
          /** EQ the processor already runs on this output (digital, at sampleRateHz); the design comes on top of it. */
          eq: z.array(peakingFilterSchema.extend({ kind: z.literal('peaking', { error: "must be 'peaking': the sub outputs' EQ is peaking filters" }) })).max(10, 'at most 10 filters').default([]),
        }),
      )
      .min(1, 'at least one sub is needed')
      .max(EQ_DESIGN_REQUEST_LIMITS.maxSubs, `at most ${EQ_DESIGN_REQUEST_LIMITS.maxSubs} subs`),
    lowpass: lowpassSchema.optional(),
    followLowpass: invertSchema.default(true),
    grid: gridSchema.default({ ...EQ_DESIGN_GRID }),
    ...designShape,
  })
  .superRefine((r, ctx) => {
    refineUniqueNames(r.seats, 'seats', ctx);
    if (r.at.toLowerCase() !== 'average' && !r.seats.some((s) => s.name.toLowerCase() === r.at.toLowerCase())) ctx.addIssue({ code: 'custom', path: ['at'], message: `must be "average" or one of the seats’ names` });
    refineGridAndBand(r, ctx);
    refineRequestInsideRoom(ctx, r.room, { seats: r.seats, subs: r.subs });
    let expected = 0;
    try {
      expected = statisticalModeCount({ ...r.room, frequencyHz: 1.5 * r.grid.stopHz });
    } catch {
      expected = 0;
    }
    if (expected > ROOM_LIMITS.maxModes) ctx.addIssue({ code: 'custom', path: ['grid', 'stopHz'], message: `the modal sum would need about ${Math.round(expected)} modes; at most ${ROOM_LIMITS.maxModes} — lower stopHz` });
    if (r.lowpass && r.lowpass.cornerHz >= r.sampleRateHz / 2) ctx.addIssue({ code: 'custom', path: ['lowpass', 'cornerHz'], message: `must be below the Nyquist frequency (${r.sampleRateHz / 2} Hz)` });
  });
export type EqDesignModelRequest = z.infer<typeof eqDesignModelRequestSchema>;

/**
 * Stored measurements at the seats: either each sub alone (`sub` named; with phase, so they can be summed — without
 * phase only when there is one sub), or every sub playing together through the processor (`sub` left out; magnitude is
 * enough). Several seats are power-averaged.
 */
export const eqDesignMeasuredRequestSchema = z
  .object({
    measurements: z
      .array(z.object({ seat: roomItemNameSchema, sub: roomItemNameSchema.optional(), measurementId: uuidField('must be a measurement id') }))
      .min(1, 'at least one measurement is needed')
      .max(EQ_DESIGN_REQUEST_LIMITS.maxSeats * EQ_DESIGN_REQUEST_LIMITS.maxSubs),
    /** With per-sub files: every sub and its present processor settings (the files are taken without processing). */
    subs: z
      .array(z.object({ name: roomItemNameSchema, gainDb: num(-30, 30, 'dB').default(0), delayMs: num(0, 100, 'ms').default(0), invert: invertSchema.default(false) }))
      .min(1, 'at least one sub is needed')
      .max(EQ_DESIGN_REQUEST_LIMITS.maxSubs, `at most ${EQ_DESIGN_REQUEST_LIMITS.maxSubs} subs`)
      .optional(),
    lowpass: lowpassSchema.optional(),
    followLowpass: invertSchema.default(true),
    grid: gridSchema.default({ ...EQ_DESIGN_GRID }),
    ...designShape,
  })
  .superRefine((r, ctx) => {
    refineGridAndBand(r, ctx);
    const perSub = r.measurements.filter((m) => m.sub !== undefined).length;
    if (perSub > 0 && perSub < r.measurements.length) {
      ctx.addIssue({ code: 'custom', path: ['measurements'], message: 'name a sub in every measurement (each sub alone) or in none (every sub playing together)' });
      return;
    }
    const seats = new Map<string, string>();
    for (const m of r.measurements) if (!seats.has(m.seat.toLowerCase())) seats.set(m.seat.toLowerCase(), m.seat);
    const seen = new Set<string>();
    r.measurements.forEach((m, i) => {
      const key = `${(m.sub ?? '').toLowerCase()}\u0000${m.seat.toLowerCase()}`;
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['measurements', i], message: m.sub ? `${m.sub} at ${m.seat} is given twice` : `${m.seat} is given twice` });
      seen.add(key);
    });
    if (perSub === 0) return;
    if (!r.subs) {
      ctx.addIssue({ code: 'custom', path: ['subs'], message: 'is required with per-sub measurements: each sub’s present gainDb, delayMs and invert' });
      return;
    }
    refineUniqueNames(r.subs, 'subs', ctx);
    r.measurements.forEach((m, i) => {
      if (!r.subs!.some((s) => s.name.toLowerCase() === m.sub!.toLowerCase())) ctx.addIssue({ code: 'custom', path: ['measurements', i, 'sub'], message: `"${m.sub}" is not one of the subs` });
    });
    for (const sub of r.subs) {
      for (const [key, seat] of seats) {
        if (!seen.has(`${sub.name.toLowerCase()}\u0000${key}`)) ctx.addIssue({ code: 'custom', path: ['measurements'], message: `a measurement of ${sub.name} at ${seat} is missing: every sub needs one at every seat` });
      }
    }
  });
export type EqDesignMeasuredRequest = z.infer<typeof eqDesignMeasuredRequestSchema>;
