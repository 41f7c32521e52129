import type { CompiledPath } from '../blend/path-plan';
import { logFrequencyGridHz } from '../grid/log-frequency-grid';
import { evaluatePlanOnGrid, planValues } from '../internal/section-plan';

/** Points per octave of the ±1-octave band that Timing and the crossover sweep judge flatness on. */
export const ALIGNMENT_POINTS_PER_OCTAVE = 48;

/** The band fc/2 … 2fc at 48 points per octave (97 points, index 48 is fc) plus one last point at 4fc, the reference. */
export interface AlignmentGrid {
  readonly frequencyHz: Float64Array;
  readonly omega: Float64Array;
  readonly bandCount: number;
  readonly crossoverIndex: number;
  readonly refIndex: number;
}

export function alignmentGrid(crossoverHz: number): AlignmentGrid {
  const band = logFrequencyGridHz({ startHz: crossoverHz / 2, stopHz: crossoverHz * 2 * (1 + 1e-12), pointsPerOctave: ALIGNMENT_POINTS_PER_OCTAVE });
  const frequencyHz = new Float64Array(band.length + 1);
  frequencyHz.set(band);
  frequencyHz[band.length] = 4 * crossoverHz;
  const omega = frequencyHz.map((f) => 2 * Math.PI * f);
  return { frequencyHz, omega, bandCount: band.length, crossoverIndex: ALIGNMENT_POINTS_PER_OCTAVE, refIndex: band.length };
}

/** A compiled path's complex response (delay included) on the points ω. */
export function pathComplex(path: CompiledPath, omega: Float64Array): { re: Float64Array; im: Float64Array } {
  const h = planValues(omega.length);
  evaluatePlanOnGrid(path.plan, omega, h);
  const re = new Float64Array(omega.length);
  const im = new Float64Array(omega.length);
  for (let i = 0; i < omega.length; i++) {
    const w = omega[i] as number;
    const c = Math.cos(w * path.delayS);
    const s = -Math.sin(w * path.delayS);
    const hr = h.re[i] as number;
    const hi = h.im[i] as number;
    re[i] = hr * c - hi * s;
    im[i] = hr * s + hi * c;
  }
  return { re, im };
}
