import { RAD_TO_DEG } from '../internal/angles';
import { complexLevelDb } from '../internal/complex';
import { assertPositive, positiveFrequencies } from '../internal/guards';
import { compileSections, evaluatePlanOnGrid, planValues } from '../internal/section-plan';
import { filterSections, MAX_SECTION_Q, rolloffSections } from './analog-sections';
import type { AnalogSection, ComplexResponse, FilterSpec, RolloffChain } from './filter-types';

/** Complex response of a product of analog sections on a grid (analytic group delay). */
export function sectionsResponse(sections: readonly AnalogSection[], frequencyHz: Float64Array | readonly number[]): ComplexResponse {
  const f = positiveFrequencies('frequencyHz', frequencyHz);
  const plan = compileSections(sections, 1);
  const n = f.length;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  const magnitudeDb = new Float64Array(n);
  const phaseDeg = new Float64Array(n);
  const groupDelayMs = new Float64Array(n);
  const h = planValues(n);
  evaluatePlanOnGrid(plan, Float64Array.from(f, (x) => 2 * Math.PI * x), h);
  for (let i = 0; i < n; i++) {
    const r = h.re[i] as number;
    const m = h.im[i] as number;
    re[i] = r;
    im[i] = m;
    magnitudeDb[i] = complexLevelDb(r, m);
    const p = Math.atan2(m, r) * RAD_TO_DEG;
    phaseDeg[i] = p === -180 ? 180 : p;
    groupDelayMs[i] = -1000 * (h.dIm[i] as number);
  }
  return { frequencyHz: Float64Array.from(f), re, im, magnitudeDb, phaseDeg, groupDelayMs };
}

/** Options of {@link filterResponse}. */
export interface FilterResponseOptions {
  readonly filter: FilterSpec;
  readonly frequencyHz: Float64Array | readonly number[];
}

/**
 * Complex response of a Butterworth (1–8) or Linkwitz–Riley (2, 4, 8) analog low-/high-pass (Butterworth 1930;
 * Linkwitz 1976). Magnitude dB, phase deg (−180, 180], group delay ms.
 * @example filterResponse({ filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, frequencyHz: [80] }).magnitudeDb[0] // −3.0103
 */
export function filterResponse({ filter, frequencyHz }: FilterResponseOptions): ComplexResponse {
  return sectionsResponse(filterSections(filter), frequencyHz);
}

/** Options of {@link rolloffResponse}. */
export interface RolloffResponseOptions {
  /** One roll-off or a list applied together. */
  readonly rolloff: RolloffChain;
  readonly frequencyHz: Float64Array | readonly number[];
}

/**
 * Complex response of a speaker's natural roll-off (sealed: Small 1972; vented B4: Thiele 1971).
 * @example rolloffResponse({ rolloff: { kind: 'sealed', cornerHz: 50, q: 0.707 }, frequencyHz: [50] }).magnitudeDb[0] // −3.01
 */
export function rolloffResponse({ rolloff, frequencyHz }: RolloffResponseOptions): ComplexResponse {
  return sectionsResponse(rolloffSections(rolloff), frequencyHz);
}

/** Options of {@link secondOrderSectionResponse}. */
export interface SecondOrderSectionOptions {
  readonly response: 'lowpass' | 'highpass';
  readonly cornerHz: number;
  readonly q: number;
  readonly frequencyHz: Float64Array | readonly number[];
}

/**
 * One second-order section of any Q: 1/(1 + s/(Qω0) + s²/ω0²) or (s²/ω0²)/(…); at the corner its level is 20·log10(Q).
 * @example secondOrderSectionResponse({ response: 'lowpass', cornerHz: 100, q: 2, frequencyHz: [100] }).magnitudeDb[0] // 6.02
 */
export function secondOrderSectionResponse({ response, cornerHz, q, frequencyHz }: SecondOrderSectionOptions): ComplexResponse {
  assertPositive('cornerHz', cornerHz);
  assertPositive('q', q);
  if (q > MAX_SECTION_Q) throw new RangeError(`q must be at most ${MAX_SECTION_Q} (got ${q})`);
  if (response !== 'lowpass' && response !== 'highpass') throw new RangeError(`response must be 'lowpass' or 'highpass' (got ${String(response)})`);
  return sectionsResponse([{ kind: response === 'lowpass' ? 'lowpass2' : 'highpass2', cornerHz, q }], frequencyHz);
}
