import { z } from 'zod';
import { num } from './common';
import { ROOM_LIMITS, roomItemNameSchema } from './compute-common';

/** Request body of POST /api/v1/headroom (fields on the API page /docs/api). */

const headroomRow = z.object({
  name: roomItemNameSchema,
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
