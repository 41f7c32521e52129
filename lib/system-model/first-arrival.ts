/**
 * The reference phase is drawn from: the first arrival at the MLP. The same air path taken off every path changes
 * neither the levels nor how the paths line up (their differences stay), and keeps the phase readable: a mains 3 m
 * away would otherwise wrap about 8 times by 1 kHz (3 m / 343 m/s ≈ 8.7 ms; 8.7 cycles at 1 kHz). Blend's plots and
 * every Lesson frame (editor preview, Presenter view, shared Lesson) draw phase from this one reference.
 */
import type { PathSpec } from '@/dsp';

export interface FirstArrivalPaths {
  /** The paths with the nearest air path taken off each distance (0.1 mm, as the requests carry distances). */
  paths: PathSpec[];
  /** The air path taken off, m: the distance from the nearest source to the MLP. */
  nearestM: number;
}

/** The paths with the first arrival's air path removed from every one of them. */
export function fromFirstArrival(paths: readonly PathSpec[]): FirstArrivalPaths {
  const nearestM = paths.length ? Math.min(...paths.map((p) => p.distanceM ?? 0)) : 0;
  return { paths: paths.map((p) => ({ ...p, distanceM: Math.round(((p.distanceM ?? 0) - nearestM) * 1e4) / 1e4 })), nearestM };
}
