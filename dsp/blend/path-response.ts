import { speedOfSoundMps } from '../air/speed-of-sound';
import { complexLevelDb } from '../internal/complex';
import { positiveFrequencies } from '../internal/guards';
import { evaluatePlanOnGrid, planValues } from '../internal/section-plan';
import type { PathSpec } from './blend-types';
import { compilePath } from './path-plan';

/** A path's complex response on a grid. */
export interface PathComplexResponse {
  readonly frequencyHz: Float64Array;
  readonly re: Float64Array;
  readonly im: Float64Array;
  readonly magnitudeDb: Float64Array;
}

/**
 * The complex response of one path exactly as a blend hears it — the same compiled plan (crossover filter, roll-offs,
 * EQ, gain, polarity) times e^(−jωτ) for its delay τ = delayMs + distanceM / c — for the places where a path meets
 * something other than another path (a sub's path through the room's modal transfer, a measured curve).
 * @example pathResponse({ name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false }, [80]).magnitudeDb[0] // −6.02
 */
export function pathResponse(path: PathSpec, frequencyHz: Float64Array | readonly number[], temperatureC = 20): PathComplexResponse {
  const f = Float64Array.from(positiveFrequencies('frequencyHz', frequencyHz));
  const compiled = compilePath(path, speedOfSoundMps(temperatureC));
  const n = f.length;
  const omega = Float64Array.from(f, (x) => 2 * Math.PI * x);
  const h = planValues(n);
  evaluatePlanOnGrid(compiled.plan, omega, h);
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  const magnitudeDb = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const phase = -(omega[i] as number) * compiled.delayS;
    const c = Math.cos(phase);
    const s = Math.sin(phase);
    const hr = h.re[i] as number;
    const hi = h.im[i] as number;
    re[i] = hr * c - hi * s;
    im[i] = hr * s + hi * c;
    magnitudeDb[i] = complexLevelDb(re[i] as number, im[i] as number);
  }
  return { frequencyHz: f, re, im, magnitudeDb };
}
