import { z } from 'zod';
import { statisticalModeCount } from '@/dsp';
import { num } from './common';
import { positionShape, refineRequestInsideRoom, ROOM_LIMITS, roomDimensionsShape, roomItemNameSchema, temperatureCSchema } from './compute-common';

/** Request bodies of POST /api/v1/room-modes and /api/v1/room-response (the API page /docs/api lists their fields). */

const rt60SSchema = num(0.05, 10, 's');

/** Expected number of modes below `frequencyHz` (Kuttruff's statistical count), or 0 for an invalid room. */
function expectedModes(room: { lengthM: number; widthM: number; heightM: number; temperatureC: number }, frequencyHz: number): number {
  try {
    return statisticalModeCount({ ...room, frequencyHz });
  } catch {
    return 0;
  }
}

/** POST /api/v1/room-modes. */
export const roomModesRequestSchema = z
  .object({
    ...roomDimensionsShape,
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

const seatInput = z.object({ name: roomItemNameSchema, ...positionShape });
const subInput = z.object({
  name: roomItemNameSchema,
  ...positionShape,
  gainDb: num(-30, 30, 'dB').default(0),
  delayMs: num(0, 100, 'ms').default(0),
  invert: z.boolean({ error: 'must be true or false' }).default(false),
});

/** POST /api/v1/room-response: modal seat responses from the subs. */
export const roomResponseRequestSchema = z
  .object({
    room: z.object({ ...roomDimensionsShape, rt60S: rt60SSchema, temperatureC: temperatureCSchema }),
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
      .array(z.object({ name: roomItemNameSchema, distanceM: num(0.01, 100, 'm') }))
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
    refineRequestInsideRoom(ctx, room, { seats: r.seats, subs: r.subs });
    if (r.map && r.map.zM > room.heightM) ctx.addIssue({ code: 'custom', path: ['map', 'zM'], message: `must be within the room height (${room.heightM} m)` });
    if (r.map && r.map.indices.every((n) => n === 0)) ctx.addIssue({ code: 'custom', path: ['map', 'indices'], message: '(0,0,0) is not a mode' });
  });
export type RoomResponseRequest = z.infer<typeof roomResponseRequestSchema>;
