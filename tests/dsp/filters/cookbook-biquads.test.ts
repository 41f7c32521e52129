import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { allpassBiquad, biquadsResponse, eqBiquad, eqSection, type AllpassFilter, type Biquad, type EqFilter } from '@/dsp';
import { sectionsResponse } from '@/dsp/filters/filter-response';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';
import { arbAllpass, arbEq, arbSampleRateHz, biquadAt, db, dcGain, nyquistGain } from './filter-arbitraries';

// Source of every check here: R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad filter coefficients" (the
// Audio EQ Cookbook; W3C Audio Working Group note, 2021).

const coefficients = (s: Biquad) => [s.b0, s.b1, s.b2, s.a1, s.a2];

describe('eqBiquad / allpassBiquad: coefficients worked by hand (python math module, from the cookbook formulae)', () => {
  it('peaking 1 kHz, +6 dB, Q 1 at 48 kHz', () => {
    // w0 = 2π·1000/48000 = 0.1308996938995747, A = 10^(6/40) = 1.4125375446227544,
    // α = sin(w0)/(2·1) = 0.06526309611002579, cos w0 = 0.9914448613738104, a0 = 1 + α/A
    const bq = eqBiquad({ kind: 'peaking', centerHz: 1000, gainDb: 6, q: 1 }, 48000);
    assertInDelta(coefficients(bq), [1.043953086990335, -1.8953207239365961, 0.8677222847598566, -1.8953207239365961, 0.9116753717501915], 1e-14, 'peaking');
  });
  it('low shelf 200 Hz, +6 dB, slope S = 1 at 48 kHz', () => {
    // w0 = 0.026179938779914945, A = 1.4125375446227544, α = sin(w0)/2·√((A + 1/A)(1/S − 1) + 2) = 0.01850989765926683,
    // 2√A·α = 0.043998109195339766, cos w0 = 0.9996573249755573, a0 = (A+1) + (A−1)cos w0 + 2√A·α
    const bq = eqBiquad({ kind: 'low-shelf', cornerHz: 200, gainDb: 6, slope: 1 }, 48000);
    assertInDelta(coefficients(bq), [1.0064455778511419, -1.9686123523200318, 0.9631200582728409, -1.9688501073857254, 0.9693278810582894], 1e-14, 'low shelf');
  });
  it('high shelf 5 kHz, −4 dB, Q 0.707 at 48 kHz', () => {
    // w0 = 0.6544984694978736, A = 10^(−4/40) = 0.7943282347242815, α = sin(w0)/(2·0.707) = 0.4305243486624616,
    // 2√A·α = 0.7674104592696773, cos w0 = 0.7933533402912352, a0 = (A+1) − (A−1)cos w0 + 2√A·α
    const bq = eqBiquad({ kind: 'high-shelf', cornerHz: 5000, gainDb: -4, q: 0.707 }, 48000);
    assertInDelta(coefficients(bq), [0.699197837439424, -0.7100304325120527, 0.2517878296749516, -1.195788937131957, 0.43674417173428004], 1e-14, 'high shelf');
  });
  it('second-order all-pass 1 kHz, Q 1/√2 (the default) at 48 kHz', () => {
    // w0 = 0.1308996938995747, α = sin(w0)/(2/√2) = 0.09229595564125725, cos w0 = 0.9914448613738104, a0 = 1 + α
    const bq = allpassBiquad({ kind: 'allpass', order: 2, cornerHz: 1000 }, 48000);
    assertInDelta(coefficients(bq), [0.8310055893467576, -1.815341082704568, 1, -1.815341082704568, 0.8310055893467576], 1e-14, 'all-pass 2');
  });
  it('first-order all-pass 1 kHz at 48 kHz: the bilinear transform of (1 − s/ω0)/(1 + s/ω0), pre-warped (Oppenheim & Schafer)', () => {
    // t = tan(π·1000/48000) = 0.06554346281523822; b0 = a1 = (t − 1)/(t + 1) = −0.8769764629927568, b1 = 1
    const bq = allpassBiquad({ kind: 'allpass', order: 1, cornerHz: 1000 }, 48000);
    assertInDelta(coefficients(bq), [-0.8769764629927568, 1, 0, -0.8769764629927568, 0], 1e-14, 'all-pass 1');
  });
});

interface CookbookCase {
  readonly sampleRateHz: number;
  readonly filter: EqFilter | AllpassFilter;
  readonly biquad: Biquad;
  readonly magnitudeDb: number[];
  readonly phaseDeg: number[];
}
const fixture = JSON.parse(readFileSync(new URL('../fixtures/processor-filters-scipy.json', import.meta.url), 'utf8')) as {
  grids: Record<string, number[]>;
  cookbook: CookbookCase[];
};
const digital = (filter: EqFilter | AllpassFilter, fs: number) => (filter.kind === 'allpass' ? allpassBiquad(filter, fs) : eqBiquad(filter, fs));

describe('cookbook cases worked by the formula in numpy (scripts/reference/processor-filter-fixtures.py; not scipy)', () => {
  it('every case: coefficients within 1e-12 and the response within 1e-4 dB and 1e-4° (the fixture keeps 1e-5)', () => {
    expect(fixture.cookbook.length).toBeGreaterThanOrEqual(10);
    for (const c of fixture.cookbook) {
      const label = JSON.stringify(c.filter);
      const bq = digital(c.filter, c.sampleRateHz);
      assertInDelta(coefficients(bq), coefficients(c.biquad), 1e-12, label);
      const grid = fixture.grids[String(c.sampleRateHz)] as number[];
      const r = biquadsResponse([bq], c.sampleRateHz, grid);
      assertInDelta(r.magnitudeDb, c.magnitudeDb, 1e-4, `${label} dB`);
      assertInDelta(Array.from(r.phaseDeg, (p, i) => angleDiffDeg(p, c.phaseDeg[i] as number)), new Array<number>(grid.length).fill(0), 1e-4, `${label} deg`);
    }
  });
});

/** A rate with an EQ whose frequency lies from 20 Hz to 0.49·fs. */
const arbEqAtRate = arbSampleRateHz.chain((fs) => fc.record({ fs: fc.constant(fs), filter: arbEq(20, 0.49 * fs) }));
const frequencyOf = (f: EqFilter) => (f.kind === 'peaking' ? f.centerHz : f.cornerHz);

describe('eqBiquad: the cookbook levels at DC, at the corner and at Nyquist, for any valid filter', () => {
  // Exact in arithmetic; the tolerance covers rounding with poles near z = 1 (a 20 Hz filter at 384 kHz).
  const tolDb = 1e-6;
  it('peaking: exactly gainDb at its centre, 0 dB at DC and at Nyquist', () => {
    fc.assert(
      fc.property(arbEqAtRate, ({ fs, filter }) => {
        const f: EqFilter & { kind: 'peaking' } = { kind: 'peaking', centerHz: frequencyOf(filter), gainDb: filter.gainDb, q: filter.q ?? 1 };
        const bq = eqBiquad(f, fs);
        assertInDelta(db(biquadAt(bq, f.centerHz, fs).abs()), f.gainDb, tolDb, 'centre');
        assertInDelta(db(dcGain(bq)), 0, tolDb, 'DC');
        assertInDelta(db(nyquistGain(bq)), 0, tolDb, 'Nyquist');
      }),
      { numRuns: 300 },
    );
  });
  it('low shelf: gainDb at DC, gainDb/2 at the corner, 0 dB at Nyquist; high shelf: 0, gainDb/2, gainDb', () => {
    fc.assert(
      fc.property(arbEqAtRate, fc.boolean(), ({ fs, filter }, low) => {
        const width = filter.kind !== 'peaking' && filter.slope !== undefined ? { slope: filter.slope } : { q: filter.q };
        const shelf: EqFilter = { kind: low ? 'low-shelf' : 'high-shelf', cornerHz: frequencyOf(filter), gainDb: filter.gainDb, ...width };
        const bq = eqBiquad(shelf, fs);
        assertInDelta(db(biquadAt(bq, frequencyOf(shelf), fs).abs()), shelf.gainDb / 2, tolDb, 'corner');
        assertInDelta(db(dcGain(bq)), low ? shelf.gainDb : 0, tolDb, 'DC');
        assertInDelta(db(nyquistGain(bq)), low ? 0 : shelf.gainDb, tolDb, 'Nyquist');
      }),
      { numRuns: 300 },
    );
  });
  it('the digital filter is the analog prototype (eqSection) at the pre-warped frequency f0·tan(πf/fs)/tan(πf0/fs) (bilinear; Oppenheim & Schafer)', () => {
    fc.assert(
      fc.property(arbEqAtRate, fc.double({ min: 0.001, max: 0.499, noNaN: true }), ({ fs, filter }, ratio) => {
        const fHz = ratio * fs;
        const f0 = frequencyOf(filter);
        const warpedHz = (f0 * Math.tan((Math.PI * fHz) / fs)) / Math.tan((Math.PI * f0) / fs);
        const d = biquadAt(eqBiquad(filter, fs), fHz, fs);
        const a = sectionsResponse([eqSection(filter)], [warpedHz]);
        assertInDelta(d.re, a.re[0] as number, 1e-7 * Math.max(1, d.abs()), 're');
        assertInDelta(d.im, a.im[0] as number, 1e-7 * Math.max(1, d.abs()), 'im');
      }),
      { numRuns: 300 },
    );
  });
});

describe('allpassBiquad: |H| = 1 everywhere; −180° (second order) or −90° (first order) at the corner', () => {
  const arbAllpassAtRate = arbSampleRateHz.chain((fs) => fc.record({ fs: fc.constant(fs), filter: arbAllpass(20, 0.49 * fs) }));
  it('for any corner, Q and rate', () => {
    fc.assert(
      fc.property(arbAllpassAtRate, ({ fs, filter }) => {
        const bq = allpassBiquad(filter, fs);
        // |H| = 1 on a grid up to just below Nyquist
        for (let k = 1; k < 40; k++) assertInDelta(biquadAt(bq, (k / 80) * fs, fs).abs(), 1, 1e-9, `|H| at ${(k / 80) * fs}`);
        // Unwrapped phase walked up from near DC (0°) to the corner, in steps small enough to unwrap (< 180° each).
        let previous = biquadAt(bq, filter.cornerHz * 1e-4, fs);
        let phaseDeg = (previous.arg() * 180) / Math.PI;
        for (let k = 1; k <= 400; k++) {
          const h = biquadAt(bq, filter.cornerHz * Math.pow(1e-4, 1 - k / 400), fs);
          phaseDeg += (h.div(previous).arg() * 180) / Math.PI;
          previous = h;
        }
        assertInDelta(phaseDeg, filter.order === 2 ? -180 : -90, 0.01, 'phase at the corner');
        // At the corner itself H is −1 (second order) or −j (first order).
        const h = biquadAt(bq, filter.cornerHz, fs);
        assertInDelta([h.re, h.im], filter.order === 2 ? [-1, 0] : [0, -1], 1e-7, 'H at the corner');
      }),
      { numRuns: 200 },
    );
  });
});
