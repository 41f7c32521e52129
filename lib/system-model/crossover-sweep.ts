/**
 * Crossover sweep: the System's request (`crossoverSweepRequestFromDocument`, with another main or sub profile tried
 * in if the user picks one), the compute behind POST /api/v1/crossover-sweep (`computeCrossoverSweep`) and a chosen
 * row written back (`applyCrossoverSweepToDocument`) — exactly the crossover, slopes, delays and polarities the row
 * was assessed with. The ranking and the advice rules are dsp's.
 */
import { crossoverSweep, FLATNESS_DEFINITION, rankSweepRows, speedOfSoundMps, type FilterShape } from '@/dsp';
import { DEFAULT_SWEEP_CANDIDATES_HZ, type CrossoverSweepRequest } from '@/lib/validations/compute-blend';
import type { SpeakerProfile, SystemDocument } from '@/lib/validations/system';
import { assessmentAnswer, settingsAnswer, type AssessmentAnswer, type SettingsAnswer } from './advice-answer';
import { profileById } from './geometry';
import { roundTo } from './rounding';
import { blendMainSpeaker, retimeDocument, systemModelFromDocument, timingSettingsOf } from './system-from-document';
import { withMeasuredSources, type CurvePoints, type MeasuredBasis } from './measured-sources';
import { systemModelFromRequest, systemRequestFromModel } from './system-request';

export interface CrossoverSweepAnswerRow {
  rank: number;
  /** The present setting, unchanged. */
  present: boolean;
  crossoverHz: number;
  mainsFilter: FilterShape;
  subFilter: FilterShape;
  /** Every sub's delay moved by this, ms (negative: the mains get the delay instead); 0 on the present row. */
  shiftMs: number;
  /** Every sub's polarity flipped. */
  flip: boolean;
  /** The processor delays and polarities this row runs. */
  set: SettingsAnswer;
  /** The flatness measure at this row's setting, dB (as assessment.flatnessDb). */
  flatnessDb: number;
  /** The whole system at this row's setting (the flatness measure, dip, −3 dB point). */
  assessment: AssessmentAnswer;
  /** Against the present setting: flatness gained, −3 dB point moved up (octaves), bass below the crossover lost (dB). */
  gainDb: number;
  extensionLossOctaves: number;
  bassCutDb: number;
  /** Keeps the −3 dB point within a third of an octave and the bass within 1 dB of the present setting. */
  keepsBass: boolean;
  /** The crossover is below the mains' own −3 dB point plus half an octave. */
  nearMainsRolloff: boolean;
  /** Worth changing to (ranked above the present row). */
  worthIt: boolean;
  /** Mains level one octave below the crossover relative to two octaves above it, dB (how much low bass the mains still carry). */
  mainsLowBassDb: number;
}

export interface CrossoverSweepAnswer {
  speedOfSoundMps: number;
  flatness: { definition: string };
  /** The mains' own −3 dB point from their roll-off, and the lowest crossover clear of it (+ half an octave), Hz. */
  mainsMinus3DbHz: number | null;
  lowestClearHz: number | null;
  candidatesHz: number[];
  rows: CrossoverSweepAnswerRow[];
  /** Null on the model; on measurements: which, their ranges, phase estimates, and the mains' in-room −3 dB point used. */
  measured: MeasuredBasis | null;
}

/** Candidates from..to (inclusive) in steps of stepHz, e.g. 40, 45, … 150. */
export function candidateRangeHz(fromHz: number, toHz: number, stepHz: number): number[] {
  const out: number[] = [];
  if (!(stepHz > 0) || toHz < fromHz) return out;
  for (let f = fromHz; f <= toHz + 1e-9 && out.length < 200; f += stepHz) out.push(roundTo(f, 2));
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

/**
 * The body of POST /api/v1/crossover-sweep for the System (profiles tried in) and the candidates and pairings chosen;
 * null without a main speaker or a sub.
 */
export function crossoverSweepRequestFromDocument(
  doc: SystemDocument,
  options: { channel?: string; mainsProfile?: SpeakerProfile; subProfile?: SpeakerProfile; pairings: CrossoverSweepRequest['pairings']; candidatesHz: number[] },
): (CrossoverSweepRequest & { candidatesHz: number[] }) | null {
  const model = systemModelFromDocument(withProfiles(doc, options), options.channel);
  if (!model || model.subs.length === 0) return null;
  return { ...systemRequestFromModel(model), maxDelayMs: 20, pairings: options.pairings, candidatesHz: options.candidatesHz };
}

/**
 * The answer of POST /api/v1/crossover-sweep: every candidate crossover × slope pairing, ranked, with its settings — on
 * the model, or on the measured curves the request's sources name (resolved by the route: `curves`); then the mains'
 * roll-off rule uses their measured in-room −3 dB point.
 */
export function computeCrossoverSweep(req: CrossoverSweepRequest, curves: { mains: CurvePoints | null; subs: readonly (CurvePoints | null)[] } = { mains: null, subs: [] }): CrossoverSweepAnswer {
  const candidatesHz = [...(req.candidatesHz ?? DEFAULT_SWEEP_CANDIDATES_HZ)];
  const { model, basis } = withMeasuredSources(systemModelFromRequest(req), curves, [{ path: 'crossoverHz', valueHz: req.crossoverHz }, ...candidatesHz.map((valueHz, k) => ({ path: `candidatesHz.${k}`, valueHz }))]);
  const r = crossoverSweep({ model, pairings: req.pairings, candidatesHz, maxShiftMs: req.maxDelayMs, ...(basis && curves.mains ? { mainsMinus3DbHz: basis.mainsMinus3DbHz } : {}) });
  return {
    speedOfSoundMps: roundTo(speedOfSoundMps(req.temperatureC), 3),
    flatness: { definition: FLATNESS_DEFINITION.text },
    mainsMinus3DbHz: r.mainsMinus3DbHz === null ? null : roundTo(r.mainsMinus3DbHz, 1),
    lowestClearHz: r.lowestClearHz === null ? null : roundTo(r.lowestClearHz, 1),
    candidatesHz,
    // Ranked again on the rounded figures the answer shows, with the same rule the editor uses to merge partial answers.
    rows: rankSweepRows(
      r.rows.map((row) => ({
        rank: row.rank,
        present: row.present,
        crossoverHz: row.crossoverHz,
        mainsFilter: { ...row.mainsFilter },
        subFilter: { ...row.subFilter },
        shiftMs: roundTo(row.shiftMs, 2),
        flip: row.flip,
        set: settingsAnswer(row.model),
        flatnessDb: roundTo(row.assessment.flatnessDb, 2),
        assessment: assessmentAnswer(row.assessment),
        gainDb: roundTo(row.comparison.flatnessGainDb, 2),
        extensionLossOctaves: roundTo(row.comparison.extensionLossOctaves, 3),
        bassCutDb: roundTo(row.comparison.bassCutDb, 2),
        keepsBass: row.comparison.keepsBass,
        nearMainsRolloff: row.nearMainsRolloff,
        worthIt: row.worthIt,
        mainsLowBassDb: roundTo(row.mainsLowBassDb, 2),
      })),
      req.crossoverHz,
    ),
    measured: basis,
  };
}

/**
 * Writes a sweep row into the System: crossover, both slopes, and every delay and polarity the row runs (each sub and
 * the mains move by what the row moved them; the profiles tried in come along). Nothing else changes.
 */
export function applyCrossoverSweepToDocument(
  doc: SystemDocument,
  row: Pick<CrossoverSweepAnswerRow, 'crossoverHz' | 'mainsFilter' | 'subFilter' | 'set'>,
  options: { channel?: string; mainsProfile?: SpeakerProfile; subProfile?: SpeakerProfile } = {},
): SystemDocument {
  const trial = withProfiles(doc, options);
  const model = systemModelFromDocument(trial, options.channel);
  if (!model) return doc;
  const timed = retimeDocument(trial, timingSettingsOf(model), { mainsDelayMs: row.set.mainsDelayMs, subs: row.set.subs });
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
