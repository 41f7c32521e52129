import { assertFiniteArray, assertSameLength, curveFrequencies } from '../internal/guards';
import type { TabulatedFactor } from '../internal/section-plan';
import { phaseUnwrapByDelay } from '../time/phase-unwrap-by-delay';
import type { MeasuredResponse } from './blend-types';

const LN_10_OVER_20 = Math.LN10 / 20;
const DEG_TO_RAD = Math.PI / 180;

/** Prepared once per measured response object: a path run on a measurement is compiled again and again by the sweeps. */
const CACHE = new WeakMap<MeasuredResponse, TabulatedFactor>();

/**
 * A measured response as a factor of a path's plan: its points' ln amplitude and continuous phase. The phase is
 * unwrapped along its group delay (phaseUnwrapByDelay), so a delayed measurement on a sparse log grid keeps its
 * delay; above the last point it turns on at the top group delay. Errors name `${prefix}.frequencyHz` etc.
 * @example measuredFactor({ frequencyHz: [20, 40], magnitudeDb: [0, 0], phaseDeg: [0, 0] }).lnAmplitude // [0, 0]
 */
export function measuredFactor(measured: MeasuredResponse, prefix = 'measured'): TabulatedFactor {
  const hit = CACHE.get(measured);
  if (hit) return hit;
  if (measured === null || typeof measured !== 'object') throw new RangeError(`${prefix} must be an object`);
  let f: Float64Array;
  try {
    f = curveFrequencies(measured.frequencyHz, measured.magnitudeDb);
    assertSameLength('phaseDeg', measured.phaseDeg, f.length);
    assertFiniteArray('phaseDeg', measured.phaseDeg);
  } catch (error) {
    if (error instanceof RangeError) throw new RangeError(`${prefix}.${error.message}`);
    throw error;
  }
  if (f.length < 2) throw new RangeError(`${prefix}.frequencyHz must hold at least 2 points`);
  const n = f.length;
  const unwrapped = phaseUnwrapByDelay(f, measured.phaseDeg);
  const lnHz = new Float64Array(n);
  const lnAmplitude = new Float64Array(n);
  const phaseRad = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    lnHz[i] = Math.log(f[i] as number);
    lnAmplitude[i] = LN_10_OVER_20 * (measured.magnitudeDb[i] as number);
    phaseRad[i] = DEG_TO_RAD * (unwrapped.unwrappedDeg[i] as number);
  }
  const factor: TabulatedFactor = { hz: f, lnHz, lnAmplitude, phaseRad, topGroupDelayS: unwrapped.topGroupDelayS };
  CACHE.set(measured, factor);
  return factor;
}
