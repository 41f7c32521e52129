import { assertFiniteArray, assertSameLength, curveFrequencies, positiveFrequencies } from '../internal/guards';
import { interpolateLogHz } from '../internal/interpolate';
import { unwrapDeg } from './unwrap-phase';
import { wrapDeg } from '../internal/angles';

/** Options of {@link resampleCurve}. */
export interface ResampleCurveOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  readonly phaseDeg?: Float64Array | readonly number[];
  readonly targetHz: Float64Array | readonly number[];
}

/** A curve on the target grid. */
export interface ResampledCurve {
  readonly frequencyHz: Float64Array;
  readonly magnitudeDb: Float64Array;
  /** Present when the input had phase; wrapped to (−180, 180]. */
  readonly phaseDeg?: Float64Array;
  /** Target points outside the measured range, which hold the nearest end value. */
  readonly outsideCount: number;
}

/**
 * Resamples a measured curve to a grid: linear in log-frequency, phase unwrapped before and re-wrapped after;
 * points outside the measured range hold the end values (common practice).
 * @example resampleCurve({ frequencyHz: [10, 100], magnitudeDb: [0, 20], targetHz: [31.62] }).magnitudeDb[0] // ≈ 10
 */
export function resampleCurve({ frequencyHz, magnitudeDb, phaseDeg, targetHz }: ResampleCurveOptions): ResampledCurve {
  const f = curveFrequencies(frequencyHz, magnitudeDb);
  const target = positiveFrequencies('targetHz', targetHz);
  const magnitude = new Float64Array(target.length);
  let unwrapped: Float64Array | undefined;
  if (phaseDeg !== undefined) {
    assertSameLength('phaseDeg', phaseDeg, f.length);
    assertFiniteArray('phaseDeg', phaseDeg);
    unwrapped = unwrapDeg(phaseDeg);
  }
  const phase = unwrapped ? new Float64Array(target.length) : undefined;
  let outsideCount = 0;
  const lo = f[0] as number;
  const hi = f[f.length - 1] as number;
  for (let i = 0; i < target.length; i++) {
    const t = target[i] as number;
    if (t < lo * (1 - 1e-12) || t > hi * (1 + 1e-12)) outsideCount++;
    magnitude[i] = interpolateLogHz(f, magnitudeDb, t);
    if (phase && unwrapped) phase[i] = wrapDeg(interpolateLogHz(f, unwrapped, t));
  }
  return phase
    ? { frequencyHz: Float64Array.from(target), magnitudeDb: magnitude, phaseDeg: phase, outsideCount }
    : { frequencyHz: Float64Array.from(target), magnitudeDb: magnitude, outsideCount };
}
