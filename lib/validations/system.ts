import { z } from 'zod';
import { documentPositions, refineInsideRoom } from '@/lib/system-model/room-bounds';
import { num, uuidField } from './common';
import { eqFilterSchema, peakingFilterSchema } from './eq-filter';
import { filterFamilySchema, refineSlopeOrder } from './slope';

/**
 * The System document (see DEVELOPERS.md, "The System document"): one room, its seats, speakers, subs, bass management and the
 * speaker profiles they use. SI units inside, unit in every field name. Coordinates in metres with
 * the origin at the front-left floor corner: x across the room (0…widthM), y into the room from the
 * front wall (0…lengthM), z up from the floor (0…heightM).
 */
export const SYSTEM_SCHEMA_VERSION = 1;

export const idSchema = z.string().regex(/^[A-Za-z0-9_-]{1,40}$/, 'id must be 1–40 letters, digits, - or _');

/** A crossover slope: Butterworth orders 1–8, Linkwitz–Riley 2, 4 or 8. */
export const slopeSchema = z
  .object({ family: filterFamilySchema, order: z.number().int('order must be a whole number').min(1).max(8) })
  .superRefine((s, ctx) => refineSlopeOrder(s, ctx));

/** A speaker's natural low-frequency roll-off (Small 1972; Thiele 1971). */
export const lowRolloffSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('none') }),
  z.object({ kind: z.literal('sealed'), cornerHz: num(5, 500, '', 'cornerHz'), q: num(0.3, 3, '', 'q') }),
  z.object({ kind: z.literal('vented'), cornerHz: num(5, 500, '', 'cornerHz') }),
]);

/** A subwoofer's natural upper roll-off (second order), or none. */
export const highRolloffSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('none') }),
  z.object({ kind: z.literal('lowpass'), cornerHz: num(30, 2000, '', 'cornerHz'), q: num(0.3, 3, '', 'q') }),
]);

/** One position of a voicing switch (e.g. "−2 dB", "0", "+2 dB"): the filters the speaker runs in that position (none = flat). */
export const voicingPositionSchema = z.object({
  id: idSchema,
  name: z.string().trim().min(1, 'name is required').max(40),
  filters: z.array(eqFilterSchema).max(4),
});

/**
 * A switch on the speaker's back panel (a treble shelf, a "near a wall" low shelf…) with its positions; the first
 * position is the one a speaker has until someone picks another.
 */
export const voicingOptionSchema = z
  .object({
    id: idSchema,
    name: z.string().trim().min(1, 'name is required').max(60),
    positions: z.array(voicingPositionSchema).min(2, 'a switch needs at least two positions').max(6),
  })
  .superRefine((o, ctx) => {
    const seen = new Set<string>();
    o.positions.forEach((p, i) => {
      if (seen.has(p.id)) ctx.addIssue({ code: 'custom', path: ['positions', i, 'id'], message: `duplicate id "${p.id}"` });
      seen.add(p.id);
    });
  });

/** The position chosen for each of a profile's voicing switches, by switch id; a switch not listed is in its first position. */
export const voicingChoiceSchema = z.record(idSchema, idSchema);

export const speakerProfileSchema = z.object({
  id: idSchema,
  /** Set when the profile was copied from a Library profile. */
  libraryId: uuidField().optional(),
  name: z.string().trim().min(1, 'name is required').max(120),
  kind: z.enum(['main', 'sub']),
  lowRolloff: lowRolloffSchema,
  highRolloff: highRolloffSchema,
  sensitivityDb: num(60, 130, '', 'sensitivityDb'),
  sensitivityReference: z.enum(['1W', '2.83V']),
  ratedPowerW: num(1, 20000, '', 'ratedPowerW'),
  impedanceOhm: num(1, 64, '', 'impedanceOhm'),
  notes: z.string().max(2000).default(''),
  /** The back-panel switches the speaker offers (Voicing options). */
  voicingOptions: z
    .array(voicingOptionSchema)
    .max(4)
    .superRefine((options, ctx) => {
      const seen = new Set<string>();
      options.forEach((o, i) => {
        if (seen.has(o.id)) ctx.addIssue({ code: 'custom', path: [i, 'id'], message: `duplicate id "${o.id}"` });
        seen.add(o.id);
      });
    })
    .default([]),
});

const point = {
  xM: num(0, 100, '', 'xM'),
  yM: num(0, 100, '', 'yM'),
  zM: num(0, 30, '', 'zM'),
};

export const seatSchema = z.object({ id: idSchema, name: z.string().trim().min(1).max(60), ...point });

export const aimSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('mlp') }),
  z.object({ kind: z.literal('seat'), seatId: idSchema }),
  z.object({ kind: z.literal('point'), xM: num(-100, 200, '', 'xM'), yM: num(-100, 200, '', 'yM') }),
]);

export const CHANNEL_LABELS = [
  'L', 'C', 'R', 'SL', 'SR', 'SBL', 'SBR', 'SB', 'FWL', 'FWR',
  'TFL', 'TFR', 'TML', 'TMR', 'TRL', 'TRR', 'TFC', 'TBC',
] as const;

export const speakerSchema = z.object({
  id: idSchema,
  channel: z.enum(CHANNEL_LABELS),
  ...point,
  aim: aimSchema,
  profileId: idSchema,
  /** When set, used instead of the geometric distance to the MLP (a measured distance). */
  distanceOverrideM: num(0.1, 100, '', 'distanceOverrideM').nullable(),
  trimDb: num(-30, 30, '', 'trimDb'),
  amplifierPowerW: num(1, 20000, '', 'amplifierPowerW'),
  /** The position of each of its profile's voicing switches. */
  voicing: voicingChoiceSchema.default({}),
});

export const subSchema = z.object({
  id: idSchema,
  name: z.string().trim().min(1).max(60),
  ...point,
  profileId: idSchema,
  delayMs: num(0, 100, '', 'delayMs'),
  gainDb: num(-30, 30, '', 'gainDb'),
  invert: z.boolean(),
  distanceOverrideM: num(0.1, 100, '', 'distanceOverrideM').nullable(),
  amplifierPowerW: num(1, 20000, '', 'amplifierPowerW'),
  count: z.number().int().min(1).max(8).default(1),
  /** The position of each of its profile's voicing switches. */
  voicing: voicingChoiceSchema.default({}),
  /** The processor's EQ on this sub's output (peaking filters, at most 10), e.g. from the EQ designer. */
  eq: z.array(peakingFilterSchema).max(10).default([]),
});

export const bassManagementSchema = z.object({
  crossoverHz: num(20, 300, '', 'crossoverHz'),
  mainsHighpass: slopeSchema,
  subLowpass: slopeSchema,
  lfeLowpassHz: num(40, 250, '', 'lfeLowpassHz'),
  /** +10 dB in-band is the cinema convention for LFE. */
  lfeGainDb: num(0, 15, '', 'lfeGainDb'),
  /** Delay added to the mains (only positive delays: either the sub or the mains is delayed). */
  mainsDelayMs: num(0, 100, '', 'mainsDelayMs'),
  /** The processor's sample rate, for its digital filters (Processor filters). */
  sampleRateHz: num(8000, 384000, 'Hz', 'sampleRateHz').default(48000),
});

export const roomSchema = z.object({
  lengthM: num(1.5, 60, '', 'lengthM'),
  widthM: num(1.5, 60, '', 'widthM'),
  heightM: num(1.8, 20, '', 'heightM'),
  rt60S: num(0.1, 5, '', 'rt60S'),
  temperatureC: num(-20, 50, '', 'temperatureC'),
});

export const LAYOUT_NAMES = ['2.0', '2.1', '3.1', '5.1', '7.1', '5.1.2', '5.1.4', '7.1.2', '7.1.4', '9.1.6'] as const;

/**
 * The System document as the editor may hold it while someone works on it: every rule except "inside the room", so a
 * room made smaller never throws away the seats, speakers and subs it no longer holds (the editor marks them instead).
 * Only the URL state and a browser's kept draft are read with it; everything saved or computed uses
 * `systemDocumentSchema`.
 */
export const systemDocumentDraftSchema = z
  .object({
    schemaVersion: z.literal(SYSTEM_SCHEMA_VERSION),
    layout: z.enum(LAYOUT_NAMES),
    room: roomSchema,
    seats: z.array(seatSchema).min(1, 'at least one seat is needed').max(40),
    mlpSeatId: idSchema,
    speakers: z.array(speakerSchema).max(24),
    subs: z.array(subSchema).max(8),
    bassManagement: bassManagementSchema,
    profiles: z.array(speakerProfileSchema).max(40),
    notes: z.string().max(20000),
    tags: z.array(z.string().trim().min(1).max(40)).max(20),
  })
  .superRefine((doc, ctx) => {
    const unique = (items: { id: string }[], key: string) => {
      const seen = new Set<string>();
      items.forEach((item, i) => {
        if (seen.has(item.id)) ctx.addIssue({ code: 'custom', path: [key, i, 'id'], message: `duplicate id "${item.id}"` });
        seen.add(item.id);
      });
    };
    unique(doc.seats, 'seats');
    unique(doc.speakers, 'speakers');
    unique(doc.subs, 'subs');
    unique(doc.profiles, 'profiles');
    if (!doc.seats.some((s) => s.id === doc.mlpSeatId)) {
      ctx.addIssue({ code: 'custom', path: ['mlpSeatId'], message: 'mlpSeatId must name one of the seats' });
    }
    const profiles = new Map(doc.profiles.map((p) => [p.id, p]));
    doc.speakers.forEach((s, i) => {
      if (profiles.get(s.profileId)?.kind !== 'main') ctx.addIssue({ code: 'custom', path: ['speakers', i, 'profileId'], message: 'profileId must name a main-speaker profile' });
      if (s.aim.kind === 'seat' && !doc.seats.some((seat) => seat.id === (s.aim as { seatId: string }).seatId)) {
        ctx.addIssue({ code: 'custom', path: ['speakers', i, 'aim', 'seatId'], message: 'aim seatId must name one of the seats' });
      }
    });
    doc.subs.forEach((s, i) => {
      if (profiles.get(s.profileId)?.kind !== 'sub') ctx.addIssue({ code: 'custom', path: ['subs', i, 'profileId'], message: 'profileId must name a subwoofer profile' });
    });
  });

/** The System document: the draft's rules, and every seat, speaker and sub inside the room. */
export const systemDocumentSchema = systemDocumentDraftSchema.superRefine((doc, ctx) => refineInsideRoom(ctx, doc.room, documentPositions(doc)));

export type SystemDocument = z.infer<typeof systemDocumentSchema>;
export type SpeakerProfile = z.infer<typeof speakerProfileSchema>;
export type Seat = z.infer<typeof seatSchema>;
export type Speaker = z.infer<typeof speakerSchema>;
export type Sub = z.infer<typeof subSchema>;
export type Slope = z.infer<typeof slopeSchema>;
export type LayoutName = (typeof LAYOUT_NAMES)[number];

export const systemNameSchema = z.string().trim().min(1, 'name is required').max(200, 'name must be at most 200 characters');
