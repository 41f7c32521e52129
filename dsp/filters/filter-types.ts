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

/**
 * Kind of a first- or second-order analog section. 'general1' and 'general2' carry their own numerator (shelves,
 * peaking and all-pass sections); the others are the crossover and roll-off sections.
 */
export type SectionKind = 'lowpass1' | 'highpass1' | 'lowpass2' | 'highpass2' | 'general1' | 'general2';

/**
 * One analog section H(s), with x = s/ω0: first order 1/(1+x) or x/(1+x); second order 1/(1+x/Q+x²) or x²/(…);
 * 'general1' (n0 + n1·x)/(1 + x); 'general2' (n0 + n1·x + n2·x²)/(1 + x/Q + x²).
 */
export interface AnalogSection {
  readonly kind: SectionKind;
  readonly cornerHz: number;
  /** Quality factor; 0.5 is reported for first-order sections (not used by them). */
  readonly q: number;
  /** 'general1' / 'general2' only: the numerator's coefficients [n0, n1, n2] in powers of x = s/ω0 (n2 = 0 for first order). */
  readonly numerator?: readonly [number, number, number];
}

/**
 * An equaliser filter of a path or a processor (R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad filter
 * coefficients"): a peaking filter (gainDb at centerHz, width q), or a low or high shelf (gainDb below / above,
 * half of it at cornerHz in dB; width q, or the cookbook's shelf slope S, where S = 1 is the steepest without overshoot).
 */
export type EqFilter =
  | { readonly kind: 'peaking'; readonly centerHz: number; readonly gainDb: number; readonly q: number }
  | { readonly kind: 'low-shelf' | 'high-shelf'; readonly cornerHz: number; readonly gainDb: number; readonly q?: number; readonly slope?: number };

/** An all-pass filter: first order (phase −90° at cornerHz) or second order (−180° at cornerHz, width q). */
export interface AllpassFilter {
  readonly kind: 'allpass';
  readonly order: 1 | 2;
  readonly cornerHz: number;
  /** Second order only; default 1/√2. */
  readonly q?: number;
}

/** A crossover high- or low-pass as a processor runs it. */
export interface CrossoverFilter {
  readonly kind: 'crossover';
  readonly family: FilterFamily;
  readonly order: number;
  readonly response: 'lowpass' | 'highpass';
  readonly cornerHz: number;
}

/** Any filter a processor runs: crossover, EQ or all-pass. */
export type ProcessorFilter = CrossoverFilter | EqFilter | AllpassFilter;

/**
 * One digital second-order section (a biquad), always in this convention:
 * H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²). A first-order section has b2 = a2 = 0.
 */
export interface Biquad {
  readonly b0: number;
  readonly b1: number;
  readonly b2: number;
  readonly a1: number;
  readonly a2: number;
}

/** The biquad convention in words, shown wherever coefficients are. */
export const BIQUAD_CONVENTION = 'H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²)';

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
