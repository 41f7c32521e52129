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

/** Read-outs of one blend. Deviations are relative to referenceLevelDb. */
export interface BlendMetrics {
  readonly crossoverHz: number;
  /** Each path's level at the crossover, dB (interpolated in log-frequency). */
  readonly pathLevelsDb: number[];
  readonly sumLevelDb: number;
  /** Mains phase minus sub phase at the crossover, (−180, 180]; NaN with one path. */
  readonly phaseDifferenceDeg: number;
  /** Reference: the sum's level two octaves above the crossover (the mains' passband), or at the grid's top if it stops sooner. */
  readonly referenceHz: number;
  readonly referenceLevelDb: number;
  /** Signed deviation with the largest size within one octave either side of the crossover, dB. */
  readonly maxDeviationDb: number;
  readonly maxDeviationHz: number;
  /** Highest minus lowest level of the sum within ±1 octave, dB. */
  readonly peakToPeakDb: number;
  /** Lowest level of the sum within ±1 octave relative to the reference, dB, and where. */
  readonly deepestDipDb: number;
  readonly deepestDipHz: number;
  /** Where the sum's low-frequency roll-off crosses reference − 3 dB; null when it is still above at the grid's bottom. */
  readonly minus3DbHz: number | null;
}

/**
 * Blend read-outs at and around the crossover (definitions in BlendMetrics; the reference choice is ours: the
 * level two octaves above the crossover).
 * @example blendMetrics(blendResponse({ … LR4 pair at 80 Hz … }), { crossoverHz: 80 }).maxDeviationDb // ≈ 0
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
  const sum = result.sum.magnitudeDb;
  const pathLevelsDb = result.paths.map((p) => interpolateLogHz(f, p.magnitudeDb, crossoverHz));
  const sumLevelDb = interpolateLogHz(f, sum, crossoverHz);
  const mains = result.paths[mainsIndex];
  const sub = result.paths[subIndex];
  const phaseDifferenceDeg =
    pathCount >= 2 && mains && sub
      ? wrapDeg(interpolateLogHz(f, mains.unwrappedPhaseDeg, crossoverHz) - interpolateLogHz(f, sub.unwrappedPhaseDeg, crossoverHz))
      : NaN;
  const referenceHz = Math.min(4 * crossoverHz, fHigh);
  const referenceLevelDb = interpolateLogHz(f, sum, referenceHz);
  let maxDeviationDb = 0;
  let maxDeviationHz = crossoverHz;
  let lowest = Infinity;
  let highest = -Infinity;
  let deepestDipHz = crossoverHz;
  const lo = crossoverHz / 2;
  const hi = crossoverHz * 2;
  for (let i = 0; i < n; i++) {
    const fi = f[i] as number;
    if (fi < lo * (1 - 1e-12) || fi > hi * (1 + 1e-12)) continue;
    const d = (sum[i] as number) - referenceLevelDb;
    if (Math.abs(d) > Math.abs(maxDeviationDb)) {
      maxDeviationDb = d;
      maxDeviationHz = fi;
    }
    if (d < lowest) {
      lowest = d;
      deepestDipHz = fi;
    }
    if (d > highest) highest = d;
  }
  if (lowest === Infinity) {
    const d = sumLevelDb - referenceLevelDb;
    lowest = highest = maxDeviationDb = d;
  }
  let minus3DbHz: number | null = null;
  const threshold = referenceLevelDb - 3;
  if ((sum[0] as number) < threshold) {
    for (let i = 1; i < n; i++) {
      const v = sum[i] as number;
      if (v >= threshold) {
        const v0 = sum[i - 1] as number;
        const t = (threshold - v0) / (v - v0);
        const f0 = f[i - 1] as number;
        minus3DbHz = f0 * Math.pow((f[i] as number) / f0, t);
        break;
      }
    }
  }
  return {
    crossoverHz,
    pathLevelsDb,
    sumLevelDb,
    phaseDifferenceDeg,
    referenceHz,
    referenceLevelDb,
    maxDeviationDb,
    maxDeviationHz,
    peakToPeakDb: highest - lowest,
    deepestDipDb: lowest,
    deepestDipHz,
    minus3DbHz,
  };
}
