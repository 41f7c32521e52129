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
  .object({
    family: filterFamilySchema.meta({ description: 'The filter family: butterworth or linkwitz-riley (two Butterworth filters of half the order in cascade).' }),
    order: z.number().int('order must be a whole number').min(1).max(8).meta({ description: 'The order: 1–8 for Butterworth, 2, 4 or 8 for Linkwitz–Riley (6 dB per octave per order).' }),
  })
  .superRefine((s, ctx) => refineSlopeOrder(s, ctx))
  .meta({ description: 'A crossover slope: Butterworth orders 1–8, Linkwitz–Riley 2, 4 or 8.' });

/** A speaker's natural low-frequency roll-off (Small 1972; Thiele 1971). */
const rolloffQ = num(0.3, 3, '', 'q').meta({ description: 'The roll-off’s Q, 0.3–3 (0.707: a Butterworth, maximally flat alignment).' });
export const lowRolloffSchema = z
  .discriminatedUnion('kind', [
    z.object({ kind: z.literal('none').meta({ description: 'No natural roll-off (a flat model down to DC).' }) }),
    z.object({
      kind: z.literal('sealed').meta({ description: 'A sealed box: a second-order high-pass.' }),
      cornerHz: num(5, 500, '', 'cornerHz').meta({ description: 'The corner (−3 dB at Q 0.707), 5–500 Hz.', 'x-unit': 'Hz' }),
      q: rolloffQ,
    }),
    z.object({
      kind: z.literal('vented').meta({ description: 'A vented box or passive radiator: a fourth-order high-pass.' }),
      cornerHz: num(5, 500, '', 'cornerHz').meta({ description: 'The corner (the box tuning), 5–500 Hz.', 'x-unit': 'Hz' }),
    }),
  ])
  .meta({ id: 'SpeakerLowRolloff', description: 'A speaker’s natural low-frequency roll-off: none, sealed (second order at cornerHz with q) or vented (fourth order at cornerHz).' });

/** A subwoofer's natural upper roll-off (second order), or none. */
export const highRolloffSchema = z
  .discriminatedUnion('kind', [
    z.object({ kind: z.literal('none').meta({ description: 'No upper roll-off of its own.' }) }),
    z.object({
      kind: z.literal('lowpass').meta({ description: 'A second-order low-pass (the driver or an internal filter).' }),
      cornerHz: num(30, 2000, '', 'cornerHz').meta({ description: 'The corner, 30–2000 Hz.', 'x-unit': 'Hz' }),
      q: rolloffQ,
    }),
  ])
  .meta({ id: 'SpeakerHighRolloff', description: 'A subwoofer’s own upper roll-off (second order), or none.' });

/** One position of a voicing switch (e.g. "−2 dB", "0", "+2 dB"): the filters the speaker runs in that position (none = flat). */
export const voicingPositionSchema = z.object({
  id: idSchema.meta({ description: 'The position’s id, unique within its switch (1–40 letters, digits, - or _).' }),
  name: z.string().trim().min(1, 'name is required').max(40).meta({ description: 'What the panel prints at this position, e.g. "−2 dB", "0", "+2 dB" (1–40 characters).' }),
  filters: z.array(eqFilterSchema).max(4).meta({
    description: 'The filters the speaker runs in this position, at most 4 (none: flat): peaking { centerHz, gainDb, q } or low-/high-shelf { cornerHz, gainDb, q or slope } (Audio EQ Cookbook; gain ±24 dB, Q 0.1–20, shelf slope 0.1–1, default 1).',
  }),
});

/**
 * A switch on the speaker's back panel (a treble shelf, a "near a wall" low shelf…) with its positions; the first
 * position is the one a speaker has until someone picks another.
 */
export const voicingOptionSchema = z
  .object({
    id: idSchema.meta({ description: 'The switch’s id, unique within the profile (1–40 letters, digits, - or _).' }),
    name: z.string().trim().min(1, 'name is required').max(60).meta({ description: 'The switch’s name, e.g. "Treble" or "Near a wall" (1–60 characters).' }),
    positions: z.array(voicingPositionSchema).min(2, 'a switch needs at least two positions').max(6).meta({ description: '2–6 positions; the first is the one a speaker has until someone picks another.' }),
  })
  .superRefine((o, ctx) => {
    const seen = new Set<string>();
    o.positions.forEach((p, i) => {
      if (seen.has(p.id)) ctx.addIssue({ code: 'custom', path: ['positions', i, 'id'], message: `duplicate id "${p.id}"` });
      seen.add(p.id);
    });
  })
  .meta({ id: 'VoicingOption', description: 'A switch on the speaker’s back panel (a treble shelf, a "near a wall" low shelf…) with its positions.' });

/** The position chosen for each of a profile's voicing switches, by switch id; a switch not listed is in its first position. */
export const voicingChoiceSchema = z.record(idSchema, idSchema.meta({ description: 'The id of the chosen position.' }));

export const speakerProfileSchema = z.object({
  id: idSchema.meta({ description: 'The profile’s id within the document (1–40 letters, digits, - or _); speakers and subs name it in profileId.' }),
  /** Set when the profile was copied from a Library profile. */
  libraryId: uuidField().optional().meta({ description: 'The Library Speaker profile it was copied from, when it was.' }),
  name: z.string().trim().min(1, 'name is required').max(120).meta({ description: 'The profile’s name, 1–120 characters.' }),
  kind: z.enum(['main', 'sub']).meta({ description: 'main: a main speaker; sub: a subwoofer.' }),
  lowRolloff: lowRolloffSchema,
  highRolloff: highRolloffSchema,
  sensitivityDb: num(60, 130, '', 'sensitivityDb').meta({ description: 'Sensitivity, 60–130 dB SPL at 1 m with the drive sensitivityReference names.', 'x-unit': 'dB' }),
  sensitivityReference: z.enum(['1W', '2.83V']).meta({ description: 'The drive of the sensitivity figure: 1 W, or 2.83 V (1 W into 8 Ω).' }),
  ratedPowerW: num(1, 20000, '', 'ratedPowerW').meta({ description: 'Rated power handling, 1–20000 W.', 'x-unit': 'W' }),
  impedanceOhm: num(1, 64, '', 'impedanceOhm').meta({ description: 'Nominal impedance, 1–64 Ω.', 'x-unit': 'Ω' }),
  notes: z.string().max(2000).default('').meta({ description: 'Free text, up to 2000 characters.' }),
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
    .default([])
    .meta({
      description:
        'Voicing options: the switches on the speaker’s back panel (at most 4, ids unique), each with 2–6 positions. A System picks a position per speaker (speakers[].voicing, subs[].voicing); a switch not picked is in its first position. Default [].',
    }),
});

const point = {
  xM: num(0, 100, '', 'xM').meta({ description: 'Across the room from the left wall (x), 0–100 m; inside the room (0…widthM).', 'x-unit': 'm' }),
  yM: num(0, 100, '', 'yM').meta({ description: 'Into the room from the front wall (y), 0–100 m; inside the room (0…lengthM).', 'x-unit': 'm' }),
  zM: num(0, 30, '', 'zM').meta({ description: 'Up from the floor (z), 0–30 m; inside the room (0…heightM). For a seat: ear height.', 'x-unit': 'm' }),
};

export const seatSchema = z
  .object({
    id: idSchema.meta({ description: 'The seat’s id, unique among the seats (1–40 letters, digits, - or _).' }),
    name: z.string().trim().min(1).max(60).meta({ description: 'The seat’s name, e.g. "Row 1 centre" (1–60 characters).' }),
    ...point,
  })
  .meta({ description: 'A listening position (the ears).' });

export const aimSchema = z
  .discriminatedUnion('kind', [
    z.object({ kind: z.literal('mlp').meta({ description: 'Aimed at the main listening position.' }) }),
    z.object({
      kind: z.literal('seat').meta({ description: 'Aimed at one seat.' }),
      seatId: idSchema.meta({ description: 'The id of one of the seats.' }),
    }),
    z.object({
      kind: z.literal('point').meta({ description: 'Aimed at a point on the floor plan.' }),
      xM: num(-100, 200, '', 'xM').meta({ description: 'The point across the room (x), −100–200 m (it may lie outside the room).', 'x-unit': 'm' }),
      yM: num(-100, 200, '', 'yM').meta({ description: 'The point into the room (y), −100–200 m.', 'x-unit': 'm' }),
    }),
  ])
  .meta({ description: 'Where the speaker is aimed (for its toe-in): the MLP, a seat, or a point.' });

export const CHANNEL_LABELS = [
  'L', 'C', 'R', 'SL', 'SR', 'SBL', 'SBR', 'SB', 'FWL', 'FWR',
  'TFL', 'TFR', 'TML', 'TMR', 'TRL', 'TRR', 'TFC', 'TBC',
] as const;

const distanceOverrideM = num(0.1, 100, '', 'distanceOverrideM')
  .nullable()
  .meta({
    description: 'The distance set on the processor, 0.1–100 m, used instead of the distance from the positions to the MLP (e.g. a measured one); null: from the positions. The sound still travels the positions’ path, so a wrong setting shows.',
    'x-unit': 'm',
  });
const amplifierPowerW = num(1, 20000, '', 'amplifierPowerW').meta({ description: 'The amplifier power driving it, 1–20000 W (Headroom).', 'x-unit': 'W' });
const voicingChoice = voicingChoiceSchema.default({}).meta({
  description: 'The position of each of its profile’s voicing switches, { switchId: positionId }; a switch not listed is in its first position. Default {}.',
});
const profileId = (kind: string) => idSchema.meta({ description: `The id of a ${kind} profile in profiles.` });

export const speakerSchema = z
  .object({
    id: idSchema.meta({ description: 'The speaker’s id, unique among the speakers (1–40 letters, digits, - or _).' }),
    channel: z.enum(CHANNEL_LABELS).meta({ description: 'The channel label: L, C, R, SL, SR, SBL, SBR, SB, FWL, FWR, or a height channel TFL, TFR, TML, TMR, TRL, TRR, TFC, TBC.' }),
    ...point,
    aim: aimSchema,
    profileId: profileId('main-speaker'),
    /** When set, used instead of the geometric distance to the MLP (a measured distance). */
    distanceOverrideM,
    trimDb: num(-30, 30, '', 'trimDb').meta({ description: 'The channel’s trim on the processor, −30–30 dB.', 'x-unit': 'dB' }),
    amplifierPowerW,
    /** The position of each of its profile's voicing switches. */
    voicing: voicingChoice,
  })
  .meta({ description: 'A main speaker: its channel, position, aim, profile and processor settings.' });

export const subSchema = z
  .object({
    id: idSchema.meta({ description: 'The sub’s id, unique among the subs (1–40 letters, digits, - or _).' }),
    name: z.string().trim().min(1).max(60).meta({ description: 'The sub’s name, e.g. "Front left sub" (1–60 characters).' }),
    ...point,
    profileId: profileId('subwoofer'),
    delayMs: num(0, 100, '', 'delayMs').meta({ description: 'The delay the processor adds to this sub, 0–100 ms.', 'x-unit': 'ms' }),
    gainDb: num(-30, 30, '', 'gainDb').meta({ description: 'The sub’s gain on the processor, −30–30 dB.', 'x-unit': 'dB' }),
    invert: z.boolean().meta({ description: 'True: the sub’s polarity is inverted (180°).' }),
    distanceOverrideM,
    amplifierPowerW,
    count: z.number().int().min(1).max(8).default(1).meta({ description: 'Identical units stacked at this position, 1–8 (default 1): more output, the same timing.' }),
    /** The position of each of its profile's voicing switches. */
    voicing: voicingChoice,
    /** The processor's EQ on this sub's output (peaking filters, at most 10), e.g. from the EQ designer. */
    eq: z.array(peakingFilterSchema).max(10).default([]).meta({
      description: 'The processor’s EQ on this sub’s output: at most 10 peaking filters { kind: "peaking", centerHz, gainDb, q }, e.g. from the EQ designer. Default []. Boosts cost headroom: prefer cuts.',
    }),
  })
  .meta({ description: 'A subwoofer (or a stack of identical ones): position, profile and processor settings.' });

export const bassManagementSchema = z
  .object({
    crossoverHz: num(20, 300, '', 'crossoverHz').meta({ description: 'The crossover frequency, 20–300 Hz: the corner of the mains high-pass and of the sub low-pass.', 'x-unit': 'Hz' }),
    mainsHighpass: slopeSchema.meta({ description: 'The mains’ high-pass slope (the processor’s, at crossoverHz).' }),
    subLowpass: slopeSchema.meta({ description: 'The subs’ low-pass slope (the processor’s, at crossoverHz).' }),
    lfeLowpassHz: num(40, 250, '', 'lfeLowpassHz').meta({ description: 'The LFE channel’s low-pass, 40–250 Hz.', 'x-unit': 'Hz' }),
    /** +10 dB in-band is the cinema convention for LFE. */
    lfeGainDb: num(0, 15, '', 'lfeGainDb').meta({ description: 'The LFE channel’s in-band gain, 0–15 dB (+10 dB is the cinema convention).', 'x-unit': 'dB' }),
    /** Delay added to the mains (only positive delays: either the sub or the mains is delayed). */
    mainsDelayMs: num(0, 100, '', 'mainsDelayMs').meta({ description: 'Delay added to the mains, 0–100 ms (only positive delays: either the subs or the mains are delayed).', 'x-unit': 'ms' }),
    /** The processor's sample rate, for its digital filters (Processor filters). */
    sampleRateHz: num(8000, 384000, 'Hz', 'sampleRateHz').default(48000).meta({ description: 'The processor’s sample rate, 8000–384000 Hz (default 48000), for its digital filters (Processor filters).', 'x-unit': 'Hz' }),
  })
  .meta({ description: 'Bass management: the crossover, its slopes, the LFE channel and the mains delay.' });

export const roomSchema = z
  .object({
    lengthM: num(1.5, 60, '', 'lengthM').meta({ description: 'Inside length, front wall to back wall (the y axis), 1.5–60 m.', 'x-unit': 'm' }),
    widthM: num(1.5, 60, '', 'widthM').meta({ description: 'Inside width (the x axis), 1.5–60 m.', 'x-unit': 'm' }),
    heightM: num(1.8, 20, '', 'heightM').meta({ description: 'Inside height (the z axis), 1.8–20 m.', 'x-unit': 'm' }),
    rt60S: num(0.1, 5, '', 'rt60S').meta({ description: 'Reverberation time T60, 0.1–5 s (damps the modes; sets the Schroeder frequency).', 'x-unit': 's' }),
    temperatureC: num(-20, 50, '', 'temperatureC').meta({ description: 'Air temperature, −20–50 °C (the speed of sound).', 'x-unit': '°C' }),
  })
  .meta({ description: 'The room: a rectangular box, origin at the front-left floor corner.' });

export const LAYOUT_NAMES = ['2.0', '2.1', '3.1', '5.1', '7.1', '5.1.2', '5.1.4', '7.1.2', '7.1.4', '9.1.6'] as const;

/**
 * The System document as the editor may hold it while someone works on it: every rule except "inside the room", so a
 * room made smaller never throws away the seats, speakers and subs it no longer holds (the editor marks them instead).
 * Only the URL state and a browser's kept draft are read with it; everything saved or computed uses
 * `systemDocumentSchema`.
 */
export const systemDocumentDraftSchema = z
  .object({
    schemaVersion: z.literal(SYSTEM_SCHEMA_VERSION).meta({ description: 'The document’s schema version: 1.' }),
    layout: z.enum(LAYOUT_NAMES).meta({ description: 'The layout template, 2.0 up to 9.1.6 (mains.subs.heights).' }),
    room: roomSchema,
    seats: z.array(seatSchema).min(1, 'at least one seat is needed').max(40).meta({ description: 'The seats, 1–40, ids unique.' }),
    mlpSeatId: idSchema.meta({ description: 'The id of the seat that is the main listening position (MLP): distances, delays and the blend are for it.' }),
    speakers: z.array(speakerSchema).max(24).meta({ description: 'The main speakers, at most 24, ids unique; each names a main-speaker profile.' }),
    subs: z.array(subSchema).max(8).meta({ description: 'The subwoofers, at most 8, ids unique; each names a subwoofer profile.' }),
    bassManagement: bassManagementSchema,
    profiles: z.array(speakerProfileSchema).max(40).meta({ description: 'The Speaker profiles the speakers and subs use, at most 40, ids unique.' }),
    notes: z.string().max(20000).meta({ description: 'Free text, up to 20000 characters (printed on the Settings sheet).' }),
    tags: z.array(z.string().trim().min(1).max(40)).max(20).meta({ description: 'Up to 20 tags of 1–40 characters, for the Library’s filter.' }),
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
const insideRoomSchema = systemDocumentDraftSchema.superRefine((doc, ctx) => refineInsideRoom(ctx, doc.room, documentPositions(doc)));
export const systemDocumentSchema = insideRoomSchema.meta({
  id: 'SystemDocument',
  description:
    'The System document (schemaVersion 1): one room, its seats, speakers, subs, bass management and the Speaker profiles they use. SI units, the unit in every field name; coordinates in metres from the front-left floor corner (x across, y into the room, z up). Besides the field rules: ids unique in each list, mlpSeatId names a seat, speakers name main-speaker profiles and subs subwoofer profiles, a seat aim names a seat, and every seat, speaker and sub lies inside the room (each refusal names its path, e.g. speakers.0.xM).',
});

export type SystemDocument = z.infer<typeof systemDocumentSchema>;
export type SpeakerProfile = z.infer<typeof speakerProfileSchema>;
export type Seat = z.infer<typeof seatSchema>;
export type Speaker = z.infer<typeof speakerSchema>;
export type Sub = z.infer<typeof subSchema>;
export type Slope = z.infer<typeof slopeSchema>;
export type LayoutName = (typeof LAYOUT_NAMES)[number];

export const systemNameSchema = z.string().trim().min(1, 'name is required').max(200, 'name must be at most 200 characters').meta({ description: 'The System’s name, 1–200 characters (trimmed), stored verbatim.' });
