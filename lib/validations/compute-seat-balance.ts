import { z } from 'zod';
import { SEAT_BALANCE_DEFAULT_LIMITS, statisticalModeCount } from '@/dsp';
import { num, uuidField } from './common';
import { refineRequestInsideRoom, ROOM_LIMITS, roomItemNameSchema } from './compute-common';
import { describedPositionShape, modalRoomSchema, seatNameSchema, subNameSchema } from './compute-room';

/**
 * Request bodies of POST /api/v1/seat-balance: the modal model (a room and positions) or stored measurements. Each
 * field's words (description, unit) sit on it as `.meta`.
 */

export const SEAT_BALANCE_LIMITS = {
  minSeats: 2,
  maxSeats: ROOM_LIMITS.maxSeats,
  maxSubs: ROOM_LIMITS.maxSubs,
  /** Candidate positions a placement search may add to the eight defaults. */
  maxCandidates: 16,
  /** Most combinations a placement search ranks; more are sampled (seeded) and the answer says so. */
  maxCombinations: 200,
  maxBandPoints: 400,
} as const;

const D = SEAT_BALANCE_DEFAULT_LIMITS;
const hz = (description: string) => num(10, ROOM_LIMITS.maxResponseHz, 'Hz').meta({ description: `${description}, 10–${ROOM_LIMITS.maxResponseHz} Hz.`, 'x-unit': 'Hz' });

const bandSchema = z
  .object({ startHz: hz('Lowest frequency'), stopHz: hz('Highest frequency, above startHz') })
  .superRefine((b, ctx) => {
    if (b.stopHz <= b.startHz) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be above startHz' });
  });

const gridSchema = z.object({
  startHz: hz('Lowest frequency'),
  stopHz: hz('Highest frequency, above startHz'),
  pointsPerOctave: num(1, 192).meta({ description: 'Points per octave, 1–192.' }),
});

const limitsSchema = z
  .object({
    maxDelayMs: num(0, 50, 'ms').default(D.maxDelayMs).meta({ description: `Longest delay tried, 0–50 ms (default ${D.maxDelayMs}); delays run 0…maxDelayMs.`, 'x-unit': 'ms' }),
    minGainDb: num(-30, 0, 'dB').default(D.minGainDb).meta({ description: `Deepest gain cut, −30–0 dB (default ${D.minGainDb}).`, 'x-unit': 'dB' }),
    maxGainDb: num(0, 12, 'dB').default(D.maxGainDb).meta({ description: `Largest gain boost, 0–12 dB (default +${D.maxGainDb}).`, 'x-unit': 'dB' }),
    allowInvert: z.boolean({ error: 'must be true or false' }).default(D.allowInvert).meta({ description: `Polarity inversion allowed (default ${D.allowInvert}).` }),
    maxOutputLossDb: num(0, 20, 'dB').default(D.maxOutputLossDb).meta({
      description: `The output floor, 0–20 dB (default ${D.maxOutputLossDb}): the seats’ mean level may fall at most this far below every sub in phase at 0 ms / 0 dB.`,
      'x-unit': 'dB',
    }),
  })
  .default({ ...SEAT_BALANCE_DEFAULT_LIMITS })
  .meta({ description: 'The box the search stays in.' });

const weightSchema = num(0, 10).optional().meta({
  description:
    'The seat’s weight, 0–10 (default 1). With unequal weights the objective at each frequency is the largest min(wa, wb)·|La − Lb| over pairs of seats (max − min when the weights are equal); weight 0 leaves a seat out.',
});
const seedSchema = num(0, 2 ** 31 - 1)
  .int('must be a whole number')
  .default(1)
  .meta({ description: 'Seed of the search’s random draws, 0–2³¹−1 (default 1): the same request and seed give the same answer.' });
const bandField = bandSchema.default({ startHz: 20, stopHz: 120 }).meta({ description: 'Band of the objective and of the level, 10–500 Hz (default 20–120 Hz).' });
const gridField = gridSchema.optional().meta({
  description: `Log-spaced frequencies (default: the band at 48 points per octave); the band must lie within it and hold at most ${SEAT_BALANCE_LIMITS.maxBandPoints} points. Modes up to 1.5 × grid.stopHz are summed, as room-response does, so the same grid gives the same numbers.`,
});

/** Shared checks: distinct names, the grid's size, the band inside the grid, a seat of weight above 0. */
function refineCommon(
  r: { seats: { name: string; weight?: number | undefined }[]; subs: { name: string }[]; band: { startHz: number; stopHz: number }; grid?: { startHz: number; stopHz: number; pointsPerOctave: number } | undefined },
  ctx: z.RefinementCtx,
): void {
  const dup = (list: { name: string }[], key: string) => {
    const seen = new Set<string>();
    list.forEach((item, i) => {
      const name = item.name.toLowerCase();
      if (seen.has(name)) ctx.addIssue({ code: 'custom', path: [key, i, 'name'], message: `"${item.name}" is named twice; names must differ` });
      seen.add(name);
    });
  };
  dup(r.seats, 'seats');
  dup(r.subs, 'subs');
  if (r.seats.every((s) => (s.weight ?? 1) === 0)) ctx.addIssue({ code: 'custom', path: ['seats'], message: 'at least one seat needs a weight above 0' });
  const g = r.grid;
  if (!g) return;
  if (g.stopHz <= g.startHz) ctx.addIssue({ code: 'custom', path: ['grid', 'stopHz'], message: 'must be above startHz' });
  if (r.band.startHz < g.startHz || r.band.stopHz > g.stopHz) ctx.addIssue({ code: 'custom', path: ['band'], message: `must lie within the grid (${g.startHz}–${g.stopHz} Hz)` });
  const points = Math.floor(Math.log2(Math.max(r.band.stopHz / r.band.startHz, 1)) * g.pointsPerOctave) + 1;
  if (points > SEAT_BALANCE_LIMITS.maxBandPoints) ctx.addIssue({ code: 'custom', path: ['grid', 'pointsPerOctave'], message: `the band would hold about ${points} points; at most ${SEAT_BALANCE_LIMITS.maxBandPoints}` });
}

const seatsSchema = <T extends z.ZodRawShape>(shape: T, description: string) =>
  z
    .array(z.object({ name: seatNameSchema, weight: weightSchema, ...shape }))
    .min(SEAT_BALANCE_LIMITS.minSeats, 'at least two seats are needed: the spread is between seats')
    .max(SEAT_BALANCE_LIMITS.maxSeats, `at most ${SEAT_BALANCE_LIMITS.maxSeats} seats`)
    .meta({ description });

const candidateSchema = z.object({ name: roomItemNameSchema.meta({ description: 'The position’s name, 1–60 characters.' }), ...describedPositionShape });

/** The modal-model request: a room, seats and subs with positions, and optionally a placement search. */
export const seatBalanceModelRequestSchema = z
  .object({
    room: modalRoomSchema,
    seats: seatsSchema(describedPositionShape, `Listening positions, ${SEAT_BALANCE_LIMITS.minSeats}–${SEAT_BALANCE_LIMITS.maxSeats}, inside the room; names differ.`),
    subs: z
      .array(z.object({ name: subNameSchema, ...describedPositionShape }))
      .min(1, 'at least one sub is needed')
      .max(SEAT_BALANCE_LIMITS.maxSubs, `at most ${SEAT_BALANCE_LIMITS.maxSubs} subs`)
      .meta({ description: `Where the subs stand, 1–${SEAT_BALANCE_LIMITS.maxSubs}, inside the room; names differ.` }),
    band: bandField,
    /** The frequency grid (default: the band at 48 points per octave); the same grid as room-response's gives the same numbers. */
    grid: gridField,
    limits: limitsSchema,
    placement: z
      .object({
        candidates: z
          .array(candidateSchema)
          .max(SEAT_BALANCE_LIMITS.maxCandidates, `at most ${SEAT_BALANCE_LIMITS.maxCandidates} added candidates`)
          .default([])
          .meta({ description: `Positions of your own to add, at most ${SEAT_BALANCE_LIMITS.maxCandidates}, inside the room.` }),
        /** Include the room's four floor corners and four wall midpoints (default true). */
        defaults: z
          .boolean({ error: 'must be true or false' })
          .default(true)
          .meta({ description: 'Include the room’s four floor corners and four wall midpoints, 0.25 m from the walls and 0.25 m up (default true).' }),
        count: num(1, SEAT_BALANCE_LIMITS.maxSubs).int('must be a whole number').meta({ description: `How many subs to place, 1–${SEAT_BALANCE_LIMITS.maxSubs}, at most the number of candidates.` }),
        maxCombinations: num(1, SEAT_BALANCE_LIMITS.maxCombinations)
          .int('must be a whole number')
          .default(SEAT_BALANCE_LIMITS.maxCombinations)
          .meta({ description: `Most combinations ranked, 1–${SEAT_BALANCE_LIMITS.maxCombinations} (default ${SEAT_BALANCE_LIMITS.maxCombinations}); more are sampled with the seed, and the answer says so.` }),
      })
      .optional()
      .meta({ description: 'Also rank positions: every combination of `count` subs among the candidates, each with its own optimised settings, best first.' }),
    seed: seedSchema,
  })
  .superRefine((r, ctx) => {
    refineCommon(r, ctx);
    refineRequestInsideRoom(ctx, r.room, { seats: r.seats, subs: r.subs });
    const stopHz = r.grid?.stopHz ?? r.band.stopHz;
    let expected = 0;
    try {
      expected = statisticalModeCount({ ...r.room, frequencyHz: 1.5 * stopHz });
    } catch {
      expected = 0;
    }
    if (expected > ROOM_LIMITS.maxModes) ctx.addIssue({ code: 'custom', path: [r.grid ? 'grid' : 'band', 'stopHz'], message: `the modal sum would need about ${Math.round(expected)} modes; at most ${ROOM_LIMITS.maxModes} — lower stopHz` });
    const p = r.placement;
    if (!p) return;
    const total = (p.defaults ? 8 : 0) + p.candidates.length;
    if (p.count > total) ctx.addIssue({ code: 'custom', path: ['placement', 'count'], message: `must be at most the number of candidate positions (${total})` });
    p.candidates.forEach((c, i) => {
      if (c.xM > r.room.widthM) ctx.addIssue({ code: 'custom', path: ['placement', 'candidates', i, 'xM'], message: `${c.name} is beyond the room's width (${r.room.widthM} m)` });
      if (c.yM > r.room.lengthM) ctx.addIssue({ code: 'custom', path: ['placement', 'candidates', i, 'yM'], message: `${c.name} is beyond the room's length (${r.room.lengthM} m)` });
      if (c.zM > r.room.heightM) ctx.addIssue({ code: 'custom', path: ['placement', 'candidates', i, 'zM'], message: `${c.name} is above the ceiling (${r.room.heightM} m)` });
    });
  });
export type SeatBalanceModelRequest = z.infer<typeof seatBalanceModelRequestSchema>;

/** The measured request: one stored measurement (with phase) per sub per seat. */
export const seatBalanceMeasuredRequestSchema = z
  .object({
    seats: seatsSchema({}, `The seats, ${SEAT_BALANCE_LIMITS.minSeats}–${SEAT_BALANCE_LIMITS.maxSeats}, by name (as uploaded: seat = the seat’s name) and weight.`),
    subs: z
      .array(
        z.object({
          name: subNameSchema,
          /** The processor's present setting of this sub (the System's), to compare with; the files are taken without it. */
          present: z
            .object({
              delayMs: num(0, 100, 'ms').meta({ description: 'Present processor delay, 0–100 ms.', 'x-unit': 'ms' }),
              gainDb: num(-30, 30, 'dB').meta({ description: 'Present processor gain, −30–30 dB.', 'x-unit': 'dB' }),
              invert: z.boolean({ error: 'must be true or false' }).meta({ description: 'Present polarity: inverted or not.' }),
            })
            .optional()
            .meta({
              description:
                'The processor’s present settings of this sub, for every sub or for none: the answer then also holds the `present` measures and is never worse than them within the limits. The files are taken without them.',
            }),
        }),
      )
      .min(1, 'at least one sub is needed')
      .max(SEAT_BALANCE_LIMITS.maxSubs, `at most ${SEAT_BALANCE_LIMITS.maxSubs} subs`)
      .meta({ description: `The subs, 1–${SEAT_BALANCE_LIMITS.maxSubs}, by name (as uploaded: role = the sub’s name).` }),
    measurements: z
      .array(
        z.object({
          sub: roomItemNameSchema.meta({ description: 'One of the subs’ names.' }),
          seat: roomItemNameSchema.meta({ description: 'One of the seats’ names.' }),
          measurementId: uuidField('must be a measurement id').meta({ description: 'A stored measurement the caller may read, with phase.' }),
        }),
      )
      .min(1, 'at least one measurement is needed')
      .max(SEAT_BALANCE_LIMITS.maxSeats * SEAT_BALANCE_LIMITS.maxSubs)
      .meta({
        description:
          'Instead of the room: one stored measurement per sub per seat (needs a session and read access to each; 401 signed out, 404 outside the workspace). Every file must have phase measured from one timing reference for the whole set; a file without phase is refused (a minimum-phase estimate is wrong for a sum of room modes at a seat).',
      }),
    band: bandField,
    grid: gridField,
    limits: limitsSchema,
    seed: seedSchema,
  })
  .superRefine((r, ctx) => {
    refineCommon(r, ctx);
    const withPresent = r.subs.filter((s) => s.present).length;
    if (withPresent > 0 && withPresent < r.subs.length) ctx.addIssue({ code: 'custom', path: ['subs'], message: 'give `present` for every sub or for none' });
    const seen = new Set<string>();
    r.measurements.forEach((m, i) => {
      const key = `${m.sub.toLowerCase()}\u0000${m.seat.toLowerCase()}`;
      if (!r.subs.some((s) => s.name.toLowerCase() === m.sub.toLowerCase())) ctx.addIssue({ code: 'custom', path: ['measurements', i, 'sub'], message: `"${m.sub}" is not one of the subs` });
      if (!r.seats.some((s) => s.name.toLowerCase() === m.seat.toLowerCase())) ctx.addIssue({ code: 'custom', path: ['measurements', i, 'seat'], message: `"${m.seat}" is not one of the seats` });
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['measurements', i], message: `${m.sub} at ${m.seat} is given twice` });
      seen.add(key);
    });
    r.subs.forEach((sub) =>
      r.seats.forEach((seat) => {
        if (!seen.has(`${sub.name.toLowerCase()}\u0000${seat.name.toLowerCase()}`)) ctx.addIssue({ code: 'custom', path: ['measurements'], message: `a measurement of ${sub.name} at ${seat.name} is missing: every sub needs one at every seat` });
      }),
    );
  });
export type SeatBalanceMeasuredRequest = z.infer<typeof seatBalanceMeasuredRequestSchema>;

/**
 * The body of POST /api/v1/seat-balance as a whole: the handler reads a body with `measurements` as the measured
 * request and any other as the modal model (the API's description of the body; each form keeps its own error paths).
 */
export const seatBalanceRequestSchema = z
  .union([seatBalanceModelRequestSchema, seatBalanceMeasuredRequestSchema])
  .meta({ description: 'The modal model (a room, seats and subs with positions) or, with `measurements`, stored measurements of every sub at every seat.' });
