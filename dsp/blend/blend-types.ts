import type { EqFilter, FilterSpec, RolloffChain } from '../filters/filter-types';
import type { BlendGrid } from './blend-kernel';

/** One signal path: crossover filter × natural roll-off(s) × EQ × gain × polarity × delay (delayMs + distanceM / c). */
export interface PathSpec {
  readonly name: string;
  readonly filter: FilterSpec;
  /** The speaker's natural roll-off, or several applied together (a sub: [low roll-off, upper roll-off]). */
  readonly rolloff?: RolloffChain;
  /**
   * EQ on this path (the cookbook's peaking filters and shelves as analog prototypes, at most MAX_PATH_EQ_FILTERS):
   * the speaker's voicing-switch filters and the processor's EQ on this output, applied together. Absent or empty: none.
   */
  readonly eq?: readonly EqFilter[];
  readonly gainDb: number;
  /** Processor delay, ms, ≥ 0. */
  readonly delayMs: number;
  readonly invert: boolean;
  /** Air path to the listener, m; adds distanceM / c(temperatureC) to the delay, never changes level. */
  readonly distanceM?: number;
  /**
   * The speaker as measured at the seat, instead of its model: the path is then this measured complex response ×
   * filter × EQ × gain × polarity × processor delay. The measurement already holds the speaker's roll-off, its voicing
   * switches, the air path and the room, so such a path leaves out `rolloff`, voicing EQ and `distanceM`.
   */
  readonly measured?: MeasuredResponse;
}

/** A measured complex response at a seat (ascending frequencies; true phase, wrapped or continuous). */
export interface MeasuredResponse {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  readonly phaseDeg: Float64Array | readonly number[];
}

/** Magnitude, phase and group delay over a frequency grid. */
export interface ResponseCurves {
  readonly magnitudeDb: Float64Array;
  /** Wrapped to (−180, 180]. */
  readonly phaseDeg: Float64Array;
  /** Continuous phase; a path's includes exactly −360·f·τ for its delay τ. */
  readonly unwrappedPhaseDeg: Float64Array;
  readonly groupDelayMs: Float64Array;
}

/** A named path's curves. */
export interface PathCurves extends ResponseCurves {
  readonly name: string;
}

/** Result of blendResponse: each path and their complex sum. */
export interface BlendResult {
  readonly frequencyHz: Float64Array;
  readonly paths: PathCurves[];
  readonly sum: ResponseCurves;
}

/** Options of blendResponse. */
export interface BlendOptions {
  readonly temperatureC: number;
  /** Hz, each > 0; or a grid prepared once by blendGrid. */
  readonly frequencyHz: Float64Array | readonly number[] | BlendGrid;
  readonly paths: readonly PathSpec[];
}

/** Most paths one blend may sum. */
export const MAX_PATHS = 16;

/** Floor of reported levels, dB: an exact cancellation reads −300 dB (phase 0, group delay 0) instead of −∞. */
export const SILENCE_DB = -300;
