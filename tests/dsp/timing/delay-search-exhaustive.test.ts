import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import type { FilterFamily, FilterSpec } from '@/dsp';
import { alignmentGrid } from '@/dsp/timing/alignment-grid';
import { searchRelativeDelay, type DelayScanInput } from '@/dsp/timing/delay-scan';
import { arbPath, arbTemperatureC, pathOracle } from '../oracle/path-oracle';

// searchRelativeDelay finds its coarse best by branch and bound (a lower bound from every 4th band point, then the
// full band only where the bound could still win) and claims the same answer as evaluating every coarse delay; then
// it refines ±1 coarse step. The oracle here is that exhaustive evaluation, written in the test with plain
// arithmetic (Math.cos/sin/log10, none of dsp/'s fast sin/cos, recurrences or subsets) straight from the definition
// in DelayScanInput's documentation: for every relative delay d = k·step, k = −round(max/step)…+round(max/step),
// and both polarities of B, the power |A ± B·e^(−jωd)|² at every band point, and flatness = the largest
// |10·log10(power) − 10·log10(reference power)| over the band (the reference being the sum at refIndex, or the
// per-point referencePower when given). A and B come from paths evaluated with complex.js from their published
// definitions (../oracle/path-oracle.ts, reference library) or are arbitrary complex numbers. The grid is
// alignmentGrid(fc)'s frequency list (its definition: fc/2…2fc at 48 per octave, and 4fc as the reference).

/** Tie tolerance of the documented rule, dB. */
const TIE_DB = 1e-9;

interface Candidate {
  readonly k: number;
  readonly delayS: number;
  readonly flipped: boolean;
  readonly flatnessDb: number;
}

/** Power |A_i ± B_i·e^(−jω_i·d)|² at one point, plain arithmetic; `tiny` floors an exact cancellation as the code's doc does. */
function powerAt(input: DelayScanInput, i: number, delayS: number, flipped: boolean): number {
  const phase = -(input.omega[i] as number) * delayS;
  const c = Math.cos(phase);
  const s = Math.sin(phase);
  const br = input.bRe[i] as number;
  const bi = input.bIm[i] as number;
  const sign = flipped ? -1 : 1;
  const re = (input.aRe[i] as number) + sign * (br * c - bi * s);
  const im = (input.aIm[i] as number) + sign * (br * s + bi * c);
  return re * re + im * im + 1e-300;
}

/** (|A_i| + |B_i|)², the largest the power at point i can be; over the power it is the conditioning of that point's sum. */
const sizeCache = new WeakMap<DelayScanInput, Float64Array>();
function sizes(input: DelayScanInput): Float64Array {
  let out = sizeCache.get(input);
  if (!out) {
    out = Float64Array.from(input.omega, (_, i) => {
      const a = Math.hypot(input.aRe[i] as number, input.aIm[i] as number);
      const b = Math.hypot(input.bRe[i] as number, input.bIm[i] as number);
      return (a + b) * (a + b);
    });
    sizeCache.set(input, out);
  }
  return out;
}

/** Flatness at one delay and polarity, and the worst conditioning (|A| + |B|)²/power over the points used. */
function flatnessOracle(input: DelayScanInput, delayS: number, flipped: boolean): { flatnessDb: number; conditioning: number } {
  const size = sizes(input);
  const ref = input.referencePower ? NaN : powerAt(input, input.refIndex, delayS, flipped);
  let worst = 0;
  let conditioning = input.referencePower ? 1 : (size[input.refIndex] as number) / ref;
  for (let i = 0; i < input.bandCount; i++) {
    const p = powerAt(input, i, delayS, flipped);
    const level = input.referencePower ? 10 * Math.log10(p / (input.referencePower[i] as number)) : 10 * Math.log10(p) - 10 * Math.log10(ref);
    worst = Math.max(worst, Math.abs(level));
    conditioning = Math.max(conditioning, (size[i] as number) / p);
  }
  return { flatnessDb: worst, conditioning };
}

/** The crossover level 10·log10|A ± B·e^(−jωd)|² at crossoverIndex and its conditioning. */
function levelOracle(input: DelayScanInput, delayS: number, flipped: boolean): { levelDb: number; conditioning: number } {
  const i = input.crossoverIndex;
  const p = powerAt(input, i, delayS, flipped);
  return { levelDb: 10 * Math.log10(p), conditioning: (sizes(input)[i] as number) / p };
}

/**
 * Every coarse delay and both polarities; the best by the documented rule: flatter by more than 1e-9 dB, or as flat
 * within 1e-9 dB and a smaller |delay| (equal |delay|: the earlier delay, then the same polarity). Also returns how
 * far the runner-up (any other delay or polarity) is behind the best, dB.
 */
function exhaustiveCoarseBest(input: DelayScanInput, maxDelayS: number, stepS: number): { best: Candidate; margin: number; firstS: number } {
  const half = Math.round(maxDelayS / stepS);
  let best: Candidate | undefined;
  const all: Candidate[] = [];
  for (let k = -half; k <= half; k++) {
    const delayS = k * stepS;
    for (const flipped of [false, true]) {
      const c = { k, delayS, flipped, flatnessDb: flatnessOracle(input, delayS, flipped).flatnessDb };
      all.push(c);
      if (best === undefined) {
        best = c;
        continue;
      }
      const tie = Math.abs(c.flatnessDb - best.flatnessDb) <= TIE_DB;
      const closer = Math.abs(c.delayS) < Math.abs(best.delayS) || (Math.abs(c.delayS) === Math.abs(best.delayS) && (c.k < best.k || (c.k === best.k && !c.flipped && best.flipped)));
      if (c.flatnessDb < best.flatnessDb - TIE_DB || (tie && closer)) best = c;
    }
  }
  const chosen = best as Candidate;
  let margin = Infinity;
  for (const c of all) if (c !== chosen) margin = Math.min(margin, c.flatnessDb - chosen.flatnessDb);
  return { best: chosen, margin, firstS: -half * stepS };
}

/** Rounding allowance for a flatness or level compared across two evaluations: 1e-9 dB plus what the conditioning amplifies. */
const slackDb = (conditioning: number): number => TIE_DB + 10 * Math.log10(1 + 1e-13 * conditioning);

/**
 * Runs the search and checks it against the exhaustive scan: its final flatness (re-evaluated here) is at least as
 * flat as the exhaustive coarse best (within 1e-9 dB), it reports its own flatness truthfully, its delay lies in the
 * fine window around the coarse best when that best is unique, its coarse delays are the documented grid, its
 * crossover levels match, and withLevels does not change the choice.
 */
function checkSearch(input: DelayScanInput, maxDelayS: number, stepS: number): void {
  const { coarse, best } = searchRelativeDelay(input, maxDelayS, stepS, true);
  const exhaustive = exhaustiveCoarseBest(input, maxDelayS, stepS);
  const mine = flatnessOracle(input, best.delayS, best.flipped);
  const bestOfAll = flatnessOracle(input, exhaustive.best.delayS, exhaustive.best.flipped);
  const detail = `search ${best.delayS * 1000} ms ${best.flipped ? 'flipped' : 'same'} ${mine.flatnessDb} dB; exhaustive ${exhaustive.best.delayS * 1000} ms ${exhaustive.best.flipped ? 'flipped' : 'same'} ${exhaustive.best.flatnessDb} dB`;
  // Never worse than the best coarse delay: branch and bound exact, refinement never a step back.
  expect(mine.flatnessDb, detail).toBeLessThanOrEqual(exhaustive.best.flatnessDb + slackDb(Math.max(mine.conditioning, bestOfAll.conditioning)));
  // Its reported flatness is the flatness at its delay.
  expect(Math.abs(best.flatnessDb - mine.flatnessDb), detail).toBeLessThanOrEqual(slackDb(mine.conditioning));
  // The refinement searches ±1 coarse step around the coarse best (from the range's start at the lower edge).
  if (exhaustive.margin > 1e-7) {
    const lo = Math.max(exhaustive.firstS, exhaustive.best.delayS - stepS);
    expect(best.delayS, detail).toBeGreaterThanOrEqual(lo - 1e-12);
    expect(best.delayS, detail).toBeLessThanOrEqual(lo + 2 * stepS + 1e-12);
  }
  // Coarse delays: −max…+max in steps; the crossover level of each, both polarities.
  const half = Math.round(maxDelayS / stepS);
  expect(coarse.delayS.length).toBe(2 * half + 1);
  const wrong: string[] = [];
  coarse.delayS.forEach((d, j) => {
    const expected = (j - half) * stepS;
    if (!(Math.abs(d - expected) <= 1e-12 * Math.max(1, Math.abs(expected)))) wrong.push(`delay[${j}] ${d} ≠ ${expected}`);
    for (const flipped of [false, true]) {
      const level = levelOracle(input, expected, flipped);
      const got = (flipped ? coarse.levelFlippedDb : coarse.levelSameDb)[j] as number;
      if (!(Math.abs(got - level.levelDb) <= slackDb(1e3 * level.conditioning))) wrong.push(`level at ${expected * 1000} ms ${flipped ? 'flipped' : 'same'}: ${got} ≠ ${level.levelDb}`);
    }
  });
  expect(wrong.slice(0, 5)).toEqual([]);
  // The crossover levels are a by-product: skipping them changes nothing in the choice.
  const without = searchRelativeDelay(input, maxDelayS, stepS, false).best;
  expect(without.delayS).toBe(best.delayS);
  expect(without.flipped).toBe(best.flipped);
}

const grids = new Map<number, ReturnType<typeof alignmentGrid>>();
const gridFor = (crossoverHz: number): ReturnType<typeof alignmentGrid> => {
  let g = grids.get(crossoverHz);
  if (!g) grids.set(crossoverHz, (g = alignmentGrid(crossoverHz)));
  return g;
};

/** A scan input from A, B given per grid point. */
function inputOf(crossoverHz: number, a: (i: number, omega: number) => [number, number], b: (i: number, omega: number) => [number, number], referencePower?: (i: number) => number): DelayScanInput {
  const g = gridFor(crossoverHz);
  const n = g.omega.length;
  const aRe = new Float64Array(n);
  const aIm = new Float64Array(n);
  const bRe = new Float64Array(n);
  const bIm = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    [aRe[i], aIm[i]] = a(i, g.omega[i] as number);
    [bRe[i], bIm[i]] = b(i, g.omega[i] as number);
  }
  return {
    omega: g.omega,
    aRe,
    aIm,
    bRe,
    bIm,
    bandCount: g.bandCount,
    refIndex: g.refIndex,
    crossoverIndex: g.crossoverIndex,
    referencePower: referencePower ? Float64Array.from({ length: g.bandCount }, (_, i) => referencePower(i)) : undefined,
  };
}

/**
 * Small deterministic generator so that one fast-check seed draws a whole array of values (the public-domain
 * "mulberry32" integer mix, written from memory; its statistical quality hardly matters here).
 */
function mulberry32(seed: number): () => number {
  let t = seed >>> 0;
  return () => {
    t = (t + 0x6d2b79f5) >>> 0;
    let r = Math.imul(t ^ (t >>> 15), 1 | t);
    r = (r + Math.imul(r ^ (r >>> 7), 61 | r)) ^ r;
    return ((r ^ (r >>> 14)) >>> 0) / 4294967296;
  };
}

/** Scan ranges: the default (±20 ms in 0.05 ms) or random ones (±1–25 ms in 0.02–0.5 ms, at most 1001 delays). */
const arbRange = fc.oneof(
  fc.constant({ maxDelayS: 0.02, stepS: 0.00005 }),
  fc
    .record({ maxDelayS: fc.double({ min: 0.001, max: 0.025, noNaN: true }), stepS: fc.double({ min: 0.00002, max: 0.0005, noNaN: true }) })
    .map(({ maxDelayS, stepS }) => ({ maxDelayS: Math.min(maxDelayS, 500 * stepS), stepS })),
);

const arbCrossoverHz = fc.double({ min: 40, max: 200, noNaN: true, noDefaultInfinity: true });
const family = (f: fc.Arbitrary<'lowpass' | 'highpass'>): fc.Arbitrary<Omit<FilterSpec, 'cornerHz'>> =>
  fc.oneof(
    fc.record({ family: fc.constant<FilterFamily>('butterworth'), order: fc.integer({ min: 1, max: 8 }), response: f }),
    fc.record({ family: fc.constant<FilterFamily>('linkwitz-riley'), order: fc.constantFrom(2, 4, 8), response: f }),
  );

/** Stops fast-check after 20 s (a normal run takes a few seconds) and reports that as a failure, so a shrink cannot run on for minutes. */
const shrinkBudget = () => fc.interruptAfterTimeLimit(20_000, { failOnInterrupt: true });

describe('searchRelativeDelay against an exhaustive scan of every coarse delay (oracle: definition evaluated in the test)', () => {
  it('realistic mains and sub paths (complex.js evaluation of the published definitions, reference library): never less flat than the best coarse delay', () => {
    fc.assert(
      fc.property(
        arbCrossoverHz,
        family(fc.constant('highpass' as const)),
        family(fc.constant('lowpass' as const)),
        arbPath('mains'),
        arbPath('sub'),
        arbTemperatureC,
        arbRange,
        (crossoverHz, mainsFilter, subFilter, mainsBase, subBase, temperatureC, range) => {
          const mains = { ...mainsBase, filter: { ...mainsFilter, cornerHz: crossoverHz } };
          const sub = { ...subBase, filter: { ...subFilter, cornerHz: crossoverHz } };
          const at = (p: typeof mains) => (_: number, w: number): [number, number] => {
            const h = pathOracle(p, temperatureC, w);
            return [h.re, h.im];
          };
          checkSearch(inputOf(crossoverHz, at(mains), at(sub)), range.maxDelayS, range.stepS);
        },
      ),
      { numRuns: 60, plugins: [shrinkBudget()] },
    );
  });

  it('arbitrary complex A and B (random per point, random multipath sums, lopsided levels), with and without a per-point reference power', () => {
    const arbStyle = fc.constantFrom('per-point', 'multipath', 'lopsided');
    fc.assert(
      fc.property(arbCrossoverHz, arbStyle, fc.integer(), fc.boolean(), arbRange, (crossoverHz, style, seed, withReference, range) => {
        const rnd = mulberry32(seed);
        const logUniform = (lo: number, hi: number): number => Math.pow(10, lo + (hi - lo) * rnd());
        const polar = (m: number, p: number): [number, number] => [m * Math.cos(p), m * Math.sin(p)];
        let a: (i: number, w: number) => [number, number];
        let b: (i: number, w: number) => [number, number];
        if (style === 'multipath') {
          // A sum of 1–3 delayed, scaled echoes each: comb-like responses with several near-equal optima.
          const echoes = () => Array.from({ length: 1 + Math.floor(3 * rnd()) }, () => ({ g: (rnd() < 0.5 ? -1 : 1) * logUniform(-1, 0.5), t: 0.03 * rnd() }));
          const sum = (e: ReturnType<typeof echoes>) => (_: number, w: number): [number, number] =>
            e.reduce<[number, number]>((acc, x) => [acc[0] + x.g * Math.cos(-w * x.t), acc[1] + x.g * Math.sin(-w * x.t)], [0, 0]);
          a = sum(echoes());
          b = sum(echoes());
        } else {
          // B's level: 0.1–10 like A's, or lopsided 0.001–0.1 or 10–1000.
          const lo = style === 'lopsided' ? (rnd() < 0.5 ? -3 : 1) : -1;
          const as = Array.from({ length: 98 }, () => polar(logUniform(-1, 1), 2 * Math.PI * rnd()));
          const bs = Array.from({ length: 98 }, () => polar(logUniform(lo, lo + 2), 2 * Math.PI * rnd()));
          a = (i) => as[i] as [number, number];
          b = (i) => bs[i] as [number, number];
        }
        const referencePower = withReference ? (() => {
          const r = Array.from({ length: 98 }, () => logUniform(-1, 1));
          return (i: number) => r[i] as number;
        })() : undefined;
        checkSearch(inputOf(crossoverHz, a, b, referencePower), range.maxDelayS, range.stepS);
      }),
      { numRuns: 80, plugins: [shrinkBudget()] },
    );
  });

  it('B ≡ 0: every delay is as flat; the tie rule keeps the delay at 0 and the same polarity', () => {
    const input = inputOf(80, (i) => [1 + 0.01 * i, 0.5], () => [0, 0]);
    const { best } = searchRelativeDelay(input, 0.02, 0.00005);
    expect(Math.abs(best.delayS)).toBeLessThan(1e-15);
    expect(best.flipped).toBe(false);
  });

  it('two equal paths a pure delay d0 apart are made one by a relative delay of −d0, either polarity (geometry: common practice)', () => {
    for (const [d0, sign] of [
      [0.0071234, 1],
      [-0.0123457, 1],
      [0.0032109, -1],
    ] as const) {
      // A = 1, B = ±e^(−jω·d0): with B delayed by d, the sum is 1 ± e^(−jω(d0 + d)), flat (0 dB) at d = −d0.
      const input = inputOf(100, () => [1, 0], (_, w) => [sign * Math.cos(-w * d0), sign * Math.sin(-w * d0)]);
      const { best } = searchRelativeDelay(input, 0.02, 0.00005);
      expect(best.flipped).toBe(sign < 0);
      // The fine scan steps 2·0.05/40 ms: within half a fine step of −d0.
      expect(Math.abs(best.delayS + d0)).toBeLessThanOrEqual(0.00005 / 40 + 1e-12);
      expect(flatnessOracle(input, best.delayS, best.flipped).flatnessDb).toBeLessThan(0.01);
    }
  });
});
