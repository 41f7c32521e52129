import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import fc from 'fast-check';
import { blendResponse, blendSumResponse, SILENCE_DB, type PathSpec } from '@/dsp';
import { angleDiffDeg } from '../../helpers/assert-in-delta';
import { arbPath, arbTemperatureC, groupDelayWithBoundS, pathDelayOracleS, pathOracle, sumOracle } from '../oracle/path-oracle';

// Oracle: every path's transfer function written in the test from its published definition (Butterworth poles,
// Linkwitz–Riley = Butterworth squared, Small's sealed box, Thiele's B4 vented box, gain, polarity, e^(−jωτ) with
// Kinsler's c) and evaluated with complex.js (reference library) — see ../oracle/path-oracle.ts. None of dsp/'s
// sections, Q tables, kernel or fast sin/cos/atan2 is used by the oracle.

const DB_PER_NEPER = 20 / Math.LN10;
const DEG_PER_RAD = 180 / Math.PI;
const SILENT_POWER = Math.pow(10, SILENCE_DB / 10);

/**
 * Relative rounding of one term at ω: its phase −ωτ is rounded to about one ulp of ωτ (both here and in the code),
 * the filter products to a few ulps. A sum of terms of total size Σ|H| whose result is |S| loses κ = Σ|H|/|S| of that
 * (a cancelling sum is ill-conditioned whoever computes it), so the tolerances scale with κ beyond their floors.
 */
function termRounding(omega: number, tauMaxS: number): number {
  return 1e-14 + 4e-16 * omega * tauMaxS;
}

/** Frequencies 10 Hz – 20 kHz, log-uniform, sorted. */
const arbGridHz = fc
  .array(fc.double({ min: 1, max: Math.log10(20000), noNaN: true, noDefaultInfinity: true }), { minLength: 1, maxLength: 40, size: 'max' })
  .map((xs) => xs.map((x) => Math.pow(10, x)).sort((a, b) => a - b));

interface Mismatch {
  readonly what: string;
  readonly fHz: number;
  readonly got: number;
  readonly expected: number;
  readonly tolerance: number;
}

/**
 * Compares one response (magnitude dB, wrapped phase deg, group delay ms) with the oracle `evaluate` at each point;
 * returns the mismatches (empty when every check holds). `termSize(ω)` is Σ|H_k| of the terms summed there.
 */
function compareCurves(
  label: string,
  frequencyHz: readonly number[],
  curves: { magnitudeDb: Float64Array; phaseDeg: Float64Array; unwrappedPhaseDeg: Float64Array; groupDelayMs: Float64Array },
  evaluate: (omega: number) => Complex,
  termSize: (omega: number) => number,
  tauMaxS: number,
): Mismatch[] {
  const bad: Mismatch[] = [];
  const check = (what: string, fHz: number, got: number, expected: number, tolerance: number): void => {
    if (!(Math.abs(got - expected) <= tolerance)) bad.push({ what: `${label} ${what}`, fHz, got, expected, tolerance });
  };
  frequencyHz.forEach((fHz, i) => {
    const omega = 2 * Math.PI * fHz;
    const h = evaluate(omega);
    const power = h.abs() * h.abs();
    // The code floors an exact cancellation at SILENCE_DB; right at the floor either side is fair.
    if (Math.abs(Math.log10(power / SILENT_POWER)) < 1e-6) return;
    if (power <= SILENT_POWER) {
      check('silent dB', fHz, curves.magnitudeDb[i] as number, SILENCE_DB, 0);
      return;
    }
    const kappa = termSize(omega) / h.abs();
    const eps = termRounding(omega, tauMaxS) * kappa;
    check('dB', fHz, curves.magnitudeDb[i] as number, DB_PER_NEPER * Math.log(h.abs()), 1e-9 + DB_PER_NEPER * eps);
    check('phase °', fHz, angleDiffDeg(curves.phaseDeg[i] as number, DEG_PER_RAD * h.arg()), 0, 1e-6 + DEG_PER_RAD * eps);
    // The unwrapped phase differs from the wrapped one by whole turns only.
    const turns = ((curves.unwrappedPhaseDeg[i] as number) - (curves.phaseDeg[i] as number)) / 360;
    check('unwrapped − wrapped (turns)', fHz, turns, Math.round(turns), 1e-9 * Math.max(1, Math.abs(turns)));
    // Group delay: a Richardson-extrapolated central difference of the oracle's phase around ω(1 ± 1e-6), with its
    // own error bound (truncation and phase rounding eps over the step).
    const gd = groupDelayWithBoundS(evaluate, omega, eps);
    if (Number.isFinite(gd.boundS)) check('group delay ms', fHz, curves.groupDelayMs[i] as number, 1000 * gd.valueS, 1e-7 + 1e-7 * Math.abs(1000 * gd.valueS) + 1000 * gd.boundS);
  });
  return bad;
}

const report = (bad: readonly Mismatch[]): string =>
  bad
    .slice(0, 5)
    .map((m) => `${m.what} at ${m.fHz} Hz: got ${m.got}, oracle ${m.expected}, |diff| ${Math.abs(m.got - m.expected)} > ${m.tolerance}`)
    .join('\n');

/**
 * Stops fast-check after 20 s (a normal run takes a few seconds) and reports that as a failure: shrinking a failure
 * over many doubles can otherwise run for many minutes; the counterexample found so far is still printed.
 */
const shrinkBudget = () => fc.interruptAfterTimeLimit(20_000, { failOnInterrupt: true });

const maxTau = (paths: readonly PathSpec[], temperatureC: number): number => Math.max(...paths.map((p) => pathDelayOracleS(p, temperatureC)));

const lr = (response: 'lowpass' | 'highpass', order: number, invert = false): PathSpec => ({
  name: response,
  filter: { family: 'linkwitz-riley', order, response, cornerHz: 80 },
  gainDb: 0,
  delayMs: 0,
  invert,
});
const w80 = 2 * Math.PI * 80;

describe('the oracle itself reproduces published values (so it cannot share a mistake with the code unnoticed)', () => {
  it('Butterworth −3.01 dB and Linkwitz–Riley −6.02 dB at the corner (published: Butterworth 1930; Linkwitz 1976)', () => {
    for (const response of ['lowpass', 'highpass'] as const) {
      for (let order = 1; order <= 8; order++) {
        const h = pathOracle({ name: 'b', filter: { family: 'butterworth', order, response, cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false }, 20, w80);
        expect(Math.abs(DB_PER_NEPER * Math.log(h.abs()) + 3.0103)).toBeLessThan(1e-4);
      }
      for (const order of [2, 4, 8]) expect(Math.abs(DB_PER_NEPER * Math.log(pathOracle(lr(response, order), 20, w80).abs()) + 6.0206)).toBeLessThan(1e-4);
    }
  });
  it('LR4 and LR8 low + high sum flat within 1e-9 dB, LR2 only with one path inverted; LR4 inverted nulls at the corner (published: Linkwitz 1976)', () => {
    for (const fHz of [10, 40, 80, 160, 1000]) {
      const w = 2 * Math.PI * fHz;
      for (const order of [4, 8]) expect(Math.abs(DB_PER_NEPER * Math.log(sumOracle([lr('lowpass', order), lr('highpass', order)], 20, w).sum.abs()))).toBeLessThan(1e-9);
      expect(Math.abs(DB_PER_NEPER * Math.log(sumOracle([lr('lowpass', 2), lr('highpass', 2, true)], 20, w).sum.abs()))).toBeLessThan(1e-9);
    }
    expect(sumOracle([lr('lowpass', 4), lr('highpass', 4, true)], 20, w80).sum.abs()).toBeLessThan(1e-12);
  });
  it('LR4 sum group delay at 1 Hz ≈ 2√2/(2π·80 Hz) = 5.627 ms (published: Linkwitz 1976; scipy gives 5.628 ms at 1 Hz, reference library)', () => {
    const gd = groupDelayWithBoundS((w) => sumOracle([lr('lowpass', 4), lr('highpass', 4)], 20, w).sum, 2 * Math.PI, 1e-14);
    expect(Math.abs(1000 * gd.valueS - 5.628)).toBeLessThan(0.001);
  });
  it('1 m of air at 20 °C is 2.914 ms (published: Kinsler et al. 2000, c = 343.21 m/s)', () => {
    const p: PathSpec = { name: 'air', filter: { family: 'butterworth', order: 2, response: 'none', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false, distanceM: 1 };
    expect(Math.abs(1000 * pathDelayOracleS(p, 20) - 2.9137)).toBeLessThan(1e-4);
  });
  it('a sealed box is −3.01 dB at its corner with Q = 1/√2 and +20·log10(Q) at the corner in general; vented B4 −3.01 dB (published: Small 1972; Thiele 1971)', () => {
    const at = (rolloff: PathSpec['rolloff']): number =>
      DB_PER_NEPER * Math.log(pathOracle({ name: 'r', filter: { family: 'butterworth', order: 1, response: 'none', cornerHz: 1 }, rolloff, gainDb: 0, delayMs: 0, invert: false }, 20, 2 * Math.PI * 50).abs());
    expect(Math.abs(at({ kind: 'sealed', cornerHz: 50, q: Math.SQRT1_2 }) + 3.0103)).toBeLessThan(1e-4);
    expect(Math.abs(at({ kind: 'sealed', cornerHz: 50, q: 1.2 }) - 20 * Math.log10(1.2))).toBeLessThan(1e-9);
    expect(Math.abs(at({ kind: 'lowpass', cornerHz: 50, q: 0.9 }) - 20 * Math.log10(0.9))).toBeLessThan(1e-9);
    expect(Math.abs(at({ kind: 'vented', cornerHz: 50 }) + 3.0103)).toBeLessThan(1e-4);
  });
});

describe('blend sum against an independent complex.js evaluation of the definitions (reference library; published definitions named in ../oracle/path-oracle.ts)', () => {
  it('blendSumResponse: magnitude (1e-9 dB), wrapped phase (1e-6°) and group delay of Σ paths for random 1–5 path systems', () => {
    fc.assert(
      fc.property(fc.array(arbPath('p'), { minLength: 1, maxLength: 5 }), arbTemperatureC, arbGridHz, (paths, temperatureC, frequencyHz) => {
        const { sum } = blendSumResponse({ temperatureC, frequencyHz, paths });
        const bad = compareCurves(
          'sum',
          frequencyHz,
          sum,
          (w) => sumOracle(paths, temperatureC, w).sum,
          (w) => sumOracle(paths, temperatureC, w).termSize,
          maxTau(paths, temperatureC),
        );
        expect(bad, report(bad)).toEqual([]);
      }),
      { numRuns: 600, plugins: [shrinkBudget()] },
    );
  });

  it('blendResponse: every path and the sum, same oracle', () => {
    fc.assert(
      fc.property(fc.array(arbPath('p'), { minLength: 1, maxLength: 5 }), arbTemperatureC, arbGridHz, (paths, temperatureC, frequencyHz) => {
        const r = blendResponse({ temperatureC, frequencyHz, paths });
        const tau = maxTau(paths, temperatureC);
        const bad = [
          ...compareCurves('sum', frequencyHz, r.sum, (w) => sumOracle(paths, temperatureC, w).sum, (w) => sumOracle(paths, temperatureC, w).termSize, tau),
          ...paths.flatMap((p, k) =>
            compareCurves(`path ${k}`, frequencyHz, r.paths[k]!, (w) => pathOracle(p, temperatureC, w), (w) => pathOracle(p, temperatureC, w).abs(), pathDelayOracleS(p, temperatureC)),
          ),
        ];
        expect(bad, report(bad)).toEqual([]);
      }),
      { numRuns: 200, plugins: [shrinkBudget()] },
    );
  });
});
