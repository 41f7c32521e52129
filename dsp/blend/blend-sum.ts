import type { BlendOptions, ResponseCurves } from './blend-types';
import { accumulatePath, finishSum, newCurves, toBlendGrid } from './blend-kernel';
import { compileBlendPaths, earliestDelayS } from './blend-response';

/** Options of {@link blendSumResponse}: those of blendResponse, plus curves to write into. */
export interface BlendSumOptions extends BlendOptions {
  /** Curves to overwrite with the result (each as long as the grid); fresh arrays when omitted. */
  readonly into?: ResponseCurves;
}

/** Result of {@link blendSumResponse}. */
export interface BlendSumResult {
  /** The grid, Hz (the BlendGrid's own array when one was passed: do not mutate it). */
  readonly frequencyHz: Float64Array;
  readonly sum: ResponseCurves;
}

/**
 * Only the complex sum of blendResponse (same paths, same definitions, same numbers): magnitude dB, wrapped and
 * unwrapped phase deg and analytic group delay ms of Σ paths. The earliest path's delay is factored out (its phase
 * −ωτ0 added arithmetically), so each later path costs one sin/cos pair per point and the sum one log and one atan2.
 * With a {@link BlendGrid} and `into`, a call allocates nothing per frequency point.
 * @example blendSumResponse({ temperatureC: 20, frequencyHz: blendGrid([80]), paths: [lr4High, lr4Low] }).sum.magnitudeDb[0] // ≈ 0
 */
export function blendSumResponse({ temperatureC, frequencyHz, paths, into }: BlendSumOptions): BlendSumResult {
  const compiled = compileBlendPaths(temperatureC, paths);
  const grid = toBlendGrid(frequencyHz);
  const n = grid.omega.length;
  if (into !== undefined) {
    for (const key of ['magnitudeDb', 'phaseDeg', 'unwrappedPhaseDeg', 'groupDelayMs'] as const) {
      const a = (into as Partial<ResponseCurves>)[key];
      if (!(a instanceof Float64Array) || a.length !== n) throw new RangeError(`into.${key} must be a Float64Array of ${n} entries like frequencyHz`);
    }
  }
  const tau0 = earliestDelayS(compiled);
  for (let k = 0; k < compiled.length; k++) {
    const c = compiled[k]!;
    accumulatePath(c, c.delayS - tau0, grid, k === 0);
  }
  const sum = into ?? newCurves(n);
  finishSum(grid, tau0, sum);
  return { frequencyHz: grid.frequencyHz, sum };
}
