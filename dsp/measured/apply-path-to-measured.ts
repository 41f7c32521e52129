import { speedOfSoundMps } from '../air/speed-of-sound';
import type { PathSpec } from '../blend/blend-types';
import { compilePath } from '../blend/path-plan';
import { DEG_TO_RAD, LN_POWER_TO_DB, RAD_TO_DEG, wrapDeg } from '../internal/angles';
import { assertAscending, assertFiniteArray, assertSameLength, positiveFrequencies } from '../internal/guards';
import { evaluatePlanOnGrid, planValues } from '../internal/section-plan';
import { minimumPhaseDeg } from './minimum-phase';

/** Options of {@link applyPathToMeasured}. */
export interface ApplyPathOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  /** Measured phase; when absent the minimum phase is estimated (and phaseEstimated is true). */
  readonly phaseDeg?: Float64Array | readonly number[];
  /** Crossover filter, gain, delayMs and polarity to apply. The roll-off is ignored (the measurement holds it). */
  readonly path: PathSpec;
  readonly temperatureC: number;
  /** Also add the air path distanceM / c (default false: the measurement already holds the distance). */
  readonly includeDistance?: boolean;
}

/** A measured response with the processor settings applied. */
export interface ProcessedMeasurement {
  readonly frequencyHz: Float64Array;
  readonly re: Float64Array;
  readonly im: Float64Array;
  readonly magnitudeDb: Float64Array;
  /** Wrapped to (−180, 180]. */
  readonly phaseDeg: Float64Array;
  readonly phaseEstimated: boolean;
}

/**
 * Applies a path's crossover filter, gain, delay and polarity to a measured complex response (product of the
 * measurement and the analog filter, times e^(−jωτ)); missing phase is estimated as minimum phase.
 * @example applyPathToMeasured({ frequencyHz, magnitudeDb, path: sub, temperatureC: 20 }).phaseEstimated // true
 */
export function applyPathToMeasured(options: ApplyPathOptions): ProcessedMeasurement {
  const f = positiveFrequencies('frequencyHz', options.frequencyHz);
  assertAscending('frequencyHz', f);
  assertSameLength('magnitudeDb', options.magnitudeDb, f.length);
  assertFiniteArray('magnitudeDb', options.magnitudeDb);
  let phase: ArrayLike<number>;
  let phaseEstimated = false;
  if (options.phaseDeg !== undefined) {
    assertSameLength('phaseDeg', options.phaseDeg, f.length);
    assertFiniteArray('phaseDeg', options.phaseDeg);
    phase = options.phaseDeg;
  } else {
    phase = minimumPhaseDeg({ frequencyHz: f, magnitudeDb: options.magnitudeDb }).unwrappedPhaseDeg;
    phaseEstimated = true;
  }
  const speed = speedOfSoundMps(options.temperatureC);
  const withoutRolloff: PathSpec = { ...options.path, rolloff: { kind: 'none' }, distanceM: options.includeDistance ? options.path.distanceM : 0 };
  const compiled = compilePath(withoutRolloff, speed, 'path');
  const n = f.length;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  const magnitudeDb = new Float64Array(n);
  const phaseDeg = new Float64Array(n);
  const omega = Float64Array.from(f, (x) => 2 * Math.PI * x);
  const h = planValues(n);
  evaluatePlanOnGrid(compiled.plan, omega, h);
  for (let i = 0; i < n; i++) {
    const w = omega[i] as number;
    const mag = Math.pow(10, (options.magnitudeDb[i] as number) / 20);
    const ph = (phase[i] as number) * DEG_TO_RAD - w * compiled.delayS;
    const mr = mag * Math.cos(ph);
    const mi = mag * Math.sin(ph);
    const hr = h.re[i] as number;
    const hi = h.im[i] as number;
    const r = mr * hr - mi * hi;
    const m = mr * hi + mi * hr;
    re[i] = r;
    im[i] = m;
    magnitudeDb[i] = LN_POWER_TO_DB * Math.log(r * r + m * m + 1e-300);
    phaseDeg[i] = wrapDeg(Math.atan2(m, r) * RAD_TO_DEG);
  }
  return { frequencyHz: Float64Array.from(f), re, im, magnitudeDb, phaseDeg, phaseEstimated };
}
