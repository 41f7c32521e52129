import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz } from '@/dsp';
import { findNulls } from '@/dsp/eq/find-nulls';
import { bandwidthOctaves, cascadeDb } from './eq-oracle';

const grid = logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });
const band = { startHz: 20, stopHz: 120 };

describe('findNulls: deep narrow dips below the level around them', () => {
  /** The definition's level around f: the median of d over the points within ±1/2 octave. */
  const medianAround = (d: number[], f: number) => {
    const w = d.filter((_, i) => Math.abs(Math.log2(grid[i]! / f)) <= 0.5 + 1e-12).sort((a, b) => a - b);
    return w.length % 2 ? w[(w.length - 1) / 2]! : (w[w.length / 2 - 1]! + w[w.length / 2]!) / 2;
  };

  it('finds a −20 dB cookbook notch (Q 8) on the 60 Hz grid point: there, as deep as the definition says, its extent where it crosses half that depth', () => {
    const f0 = grid[96]!; // 15·2^(96/48) = 60 Hz
    const notch = { centerHz: f0, gainDb: -20, q: 8 };
    const d = cascadeDb([notch], 48000, grid);
    const nulls = findNulls({ frequencyHz: grid, deviationDb: d, ...band });
    expect(nulls).toHaveLength(1);
    const n = nulls[0]!;
    expect(n.frequencyHz).toBe(f0);
    // A peaking filter has exactly its gain at f0 (R. Bristow-Johnson, Audio EQ Cookbook); the level around is the octave's median.
    const level = medianAround(d, f0);
    expect(level).toBeLessThan(0);
    expect(n.depthDb).toBeCloseTo(level + 20, 6);
    // The notch itself, evaluated at the reported edges, is half the depth below that level (within the interpolation between points).
    for (const edgeHz of [n.lowHz, n.highHz]) expect(Math.abs(cascadeDb([notch], 48000, [edgeHz])[0]! - (level - n.depthDb / 2))).toBeLessThan(0.2);
    expect(n.lowHz).toBeLessThan(f0);
    expect(n.highHz).toBeGreaterThan(f0);
    // and it is narrower than the notch's own half-gain band (the cookbook's bandwidth), since the level around sits below 0 dB.
    expect(Math.log2(n.highHz / n.lowHz)).toBeLessThan(bandwidthOctaves(8));
    expect(n.reason).toMatch(new RegExp(`${n.depthDb.toFixed(1)} dB below the level around it`));
  });

  it('a dip between grid points is as deep as the grid shows it', () => {
    const d = cascadeDb([{ centerHz: 63, gainDb: -20, q: 8 }], 48000, grid);
    const [n] = findNulls({ frequencyHz: grid, deviationDb: d, ...band });
    const at = d.indexOf(Math.min(...d));
    expect(n!.frequencyHz).toBe(grid[at]);
    expect(n!.depthDb).toBeCloseTo(medianAround(d, grid[at]!) - d[at]!, 9);
  });

  it('leaves a wide dip alone (the octave’s median follows it) and a shallow one below the depth', () => {
    const wide = Array.from(grid, (f) => -12 * Math.exp(-0.5 * (Math.log2(f / 50) / 0.6) ** 2));
    expect(findNulls({ frequencyHz: grid, deviationDb: wide, ...band })).toEqual([]);
    const shallow = cascadeDb([{ centerHz: 50, gainDb: -6, q: 8 }], 48000, grid);
    expect(findNulls({ frequencyHz: grid, deviationDb: shallow, ...band })).toEqual([]);
    expect(findNulls({ frequencyHz: grid, deviationDb: shallow, ...band, depthDb: 4 })).toHaveLength(1);
  });

  it('reports only minima inside the band, deepest first; a level offset changes nothing', () => {
    const d = cascadeDb([{ centerHz: 45, gainDb: -12, q: 10 }, { centerHz: 90, gainDb: -22, q: 10 }, { centerHz: 160, gainDb: -25, q: 10 }], 48000, grid);
    const nulls = findNulls({ frequencyHz: grid, deviationDb: d, ...band });
    expect(nulls.map((n) => Math.round(n.frequencyHz / 5) * 5)).toEqual([90, 45]);
    const shifted = findNulls({ frequencyHz: grid, deviationDb: d.map((v) => v + 37), ...band });
    expect(shifted.map((n) => n.frequencyHz)).toEqual(nulls.map((n) => n.frequencyHz));
  });

  it('refuses a depth under 1 dB and curves of unequal length, naming the field', () => {
    expect(() => findNulls({ frequencyHz: grid, deviationDb: Array.from(grid, () => 0), ...band, depthDb: 0.5 })).toThrow(/depthDb/);
    expect(() => findNulls({ frequencyHz: grid, deviationDb: [0, 0], ...band })).toThrow(/deviationDb/);
  });
});
