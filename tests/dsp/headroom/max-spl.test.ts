import { describe, expect, it } from 'vitest';
import { exposureMinutes, headroomCheck, LFE_PEAK_DB, maxSplDb, REFERENCE_PEAK_DB } from '@/dsp';
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
  it('N units in phase add 20·log10 N, uncorrelated 10·log10 N (REFERENCES.md)', () => {
    assertInDelta(maxSplDb({ ...base, count: 2 }).splDb - maxSplDb(base).splDb, 6.0206, 1e-4);
    assertInDelta(maxSplDb({ ...base, count: 2, summation: 'power' }).splDb - maxSplDb(base).splDb, 3.0103, 1e-4);
  });
  it('throws RangeError naming powerW, distanceM, count', () => {
    expect(() => maxSplDb({ ...base, powerW: 0 })).toThrow(/powerW/);
    expect(() => maxSplDb({ ...base, distanceM: -3 })).toThrow(/distanceM/);
    expect(() => maxSplDb({ ...base, count: 0 })).toThrow(/count/);
  });
});

describe('headroomCheck', () => {
  it('targets are 105 dB per channel and 115 dB LFE (published: SMPTE RP 200; LFE +10 dB common practice)', () => {
    expect(REFERENCE_PEAK_DB).toBe(105);
    expect(LFE_PEAK_DB).toBe(115);
  });
  it('97.46 dB against 105 dB is a 7.54 dB deficit needing 100·10^0.754 ≈ 567 W', () => {
    const r = headroomCheck({ ...base, targetPeakDb: REFERENCE_PEAK_DB });
    assertInDelta(r.deficitDb, 7.54, 0.005);
    expect(r.meetsTarget).toBe(false);
    assertInDelta(r.powerNeededW, 100 * Math.pow(10, (105 - r.maxSplDb) / 10), 1e-9);
    assertInDelta(maxSplDb({ ...base, powerW: r.powerNeededW }).splDb, 105, 1e-9);
  });
});

describe('exposureMinutes', () => {
  it('85 dBA → 480 min, 100 dBA → 15 min (published: NIOSH 1998)', () => {
    assertInDelta(exposureMinutes({ levelDba: 85 }), 480, 1e-9);
    assertInDelta(exposureMinutes({ levelDba: 100 }), 15, 1e-9);
  });
});
