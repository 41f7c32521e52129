/**
 * Lesson sweep: which value one parameter of a Lesson Step's sweep has at a moment of the animation (`sweepValueAt`),
 * and the System document with that value applied (`applyLessonSweepToDocument`). Pure bookkeeping, shared by the
 * editor preview, the Presenter view and the student view; the blend itself is computed by dsp/ (see lesson-frame.ts).
 */
import { FILTER_CHOICES, filterChoiceLabel, filterChoiceSlope, type FilterChoice, type Sweep } from '@/lib/validations/lesson';
import type { SystemDocument } from '@/lib/validations/system';
import { mlpSeat } from './geometry';
import { roundTo } from './rounding';

export type SweepValue = { kind: 'number'; value: number } | { kind: 'polarity'; inverted: boolean } | { kind: 'filter'; choice: FilterChoice };

/** The discrete choices a polarity or filter sweep steps through, in order from `from` to `to`. */
export function sweepChoices(sweep: Sweep): SweepValue[] {
  if (sweep.parameter === 'subPolarity') {
    return sweep.from === sweep.to ? [{ kind: 'polarity', inverted: sweep.from === 'inverted' }] : [{ kind: 'polarity', inverted: sweep.from === 'inverted' }, { kind: 'polarity', inverted: sweep.to === 'inverted' }];
  }
  if (sweep.parameter === 'filter') {
    const a = FILTER_CHOICES.indexOf(sweep.from);
    const b = FILTER_CHOICES.indexOf(sweep.to);
    const step = a <= b ? 1 : -1;
    const out: SweepValue[] = [];
    for (let i = a; step > 0 ? i <= b : i >= b; i += step) out.push({ kind: 'filter', choice: FILTER_CHOICES[i] as FilterChoice });
    return out;
  }
  return [];
}

/**
 * The swept value at `progress` (0 = start, 1 = end). Continuous parameters move linearly, the
 * crossover geometrically (equal steps in octaves, as the frequency axis shows them); discrete
 * ones hold each choice for an equal share of the time.
 */
export function sweepValueAt(sweep: Sweep, progress: number): SweepValue {
  const t = Math.min(1, Math.max(0, Number.isFinite(progress) ? progress : 0));
  switch (sweep.parameter) {
    case 'subPolarity':
    case 'filter': {
      const choices = sweepChoices(sweep);
      return choices[Math.min(choices.length - 1, Math.floor(t * choices.length))] as SweepValue;
    }
    case 'crossoverHz':
      return { kind: 'number', value: sweep.from * (sweep.to / sweep.from) ** t };
    default:
      return { kind: 'number', value: sweep.from + (sweep.to - sweep.from) * t };
  }
}

/** The document with the swept value applied and nothing else changed (never mutates `doc`). */
export function applyLessonSweepToDocument(doc: SystemDocument, sweep: Sweep, value: SweepValue): SystemDocument {
  const bm = doc.bassManagement;
  switch (sweep.parameter) {
    case 'subDelayMs':
      return value.kind === 'number' ? { ...doc, subs: doc.subs.map((s) => ({ ...s, delayMs: Math.max(0, value.value) })) } : doc;
    case 'subPolarity':
      return value.kind === 'polarity' ? { ...doc, subs: doc.subs.map((s) => ({ ...s, invert: value.inverted })) } : doc;
    case 'crossoverHz':
      return value.kind === 'number' ? { ...doc, bassManagement: { ...bm, crossoverHz: value.value } } : doc;
    case 'filter': {
      if (value.kind !== 'filter') return doc;
      const slope = filterChoiceSlope(value.choice);
      return { ...doc, bassManagement: { ...bm, mainsHighpass: { ...slope }, subLowpass: { ...slope } } };
    }
    case 'subDistanceM':
      // The subs move (toward or away from the front wall, keeping x and height); the processor keeps its settings.
      return value.kind === 'number' ? { ...doc, subs: doc.subs.map((s) => atDistanceFromMlp(doc, s, value.value)) } : doc;
    case 'mainsGainDb':
      return value.kind === 'number' ? { ...doc, speakers: doc.speakers.map((s) => ({ ...s, trimDb: value.value })) } : doc;
  }
}

export const SWEEP_LABELS: Record<Sweep['parameter'], string> = {
  subDelayMs: 'sub delay',
  subPolarity: 'sub polarity',
  crossoverHz: 'crossover',
  filter: 'slopes',
  subDistanceM: 'sub distance',
  mainsGainDb: 'mains gain',
};

export const SWEEP_UNITS: Record<Sweep['parameter'], string> = {
  subDelayMs: 'ms',
  subPolarity: '',
  crossoverHz: 'Hz',
  filter: '',
  subDistanceM: 'm',
  mainsGainDb: 'dB',
};

/** "sub delay 3.2 ms", "sub polarity inverted", "slopes LR4", "crossover 84 Hz". */
export function formatSweepValue(sweep: Sweep, value: SweepValue): string {
  const label = SWEEP_LABELS[sweep.parameter];
  if (value.kind === 'polarity') return `${label} ${value.inverted ? 'inverted' : 'normal'}`;
  if (value.kind === 'filter') return `${label} ${filterChoiceLabel(value.choice)}`;
  const v = value.value;
  const text = sweep.parameter === 'crossoverHz' ? v.toFixed(0) : sweep.parameter === 'subDistanceM' ? v.toFixed(2) : sweep.parameter === 'mainsGainDb' ? `${v > 0 ? '+' : v < 0 ? '\u2212' : ''}${Math.abs(v).toFixed(1)}` : v.toFixed(1);
  return `${label} ${text}\u2009${SWEEP_UNITS[sweep.parameter]}`;
}

/** A sentence for the sweep ("sub delay from 0 ms to 6 ms over 6 s"). */
export function describeSweep(sweep: Sweep): string {
  const at = (p: number) => formatSweepValue(sweep, sweepValueAt(sweep, p)).slice(SWEEP_LABELS[sweep.parameter].length + 1);
  return `${SWEEP_LABELS[sweep.parameter]} from ${at(0)} to ${at(1)} over ${sweep.durationS} s`;
}

/** A sub moved along y (same side of the MLP, same x and height) to `distanceM` from the MLP, kept inside the room. */
function atDistanceFromMlp<T extends { xM: number; yM: number; zM: number }>(doc: SystemDocument, item: T, distanceM: number): T {
  const mlp = mlpSeat(doc);
  const dx = item.xM - mlp.xM;
  const dz = item.zM - mlp.zM;
  const across = distanceM * distanceM - dx * dx - dz * dz;
  if (across < 0) return item;
  const side = item.yM <= mlp.yM ? -1 : 1;
  const yM = roundTo(mlp.yM + side * Math.sqrt(across), 4);
  return yM >= 0 && yM <= doc.room.lengthM ? { ...item, yM } : item;
}
