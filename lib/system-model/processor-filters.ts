/**
 * Processor filters: every filter the processor runs on each output of the finished System as digital biquads
 * (`processorFiltersFromDocument`), the compute behind POST /api/v1/processor-filters (`computeProcessorFilters`), and
 * the words and grouping the panel and the Settings sheet both show (`processorFiltersSummary`). The mathematics is
 * dsp/filters (bilinear transform pre-warped for the crossovers, the Audio EQ Cookbook for EQ); nothing is written back
 * here: each sub output's EQ and the sample rate are fields of the document the panel edits directly.
 */
import { BIQUAD_CONVENTION, logFrequencyGridHz, processorFilters, type DigitalDeviation, type FilterFamily, type ProcessorFilter, type ProcessorFiltersResult, type ProcessorSection } from '@/dsp';
import type { ProcessorFiltersRequest } from '@/lib/validations/compute-processor-filters';
import type { Slope, SystemDocument } from '@/lib/validations/system';
import { profileById } from './geometry';
import { roundAllTo, roundTo, roundToSignificant } from './rounding';
import { voicingSummary } from './voicing';

/** What a filter does on an output: part of bass management, or equalisation. */
export type ProcessorFilterRole = 'crossover' | 'eq';

export interface OutputFilter {
  role: ProcessorFilterRole;
  filter: ProcessorFilter;
  /** The filter in words: "High-pass, Butterworth 2nd order (12 dB/oct), 80 Hz". */
  words: string;
}

export interface ProcessorOutput {
  /** 'main-<speaker id>', 'sub-<sub id>' or 'lfe'. */
  id: string;
  kind: 'main' | 'sub' | 'lfe';
  /** The channel label, the sub's name, or "LFE". */
  label: string;
  filters: OutputFilter[];
  /** The biquads, responses and deviation; null when a filter cannot run at this sample rate (see `problem`). */
  result: ProcessorFiltersResult | null;
  problem: string | null;
  /**
   * The positions of the speaker's own back-panel switches (Voicing options), in words ("Treble: +2 dB · Placement: Near a
   * wall"); set on the speaker, not in the processor, so not among `filters`. Null without switches (and for the LFE).
   */
  voicing: string | null;
}

export interface SystemProcessorFilters {
  sampleRateHz: number;
  convention: string;
  /** The grid every response is on: 10 Hz to min(20 kHz, 0.45·fs), 48 points per octave. */
  frequencyHz: Float64Array;
  outputs: ProcessorOutput[];
}

/**
 * The LFE low-pass Seamline assumes: the System stores only its frequency, and 24 dB/octave is the usual slope
 * (common practice). A processor that fixes its own LFE slope keeps it; only the frequency is then set.
 */
export const LFE_LOWPASS_SLOPE: Slope = { family: 'linkwitz-riley', order: 4 };

/** What an integrator must know about a1 and a2 before typing them in. */
export const COEFFICIENT_SIGN_NOTE =
  'a1 and a2 are as written in this formula. Some processors write the denominator as 1 − a1·z⁻¹ − a2·z⁻² and want a1 and a2 with their signs changed: negate both for those.';

/** The grid of the processor filters' responses: log 10 Hz to min(20 kHz, 0.45·sampleRateHz), 48 points per octave. */
export function processorGridHz(sampleRateHz: number): Float64Array {
  return logFrequencyGridHz({ startHz: 10, stopHz: Math.min(20000, 0.45 * sampleRateHz), pointsPerOctave: 48 });
}

const trimmed = (x: number, decimals: number) => String(Number(x.toFixed(decimals)));
const signedDb = (x: number) => `${x > 0 ? '+' : x < 0 ? '−' : ''}${trimmed(Math.abs(x), 2)} dB`;
const hz = (x: number) => (x >= 1000 ? `${trimmed(x / 1000, 3)} kHz` : `${trimmed(x, 2)} Hz`);
const ordinal = (n: number) => `${n}${n === 1 ? 'st' : n === 2 ? 'nd' : n === 3 ? 'rd' : 'th'}`;
const familyWord = (family: FilterFamily) => (family === 'linkwitz-riley' ? 'Linkwitz–Riley' : 'Butterworth');

function slopeWords(slope: { family: FilterFamily; order: number }): string {
  return `${familyWord(slope.family)} ${ordinal(slope.order)} order (${6 * slope.order} dB/oct)`;
}

/** The LFE output's assumption, in words. */
export const LFE_NOTE = `The LFE low-pass is on the LFE input, before it joins the subs’ feed. The System stores only its frequency; Seamline assumes ${slopeWords(LFE_LOWPASS_SLOPE)}. Where the processor fixes the LFE slope, set only the frequency.`;

/** A processor filter in words, e.g. "Peaking −3 dB at 45 Hz, Q 4". */
export function filterWords(filter: ProcessorFilter): string {
  switch (filter.kind) {
    case 'crossover':
      return `${filter.response === 'highpass' ? 'High-pass' : 'Low-pass'}, ${slopeWords(filter)}, ${hz(filter.cornerHz)}`;
    case 'peaking':
      return `Peaking ${signedDb(filter.gainDb)} at ${hz(filter.centerHz)}, Q ${trimmed(filter.q, 3)}`;
    case 'low-shelf':
    case 'high-shelf': {
      const width = filter.q !== undefined ? `Q ${trimmed(filter.q, 3)}` : `slope ${trimmed(filter.slope ?? 1, 3)}`;
      return `${filter.kind === 'low-shelf' ? 'Low' : 'High'} shelf ${signedDb(filter.gainDb)} at ${hz(filter.cornerHz)}, ${width}`;
    }
    case 'allpass':
      return `All-pass, ${ordinal(filter.order)} order, ${hz(filter.cornerHz)}${filter.order === 2 ? `, Q ${trimmed(filter.q ?? Math.SQRT1_2, 3)}` : ''}`;
  }
}

const filterFrequencyHz = (f: ProcessorFilter) => (f.kind === 'peaking' ? f.centerHz : f.cornerHz);

function output(id: string, kind: ProcessorOutput['kind'], label: string, list: { role: ProcessorFilterRole; filter: ProcessorFilter }[], sampleRateHz: number, frequencyHz: Float64Array, voicing: string | null = null): ProcessorOutput {
  const filters = list.map((f) => ({ ...f, words: filterWords(f.filter) }));
  const nyquistHz = sampleRateHz / 2;
  const tooHigh = filters.filter((f) => filterFrequencyHz(f.filter) >= nyquistHz);
  if (tooHigh.length) {
    const which = tooHigh.map((f) => f.words).join('; ');
    return { id, kind, label, filters, result: null, problem: `${which}: at or above the Nyquist frequency (${hz(nyquistHz)} at ${hz(sampleRateHz)}), so no digital filter can run it. Raise the sample rate or lower the filter.`, voicing };
  }
  try {
    return { id, kind, label, filters, result: processorFilters({ sampleRateHz, filters: filters.map((f) => f.filter), frequencyHz }), problem: null, voicing };
  } catch (error) {
    if (error instanceof RangeError) return { id, kind, label, filters, result: null, problem: error.message, voicing };
    throw error;
  }
}

const crossover = (response: 'highpass' | 'lowpass', slope: Slope, cornerHz: number): ProcessorFilter => ({ kind: 'crossover', family: slope.family, order: slope.order, response, cornerHz });

/**
 * Every output of the finished System as the processor runs it, at the document's sample rate (or `sampleRateHz`):
 * each main channel's high-pass (crossover at bassManagement.crossoverHz, mainsHighpass slope); each sub's low-pass
 * (subLowpass slope) then its EQ; and, with subs, the LFE input's low-pass (LFE_LOWPASS_SLOPE at lfeLowpassHz). Each
 * main and sub output also names its speaker's voicing switch positions (`voicing`), which the speaker runs itself.
 */
export function processorFiltersFromDocument(doc: SystemDocument, options: { sampleRateHz?: number } = {}): SystemProcessorFilters {
  const bm = doc.bassManagement;
  const sampleRateHz = options.sampleRateHz ?? bm.sampleRateHz;
  const frequencyHz = processorGridHz(sampleRateHz);
  const highpass = crossover('highpass', bm.mainsHighpass, bm.crossoverHz);
  const lowpass = crossover('lowpass', bm.subLowpass, bm.crossoverHz);
  const outputs: ProcessorOutput[] = [
    ...doc.speakers.map((s) => output(`main-${s.id}`, 'main', s.channel, [{ role: 'crossover', filter: highpass }], sampleRateHz, frequencyHz, voicingSummary(profileById(doc, s.profileId), s.voicing))),
    ...doc.subs.map((s) =>
      output(`sub-${s.id}`, 'sub', s.name, [{ role: 'crossover', filter: lowpass }, ...s.eq.map((filter) => ({ role: 'eq' as const, filter }))], sampleRateHz, frequencyHz, voicingSummary(profileById(doc, s.profileId), s.voicing)),
    ),
    ...(doc.subs.length ? [output('lfe', 'lfe', 'LFE', [{ role: 'crossover', filter: crossover('lowpass', LFE_LOWPASS_SLOPE, bm.lfeLowpassHz) }], sampleRateHz, frequencyHz)] : []),
  ];
  return { sampleRateHz, convention: BIQUAD_CONVENTION, frequencyHz, outputs };
}

/** x rounded up to two significant digits (never below `floor`), so a stated bound is never smaller than the truth. */
function boundUp(x: number, floor: number): string {
  if (!(x > floor)) return String(floor);
  const step = 10 ** (Math.floor(Math.log10(x)) - 1);
  return String(Number((Math.ceil(x / step - 1e-9) * step).toPrecision(2)));
}

/** "within 0.0021 dB and 0.31° of the analog filter up to 20 kHz (where it is above −40 dB)". */
export function deviationWords(d: DigitalDeviation): string {
  return `within ${boundUp(d.maxDb, 0.001)} dB and ${boundUp(d.maxDeg, 0.01)}° of the analog filter up to ${hz(d.upToHz)} (where it is above −${Math.abs(d.floorDb)} dB)`;
}

/** Outputs that run exactly the same filters, shown once with every label (a 7.1.4 System's mains share one high-pass). */
export interface OutputGroup {
  key: string;
  kind: ProcessorOutput['kind'];
  labels: string[];
  outputs: ProcessorOutput[];
  /** The first output: its filters, sections and responses stand for the group. */
  first: ProcessorOutput;
}

/** Groups outputs of the same kind whose filters are identical, in document order. */
export function groupOutputs(outputs: readonly ProcessorOutput[]): OutputGroup[] {
  const groups = new Map<string, OutputGroup>();
  for (const o of outputs) {
    const key = `${o.kind}:${JSON.stringify(o.filters.map((f) => f.filter))}`;
    const g = groups.get(key);
    if (g) {
      g.labels.push(o.label);
      g.outputs.push(o);
    } else groups.set(key, { key, kind: o.kind, labels: [o.label], outputs: [o], first: o });
  }
  return [...groups.values()];
}

/** What the voicing lines of an output card and of the Settings sheet begin with. */
export const VOICING_NOTE = 'Set on the speaker, not in the processor';

/**
 * The voicing of a group's outputs, one line per distinct setting: without labels when every output of the group has
 * the same (or the group has one output), else with the labels of the outputs set alike. Outputs without switches are
 * left out; none at all gives [].
 */
export function groupVoicing(group: Pick<OutputGroup, 'outputs'>): { labels: string[] | null; text: string }[] {
  const lines = new Map<string, string[]>();
  for (const o of group.outputs) if (o.voicing !== null) lines.set(o.voicing, [...(lines.get(o.voicing) ?? []), o.label]);
  const alike = lines.size === 1 && [...lines.values()][0]!.length === group.outputs.length;
  return [...lines].map(([text, labels]) => ({ labels: alike ? null : labels, text }));
}

/** The sections of an output numbered within it (1, 2, …), each with its filter's index in `filters`. */
export function numberedSections(o: ProcessorOutput): (ProcessorSection & { section: number })[] {
  return (o.result?.sections ?? []).map((s, i) => ({ ...s, section: i + 1 }));
}

// ------------------------------------------------------------------------------------------------ the API

export interface ProcessorFiltersAnswer {
  sampleRateHz: number;
  convention: string;
  /** Full double precision, never rounded. */
  sections: { filter: number; b0: number; b1: number; b2: number; a1: number; a2: number }[];
  response: { frequencyHz: number[]; magnitudeDb: number[]; phaseDeg: number[] };
  analog: { magnitudeDb: number[]; phaseDeg: number[] };
  difference: { magnitudeDb: number[]; phaseDeg: number[] };
  deviation: { maxDb: number; maxDeg: number; upToHz: number; floorDb: number };
}

/** The answer of POST /api/v1/processor-filters: the biquads at full precision, the curves rounded like every compute answer. */
export function computeProcessorFilters(req: ProcessorFiltersRequest): ProcessorFiltersAnswer {
  const frequencyHz = req.grid ? logFrequencyGridHz(req.grid) : processorGridHz(req.sampleRateHz);
  const r = processorFilters({ sampleRateHz: req.sampleRateHz, filters: req.filters, frequencyHz });
  return {
    sampleRateHz: req.sampleRateHz,
    convention: BIQUAD_CONVENTION,
    sections: r.sections.map(({ filter, b0, b1, b2, a1, a2 }) => ({ filter, b0, b1, b2, a1, a2 })),
    // 0.001 Hz, 0.001 dB, 0.01° as the other compute answers; the difference finer (1e-5 dB, 1e-4°), as it is small.
    response: { frequencyHz: roundAllTo(frequencyHz, 3), magnitudeDb: roundAllTo(r.response.magnitudeDb, 3), phaseDeg: roundAllTo(r.response.phaseDeg, 2) },
    analog: { magnitudeDb: roundAllTo(r.analog.magnitudeDb, 3), phaseDeg: roundAllTo(r.analog.phaseDeg, 2) },
    difference: { magnitudeDb: roundAllTo(r.difference.magnitudeDb, 5), phaseDeg: roundAllTo(r.difference.phaseDeg, 4) },
    deviation: { maxDb: roundToSignificant(r.deviation.maxDb, 3), maxDeg: roundToSignificant(r.deviation.maxDeg, 3), upToHz: roundTo(r.deviation.upToHz, 3), floorDb: r.deviation.floorDb },
  };
}
