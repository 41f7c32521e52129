import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import fc from 'fast-check';
import { EQ_LIMITS, eqSection, eqSections, type AllpassFilter, type EqFilter } from '@/dsp';
import { allpassSection, shelfQ } from '@/dsp/filters/eq-sections';
import { sectionsResponse } from '@/dsp/filters/filter-response';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { arbAllpass, arbEq } from './filter-arbitraries';

// Oracle: the analog prototypes exactly as R. Bristow-Johnson's Audio EQ Cookbook writes them (W3C note, 2021), with
// s normalised to ω0 (x = s/ω0), A = 10^(gainDb/40), evaluated with complex.js (reference library):
//   peaking     H(x) = (x² + x·(A/Q) + 1) / (x² + x/(A·Q) + 1)
//   low shelf   H(x) = A·(x² + (√A/Q)·x + A) / (A·x² + (√A/Q)·x + 1)
//   high shelf  H(x) = A·(A·x² + (√A/Q)·x + 1) / (x² + (√A/Q)·x + A)
//   all-pass    H(x) = (x² − x/Q + 1) / (x² + x/Q + 1); first order (1 − x)/(1 + x) (definition)
// and the shelf's Q from its slope S: 1/Q = √((A + 1/A)·(1/S − 1) + 2).

const poly = (x: Complex, c2: number, c1: number, c0: number) => x.mul(x).mul(c2).add(x.mul(c1)).add(c0);

function cookbookQ(filter: EqFilter): number {
  if (filter.kind === 'peaking' || filter.q !== undefined) return filter.q as number;
  const a = Math.pow(10, filter.gainDb / 40);
  return 1 / Math.sqrt((a + 1 / a) * (1 / (filter.slope ?? 1) - 1) + 2);
}

function cookbookAnalog(filter: EqFilter | AllpassFilter, fHz: number): Complex {
  if (filter.kind === 'allpass') {
    const x = new Complex(0, fHz / filter.cornerHz);
    if (filter.order === 1) return new Complex(1, 0).sub(x).div(x.add(1));
    const q = filter.q ?? Math.SQRT1_2;
    return poly(x, 1, -1 / q, 1).div(poly(x, 1, 1 / q, 1));
  }
  const a = Math.pow(10, filter.gainDb / 40);
  const q = cookbookQ(filter);
  if (filter.kind === 'peaking') {
    const x = new Complex(0, fHz / filter.centerHz);
    return poly(x, 1, a / q, 1).div(poly(x, 1, 1 / (a * q), 1));
  }
  const x = new Complex(0, fHz / filter.cornerHz);
  const r = Math.sqrt(a) / q;
  return filter.kind === 'low-shelf' ? poly(x, 1, r, a).div(poly(x, a, r, 1)).mul(a) : poly(x, a, r, 1).div(poly(x, 1, r, a)).mul(a);
}

const grid = Array.from({ length: 97 }, (_, i) => 10 * Math.pow(2, i / 8)); // 10 Hz … 40 kHz

describe('eqSection / allpassSection: the cookbook analog prototypes (complex.js oracle)', () => {
  it('any peaking filter or shelf (with q or slope) within EQ_LIMITS equals the cookbook H(s) on a grid', () => {
    fc.assert(
      fc.property(arbEq(20, 20000), (filter) => {
        const r = sectionsResponse([eqSection(filter)], grid);
        grid.forEach((fHz, i) => {
          const h = cookbookAnalog(filter, fHz);
          const tol = 1e-12 * Math.max(1, h.abs());
          assertInDelta(r.re[i] as number, h.re, tol, `${JSON.stringify(filter)} re at ${fHz}`);
          assertInDelta(r.im[i] as number, h.im, tol, `${JSON.stringify(filter)} im at ${fHz}`);
        });
      }),
      { numRuns: 300 },
    );
  });
  it('any first- or second-order all-pass equals its definition on a grid', () => {
    fc.assert(
      fc.property(arbAllpass(20, 20000), (filter) => {
        const r = sectionsResponse([allpassSection(filter)], grid);
        grid.forEach((fHz, i) => {
          const h = cookbookAnalog(filter, fHz);
          assertInDelta([r.re[i] as number, r.im[i] as number], [h.re, h.im], 1e-12, `${JSON.stringify(filter)} at ${fHz}`);
        });
      }),
      { numRuns: 200 },
    );
  });
  it('a 0 dB peaking filter or shelf is a wire', () => {
    for (const filter of [
      { kind: 'peaking', centerHz: 100, gainDb: 0, q: 3 },
      { kind: 'low-shelf', cornerHz: 100, gainDb: 0, slope: 0.4 },
      { kind: 'high-shelf', cornerHz: 100, gainDb: 0, q: 0.5 },
    ] as const) {
      const r = sectionsResponse([eqSection(filter)], grid);
      assertInDelta(r.magnitudeDb, new Array<number>(grid.length).fill(0), 1e-12, filter.kind);
    }
  });
});

describe('shelfQ and the limits', () => {
  it('slope S = 1 gives Q = 1/√2 at any gain (the cookbook: the steepest shelf without overshoot)', () => {
    for (const gainDb of [-24, -6, 0, 3, 24]) assertInDelta(shelfQ({ kind: 'low-shelf', cornerHz: 100, gainDb }), Math.SQRT1_2, 1e-15, `${gainDb} dB`);
  });
  it('a given q wins over the slope', () => {
    expect(shelfQ({ kind: 'high-shelf', cornerHz: 100, gainDb: 6, q: 2, slope: 0.3 })).toBe(2);
  });
  it('refuses a gain, q or slope outside EQ_LIMITS, naming the field', () => {
    expect(() => eqSection({ kind: 'peaking', centerHz: 100, gainDb: EQ_LIMITS.gainDb.max + 0.1, q: 1 }, 'eq[0]')).toThrow(/eq\[0\]\.gainDb/);
    expect(() => eqSection({ kind: 'peaking', centerHz: 100, gainDb: 3, q: EQ_LIMITS.q.min / 2 })).toThrow(/filter\.q/);
    expect(() => eqSection({ kind: 'low-shelf', cornerHz: 100, gainDb: 3, slope: EQ_LIMITS.slope.max + 0.5 })).toThrow(/filter\.slope/);
    expect(() => eqSection({ kind: 'high-shelf', cornerHz: 0, gainDb: 3 })).toThrow(/filter\.cornerHz/);
    expect(() => eqSection({ kind: 'notch', centerHz: 100, gainDb: 3, q: 1 } as never)).toThrow(/filter\.kind/);
    expect(() => allpassSection({ kind: 'allpass', order: 3 as never, cornerHz: 100 })).toThrow(/filter\.order/);
  });
  it('eqSections names the list entry and refuses more than 20', () => {
    expect(() => eqSections([{ kind: 'peaking', centerHz: 100, gainDb: 3, q: 1 }, { kind: 'peaking', centerHz: -1, gainDb: 3, q: 1 }])).toThrow(/eq\[1\]\.centerHz/);
    expect(() => eqSections(new Array(21).fill({ kind: 'peaking', centerHz: 100, gainDb: 3, q: 1 }))).toThrow(/at most 20/);
    expect(eqSections(undefined)).toEqual([]);
  });
});
