import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import fc from 'fast-check';
import { biquadsResponse, isStableBiquad, processorFilterBiquads, type Biquad } from '@/dsp';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';
import { arbFilterAtRate, arbLogHz, arbProcessorFilter, cascadeAt, largestPoleModulus } from './filter-arbitraries';

/** A rate, one to four random processor filters at it (corners 10 Hz – 0.49·fs), and a frequency 20 Hz – 0.45·fs. */
const arbCascade = arbFilterAtRate.chain(({ sampleRateHz, filter }) =>
  fc.record({
    sampleRateHz: fc.constant(sampleRateHz),
    sections: fc
      .array(arbProcessorFilter(10, 0.49 * sampleRateHz), { maxLength: 3 })
      .map((more) => [filter, ...more].flatMap((f) => processorFilterBiquads(f, sampleRateHz))),
    fHz: arbLogHz(20, 0.45 * sampleRateHz),
  }),
);

/** Σ over the cascade's polynomials of (Σ|c_k|)/|P(e^(jθ))|: how much rounding the evaluation of each can amplify. */
function conditionOf(sections: readonly Biquad[], fHz: number, sampleRateHz: number): number {
  const zInv = new Complex({ abs: 1, arg: (-2 * Math.PI * fHz) / sampleRateHz });
  const size = (c0: number, c1: number, c2: number) =>
    (Math.abs(c0) + Math.abs(c1) + Math.abs(c2)) / new Complex(c0, 0).add(zInv.mul(c1)).add(zInv.mul(zInv).mul(c2)).abs();
  return sections.reduce((sum, s) => sum + size(s.b0, s.b1, s.b2) + size(1, s.a1, s.a2), 0);
}

describe('biquadsResponse', () => {
  it('equals the product of H(z) = (b0 + b1·z⁻¹ + b2·z⁻²)/(1 + a1·z⁻¹ + a2·z⁻²) evaluated with complex.js (reference library)', () => {
    fc.assert(
      fc.property(arbCascade, ({ sampleRateHz, sections, fHz }) => {
        const r = biquadsResponse(sections, sampleRateHz, [fHz]);
        const h = cascadeAt(sections, fHz, sampleRateHz);
        // Both evaluations round each polynomial to ≈ ε·(Σ|c_k|)/|P| of itself (poles or zeros near the circle).
        const relative = 1e-14 * conditionOf(sections, fHz, sampleRateHz);
        assertInDelta([r.re[0] as number, r.im[0] as number], [h.re, h.im], relative * h.abs(), 'H');
        assertInDelta(r.magnitudeDb[0] as number, 20 * Math.log10(h.abs()), 10 * relative, 'dB');
        assertInDelta(angleDiffDeg(r.phaseDeg[0] as number, (h.arg() * 180) / Math.PI), 0, 60 * relative, 'deg');
      }),
      { numRuns: 300 },
    );
  });

  it('group delay equals a central difference of the unwrapped phase, −dφ/dω (definition; common practice numeric check)', () => {
    fc.assert(
      fc.property(arbCascade, ({ sampleRateHz, sections, fHz }) => {
        // The scale of the phase's change, in samples: every numerator's and denominator's own |group delay|, plus one.
        // Poles near z = 1 make the phase itself uncertain by ≈ ε/|A|, so the step must move the phase by about
        // 1e-3 rad (rounding ≈ 1e-6 of it) while staying far inside the narrowest feature (truncation ≈ 1e-7).
        const alone = (s: Biquad) => [
          { b0: s.b0, b1: s.b1, b2: s.b2, a1: 0, a2: 0 },
          { b0: 1, b1: 0, b2: 0, a1: s.a1, a2: s.a2 },
        ];
        const scaleSamples = 1 + sections.flatMap(alone).reduce((sum, p) => sum + Math.abs(biquadsResponse([p], sampleRateHz, [fHz]).groupDelayMs[0] as number), 0) * (sampleRateHz / 1000);
        const stepHz = Math.min((1e-3 / scaleSamples) * (sampleRateHz / (2 * Math.PI)), 1e-4 * fHz);
        const r = biquadsResponse(sections, sampleRateHz, [fHz - stepHz, fHz, fHz + stepHz]);
        // Unwrap: consecutive points may differ by at most 180°.
        const unwrapped = [r.phaseDeg[0] as number];
        for (let i = 1; i < 3; i++) unwrapped.push((unwrapped[i - 1] as number) + angleDiffDeg(r.phaseDeg[i] as number, r.phaseDeg[i - 1] as number));
        const numericMs = (-((unwrapped[2] as number) - (unwrapped[0] as number)) / 360 / (2 * stepHz)) * 1000;
        const analyticMs = r.groupDelayMs[1] as number;
        // Each phase is rounded to ≈ 4ε·condition rad (poles near z = 1 at a high rate make that large); the difference
        // over 2·step turns it into a delay error of 2·that/(2π·2·step) seconds, which the tolerance must admit.
        const roundingMs = ((2 * 4 * Number.EPSILON * conditionOf(sections, fHz, sampleRateHz)) / (2 * Math.PI * 2 * stepHz)) * 1000;
        assertInDelta(analyticMs, numericMs, 1e-5 * scaleSamples * (1000 / sampleRateHz) + roundingMs, `group delay at ${fHz} Hz`);
      }),
      { numRuns: 300 },
    );
  });

  it('a pure delay of one and two samples has a group delay of one and two samples at every frequency (definition)', () => {
    const grid = [10, 1000, 10000, 23000];
    const one = biquadsResponse([{ b0: 0, b1: 1, b2: 0, a1: 0, a2: 0 }], 48000, grid);
    const two = biquadsResponse([{ b0: 0, b1: 0, b2: 1, a1: 0, a2: 0 }], 48000, grid);
    assertInDelta(one.groupDelayMs, grid.map(() => 1000 / 48000), 1e-12, 'one sample');
    assertInDelta(two.groupDelayMs, grid.map(() => 2000 / 48000), 1e-12, 'two samples');
    assertInDelta(one.phaseDeg, grid.map((f) => (-360 * f) / 48000), 1e-9, 'phase −ωT');
  });

  it('an empty cascade is a wire; phase is wrapped to (−180, 180] (an inversion reads +180°)', () => {
    const wire = biquadsResponse([], 48000, [20, 20000]);
    expect(Array.from(wire.magnitudeDb)).toEqual([0, 0]);
    expect(Array.from(wire.phaseDeg)).toEqual([0, 0]);
    const inverted = biquadsResponse([{ b0: -1, b1: 0, b2: 0, a1: 0, a2: 0 }], 48000, [20, 20000]);
    expect(Array.from(inverted.phaseDeg)).toEqual([180, 180]);
    fc.assert(
      fc.property(arbCascade, ({ sampleRateHz, sections, fHz }) => {
        const p = biquadsResponse(sections, sampleRateHz, [fHz]).phaseDeg[0] as number;
        expect(p > -180 && p <= 180).toBe(true);
      }),
      { numRuns: 100 },
    );
  });

  it('refuses a sample rate outside 8000–384000 Hz and a grid with a non-positive frequency', () => {
    const wire: Biquad[] = [{ b0: 1, b1: 0, b2: 0, a1: 0, a2: 0 }];
    expect(() => biquadsResponse(wire, 7999, [100])).toThrow(/sampleRateHz/);
    expect(() => biquadsResponse(wire, 384001, [100])).toThrow(/sampleRateHz/);
    expect(() => biquadsResponse(wire, 48000, [100, 0])).toThrow(/frequencyHz\[1\]/);
  });
});

describe('isStableBiquad', () => {
  it('is true exactly when both poles lie inside the unit circle (roots of z² + a1·z + a2; Oppenheim & Schafer)', () => {
    const coefficient = fc.double({ min: -3, max: 3, noNaN: true, noDefaultInfinity: true });
    fc.assert(
      fc.property(coefficient, coefficient, (a1, a2) => {
        const modulus = largestPoleModulus(a1, a2);
        fc.pre(Math.abs(modulus - 1) > 1e-9);
        expect(isStableBiquad({ b0: 1, b1: 0, b2: 0, a1, a2 })).toBe(modulus < 1);
      }),
      { numRuns: 2000 },
    );
  });
  it('the edges of the triangle: a pole on the unit circle is not stable', () => {
    expect(isStableBiquad({ b0: 1, b1: 0, b2: 0, a1: 0, a2: 1 })).toBe(false); // poles ±j
    expect(isStableBiquad({ b0: 1, b1: 0, b2: 0, a1: -1, a2: 0 })).toBe(false); // pole at z = 1
    expect(isStableBiquad({ b0: 1, b1: 0, b2: 0, a1: 1.9, a2: 0.95 })).toBe(true);
  });
});
