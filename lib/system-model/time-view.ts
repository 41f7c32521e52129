/**
 * Time view: the impulse and step response of each path of the whole-system model (the shown main channel and every
 * sub, as the processor runs them) and of their sum (`computeTimeView`), and of measured curves with phase
 * (`measuredTimeView`). The model's paths are dsp's `systemPaths`, each evaluated exactly as Blend sums it
 * (`pathsTimeResponse`: pathResponse on the FFT's bins, the sum as their complex sum), so the late sub seen here in time
 * is the same one Blend and Timing show in phase. Computed in the browser from the document; no request, nothing
 * written back.
 */
import { impulseFromResponse, minimumPhaseDeg, pathsTimeResponse, systemPaths, type SystemModel, type TimeSignal } from '@/dsp';
import type { SystemDocument } from '@/lib/validations/system';
import { systemModelFromDocument } from './system-from-document';

/** Where a trace comes from: a model path, the model's sum, or a measured curve. */
export type TimeTraceRole = 'mains' | 'sub' | 'sum' | 'measured';

/** One trace of a time view. */
export interface TimeTrace extends TimeSignal {
  /** 'mains', 'sub-0', 'sub-1' …, 'sum', or 'measured-0' …. */
  id: string;
  name: string;
  role: TimeTraceRole;
  /** Which sub (0-based) for a sub path. */
  subIndex?: number;
  /** When its sound can first arrive (a model path's processor delay plus air path; an impulse file's peak), ms; null when not known. */
  arrivalMs: number | null;
  /** The largest |h(t)|, and when, ms. */
  impulsePeakMs: number;
  /** The largest |step|, and when, ms. */
  stepPeakMs: number;
  /** The polarity is inverted (its step goes negative). */
  inverted: boolean;
  /** The phase is a minimum-phase estimate from the level (a measured curve without phase): it holds no arrival time. */
  phaseEstimated: boolean;
}

/** Impulse and step responses over one window from one time origin, with sentences computed from them. */
export interface TimeView {
  /** Sample times, ms, shared by every trace. */
  timeMs: Float64Array;
  traces: TimeTrace[];
  /** What time 0 is. */
  originText: string;
  /** Plain sentences read off the traces (which step peaks when, who arrives first). */
  sentences: string[];
  /** A close-up of where the traces arrive and settle, ms (inside the window). */
  closeUpMs: [number, number];
  /** The band the responses are seen through, in words. */
  bandNote: string;
}

export interface TimeViewOptions {
  /** The main channel shown (L by default), as Blend and Timing choose it. */
  channel?: string;
  /** The window, ms from the time origin (default −20 … 300 ms). */
  startMs?: number;
  stopMs?: number;
}

/** Index of the largest |value|. */
function peakIndex(values: Float64Array): number {
  let best = 0;
  for (let i = 1; i < values.length; i++) if (Math.abs(values[i] as number) > Math.abs(values[best] as number)) best = i;
  return best;
}

const ms1 = (v: number) => `${Math.abs(v).toFixed(1)} ms`;
const ms2 = (v: number) => `${Math.abs(v).toFixed(2)} ms`;

function peaks(timeMs: Float64Array, s: TimeSignal): { impulsePeakMs: number; stepPeakMs: number } {
  return { impulsePeakMs: timeMs[peakIndex(s.impulsePerS)] as number, stepPeakMs: timeMs[peakIndex(s.step)] as number };
}

/** "Sub's step peaks 11.2 ms after the mains' (L); its sound arrives 2.91 ms after theirs." — read off two traces. */
function stepSentence(late: TimeTrace, reference: TimeTrace, referenceText: string): string {
  const d = late.stepPeakMs - reference.stepPeakMs;
  const when = Math.abs(d) < 0.05 ? `at the same time as ${referenceText}` : `${ms1(d)} ${d > 0 ? 'after' : 'before'} ${referenceText}`;
  let text = `${late.name}’s step peaks ${when}`;
  if (late.arrivalMs !== null && reference.arrivalMs !== null) {
    const a = late.arrivalMs - reference.arrivalMs;
    text += Math.abs(a) < 0.005 ? '; its sound arrives at the same time as theirs' : `; its sound arrives ${ms2(a)} ${a > 0 ? 'after' : 'before'} theirs`;
  }
  return `${text}${late.inverted ? ' (polarity inverted: its step goes negative)' : ''}.`;
}

/** From 5 ms before the first arrival to the last step peak plus the spread from the first arrival to it (at least 10 ms), in 5 ms. */
function closeUp(traces: readonly TimeTrace[], startMs: number, stopMs: number): [number, number] {
  const firsts = traces.map((t) => t.arrivalMs ?? t.impulsePeakMs);
  const first = Math.min(...firsts);
  const last = Math.max(...traces.map((t) => t.stepPeakMs));
  const from = Math.max(startMs, 5 * Math.floor((first - 5) / 5));
  const to = Math.min(stopMs, 5 * Math.ceil((last + Math.max(10, last - first)) / 5));
  return to > from ? [from, to] : [startMs, stopMs];
}

/**
 * The time view of the System's model: every path (the main channel first, then each sub) and the sum, from the
 * signal entering the processor (so each trace includes its processor delay and its air path to the MLP). Null
 * without a main speaker.
 */
export function computeTimeView(doc: SystemDocument, options: TimeViewOptions = {}): TimeView | null {
  const model = systemModelFromDocument(doc, options.channel);
  return model ? timeViewOfModel(model, options) : null;
}

/** The processor delays and polarities a piece of Timing advice states (its `set`), in the model's terms. */
export interface ModelSettings {
  mainsDelayMs: number;
  subs: readonly { delayMs: number; invert: boolean }[];
}

/** The model running other processor delays and polarities (a piece of Timing advice), everything else as it is. */
export function modelWithSettings(model: SystemModel, set: ModelSettings): SystemModel {
  return {
    ...model,
    mains: { ...model.mains, delayMs: set.mainsDelayMs },
    subs: model.subs.map((s, k) => ({ ...s, delayMs: set.subs[k]?.delayMs ?? s.delayMs, invert: set.subs[k]?.invert ?? s.invert })),
  };
}

/**
 * The time view of a whole-system model as Timing evaluates it (from the document, or from the request Timing sent —
 * measured sources included), every path and the sum from the signal entering the processor.
 */
export function timeViewOfModel(model: SystemModel, options: Pick<TimeViewOptions, 'startMs' | 'stopMs'> = {}): TimeView {
  const paths = systemPaths(model);
  const r = pathsTimeResponse({ paths, temperatureC: model.temperatureC, startMs: options.startMs, stopMs: options.stopMs });
  const traces: TimeTrace[] = r.paths.map((p, i) => ({
    id: i === 0 ? 'mains' : `sub-${i - 1}`,
    name: p.name,
    role: i === 0 ? 'mains' : 'sub',
    ...(i > 0 ? { subIndex: i - 1 } : {}),
    timeMs: p.timeMs,
    impulsePerS: p.impulsePerS,
    step: p.step,
    arrivalMs: p.arrivalMs,
    ...peaks(r.timeMs, p),
    inverted: paths[i]?.invert ?? false,
    phaseEstimated: false,
  }));
  const mains = traces[0] as TimeTrace;
  const sentences = traces.slice(1).map((t) => stepSentence(t, mains, `the mains’ (${mains.name})`));
  traces.push({ id: 'sum', name: 'Sum', role: 'sum', ...r.sum, arrivalMs: null, ...peaks(r.timeMs, r.sum), inverted: false, phaseEstimated: false });
  return {
    timeMs: r.timeMs,
    traces,
    originText: 'Time 0: the signal enters the processor; each trace includes its processor delay and its path through the air to the seat.',
    sentences,
    closeUpMs: closeUp(traces, r.timeMs[0] as number, r.timeMs[r.timeMs.length - 1] as number),
    bandNote: `Every response is seen through one Gaussian band limit (−3 dB at ${Math.round(r.bandLimitMinus3DbHz)} Hz, −0.5 dB at 300 Hz), which never rings: nothing shows before a path’s sound arrives but a fraction of a millisecond’s smear.`,
  };
}

/** A measured curve for {@link measuredTimeView} (a stored measurement has these fields). */
export interface MeasuredTimeCurve {
  name: string;
  /** 'mains' or 'sub' colour it as the model's paths; anything else is another measured curve. */
  role?: string | null;
  frequencyHz: readonly number[];
  magnitudeDb: readonly number[];
  /** Measured phase, degrees; null when the file had none (then the minimum-phase estimate is used, and said). */
  phaseDeg: readonly number[] | null;
  /** An impulse upload's peak, ms from the file's first sample; null for text. */
  arrivalMs: number | null;
}

/** The window around the earliest impulse-file arrival (20 ms before it to 300 ms after), else the default. */
function measuredWindow(curves: readonly MeasuredTimeCurve[], options: TimeViewOptions): { startMs?: number; stopMs?: number } {
  if (options.startMs !== undefined || options.stopMs !== undefined) return { startMs: options.startMs, stopMs: options.stopMs };
  const arrivals = curves.filter((c) => c.phaseDeg && c.arrivalMs !== null).map((c) => c.arrivalMs as number);
  if (!arrivals.length) return {};
  const first = Math.min(...arrivals);
  return { startMs: Math.floor(first - 20), stopMs: Math.floor(first - 20) + 320 };
}

/**
 * The time view of measured curves, each as measured (no filters applied), levels relative to its own highest point
 * below 2 kHz. With measured phase the times keep the measurement's timing reference (an impulse file's first sample,
 * where its peak's arrival is marked); without, the phase is the minimum-phase estimate from the level, which holds no
 * arrival time — its impulse starts at 0 ms whatever the real delay, and the view says so.
 */
export function measuredTimeView(curves: readonly MeasuredTimeCurve[], options: TimeViewOptions = {}): TimeView {
  if (curves.length === 0) throw new RangeError('curves must hold at least one measured curve');
  const window = measuredWindow(curves, options);
  let subs = 0;
  let bandTopHz = Infinity;
  const traces = curves.map((c, k): TimeTrace => {
    const phaseEstimated = c.phaseDeg === null;
    const phaseDeg = c.phaseDeg ?? minimumPhaseDeg({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb }).phaseDeg;
    const topDb = Math.max(...c.magnitudeDb.filter((_, i) => (c.frequencyHz[i] as number) <= 2000));
    const reference = Number.isFinite(topDb) ? topDb : Math.max(...c.magnitudeDb);
    const r = impulseFromResponse({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb.map((v) => v - reference), phaseDeg, ...window });
    bandTopHz = Math.min(bandTopHz, r.bandTopHz);
    const role: TimeTraceRole = c.role === 'mains' ? 'mains' : c.role === 'sub' ? 'sub' : 'measured';
    return {
      id: `measured-${k}`,
      name: c.name,
      role,
      ...(role === 'sub' ? { subIndex: subs++ } : {}),
      timeMs: r.timeMs,
      impulsePerS: r.impulsePerS,
      step: r.step,
      arrivalMs: phaseEstimated ? null : c.arrivalMs,
      ...peaks(r.timeMs, r),
      inverted: false,
      phaseEstimated,
    };
  });
  const first = traces[0] as TimeTrace;
  const timeMs = first.timeMs;
  const sentences: string[] = [];
  for (const t of traces) {
    if (t.phaseEstimated) sentences.push(`${t.name} has no measured phase: its phase is the minimum-phase estimate from its level, which holds no arrival time, so its impulse is drawn from 0 ms whatever the real delay.`);
    else sentences.push(`${t.name}: the impulse peaks at ${t.impulsePeakMs.toFixed(1)} ms and the step at ${t.stepPeakMs.toFixed(1)} ms${t.arrivalMs !== null ? ` (the impulse file’s peak arrived at ${t.arrivalMs.toFixed(2)} ms)` : ''}.`);
  }
  const mains = traces.find((t) => t.role === 'mains' && !t.phaseEstimated);
  // Only meaningful when both were measured from one timing reference (e.g. one loopback), as the text says.
  if (mains) {
    for (const t of traces) {
      if (t.role === 'sub' && !t.phaseEstimated) sentences.push(`${stepSentence({ ...t, arrivalMs: null }, { ...mains, arrivalMs: null }, `${mains.name}’s`).slice(0, -1)}, if both were measured from one timing reference.`);
    }
  }
  const fromFile = curves.some((c) => c.phaseDeg && c.arrivalMs !== null);
  return {
    timeMs,
    traces,
    originText: fromFile ? 'Time 0: the impulse file’s first sample (the measurement’s timing reference).' : 'Time 0: the measurement’s own timing reference (0 ms for a minimum-phase estimate).',
    sentences,
    closeUpMs: closeUp(traces, timeMs[0] as number, timeMs[timeMs.length - 1] as number),
    bandNote: `Responses used up to ${Math.round(bandTopHz)} Hz and tapered off over the octave above.`,
  };
}
