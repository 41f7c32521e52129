import { describe, expect, it } from 'vitest';
import { headroomCheck, LFE_PEAK_DB, maxSplDb, REFERENCE_PEAK_DB } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const base = { sensitivityDb: 87, sensitivityRef: '1W' as const, impedanceOhm: 8, powerW: 100, distanceM: 3, count: 1 };

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
    // By hand from the inverse-square law (published: Kinsler et al. 2000): 87 + 10·log10(P) − 20·log10(3) = 105
    // → P = 10^((105 − 87 + 9.5424)/10) = 567.9 W; headroom −7.5424 dB.
    assertInDelta(r.powerNeededW, Math.pow(10, (105 - 87 + 20 * Math.log10(3)) / 10), 1e-6);
    assertInDelta(r.headroomDb, -7.5424, 1e-4);
    expect(r.targetPeakDb).toBe(105);
  });
  it('a target below the maximum is met with positive headroom, no deficit and less power than given', () => {
    // 87 + 20 − 9.5424 = 97.4576 dB against 90 dB: headroom 7.4576 dB; 100 W·10^(−0.74576) = 17.96 W reaches 90 dB
    // exactly (inverse-square law, by hand).
    const r = headroomCheck({ ...base, targetPeakDb: 90 });
    expect(r.meetsTarget).toBe(true);
    assertInDelta(r.headroomDb, 7.4576, 1e-4);
    expect(r.deficitDb).toBe(0);
    assertInDelta(r.powerNeededW, Math.pow(10, (90 - 87 + 20 * Math.log10(3)) / 10), 1e-9);
  });
  it('throws RangeError naming targetPeakDb', () => {
    expect(() => headroomCheck({ ...base, targetPeakDb: NaN })).toThrow(/targetPeakDb/);
  });
});
