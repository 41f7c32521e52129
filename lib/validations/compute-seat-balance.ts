import { z } from 'zod';
import { SEAT_BALANCE_DEFAULT_LIMITS, statisticalModeCount } from '@/dsp';
import { num, uuidField } from './common';
import { positionShape, refineRequestInsideRoom, ROOM_LIMITS, roomDimensionsShape, roomItemNameSchema, temperatureCSchema } from './compute-common';

/** Request bodies of POST /api/v1/seat-balance: the modal model (a room and positions) or stored measurements. */

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

const bandSchema = z
  .object({ startHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz'), stopHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz') })
  .superRefine((b, ctx) => {
    if (b.stopHz <= b.startHz) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be above startHz' });
  });

const gridSchema = z.object({
  startHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz'),
  stopHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz'),
  pointsPerOctave: num(1, 192),
});

const limitsSchema = z
  .object({
    maxDelayMs: num(0, 50, 'ms').default(SEAT_BALANCE_DEFAULT_LIMITS.maxDelayMs),
    minGainDb: num(-30, 0, 'dB').default(SEAT_BALANCE_DEFAULT_LIMITS.minGainDb),
    maxGainDb: num(0, 12, 'dB').default(SEAT_BALANCE_DEFAULT_LIMITS.maxGainDb),
    allowInvert: z.boolean({ error: 'must be true or false' }).default(SEAT_BALANCE_DEFAULT_LIMITS.allowInvert),
    maxOutputLossDb: num(0, 20, 'dB').default(SEAT_BALANCE_DEFAULT_LIMITS.maxOutputLossDb),
  })
  .default({ ...SEAT_BALANCE_DEFAULT_LIMITS });

const weightSchema = num(0, 10).optional();
const seedSchema = num(0, 2 ** 31 - 1).int('must be a whole number').default(1);

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

const seatsSchema = <T extends z.ZodRawShape>(shape: T) =>
  z
    .array(z.object({ name: roomItemNameSchema, weight: weightSchema, ...shape }))
    .min(SEAT_BALANCE_LIMITS.minSeats, 'at least two seats are needed: the spread is between seats')
    .max(SEAT_BALANCE_LIMITS.maxSeats, `at most ${SEAT_BALANCE_LIMITS.maxSeats} seats`);

const candidateSchema = z.object({ name: roomItemNameSchema, ...positionShape });

/** The modal-model request: a room, seats and subs with positions, and optionally a placement search. */
export const seatBalanceModelRequestSchema = z
  .object({
    room: z.object({ ...roomDimensionsShape, rt60S: num(0.05, 10, 's'), temperatureC: temperatureCSchema }),
    seats: seatsSchema(positionShape),
    subs: z.array(z.object({ name: roomItemNameSchema, ...positionShape })).min(1, 'at least one sub is needed').max(SEAT_BALANCE_LIMITS.maxSubs, `at most ${SEAT_BALANCE_LIMITS.maxSubs} subs`),
    band: bandSchema.default({ startHz: 20, stopHz: 120 }),
    /** The frequency grid (default: the band at 48 points per octave); the same grid as room-response's gives the same numbers. */
    grid: gridSchema.optional(),
    limits: limitsSchema,
    placement: z
      .object({
        candidates: z.array(candidateSchema).max(SEAT_BALANCE_LIMITS.maxCandidates, `at most ${SEAT_BALANCE_LIMITS.maxCandidates} added candidates`).default([]),
        /** Include the room's four floor corners and four wall midpoints (default true). */
        defaults: z.boolean({ error: 'must be true or false' }).default(true),
        count: num(1, SEAT_BALANCE_LIMITS.maxSubs).int('must be a whole number'),
        maxCombinations: num(1, SEAT_BALANCE_LIMITS.maxCombinations).int('must be a whole number').default(SEAT_BALANCE_LIMITS.maxCombinations),
      })
      .optional(),
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
    seats: seatsSchema({}),
    subs: z
      .array(
        z.object({
          name: roomItemNameSchema,
          /** The processor's present setting of this sub (the System's), to compare with; the files are taken without it. */
          present: z.object({ delayMs: num(0, 100, 'ms'), gainDb: num(-30, 30, 'dB'), invert: z.boolean({ error: 'must be true or false' }) }).optional(),
        }),
      )
      .min(1, 'at least one sub is needed').max(SEAT_BALANCE_LIMITS.maxSubs, `at most ${SEAT_BALANCE_LIMITS.maxSubs} subs`),
    measurements: z
      .array(z.object({ sub: roomItemNameSchema, seat: roomItemNameSchema, measurementId: uuidField('must be a measurement id') }))
      .min(1, 'at least one measurement is needed')
      .max(SEAT_BALANCE_LIMITS.maxSeats * SEAT_BALANCE_LIMITS.maxSubs),
    band: bandSchema.default({ startHz: 20, stopHz: 120 }),
    grid: gridSchema.optional(),
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
