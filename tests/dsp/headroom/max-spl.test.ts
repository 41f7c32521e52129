import { describe, expect, it } from 'vitest';
import { maxSplDb } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const base = { sensitivityDb: 87, sensitivityRef: '1W' as const, impedanceOhm: 8, powerW: 100, distanceM: 3, count: 1 };

describe('maxSplDb (inverse-square law, published: Kinsler et al. 2000)', () => {
  it('87 dB, 100 W, 3 m → 97.46 dB', () => {
    assertInDelta(maxSplDb(base).splDb, 97.46, 0.005);
  });
  it('2.83 V into 8 Ω is 1 W; into 4 Ω a 2.83 V rating is 3.01 dB above the 1 W one', () => {
    assertInDelta(maxSplDb({ ...base, sensitivityRef: '2.83V' }).splDb, 97.46, 0.005);
    assertInDelta(maxSplDb({ ...base, sensitivityRef: '2.83V', impedanceOhm: 4 }).sensitivity1WDb, 87 - 3.0103, 1e-4);
  });
  it('N units in phase add 20·log10 N, uncorrelated 10·log10 N (textbook acoustics, e.g. Kinsler et al. 2000; from memory)', () => {
    assertInDelta(maxSplDb({ ...base, count: 2 }).splDb - maxSplDb(base).splDb, 6.0206, 1e-4);
    assertInDelta(maxSplDb({ ...base, count: 2, summation: 'power' }).splDb - maxSplDb(base).splDb, 3.0103, 1e-4);
  });
  it('throws RangeError naming powerW, distanceM, count', () => {
    expect(() => maxSplDb({ ...base, powerW: 0 })).toThrow(/powerW/);
    expect(() => maxSplDb({ ...base, distanceM: -3 })).toThrow(/distanceM/);
    expect(() => maxSplDb({ ...base, count: 0 })).toThrow(/count/);
  });
});
