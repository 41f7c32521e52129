import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { logFrequencyGridHz } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('logFrequencyGridHz', () => {
  it('10 Hz–20 kHz at 48 points per octave has 527 points, starts at 10 Hz and stays ≤ 20 kHz (issue 3)', () => {
    const g = logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 48 });
    expect(g.length).toBe(527);
    expect(g[0]).toBe(10);
    expect(g[g.length - 1]).toBeLessThanOrEqual(20000);
    assertInDelta((g[48] as number) / (g[0] as number), 2, 1e-12);
  });
  it('includes stopHz when it falls on the grid', () => {
    const g = logFrequencyGridHz({ startHz: 10, stopHz: 1280, pointsPerOctave: 3 });
    assertInDelta(g[g.length - 1] as number, 1280, 1e-9);
  });
  it('is strictly ascending for any valid input (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1, max: 1000, noNaN: true }), fc.double({ min: 1, max: 64, noNaN: true }), fc.double({ min: 1, max: 100, noNaN: true }), (start, ppo, span) => {
        const g = logFrequencyGridHz({ startHz: start, stopHz: start * span, pointsPerOctave: ppo });
        for (let i = 1; i < g.length; i++) expect(g[i]).toBeGreaterThan(g[i - 1] as number);
        expect(g[g.length - 1]).toBeLessThanOrEqual(start * span * (1 + 1e-9));
      }),
    );
  });
  it('throws RangeError naming the parameter for zero, negative, NaN and reversed limits', () => {
    expect(() => logFrequencyGridHz({ startHz: 0, stopHz: 100, pointsPerOctave: 3 })).toThrow(/startHz/);
    expect(() => logFrequencyGridHz({ startHz: 10, stopHz: -1, pointsPerOctave: 3 })).toThrow(/stopHz/);
    expect(() => logFrequencyGridHz({ startHz: 10, stopHz: 100, pointsPerOctave: NaN })).toThrow(/pointsPerOctave/);
    expect(() => logFrequencyGridHz({ startHz: 100, stopHz: 10, pointsPerOctave: 3 })).toThrow(RangeError);
  });
});
