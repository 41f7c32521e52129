/** Crossover filter families: Butterworth (orders 1–8) and Linkwitz–Riley (orders 2, 4, 8). */
export type FilterFamily = 'butterworth' | 'linkwitz-riley';

/** What a crossover filter passes; 'none' is a straight wire (family, order and cornerHz are ignored). */
export type FilterResponseKind = 'lowpass' | 'highpass' | 'none';

/** One crossover filter of a path. */
export interface FilterSpec {
  readonly family: FilterFamily;
  readonly order: number;
  readonly response: FilterResponseKind;
  readonly cornerHz: number;
}

/** A filter without its corner, as a crossover sweep takes it. */
export interface FilterShape {
  readonly family: FilterFamily;
  readonly order: number;
}

/**
 * A speaker's natural roll-off: 'sealed' is a second-order high-pass (corner, Qtc), 'vented' a fourth-order
 * Butterworth (B4) high-pass at cornerHz, 'lowpass' a sub's second-order upper roll-off.
 */
export type RolloffSpec =
  | { readonly kind: 'none' }
  | { readonly kind: 'sealed'; readonly cornerHz: number; readonly q: number }
  | { readonly kind: 'vented'; readonly cornerHz: number }
  | { readonly kind: 'lowpass'; readonly cornerHz: number; readonly q: number };

/** One roll-off, or several applied together (the product of their sections), e.g. a sub's [low, upper] roll-offs. */
export type RolloffChain = RolloffSpec | readonly RolloffSpec[];

/** Kind of a first- or second-order analog section. */
export type SectionKind = 'lowpass1' | 'highpass1' | 'lowpass2' | 'highpass2';

/** One analog section H(s): first order 1/(1+s/ω0) or (s/ω0)/(1+s/ω0); second order 1/(1+s/(Qω0)+s²/ω0²) or its high-pass. */
export interface AnalogSection {
  readonly kind: SectionKind;
  readonly cornerHz: number;
  /** Quality factor; 0.5 is reported for first-order sections (not used by them). */
  readonly q: number;
}

/** A complex frequency response with its magnitude, wrapped phase and group delay. */
export interface ComplexResponse {
  readonly frequencyHz: Float64Array;
  readonly re: Float64Array;
  readonly im: Float64Array;
  readonly magnitudeDb: Float64Array;
  /** Wrapped to (−180, 180]. */
  readonly phaseDeg: Float64Array;
  readonly groupDelayMs: Float64Array;
}
