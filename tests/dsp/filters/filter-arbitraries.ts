import Complex from 'complex.js';
import fc from 'fast-check';
import { EQ_LIMITS, type AllpassFilter, type Biquad, type CrossoverFilter, type EqFilter, type ProcessorFilter } from '@/dsp';

// Shared by the processor-filter tests: random valid filters, and a biquad's H(z) straight from the convention
// H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²), evaluated with complex.js (reference library).

const unit = fc.double({ min: 0, max: 1, noNaN: true, noDefaultInfinity: true });

/** A processor sample rate, 8 kHz to 384 kHz. */
export const arbSampleRateHz = fc.double({ min: 8000, max: 384000, noNaN: true, noDefaultInfinity: true });

/** A frequency log-uniform from loHz to hiHz. */
export const arbLogHz = (loHz: number, hiHz: number) => unit.map((u) => loHz * Math.pow(hiHz / loHz, u));

/** Any crossover high-/low-pass with its corner from `loHz` to `hiHz`. */
const arbCrossover = (loHz: number, hiHz: number): fc.Arbitrary<CrossoverFilter> =>
  fc.oneof(
    fc.record({ family: fc.constant('butterworth' as const), order: fc.integer({ min: 1, max: 8 }) }),
    fc.record({ family: fc.constant('linkwitz-riley' as const), order: fc.constantFrom(2, 4, 8) }),
  ).chain(({ family, order }) =>
    fc.record({
      kind: fc.constant('crossover' as const),
      family: fc.constant(family),
      order: fc.constant(order),
      response: fc.constantFrom('lowpass' as const, 'highpass' as const),
      cornerHz: arbLogHz(loHz, hiHz),
    }),
  );

const arbGainDb = fc.double({ min: EQ_LIMITS.gainDb.min, max: EQ_LIMITS.gainDb.max, noNaN: true, noDefaultInfinity: true });
const arbQ = arbLogHz(EQ_LIMITS.q.min, EQ_LIMITS.q.max);
const arbSlope = fc.double({ min: EQ_LIMITS.slope.min, max: EQ_LIMITS.slope.max, noNaN: true, noDefaultInfinity: true });

/** A peaking filter or a shelf (with q, or with a slope) within EQ_LIMITS, its frequency from `loHz` to `hiHz`. */
export const arbEq = (loHz: number, hiHz: number): fc.Arbitrary<EqFilter> =>
  fc.oneof(
    fc.record({ kind: fc.constant('peaking' as const), centerHz: arbLogHz(loHz, hiHz), gainDb: arbGainDb, q: arbQ }),
    fc.record({ kind: fc.constantFrom('low-shelf' as const, 'high-shelf' as const), cornerHz: arbLogHz(loHz, hiHz), gainDb: arbGainDb, q: arbQ }),
    fc.record({ kind: fc.constantFrom('low-shelf' as const, 'high-shelf' as const), cornerHz: arbLogHz(loHz, hiHz), gainDb: arbGainDb, slope: arbSlope }),
  );

/** A first- or second-order all-pass, its corner from `loHz` to `hiHz`. */
export const arbAllpass = (loHz: number, hiHz: number): fc.Arbitrary<AllpassFilter> =>
  fc.oneof(
    fc.record({ kind: fc.constant('allpass' as const), order: fc.constant(1 as const), cornerHz: arbLogHz(loHz, hiHz) }),
    fc.record({ kind: fc.constant('allpass' as const), order: fc.constant(2 as const), cornerHz: arbLogHz(loHz, hiHz), q: arbQ }),
  );

/** Any processor filter with its corner or centre from `loHz` to `hiHz`. */
export const arbProcessorFilter = (loHz: number, hiHz: number): fc.Arbitrary<ProcessorFilter> =>
  fc.oneof(arbCrossover(loHz, hiHz), arbEq(loHz, hiHz), arbAllpass(loHz, hiHz));

/** A sample rate with any processor filter whose corner lies from 10 Hz to 0.49·fs. */
export const arbFilterAtRate: fc.Arbitrary<{ sampleRateHz: number; filter: ProcessorFilter }> = arbSampleRateHz.chain((sampleRateHz) =>
  fc.record({ sampleRateHz: fc.constant(sampleRateHz), filter: arbProcessorFilter(10, 0.49 * sampleRateHz) }),
);

/** H(z) of one biquad at z = e^(jθ), θ = 2π·f/fs, by the convention's definition. */
export function biquadAt(s: Biquad, fHz: number, sampleRateHz: number): Complex {
  const zInv = new Complex({ abs: 1, arg: (-2 * Math.PI * fHz) / sampleRateHz });
  const num = new Complex(s.b0, 0).add(zInv.mul(s.b1)).add(zInv.mul(zInv).mul(s.b2));
  const den = new Complex(1, 0).add(zInv.mul(s.a1)).add(zInv.mul(zInv).mul(s.a2));
  return num.div(den);
}

/** The product of a cascade's H(z) (complex.js). */
export const cascadeAt = (sections: readonly Biquad[], fHz: number, sampleRateHz: number): Complex =>
  sections.reduce((h, s) => h.mul(biquadAt(s, fHz, sampleRateHz)), new Complex(1, 0));

/** H at z = 1 (DC) and z = −1 (Nyquist), straight from the coefficients. */
export const dcGain = (s: Biquad) => (s.b0 + s.b1 + s.b2) / (1 + s.a1 + s.a2);
export const nyquistGain = (s: Biquad) => (s.b0 - s.b1 + s.b2) / (1 - s.a1 + s.a2);

/** 20·log10|x|. */
export const db = (x: number) => 20 * Math.log10(Math.abs(x));

/** Largest pole modulus of 1 + a1·z⁻¹ + a2·z⁻², from the roots of z² + a1·z + a2 (quadratic formula, complex.js). */
export function largestPoleModulus(a1: number, a2: number): number {
  const root = new Complex(a1 * a1 - 4 * a2, 0).sqrt();
  return Math.max(root.sub(a1).div(2).abs(), root.neg().sub(a1).div(2).abs());
}
