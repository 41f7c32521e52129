import { assertPositive } from '../internal/guards';

/** Options of {@link logFrequencyGridHz}. */
export interface LogFrequencyGridOptions {
  readonly startHz: number;
  readonly stopHz: number;
  readonly pointsPerOctave: number;
}

/** Most points a grid may have (guards against runaway allocations). */
export const MAX_GRID_POINTS = 100_000;

/**
 * Log-spaced frequencies f_i = startHz·2^(i/pointsPerOctave), from startHz up to (at most) stopHz.
 * A point within 1e-9 (relative) of stopHz is kept. Units: Hz.
 * @example logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 48 }).length // 527
 */
export function logFrequencyGridHz({ startHz, stopHz, pointsPerOctave }: LogFrequencyGridOptions): Float64Array {
  assertPositive('startHz', startHz);
  assertPositive('stopHz', stopHz);
  assertPositive('pointsPerOctave', pointsPerOctave);
  if (stopHz < startHz) throw new RangeError(`stopHz must be at least startHz (got ${stopHz} < ${startHz})`);
  const count = Math.floor(Math.log2(stopHz / startHz) * pointsPerOctave + 1e-9) + 1;
  if (count > MAX_GRID_POINTS) {
    throw new RangeError(`pointsPerOctave gives ${count} points; at most ${MAX_GRID_POINTS} are allowed`);
  }
  const grid = new Float64Array(count);
  for (let i = 0; i < count; i++) grid[i] = startHz * Math.pow(2, i / pointsPerOctave);
  return grid;
}
