import { wrapDeg } from '../internal/angles';
import { assertIntegerInRange, assertPositive } from '../internal/guards';
import { interpolateLogHz } from '../internal/interpolate';
import type { BlendResult } from './blend-types';

/** Options of {@link blendMetrics}. */
export interface BlendMetricsOptions {
  readonly crossoverHz: number;
  /** Path taken as the mains for the phase difference (default 0). */
  readonly mainsIndex?: number;
  /** Path taken as the sub (default 1). */
  readonly subIndex?: number;
}

/** Read-outs of one blend at its crossover (flatness, dips and the −3 dB point are assessBlend's: one measure). */
export interface BlendMetrics {
  readonly crossoverHz: number;
  /** Each path's level at the crossover, dB (interpolated in log-frequency). */
  readonly pathLevelsDb: number[];
  readonly sumLevelDb: number;
  /** Mains phase minus sub phase at the crossover, (−180, 180]; NaN with one path. */
  readonly phaseDifferenceDeg: number;
}

/**
 * Blend read-outs at the crossover: each path's level, the sum's level and the phase difference between the mains and
 * the sub there (interpolated in log-frequency on the blend's own grid).
 * @example blendMetrics(blendResponse({ … LR4 pair at 80 Hz … }), { crossoverHz: 80 }).sumLevelDb // ≈ 0
 */
export function blendMetrics(result: BlendResult, options: BlendMetricsOptions): BlendMetrics {
  const { crossoverHz } = options;
  assertPositive('crossoverHz', crossoverHz);
  const f = result.frequencyHz;
  const n = f.length;
  const fLow = f[0] as number;
  const fHigh = f[n - 1] as number;
  if (crossoverHz < fLow || crossoverHz > fHigh) {
    throw new RangeError(`crossoverHz must lie within the grid ${fLow}..${fHigh} Hz (got ${crossoverHz})`);
  }
  const pathCount = result.paths.length;
  const mainsIndex = options.mainsIndex ?? 0;
  const subIndex = options.subIndex ?? Math.min(1, pathCount - 1);
  assertIntegerInRange('mainsIndex', mainsIndex, 0, Math.max(0, pathCount - 1));
  assertIntegerInRange('subIndex', subIndex, 0, Math.max(0, pathCount - 1));
  const pathLevelsDb = result.paths.map((p) => interpolateLogHz(f, p.magnitudeDb, crossoverHz));
  const sumLevelDb = interpolateLogHz(f, result.sum.magnitudeDb, crossoverHz);
  const mains = result.paths[mainsIndex];
  const sub = result.paths[subIndex];
  const phaseDifferenceDeg =
    pathCount >= 2 && mains && sub
      ? wrapDeg(interpolateLogHz(f, mains.unwrappedPhaseDeg, crossoverHz) - interpolateLogHz(f, sub.unwrappedPhaseDeg, crossoverHz))
      : NaN;
  return { crossoverHz, pathLevelsDb, sumLevelDb, phaseDifferenceDeg };
}
