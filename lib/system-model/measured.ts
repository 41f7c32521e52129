/**
 * Measured: the System's request for two measured curves (`measuredRequestFromDocument`), the compute behind
 * POST /api/v1/measured/predict (`computeMeasured`) and the measured-pair recommendation written back
 * (`applyMeasuredToDocument`). The mathematics (resampling, minimum phase, applying a path, the complex sum, the delay
 * scan and Timing window, smoothing) is dsp's; here only the shared grid, processor bookkeeping and rounding.
 */
import {
  ADVICE_RULES,
  bandPowerAverageDb,
  bestMeasuredAlignment,
  logFrequencyGridHz,
  predictMeasuredBlend,
  resampleCurve,
  smoothFractionalOctave,
  type MeasuredPathInput,
  type PathSpec,
  withoutCommonDelayMs,
} from '@/dsp';
import { invalid } from '@/lib/errors';
import type { PredictRequest, PredictRequestInput } from '@/lib/validations/measurement';
import type { SystemDocument } from '@/lib/validations/system';
import type { CurvePoints } from './measured-sources';
import { roundAllTo, roundAllToSignificant, roundTo } from './rounding';
import { retimeDocument, systemModelFromDocument, timingSettingsOf } from './system-from-document';


export interface PredictTrace {
  name: string;
  magnitudeDb: number[];
  phaseDeg: number[];
  /** True when this trace's phase is a minimum-phase estimate (the file had none). */
  phaseEstimated: boolean;
}

export interface PredictAnswer {
  /** The shared log grid: the two curves' common range within 10 Hz … max(1 kHz, 4.5·fc). */
  frequencyHz: number[];
  smoothingFraction: number;
  /** True when either file had no phase and its minimum-phase estimate was used. */
  phaseEstimated: boolean;
  /** Each measurement on the shared grid, as measured (nothing applied). */
  measured: PredictTrace[];
  /** Each measurement with the System's filter, processor EQ, gain, delay and polarity applied. */
  paths: PredictTrace[];
  /** The two processed paths summed: what the System's settings would give at this seat. */
  predictedSum: { magnitudeDb: number[]; phaseDeg: number[] };
  /** The two measurements summed as they are (no processing): the seat as measured. */
  measuredSum: { magnitudeDb: number[]; phaseDeg: number[] };
  /** Best extra delay and sub polarity found on the measured pair; null when the curves do not cover fc/2 … 4fc. */
  alignment: null | {
    /** True when the best setting is under ADVICE_RULES.audibleGainDb (0.5 dB) flatter than the present: keep it. */
    keep: boolean;
    /** One sentence: what the change gains, or why the present setting stays. */
    reason: string;
    addTo: 'sub' | 'mains';
    addDelayMs: number;
    subDelayMs: number;
    mainsDelayMs: number;
    invert: boolean;
    flipPolarity: boolean;
    phaseDifferenceDeg: number;
    phaseDifferenceAfterDeg: number;
    crossoverLevelDb: number;
    flatnessBeforeDb: number;
    flatnessDb: number;
    /** Timing window in sub-minus-mains delay settings, ms. */
    timingWindowMs: [number, number];
    levelVersusDelay: { subMinusMainsDelayMs: number[]; normalDb: number[]; invertedDb: number[] };
    /** The predicted sum with the recommendation applied. */
    recommendedSum: { magnitudeDb: number[] };
  };
  /** Why there is no alignment, when there is none. */
  alignmentNote: string | null;
}

/** Which System sub a sub measurement stands for, and which main channel the mains measurement. */
export interface PredictTarget {
  channel?: string;
  /** The System sub whose settings apply; "all" takes the first sub's (every sub playing together). */
  subIndex: number | 'all';
}

/** The predict body for two curves with the System's current settings (the mains channel's trim, the chosen sub's gain, delay and polarity). */
export function measuredRequestFromDocument(
  doc: SystemDocument,
  curves: { mains: PredictRequestInput['mains']['curve']; sub: PredictRequestInput['sub']['curve'] },
  target: PredictTarget,
  options: { smoothingFraction?: number } = {},
): PredictRequestInput | null {
  // The processor's delays come from the whole-system model (the one channel-settings function), so the
  // measured curves get what the processor runs: distance alignment plus the mains and sub delays.
  const model = systemModelFromDocument(doc, target.channel);
  const k = target.subIndex === 'all' ? 0 : target.subIndex;
  const sub = doc.subs[k];
  const subSource = model?.subs[k];
  if (!model || !sub || !subSource) return null;
  const outputEq = doc.subs[k]?.eq ?? [];
  return {
    temperatureC: model.temperatureC,
    crossoverHz: model.crossoverHz,
    mainsHighpass: { ...model.mainsHighpass },
    subLowpass: { ...model.subLowpass },
    mains: { name: model.mains.name, curve: curves.mains, gainDb: model.mains.gainDb, delayMs: model.mains.delayMs, invert: false },
    // The sub's processor EQ is applied (measurements are taken without processing), but not the voicing switches:
    // the switch was in the speaker, in whatever position it had, when it was measured. "All subs" takes the first sub's.
    sub: { name: target.subIndex === 'all' ? 'All subs' : sub.name, curve: curves.sub, gainDb: sub.gainDb, delayMs: subSource.delayMs, invert: sub.invert, ...(outputEq.length > 0 ? { processorEq: [...outputEq] } : {}) },
    smoothingFraction: options.smoothingFraction ?? 0,
  };
}

const r3 = (v: number) => roundTo(v, 3);
const r2 = (v: number) => roundTo(v, 2);

export const PREDICT_MIN_HZ = 10;

/** Predicts the blend at the measurement seat from two measured curves and the System's settings. */
export function computeMeasured(req: PredictRequest, curves: { mains: CurvePoints; sub: CurvePoints }): PredictAnswer {
  const { mains, sub } = curves;
  const topHz = Math.max(1000, 4.5 * req.crossoverHz);
  const startHz = Math.max(PREDICT_MIN_HZ, mains.frequencyHz[0] as number, sub.frequencyHz[0] as number);
  const stopHz = Math.min(topHz, mains.frequencyHz[mains.frequencyHz.length - 1] as number, sub.frequencyHz[sub.frequencyHz.length - 1] as number);
  if (!(stopHz >= 2 * startHz)) {
    throw invalid(`The two measurements share only ${r2(startHz)}–${r2(stopHz)} Hz (within ${PREDICT_MIN_HZ}–${topHz} Hz); at least one octave in common is needed.`, [
      { path: 'sub.curve', message: `shares less than an octave with the mains curve (${r2(startHz)}–${r2(stopHz)} Hz)` },
    ]);
  }
  const grid = logFrequencyGridHz({ startHz, stopHz: stopHz * (1 + 1e-12), pointsPerOctave: req.pointsPerOctave });
  const onGrid = (c: CurvePoints) =>
    resampleCurve({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb, ...(c.phaseDeg ? { phaseDeg: c.phaseDeg } : {}), targetHz: grid });
  const m = onGrid(mains);
  const s = onGrid(sub);

  const mainsPath: PathSpec = {
    name: req.mains.name,
    filter: { family: req.mainsHighpass.family, order: req.mainsHighpass.order, response: 'highpass', cornerHz: req.crossoverHz },
    ...(req.mains.processorEq ? { eq: req.mains.processorEq } : {}),
    gainDb: req.mains.gainDb,
    delayMs: req.mains.delayMs,
    invert: req.mains.invert,
  };
  const subPathSpec: PathSpec = {
    name: req.sub.name,
    filter: { family: req.subLowpass.family, order: req.subLowpass.order, response: 'lowpass', cornerHz: req.crossoverHz },
    ...(req.sub.processorEq ? { eq: req.sub.processorEq } : {}),
    gainDb: req.sub.gainDb,
    delayMs: req.sub.delayMs,
    invert: req.sub.invert,
  };
  const input = (c: typeof m, path: PathSpec): MeasuredPathInput => ({ magnitudeDb: c.magnitudeDb, ...(c.phaseDeg ? { phaseDeg: c.phaseDeg } : {}), path });
  const wire = (path: PathSpec): PathSpec => ({ ...path, filter: { ...path.filter, response: 'none' }, eq: [], gainDb: 0, delayMs: 0, invert: false });

  const predicted = predictMeasuredBlend({ frequencyHz: grid, measured: [input(m, mainsPath), input(s, subPathSpec)], temperatureC: req.temperatureC });
  const asMeasured = predictMeasuredBlend({ frequencyHz: grid, measured: [input(m, wire(mainsPath)), input(s, wire(subPathSpec))], temperatureC: req.temperatureC });

  const fraction = req.smoothingFraction;
  const smooth = (db: Float64Array): number[] => roundAllTo(fraction > 0 ? smoothFractionalOctave({ frequencyHz: grid, magnitudeDb: db, fraction }).magnitudeDb : db, 3);

  let alignment: PredictAnswer['alignment'] = null;
  let alignmentNote: string | null = null;
  const needLo = req.crossoverHz / 2;
  const needHi = 4 * req.crossoverHz;
  if (startHz > needLo * (1 + 1e-9) || stopHz < needHi * (1 - 1e-9)) {
    alignmentNote = `The best delay needs both curves to cover ${r2(needLo)}–${r2(needHi)} Hz (half to four times the crossover); they share ${r2(startHz)}–${r2(stopHz)} Hz.`;
  } else {
    const a = bestMeasuredAlignment({
      frequencyHz: grid,
      mains: input(m, mainsPath),
      sub: input(s, subPathSpec),
      crossoverHz: req.crossoverHz,
      temperatureC: req.temperatureC,
      maxDelayMs: req.maxDelayMs,
    });
    // Processor bookkeeping as on Timing: delays are "sub minus mains" settings, the common delay taken out (one side 0).
    const offsetMs = req.sub.delayMs - req.mains.delayMs;
    const next = offsetMs + a.relativeDelayMs;
    const [mainsDelayMs, subDelayMs] = withoutCommonDelayMs([0, next]) as [number, number];
    const recommended = predictMeasuredBlend({
      frequencyHz: grid,
      measured: [input(m, { ...mainsPath, delayMs: mainsDelayMs }), input(s, { ...subPathSpec, delayMs: subDelayMs, invert: a.invertSub })],
      temperatureC: req.temperatureC,
    });
    // The one advice rule (ADVICE_RULES): a change under 0.5 dB of the flatness measure is not worth making.
    const gainDb = a.flatnessBeforeDb - a.flatnessDb;
    const keep = gainDb < ADVICE_RULES.audibleGainDb;
    alignment = {
      keep,
      reason: keep
        ? `Keep the present setting (±${a.flatnessBeforeDb.toFixed(2)} dB on the measured pair): the best delay and polarity gain only ${Math.max(0, gainDb).toFixed(2)} dB, under the ${ADVICE_RULES.audibleGainDb} dB a listener could hear in the bass.`
        : `Flatness on the measured pair ±${a.flatnessBeforeDb.toFixed(2)} dB → ±${a.flatnessDb.toFixed(2)} dB (${gainDb.toFixed(2)} dB better).`,
      addTo: next >= offsetMs ? 'sub' : 'mains',
      addDelayMs: r3(Math.abs(a.relativeDelayMs)),
      subDelayMs: r3(subDelayMs),
      mainsDelayMs: r3(mainsDelayMs),
      invert: a.invertSub,
      flipPolarity: a.flipPolarity,
      phaseDifferenceDeg: r2(a.phaseDifferenceDeg),
      phaseDifferenceAfterDeg: r2(a.phaseDifferenceAfterDeg),
      crossoverLevelDb: r3(a.crossoverLevelDb),
      flatnessBeforeDb: r3(a.flatnessBeforeDb),
      flatnessDb: r3(a.flatnessDb),
      timingWindowMs: [r3(offsetMs + a.windowMs[0]), r3(offsetMs + a.windowMs[1])],
      levelVersusDelay: {
        subMinusMainsDelayMs: Array.from(a.levelVersusDelay.delayMs, (d) => r3(offsetMs + d)),
        normalDb: roundAllTo(a.levelVersusDelay.normalDb, 3),
        invertedDb: roundAllTo(a.levelVersusDelay.invertedDb, 3),
      },
      recommendedSum: { magnitudeDb: smooth(recommended.sum.magnitudeDb) },
    };
    if (predicted.phaseEstimated) alignmentNote = 'At least one curve has no measured phase: its minimum-phase estimate holds no arrival time, so treat the best delay as a rough guide and measure with phase to confirm.';
  }

  // As measured: the file's phase, or the minimum-phase estimate (the "wire" paths add nothing to it).
  const asIs = (c: typeof m, i: number, name: string): PredictTrace => ({
    name,
    magnitudeDb: smooth(c.magnitudeDb),
    phaseDeg: roundAllTo(c.phaseDeg ?? asMeasured.paths[i]!.phaseDeg, 2),
    phaseEstimated: !c.phaseDeg,
  });
  return {
    frequencyHz: roundAllToSignificant(grid, 6),
    smoothingFraction: fraction,
    phaseEstimated: predicted.phaseEstimated,
    measured: [asIs(m, 0, req.mains.name), asIs(s, 1, req.sub.name)],
    paths: predicted.paths.map((p) => ({ name: p.name, magnitudeDb: smooth(p.magnitudeDb), phaseDeg: roundAllTo(p.phaseDeg, 2), phaseEstimated: p.phaseEstimated })),
    predictedSum: { magnitudeDb: smooth(predicted.sum.magnitudeDb), phaseDeg: roundAllTo(predicted.sum.phaseDeg, 2) },
    measuredSum: { magnitudeDb: smooth(asMeasured.sum.magnitudeDb), phaseDeg: roundAllTo(asMeasured.sum.phaseDeg, 2) },
    alignment,
    alignmentNote,
  };
}

/**
 * Writes the measured-pair recommendation into the document: the processor delays it states (the mains', the chosen
 * sub's) and the sub's polarity. Other subs keep their timing against the mains (they move with the mains delay);
 * with "all" every sub moves and flips together. Delays are written back through the one channel-settings bookkeeping
 * (retimeDocument), so the processor runs exactly the advised settings.
 */
export function applyMeasuredToDocument(
  doc: SystemDocument,
  subIndex: number | 'all',
  rec: { subDelayMs: number; mainsDelayMs: number; invert: boolean; flipPolarity: boolean },
  channel?: string,
): SystemDocument {
  const model = systemModelFromDocument(doc, channel);
  if (!model) return doc;
  const before = timingSettingsOf(model);
  const mainsShift = rec.mainsDelayMs - before.mainsDelayMs;
  const first = before.subs[0];
  const allShift = first ? rec.subDelayMs - first.delayMs : 0;
  const subs = before.subs.map((s, k) =>
    subIndex === 'all'
      ? { delayMs: s.delayMs + allShift, invert: rec.flipPolarity ? !s.invert : s.invert }
      : k === subIndex
        ? { delayMs: rec.subDelayMs, invert: rec.invert }
        : { delayMs: s.delayMs + mainsShift, invert: s.invert },
  );
  return retimeDocument(doc, before, { mainsDelayMs: rec.mainsDelayMs, subs });
}

/** What a measurement's role says was playing: `sub` (sub, LFE), `sum` (mains and sub together), `mains` (mains or a channel label), or unknown. */
export function measurementRoleKind(role: string | null | undefined): 'mains' | 'sub' | 'sum' | null {
  if (!role || !role.trim()) return null;
  if (/sum|both|together|\+/i.test(role)) return 'sum';
  if (/sub|lfe/i.test(role)) return 'sub';
  return 'mains';
}

/**
 * The band a measured curve is level-aligned to the model sum in (the sum is at 0 dB through the passband), by its
 * role, within the file's own range: a mains file above the crossover (2·fc … 8·fc), a sub file below it (fc/3 … fc),
 * anything else around it (fc/2 … 2·fc). Null when the file does not reach a third of an octave of that band.
 */
export function overlayAlignBandHz(role: string | null, crossoverHz: number, curveHz: readonly number[]): { startHz: number; stopHz: number } | null {
  const kind = measurementRoleKind(role);
  const [lo, hi] = kind === 'mains' ? [2, 8] : kind === 'sub' ? [1 / 3, 1] : [0.5, 2];
  const startHz = Math.max(crossoverHz * lo, curveHz[0] ?? Infinity);
  const stopHz = Math.min(crossoverHz * hi, curveHz[curveHz.length - 1] ?? 0);
  return stopHz >= startHz * 2 ** (1 / 3) ? { startHz: Math.round(startHz), stopHz: Math.round(stopHz) } : null;
}

/** The offset that brings a curve's power average over the band to the model sum's there, dB (0.1 dB); null when either has no point in it. */
export function overlayAlignOffsetDb(
  model: { frequencyHz: readonly number[]; magnitudeDb: readonly number[] },
  curve: { frequencyHz: readonly number[]; magnitudeDb: readonly number[] },
  band: { startHz: number; stopHz: number },
): number | null {
  try {
    const target = bandPowerAverageDb({ ...model, ...band }).levelDb;
    const own = bandPowerAverageDb({ frequencyHz: curve.frequencyHz, magnitudeDb: curve.magnitudeDb, ...band }).levelDb;
    return roundTo(target - own, 1);
  } catch (e) {
    if (e instanceof RangeError) return null;
    throw e;
  }
}
