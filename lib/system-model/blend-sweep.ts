/**
 * Crossover sweep glue for the editor: the request for the System (with another main or sub profile tried in, if
 * the user picks one) and writing a chosen row back into the System — exactly the crossover, slopes, delays and
 * polarities the row was assessed with.
 */
import type { CrossoverSweepAnswerRow } from '@/lib/system-model/blend-compute';
import type { CrossoverSweepRequest } from '@/lib/validations/compute-blend';
import type { SpeakerProfile, SystemDocument } from '@/lib/validations/system';
import { profileById } from './geometry';
import { applyTimingToDocument, blendMainSpeaker, systemModelFromDocument, timingSettingsOf } from './system-from-document';
import { timingRequestFromDocument } from './timing';

/** Candidates from..to (inclusive) in steps of stepHz, e.g. 40, 45, … 150. */
export function candidateRangeHz(fromHz: number, toHz: number, stepHz: number): number[] {
  const out: number[] = [];
  if (!(stepHz > 0) || toHz < fromHz) return out;
  for (let f = fromHz; f <= toHz + 1e-9 && out.length < 200; f += stepHz) out.push(Math.round(f * 100) / 100);
  return out;
}

/**
 * The System with another main profile (for every speaker sharing the shown channel's profile) and another sub
 * profile (for every sub) tried in; the profiles are copied into the document when they are not there yet.
 */
export function withProfiles(doc: SystemDocument, options: { channel?: string; mainsProfile?: SpeakerProfile; subProfile?: SpeakerProfile }): SystemDocument {
  let next = doc;
  const speaker = blendMainSpeaker(doc, options.channel);
  const addProfile = (p: SpeakerProfile | undefined) => {
    if (p && !profileById(next, p.id)) next = { ...next, profiles: [...next.profiles, structuredClone(p)] };
  };
  addProfile(options.mainsProfile);
  addProfile(options.subProfile);
  const mains = options.mainsProfile;
  if (mains && speaker && speaker.profileId !== mains.id) next = { ...next, speakers: next.speakers.map((s) => (s.profileId === speaker.profileId ? { ...s, profileId: mains.id } : s)) };
  const sub = options.subProfile;
  if (sub && next.subs.some((s) => s.profileId !== sub.id)) next = { ...next, subs: next.subs.map((s) => ({ ...s, profileId: sub.id })) };
  return next;
}

/** The sweep request for the System (profiles tried in) and the candidates and pairings chosen; null without a main speaker or a sub. */
export function sweepRequestFromDocument(
  doc: SystemDocument,
  options: { channel?: string; mainsProfile?: SpeakerProfile; subProfile?: SpeakerProfile; pairings: CrossoverSweepRequest['pairings']; candidatesHz: number[] },
): (CrossoverSweepRequest & { candidatesHz: number[] }) | null {
  const system = timingRequestFromDocument(withProfiles(doc, options), options.channel);
  if (!system) return null;
  const { stepMs: _unused, ...rest } = system;
  void _unused;
  return { ...rest, pairings: options.pairings, candidatesHz: options.candidatesHz, maxDelayMs: 20 };
}

/**
 * Writes a sweep row into the System: crossover, both slopes, and every delay and polarity the row runs (each sub and
 * the mains move by what the row moved them; the profiles tried in come along).
 */
export function applySweepRow(
  doc: SystemDocument,
  row: Pick<CrossoverSweepAnswerRow, 'crossoverHz' | 'mainsFilter' | 'subFilter' | 'set'>,
  options: { channel?: string; mainsProfile?: SpeakerProfile; subProfile?: SpeakerProfile } = {},
): SystemDocument {
  const trial = withProfiles(doc, options);
  const model = systemModelFromDocument(trial, options.channel);
  if (!model) return doc;
  const timed = applyTimingToDocument(trial, timingSettingsOf(model), { mainsDelayMs: row.set.mainsDelayMs, subs: row.set.subs });
  return {
    ...timed,
    bassManagement: {
      ...timed.bassManagement,
      crossoverHz: Math.min(300, Math.max(20, row.crossoverHz)),
      mainsHighpass: { family: row.mainsFilter.family, order: row.mainsFilter.order },
      subLowpass: { family: row.subFilter.family, order: row.subFilter.order },
    },
  };
}
