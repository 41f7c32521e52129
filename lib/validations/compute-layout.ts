import { z } from 'zod';
import { LAYOUT_TEMPLATES } from '@/dsp';
import { num } from './common';
import { refineRequestInsideRoom, ROOM_LIMITS, roomItemNameSchema, temperatureCSchema } from './compute-common';
import { describedPositionShape, describedRoomShape, subNameSchema } from './compute-room';

/** Request body of POST /api/v1/layout; each field's words (description, unit) sit on it as `.meta`. */

export const LAYOUT_TEMPLATE_IDS = LAYOUT_TEMPLATES.map((t) => t.id) as [string, ...string[]];

const aimInput = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('mlp').meta({ description: 'Aim at the MLP.' }) }).meta({ description: 'Aim at the MLP (the listener).' }),
  z.object({ kind: z.literal('seat').meta({ description: 'Aim at a seat.' }), seatId: z.string().min(1).max(40).meta({ description: 'The id of one of seats.' }) }).meta({ description: 'Aim at a seat.' }),
  z
    .object({
      kind: z.literal('point').meta({ description: 'Aim at a point.' }),
      xM: num(-100, 200, 'm').meta({ description: 'The point’s x (across), −100–200 m.', 'x-unit': 'm' }),
      yM: num(-100, 200, 'm').meta({ description: 'The point’s y (into the room), −100–200 m.', 'x-unit': 'm' }),
    })
    .meta({ description: 'Aim at a point on the floor plan.' }),
], { error: "must be { kind: 'mlp' }, { kind: 'seat', seatId } or { kind: 'point', xM, yM }" });

/** POST /api/v1/layout: angles, pass/warn, toe-in, delays and trims. */
export const layoutRequestSchema = z
  .object({
    template: z.enum(LAYOUT_TEMPLATE_IDS, { error: `must be one of ${LAYOUT_TEMPLATE_IDS.join(', ')}` }).meta({
      description: 'The layout whose recommended ranges apply (ITU-R BS.775-3 for 5.1; ITU-R BS.2051-3 for larger layouts, from memory).',
    }),
    temperatureC: temperatureCSchema.meta({ description: 'Air temperature, −20–50 °C, for the delays (the speed of sound).', 'x-unit': '°C' }),
    /** The System's mains delay, added to every speaker's distance alignment (ms). */
    mainsDelayMs: num(0, 100, 'ms').default(0).meta({ description: 'The System’s mains delay, 0–100 ms (default 0): added to every speaker’s distance alignment.', 'x-unit': 'ms' }),
    room: z.object(describedRoomShape).optional().meta({ description: 'When given, every position must lie inside it (else 400 naming the coordinate) and nominal positions are kept inside the walls.' }),
    listener: z.object(describedPositionShape).meta({ description: 'The MLP (the ear position).' }),
    seats: z
      .array(
        z.object({
          id: z.string().min(1).max(40).meta({ description: 'The seat’s id, 1–40 characters, named by a speaker’s aim.' }),
          name: roomItemNameSchema.meta({ description: 'The seat’s name, 1–60 characters.' }),
          ...describedPositionShape,
        }),
      )
      .max(40)
      .default([])
      .meta({ description: 'Seats a speaker may be aimed at (at most 40).' }),
    speakers: z
      .array(
        z.object({
          channel: z.string().trim().min(1, 'is required').max(8).meta({ description: 'The channel label, 1–8 characters (L, C, R, SL, TFL…); a label not in the template is answered as unlisted.' }),
          ...describedPositionShape,
          aim: aimInput.default({ kind: 'mlp' }).meta({ description: "Where the speaker is aimed, for its toe-in: { kind: 'mlp' } (default), { kind: 'seat', seatId } or { kind: 'point', xM, yM }." }),
          /** Heading before toe-in, deg: 0 = square to the front wall facing into the room. */
          facingDeg: num(-180, 180, '°').optional().meta({ description: 'Heading before toe-in, −180–180° (0: square to the front wall, facing into the room). Default: square to the channel’s wall.', 'x-unit': '°' }),
          distanceOverrideM: num(0.1, 100, 'm').nullable().optional().meta({ description: 'A measured distance, 0.1–100 m, used instead of the geometry for the delay and trim (the distance set on the processor); null or absent: from the positions.', 'x-unit': 'm' }),
          /** The channel's level offset, added to its level match by distance (dB). */
          trimDb: num(-30, 30, 'dB').default(0).meta({ description: 'The channel’s offset, −30–30 dB (default 0), added to its level match by distance.', 'x-unit': 'dB' }),
        }),
      )
      .min(1, 'at least one speaker is needed')
      .max(ROOM_LIMITS.maxSpeakers, `at most ${ROOM_LIMITS.maxSpeakers} speakers`)
      .meta({ description: `The speakers, 1–${ROOM_LIMITS.maxSpeakers}, by channel; none may sit at the listening position.` }),
    subs: z
      .array(
        z.object({
          name: subNameSchema,
          ...describedPositionShape,
          distanceOverrideM: num(0.1, 100, 'm').nullable().optional().meta({ description: 'A measured distance, 0.1–100 m, used instead of the geometry; null or absent: from the positions.', 'x-unit': 'm' }),
          /** The sub's own delay, added to its distance alignment (ms). */
          delayMs: num(0, 100, 'ms').default(0).meta({ description: 'The sub’s own delay, 0–100 ms (default 0), added to its distance alignment.', 'x-unit': 'ms' }),
          /** The sub's gain (dB). */
          gainDb: num(-30, 30, 'dB').default(0).meta({ description: 'The sub’s gain, −30–30 dB (default 0), answered as given (rounded to 0.1 dB).', 'x-unit': 'dB' }),
        }),
      )
      .max(ROOM_LIMITS.maxSubs, `at most ${ROOM_LIMITS.maxSubs} subs`)
      .default([])
      .meta({ description: `The subs (at most ${ROOM_LIMITS.maxSubs}): their distances join the speakers’ for the distance alignment, to the farthest of all.` }),
    /** When given, the answer also holds each template channel's nominal position at this distance. */
    radiusM: num(0.5, 50, 'm').optional().meta({ description: 'When given, 0.5–50 m: the answer holds each template channel’s nominal position at this distance from the MLP.', 'x-unit': 'm' }),
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
      refineRequestInsideRoom(ctx, r.room, { listener: r.listener, seats: r.seats, speakers: r.speakers, subs: r.subs });
    }
  });
export type LayoutRequest = z.infer<typeof layoutRequestSchema>;
