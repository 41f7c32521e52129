/**
 * Timing: the System's request (`timingRequestFromDocument`), the compute behind POST /api/v1/timing (`computeTiming`)
 * and a piece of advice written back (`applyTimingToDocument`). The request is the whole system (the shown main
 * channel and every sub, with the processor delays of the channel settings); the mathematics — arrival times, the one
 * flatness measure, the search, the advice rules — is dsp's. Every piece of advice states the settings it runs, and is
 * made only when, run on the whole system, it is at least 0.5 dB flatter and keeps the bass (dsp ADVICE_RULES).
 */
import { arrivalTimeMs, blendResponse, groupTimingAdvice, speedOfSoundMps, subTimingAdvice, systemPaths, wrapDeg } from '@/dsp';
import type { TimingRequest } from '@/lib/validations/compute-blend';
import type { SystemDocument } from '@/lib/validations/system';
import { adviceAnswer, assessmentAnswer, FLATNESS_TEXT, type AdviceAnswer, type AssessmentAnswer } from './advice-answer';
import { roundTo } from './rounding';
import { retimeDocument, systemModelFromDocument, timingSettingsOf } from './system-from-document';
import { systemModelFromRequest, systemRequestFromModel } from './system-request';

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
  /** Mains phase minus sub phase at the crossover with the present settings, (−180, 180], filters' own phase included. */
  phaseDifferenceDeg: number;
  /** The part of it from the arrival and processor delays alone: 360·fc·(sub total − mains total). */
  delayPhaseDeg: number;
  /** The rest: the filters' and roll-offs' own phase (and polarity), wrapped. */
  filterPhaseDeg: number;
  /** This sub's delay and polarity with everything else as it is. */
  advice: AdviceAnswer & { shiftMs: number; flip: boolean };
  /** Timing window: this sub's delay settings (minus the mains') that keep the flatness within 1 dB of the advised setting's, ms. */
  timingWindowMs: [number, number];
  /** The flatness measure of the whole system against this sub's delay setting minus the mains', both polarities. */
  flatnessVersusDelay: { subMinusMainsDelayMs: number[]; normalDb: number[]; invertedDb: number[] };
}

export interface TimingAnswer {
  speedOfSoundMps: number;
  crossoverHz: number;
  /** What "flatness" means in this answer. */
  flatness: { definition: string; bandHz: [number, number] };
  /** The whole system as it is. */
  present: AssessmentAnswer;
  mains: TimingArrival;
  subs: TimingSubAnswer[];
  /** All subs together (each sub's delay and polarity and the group against the mains); null with one sub. */
  group: AdviceAnswer | null;
}

/** The body of POST /api/v1/timing for the System's main channel (L by default) and every sub: the whole-system model. */
export function timingRequestFromDocument(doc: SystemDocument, channel?: string): TimingRequest | null {
  const model = systemModelFromDocument(doc, channel);
  if (!model || model.subs.length === 0) return null;
  return { ...systemRequestFromModel(model), maxDelayMs: 20, stepMs: 0.05 };
}

const r3 = (v: number) => roundTo(v, 3);

/** The answer of POST /api/v1/timing: arrivals, the present flatness, each sub's advice and Timing window, the all-subs advice. */
export function computeTiming(req: TimingRequest): TimingAnswer {
  const { temperatureC, crossoverHz } = req;
  const model = systemModelFromRequest(req);
  const options = { maxShiftMs: req.maxDelayMs, stepMs: req.stepMs };
  const arrival = (name: string, distanceM: number, delayMs: number): TimingArrival => {
    const arrivalMs = arrivalTimeMs({ distanceM, temperatureC });
    return { name, distanceM: roundTo(distanceM, 2), arrivalMs: r3(arrivalMs), delayMs: roundTo(delayMs, 2), totalMs: r3(arrivalMs + delayMs) };
  };
  const mainsTotalMs = arrivalTimeMs({ distanceM: req.mains.distanceM, temperatureC }) + req.mains.delayMs;
  // The phase of each path at the crossover, from the same paths every evaluation sums.
  const atCrossover = blendResponse({ temperatureC, frequencyHz: [crossoverHz], paths: systemPaths(model) });
  const mainsPhase = atCrossover.paths[0]!.unwrappedPhaseDeg[0] as number;

  let present: AssessmentAnswer | null = null;
  const subs = req.subs.map((s, k): TimingSubAnswer => {
    const a = subTimingAdvice(model, k, options);
    present ??= assessmentAnswer(a.present);
    const subTotalMs = arrivalTimeMs({ distanceM: s.distanceM, temperatureC }) + s.delayMs;
    const offsetMs = s.delayMs - req.mains.delayMs;
    const phaseDifferenceDeg = wrapDeg(mainsPhase - (atCrossover.paths[k + 1]!.unwrappedPhaseDeg[0] as number));
    const delayPhaseDeg = wrapDeg((360 * crossoverHz * (subTotalMs - mainsTotalMs)) / 1000);
    const normal = s.invert ? a.curve.flippedDb : a.curve.normalDb;
    const inverted = s.invert ? a.curve.normalDb : a.curve.flippedDb;
    // The plot at 0.1 ms: every other point of the 0.05 ms scan.
    const keepPoint = (_: number, i: number) => i % 2 === 0;
    return {
      ...arrival(s.name, s.distanceM, s.delayMs),
      invert: s.invert,
      leadMs: r3(mainsTotalMs - subTotalMs),
      phaseDifferenceDeg: roundTo(phaseDifferenceDeg, 1),
      delayPhaseDeg: roundTo(delayPhaseDeg, 1),
      filterPhaseDeg: roundTo(wrapDeg(phaseDifferenceDeg - delayPhaseDeg), 1),
      advice: { ...adviceAnswer(a.keep, a.present, a.after, a.model, a.comparison, a.flattestDb), shiftMs: roundTo(a.shiftMs, 2), flip: a.flip },
      timingWindowMs: [roundTo(offsetMs + a.windowMs[0], 2), roundTo(offsetMs + a.windowMs[1], 2)],
      flatnessVersusDelay: {
        subMinusMainsDelayMs: Array.from(a.curve.shiftMs, (d) => roundTo(offsetMs + d, 2)).filter(keepPoint),
        normalDb: Array.from(normal, (v) => roundTo(v, 2)).filter(keepPoint),
        invertedDb: Array.from(inverted, (v) => roundTo(v, 2)).filter(keepPoint),
      },
    };
  });
  let group: AdviceAnswer | null = null;
  if (req.subs.length >= 2) {
    const g = groupTimingAdvice(model, options);
    group = adviceAnswer(g.keep, g.present, g.after, g.model, g.comparison, g.flattestDb);
  }
  const p = present as AssessmentAnswer | null;
  return {
    speedOfSoundMps: r3(speedOfSoundMps(temperatureC)),
    crossoverHz,
    flatness: { definition: FLATNESS_TEXT, bandHz: p ? p.bandHz : [crossoverHz / 2, crossoverHz * 2] },
    present: p!,
    mains: arrival(req.mains.name, req.mains.distanceM, req.mains.delayMs),
    subs,
    group,
  };
}

/** Writes a piece of Timing advice (a sub's or the group's) into the document: exactly the settings it states. */
export function applyTimingToDocument(doc: SystemDocument, advice: Pick<AdviceAnswer, 'set'>, channel?: string): SystemDocument {
  const model = systemModelFromDocument(doc, channel);
  if (!model) return doc;
  return retimeDocument(doc, timingSettingsOf(model), { mainsDelayMs: advice.set.mainsDelayMs, subs: advice.set.subs });
}
