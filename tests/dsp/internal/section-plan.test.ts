import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import fc from 'fast-check';
import type { AnalogSection } from '@/dsp';
import { compileSections, evaluatePlanOnGrid, planValues } from '@/dsp/internal/section-plan';

// The oracle: each section's H(s) at s = jω exactly as filter-types.ts defines it — first order 1/(1 + s/ω0) or
// (s/ω0)/(1 + s/ω0), second order 1/(1 + s/(Qω0) + s²/ω0²) or (s²/ω0²)/(…) — multiplied out with complex.js
// (reference library), and H′ = dH/dω by a central difference (common practice numeric derivative).

function sectionOracle(section: AnalogSection, omega: number): Complex {
  const x = new Complex(0, omega / (2 * Math.PI * section.cornerHz)); // s/ω0
  const one = new Complex(1, 0);
  switch (section.kind) {
    case 'lowpass1':
      return one.div(one.add(x));
    case 'highpass1':
      return x.div(one.add(x));
    case 'lowpass2':
      return one.div(one.add(x.div(section.q)).add(x.mul(x)));
    case 'highpass2':
      return x.mul(x).div(one.add(x.div(section.q)).add(x.mul(x)));
    case 'general1': {
      const [n0, n1] = section.numerator ?? [1, 0, 0];
      return new Complex(n0, 0).add(x.mul(n1)).div(one.add(x));
    }
    case 'general2': {
      const [n0, n1, n2] = section.numerator ?? [1, 0, 0];
      return new Complex(n0, 0).add(x.mul(n1)).add(x.mul(x).mul(n2)).div(one.add(x.div(section.q)).add(x.mul(x)));
    }
  }
}

const productOracle = (sections: readonly AnalogSection[], gain: number, omega: number): Complex =>
  sections.reduce((h, s) => h.mul(sectionOracle(s, omega)), new Complex(gain, 0));

const coefficient = fc.double({ min: 0.05, max: 4, noNaN: true, noDefaultInfinity: true });
const arbSection: fc.Arbitrary<AnalogSection> = fc.record({
  kind: fc.constantFrom('lowpass1' as const, 'highpass1' as const, 'lowpass2' as const, 'highpass2' as const, 'general1' as const, 'general2' as const),
  cornerHz: fc.double({ min: 15, max: 400, noNaN: true, noDefaultInfinity: true }),
  q: fc.double({ min: 0.3, max: 3, noNaN: true, noDefaultInfinity: true }),
  // Used by the general kinds only (shelves, peaking and all-pass sections): a numerator without zeros on the jω axis.
  numerator: fc.tuple(coefficient, coefficient, coefficient),
});

const omegaGrid = Float64Array.from({ length: 61 }, (_, i) => 2 * Math.PI * 5 * Math.pow(2, i / 8));

describe('compileSections / evaluatePlanOnGrid', () => {
  it('H of any product of sections equals the product of their definitions (complex.js), polarity in the gain', () => {
    fc.assert(
      fc.property(fc.array(arbSection, { minLength: 0, maxLength: 8 }), fc.double({ min: 0.1, max: 10, noNaN: true }), fc.boolean(), (sections, size, invert) => {
        const gain = invert ? -size : size;
        const plan = compileSections(sections, gain);
        const out = planValues(omegaGrid.length);
        evaluatePlanOnGrid(plan, omegaGrid, out);
        omegaGrid.forEach((w, i) => {
          const h = productOracle(sections, gain, w);
          const tolerance = 1e-12 * Math.max(h.abs(), 1e-300) * (1 + sections.length);
          expect(Math.abs((out.re[i] as number) - h.re), `Re H at ${w}`).toBeLessThanOrEqual(tolerance);
          expect(Math.abs((out.im[i] as number) - h.im), `Im H at ${w}`).toBeLessThanOrEqual(tolerance);
        });
      }),
      { numRuns: 150 },
    );
  });
  it('H′/H equals a central difference of the definition: Re = d ln|H|/dω, and −Im is the group delay', () => {
    fc.assert(
      fc.property(fc.array(arbSection, { minLength: 1, maxLength: 6 }), (sections) => {
        const plan = compileSections(sections, 1);
        const out = planValues(omegaGrid.length);
        evaluatePlanOnGrid(plan, omegaGrid, out);
        omegaGrid.forEach((w, i) => {
          const step = 1e-5 * w;
          const h = productOracle(sections, 1, w);
          const ratio = productOracle(sections, 1, w + step).sub(productOracle(sections, 1, w - step)).div(2 * step).div(h);
          // Central-difference error ~ step²·H‴/H: relative 1e-7 of the size of H′/H (its terms are ~ 1/ω0 each).
          const size = sections.reduce((acc, s) => acc + 2 / (2 * Math.PI * s.cornerHz * Math.min(s.q, 1)) + 1 / w, 0);
          expect(Math.abs((out.dRe[i] as number) - ratio.re), `Re H′/H at ${w}`).toBeLessThanOrEqual(1e-6 * size);
          expect(Math.abs((out.dIm[i] as number) - ratio.im), `Im H′/H at ${w}`).toBeLessThanOrEqual(1e-6 * size);
        });
      }),
      { numRuns: 100 },
    );
  });
  it('BW2 low-pass sections at the corner: −3.01 dB, −90°, group delay √2/ω0 (published: Butterworth 1930; by hand)', () => {
    const plan = compileSections([{ kind: 'lowpass2', cornerHz: 80, q: Math.SQRT1_2 }], 1);
    const out = planValues(1);
    const w0 = 2 * Math.PI * 80;
    evaluatePlanOnGrid(plan, [w0], out);
    // H(jω0) = 1/(j·√2) = −j/√2.
    expect(Math.abs((out.re[0] as number) - 0)).toBeLessThan(1e-15);
    expect(Math.abs((out.im[0] as number) + Math.SQRT1_2)).toBeLessThan(1e-15);
    // Phase −atan2(√2·x, 1 − x²), x = ω/ω0, whose slope at x = 1 is √2 (by hand): group delay √2/ω0.
    expect(Math.abs(-(out.dIm[0] as number) - Math.SQRT2 / w0)).toBeLessThan(1e-15);
  });
  it('packs [kind code, 1/ω0, 1/Q] per section and counts the powers of s in the numerator', () => {
    const plan = compileSections(
      [
        { kind: 'highpass2', cornerHz: 50, q: 0.5 },
        { kind: 'lowpass1', cornerHz: 100, q: 0.5 },
        { kind: 'highpass1', cornerHz: 25, q: 0.5 },
      ],
      -2,
    );
    expect(plan.count).toBe(3);
    expect(plan.gain).toBe(-2);
    expect(plan.numeratorPower).toBe(3);
    expect(Array.from(plan.kernel)).toEqual([3, 1 / (2 * Math.PI * 50), 2, 0, 1 / (2 * Math.PI * 100), 2, 1, 1 / (2 * Math.PI * 25), 2]);
  });
  it('planValues gives four separate rows of n points', () => {
    const v = planValues(5);
    for (const row of [v.re, v.im, v.dRe, v.dIm]) expect(row.length).toBe(5);
    v.re[4] = 1;
    expect([v.im[0], v.dRe[0], v.dIm[0]]).toEqual([0, 0, 0]);
  });
});
