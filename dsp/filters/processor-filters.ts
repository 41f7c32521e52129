import { RAD_TO_DEG } from '../internal/angles';
import { positiveFrequencies } from '../internal/guards';
import { filterSections } from './analog-sections';
import { crossoverBiquads } from './bilinear-transform';
import { biquadsResponse } from './biquad-response';
import { allpassBiquad, eqBiquad } from './cookbook-biquads';
import { allpassSection, eqSection } from './eq-sections';
import { sectionsResponse } from './filter-response';
import type { AnalogSection, Biquad, ComplexResponse, ProcessorFilter } from './filter-types';
import { assertSampleRate } from './sample-rate';

/** Most filters one request may list. */
export const MAX_PROCESSOR_FILTERS = 32;

/** The digital biquads of one processor filter (crossover: bilinear, pre-warped; EQ and all-pass: the cookbook). */
export function processorFilterBiquads(filter: ProcessorFilter, sampleRateHz: number, name = 'filter'): Biquad[] {
  if (filter === null || typeof filter !== 'object') throw new RangeError(`${name} must be an object with a kind`);
  switch (filter.kind) {
    case 'crossover':
      return crossoverBiquads(filter, sampleRateHz, name);
    case 'allpass':
      return [allpassBiquad(filter, sampleRateHz, name)];
    case 'peaking':
    case 'low-shelf':
    case 'high-shelf':
      return [eqBiquad(filter, sampleRateHz, name)];
    default:
      throw new RangeError(`${name}.kind must be 'crossover', 'peaking', 'low-shelf', 'high-shelf' or 'allpass' (got ${String((filter as { kind: unknown }).kind)})`);
  }
}

/** The analog prototype of one processor filter, as sections (Butterworth/Linkwitz–Riley, or the cookbook's prototype). */
export function processorFilterSections(filter: ProcessorFilter, name = 'filter'): AnalogSection[] {
  switch (filter.kind) {
    case 'crossover':
      return filterSections({ family: filter.family, order: filter.order, response: filter.response, cornerHz: filter.cornerHz });
    case 'allpass':
      return [allpassSection(filter, name)];
    default:
      return [eqSection(filter, name)];
  }
}

/** A digital section with the index of the filter it belongs to. */
export interface ProcessorSection extends Biquad {
  readonly filter: number;
}

/** How far the digital filters depart from their analog prototype. */
export interface DigitalDeviation {
  /** Largest |digital − analog| level, dB, over the grid up to upToHz where the analog level is at least floorDb. */
  readonly maxDb: number;
  /** Largest phase difference, degrees, over the same points. */
  readonly maxDeg: number;
  readonly upToHz: number;
  readonly floorDb: number;
}

/** Levels below this (in the stop band) are left out of the deviation: there the two differ by design and nobody hears it. */
export const DEVIATION_FLOOR_DB = -40;

/** The deviation is taken up to min(20 kHz, 0.45·sampleRateHz). */
export function deviationLimitHz(sampleRateHz: number): number {
  return Math.min(20000, 0.45 * sampleRateHz);
}

/** Options of {@link processorFilters}. */
export interface ProcessorFiltersOptions {
  readonly sampleRateHz: number;
  readonly filters: readonly ProcessorFilter[];
  /** Grid points at or above the Nyquist frequency are refused. */
  readonly frequencyHz: Float64Array | readonly number[];
}

/** The answer of {@link processorFilters}. */
export interface ProcessorFiltersResult {
  readonly sampleRateHz: number;
  readonly sections: ProcessorSection[];
  /** The digital cascade's exact response. */
  readonly response: ComplexResponse;
  /** The analog prototypes' response. */
  readonly analog: ComplexResponse;
  /** Digital minus analog at every grid point: level dB and phase degrees (−180, 180]. */
  readonly difference: { readonly magnitudeDb: Float64Array; readonly phaseDeg: Float64Array };
  readonly deviation: DigitalDeviation;
}

/**
 * Every filter of a processor output as biquads at one sample rate, their exact digital response, the analog
 * prototype's, and the difference between them.
 * @example processorFilters({ sampleRateHz: 48000, filters: [{ kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }], frequencyHz: [80] }).response.magnitudeDb[0] // −6.0206
 */
export function processorFilters({ sampleRateHz, filters, frequencyHz }: ProcessorFiltersOptions): ProcessorFiltersResult {
  assertSampleRate(sampleRateHz);
  if (!Array.isArray(filters)) throw new RangeError('filters must be a list');
  if (filters.length > MAX_PROCESSOR_FILTERS) throw new RangeError(`filters must hold at most ${MAX_PROCESSOR_FILTERS} filters (got ${filters.length})`);
  // biquadsResponse refuses grid points at or above the Nyquist frequency.
  const f = positiveFrequencies('frequencyHz', frequencyHz);
  const sections: ProcessorSection[] = [];
  const analogSections: AnalogSection[] = [];
  filters.forEach((filter, i) => {
    const name = `filters[${i}]`;
    for (const s of processorFilterBiquads(filter, sampleRateHz, name)) sections.push({ filter: i, ...s });
    analogSections.push(...processorFilterSections(filter, name));
  });
  const response = biquadsResponse(sections, sampleRateHz, f);
  const analog = sectionsResponse(analogSections, f);
  const n = f.length;
  const magnitudeDb = new Float64Array(n);
  const phaseDeg = new Float64Array(n);
  const upToHz = deviationLimitHz(sampleRateHz);
  let maxDb = 0;
  let maxDeg = 0;
  for (let i = 0; i < n; i++) {
    magnitudeDb[i] = (response.magnitudeDb[i] as number) - (analog.magnitudeDb[i] as number);
    // arg(Hd / Ha) = arg(Hd · conj(Ha))
    const dr = response.re[i] as number;
    const di = response.im[i] as number;
    const ar = analog.re[i] as number;
    const ai = analog.im[i] as number;
    const p = Math.atan2(di * ar - dr * ai, dr * ar + di * ai) * RAD_TO_DEG;
    phaseDeg[i] = p === -180 ? 180 : p;
    if ((f[i] as number) <= upToHz && (analog.magnitudeDb[i] as number) >= DEVIATION_FLOOR_DB) {
      maxDb = Math.max(maxDb, Math.abs(magnitudeDb[i] as number));
      maxDeg = Math.max(maxDeg, Math.abs(phaseDeg[i] as number));
    }
  }
  return { sampleRateHz, sections, response, analog, difference: { magnitudeDb, phaseDeg }, deviation: { maxDb, maxDeg, upToHz, floorDb: DEVIATION_FLOOR_DB } };
}
