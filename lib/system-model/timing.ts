/**
 * Timing: the compute behind POST /api/v1/timing, the document → request glue, and applying a
 * recommendation back to the document. The mathematics (arrival times, the delay scan, the
 * Timing window, several subs) is dsp's; here only processor bookkeeping: delays are settings
 * of "sub minus mains", and a processor takes only positive delays, so one side stays at 0.
 */
import { alignSubToMains, alignSubs, arrivalTimeMs, speedOfSoundMps, wrapDeg, type PathSpec, type RolloffChain, type RolloffSpec } from '@/dsp';
import type { TimingRequest } from '@/lib/validations/compute-blend';
import type { SystemDocument } from '@/lib/validations/system';
import { blendMainSpeaker, distanceToSeatM, mainsRolloff, profileById, subLevelMatchDb, subRolloffs } from './index';
import { roundTo } from './blend-compute';

export interface TimingArrival {
  name: string;
  distanceM: number;
  /** Air path time distanceM / c, ms. */
  arrivalMs: number;
  /** Processor delay now set, ms. */
  delayMs: number;
  /** arrivalMs + delayMs, ms. */
  totalMs: number;
}

export interface TimingSubAnswer extends TimingArrival {
  invert: boolean;
  /** How much earlier this sub's sound arrives than the mains', ms (processor delays included; negative: later). */
  leadMs: number;
  /** Mains phase minus sub phase at the crossover with the current settings, (−180, 180], filters' own phase included. */
  phaseDifferenceDeg: number;
  /** The part of it from the arrival and processor delays alone: 360·fc·(sub total − mains total). */
  delayPhaseDeg: number;
  /** The rest: the filters' and roll-offs' own phase (and polarity), wrapped. */
  filterPhaseDeg: number;
  recommendation: {
    /** Which side gets the added delay. */
    addTo: 'sub' | 'mains';
    /** Delay to add there, ms ≥ 0. */
    addDelayMs: number;
    /** The resulting settings (one of the two is 0). */
    subDelayMs: number;
    mainsDelayMs: number;
    invert: boolean;
    flipPolarity: boolean;
    phaseDifferenceAfterDeg: number;
    crossoverLevelDb: number;
    flatnessBeforeDb: number;
    flatnessDb: number;
  };
  /** Timing window: sub-minus-mains delay settings that keep the level at the crossover within 1 dB of the recommendation's, ms. */
  timingWindowMs: [number, number];
  /** Level of the blend at the crossover against the sub-minus-mains delay setting, both sub polarities. */
  levelVersusDelay: { subMinusMainsDelayMs: number[]; normalDb: number[]; invertedDb: number[] };
}

export interface TimingAnswer {
  speedOfSoundMps: number;
  crossoverHz: number;
  mains: TimingArrival;
  subs: TimingSubAnswer[];
  /** Several subs aligned to each other, then as a group to the mains (null with one sub). */
  group: null | {
    mainsDelayMs: number;
    subs: { name: string; delayMs: number; invert: boolean }[];
    flatnessBeforeDb: number;
    flatnessDb: number;
  };
}

const r3 = (v: number) => roundTo(v, 3);

/** A roll-off chain as the request schema takes it (a plain array). */
export const asChain = (r: RolloffChain): RolloffSpec | RolloffSpec[] => (Array.isArray(r) ? [...r] : (r as RolloffSpec));

export function computeTiming(req: TimingRequest): TimingAnswer {
  const { temperatureC, crossoverHz } = req;
  const c = speedOfSoundMps(temperatureC);
  const mains: PathSpec = {
    name: req.mains.name,
    filter: { ...req.mainsHighpass, response: 'highpass', cornerHz: crossoverHz },
    rolloff: req.mains.rolloff,
    gainDb: req.mains.gainDb,
    delayMs: req.mains.delayMs,
    invert: false,
    distanceM: req.mains.distanceM,
  };
  const subs: PathSpec[] = req.subs.map((s) => ({
    name: s.name,
    filter: { ...req.subLowpass, response: 'lowpass', cornerHz: crossoverHz },
    rolloff: s.rolloff,
    gainDb: s.gainDb,
    delayMs: s.delayMs,
    invert: s.invert,
    distanceM: s.distanceM,
  }));
  const arrival = (name: string, distanceM: number, delayMs: number): TimingArrival => {
    const arrivalMs = arrivalTimeMs({ distanceM, temperatureC });
    return { name, distanceM: roundTo(distanceM, 4), arrivalMs: r3(arrivalMs), delayMs: r3(delayMs), totalMs: r3(arrivalMs + delayMs) };
  };
  const mainsArrival = arrival(req.mains.name, req.mains.distanceM, req.mains.delayMs);
  const mainsTotalMs = arrivalTimeMs({ distanceM: req.mains.distanceM, temperatureC }) + req.mains.delayMs;

  const perSub = req.subs.map((s, k): TimingSubAnswer => {
    const a = alignSubToMains({ temperatureC, crossoverHz, mains, sub: subs[k] as PathSpec, maxDelayMs: req.maxDelayMs, stepMs: req.stepMs });
    const subTotalMs = arrivalTimeMs({ distanceM: s.distanceM, temperatureC }) + s.delayMs;
    const offsetMs = s.delayMs - req.mains.delayMs;
    const next = offsetMs + a.relativeDelayMs;
    const delayPhaseDeg = wrapDeg((360 * crossoverHz * (subTotalMs - mainsTotalMs)) / 1000);
    return {
      ...arrival(s.name, s.distanceM, s.delayMs),
      invert: s.invert,
      leadMs: r3(mainsTotalMs - subTotalMs),
      phaseDifferenceDeg: roundTo(a.phaseDifferenceDeg, 2),
      delayPhaseDeg: roundTo(delayPhaseDeg, 2),
      filterPhaseDeg: roundTo(wrapDeg(a.phaseDifferenceDeg - delayPhaseDeg), 2),
      recommendation: {
        addTo: next >= offsetMs ? 'sub' : 'mains',
        addDelayMs: r3(Math.abs(a.relativeDelayMs)),
        subDelayMs: r3(Math.max(0, next)),
        mainsDelayMs: r3(Math.max(0, -next)),
        invert: a.invertSub,
        flipPolarity: a.flipPolarity,
        phaseDifferenceAfterDeg: roundTo(a.phaseDifferenceAfterDeg, 2),
        crossoverLevelDb: r3(a.crossoverLevelDb),
        flatnessBeforeDb: r3(a.flatnessBeforeDb),
        flatnessDb: r3(a.flatnessDb),
      },
      timingWindowMs: [r3(offsetMs + a.windowMs[0]), r3(offsetMs + a.windowMs[1])],
      levelVersusDelay: {
        subMinusMainsDelayMs: Array.from(a.levelVersusDelay.delayMs, (d) => r3(offsetMs + d)),
        normalDb: Array.from(a.levelVersusDelay.normalDb, r3),
        invertedDb: Array.from(a.levelVersusDelay.invertedDb, r3),
      },
    };
  });

  let group: TimingAnswer['group'] = null;
  if (subs.length >= 2) {
    const g = alignSubs({ temperatureC, crossoverHz, mains, subs, maxDelayMs: req.maxDelayMs, stepMs: req.stepMs });
    const mainsDelay = req.mains.delayMs + g.mainsAddDelayMs;
    // Both sides only ever get positive delay: take out what every path has in common.
    const common = Math.min(mainsDelay, ...g.subs.map((s) => s.delayMs));
    group = {
      mainsDelayMs: r3(mainsDelay - common),
      subs: g.subs.map((s) => ({ name: s.name, delayMs: r3(s.delayMs - common), invert: s.invert })),
      flatnessBeforeDb: r3(g.flatnessBeforeDb),
      flatnessDb: r3(g.flatnessDb),
    };
  }
  return { speedOfSoundMps: r3(c), crossoverHz, mains: mainsArrival, subs: perSub, group };
}

/** The body of POST /api/v1/timing for the System's main channel (L by default) and every sub. */
export function timingRequestFromDocument(doc: SystemDocument, channel?: string): TimingRequest | null {
  const speaker = blendMainSpeaker(doc, channel);
  if (!speaker || doc.subs.length === 0) return null;
  const bm = doc.bassManagement;
  return {
    temperatureC: doc.room.temperatureC,
    crossoverHz: bm.crossoverHz,
    mainsHighpass: { family: bm.mainsHighpass.family, order: bm.mainsHighpass.order },
    subLowpass: { family: bm.subLowpass.family, order: bm.subLowpass.order },
    mains: { name: speaker.channel, distanceM: roundTo(distanceToSeatM(doc, speaker), 4), delayMs: bm.mainsDelayMs, gainDb: speaker.trimDb, rolloff: asChain(mainsRolloff(profileById(doc, speaker.profileId))) as TimingRequest['mains']['rolloff'] },
    subs: doc.subs.map((s) => {
      return {
        name: s.name,
        distanceM: roundTo(distanceToSeatM(doc, s), 4),
        delayMs: s.delayMs,
        gainDb: Math.max(-30, Math.min(30, s.gainDb + subLevelMatchDb(doc, s))),
        invert: s.invert,
        rolloff: asChain(subRolloffs(profileById(doc, s.profileId))),
      };
    }),
    maxDelayMs: 20,
    stepMs: 0.05,
  };
}

/**
 * Writes one sub's recommendation into the document. When it moves the mains delay, the other
 * subs move by the same amount so their own alignment to the mains is kept.
 */
export function applySubRecommendation(doc: SystemDocument, subIndex: number, answer: TimingSubAnswer): SystemDocument {
  const rec = answer.recommendation;
  const clamp = (v: number) => Math.min(100, Math.max(0, roundTo(v, 2)));
  const mainsShift = rec.mainsDelayMs - doc.bassManagement.mainsDelayMs;
  const subs = doc.subs.map((s, k) => (k === subIndex ? { ...s, delayMs: rec.subDelayMs, invert: rec.invert } : { ...s, delayMs: s.delayMs + mainsShift }));
  const common = Math.min(rec.mainsDelayMs, ...subs.map((s) => s.delayMs));
  return {
    ...doc,
    bassManagement: { ...doc.bassManagement, mainsDelayMs: clamp(rec.mainsDelayMs - common) },
    subs: subs.map((s) => ({ ...s, delayMs: clamp(s.delayMs - common) })),
  };
}

/** Writes the several-subs recommendation into the document (subs matched by position). */
export function applyGroupRecommendation(doc: SystemDocument, group: NonNullable<TimingAnswer['group']>): SystemDocument {
  const clamp = (v: number) => Math.min(100, Math.max(0, roundTo(v, 2)));
  return {
    ...doc,
    bassManagement: { ...doc.bassManagement, mainsDelayMs: clamp(group.mainsDelayMs) },
    subs: doc.subs.map((s, k) => {
      const g = group.subs[k];
      return g ? { ...s, delayMs: clamp(g.delayMs), invert: g.invert } : s;
    }),
  };
}
