import { z } from 'zod';
import { num } from './common';
import { ROOM_LIMITS, roomItemNameSchema } from './compute-common';

/** Request body of POST /api/v1/headroom; each field's words (description, unit) sit on it as `.meta`. */

const headroomRow = z
  .object({
    name: roomItemNameSchema.meta({ description: 'The channel’s or sub’s name, 1–60 characters.' }),
    sensitivityDb: num(60, 130, 'dB').meta({ description: 'Sensitivity at 1 m, 60–130 dB SPL, for 1 W or for 2.83 V (sensitivityRef).', 'x-unit': 'dB' }),
    sensitivityRef: z.enum(['1W', '2.83V'], { error: "must be '1W' or '2.83V'" }).meta({ description: 'What the sensitivity is rated for: 1 W, or 2.83 V (1 W into 8 Ω); with impedanceOhm a 2.83 V rating is converted to 1 W.' }),
    impedanceOhm: num(1, 64, 'Ω').meta({ description: 'Nominal impedance, 1–64 Ω.', 'x-unit': 'Ω' }),
    powerW: num(0.1, 20000, 'W').meta({ description: 'Amplifier power per unit, 0.1–20 000 W.', 'x-unit': 'W' }),
    distanceM: num(0.1, 100, 'm').meta({ description: 'Distance to the MLP, 0.1–100 m.', 'x-unit': 'm' }),
    count: num(1, 16).int('must be a whole number').default(1).meta({ description: 'Identical units driven together, 1–16 (+20·log10 N), default 1.' }),
    roomGainDb: num(-20, 30, 'dB').default(0).meta({ description: 'Boundary or room gain added to free field, −20–30 dB, default 0.', 'x-unit': 'dB' }),
    /** Target peak at the MLP, dB SPL (default 105 per channel, 115 for subs). */
    targetPeakDb: num(60, 140, 'dB').optional().meta({ description: 'Own target peak at the MLP, 60–140 dB SPL, instead of 105 (a channel) or 115 (the subs together).', 'x-unit': 'dB' }),
    /** The speaker's rated (continuous) power, W: the answer says when the power needed exceeds it. */
    ratedPowerW: num(1, 20000, 'W').optional().meta({ description: 'The speaker’s rated power, 1–20 000 W: the answer says when the power needed or the amplifier exceeds it, and holds the level to it.', 'x-unit': 'W' }),
  })
  .meta({ description: 'One channel or sub: its sensitivity, impedance, amplifier power and distance.' });

/** POST /api/v1/headroom: maximum SPL at the MLP against the target, per channel and per sub. */
export const headroomRequestSchema = z
  .object({
    channels: z
      .array(headroomRow)
      .max(ROOM_LIMITS.maxHeadroomRows, `at most ${ROOM_LIMITS.maxHeadroomRows} channels`)
      .default([])
      .meta({ description: `One row per channel (at most ${ROOM_LIMITS.maxHeadroomRows}), each held to 105 dB SPL peaks unless targetPeakDb is given. Give at least one channel or sub.` }),
    subs: z
      .array(headroomRow)
      .max(ROOM_LIMITS.maxSubs, `at most ${ROOM_LIMITS.maxSubs} subs`)
      .default([])
      .meta({ description: `One row per sub (at most ${ROOM_LIMITS.maxSubs}); with N subs each is held to its share of 115 dB SPL (115 − 20·log10 N in phase, 115 − 10·log10 N as power).` }),
    /** How several subs add at the MLP: in phase (default, low frequency) or as uncorrelated power. */
    subSummation: z
      .enum(['coherent', 'power'], { error: "must be 'coherent' or 'power'" })
      .default('coherent')
      .meta({ description: 'How the subs add at the MLP: coherent (default; in phase at low frequency, +20·log10 N) or power (uncorrelated, +10·log10 N).' }),
  })
  .superRefine((r, ctx) => {
    if (r.channels.length === 0 && r.subs.length === 0) ctx.addIssue({ code: 'custom', path: ['channels'], message: 'give at least one channel or sub' });
  });
export type HeadroomRequest = z.infer<typeof headroomRequestSchema>;
