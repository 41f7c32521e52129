import { z } from 'zod';
import { refineInsideRoom, type Position, type RoomBox } from '@/lib/system-model/room-bounds';
import { num } from './common';

/** Limits that keep the compute routes safe: answered 400 with the field named. */
export const COMPUTE_LIMITS = {
  maxPaths: 16,
  maxGridPoints: 4000,
  minHz: 10,
  maxHz: 24000,
} as const;

/** Limits of the room compute routes (room modes, room response, layout, headroom), answered 400 with the field named. */
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

export const temperatureCSchema = num(-20, 50, '°C').meta({
  description: 'Air temperature, −20…50 °C; sets the speed of sound c = 331.3·√(1 + T/273.15) m/s.',
  'x-unit': '°C',
});

export const gridSchema = z
  .object({
    startHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz').meta({ description: `First frequency (included), ${COMPUTE_LIMITS.minHz}…24 000 Hz.`, 'x-unit': 'Hz' }),
    stopHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz').meta({
      description: 'Last frequency (reached when it falls on the log grid), above startHz, at most 24 000 Hz.',
      'x-unit': 'Hz',
    }),
    pointsPerOctave: num(1, 384).meta({ description: `Log spacing, 1…384 points per octave; at most ${COMPUTE_LIMITS.maxGridPoints} points in all.` }),
  })
  .superRefine((g, ctx) => {
    if (g.stopHz <= g.startHz) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be above startHz' });
    const points = Math.floor(Math.log2(g.stopHz / g.startHz) * g.pointsPerOctave) + 1;
    if (points > COMPUTE_LIMITS.maxGridPoints) {
      ctx.addIssue({ code: 'custom', path: ['pointsPerOctave'], message: `the grid would have ${points} points; at most ${COMPUTE_LIMITS.maxGridPoints} are allowed` });
    }
  })
  .meta({ id: 'FrequencyGrid', description: 'A log-spaced frequency grid from startHz (included) towards stopHz.' });

const metres = (description: string) => ({ description, 'x-unit': 'm' });

/** A room's inside dimensions in a compute request (m), as fields to spread into its object. */
export const roomDimensionsShape = {
  lengthM: num(1, 100, 'm').meta(metres('Inside length, front wall to back wall (y), 1–100 m.')),
  widthM: num(1, 100, 'm').meta(metres('Inside width (x), 1–100 m.')),
  heightM: num(1, 30, 'm').meta(metres('Inside height (z), 1–30 m.')),
};

/** A position in a compute request (m; origin at the front-left floor corner), as fields to spread into its object. */
export const positionShape = {
  xM: num(0, 100, 'm').meta(metres('Across the room from the left wall (x), 0–100 m.')),
  yM: num(0, 100, 'm').meta(metres('Into the room from the front wall (y), 0–100 m.')),
  zM: num(0, 30, 'm').meta(metres('Up from the floor (z), 0–30 m.')),
};

/** The name of a seat, speaker, sub or headroom row in a room compute request. */
export const roomItemNameSchema = z
  .string({ error: 'must be text' })
  .trim()
  .min(1, 'is required')
  .max(60, 'must be at most 60 characters')
  .meta({ description: 'A name, 1–60 characters, given back in the answer.' });

/** What a room compute request places in the room: a listener, seats and subs by name, speakers by channel. */
interface PlacedItems {
  listener?: Position;
  seats?: readonly (Position & { name: string })[];
  speakers?: readonly (Position & { channel: string })[];
  subs?: readonly (Position & { name: string })[];
}

/**
 * The "inside the room" rule of the room compute requests: an issue at `seats.0.xM` (and so on) for every coordinate of
 * the listener, a seat, a speaker or a sub beyond a wall of `room`, in that order. The System document applies the same
 * rule to its own positions (`systemDocumentSchema`).
 */
export function refineRequestInsideRoom(ctx: z.RefinementCtx, room: RoomBox, items: PlacedItems): void {
  refineInsideRoom(ctx, room, [
    ...(items.listener ? [{ label: 'The listening position', position: items.listener, path: ['listener'] }] : []),
    ...(items.seats ?? []).map((s, i) => ({ label: s.name, position: s, path: ['seats', i] })),
    ...(items.speakers ?? []).map((s, i) => ({ label: s.channel, position: s, path: ['speakers', i] })),
    ...(items.subs ?? []).map((s, i) => ({ label: s.name, position: s, path: ['subs', i] })),
  ]);
}
