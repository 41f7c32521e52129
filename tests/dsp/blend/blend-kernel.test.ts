import { describe, expect, it } from 'vitest';
import { SILENCE_DB, type PathSpec } from '@/dsp';
import { accumulatePath, blendGrid, finishPath, finishSum, isBlendGrid, newCurves, toBlendGrid } from '@/dsp/blend/blend-kernel';
import { compilePath } from '@/dsp/blend/path-plan';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';
import { groupDelayWithBoundS, pathOracle, speedOfSoundOracle, sumOracle } from '../oracle/path-oracle';

// The kernel's functions called one by one, as blendResponse and blendSumResponse call them. Oracles: closed forms
// worked by hand from the published definitions (Butterworth 1930: BW2 high-pass −x²/(1 − x² + j√2·x), x = f/fc;
// a delay τ is e^(−jωτ)), and the complex.js evaluation of ../oracle/path-oracle.ts (reference library).

const c20 = speedOfSoundOracle(20);
const frequencyHz = Array.from({ length: 40 }, (_, i) => 10 * Math.pow(2, i / 6)); // 10 Hz … 1.1 kHz
const bw2High = (over: Partial<PathSpec> = {}): PathSpec => ({ name: 'mains', filter: { family: 'butterworth', order: 2, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false, ...over });
const lr4Low = (over: Partial<PathSpec> = {}): PathSpec => ({ name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false, ...over });

/** Runs one path through the kernel as blendResponse does, alone (relative delay 0 to itself). */
function onePath(path: PathSpec) {
  const grid = blendGrid(frequencyHz);
  const compiled = compilePath(path, c20);
  const curves = newCurves(frequencyHz.length);
  accumulatePath(compiled, 0, grid, true);
  finishPath(grid, compiled.delayS, curves.magnitudeDb, curves.phaseDeg, curves.unwrappedPhaseDeg, curves.groupDelayMs);
  return { curves, compiled };
}

describe('blendGrid / isBlendGrid / toBlendGrid / newCurves', () => {
  it('computes ω = 2πf once on a private copy, with an 8-row scratch whose rows 4..7 are the section rows', () => {
    const source = [20, 40, 80];
    const g = blendGrid(source);
    source[1] = 1;
    expect(Array.from(g.frequencyHz)).toEqual([20, 40, 80]);
    assertInDelta(g.omega, [40 * Math.PI, 80 * Math.PI, 160 * Math.PI], 1e-12);
    expect(g.scratch.length).toBe(24);
    g.rows.re[0] = 4;
    g.rows.im[0] = 5;
    g.rows.dIm[0] = 6;
    g.rows.dRe[0] = 7;
    expect([g.scratch[12], g.scratch[15], g.scratch[18], g.scratch[21]]).toEqual([4, 5, 6, 7]);
  });
  it('a typed grid is copied too, and bad frequencies are refused naming the index', () => {
    const typed = new Float64Array([30, 60]);
    expect(blendGrid(typed).frequencyHz).not.toBe(typed);
    expect(() => blendGrid([20, 0])).toThrow(/frequencyHz\[1\]/);
    expect(() => blendGrid([])).toThrow(/frequencyHz/);
  });
  it('isBlendGrid knows a grid from look-alikes; toBlendGrid passes a grid through and prepares anything else', () => {
    const g = blendGrid([50]);
    expect(isBlendGrid(g)).toBe(true);
    for (const other of [null, undefined, [50], new Float64Array([50]), { kind: 'blend-grid' }, { kind: 'blend-grid', omega: [1] }]) expect(isBlendGrid(other)).toBe(false);
    expect(toBlendGrid(g)).toBe(g);
    const fresh = toBlendGrid([25, 50]);
    expect(isBlendGrid(fresh)).toBe(true);
    assertInDelta(fresh.omega, [50 * Math.PI, 100 * Math.PI], 1e-12);
  });
  it('newCurves gives four separate curves of n points', () => {
    const c = newCurves(3);
    for (const a of [c.magnitudeDb, c.phaseDeg, c.unwrappedPhaseDeg, c.groupDelayMs]) expect(a.length).toBe(3);
    c.magnitudeDb[2] = 1;
    expect([c.phaseDeg[0], c.unwrappedPhaseDeg[0], c.groupDelayMs[0]]).toEqual([0, 0, 0]);
  });
});

describe('accumulatePath + finishPath: one path', () => {
  it('BW2 high-pass with 7 ms and 2 m of delay: |H|, phase 180° − atan2(√2·x, 1 − x²) − 360·f·τ unwrapped, group delay (by hand)', () => {
    const { curves, compiled } = onePath(bw2High({ delayMs: 7, distanceM: 2 }));
    const tauS = 0.007 + 2 / c20;
    assertInDelta(compiled.delayS, tauS, 1e-15);
    frequencyHz.forEach((f, i) => {
      const x = f / 80;
      // |H|² = x⁴/(1 + x⁴); phase of −x² over the denominator; group delay of the filter √2·(1 + x²)/((1 + x⁴)·ω0).
      assertInDelta(curves.magnitudeDb[i] as number, 10 * Math.log10(Math.pow(x, 4) / (1 + Math.pow(x, 4))), 1e-9, `dB at ${f}`);
      const phaseDeg = 180 - (180 / Math.PI) * Math.atan2(Math.SQRT2 * x, 1 - x * x) - 360 * f * tauS;
      assertInDelta(curves.unwrappedPhaseDeg[i] as number, phaseDeg, 1e-9 * Math.max(1, Math.abs(phaseDeg)), `unwrapped at ${f}`);
      assertInDelta(angleDiffDeg(curves.phaseDeg[i] as number, phaseDeg), 0, 1e-9, `phase at ${f}`);
      expect(curves.phaseDeg[i]).toBeGreaterThan(-180);
      expect(curves.phaseDeg[i]).toBeLessThanOrEqual(180);
      const groupMs = 1000 * ((Math.SQRT2 * (1 + x * x)) / ((1 + Math.pow(x, 4)) * 2 * Math.PI * 80) + tauS);
      assertInDelta(curves.groupDelayMs[i] as number, groupMs, 1e-12 * groupMs, `group delay at ${f}`);
    });
  });
  it('gain and polarity: −6 dB and inverted reads 6 dB lower and 180° turned', () => {
    const plain = onePath(lr4Low()).curves;
    const turned = onePath(lr4Low({ gainDb: -6, invert: true })).curves;
    frequencyHz.forEach((_, i) => {
      assertInDelta((turned.magnitudeDb[i] as number) - (plain.magnitudeDb[i] as number), -6, 1e-9);
      assertInDelta(Math.abs(angleDiffDeg(turned.phaseDeg[i] as number, plain.phaseDeg[i] as number)), 180, 1e-9);
      assertInDelta(turned.groupDelayMs[i] as number, plain.groupDelayMs[i] as number, 1e-12);
    });
  });
});

describe('accumulatePath + finishSum: the sum relative to the earliest path', () => {
  it('two paths 3.3 ms apart (the later one rotated by e^(−jωΔ)) equal the complex.js sum: magnitude, phase, group delay', () => {
    const paths = [bw2High({ delayMs: 1.2 }), lr4Low({ delayMs: 4.5, gainDb: 2, invert: true })];
    const grid = blendGrid(frequencyHz);
    const compiled = paths.map((p) => compilePath(p, c20));
    const tau0 = Math.min(...compiled.map((c) => c.delayS));
    compiled.forEach((c, k) => accumulatePath(c, c.delayS - tau0, grid, k === 0));
    const sum = newCurves(frequencyHz.length);
    finishSum(grid, tau0, sum);
    frequencyHz.forEach((f, i) => {
      const w = 2 * Math.PI * f;
      const { sum: s } = sumOracle(paths, 20, w);
      assertInDelta(sum.magnitudeDb[i] as number, 20 * Math.log10(s.abs()), 1e-9, `dB at ${f}`);
      assertInDelta(angleDiffDeg(sum.phaseDeg[i] as number, (180 / Math.PI) * s.arg()), 0, 1e-7, `phase at ${f}`);
      const gd = groupDelayWithBoundS((omega) => sumOracle(paths, 20, omega).sum, w, 1e-14);
      assertInDelta(sum.groupDelayMs[i] as number, 1000 * gd.valueS, 1e-6 + 1000 * gd.boundS, `group delay at ${f}`);
    });
  });
  it('first = true overwrites an earlier sum instead of adding to it', () => {
    const grid = blendGrid(frequencyHz);
    const a = compilePath(lr4Low(), c20);
    accumulatePath(a, 0, grid, true);
    accumulatePath(a, 0, grid, false);
    accumulatePath(a, 0, grid, true);
    const sum = newCurves(frequencyHz.length);
    finishSum(grid, 0, sum);
    frequencyHz.forEach((f, i) => assertInDelta(sum.magnitudeDb[i] as number, 20 * Math.log10(pathOracle(lr4Low(), 20, 2 * Math.PI * f).abs()), 1e-9));
  });
  it('a path plus its inverted copy is silent: SILENCE_DB and group delay 0 by definition, the phase only the earliest delay’s', () => {
    const grid = blendGrid(frequencyHz);
    const a = compilePath(bw2High({ delayMs: 2 }), c20);
    const b = compilePath(bw2High({ delayMs: 2, invert: true }), c20);
    accumulatePath(a, 0, grid, true);
    accumulatePath(b, 0, grid, false);
    const sum = newCurves(frequencyHz.length);
    finishSum(grid, a.delayS, sum);
    frequencyHz.forEach((_, i) => {
      expect(sum.magnitudeDb[i]).toBe(SILENCE_DB);
      expect(sum.groupDelayMs[i]).toBe(0);
      assertInDelta(angleDiffDeg(sum.phaseDeg[i] as number, (-360 * (frequencyHz[i] as number) * a.delayS) % 360), 0, 1e-9);
    });
  });
});
