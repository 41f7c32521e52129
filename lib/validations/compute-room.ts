import { z } from 'zod';
import { statisticalModeCount } from '@/dsp';
import { num } from './common';
import { positionShape, refineRequestInsideRoom, ROOM_LIMITS, roomDimensionsShape, roomItemNameSchema, temperatureCSchema } from './compute-common';

/**
 * Request bodies of POST /api/v1/room-modes and /api/v1/room-response. Each field's words (description, unit) sit on
 * it as `.meta`, for the OpenAPI document and the API page; the room and position fields are shared with layout,
 * seat-balance and eq-design.
 */

/** A room's inside dimensions, described (m). */
export const describedRoomShape = {
  lengthM: roomDimensionsShape.lengthM.meta({ description: 'Inside length, front wall to back wall (the y axis), 1–100 m.', 'x-unit': 'm' }),
  widthM: roomDimensionsShape.widthM.meta({ description: 'Inside width (the x axis), 1–100 m.', 'x-unit': 'm' }),
  heightM: roomDimensionsShape.heightM.meta({ description: 'Inside height (the z axis), 1–30 m.', 'x-unit': 'm' }),
};

/** A position in the room, described (m from the front-left floor corner). */
export const describedPositionShape = {
  xM: positionShape.xM.meta({ description: 'Across the room from the left wall (x), m from the front-left floor corner.', 'x-unit': 'm' }),
  yM: positionShape.yM.meta({ description: 'Into the room from the front wall (y).', 'x-unit': 'm' }),
  zM: positionShape.zM.meta({ description: 'Up from the floor (z).', 'x-unit': 'm' }),
};

/** The air temperature of a room compute request. */
const roomTemperatureCSchema = temperatureCSchema.meta({ description: 'Air temperature, −20–50 °C; sets the speed of sound c = 331.3·√(1 + T/273.15).', 'x-unit': '°C' });

/** The reverberation time of a room compute request. */
const rt60SSchema = num(0.05, 10, 's').meta({ description: 'Reverberation time T60, 0.05–10 s: damps the modes and sets the Schroeder frequency 2000·√(T60/V).', 'x-unit': 's' });

/** The room of the modal routes (room-response, seat-balance, eq-design). */
export const modalRoomSchema = z
  .object({ ...describedRoomShape, rt60S: rt60SSchema, temperatureC: roomTemperatureCSchema })
  .meta({ description: 'The room, a rigid rectangular box, for the modal model.' });

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
    ...describedRoomShape,
    maxHz: num(10, ROOM_LIMITS.maxModeHz, 'Hz').meta({
      description: `Highest mode listed, 10–${ROOM_LIMITS.maxModeHz} Hz. A room and maxHz that would give more than ${ROOM_LIMITS.maxModes} modes are refused (400 naming maxHz).`,
      'x-unit': 'Hz',
    }),
    temperatureC: roomTemperatureCSchema,
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

/** A seat or sub's name, described. */
export const seatNameSchema = roomItemNameSchema.meta({ description: 'The seat’s name, 1–60 characters, as the answer gives it back.' });
export const subNameSchema = roomItemNameSchema.meta({ description: 'The sub’s name, 1–60 characters, as the answer gives it back.' });

const seatInput = z.object({ name: seatNameSchema, ...describedPositionShape }).meta({ description: 'A listening position (ear height), inside the room.' });
const subInput = z.object({
  name: subNameSchema,
  ...describedPositionShape,
  gainDb: num(-30, 30, 'dB').default(0).meta({ description: 'The sub’s processor gain, −30–30 dB (default 0).', 'x-unit': 'dB' }),
  delayMs: num(0, 100, 'ms').default(0).meta({ description: 'The sub’s processor delay, 0–100 ms (default 0).', 'x-unit': 'ms' }),
  invert: z.boolean({ error: 'must be true or false' }).default(false).meta({ description: 'Polarity inverted (default false).' }),
}).meta({ description: 'A sub, where it stands (inside the room) and its processor settings.' });

const bandEdge = (edge: string) => num(10, ROOM_LIMITS.maxResponseHz, 'Hz').meta({ description: `${edge}, 10–${ROOM_LIMITS.maxResponseHz} Hz.`, 'x-unit': 'Hz' });

/** POST /api/v1/room-response: modal seat responses from the subs. */
export const roomResponseRequestSchema = z
  .object({
    room: modalRoomSchema,
    grid: z
      .object({
        startHz: bandEdge('Lowest frequency'),
        stopHz: bandEdge('Highest frequency, above startHz'),
        pointsPerOctave: num(1, 192).meta({ description: 'Points per octave, 1–192.' }),
      })
      .default({ startHz: 15, stopHz: 200, pointsPerOctave: 48 })
      .meta({
        description: `Log-spaced frequencies, 10–${ROOM_LIMITS.maxResponseHz} Hz, at most ${ROOM_LIMITS.maxResponsePoints} points (default 15–200 Hz, 48 per octave). Modes up to 1.5 × stopHz are summed, at most ${ROOM_LIMITS.maxModes} (else 400 naming grid.stopHz).`,
      }),
    seats: z
      .array(seatInput)
      .min(1, 'at least one seat is needed')
      .max(ROOM_LIMITS.maxSeats, `at most ${ROOM_LIMITS.maxSeats} seats`)
      .meta({ description: `Listening positions, 1–${ROOM_LIMITS.maxSeats}, inside the room (else 400 naming the coordinate, e.g. seats.0.xM).` }),
    subs: z
      .array(subInput)
      .min(1, 'at least one sub is needed')
      .max(ROOM_LIMITS.maxSubs, `at most ${ROOM_LIMITS.maxSubs} subs`)
      .meta({ description: `The subs, 1–${ROOM_LIMITS.maxSubs}, each with its processor gain, delay and polarity.` }),
    /** Band over which the seat-to-seat spread is summarised (default 20–120 Hz). */
    spread: z
      .object({ startHz: bandEdge('Lowest frequency'), stopHz: bandEdge('Highest frequency, above startHz') })
      .default({ startHz: 20, stopHz: 120 })
      .meta({ description: 'Band summarising the seat-to-seat spread and setting the 0 dB reference (default 20–120 Hz).' }),
    /** One mode's pressure over the floor at ear height. */
    map: z
      .object({
        indices: z
          .tuple([num(0, 50).int('must be a whole number'), num(0, 50).int('must be a whole number'), num(0, 50).int('must be a whole number')])
          .meta({ description: 'The mode [nL, nW, nH]: half-waves along the length, width and height, 0–50 each; not [0, 0, 0].' }),
        zM: num(0, 30, 'm').meta({ description: 'Height of the map above the floor, within the room height.', 'x-unit': 'm' }),
        columns: num(2, ROOM_LIMITS.maxMapCells).int('must be a whole number').default(40).meta({ description: `Cells across the width, 2–${ROOM_LIMITS.maxMapCells} (default 40).` }),
        rows: num(2, ROOM_LIMITS.maxMapCells).int('must be a whole number').default(50).meta({ description: `Cells along the length, 2–${ROOM_LIMITS.maxMapCells} (default 50).` }),
      })
      .optional()
      .meta({
        description:
          'One mode’s pressure over the floor at height zM, on a columns × rows grid. Each count is moved to the nearest one (upwards first) whose cell centres fall on every node line of the mode, so a node reads 0; the answer gives the counts used.',
      }),
    /** Sources whose front-wall (quarter-wave) cancellation is wanted. */
    quarterWave: z
      .array(
        z.object({
          name: roomItemNameSchema.meta({ description: 'The source’s name, 1–60 characters.' }),
          distanceM: num(0.01, 100, 'm').meta({ description: 'Distance from the source to the wall behind it, 0.01–100 m.', 'x-unit': 'm' }),
        }),
      )
      .max(ROOM_LIMITS.maxQuarterWave, `at most ${ROOM_LIMITS.maxQuarterWave} sources`)
      .default([])
      .meta({ description: `Sources (at most ${ROOM_LIMITS.maxQuarterWave}) whose front-wall cancellation is wanted: the first notch at c / (4d).` }),
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
