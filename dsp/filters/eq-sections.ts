import { assertFinite, assertInRange, assertPositive } from '../internal/guards';
import type { AllpassFilter, AnalogSection, EqFilter } from './filter-types';

// The analog prototypes of the Audio EQ Cookbook's filters (R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad
// filter coefficients"; W3C Audio EQ Cookbook note, 2021), written as Seamline's analog sections so that a path's
// voicing is evaluated by the one section evaluator. With A = 10^(gainDb/40) and x = s/ω0 the cookbook gives
//   peaking     H = (x² + x·A/Q + 1) / (x² + x/(A·Q) + 1)
//   low shelf   H = A·(x² + x·√A/Q + A) / (A·x² + x·√A/Q + 1)
//   high shelf  H = A·(A·x² + x·√A/Q + 1) / (x² + x·√A/Q + A)
// Normalising each denominator to 1 + y/Q′ + y² moves a shelf's pole pair to ω0/√A (low) or ω0·√A (high) with Q′ = Q,
// and its numerator becomes [A², A/Q, 1] (low) or [1, A/Q, A²] (high) in powers of y — worked by hand from the above.

/** Limits of an EQ filter's fields (the API and the schemas use the same). */
export const EQ_LIMITS = { gainDb: { min: -24, max: 24 }, q: { min: 0.1, max: 20 }, slope: { min: 0.1, max: 1 } } as const;

/** A shelf's Q: its own, or from the cookbook's shelf slope S, 1/Q = √((A + 1/A)·(1/S − 1) + 2); default S = 1. */
export function shelfQ(filter: Extract<EqFilter, { kind: 'low-shelf' | 'high-shelf' }>, name = 'filter'): number {
  if (filter.q !== undefined) {
    assertInRange(`${name}.q`, filter.q, EQ_LIMITS.q.min, EQ_LIMITS.q.max);
    return filter.q;
  }
  const slope = filter.slope ?? 1;
  assertInRange(`${name}.slope`, slope, EQ_LIMITS.slope.min, EQ_LIMITS.slope.max);
  const a = Math.pow(10, filter.gainDb / 40);
  return 1 / Math.sqrt((a + 1 / a) * (1 / slope - 1) + 2);
}

/** Checks an EQ filter's fields; errors name `name.field`. */
export function assertEqFilter(filter: EqFilter, name = 'filter'): void {
  if (filter === null || typeof filter !== 'object') throw new RangeError(`${name} must be an object with a kind`);
  assertFinite(`${name}.gainDb`, filter.gainDb);
  assertInRange(`${name}.gainDb`, filter.gainDb, EQ_LIMITS.gainDb.min, EQ_LIMITS.gainDb.max);
  if (filter.kind === 'peaking') {
    assertPositive(`${name}.centerHz`, filter.centerHz);
    assertInRange(`${name}.q`, filter.q, EQ_LIMITS.q.min, EQ_LIMITS.q.max);
  } else if (filter.kind === 'low-shelf' || filter.kind === 'high-shelf') {
    assertPositive(`${name}.cornerHz`, filter.cornerHz);
    shelfQ(filter, name);
  } else {
    throw new RangeError(`${name}.kind must be 'peaking', 'low-shelf' or 'high-shelf' (got ${String((filter as { kind: unknown }).kind)})`);
  }
}

/** The analog section of one EQ filter (cookbook prototype); a 0 dB filter is a section equal to 1. */
export function eqSection(filter: EqFilter, name = 'filter'): AnalogSection {
  assertEqFilter(filter, name);
  const a = Math.pow(10, filter.gainDb / 40);
  if (filter.kind === 'peaking') {
    return { kind: 'general2', cornerHz: filter.centerHz, q: a * filter.q, numerator: [1, a / filter.q, 1] };
  }
  const q = shelfQ(filter, name);
  const sqrtA = Math.sqrt(a);
  return filter.kind === 'low-shelf'
    ? { kind: 'general2', cornerHz: filter.cornerHz / sqrtA, q, numerator: [a * a, a / q, 1] }
    : { kind: 'general2', cornerHz: filter.cornerHz * sqrtA, q, numerator: [1, a / q, a * a] };
}

/** The analog sections of a list of EQ filters (at most 20); errors name `name[i].field`. */
export function eqSections(filters: readonly EqFilter[] | undefined, name = 'eq'): AnalogSection[] {
  if (filters === undefined) return [];
  if (!Array.isArray(filters)) throw new RangeError(`${name} must be a list of filters`);
  if (filters.length > 20) throw new RangeError(`${name} must hold at most 20 filters (got ${filters.length})`);
  return filters.map((f, i) => eqSection(f, `${name}[${i}]`));
}

/** The analog all-pass: first order (1 − x)/(1 + x); second order (1 − x/Q + x²)/(1 + x/Q + x²). */
export function allpassSection(filter: AllpassFilter, name = 'filter'): AnalogSection {
  assertPositive(`${name}.cornerHz`, filter.cornerHz);
  if (filter.order === 1) return { kind: 'general1', cornerHz: filter.cornerHz, q: 0.5, numerator: [1, -1, 0] };
  if (filter.order !== 2) throw new RangeError(`${name}.order must be 1 or 2 for an all-pass (got ${String(filter.order)})`);
  const q = filter.q ?? Math.SQRT1_2;
  assertInRange(`${name}.q`, q, EQ_LIMITS.q.min, EQ_LIMITS.q.max);
  return { kind: 'general2', cornerHz: filter.cornerHz, q, numerator: [1, -1 / q, 1] };
}
