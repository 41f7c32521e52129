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
  it('a 200 W amplifier on a 120 W-rated speaker: the rating binds and the verdict is taken there (by hand, 10·log10 P)', () => {
    // Inverse-square/power law (published: Kinsler et al. 2000), by hand:
    // amplifier: 87 + 10·log10(200) − 20·log10(3) = 87 + 23.0103 − 9.5424 = 100.4679 dB SPL;
    // rating:    87 + 10·log10(120) − 20·log10(3) = 87 + 20.7918 − 9.5424 =  98.2494 dB SPL (2.2185 dB lower);
    // headroom at the rating 98.2494 − 105 = −6.7506 dB.
    const r = headroomCheck({ ...base, powerW: 200, ratedPowerW: 120, targetPeakDb: REFERENCE_PEAK_DB });
    expect(r.binding).toBe('speaker');
    expect(r.usablePowerW).toBe(120);
    assertInDelta(r.amplifierSplDb, 100.4679, 1e-4);
    assertInDelta(r.ratedSplDb!, 98.2494, 1e-4);
    assertInDelta(r.maxSplDb, 98.2494, 1e-4);
    assertInDelta(r.headroomDb, -6.7506, 1e-4);
    assertInDelta(r.deficitDb, 6.7506, 1e-4);
    expect(r.meetsTarget).toBe(false);
    // The power that reaches 105 dB is the same physics whichever limit binds: 10^((105 − 87 + 9.5424)/10) = 567.9 W.
    assertInDelta(r.powerNeededW, Math.pow(10, (105 - 87 + 20 * Math.log10(3)) / 10), 1e-6);
  });
  it('the amplifier binds when it is at or below the rating; the rated SPL is still given', () => {
    // 87 + 20 − 9.5424 = 97.4576 dB at 100 W; at the 150 W rating 87 + 21.7609 − 9.5424 = 99.2185 dB (by hand).
    const r = headroomCheck({ ...base, ratedPowerW: 150, targetPeakDb: 90 });
    expect(r.binding).toBe('amplifier');
    assertInDelta(r.maxSplDb, 97.4576, 1e-4);
    assertInDelta(r.ratedSplDb!, 99.2185, 1e-4);
    expect(headroomCheck({ ...base, targetPeakDb: 90 }).ratedSplDb).toBeNull();
  });
  it('a 200 W amplifier that meets the target only above a 120 W rating fails at the rating', () => {
    // Target 99 dB: the amplifier reaches 100.47 (would pass), the rating 98.25 (0.75 dB short), by hand as above.
    const r = headroomCheck({ ...base, powerW: 200, ratedPowerW: 120, targetPeakDb: 99 });
    expect(r.meetsTarget).toBe(false);
    assertInDelta(r.deficitDb, 0.7506, 1e-4);
  });
  it('throws RangeError naming targetPeakDb and ratedPowerW', () => {
    expect(() => headroomCheck({ ...base, targetPeakDb: NaN })).toThrow(/targetPeakDb/);
    expect(() => headroomCheck({ ...base, targetPeakDb: 105, ratedPowerW: 0 })).toThrow(/ratedPowerW/);
  });
});
