import { speedOfSoundMps } from '../air/speed-of-sound';
import type { PathSpec } from '../blend/blend-types';
import { compilePath } from '../blend/path-plan';
import { DEG_TO_RAD, RAD_TO_DEG, wrapDeg } from '../internal/angles';
import { writeTimesPolar } from '../internal/complex';
import { assertFiniteArray, assertSameLength, curveFrequencies } from '../internal/guards';
import { evaluatePlanOnGrid, planValues } from '../internal/section-plan';
import { minimumPhaseDeg } from './minimum-phase';

/** Options of {@link applyPathToMeasured}. */
export interface ApplyPathOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  /** Measured phase; when absent the minimum phase is estimated (and phaseEstimated is true). */
  readonly phaseDeg?: Float64Array | readonly number[];
  /**
   * Crossover filter, EQ, gain, delayMs and polarity to apply. The roll-off is ignored (the measurement holds it); the
   * caller passes only the EQ the measurement does not hold (the processor's, not a speaker's voicing switch).
   */
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
 * Applies a path's crossover filter, EQ, gain, delay and polarity to a measured complex response (product of the
 * measurement and the analog filter, times e^(−jωτ)); missing phase is estimated as minimum phase.
 * @example applyPathToMeasured({ frequencyHz, magnitudeDb, path: sub, temperatureC: 20 }).phaseEstimated // true
 */
export function applyPathToMeasured(options: ApplyPathOptions): ProcessedMeasurement {
  const f = curveFrequencies(options.frequencyHz, options.magnitudeDb);
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
  const out = { re, im, magnitudeDb };
  for (let i = 0; i < n; i++) {
    // The filter's H times the measurement (its level and phase, less the delay's ωτ).
    const mag = Math.pow(10, (options.magnitudeDb[i] as number) / 20);
    writeTimesPolar(out, i, h.re[i] as number, h.im[i] as number, mag, (phase[i] as number) * DEG_TO_RAD - (omega[i] as number) * compiled.delayS);
    phaseDeg[i] = wrapDeg(Math.atan2(im[i] as number, re[i] as number) * RAD_TO_DEG);
  }
  return { frequencyHz: Float64Array.from(f), re, im, magnitudeDb, phaseDeg, phaseEstimated };
}
