/**
 * The System document as dsp's whole-system model, and a change of timing written back into the document (shared by
 * Timing, the Crossover sweep and Measured). Every plot, read-out, ranking and recommendation evaluates the model this
 * file builds, so they all hear the same system: the shown main channel and every sub, with the processor delays and
 * levels of the one channel-settings function.
 */
import { withoutCommonDelayMs, type RolloffSpec, type SystemModel, type SystemSource } from '@/dsp';
import type { SpeakerProfile, Speaker, Sub, SystemDocument } from '@/lib/validations/system';
import { systemChannelSettings } from './channel-settings';
import { geometricDistanceM, mlpSeat, profileById } from './geometry';
import { roundTo } from './rounding';
import { voicingFilters } from './voicing';

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

/**
 * A main channel as the model's source: the air path from its position (what the sound travels), its processor delay
 * from the channel settings (which align the distances the processor is set to), its offset trim, its roll-off and the
 * EQ of its voicing switches. When a measured distance set on the processor differs from the positions, the model
 * hears the difference.
 */
export function mainsSource(doc: SystemDocument, speaker: Speaker): SystemSource {
  const i = doc.speakers.indexOf(speaker);
  const settings = systemChannelSettings(doc).mains[i];
  const profile = profileById(doc, speaker.profileId);
  return {
    name: speaker.channel,
    distanceM: geometricDistanceM(speaker, mlpSeat(doc)),
    delayMs: settings?.delayMs ?? 0,
    gainDb: speaker.trimDb,
    invert: false,
    rolloff: mainsRolloff(profile),
    eq: voicingFilters(profile, speaker.voicing),
  };
}

/**
 * A sub as the model's source: processor delay and gain from the channel settings, level-matched, both roll-offs, and
 * its EQ: the filters of its voicing switches, then the processor's EQ on its output.
 */
export function subSource(doc: SystemDocument, sub: Sub): SystemSource {
  const k = doc.subs.indexOf(sub);
  const settings = systemChannelSettings(doc).subs[k];
  const profile = profileById(doc, sub.profileId);
  // The processor's EQ on this sub's output (defaulted to none by the schema; a hand-built document may leave it out).
  const outputEq = doc.subs[k]?.eq ?? [];
  return {
    name: sub.name,
    distanceM: geometricDistanceM(sub, mlpSeat(doc)),
    delayMs: settings?.delayMs ?? 0,
    gainDb: (settings?.gainDb ?? sub.gainDb) + subLevelMatchDb(doc, sub),
    invert: sub.invert,
    rolloff: subRolloffs(profile),
    eq: [...voicingFilters(profile, sub.voicing), ...outputEq],
  };
}

/** The whole-system model for the shown main channel (L by default) and every sub; null without a main speaker. */
export function systemModelFromDocument(doc: SystemDocument, channel?: string): SystemModel | null {
  const speaker = blendMainSpeaker(doc, channel);
  if (!speaker) return null;
  const bm = doc.bassManagement;
  return {
    temperatureC: doc.room.temperatureC,
    crossoverHz: bm.crossoverHz,
    mainsHighpass: { family: bm.mainsHighpass.family, order: bm.mainsHighpass.order },
    subLowpass: { family: bm.subLowpass.family, order: bm.subLowpass.order },
    mains: mainsSource(doc, speaker),
    subs: doc.subs.map((s) => subSource(doc, s)),
  };
}

/** The processor delays of a change, as the model states them: the main channel's and each sub's, ms. */
export interface TimingSettings {
  readonly mainsDelayMs: number;
  readonly subs: readonly { readonly delayMs: number; readonly invert: boolean }[];
}

/**
 * Writes a change of timing into the document, the one bookkeeping every Apply button uses: each source's processor
 * delay moves by (after − before) — the mains delay for the main channels, each sub's own delay for the subs — and
 * each sub takes its new polarity; then the delay all share is taken out (the smallest is 0; a common delay changes no
 * level). Delays move in whole hundredths of a millisecond, as the channel settings round them, so the applied
 * document runs exactly the settings advised. Nothing else in the document changes.
 */
export function retimeDocument(doc: SystemDocument, before: TimingSettings, after: TimingSettings): SystemDocument {
  const hundredths = (v: number) => roundTo(v, 2);
  const mainsMs = doc.bassManagement.mainsDelayMs + hundredths(after.mainsDelayMs - before.mainsDelayMs);
  const subsMs = doc.subs.map((s, k) => s.delayMs + hundredths((after.subs[k]?.delayMs ?? 0) - (before.subs[k]?.delayMs ?? 0)));
  const [mainsDelayMs, ...subDelaysMs] = withoutCommonDelayMs([mainsMs, ...subsMs]).map((v) => Math.min(100, Math.max(0, hundredths(v))));
  return {
    ...doc,
    bassManagement: { ...doc.bassManagement, mainsDelayMs: mainsDelayMs as number },
    subs: doc.subs.map((s, k) => ({ ...s, delayMs: subDelaysMs[k] as number, invert: after.subs[k]?.invert ?? s.invert })),
  };
}

/** The timing settings a model runs. */
export function timingSettingsOf(model: SystemModel): TimingSettings {
  return { mainsDelayMs: model.mains.delayMs, subs: model.subs.map((s) => ({ delayMs: s.delayMs, invert: s.invert })) };
}
