import { z } from 'zod';
import { LAYOUT_TEMPLATES, statisticalModeCount } from '@/dsp';
import { refineInsideRoom } from '@/lib/system-model/room-bounds';
import { num, temperatureCSchema } from './compute-common';

/** Limits of the room compute routes (answered 400 with the field named). */
export const ROOM_LIMITS = {
  /** Highest mode frequency POST /room-modes enumerates, Hz. */
  maxModeHz: 500,
  /** Most modes one answer (or one modal sum) may hold. */
  maxModes: 5000,
  maxSeats: 16,
  maxSubs: 8,
  maxResponseHz: 500,
  maxResponsePoints: 1000,
  maxMapCells: 100,
  maxQuarterWave: 32,
  maxSpeakers: 32,
  maxHeadroomRows: 32,
} as const;

const rt60SSchema = num(0.05, 10, 's');
const roomShape = { lengthM: num(1, 100, 'm'), widthM: num(1, 100, 'm'), heightM: num(1, 30, 'm') };
const nameSchema = z.string({ error: 'must be text' }).trim().min(1, 'is required').max(60, 'must be at most 60 characters');
const point = { xM: num(0, 100, 'm'), yM: num(0, 100, 'm'), zM: num(0, 30, 'm') };

/** Expected number of modes below `frequencyHz` (Kuttruff's statistical count), or 0 for an invalid room. */
function expectedModes(room: { lengthM: number; widthM: number; heightM: number; temperatureC: number }, frequencyHz: number): number {
  try {
    return statisticalModeCount({ ...room, frequencyHz });
  } catch {
    return 0;
  }
}

/** POST /api/v1/room-modes (SPEC §6). */
export const roomModesRequestSchema = z
  .object({
    ...roomShape,
    maxHz: num(10, ROOM_LIMITS.maxModeHz, 'Hz'),
    temperatureC: temperatureCSchema,
    rt60S: rt60SSchema,
  })
  .superRefine((r, ctx) => {
    // The statistical count slightly over-estimates the enumeration, so this refuses before enumerating.
    const expected = r.maxHz <= ROOM_LIMITS.maxModeHz ? expectedModes(r, r.maxHz) : 0;
    if (expected > ROOM_LIMITS.maxModes * 1.05) {
      ctx.addIssue({
        code: 'custom',
        path: ['maxHz'],
        message: `this room has about ${Math.round(expected)} modes up to ${r.maxHz} Hz; at most ${ROOM_LIMITS.maxModes} are answered — lower maxHz`,
      });
    }
  });
export type RoomModesRequest = z.infer<typeof roomModesRequestSchema>;

const seatInput = z.object({ name: nameSchema, ...point });
const subInput = z.object({
  name: nameSchema,
  ...point,
  gainDb: num(-30, 30, 'dB').default(0),
  delayMs: num(0, 100, 'ms').default(0),
  invert: z.boolean({ error: 'must be true or false' }).default(false),
});

/** POST /api/v1/room-response: modal seat responses from the subs. */
export const roomResponseRequestSchema = z
  .object({
    room: z.object({ ...roomShape, rt60S: rt60SSchema, temperatureC: temperatureCSchema }),
    grid: z
      .object({
        startHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz'),
        stopHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz'),
        pointsPerOctave: num(1, 192),
      })
      .default({ startHz: 15, stopHz: 200, pointsPerOctave: 48 }),
    seats: z.array(seatInput).min(1, 'at least one seat is needed').max(ROOM_LIMITS.maxSeats, `at most ${ROOM_LIMITS.maxSeats} seats`),
    subs: z.array(subInput).min(1, 'at least one sub is needed').max(ROOM_LIMITS.maxSubs, `at most ${ROOM_LIMITS.maxSubs} subs`),
    /** Band over which the seat-to-seat spread is summarised (default 20–120 Hz). */
    spread: z.object({ startHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz'), stopHz: num(10, ROOM_LIMITS.maxResponseHz, 'Hz') }).default({ startHz: 20, stopHz: 120 }),
    /** One mode's pressure over the floor at ear height. */
    map: z
      .object({
        indices: z.tuple([num(0, 50).int('must be a whole number'), num(0, 50).int('must be a whole number'), num(0, 50).int('must be a whole number')]),
        zM: num(0, 30, 'm'),
        columns: num(2, ROOM_LIMITS.maxMapCells).int('must be a whole number').default(40),
        rows: num(2, ROOM_LIMITS.maxMapCells).int('must be a whole number').default(50),
      })
      .optional(),
    /** Sources whose front-wall (quarter-wave) cancellation is wanted. */
    quarterWave: z
      .array(z.object({ name: nameSchema, distanceM: num(0.01, 100, 'm') }))
      .max(ROOM_LIMITS.maxQuarterWave, `at most ${ROOM_LIMITS.maxQuarterWave} sources`)
      .default([]),
  })
  .superRefine((r, ctx) => {
    const { room, grid } = r;
    if (grid.stopHz <= grid.startHz) ctx.addIssue({ code: 'custom', path: ['grid', 'stopHz'], message: 'must be above startHz' });
    const points = Math.floor(Math.log2(Math.max(grid.stopHz / grid.startHz, 1)) * grid.pointsPerOctave) + 1;
    if (points > ROOM_LIMITS.maxResponsePoints) {
      ctx.addIssue({ code: 'custom', path: ['grid', 'pointsPerOctave'], message: `the grid would have ${points} points; at most ${ROOM_LIMITS.maxResponsePoints} are allowed` });
    }
    if (r.spread.stopHz <= r.spread.startHz) ctx.addIssue({ code: 'custom', path: ['spread', 'stopHz'], message: 'must be above startHz' });
    const expected = grid.stopHz <= ROOM_LIMITS.maxResponseHz ? expectedModes(room, 1.5 * grid.stopHz) : 0;
    if (expected > ROOM_LIMITS.maxModes) {
      ctx.addIssue({ code: 'custom', path: ['grid', 'stopHz'], message: `the modal sum would need about ${Math.round(expected)} modes; at most ${ROOM_LIMITS.maxModes} — lower stopHz` });
    }
    refineInsideRoom(ctx, room, [
      ...r.seats.map((s, i) => ({ label: s.name, position: s, path: ['seats', i] })),
      ...r.subs.map((s, i) => ({ label: s.name, position: s, path: ['subs', i] })),
    ]);
    if (r.map && r.map.zM > room.heightM) ctx.addIssue({ code: 'custom', path: ['map', 'zM'], message: `must be within the room height (${room.heightM} m)` });
    if (r.map && r.map.indices.every((n) => n === 0)) ctx.addIssue({ code: 'custom', path: ['map', 'indices'], message: '(0,0,0) is not a mode' });
  });
export type RoomResponseRequest = z.infer<typeof roomResponseRequestSchema>;

export const LAYOUT_TEMPLATE_IDS = LAYOUT_TEMPLATES.map((t) => t.id) as [string, ...string[]];

const aimInput = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('mlp') }),
  z.object({ kind: z.literal('seat'), seatId: z.string().min(1).max(40) }),
  z.object({ kind: z.literal('point'), xM: num(-100, 200, 'm'), yM: num(-100, 200, 'm') }),
], { error: "must be { kind: 'mlp' }, { kind: 'seat', seatId } or { kind: 'point', xM, yM }" });

/** POST /api/v1/layout: angles, pass/warn, toe-in, delays and trims. */
export const layoutRequestSchema = z
  .object({
    template: z.enum(LAYOUT_TEMPLATE_IDS, { error: `must be one of ${LAYOUT_TEMPLATE_IDS.join(', ')}` }),
    temperatureC: temperatureCSchema,
    /** The System's mains delay, added to every speaker's distance alignment (ms). */
    mainsDelayMs: num(0, 100, 'ms').default(0),
    room: z.object(roomShape).optional(),
    listener: z.object(point),
    seats: z.array(z.object({ id: z.string().min(1).max(40), name: nameSchema, ...point })).max(40).default([]),
    speakers: z
      .array(
        z.object({
          channel: z.string().trim().min(1, 'is required').max(8),
          ...point,
          aim: aimInput.default({ kind: 'mlp' }),
          /** Heading before toe-in, deg: 0 = square to the front wall facing into the room. */
          facingDeg: num(-180, 180, '°').optional(),
          distanceOverrideM: num(0.1, 100, 'm').nullable().optional(),
          /** The channel's level offset, added to its level match by distance (dB). */
          trimDb: num(-30, 30, 'dB').default(0),
        }),
      )
      .min(1, 'at least one speaker is needed')
      .max(ROOM_LIMITS.maxSpeakers, `at most ${ROOM_LIMITS.maxSpeakers} speakers`),
    subs: z
      .array(
        z.object({
          name: nameSchema,
          ...point,
          distanceOverrideM: num(0.1, 100, 'm').nullable().optional(),
          /** The sub's own delay, added to its distance alignment (ms). */
          delayMs: num(0, 100, 'ms').default(0),
          /** The sub's gain (dB). */
          gainDb: num(-30, 30, 'dB').default(0),
        }),
      )
      .max(ROOM_LIMITS.maxSubs, `at most ${ROOM_LIMITS.maxSubs} subs`)
      .default([]),
    /** When given, the answer also holds each template channel's nominal position at this distance. */
    radiusM: num(0.5, 50, 'm').optional(),
  })
  .superRefine((r, ctx) => {
    r.speakers.forEach((s, i) => {
      if (s.aim.kind === 'seat') {
        const seatId = s.aim.seatId;
        if (!r.seats.some((seat) => seat.id === seatId)) ctx.addIssue({ code: 'custom', path: ['speakers', i, 'aim', 'seatId'], message: 'must name one of seats' });
      }
      if (s.xM === r.listener.xM && s.yM === r.listener.yM && s.zM === r.listener.zM) {
        ctx.addIssue({ code: 'custom', path: ['speakers', i, 'xM'], message: 'the speaker cannot sit at the listening position' });
      }
    });
    if (r.room) {
      refineInsideRoom(ctx, r.room, [
        { label: 'The listening position', position: r.listener, path: ['listener'] },
        ...r.seats.map((s, i) => ({ label: s.name, position: s, path: ['seats', i] })),
        ...r.speakers.map((s, i) => ({ label: s.channel, position: s, path: ['speakers', i] })),
        ...r.subs.map((s, i) => ({ label: s.name, position: s, path: ['subs', i] })),
      ]);
    }
  });
export type LayoutRequest = z.infer<typeof layoutRequestSchema>;

const headroomRow = z.object({
  name: nameSchema,
  sensitivityDb: num(60, 130, 'dB'),
  sensitivityRef: z.enum(['1W', '2.83V'], { error: "must be '1W' or '2.83V'" }),
  impedanceOhm: num(1, 64, 'Ω'),
  powerW: num(0.1, 20000, 'W'),
  distanceM: num(0.1, 100, 'm'),
  count: num(1, 16).int('must be a whole number').default(1),
  roomGainDb: num(-20, 30, 'dB').default(0),
  /** Target peak at the MLP, dB SPL (default 105 per channel, 115 for subs). */
  targetPeakDb: num(60, 140, 'dB').optional(),
  /** The speaker's rated (continuous) power, W: the answer says when the power needed exceeds it. */
  ratedPowerW: num(1, 20000, 'W').optional(),
});

/** POST /api/v1/headroom: maximum SPL at the MLP against the target, per channel and per sub. */
export const headroomRequestSchema = z
  .object({
    channels: z.array(headroomRow).max(ROOM_LIMITS.maxHeadroomRows, `at most ${ROOM_LIMITS.maxHeadroomRows} channels`).default([]),
    subs: z.array(headroomRow).max(ROOM_LIMITS.maxSubs, `at most ${ROOM_LIMITS.maxSubs} subs`).default([]),
    /** How several subs add at the MLP: in phase (default, low frequency) or as uncorrelated power. */
    subSummation: z.enum(['coherent', 'power'], { error: "must be 'coherent' or 'power'" }).default('coherent'),
  })
  .superRefine((r, ctx) => {
    if (r.channels.length === 0 && r.subs.length === 0) ctx.addIssue({ code: 'custom', path: ['channels'], message: 'give at least one channel or sub' });
  });
export type HeadroomRequest = z.infer<typeof headroomRequestSchema>;
