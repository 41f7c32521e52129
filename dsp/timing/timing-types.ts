import type { PathSpec } from '../blend/blend-types';

/** Blend level at the crossover against the sub's extra delay, for both sub polarities. */
export interface LevelVersusDelay {
  /** Extra sub delay relative to the current settings, ms; negative values mean that much delay added to the mains. */
  readonly delayMs: Float64Array;
  /** Sum level at the crossover with the sub not inverted, dB. */
  readonly normalDb: Float64Array;
  /** …with the sub inverted, dB. */
  readonly invertedDb: Float64Array;
}

/** A recommended delay and polarity. Flatness = largest |sum − reference| within ±1 octave (reference: the sum two octaves above the crossover). */
export interface AlignmentResult {
  /** Which side gets the extra delay (only positive delays exist in a processor). */
  readonly addTo: 'sub' | 'mains';
  /** Extra delay to add, ms ≥ 0. */
  readonly delayMs: number;
  /** Signed: extra sub delay minus extra mains delay, ms. */
  readonly relativeDelayMs: number;
  /** Recommended sub polarity setting (absolute). */
  readonly invertSub: boolean;
  /** True when the recommendation changes the sub's polarity. */
  readonly flipPolarity: boolean;
  /** Mains phase minus sub phase at the crossover with the current settings, (−180, 180]. */
  readonly phaseDifferenceDeg: number;
  /** The same after the recommendation. */
  readonly phaseDifferenceAfterDeg: number;
  readonly flatnessBeforeDb: number;
  readonly flatnessDb: number;
  /** Sum level at the crossover after the recommendation, dB. */
  readonly crossoverLevelDb: number;
  /** Timing window: the contiguous relative delays around the recommendation (same polarity) whose level at the crossover stays within 1 dB of the recommendation's, ms. */
  readonly windowMs: readonly [number, number];
  readonly levelVersusDelay: LevelVersusDelay;
}

/** Options of alignSubToMains. */
export interface AlignSubToMainsOptions {
  readonly temperatureC: number;
  readonly crossoverHz: number;
  readonly mains: PathSpec;
  readonly sub: PathSpec;
  /** Largest extra delay tried on either side, ms (default 20). */
  readonly maxDelayMs?: number;
  /** Scan step, ms (default 0.05; refined around the best). */
  readonly stepMs?: number;
}
