import { describe, expect, it } from 'vitest';
import { biquadsResponse, designEq, logFrequencyGridHz } from '@/dsp';
import { bandwidthOctaves, cascadeDb, peakingDb, residualOf } from './eq-oracle';

const grid = logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });
const band = { startHz: 20, stopHz: 120 };

/** The designer's answer checked against the oracle: its EQ curve and both residuals recomputed from the returned filters. */
function recheck(d: ReturnType<typeof designEq>, inputDb: ArrayLike<number>, targetDb: ArrayLike<number>) {
  const eq = cascadeDb(d.filters, d.sampleRateHz, grid);
  const corrected = Array.from(inputDb, (v, i) => v + eq[i]!);
  const before = residualOf(grid, inputDb, targetDb, d.band, d.nulls);
  const after = residualOf(grid, corrected, targetDb, d.band, d.nulls);
  eq.forEach((v, i) => expect(Math.abs(v - d.eqDb[i]!)).toBeLessThan(1e-6));
  expect(Math.abs(before.rmsDb - d.residual.before.rmsDb)).toBeLessThan(1e-6);
  expect(Math.abs(after.rmsDb - d.residual.after.rmsDb)).toBeLessThan(1e-6);
  expect(Math.abs(after.maxDb - d.residual.after.maxDb)).toBeLessThan(1e-6);
  return { before, after };
}

describe('designEq: a single resonance, made with the cookbook formula, is found and undone', () => {
  it.each([
    [35, 3],
    [57, 5],
    [90, 2],
    [42.5, 8],
  ])('+8 dB at %f Hz, Q %f: a cut within 3 percent of the centre and 1 dB of −8 dB; the residual falls below 1 dB (oracle: complex.js)', (centerHz, q) => {
    const input = cascadeDb([{ centerHz, gainDb: 8, q }], 48000, grid);
    const d = designEq({ frequencyHz: grid, magnitudeDb: input });
    const main = [...d.filters].sort((a, b) => a.gainDb - b.gainDb)[0]!;
    expect(Math.abs(main.centerHz / centerHz - 1)).toBeLessThan(0.03);
    expect(Math.abs(main.gainDb + 8)).toBeLessThan(1);
    const { before, after } = recheck(d, input, grid.map(() => d.levelOffsetDb));
    expect(after.rmsDb).toBeLessThan(1);
    expect(before.rmsDb).toBeGreaterThan(1);
    expect(d.nulls).toEqual([]);
  });
});

describe('designEq: nothing to do, nothing done', () => {
  it.each([0, -42.7, 95])('a flat response at %f dB with a flat target: no filters, residual 0', (levelDb) => {
    const d = designEq({ frequencyHz: grid, magnitudeDb: grid.map(() => levelDb) });
    expect(d.filters).toEqual([]);
    expect(d.sections).toEqual([]);
    expect(d.residual.before).toEqual({ rmsDb: 0, maxDb: 0 });
    expect(d.residual.after).toEqual({ rmsDb: 0, maxDb: 0 });
    expect(d.levelOffsetDb).toBe(levelDb);
    expect(Array.from(d.correctedDb)).toEqual(Array.from(d.inputDb));
  });

  it('a response that is the house curve, with the house curve as target: no filters', () => {
    const house = designEq({ frequencyHz: grid, magnitudeDb: grid.map(() => 0), target: { kind: 'house', riseDb: 6, belowHz: 60 } }).targetDb;
    const d = designEq({ frequencyHz: grid, magnitudeDb: house.map((v) => v + 12), target: { kind: 'house', riseDb: 6, belowHz: 60 } });
    expect(d.filters).toEqual([]);
    expect(d.residual.before.rmsDb).toBeLessThan(1e-9);
  });

  it('a response through an LR4 low-pass with the low-pass as the target’s shape: no filters (the EQ does not fight the crossover)', () => {
    // |LR4 low-pass| = 1/(1 + (f/fc)⁴) (Linkwitz 1976: a Butterworth second order, |H|² = 1/(1 + x⁴), squared).
    const lp = grid.map((f) => -20 * Math.log10(1 + (f / 80) ** 4));
    expect(designEq({ frequencyHz: grid, magnitudeDb: lp, targetShapeDb: lp }).filters).toEqual([]);
    expect(designEq({ frequencyHz: grid, magnitudeDb: lp }).filters.length).toBeGreaterThan(0);
  });
});

describe('designEq: cut first, limited boost, nulls left alone', () => {
  // A broad 5 dB hollow around 45 Hz that wants a boost, and a deep narrow notch at 60 Hz beside it.
  const hollow = Array.from(grid, (f) => -5 * Math.exp(-0.5 * (Math.log2(f / 45) / 0.35) ** 2));
  const notch = cascadeDb([{ centerHz: 60, gainDb: -22, q: 12 }], 48000, grid);
  const withNotch = hollow.map((v, i) => v + notch[i]!);

  it('boosts the hollow when nothing is in the way, never above maxBoostDb', () => {
    const d = designEq({ frequencyHz: grid, magnitudeDb: hollow, maxBoostDb: 2 });
    expect(d.filters.some((f) => f.gainDb > 0)).toBe(true);
    for (const f of d.filters) expect(f.gainDb).toBeLessThanOrEqual(2);
    recheck(d, hollow, grid.map(() => d.levelOffsetDb));
  });

  it('reports the notch and keeps every boost’s bandwidth (the cookbook’s, between its half-gain frequencies) clear of it', () => {
    const d = designEq({ frequencyHz: grid, magnitudeDb: withNotch });
    expect(d.nulls).toHaveLength(1);
    expect(Math.abs(Math.log2(d.nulls[0]!.frequencyHz / 60))).toBeLessThan(1 / 48);
    expect(d.nulls[0]!.reason).toMatch(/headroom/);
    for (const f of d.filters.filter((x) => x.gainDb > 0)) {
      const half = Math.pow(2, bandwidthOctaves(f.q) / 2);
      expect(f.centerHz * half < d.nulls[0]!.lowHz || f.centerHz / half > d.nulls[0]!.highHz).toBe(true);
    }
    recheck(d, withNotch, grid.map(() => d.levelOffsetDb));
  });

  it('maxBoostDb 0 gives cuts only; maxCutDb and the Q range hold', () => {
    const d = designEq({ frequencyHz: grid, magnitudeDb: withNotch.map((v, i) => v + 6 * Math.sin(i / 7)), maxBoostDb: 0, maxCutDb: 4, q: { min: 1, max: 3 } });
    expect(d.filters.length).toBeGreaterThan(0);
    for (const f of d.filters) {
      expect(f.gainDb).toBeLessThan(0);
      expect(f.gainDb).toBeGreaterThanOrEqual(-4);
      expect(f.q).toBeGreaterThanOrEqual(1);
      expect(f.q).toBeLessThanOrEqual(3);
    }
  });

  it('a coarse grid gets no filter narrower than two of its steps (it could hide between the points)', () => {
    const coarse = logFrequencyGridHz({ startHz: 20, stopHz: 120, pointsPerOctave: 6 });
    const d = designEq({ frequencyHz: coarse, magnitudeDb: Array.from(coarse, (f) => peakingDb({ centerHz: 47, gainDb: 9, q: 6 }, 48000, f)) });
    for (const f of d.filters) expect(bandwidthOctaves(f.q)).toBeGreaterThanOrEqual(2 / 6 - 0.01);
  });
});

describe('designEq: the answer', () => {
  const input = cascadeDb([{ centerHz: 38, gainDb: 9, q: 4 }, { centerHz: 75, gainDb: -6, q: 3 }, { centerHz: 100, gainDb: 5, q: 6 }], 96000, grid);

  it('is the same for the same input (no seed, no randomness)', () => {
    expect(designEq({ frequencyHz: grid, magnitudeDb: input, sampleRateHz: 96000 })).toEqual(designEq({ frequencyHz: grid, magnitudeDb: input, sampleRateHz: 96000 }));
  });

  it('rounds as a processor takes it (0.1 Hz, 0.1 dB, Q 0.01), and its sections are those filters at the sample rate', () => {
    const d = designEq({ frequencyHz: grid, magnitudeDb: input, sampleRateHz: 96000, maxFilters: 3 });
    expect(d.filters.length).toBeGreaterThan(0);
    expect(d.filters.length).toBeLessThanOrEqual(3);
    const onStep = (v: number, step: number) => Math.abs(v / step - Math.round(v / step)) < 1e-9;
    for (const f of d.filters) expect(onStep(f.centerHz, 0.1) && onStep(f.gainDb, 0.1) && onStep(f.q, 0.01)).toBe(true);
    recheck(d, input, grid.map(() => d.levelOffsetDb));
    d.correctedDb.forEach((v, i) => expect(Math.abs(v - d.inputDb[i]! - d.eqDb[i]!)).toBeLessThan(1e-9));
    const sectionsDb = biquadsResponse(d.sections, 96000, grid).magnitudeDb;
    cascadeDb(d.filters, 96000, grid).forEach((v, i) => expect(Math.abs(v - sectionsDb[i]!)).toBeLessThan(1e-6));
  });

  it.each<[string, Parameters<typeof designEq>[0], RegExp]>([
    ['11 filters', { frequencyHz: grid, magnitudeDb: input, maxFilters: 11 }, /maxFilters/],
    ['a boost limit of 13 dB', { frequencyHz: grid, magnitudeDb: input, maxBoostDb: 13 }, /maxBoostDb/],
    ['a sample rate of 7 kHz', { frequencyHz: grid, magnitudeDb: input, sampleRateHz: 7000 }, /sampleRateHz/],
    ['a frequency at the Nyquist frequency', { frequencyHz: [20, 50, 4000], magnitudeDb: [0, 0, 0], sampleRateHz: 8000, band }, /frequencyHz\[2\].*Nyquist/],
    ['a band with two points', { frequencyHz: grid, magnitudeDb: input, band: { startHz: 50, stopHz: 51.2 } }, /band.*at least 3 points/],
    ['Q limits upside down', { frequencyHz: grid, magnitudeDb: input, q: { min: 5, max: 2 } }, /q\.max/],
  ])('refuses %s with a RangeError naming the field', (_, options, message) => {
    expect(() => designEq(options)).toThrow(RangeError);
    expect(() => designEq(options)).toThrow(message);
  });
});
