import { LN_POWER_TO_DB } from '../internal/angles';
import { assertPositive, curveFrequencies } from '../internal/guards';

/** Options of {@link bandPowerAverageDb}. */
export interface BandPowerAverageOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  readonly startHz: number;
  readonly stopHz: number;
}

/** The power average of a band and how many points it took. */
export interface BandPowerAverage {
  /** 10·log10(mean of 10^(L/10)) over the points in [startHz, stopHz], dB. */
  readonly levelDb: number;
  readonly pointCount: number;
}

/**
 * Power average of a curve's points within [startHz, stopHz], each point weighted by its share of
 * log-frequency (half the log distance to each neighbour), so a dense linear-spaced file and a
 * log-spaced one of the same response give the same average (common practice: level matching by a
 * band's energy average).
 * @example bandPowerAverageDb({ frequencyHz: [100, 200, 400], magnitudeDb: [0, 0, 0], startHz: 100, stopHz: 400 }).levelDb // 0
 */
export function bandPowerAverageDb({ frequencyHz, magnitudeDb, startHz, stopHz }: BandPowerAverageOptions): BandPowerAverage {
  const f = curveFrequencies(frequencyHz, magnitudeDb);
  assertPositive('startHz', startHz);
  assertPositive('stopHz', stopHz);
  if (stopHz <= startHz) throw new RangeError(`stopHz must be above startHz (got ${stopHz} ≤ ${startHz})`);
  let lo = 0;
  while (lo < f.length && (f[lo] as number) < startHz) lo++;
  let hi = f.length - 1;
  while (hi >= 0 && (f[hi] as number) > stopHz) hi--;
  if (hi < lo) throw new RangeError(`no point of the curve lies within ${startHz}–${stopHz} Hz`);
  let peak = -Infinity;
  for (let i = lo; i <= hi; i++) peak = Math.max(peak, magnitudeDb[i] as number);
  if (hi === lo) return { levelDb: magnitudeDb[lo] as number, pointCount: 1 };
  let total = 0;
  let weights = 0;
  for (let i = lo; i <= hi; i++) {
    const left = i > lo ? Math.log((f[i] as number) / (f[i - 1] as number)) / 2 : 0;
    const right = i < hi ? Math.log((f[i + 1] as number) / (f[i] as number)) / 2 : 0;
    const w = left + right;
    total += w * Math.exp(((magnitudeDb[i] as number) - peak) / LN_POWER_TO_DB);
    weights += w;
  }
  return { levelDb: peak + LN_POWER_TO_DB * Math.log(total / weights), pointCount: hi - lo + 1 };
}
