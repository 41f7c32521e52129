import { logFrequencyGridHz } from '../grid/log-frequency-grid';
import { assertIntegerInRange, assertPositive, curveFrequencies } from '../internal/guards';
import { bandPowerAverageDb } from './band-power-average';
import { resampleCurve } from './resample-curve';
import { smoothFractionalOctave } from './smooth-fractional-octave';

/** One run's magnitude, point by point (ascending frequencies). */
export interface RunCurve {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
}

/** Options of {@link compareRuns}. */
export interface CompareRunsOptions {
  readonly reference: RunCurve;
  readonly others: readonly RunCurve[];
  /** 0: no smoothing; N: 1/N octave (1…48), applied to each run on its own points before the difference. */
  readonly smoothingFraction: number;
  /** Points per octave of the common grid (default 48). */
  readonly pointsPerOctave?: number;
  /**
   * When given, each other run is moved by the level that makes its power average over this band equal the reference's
   * (level matching); without it the levels are as measured. Must lie within the runs' common range.
   */
  readonly matchLevelBandHz?: { readonly startHz: number; readonly stopHz: number };
}

/** One run against the reference on the common grid. */
export interface RunDifference {
  /** (run + levelOffsetDb) − reference at each grid frequency, dB. */
  readonly differenceDb: Float64Array;
  /** What was added to the run to match levels over the band, dB; 0 without level matching. */
  readonly levelOffsetDb: number;
  readonly minDb: number;
  readonly maxDb: number;
  /** The difference of largest size (signed) and where it is (the lowest such frequency on a tie). */
  readonly largestDb: number;
  readonly largestHz: number;
}

/** Every other run as a difference from the reference over the range all runs share. */
export interface ComparedRuns {
  /** Log grid from the highest first frequency to the lowest last frequency of all runs, Hz. */
  readonly frequencyHz: Float64Array;
  readonly startHz: number;
  readonly stopHz: number;
  readonly differences: RunDifference[];
}

/** The runs must share at least this much of the spectrum, octaves. */
export const COMPARE_MIN_COMMON_OCTAVES = 1;

function checkedRun(name: string, run: RunCurve): Float64Array {
  try {
    return curveFrequencies(run.frequencyHz, run.magnitudeDb);
  } catch (error) {
    if (error instanceof RangeError) throw new RangeError(`${name}.${error.message}`);
    throw error;
  }
}

/**
 * Runs compared as differences from a reference (common practice: "difference from reference" curves when comparing
 * measurements of one source under two conditions, e.g. a voicing switch's two positions). Each run is smoothed on its
 * own points (power average over 1/N octave, smoothFractionalOctave), resampled linearly in log-frequency onto a common
 * log grid (resampleCurve) spanning the range every run covers, and the reference subtracted, dB. With a band, each run
 * is first offset so its band power average (bandPowerAverageDb, on its own unsmoothed points) equals the reference's.
 * A difference that is the same at every frequency stays exactly that after any smoothing (smoothing is a power mean).
 * @example compareRuns({ reference: { frequencyHz: [20, 200], magnitudeDb: [0, 0] }, others: [{ frequencyHz: [20, 200], magnitudeDb: [-3, -3] }], smoothingFraction: 0 }).differences[0].largestDb // −3
 */
export function compareRuns({ reference, others, smoothingFraction, pointsPerOctave = 48, matchLevelBandHz }: CompareRunsOptions): ComparedRuns {
  assertIntegerInRange('smoothingFraction', smoothingFraction, 0, 48);
  assertPositive('pointsPerOctave', pointsPerOctave);
  if (others.length === 0) throw new RangeError('others must hold at least one run');
  const runs = [reference, ...others];
  const frequencies = runs.map((run, k) => checkedRun(k === 0 ? 'reference' : `others[${k - 1}]`, run));
  const startHz = Math.max(...frequencies.map((f) => f[0] as number));
  const stopHz = Math.min(...frequencies.map((f) => f[f.length - 1] as number));
  if (!(stopHz >= startHz * 2 ** COMPARE_MIN_COMMON_OCTAVES * (1 - 1e-9))) {
    throw new RangeError(`the runs share ${startHz}–${stopHz} Hz; at least ${COMPARE_MIN_COMMON_OCTAVES} octave in common is needed`);
  }
  const grid = logFrequencyGridHz({ startHz, stopHz: stopHz * (1 + 1e-12), pointsPerOctave });

  let bandLevelsDb: number[] | null = null;
  if (matchLevelBandHz) {
    const { startHz: bandStartHz, stopHz: bandStopHz } = matchLevelBandHz;
    assertPositive('matchLevelBandHz.startHz', bandStartHz);
    assertPositive('matchLevelBandHz.stopHz', bandStopHz);
    if (bandStopHz <= bandStartHz) throw new RangeError(`matchLevelBandHz.stopHz must be above startHz (got ${bandStopHz} ≤ ${bandStartHz})`);
    if (bandStartHz < startHz * (1 - 1e-9) || bandStopHz > stopHz * (1 + 1e-9)) {
      throw new RangeError(`matchLevelBandHz ${bandStartHz}–${bandStopHz} Hz must lie within the runs' common range ${startHz}–${stopHz} Hz`);
    }
    bandLevelsDb = runs.map((run) => bandPowerAverageDb({ frequencyHz: run.frequencyHz, magnitudeDb: run.magnitudeDb, startHz: bandStartHz, stopHz: bandStopHz }).levelDb);
  }

  const onGrid = runs.map((run, k) => {
    const smoothed = smoothingFraction > 0 ? smoothFractionalOctave({ frequencyHz: frequencies[k] as Float64Array, magnitudeDb: run.magnitudeDb, fraction: smoothingFraction }).magnitudeDb : run.magnitudeDb;
    return resampleCurve({ frequencyHz: frequencies[k] as Float64Array, magnitudeDb: smoothed, targetHz: grid }).magnitudeDb;
  });
  const referenceDb = onGrid[0] as Float64Array;

  const differences = others.map((_run, j): RunDifference => {
    const k = j + 1;
    const levelOffsetDb = bandLevelsDb ? (bandLevelsDb[0] as number) - (bandLevelsDb[k] as number) : 0;
    const runDb = onGrid[k] as Float64Array;
    const differenceDb = Float64Array.from(runDb, (v, i) => v + levelOffsetDb - (referenceDb[i] as number));
    let minDb = Infinity;
    let maxDb = -Infinity;
    let largest = 0;
    for (let i = 0; i < differenceDb.length; i++) {
      const d = differenceDb[i] as number;
      minDb = Math.min(minDb, d);
      maxDb = Math.max(maxDb, d);
      // Ties (within 1e-9 dB: rounding noise of equal differences) go to the lowest frequency.
      if (Math.abs(d) > Math.abs(differenceDb[largest] as number) + 1e-9) largest = i;
    }
    return { differenceDb, levelOffsetDb, minDb, maxDb, largestDb: differenceDb[largest] as number, largestHz: grid[largest] as number };
  });
  return { frequencyHz: grid, startHz, stopHz, differences };
}
