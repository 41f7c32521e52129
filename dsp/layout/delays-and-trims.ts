import { speedOfSoundMps } from '../air/speed-of-sound';

/** Options of {@link delaysAndTrims}. */
export interface DelaysAndTrimsOptions {
  readonly distancesM: Float64Array | readonly number[];
  readonly temperatureC: number;
}

/** Per-speaker delay and level trim relative to the farthest speaker. */
export interface DelaysAndTrims {
  /** (d_max − d)/c: the farthest gets 0 ms, nearer ones wait for it. */
  readonly delaysMs: Float64Array;
  /** 20·log10(d / d_max) ≤ 0: nearer speakers are turned down by their inverse-square advantage. */
  readonly trimsDb: Float64Array;
  readonly farthestIndex: number;
  readonly farthestDistanceM: number;
}

/**
 * Processor delays and trims from distances (processor convention: the farthest speaker gets 0 ms; trims from the
 * inverse-square law, free field — a measured level match supersedes them).
 * @example delaysAndTrims({ distancesM: [3, 2], temperatureC: 20 }).delaysMs // [0, 2.914]
 */
export function delaysAndTrims({ distancesM, temperatureC }: DelaysAndTrimsOptions): DelaysAndTrims {
  const c = speedOfSoundMps(temperatureC);
  if (distancesM.length === 0) throw new RangeError('distancesM must hold at least one distance');
  let farthestIndex = 0;
  for (let i = 0; i < distancesM.length; i++) {
    const d = distancesM[i] as number;
    if (!Number.isFinite(d) || d <= 0) throw new RangeError(`distancesM[${i}] must be a finite distance greater than 0 (got ${String(d)})`);
    if (d > (distancesM[farthestIndex] as number)) farthestIndex = i;
  }
  const farthestDistanceM = distancesM[farthestIndex] as number;
  const delaysMs = new Float64Array(distancesM.length);
  const trimsDb = new Float64Array(distancesM.length);
  for (let i = 0; i < distancesM.length; i++) {
    const d = distancesM[i] as number;
    delaysMs[i] = (1000 * (farthestDistanceM - d)) / c;
    trimsDb[i] = 20 * Math.log10(d / farthestDistanceM);
  }
  return { delaysMs, trimsDb, farthestIndex, farthestDistanceM };
}
