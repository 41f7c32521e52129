import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { analogSectionToBiquad, biquadsResponse, crossoverBiquads, type CrossoverFilter } from '@/dsp';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';

// Reference library: scipy.signal.butter(N, fc, btype, fs=fs, output='sos') and sosfreqz (Debian python3-scipy), written
// by scripts/reference/processor-filter-fixtures.py; Linkwitz–Riley = the Butterworth of half the order, its sos
// stacked twice (Linkwitz, J. Audio Eng. Soc. 24(1), 1976). Phase in the fixture is wrapped to (−180, 180].

interface CrossoverCase {
  readonly sampleRateHz: number;
  readonly filter: CrossoverFilter;
  /** Rows [b0, b1, b2, 1, a1, a2]. */
  readonly sos: number[][];
  readonly magnitudeDb: number[];
  readonly phaseDeg: number[];
}
interface Fixture {
  readonly source: string;
  readonly grids: Record<string, number[]>;
  readonly crossovers: CrossoverCase[];
}

const fixture = JSON.parse(readFileSync(new URL('../fixtures/processor-filters-scipy.json', import.meta.url), 'utf8')) as Fixture;
const label = (c: CrossoverCase) => `${c.filter.family} ${c.filter.order} ${c.filter.response} ${c.filter.cornerHz} Hz at ${c.sampleRateHz} Hz`;

describe('crossoverBiquads against scipy.signal.butter (reference library)', () => {
  it('the fixture covers Butterworth 1–8 and Linkwitz–Riley 2/4/8, both responses, four rates, four corners each', () => {
    expect(fixture.source).toMatch(/scipy/);
    expect(fixture.crossovers).toHaveLength(11 * 2 * 4 * 4);
    expect(new Set(fixture.crossovers.map((c) => c.sampleRateHz))).toEqual(new Set([44100, 48000, 96000, 192000]));
  });

  it('the cascade response is within 0.001 dB and 0.01° of sosfreqz up to 0.45·fs, every case', () => {
    for (const c of fixture.crossovers) {
      const grid = fixture.grids[String(c.sampleRateHz)] as number[];
      expect(grid[grid.length - 1]).toBeCloseTo(0.45 * c.sampleRateHz, 6);
      const r = biquadsResponse(crossoverBiquads(c.filter, c.sampleRateHz), c.sampleRateHz, grid);
      assertInDelta(r.magnitudeDb, c.magnitudeDb, 0.001, `${label(c)} dB`);
      const phaseError = Array.from(r.phaseDeg, (p, i) => angleDiffDeg(p, c.phaseDeg[i] as number));
      assertInDelta(phaseError, new Array<number>(grid.length).fill(0), 0.01, `${label(c)} deg`);
    }
  });

  it('the same poles as scipy (each denominator 1 + a1·z⁻¹ + a2·z⁻², in any order) and the same overall gain Π b0', () => {
    const key = (a1: number, a2: number) => [a1, a2] as const;
    const byA = (x: readonly [number, number], y: readonly [number, number]) => x[1] - y[1] || x[0] - y[0];
    for (const c of fixture.crossovers) {
      const ours = crossoverBiquads(c.filter, c.sampleRateHz);
      expect(ours.length, label(c)).toBe(c.sos.length);
      const mine = ours.map((s) => key(s.a1, s.a2)).sort(byA);
      const theirs = c.sos.map((row) => key(row[4] as number, row[5] as number)).sort(byA);
      mine.forEach((d, i) => {
        assertInDelta(d[0], (theirs[i] as readonly [number, number])[0], 1e-11, `${label(c)} a1`);
        assertInDelta(d[1], (theirs[i] as readonly [number, number])[1], 1e-11, `${label(c)} a2`);
      });
      const gain = ours.reduce((p, s) => p * s.b0, 1);
      const scipyGain = c.sos.reduce((p, row) => p * (row[0] as number), 1);
      expect(Math.abs(gain / scipyGain - 1), `${label(c)} Π b0`).toBeLessThan(1e-10);
    }
  });
});

// Exact in arithmetic; in doubles a corner at 20 Hz and 192 kHz puts the poles within t² ≈ 1e-8 of z = 1, so the direct
// form's rounding (≈ ε/t²) reaches a few 1e-9 dB — hence 1e-7 dB, still ten thousand times finer than the scipy check.
describe('crossoverBiquads: the corner lands exactly on the analog corner (pre-warping: Oppenheim & Schafer)', () => {
  const corners = [20, 80, 1000, 15000];
  const rates = [44100, 48000, 96000, 192000];
  it('every Butterworth is −3.0103 dB (−10·log10 2) at its corner (published: Butterworth 1930)', () => {
    for (const fs of rates) {
      for (const cornerHz of corners) {
        for (let order = 1; order <= 8; order++) {
          for (const response of ['lowpass', 'highpass'] as const) {
            const r = biquadsResponse(crossoverBiquads({ kind: 'crossover', family: 'butterworth', order, response, cornerHz }, fs), fs, [cornerHz]);
            assertInDelta(r.magnitudeDb[0] as number, -10 * Math.log10(2), 1e-7, `BW${order} ${response} ${cornerHz} Hz at ${fs}`);
          }
        }
      }
    }
  });
  it('every Linkwitz–Riley is −6.0206 dB (−20·log10 2) at its corner, with the LP and HP in phase there (published: Linkwitz 1976)', () => {
    for (const fs of rates) {
      for (const cornerHz of corners) {
        for (const order of [2, 4, 8]) {
          const low = biquadsResponse(crossoverBiquads({ kind: 'crossover', family: 'linkwitz-riley', order, response: 'lowpass', cornerHz }, fs), fs, [cornerHz]);
          const high = biquadsResponse(crossoverBiquads({ kind: 'crossover', family: 'linkwitz-riley', order, response: 'highpass', cornerHz }, fs), fs, [cornerHz]);
          assertInDelta(low.magnitudeDb[0] as number, -20 * Math.log10(2), 1e-7, `LR${order} low ${cornerHz} at ${fs}`);
          assertInDelta(high.magnitudeDb[0] as number, -20 * Math.log10(2), 1e-7, `LR${order} high ${cornerHz} at ${fs}`);
          // LR4 and LR8 outputs are in phase at the corner (sum +0 dB); LR2's are 180° apart (Linkwitz 1976).
          const apart = order === 2 ? 180 : 0;
          assertInDelta(Math.abs(angleDiffDeg(low.phaseDeg[0] as number, (high.phaseDeg[0] as number) + apart)), 0, 1e-6, `LR${order} phase`);
        }
      }
    }
  });
});

describe('analogSectionToBiquad', () => {
  it('a Butterworth low-pass at fs/4: t = tan(π/4) = 1, so b = [1, 2, 1]/(2 + √2), a1 = 0, a2 = (2 − √2)/(2 + √2) (worked by hand)', () => {
    const bq = analogSectionToBiquad({ kind: 'lowpass2', cornerHz: 12000, q: Math.SQRT1_2 }, 48000);
    const a0 = 2 + Math.SQRT2;
    assertInDelta([bq.b0, bq.b1, bq.b2, bq.a1, bq.a2], [1 / a0, 2 / a0, 1 / a0, 0, (2 - Math.SQRT2) / a0], 1e-15, 'coefficients');
  });
  it('a first-order high-pass at fs/4: b = [1, −1]/2, a1 = 0, b2 = a2 = 0 (worked by hand)', () => {
    const bq = analogSectionToBiquad({ kind: 'highpass1', cornerHz: 12000, q: 0.5 }, 48000);
    assertInDelta([bq.b0, bq.b1, bq.b2, bq.a1, bq.a2], [0.5, -0.5, 0, 0, 0], 1e-15, 'coefficients');
  });
  it('an odd Butterworth keeps its first-order section last, with b2 = a2 = 0', () => {
    for (const order of [1, 3, 5, 7]) {
      const sections = crossoverBiquads({ kind: 'crossover', family: 'butterworth', order, response: 'highpass', cornerHz: 80 }, 48000);
      expect(sections).toHaveLength((order + 1) / 2);
      const last = sections[sections.length - 1];
      expect(last?.b2).toBe(0);
      expect(last?.a2).toBe(0);
      sections.slice(0, -1).forEach((s) => expect(s.a2).not.toBe(0));
    }
  });
  it('names the field it refuses', () => {
    expect(() => crossoverBiquads({ kind: 'crossover', family: 'linkwitz-riley', order: 3, response: 'lowpass', cornerHz: 80 }, 48000, 'filters[2]')).toThrow(/^filters\[2\]\.order/);
    expect(() => crossoverBiquads({ kind: 'crossover', family: 'butterworth', order: 9, response: 'lowpass', cornerHz: 80 }, 48000)).toThrow(/filter\.order/);
  });
});
