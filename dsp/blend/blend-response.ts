import { speedOfSoundMps } from '../air/speed-of-sound';
import { MAX_PATHS, type BlendOptions, type BlendResult, type PathCurves } from './blend-types';
import { accumulatePath, finishPath, finishSum, toBlendGrid, type BlendGrid } from './blend-kernel';
import { compilePath, type CompiledPath } from './path-plan';

/** Validates temperatureC and the paths and compiles them (shared by blendResponse and blendSumResponse). */
export function compileBlendPaths(temperatureC: number, paths: BlendOptions['paths']): CompiledPath[] {
  const speed = speedOfSoundMps(temperatureC);
  if (!Array.isArray(paths) || paths.length === 0) throw new RangeError('paths must contain at least one path');
  if (paths.length > MAX_PATHS) throw new RangeError(`paths must contain at most ${MAX_PATHS} paths (got ${paths.length})`);
  return paths.map((p, k) => compilePath(p, speed, `paths[${k}]`));
}

/**
 * Complex sum of up to 16 paths (filter × roll-off(s) × gain × polarity × e^(−jωτ), τ = delayMs + distanceM/c):
 * magnitude (dB), wrapped and unwrapped phase (deg) and analytic group delay (ms) of every path and of the sum.
 * Group delay is exact: τg = −Im(H′(ω)/H(ω)) with H′ from the product rule over the analog sections.
 * `frequencyHz` may be a prepared {@link BlendGrid} (validated once, ω precomputed). When only the sum is needed,
 * blendSumResponse is several times faster.
 * @example blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [lr4High, lr4Low] }).sum.magnitudeDb[0] // ≈ 0
 */
export function blendResponse({ temperatureC, frequencyHz, paths }: BlendOptions): BlendResult {
  const compiled = compileBlendPaths(temperatureC, paths);
  return evaluateBlend(toBlendGrid(frequencyHz), compiled);
}

/** The earliest total delay of the compiled paths, seconds. */
export function earliestDelayS(compiled: readonly CompiledPath[]): number {
  let tau0 = Infinity;
  for (const c of compiled) tau0 = Math.min(tau0, c.delayS);
  return tau0;
}

/** The inner evaluation of blendResponse over a prepared grid and compiled paths. */
export function evaluateBlend(grid: BlendGrid, compiled: readonly CompiledPath[]): BlendResult {
  const n = grid.omega.length;
  const pathCount = compiled.length;
  const tau0 = earliestDelayS(compiled);
  // One buffer for every output curve (few large allocations instead of many small ones).
  const buffer = new Float64Array(n * 4 * (pathCount + 1));
  const view = (k: number): Float64Array => buffer.subarray(k * n, (k + 1) * n);
  const pathCurves: PathCurves[] = [];
  for (let k = 0; k < pathCount; k++) {
    const c = compiled[k] as CompiledPath;
    const curves: PathCurves = { name: c.name, magnitudeDb: view(4 * k), phaseDeg: view(4 * k + 1), unwrappedPhaseDeg: view(4 * k + 2), groupDelayMs: view(4 * k + 3) };
    accumulatePath(c, c.delayS - tau0, grid, k === 0);
    finishPath(grid, c.delayS, curves.magnitudeDb, curves.phaseDeg, curves.unwrappedPhaseDeg, curves.groupDelayMs);
    pathCurves.push(curves);
  }
  const sum = { magnitudeDb: view(4 * pathCount), phaseDeg: view(4 * pathCount + 1), unwrappedPhaseDeg: view(4 * pathCount + 2), groupDelayMs: view(4 * pathCount + 3) };
  finishSum(grid, tau0, sum);
  return { frequencyHz: Float64Array.from(grid.frequencyHz), paths: pathCurves, sum };
}
