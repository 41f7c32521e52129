/**
 * From the System document to the inputs of dsp/ and of the compute API. Pure and shared by the
 * editor (browser) and the route handlers (server), so a distance changed on Layout is the same
 * distance Timing and Blend use. No mathematics of its own beyond picking fields: geometry comes
 * from dsp/.
 */
import { speakerAngles, type PathSpec, type PointM, type RolloffSpec } from '@/dsp';
import type { Seat, Speaker, SpeakerProfile, Sub, SystemDocument } from '@/lib/validations/system';

export const toPointM = (p: { xM: number; yM: number; zM: number }): PointM => ({ x: p.xM, y: p.yM, z: p.zM });

export function mlpSeat(doc: SystemDocument): Seat {
  const seat = doc.seats.find((s) => s.id === doc.mlpSeatId) ?? doc.seats[0];
  if (!seat) throw new RangeError('the System has no seats');
  return seat;
}

export function profileById(doc: SystemDocument, id: string): SpeakerProfile | undefined {
  return doc.profiles.find((p) => p.id === id);
}

/** Distance from a speaker or sub to a seat (the MLP by default): the override when set, else geometry. */
export function distanceToSeatM(doc: SystemDocument, item: Speaker | Sub, seat: Seat = mlpSeat(doc)): number {
  if (item.distanceOverrideM != null && seat.id === doc.mlpSeatId) return item.distanceOverrideM;
  return speakerAngles({ listenerM: toPointM(seat), speakerM: toPointM(item) }).distanceM;
}

/** The main channel a blend is shown for: the requested one, else L, else the first speaker. */
export function blendMainSpeaker(doc: SystemDocument, channel?: string): Speaker | undefined {
  return doc.speakers.find((s) => s.channel === channel) ?? doc.speakers.find((s) => s.channel === 'L') ?? doc.speakers[0];
}

export function mainsRolloff(profile: SpeakerProfile | undefined): RolloffSpec {
  return profile?.lowRolloff ?? { kind: 'none' };
}

/** A sub's upper natural roll-off (the part that shapes the blend through the crossover region). */
export function subRolloff(profile: SpeakerProfile | undefined): RolloffSpec {
  return profile?.highRolloff ?? { kind: 'none' };
}

/** Both natural roll-offs of a sub, applied together on its path: [low roll-off (sealed/vented/none), upper roll-off]. */
export function subRolloffs(profile: SpeakerProfile | undefined): RolloffSpec[] {
  return [profile?.lowRolloff ?? { kind: 'none' }, subRolloff(profile)];
}

/** The mains path: high-pass at the crossover, the speaker's roll-off, trim, mains delay, distance. */
export function mainsPath(doc: SystemDocument, speaker: Speaker): PathSpec {
  const bm = doc.bassManagement;
  return {
    name: speaker.channel,
    filter: { family: bm.mainsHighpass.family, order: bm.mainsHighpass.order, response: 'highpass', cornerHz: bm.crossoverHz },
    rolloff: mainsRolloff(profileById(doc, speaker.profileId)),
    gainDb: speaker.trimDb,
    delayMs: bm.mainsDelayMs,
    invert: false,
    distanceM: distanceToSeatM(doc, speaker),
  };
}

/**
 * A sub's gainDb is its trim relative to level-matched subs: at 0 dB all the System's sub units
 * together match the mains in band, as they do after the processor's level calibration (common
 * practice). So each unit is modelled at −20·log10(total units) (coherent at low frequency), and a
 * sub of `count` units adds +20·log10(count).
 */
export function subLevelMatchDb(doc: SystemDocument, sub: Sub): number {
  const totalUnits = doc.subs.reduce((n, s) => n + s.count, 0) || 1;
  return 20 * Math.log10(sub.count) - 20 * Math.log10(totalUnits);
}

/** One path per sub: low-pass at the crossover, the sub's low and upper roll-offs, gain, delay, polarity, distance. */
export function subPath(doc: SystemDocument, sub: Sub): PathSpec {
  const bm = doc.bassManagement;
  return {
    name: sub.name,
    filter: { family: bm.subLowpass.family, order: bm.subLowpass.order, response: 'lowpass', cornerHz: bm.crossoverHz },
    rolloff: subRolloffs(profileById(doc, sub.profileId)),
    gainDb: sub.gainDb + subLevelMatchDb(doc, sub),
    delayMs: sub.delayMs,
    invert: sub.invert,
    distanceM: distanceToSeatM(doc, sub),
  };
}

export interface BlendRequestBody {
  temperatureC: number;
  grid: { startHz: number; stopHz: number; pointsPerOctave: number };
  paths: PathSpec[];
}

/** The body of POST /api/v1/blend for the System's mains channel and all its subs. */
export function blendRequestFromDocument(doc: SystemDocument, options: { channel?: string; startHz?: number; stopHz?: number; pointsPerOctave?: number } = {}): BlendRequestBody | null {
  const speaker = blendMainSpeaker(doc, options.channel);
  if (!speaker) return null;
  return {
    temperatureC: doc.room.temperatureC,
    grid: { startHz: options.startHz ?? 10, stopHz: options.stopHz ?? 1000, pointsPerOctave: options.pointsPerOctave ?? 48 },
    paths: [mainsPath(doc, speaker), ...doc.subs.map((s) => subPath(doc, s))],
  };
}
