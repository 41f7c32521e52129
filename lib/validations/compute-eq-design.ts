import { z } from 'zod';
import { EQ_DESIGN_DEFAULTS, EQ_DESIGN_LIMITS, EQ_LIMITS, HOUSE_CURVE_DEFINITION, MAX_HOUSE_RISE_DB, SAMPLE_RATE_LIMITS_HZ, statisticalModeCount } from '@/dsp';
import { num, uuidField } from './common';
import { rolloffSchema } from './compute-blend';
import { refineRequestInsideRoom, ROOM_LIMITS, roomItemNameSchema } from './compute-common';
import { describedPositionShape, modalRoomSchema, seatNameSchema, subNameSchema } from './compute-room';
import { eqFilterSchema, peakingFilterSchema } from './eq-filter';
import { filterFamilySchema, refineSlopeOrder } from './slope';

/**
 * Request bodies of POST /api/v1/eq-design: an inline curve, the modal model of a room with its subs, or stored
 * measurements. The design options are common to all three. Each field's words (description, unit) sit on it as `.meta`.
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

const D = EQ_DESIGN_DEFAULTS;
const L = EQ_DESIGN_LIMITS;
const hz = (description: string) => num(10, ROOM_LIMITS.maxResponseHz, 'Hz').meta({ description: `${description}, 10–${ROOM_LIMITS.maxResponseHz} Hz.`, 'x-unit': 'Hz' });

const targetSchema = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('flat').meta({ description: 'A flat target.' }) }).meta({ description: 'A flat target.' }),
    z
      .object({
        kind: z.literal('house').meta({ description: 'A house curve.' }),
        riseDb: num(0, MAX_HOUSE_RISE_DB, 'dB').meta({ description: `The low-frequency rise, 0–${MAX_HOUSE_RISE_DB} dB.`, 'x-unit': 'dB' }),
        belowHz: num(20, 200, 'Hz').meta({ description: 'Where the rise is half done, 20–200 Hz.', 'x-unit': 'Hz' }),
      })
      .meta({ description: `A house curve: ${HOUSE_CURVE_DEFINITION}.` }),
  ],
  { error: "kind must be 'flat' or 'house'" },
);

const bandSchema = z
  .object({ startHz: hz('Lowest frequency'), stopHz: hz('Highest frequency, above startHz') })
  .superRefine((b, ctx) => {
    if (b.stopHz <= b.startHz) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be above startHz' });
  });

const qLimit = (description: string) => num(EQ_LIMITS.q.min, EQ_LIMITS.q.max).meta({ description: `${description}, ${EQ_LIMITS.q.min}–${EQ_LIMITS.q.max}.` });
const qSchema = z
  .object({ min: qLimit('Lowest Q'), max: qLimit('Highest Q, at least min') })
  .superRefine((q, ctx) => {
    if (q.max < q.min) ctx.addIssue({ code: 'custom', path: ['max'], message: 'must be at least min' });
  });

/** The designer's options, common to every form. */
const designShape = {
  target: targetSchema.default({ kind: 'flat' }).meta({ description: `The target: { kind: 'flat' } (default) or { kind: 'house', riseDb, belowHz }.` }),
  band: bandSchema.default({ ...D.band }).meta({ description: `Where the EQ works and the residual is measured, 10–500 Hz (default ${D.band.startHz}–${D.band.stopHz}); filter centres stay inside it.` }),
  maxFilters: num(1, L.maxFilters).int('must be a whole number').default(D.maxFilters).meta({ description: `Most filters, 1–${L.maxFilters} (default ${D.maxFilters}); fewer come back when more would not help.` }),
  maxBoostDb: num(0, L.maxBoostDb, 'dB').default(D.maxBoostDb).meta({ description: `Largest gain of any filter, 0–${L.maxBoostDb} dB (default +${D.maxBoostDb}; 0 for cuts only).`, 'x-unit': 'dB' }),
  maxCutDb: num(0, L.maxCutDb, 'dB').default(D.maxCutDb).meta({ description: `Deepest cut, 0–${L.maxCutDb} dB (default ${D.maxCutDb}, i.e. gains down to −${D.maxCutDb} dB).`, 'x-unit': 'dB' }),
  q: qSchema.default({ ...D.q }).meta({ description: `The filters’ Q range (default ${D.q.min}–${D.q.max}).` }),
  sampleRateHz: num(SAMPLE_RATE_LIMITS_HZ.min, SAMPLE_RATE_LIMITS_HZ.max, 'Hz').default(D.sampleRateHz).meta({
    description: `The processor’s sample rate, ${SAMPLE_RATE_LIMITS_HZ.min}–${SAMPLE_RATE_LIMITS_HZ.max} Hz (default ${D.sampleRateHz}): the filters are evaluated, and their sections given, as its digital biquads.`,
    'x-unit': 'Hz',
  }),
  nullDepthDb: num(L.minNullDepthDb, L.maxNullDepthDb, 'dB').default(D.nullDepthDb).meta({
    description: `How far a dip must lie below the level around it to count as a null, ${L.minNullDepthDb}–${L.maxNullDepthDb} dB (default ${D.nullDepthDb}).`,
    'x-unit': 'dB',
  }),
  /** Where the target sits (the input's units); default the median in the band. A design's levelOffsetDb checks against its target. */
  targetLevelDb: num(-500, 500, 'dB').optional().meta({
    description:
      'Where the target sits in the input’s units, −500–500 dB (default: the median of input − target shape in the band, outside the nulls). Send a design’s levelOffsetDb with the EQ applied to check it against that design’s own target: its residual before is then what the applied EQ achieves.',
    'x-unit': 'dB',
  }),
};

const gridSchema = z
  .object({ startHz: hz('Lowest frequency'), stopHz: hz('Highest frequency, above startHz'), pointsPerOctave: num(1, 192).meta({ description: 'Points per octave, 1–192.' }) })
  .meta({ description: 'The log grid (default 15–200 Hz at 48 points per octave, the Modes tab’s); the band must lie within it and hold 3–400 of its points.' });

/** The crossover low-pass the sub outputs run (a digital filter at sampleRateHz, as the processor runs it). */
const lowpassSchema = z
  .object({
    family: filterFamilySchema,
    order: num(1, 8).int('must be a whole number').meta({ description: 'Butterworth 1–8, Linkwitz–Riley 2, 4 or 8.' }),
    cornerHz: num(10, 500, 'Hz').meta({ description: 'The corner, 10–500 Hz, below the Nyquist frequency.', 'x-unit': 'Hz' }),
  })
  .superRefine((s, ctx) => refineSlopeOrder(s, ctx))
  .meta({ description: 'The crossover low-pass the sub outputs run, as the processor’s biquads at sampleRateHz. Applied to the model and to per-sub measurements; files of all subs together already hold it.' });
const followLowpassSchema = z
  .boolean({ error: 'must be true or false' })
  .default(true)
  .meta({ description: 'Add the low-pass’s level to the target, so the EQ does not fight the crossover (default true).' });

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
    frequencyHz: z
      .array(num(1, SAMPLE_RATE_LIMITS_HZ.max / 2, 'Hz'))
      .min(3, 'at least 3 points are needed')
      .max(EQ_DESIGN_REQUEST_LIMITS.maxCurvePoints, `at most ${EQ_DESIGN_REQUEST_LIMITS.maxCurvePoints} points`)
      .meta({
        description: `An inline curve’s frequencies, 3–${EQ_DESIGN_REQUEST_LIMITS.maxCurvePoints}, ascending, below the Nyquist frequency. A log grid suits the designer; any spacing works (the residual weighs each point by its share of log frequency). Q is held to what two grid steps resolve, so a coarse grid gets wider filters.`,
        'x-unit': 'Hz',
      }),
    magnitudeDb: z
      .array(num(-300, 300, 'dB'))
      .meta({ description: 'The response the EQ acts on (already through whatever the output plays: roll-offs, crossover), one value per frequency, ±300 dB.', 'x-unit': 'dB' }),
    targetShapeDb: z
      .array(num(-100, 100, 'dB'))
      .optional()
      .meta({ description: 'A shape added to the target at each frequency, ±100 dB (e.g. the crossover low-pass, so the EQ does not fight it); one value per frequency.', 'x-unit': 'dB' }),
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
    room: modalRoomSchema,
    seats: z
      .array(z.object({ name: seatNameSchema, ...describedPositionShape }))
      .min(1, 'at least one seat is needed')
      .max(EQ_DESIGN_REQUEST_LIMITS.maxSeats, `at most ${EQ_DESIGN_REQUEST_LIMITS.maxSeats} seats`)
      .meta({ description: `Listening positions, 1–${EQ_DESIGN_REQUEST_LIMITS.maxSeats}, inside the room; names differ.` }),
    /** 'average' (the power average over the seats) or one seat's name. */
    at: z
      .string({ error: 'must be "average" or a seat’s name' })
      .trim()
      .min(1, 'is required')
      .max(60)
      .default('average')
      .meta({ description: 'Where the response is taken: "average" (the power average over the seats, default) or one seat’s name, e.g. the MLP.' }),
    subs: z
      .array(
        z.object({
          name: subNameSchema,
          ...describedPositionShape,
          gainDb: num(-30, 30, 'dB').default(0).meta({ description: 'Present processor gain, −30–30 dB (default 0).', 'x-unit': 'dB' }),
          delayMs: num(0, 100, 'ms').default(0).meta({ description: 'Present processor delay (alignment and own delay), 0–100 ms (default 0).', 'x-unit': 'ms' }),
          invert: invertSchema.default(false).meta({ description: 'Present polarity: inverted or not (default false).' }),
          rolloffs: z.array(rolloffSchema).max(4, 'at most 4 roll-offs').default([]).meta({ description: 'The sub’s natural roll-offs, at most 4, as blend’s rolloff: sealed, vented, lowpass.' }),
          /** The filters of the sub's own back-panel switches (Voicing options), as analog prototypes. */
          voicing: z
            .array(eqFilterSchema)
            .max(16, 'at most 16 filters')
            .default([])
            .meta({ description: 'The filters of the sub’s own back-panel switches (its Voicing options), at most 16 peaking or shelf filters, as analog prototypes.' }),
          /** EQ the processor already runs on this output (digital, at sampleRateHz); the design comes on top of it. */
          eq: z
            .array(peakingFilterSchema.extend({ kind: z.literal('peaking', { error: "must be 'peaking': the sub outputs' EQ is peaking filters" }).meta({ description: 'A peaking filter (the only kind on the sub outputs).' }) }))
            .max(10, 'at most 10 filters')
            .default([])
            .meta({ description: 'EQ the processor already runs on this output (at most 10 peaking filters, digital at sampleRateHz); the design comes on top of it — leave it out to design from scratch.' }),
        }),
      )
      .min(1, 'at least one sub is needed')
      .max(EQ_DESIGN_REQUEST_LIMITS.maxSubs, `at most ${EQ_DESIGN_REQUEST_LIMITS.maxSubs} subs`)
      .meta({ description: `The subs, 1–${EQ_DESIGN_REQUEST_LIMITS.maxSubs}, summed at each seat with their present settings (the modal model, as room-response and seat-balance take it).` }),
    lowpass: lowpassSchema.optional(),
    followLowpass: followLowpassSchema,
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
      .array(
        z.object({
          seat: roomItemNameSchema.meta({ description: 'The seat it was measured at; several seats are power-averaged.' }),
          sub: roomItemNameSchema.optional().meta({ description: 'The sub measured alone (one of subs’ names); left out when every sub played together through the processor.' }),
          measurementId: uuidField('must be a measurement id').meta({ description: 'A stored measurement the caller may read.' }),
        }),
      )
      .min(1, 'at least one measurement is needed')
      .max(EQ_DESIGN_REQUEST_LIMITS.maxSeats * EQ_DESIGN_REQUEST_LIMITS.maxSubs)
      .meta({
        description:
          'Stored measurements (needs a session and read access to each; 401 signed out, 404 outside the workspace): either each sub alone at each seat (sub named; summed with subs’ present settings and the low-pass, which needs phase from one timing reference, except with one sub), or every sub playing together through the processor with the subs’ EQ bypassed (sub left out; magnitude is enough). The files must cover the band.',
      }),
    /** With per-sub files: every sub and its present processor settings (the files are taken without processing). */
    subs: z
      .array(
        z.object({
          name: subNameSchema,
          gainDb: num(-30, 30, 'dB').default(0).meta({ description: 'Present processor gain, −30–30 dB (default 0).', 'x-unit': 'dB' }),
          delayMs: num(0, 100, 'ms').default(0).meta({ description: 'Present processor delay, 0–100 ms (default 0).', 'x-unit': 'ms' }),
          invert: invertSchema.default(false).meta({ description: 'Present polarity: inverted or not (default false).' }),
        }),
      )
      .min(1, 'at least one sub is needed')
      .max(EQ_DESIGN_REQUEST_LIMITS.maxSubs, `at most ${EQ_DESIGN_REQUEST_LIMITS.maxSubs} subs`)
      .optional()
      .meta({ description: 'Required with per-sub files: every sub and its present processor settings (the files are taken without processing).' }),
    lowpass: lowpassSchema.optional(),
    followLowpass: followLowpassSchema,
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

/**
 * The body of POST /api/v1/eq-design as a whole: the handler reads a body with `measurements` as the measured request,
 * one with `frequencyHz` as an inline curve, any other as the modal model (each form keeps its own error paths).
 */
export const eqDesignRequestSchema = z
  .union([eqDesignCurveRequestSchema, eqDesignModelRequestSchema, eqDesignMeasuredRequestSchema])
  .meta({ description: 'An inline curve (`frequencyHz`), the modal model of a room (`room`), or stored measurements (`measurements`), with the design options common to all three.' });
