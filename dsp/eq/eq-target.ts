import { eqSection } from '../filters/eq-sections';
import { sectionsResponse } from '../filters/filter-response';
import { assertInRange, assertPositive, positiveFrequencies } from '../internal/guards';

/**
 * The shape an EQ aims for: flat, or a house curve — a low-frequency rise of `riseDb` below `belowHz`.
 */
export type EqTarget = { readonly kind: 'flat' } | { readonly kind: 'house'; readonly riseDb: number; readonly belowHz: number };

/** Largest house-curve rise, dB. */
export const MAX_HOUSE_RISE_DB = 15;

/** The house curve in words, for the answer and the API page. */
export const HOUSE_CURVE_DEFINITION =
  'the analog magnitude of the Audio EQ Cookbook’s low shelf (R. Bristow-Johnson) with gain riseDb, corner belowHz and shelf slope S = 1: riseDb at the lowest frequencies, riseDb/2 at belowHz, 0 dB well above it, with no overshoot';

/**
 * The target's shape, dB, on a grid: 0 everywhere (flat), or the house curve — the analog magnitude of the cookbook's
 * low shelf at `belowHz` with gain `riseDb` and shelf slope S = 1 (R. Bristow-Johnson, "Cookbook formulae for audio EQ
 * biquad filter coefficients"), evaluated with Seamline's one section evaluator: riseDb/2 at belowHz, → riseDb far below.
 * @example eqTargetDb({ kind: 'house', riseDb: 6, belowHz: 60 }, [60])[0] // 3
 */
export function eqTargetDb(target: EqTarget, frequencyHz: Float64Array | readonly number[]): Float64Array {
  const f = positiveFrequencies('frequencyHz', frequencyHz);
  if (target === null || typeof target !== 'object') throw new RangeError("target must be { kind: 'flat' } or { kind: 'house', riseDb, belowHz }");
  if (target.kind === 'flat') return new Float64Array(f.length);
  if (target.kind !== 'house') throw new RangeError(`target.kind must be 'flat' or 'house' (got ${String((target as { kind: unknown }).kind)})`);
  assertInRange('target.riseDb', target.riseDb, 0, MAX_HOUSE_RISE_DB);
  assertPositive('target.belowHz', target.belowHz);
  if (target.riseDb === 0) return new Float64Array(f.length);
  const shelf = eqSection({ kind: 'low-shelf', cornerHz: target.belowHz, gainDb: target.riseDb, slope: 1 }, 'target');
  return Float64Array.from(sectionsResponse([shelf], f).magnitudeDb);
}
