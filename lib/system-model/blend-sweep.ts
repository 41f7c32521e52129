/**
 * Crossover sweep glue for the editor: ranking rows, the request for a pairing chosen from the
 * document, and writing a chosen row back into the System. Arrival times come from dsp.
 */
import { arrivalTimeMs, type RolloffChain, type RolloffSpec } from '@/dsp';
import type { CrossoverSweepAnswerRow } from '@/lib/system-model/blend-compute';
import type { CrossoverSweepRequest } from '@/lib/validations/compute-blend';
import type { SpeakerProfile, SystemDocument } from '@/lib/validations/system';
import { blendMainSpeaker, distanceToSeatM, mainsRolloff, subRolloffs } from './index';

type Rankable = Pick<CrossoverSweepAnswerRow, 'flatnessDb' | 'deepestDipDb' | 'crossoverHz'>;

/** The sweep's ranking: flattest first, then the shallower dip, then the lower crossover. */
export function compareSweepRows(a: Rankable, b: Rankable): number {
  return a.flatnessDb - b.flatnessDb || b.deepestDipDb - a.deepestDipDb || a.crossoverHz - b.crossoverHz;
}

/** Candidates from..to (inclusive) in steps of stepHz, e.g. 40, 45, … 150. */
export function candidateRangeHz(fromHz: number, toHz: number, stepHz: number): number[] {
  const out: number[] = [];
  if (!(stepHz > 0) || toHz < fromHz) return out;
  for (let f = fromHz; f <= toHz + 1e-9 && out.length < 200; f += stepHz) out.push(Math.round(f * 100) / 100);
  return out;
}

const chain = (r: RolloffChain): RolloffSpec | RolloffSpec[] => (Array.isArray(r) ? [...r] : (r as RolloffSpec));

/**
 * The sweep request for a main profile and a sub profile in this System: the shown channel's trim
 * and distance, and the subs' combined level (in phase at low frequency: +20·log10 of the summed
 * amplitudes, REFERENCES.md "N identical sources in phase") at the first sub's distance.
 */
export function sweepRequestFromDocument(
  doc: SystemDocument,
  options: { channel?: string; mainsProfile?: SpeakerProfile; subProfile?: SpeakerProfile; pairings: CrossoverSweepRequest['pairings']; candidatesHz: number[] },
): CrossoverSweepRequest & { candidatesHz: number[] } {
  const speaker = blendMainSpeaker(doc, options.channel);
  const firstSub = doc.subs[0];
  const amplitude = doc.subs.reduce((sum, s) => sum + s.count * 10 ** (s.gainDb / 20), 0);
  return {
    temperatureC: doc.room.temperatureC,
    // The profiles' roll-offs exactly as the System's paths use them (lib/system-model).
    mainsRolloff: chain(mainsRolloff(options.mainsProfile)) as CrossoverSweepRequest['mainsRolloff'],
    subRolloff: chain(subRolloffs(options.subProfile)),
    pairings: options.pairings,
    candidatesHz: options.candidatesHz,
    mainsGainDb: speaker?.trimDb ?? 0,
    subGainDb: amplitude > 0 ? Math.max(-60, Math.min(60, Math.round(2000 * Math.log10(amplitude)) / 100)) : 0,
    mainsDistanceM: speaker ? Math.round(distanceToSeatM(doc, speaker) * 1e4) / 1e4 : 0,
    subDistanceM: firstSub ? Math.round(distanceToSeatM(doc, firstSub) * 1e4) / 1e4 : 0,
    maxDelayMs: 20,
  };
}

/**
 * Writes a sweep row into the System: crossover, both slopes, every sub's polarity, and delays so
 * that each sub lags the shown main channel by the row's relative delay at the MLP (each sub's
 * own distance counted); only positive delays, the smallest set to 0.
 */
export function applySweepRow(doc: SystemDocument, row: Pick<CrossoverSweepAnswerRow, 'crossoverHz' | 'mainsFilter' | 'subFilter' | 'relativeDelayMs' | 'invertSub'>, channel?: string): SystemDocument {
  const t = doc.room.temperatureC;
  const speaker = blendMainSpeaker(doc, channel);
  const mainsArrivalMs = speaker ? arrivalTimeMs({ distanceM: distanceToSeatM(doc, speaker), temperatureC: t }) : 0;
  // Sub k's processor delay minus the mains' = relative − (sub k arrival − mains arrival).
  const offsets = doc.subs.map((s) => row.relativeDelayMs - (arrivalTimeMs({ distanceM: distanceToSeatM(doc, s), temperatureC: t }) - mainsArrivalMs));
  const lowest = Math.min(0, ...offsets);
  const clamp = (v: number) => Math.min(100, Math.max(0, Math.round(v * 100) / 100));
  return {
    ...doc,
    bassManagement: {
      ...doc.bassManagement,
      crossoverHz: Math.min(300, Math.max(20, row.crossoverHz)),
      mainsHighpass: { family: row.mainsFilter.family, order: row.mainsFilter.order },
      subLowpass: { family: row.subFilter.family, order: row.subFilter.order },
      mainsDelayMs: clamp(-lowest),
    },
    subs: doc.subs.map((s, k) => ({ ...s, delayMs: clamp((offsets[k] as number) - lowest), invert: row.invertSub })),
  };
}
