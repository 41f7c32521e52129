import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import fc from 'fast-check';
import { filterResponse, logFrequencyGridHz, rolloffResponse, secondOrderSectionResponse, type FilterSpec } from '@/dsp';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';

const grid = logFrequencyGridHz({ startHz: 5, stopHz: 5000, pointsPerOctave: 12 });

/** Butterworth H(s) from its poles p_k = ω0·e^(jπ(2k+n−1)/(2n)) as a polynomial product, evaluated with complex.js (reference library). */
function butterworthByPoles(order: number, cornerHz: number, response: 'lowpass' | 'highpass', fHz: number): Complex {
  const w0 = 2 * Math.PI * cornerHz;
  const s = new Complex(0, 2 * Math.PI * fHz);
  let den = new Complex(1, 0);
  for (let k = 1; k <= order; k++) {
    const pole = new Complex({ abs: w0, arg: (Math.PI * (2 * k + order - 1)) / (2 * order) });
    den = den.mul(s.sub(pole));
  }
  const num = response === 'lowpass' ? new Complex(Math.pow(w0, order), 0) : s.pow(order);
  return num.div(den);
}

function reference(filter: FilterSpec, fHz: number): Complex {
  if (filter.response === 'none') return new Complex(1, 0);
  if (filter.family === 'butterworth') return butterworthByPoles(filter.order, filter.cornerHz, filter.response, fHz);
  const half = butterworthByPoles(filter.order / 2, filter.cornerHz, filter.response, fHz);
  return half.mul(half);
}

const all: FilterSpec[] = [];
for (const response of ['lowpass', 'highpass'] as const) {
  for (let order = 1; order <= 8; order++) all.push({ family: 'butterworth', order, response, cornerHz: 80 });
  for (const order of [2, 4, 8]) all.push({ family: 'linkwitz-riley', order, response, cornerHz: 80 });
}

describe('filterResponse', () => {
  it('every Butterworth low-/high-pass is −3.01 dB at the corner (published: Butterworth 1930)', () => {
    for (const f of all.filter((x) => x.family === 'butterworth')) assertInDelta(filterResponse({ filter: f, frequencyHz: [80] }).magnitudeDb[0] as number, -3.0103, 1e-4, `${f.response} ${f.order}`);
  });
  it('every Linkwitz–Riley low-/high-pass is −6.02 dB at the corner (published: Linkwitz 1976)', () => {
    for (const f of all.filter((x) => x.family === 'linkwitz-riley')) assertInDelta(filterResponse({ filter: f, frequencyHz: [80] }).magnitudeDb[0] as number, -6.0206, 1e-4, `${f.response} ${f.order}`);
  });
  it('matches the pole-product polynomial in s evaluated with complex.js for every family and order (reference library)', () => {
    for (const filter of all) {
      const r = filterResponse({ filter, frequencyHz: grid });
      grid.forEach((fHz, i) => {
        const h = reference(filter, fHz);
        const db = 20 * Math.log10(h.abs());
        if (db < -150) return;
        assertInDelta(r.magnitudeDb[i] as number, db, 1e-9, `${filter.family}${filter.order} ${filter.response} dB at ${fHz}`);
        assertInDelta(angleDiffDeg(r.phaseDeg[i] as number, (h.arg() * 180) / Math.PI), 0, 1e-7, `phase at ${fHz}`);
        assertInDelta(r.re[i] as number, h.re, 1e-9 * Math.max(1, h.abs()));
      });
    }
  });
  it('group delay equals a fine central difference of the phase (common practice numeric check)', () => {
    const filter: FilterSpec = { family: 'butterworth', order: 5, response: 'highpass', cornerHz: 60 };
    for (const fHz of [20, 60, 200]) {
      const h = 1e-4 * fHz;
      const p = filterResponse({ filter, frequencyHz: [fHz - h, fHz + h] }).phaseDeg;
      const numeric = (-angleDiffDeg(p[1] as number, p[0] as number) / 360 / (2 * h)) * 1000;
      assertInDelta(filterResponse({ filter, frequencyHz: [fHz] }).groupDelayMs[0] as number, numeric, 1e-6 * Math.max(1, Math.abs(numeric)));
    }
  });
  it('LR4 low-pass group delay at low frequency → 2·√2/(2π·fc) = 5.627 ms at 80 Hz (published: Linkwitz 1976; scipy 5.628 ms at 1 Hz)', () => {
    const r = filterResponse({ filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, frequencyHz: [0.001, 1] });
    assertInDelta(r.groupDelayMs[0] as number, (2 * Math.SQRT2 * 1000) / (2 * Math.PI * 80), 1e-6);
    assertInDelta(r.groupDelayMs[1] as number, 5.628, 0.0005);
  });
  it('gives finite outputs for any valid filter and frequency (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 8 }), fc.boolean(), fc.double({ min: 1, max: 20000, noNaN: true }), fc.double({ min: 0.1, max: 40000, noNaN: true }), (order, low, cornerHz, fHz) => {
        const r = filterResponse({ filter: { family: 'butterworth', order, response: low ? 'lowpass' : 'highpass', cornerHz }, frequencyHz: [fHz] });
        expect(Number.isFinite(r.magnitudeDb[0])).toBe(true);
        expect(Number.isFinite(r.phaseDeg[0])).toBe(true);
        expect(Number.isFinite(r.groupDelayMs[0])).toBe(true);
      }),
    );
  });
  it('throws RangeError naming the parameter for bad orders, families and corners', () => {
    expect(() => filterResponse({ filter: { family: 'butterworth', order: 9, response: 'lowpass', cornerHz: 80 }, frequencyHz: [80] })).toThrow(/order/);
    expect(() => filterResponse({ filter: { family: 'butterworth', order: 0, response: 'lowpass', cornerHz: 80 }, frequencyHz: [80] })).toThrow(/order/);
    expect(() => filterResponse({ filter: { family: 'linkwitz-riley', order: 3, response: 'lowpass', cornerHz: 80 }, frequencyHz: [80] })).toThrow(/order/);
    expect(() => filterResponse({ filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 0 }, frequencyHz: [80] })).toThrow(/cornerHz/);
    expect(() => filterResponse({ filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: NaN }, frequencyHz: [80] })).toThrow(/cornerHz/);
    expect(() => filterResponse({ filter: { family: 'bessel' as never, order: 2, response: 'lowpass', cornerHz: 80 }, frequencyHz: [80] })).toThrow(/family/);
    expect(() => filterResponse({ filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, frequencyHz: [-1] })).toThrow(/frequencyHz/);
    expect(() => filterResponse({ filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, frequencyHz: [0] })).toThrow(RangeError);
  });
});

describe('rolloffResponse', () => {
  it('sealed box at its corner reads 20·log10(Qtc) (published: Small 1972)', () => {
    assertInDelta(rolloffResponse({ rolloff: { kind: 'sealed', cornerHz: 50, q: 0.707 }, frequencyHz: [50] }).magnitudeDb[0] as number, 20 * Math.log10(0.707), 1e-9);
  });
  it('vented (B4) is −3.01 dB at the corner and falls 24 dB/octave far below (published: Thiele 1971)', () => {
    const r = rolloffResponse({ rolloff: { kind: 'vented', cornerHz: 40 }, frequencyHz: [40, 2, 1] });
    assertInDelta(r.magnitudeDb[0] as number, -3.0103, 1e-4);
    assertInDelta((r.magnitudeDb[1] as number) - (r.magnitudeDb[2] as number), 24.08, 0.01);
  });
  it('throws RangeError naming rolloff.q for q ≤ 0', () => {
    expect(() => rolloffResponse({ rolloff: { kind: 'sealed', cornerHz: 50, q: 0 }, frequencyHz: [50] })).toThrow(/rolloff\.q/);
  });
});

describe('secondOrderSectionResponse', () => {
  it('reads 20·log10(Q) at the corner for any Q (published: Self 2011, second-order sections)', () => {
    for (const q of [0.5, 0.707, 2, 10]) assertInDelta(secondOrderSectionResponse({ response: 'highpass', cornerHz: 100, q, frequencyHz: [100] }).magnitudeDb[0] as number, 20 * Math.log10(q), 1e-9);
  });
});
