import type { PathSpec } from '../blend/blend-types';
import { blendSumResponse } from '../blend/blend-sum';
import { blendGrid, type BlendGrid } from '../blend/blend-kernel';
import { assertInRange, assertPositive } from '../internal/guards';

/**
 * The one flatness measure of Seamline: the largest deviation of the sum from its own level in the mains' passband
 * (two octaves above the crossover, 4·fc), over fc/2 … 2·fc, at 48 points per octave. Every screen, read-out,
 * ranking, recommendation and API answer that says "flatness" means this number.
 */
export const FLATNESS_DEFINITION = {
  bandLowRatio: 0.5,
  bandHighRatio: 2,
  referenceRatio: 4,
  pointsPerOctave: 48,
  text: 'largest deviation of the sum from its level at 4·fc, over fc/2 … 2·fc',
} as const;

/** Lowest frequency the assessment looks at, Hz (the system −3 dB point is reported as "below" when the sum is still up here). */
export const ASSESSMENT_FLOOR_HZ = 5;

/** Options of {@link assessBlend}. */
export interface AssessBlendOptions {
  readonly temperatureC: number;
  readonly paths: readonly PathSpec[];
  readonly crossoverHz: number;
}

/** What a blend does around its crossover and below it; levels relative to the sum at 4·fc. */
export interface BlendAssessment {
  readonly crossoverHz: number;
  /** The flatness band, Hz: [fc/2, 2·fc]. */
  readonly bandHz: readonly [number, number];
  readonly referenceHz: number;
  readonly referenceLevelDb: number;
  /** The flatness measure, dB ≥ 0 (see FLATNESS_DEFINITION). */
  readonly flatnessDb: number;
  /** The same deviation with its sign, and where. */
  readonly maxDeviationDb: number;
  readonly maxDeviationHz: number;
  /** Lowest level within the band relative to the reference, dB, and where. */
  readonly deepestDipDb: number;
  readonly deepestDipHz: number;
  /** Sum level at the crossover relative to the reference, dB. */
  readonly crossoverLevelDb: number;
  /** Where the sum's low end falls to reference − 3 dB; null when it is still above at ASSESSMENT_FLOOR_HZ. */
  readonly minus3DbHz: number | null;
  /** The grid and the sum's level on it relative to the reference (for band levels). */
  readonly frequencyHz: Float64Array;
  readonly relativeDb: Float64Array;
}

const GRID_CACHE = new Map<number, BlendGrid>();

/** fc·2^(k/48) from the floor up to 4·fc, so fc/2, fc, 2·fc and 4·fc are grid points. */
export function assessmentGrid(crossoverHz: number): BlendGrid {
  const hit = GRID_CACHE.get(crossoverHz);
  if (hit) return hit;
  const ppo = FLATNESS_DEFINITION.pointsPerOctave;
  const kLow = Math.min(-2 * ppo, Math.floor(ppo * Math.log2(ASSESSMENT_FLOOR_HZ / crossoverHz)));
  const kHigh = 2 * ppo;
  const f: number[] = [];
  for (let k = kLow; k <= kHigh; k++) f.push(crossoverHz * Math.pow(2, k / ppo));
  const grid = blendGrid(f);
  if (GRID_CACHE.size > 64) GRID_CACHE.clear();
  GRID_CACHE.set(crossoverHz, grid);
  return grid;
}

/**
 * Assesses a blend with the one flatness measure, the deepest dip, the level at the crossover and the system −3 dB
 * point (the reference is the mains' passband, two octaves above the crossover — our choice, documented on the API page).
 * @example assessBlend({ temperatureC: 20, paths: [lr4High80, lr4Low80], crossoverHz: 80 }).flatnessDb // ≈ 0 (Linkwitz 1976)
 */
export function assessBlend({ temperatureC, paths, crossoverHz }: AssessBlendOptions): BlendAssessment {
  assertPositive('crossoverHz', crossoverHz);
  assertInRange('crossoverHz', crossoverHz, 10, 24000);
  const grid = assessmentGrid(crossoverHz);
  const { sum } = blendSumResponse({ temperatureC, frequencyHz: grid, paths });
  const f = grid.frequencyHz;
  const n = f.length;
  const ppo = FLATNESS_DEFINITION.pointsPerOctave;
  const refIndex = n - 1;
  const crossoverIndex = n - 1 - 2 * ppo;
  const bandLow = crossoverIndex - ppo;
  const bandHigh = crossoverIndex + ppo;
  const referenceLevelDb = sum.magnitudeDb[refIndex] as number;
  const relativeDb = new Float64Array(n);
  for (let i = 0; i < n; i++) relativeDb[i] = (sum.magnitudeDb[i] as number) - referenceLevelDb;
  let maxDeviationDb = 0;
  let maxDeviationHz = crossoverHz;
  let deepestDipDb = Infinity;
  let deepestDipHz = crossoverHz;
  for (let i = bandLow; i <= bandHigh; i++) {
    const d = relativeDb[i] as number;
    if (Math.abs(d) > Math.abs(maxDeviationDb)) {
      maxDeviationDb = d;
      maxDeviationHz = f[i] as number;
    }
    if (d < deepestDipDb) {
      deepestDipDb = d;
      deepestDipHz = f[i] as number;
    }
  }
  let minus3DbHz: number | null = null;
  if ((relativeDb[0] as number) < -3) {
    for (let i = 1; i <= refIndex; i++) {
      const v = relativeDb[i] as number;
      if (v >= -3) {
        const v0 = relativeDb[i - 1] as number;
        const f0 = f[i - 1] as number;
        minus3DbHz = f0 * Math.pow((f[i] as number) / f0, (-3 - v0) / (v - v0));
        break;
      }
    }
  }
  return {
    crossoverHz,
    bandHz: [f[bandLow] as number, f[bandHigh] as number],
    referenceHz: f[refIndex] as number,
    referenceLevelDb,
    flatnessDb: Math.abs(maxDeviationDb),
    maxDeviationDb,
    maxDeviationHz,
    deepestDipDb,
    deepestDipHz,
    crossoverLevelDb: relativeDb[crossoverIndex] as number,
    minus3DbHz,
    frequencyHz: f,
    relativeDb,
  };
}

/** The −3 dB point for comparisons: ASSESSMENT_FLOOR_HZ when the sum still holds up there (the same for every crossover). */
export function effectiveMinus3Hz(a: BlendAssessment): number {
  return a.minus3DbHz === null ? ASSESSMENT_FLOOR_HZ : Math.max(a.minus3DbHz, ASSESSMENT_FLOOR_HZ);
}

/**
 * Power average of an assessed sum over [startHz, stopHz] relative to its reference, dB (every grid point in the band
 * weighs the same: the grid is log-spaced).
 */
export function bandLevelDb(a: BlendAssessment, startHz: number, stopHz: number): number {
  let total = 0;
  let count = 0;
  for (let i = 0; i < a.frequencyHz.length; i++) {
    const fi = a.frequencyHz[i] as number;
    if (fi < startHz * (1 - 1e-9) || fi > stopHz * (1 + 1e-9)) continue;
    total += Math.pow(10, (a.relativeDb[i] as number) / 10);
    count++;
  }
  return count ? 10 * Math.log10(total / count) : NaN;
}
