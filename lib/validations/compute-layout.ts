import { z } from 'zod';
import { LAYOUT_TEMPLATES } from '@/dsp';
import { num } from './common';
import { positionShape, refineRequestInsideRoom, ROOM_LIMITS, roomDimensionsShape, roomItemNameSchema, temperatureCSchema } from './compute-common';

/** Request body of POST /api/v1/layout (fields on the API page /docs/api). */

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
    room: z.object(roomDimensionsShape).optional(),
    listener: z.object(positionShape),
    seats: z.array(z.object({ id: z.string().min(1).max(40), name: roomItemNameSchema, ...positionShape })).max(40).default([]),
    speakers: z
      .array(
        z.object({
          channel: z.string().trim().min(1, 'is required').max(8),
          ...positionShape,
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
          name: roomItemNameSchema,
          ...positionShape,
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
      refineRequestInsideRoom(ctx, r.room, { listener: r.listener, seats: r.seats, speakers: r.speakers, subs: r.subs });
    }
  });
export type LayoutRequest = z.infer<typeof layoutRequestSchema>;
