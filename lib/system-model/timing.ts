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
import { withMeasuredSources, type CurvePoints, type MeasuredBasis } from './measured-sources';
import { roundTo } from './rounding';
import { retimeDocument, systemModelFromDocument, timingSettingsOf } from './system-from-document';
import { systemModelFromRequest, systemRequestFromModel } from './system-request';

export interface TimingArrival {
  name: string;
  /** The air path, m (on a measurement: the distance its arrival time stands for); null when unknown. */
  distanceM: number | null;
  /** Air path time distanceM / c, or the measured arrival of an impulse response, ms; null when unknown. */
  arrivalMs: number | null;
  /** Where arrivalMs comes from: the layout's distance, the measured impulse's peak, or nowhere (a measurement without one). */
  arrivalFrom: 'distance' | 'measured' | null;
  /** Processor delay now set, ms. */
  delayMs: number;
  /** arrivalMs + delayMs, ms; null when the arrival is unknown. */
  totalMs: number | null;
}

export interface TimingSubAnswer extends TimingArrival {
  invert: boolean;
  /** How much earlier this sub's sound arrives than the mains', ms (processor delays included; negative: later); null when an arrival is unknown. */
  leadMs: number | null;
  /** Mains phase minus sub phase at the crossover with the present settings, (−180, 180], filters' own phase included. */
  phaseDifferenceDeg: number;
  /** The part of it from the arrival and processor delays alone: 360·fc·(sub total − mains total); null when an arrival is unknown. */
  delayPhaseDeg: number | null;
  /** The rest: the filters' and roll-offs' own phase (and polarity), wrapped; null when an arrival is unknown. */
  filterPhaseDeg: number | null;
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
  /** Null on the model; on measurements: which, their ranges and phase estimates. */
  measured: MeasuredBasis | null;
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

/**
 * The answer of POST /api/v1/timing: arrivals, the present flatness, each sub's advice and Timing window, the all-subs
 * advice — on the model, or on the measured curves the request's sources name (resolved by the route: `curves`); a
 * measured source's arrival is its impulse response's peak when it has one.
 */
export function computeTiming(req: TimingRequest, curves: { mains: CurvePoints | null; subs: readonly (CurvePoints | null)[] } = { mains: null, subs: [] }): TimingAnswer {
  const { temperatureC, crossoverHz } = req;
  const { model, basis } = withMeasuredSources(systemModelFromRequest(req), curves, [{ path: 'crossoverHz', valueHz: crossoverHz }]);
  const options = { maxShiftMs: req.maxDelayMs, stepMs: req.stepMs };
  const speedMps = speedOfSoundMps(temperatureC);
  /** The air time of a modelled source, the measured arrival of a measured one (null when it has none). */
  type Air = { ms: number | null; from: TimingArrival['arrivalFrom']; distanceM: number | null };
  const airMs = (distanceM: number, curve: CurvePoints | null | undefined): Air => {
    if (!curve) return { ms: arrivalTimeMs({ distanceM, temperatureC }), from: 'distance', distanceM };
    // A measured arrival stands for the distance sound travels in that time.
    return typeof curve.arrivalMs === 'number' ? { ms: curve.arrivalMs, from: 'measured', distanceM: (curve.arrivalMs / 1000) * speedMps } : { ms: null, from: null, distanceM: null };
  };
  const arrival = (name: string, air: Air, delayMs: number): TimingArrival => ({
    name,
    distanceM: air.distanceM === null ? null : roundTo(air.distanceM, 2),
    arrivalMs: air.ms === null ? null : r3(air.ms),
    arrivalFrom: air.from,
    delayMs: roundTo(delayMs, 2),
    totalMs: air.ms === null ? null : r3(air.ms + delayMs),
  });
  const mainsAir = airMs(req.mains.distanceM, curves.mains);
  const mainsTotalMs = mainsAir.ms === null ? null : mainsAir.ms + req.mains.delayMs;
  // The phase of each path at the crossover, from the same paths every evaluation sums.
  const atCrossover = blendResponse({ temperatureC, frequencyHz: [crossoverHz], paths: systemPaths(model) });
  const mainsPhase = atCrossover.paths[0]!.unwrappedPhaseDeg[0] as number;

  let present: AssessmentAnswer | null = null;
  const subs = req.subs.map((s, k): TimingSubAnswer => {
    const a = subTimingAdvice(model, k, options);
    present ??= assessmentAnswer(a.present);
    const subAir = airMs(s.distanceM, curves.subs[k]);
    const subTotalMs = subAir.ms === null ? null : subAir.ms + s.delayMs;
    const offsetMs = s.delayMs - req.mains.delayMs;
    const phaseDifferenceDeg = wrapDeg(mainsPhase - (atCrossover.paths[k + 1]!.unwrappedPhaseDeg[0] as number));
    const known = subTotalMs !== null && mainsTotalMs !== null;
    const delayPhaseDeg = known ? wrapDeg((360 * crossoverHz * (subTotalMs - mainsTotalMs)) / 1000) : null;
    const normal = s.invert ? a.curve.flippedDb : a.curve.normalDb;
    const inverted = s.invert ? a.curve.normalDb : a.curve.flippedDb;
    // The plot at 0.1 ms: every other point of the 0.05 ms scan.
    const keepPoint = (_: number, i: number) => i % 2 === 0;
    return {
      ...arrival(s.name, subAir, s.delayMs),
      invert: s.invert,
      leadMs: known ? r3(mainsTotalMs - subTotalMs) : null,
      phaseDifferenceDeg: roundTo(phaseDifferenceDeg, 1),
      delayPhaseDeg: delayPhaseDeg === null ? null : roundTo(delayPhaseDeg, 1),
      filterPhaseDeg: delayPhaseDeg === null ? null : roundTo(wrapDeg(phaseDifferenceDeg - delayPhaseDeg), 1),
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
    speedOfSoundMps: r3(speedMps),
    crossoverHz,
    flatness: { definition: FLATNESS_TEXT, bandHz: p ? p.bandHz : [crossoverHz / 2, crossoverHz * 2] },
    present: p!,
    mains: arrival(req.mains.name, mainsAir, req.mains.delayMs),
    subs,
    measured: basis,
    group,
  };
}

/** Writes a piece of Timing advice (a sub's or the group's) into the document: exactly the settings it states. */
export function applyTimingToDocument(doc: SystemDocument, advice: Pick<AdviceAnswer, 'set'>, channel?: string): SystemDocument {
  const model = systemModelFromDocument(doc, channel);
  if (!model) return doc;
  return retimeDocument(doc, timingSettingsOf(model), { mainsDelayMs: advice.set.mainsDelayMs, subs: advice.set.subs });
}
