import { describe, expect, it } from 'vitest';
import { alignmentGrid } from '@/dsp/timing/alignment-grid';
import { bestOfScan, flatnessAt, scanRelativeDelay, type DelayScan, type DelayScanInput } from '@/dsp/timing/delay-scan';
import { assertInDelta } from '../../helpers/assert-in-delta';

// searchRelativeDelay (the branch-and-bound search built on these) is checked against an exhaustive scan in
// delay-search-exhaustive.test.ts. Here: the scan, the direct flatness and the tie rule one by one, against the
// definition in DelayScanInput's documentation written with plain arithmetic (Math.cos/sin/log10): the power
// |A ± B·e^(−jωd)|² at each point, flatness = the largest |level − reference level| over the band.

const grid = alignmentGrid(80);

/** A deterministic mains-like A and sub-like B: smooth magnitudes, phases turning with frequency (invented shapes). */
function input(referencePower?: (i: number) => number): DelayScanInput {
  const n = grid.omega.length;
  const aRe = new Float64Array(n);
  const aIm = new Float64Array(n);
  const bRe = new Float64Array(n);
  const bIm = new Float64Array(n);
  grid.frequencyHz.forEach((f, i) => {
    const x = f / 80;
    const a = x * x / Math.sqrt(1 + Math.pow(x, 4));
    const b = 1 / Math.sqrt(1 + Math.pow(x, 4));
    aRe[i] = a * Math.cos(1.3 - 0.9 * x);
    aIm[i] = a * Math.sin(1.3 - 0.9 * x);
    bRe[i] = b * Math.cos(-0.4 - 2.1 * x);
    bIm[i] = b * Math.sin(-0.4 - 2.1 * x);
  });
  return {
    omega: grid.omega,
    aRe,
    aIm,
    bRe,
    bIm,
    bandCount: grid.bandCount,
    refIndex: grid.refIndex,
    crossoverIndex: grid.crossoverIndex,
    referencePower: referencePower ? Float64Array.from({ length: grid.bandCount }, (_, i) => referencePower(i)) : undefined,
  };
}

function levelDb(x: DelayScanInput, i: number, delayS: number, flipped: boolean): number {
  const ph = -(x.omega[i] as number) * delayS;
  const sign = flipped ? -1 : 1;
  const re = (x.aRe[i] as number) + sign * ((x.bRe[i] as number) * Math.cos(ph) - (x.bIm[i] as number) * Math.sin(ph));
  const im = (x.aIm[i] as number) + sign * ((x.bRe[i] as number) * Math.sin(ph) + (x.bIm[i] as number) * Math.cos(ph));
  return 10 * Math.log10(re * re + im * im);
}

function flatnessDefinition(x: DelayScanInput, delayS: number, flipped: boolean): number {
  let worst = 0;
  for (let i = 0; i < x.bandCount; i++) {
    const reference = x.referencePower ? 10 * Math.log10(x.referencePower[i] as number) : levelDb(x, x.refIndex, delayS, flipped);
    worst = Math.max(worst, Math.abs(levelDb(x, i, delayS, flipped) - reference));
  }
  return worst;
}

describe('scanRelativeDelay', () => {
  it('every delay firstS + k·stepS over 300 steps (past several re-anchorings): flatness and crossover level of both polarities', () => {
    const x = input();
    const scan = scanRelativeDelay(x, -0.006, 0.00004, 300);
    expect(scan.delayS.length).toBe(300);
    for (let k = 0; k < 300; k += 7) {
      const d = -0.006 + k * 0.00004;
      assertInDelta(scan.delayS[k] as number, d, 1e-15, `delay ${k}`);
      assertInDelta(scan.flatnessSameDb[k] as number, flatnessDefinition(x, d, false), 1e-9, `same ${k}`);
      assertInDelta(scan.flatnessFlippedDb[k] as number, flatnessDefinition(x, d, true), 1e-9, `flipped ${k}`);
      assertInDelta(scan.levelSameDb[k] as number, levelDb(x, x.crossoverIndex, d, false), 1e-9, `level same ${k}`);
      assertInDelta(scan.levelFlippedDb[k] as number, levelDb(x, x.crossoverIndex, d, true), 1e-9, `level flipped ${k}`);
    }
  });
  it('with a per-point reference power, flatness is measured against it instead of the reference point', () => {
    const x = input((i) => 0.5 + 0.01 * i);
    const scan = scanRelativeDelay(x, 0.001, 0.0005, 9);
    for (let k = 0; k < 9; k++) {
      const d = 0.001 + k * 0.0005;
      assertInDelta(scan.flatnessSameDb[k] as number, flatnessDefinition(x, d, false), 1e-9, `same ${k}`);
      assertInDelta(scan.flatnessFlippedDb[k] as number, flatnessDefinition(x, d, true), 1e-9, `flipped ${k}`);
    }
  });
  it('withLevels = false leaves the crossover levels at 0 and changes no flatness', () => {
    const x = input();
    const a = scanRelativeDelay(x, -0.002, 0.0001, 41, true);
    const b = scanRelativeDelay(x, -0.002, 0.0001, 41, false);
    expect(Array.from(b.levelSameDb).every((v) => v === 0)).toBe(true);
    expect(Array.from(b.levelFlippedDb).every((v) => v === 0)).toBe(true);
    expect(Array.from(b.flatnessSameDb)).toEqual(Array.from(a.flatnessSameDb));
  });
});

describe('flatnessAt', () => {
  it('is the definition at one delay and polarity, with and without a reference power (above or below the sum)', () => {
    // |A| and |B| stay under 1, so a reference power of 4 or more lies above every sum: flatness is then a dip.
    for (const x of [input(), input((i) => 1 + Math.sin(i)), input((i) => 4 + 0.1 * i)]) {
      for (const d of [-0.0123, 0, 0.00077, 0.019]) {
        for (const flipped of [false, true]) assertInDelta(flatnessAt(x, d, flipped), flatnessDefinition(x, d, flipped), 1e-9, `${d} ${flipped}`);
      }
    }
  });
});

describe('bestOfScan', () => {
  const scan = (delays: number[], same: number[], flipped: number[]): DelayScan => ({
    delayS: Float64Array.from(delays),
    flatnessSameDb: Float64Array.from(same),
    flatnessFlippedDb: Float64Array.from(flipped),
    levelSameDb: new Float64Array(delays.length),
    levelFlippedDb: new Float64Array(delays.length),
  });
  it('picks the flattest entry of either polarity', () => {
    expect(bestOfScan(scan([-1, 0, 1], [3, 2, 1.5], [2.5, 0.7, 4]))).toEqual({ index: 1, flipped: true, delayS: 0, flatnessDb: 0.7 });
  });
  it('ties within 1e-9 dB go to the smaller |delay|, then to the same polarity; a gain over 1e-9 dB wins', () => {
    expect(bestOfScan(scan([-2, -1, 0.5, 2], [1, 1, 1 + 5e-10, 1], [9, 9, 9, 9])).index).toBe(2);
    expect(bestOfScan(scan([-1, 0.5], [2, 1], [2, 1])).flipped).toBe(false);
    expect(bestOfScan(scan([-2, 0.5], [1 - 2e-9, 1], [9, 9])).index).toBe(0);
  });
});
