import { describe, expect, it } from 'vitest';
import { combinedSplDb } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('combinedSplDb (published: Kinsler et al., Fundamentals of Acoustics, 2000 — N sources +20·log10 N in phase, +10·log10 N uncorrelated)', () => {
  it('two equal sources: +6.02 dB in phase, +3.01 dB uncorrelated', () => {
    assertInDelta(combinedSplDb({ levelsDb: [100, 100], summation: 'coherent' }), 106.0206, 1e-4);
    assertInDelta(combinedSplDb({ levelsDb: [100, 100], summation: 'power' }), 103.0103, 1e-4);
  });
  it('four equal sources in phase: +12.04 dB; one source: unchanged', () => {
    assertInDelta(combinedSplDb({ levelsDb: [90, 90, 90, 90], summation: 'coherent' }), 90 + 20 * Math.log10(4), 1e-9);
    assertInDelta(combinedSplDb({ levelsDb: [97.46], summation: 'power' }), 97.46, 1e-9);
  });
  it('unequal levels: 100 and 94 dB in phase give 20·log10(10^5 + 10^4.7)', () => {
    assertInDelta(combinedSplDb({ levelsDb: [100, 94], summation: 'coherent' }), 20 * Math.log10(1e5 + Math.pow(10, 4.7)), 1e-9);
  });
  it('throws RangeError for no levels or a non-finite level', () => {
    expect(() => combinedSplDb({ levelsDb: [], summation: 'coherent' })).toThrow(/levelsDb/);
    expect(() => combinedSplDb({ levelsDb: [1, NaN], summation: 'power' })).toThrow(/levelsDb\[1\]/);
  });
});
