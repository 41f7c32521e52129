/**
 * Timing and the Crossover sweep run on what was measured at a seat: the request's system part with the measured
 * curves in place of the speakers' models (`measuredSourcesRequest`), dsp's model with those curves attached
 * (`withMeasuredSources`), the crossover points the curves can judge (`measuredCrossoverRangeHz`), and a measured
 * "all subs" result spread back over every sub of the document (`spreadAllSubsSettings`). Shared by the Timing and
 * Crossover sweep features so neither imports the other.
 */
import { EXTENSION_BAND_DEFAULTS, inRoomExtension, minimumPhaseDeg, type SystemModel, type SystemSource } from '@/dsp';
import { invalid } from '@/lib/errors';
import type { MeasuredCurveInput } from '@/lib/validations/measured-curve';
import type { SystemDocument } from '@/lib/validations/system';
import { roundTo } from './rounding';
import type { SystemRequest } from './system-request';
import { systemModelFromDocument, timingSettingsOf, type TimingSettings } from './system-from-document';

/** The points of one curve, as stored or sent inline (phase null: the file had none). */
export interface CurvePoints {
  frequencyHz: readonly number[];
  magnitudeDb: readonly number[];
  phaseDeg: readonly number[] | null;
  /** An impulse response's peak arrival, ms (from its recording's start); null or absent when unknown (text files). */
  arrivalMs?: number | null;
}

/** Which measurement stands for which source: the mains channel's, and each sub's or one of every sub playing together. */
export interface MeasuredPicks {
  mains: MeasuredCurveInput;
  subs: { kind: 'each'; curves: MeasuredCurveInput[] } | { kind: 'all'; curve: MeasuredCurveInput };
}

/** What an answer computed on measurements says about them. */
export interface MeasuredBasis {
  /** Each measured source by name: the range its curve covers, Hz, and whether its phase is a minimum-phase estimate. */
  sources: { name: string; startHz: number; stopHz: number; phaseEstimated: boolean }[];
  /** Crossover points these curves can judge, Hz: each must cover fc/2 … 4·fc (the mains) and fc/2 … 2·fc (the subs). */
  crossoverRangeHz: [number, number] | null;
  /** The mains' in-room −3 dB point against their level over 200 Hz–2 kHz, Hz; null when not measured or not reached. */
  mainsMinus3DbHz: number | null;
  /** Said beside every result: what was measured and what is an estimate. */
  note: string;
}

const r1 = (v: number) => roundTo(v, 1);

/**
 * The system part of a Timing or Crossover sweep request run on measurements: every source keeps its processor
 * settings (delay, gain, polarity, the processor's EQ on a sub output) and takes its measured curve in place of its
 * model — distance 0, no roll-off, no voicing EQ (the measurement holds the air path, the speaker's own roll-off and its
 * switches as they were set). With one curve of every sub together, the subs become one source with the first sub's
 * settings (spreadAllSubsSettings maps a result back).
 */
export function measuredSourcesRequest(doc: SystemDocument, request: SystemRequest, picks: MeasuredPicks): SystemRequest {
  const subOutputEq = (k: number) => {
    const eq = doc.subs[k]?.eq ?? [];
    return eq.length > 0 ? { eq: [...eq] } : {};
  };
  const measuredSub = (s: SystemRequest['subs'][number], k: number, curve: MeasuredCurveInput, name = s.name) => ({
    name,
    distanceM: 0,
    delayMs: s.delayMs,
    gainDb: s.gainDb,
    invert: s.invert,
    rolloff: { kind: 'none' as const },
    ...subOutputEq(k),
    measured: curve,
  });
  // The mains keep no EQ: theirs is the voicing switches, already in the measurement.
  const mains = { name: request.mains.name, delayMs: request.mains.delayMs, gainDb: request.mains.gainDb };
  return {
    ...request,
    mains: { ...mains, distanceM: 0, rolloff: { kind: 'none' }, measured: picks.mains },
    subs:
      picks.subs.kind === 'all'
        ? [measuredSub(request.subs[0]!, 0, picks.subs.curve, 'All subs')]
        : request.subs.map((s, k) => measuredSub(s, k, (picks.subs as { curves: MeasuredCurveInput[] }).curves[k]!)),
  };
}

/** A source's measured response for dsp: the curve's own phase, or its minimum-phase estimate. */
function measuredOf(c: CurvePoints): { measured: NonNullable<SystemSource['measured']>; phaseEstimated: boolean } {
  if (c.phaseDeg) return { measured: { frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb, phaseDeg: c.phaseDeg }, phaseEstimated: false };
  const estimate = minimumPhaseDeg({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb });
  return { measured: { frequencyHz: estimate.frequencyHz, magnitudeDb: c.magnitudeDb, phaseDeg: estimate.unwrappedPhaseDeg }, phaseEstimated: true };
}

/** The crossover points both kinds of curve cover: fc/2 … 4·fc for the mains (4·fc is the flatness reference), fc/2 … 2·fc for a sub. */
export function measuredCrossoverRangeHz(mains: CurvePoints | null, subs: readonly CurvePoints[]): [number, number] | null {
  let lo = 0;
  let hi = Infinity;
  const span = (c: CurvePoints) => [c.frequencyHz[0] as number, c.frequencyHz[c.frequencyHz.length - 1] as number] as const;
  if (mains) {
    const [a, b] = span(mains);
    lo = Math.max(lo, 2 * a);
    hi = Math.min(hi, b / 4);
  }
  for (const c of subs) {
    const [a, b] = span(c);
    lo = Math.max(lo, 2 * a);
    hi = Math.min(hi, b / 2);
  }
  return hi >= lo ? [lo, hi] : null;
}

/**
 * dsp's model with the resolved curves attached to the sources the request marked measured (`curves.mains`,
 * `curves.subs[k]`), and what the answer must say about them. Refuses (400, naming the field) crossover points the
 * curves cannot judge.
 */
export function withMeasuredSources(
  model: SystemModel,
  curves: { mains: CurvePoints | null; subs: readonly (CurvePoints | null)[] },
  crossoversHz: readonly { path: string; valueHz: number }[],
): { model: SystemModel; basis: MeasuredBasis | null } {
  const subCurves = curves.subs.filter((c): c is CurvePoints => c !== null);
  if (!curves.mains && subCurves.length === 0) return { model, basis: null };
  const sources: MeasuredBasis['sources'] = [];
  const attach = (s: SystemSource, c: CurvePoints | null): SystemSource => {
    if (!c) return s;
    const { measured, phaseEstimated } = measuredOf(c);
    sources.push({ name: s.name, startHz: r1(c.frequencyHz[0] as number), stopHz: r1(c.frequencyHz[c.frequencyHz.length - 1] as number), phaseEstimated });
    return { name: s.name, distanceM: 0, delayMs: s.delayMs, gainDb: s.gainDb, invert: s.invert, ...(s.eq ? { eq: s.eq } : {}), measured };
  };
  const next: SystemModel = { ...model, mains: attach(model.mains, curves.mains), subs: model.subs.map((s, k) => attach(s, curves.subs[k] ?? null)) };
  const range = measuredCrossoverRangeHz(curves.mains, subCurves);
  const outside = crossoversHz.find(({ valueHz: f }) => !range || f < range[0] * (1 - 1e-9) || f > range[1] * (1 + 1e-9));
  if (outside) {
    const { path, valueHz: f } = outside;
    throw invalid(
      range
        ? `${path}: the measurements can judge crossover points from ${r1(range[0])} to ${r1(range[1])} Hz; ${f} Hz needs the mains measured over ${f / 2}–${4 * f} Hz and the subs over ${f / 2}–${2 * f} Hz.`
        : `${path}: the measurements share no range in which a crossover could be judged (the mains need fc/2 … 4·fc, the subs fc/2 … 2·fc).`,
      [{ path, message: range ? `must lie within ${r1(range[0])}–${r1(range[1])} Hz on these measurements` : 'cannot be judged on these measurements' }],
    );
  }
  let mainsMinus3DbHz: number | null = null;
  if (curves.mains) {
    try {
      const e = inRoomExtension({ frequencyHz: curves.mains.frequencyHz, magnitudeDb: curves.mains.magnitudeDb });
      mainsMinus3DbHz = e.minus3DbHz === null ? null : r1(e.minus3DbHz);
    } catch (error) {
      if (!(error instanceof RangeError)) throw error;
    }
  }
  const estimated = sources.filter((s) => s.phaseEstimated).map((s) => s.name);
  const note = [
    `Run on the measured ${sources.map((s) => s.name).join(', ')} (each as measured alone at the seat, with this System's filters, processor EQ, gains, delays and polarity applied).`,
    estimated.length
      ? `${estimated.join(', ')} had no phase: a minimum-phase estimate stands in, which holds no arrival time — treat delays as a guide and measure with phase to confirm.`
      : 'Every curve has measured phase, so the arrival times are the measured ones.',
    `The mains' in-room −3 dB point is read against their level over ${EXTENSION_BAND_DEFAULTS.bandStartHz} Hz–${EXTENSION_BAND_DEFAULTS.bandStopHz / 1000} kHz.`,
  ].join(' ');
  return { model: next, basis: { sources, crossoverRangeHz: range ? [r1(range[0]), r1(range[1])] : null, mainsMinus3DbHz, note } };
}

/**
 * A result computed with every sub measured together (one "All subs" source) as settings of the document's subs: each
 * sub's delay moves by what the one source's moved and flips when it flipped.
 */
export function spreadAllSubsSettings(before: TimingSettings, measuredBefore: TimingSettings, measuredAfter: TimingSettings): TimingSettings {
  const first = (t: TimingSettings) => t.subs[0] ?? { delayMs: 0, invert: false };
  const shiftMs = first(measuredAfter).delayMs - first(measuredBefore).delayMs;
  const mainsShiftMs = measuredAfter.mainsDelayMs - measuredBefore.mainsDelayMs;
  const flip = first(measuredAfter).invert !== first(measuredBefore).invert;
  return {
    mainsDelayMs: before.mainsDelayMs + mainsShiftMs,
    subs: before.subs.map((s) => ({ delayMs: s.delayMs + shiftMs, invert: flip ? !s.invert : s.invert })),
  };
}

/**
 * The settings a result computed on measurements asks of the document's subs: as they are with each sub measured
 * alone; with every sub measured together, the one "All subs" source's change spread over every sub
 * (spreadAllSubsSettings, from the present row's settings to the chosen row's).
 */
export function settingsForDocument(
  doc: SystemDocument,
  channel: string | undefined,
  picks: MeasuredPicks,
  present: TimingSettings,
  chosen: { mainsDelayMs: number; subs: readonly { name?: string; delayMs: number; invert: boolean }[] },
): { mainsDelayMs: number; subs: { name: string; delayMs: number; invert: boolean }[] } {
  const model = systemModelFromDocument(doc, channel);
  if (!model || picks.subs.kind === 'each') return { mainsDelayMs: chosen.mainsDelayMs, subs: chosen.subs.map((s, k) => ({ name: s.name ?? doc.subs[k]?.name ?? '', delayMs: s.delayMs, invert: s.invert })) };
  const spread = spreadAllSubsSettings(timingSettingsOf(model), present, chosen);
  return { mainsDelayMs: roundTo(spread.mainsDelayMs, 2), subs: spread.subs.map((s, k) => ({ name: doc.subs[k]?.name ?? '', delayMs: roundTo(s.delayMs, 2), invert: s.invert })) };
}
