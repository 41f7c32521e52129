import type { PathSpec } from '../blend/blend-types';

/** A measured path: its curve (on the shared grid) and the processor settings to apply to it. */
export interface MeasuredPathInput {
  readonly magnitudeDb: Float64Array | readonly number[];
  readonly phaseDeg?: Float64Array | readonly number[];
  /** Filter, gain, delay and polarity to apply; the roll-off and distance are already in the measurement and are not applied. */
  readonly path: PathSpec;
}
