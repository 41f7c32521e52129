import { RAD_TO_DEG, wrapDeg } from '../internal/angles';
import { complexLevelDb } from '../internal/complex';
import { MAX_PATHS } from '../blend/blend-types';
import { applyPathToMeasured } from './apply-path-to-measured';
import type { MeasuredPathInput } from './measured-types';

/** Options of {@link predictMeasuredBlend}. */
export interface PredictMeasuredBlendOptions {
  /** Shared grid of every measured path (resample first when they differ). */
  readonly frequencyHz: Float64Array | readonly number[];
  readonly measured: readonly MeasuredPathInput[];
  readonly temperatureC: number;
}

/** One processed path of a predicted blend. */
export interface MeasuredPathCurves {
  readonly name: string;
  readonly magnitudeDb: Float64Array;
  readonly phaseDeg: Float64Array;
  readonly phaseEstimated: boolean;
}

/** Predicted blend at the measurement seat. */
export interface MeasuredBlendResult {
  readonly frequencyHz: Float64Array;
  readonly paths: MeasuredPathCurves[];
  readonly sum: { readonly magnitudeDb: Float64Array; readonly phaseDeg: Float64Array };
  /** True when any path's phase was estimated as minimum phase. */
  readonly phaseEstimated: boolean;
}

/**
 * Predicts the blend at the seat from measured paths with the System's filters, gains, delays and polarity applied
 * (complex sum; estimated phase where missing).
 * @example predictMeasuredBlend({ frequencyHz, measured: [mainsMeasured, subMeasured], temperatureC: 20 }).sum.magnitudeDb
 */
export function predictMeasuredBlend({ frequencyHz, measured, temperatureC }: PredictMeasuredBlendOptions): MeasuredBlendResult {
  if (!Array.isArray(measured) || measured.length === 0) throw new RangeError('measured must hold at least one path');
  if (measured.length > MAX_PATHS) throw new RangeError(`measured must hold at most ${MAX_PATHS} paths`);
  const processed = measured.map((m) =>
    applyPathToMeasured({ frequencyHz, magnitudeDb: m.magnitudeDb, ...(m.phaseDeg ? { phaseDeg: m.phaseDeg } : {}), path: m.path, temperatureC }),
  );
  const first = processed[0];
  if (!first) throw new RangeError('measured must hold at least one path');
  const n = first.frequencyHz.length;
  const magnitudeDb = new Float64Array(n);
  const phaseDeg = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let r = 0;
    let m = 0;
    for (const p of processed) {
      r += p.re[i] as number;
      m += p.im[i] as number;
    }
    magnitudeDb[i] = complexLevelDb(r, m);
    phaseDeg[i] = wrapDeg(Math.atan2(m, r) * RAD_TO_DEG);
  }
  return {
    frequencyHz: first.frequencyHz,
    paths: processed.map((p, k) => ({ name: String(measured[k]?.path.name ?? ''), magnitudeDb: p.magnitudeDb, phaseDeg: p.phaseDeg, phaseEstimated: p.phaseEstimated })),
    sum: { magnitudeDb, phaseDeg },
    phaseEstimated: processed.some((p) => p.phaseEstimated),
  };
}
