import { describe, expect, it } from 'vitest';
import { computeHeadroom, headroomRequestFromDocument } from '@/lib/system-model/headroom';
import { headroomRequestSchema } from '@/lib/validations/compute-headroom';
import { testSystem, withSpeaker } from './test-system';

/**
 * Oracle by hand: SPL = S(1 W) + 10·log10 P − 20·log10 d + 20·log10 N (+ room gain); 2.83 V into 8 Ω is 1 W
 * (inverse-square law, Kinsler et al. 2000). Exposure: 480 min at 85 dBA, halved every 3 dB (NIOSH 1998).
 */
const r2 = (v: number) => Math.round(v * 100) / 100;
const sig = (v: number, digits: number) => Number(v.toPrecision(digits));

describe('headroomRequestFromDocument: one row per speaker and per sub', () => {
  it('each row carries its profile’s sensitivity, impedance and rating, its amplifier, its distance and count', () => {
    const req = headroomRequestFromDocument(testSystem(), { mainsRoomGainDb: 3, subsRoomGainDb: 6 })!;
    expect(req.channels[0]).toEqual({ name: 'L', sensitivityDb: 88, sensitivityRef: '2.83V', impedanceOhm: 8, powerW: 100, distanceM: 3, count: 1, roomGainDb: 3, ratedPowerW: 150 });
    expect(req.subs[0]).toEqual({ name: 'Sub A', sensitivityDb: 90, sensitivityRef: '1W', impedanceOhm: 4, powerW: 300, distanceM: 4, count: 2, roomGainDb: 6, ratedPowerW: 400 });
    expect(req.subs[1]).toMatchObject({ name: 'Sub B', distanceM: 5, count: 1 });
    expect(req.subSummation).toBe('coherent');
    expect(headroomRequestSchema.safeParse(req).success).toBe(true);
  });

  it('a measured distance is the distance used; a speaker whose profile is missing is left out; nothing at all → null', () => {
    const doc = withSpeaker(withSpeaker(testSystem(), 'L', { distanceOverrideM: 2.5 }), 'R', { profileId: 'gone' });
    const req = headroomRequestFromDocument(doc, { subSummation: 'power' })!;
    expect(req.channels.map((c) => [c.name, c.distanceM])).toEqual([['L', 2.5], ['C', expect.closeTo(3, 12)]]);
    expect(req.channels[0]!.roomGainDb).toBe(0);
    expect(req.subSummation).toBe('power');
    expect(headroomRequestFromDocument({ ...testSystem(), speakers: [], subs: [] })).toBeNull();
  });
});

describe('computeHeadroom: the answer of POST /api/v1/headroom', () => {
  const answer = () => computeHeadroom(headroomRequestSchema.parse(headroomRequestFromDocument(testSystem())));

  it('L: 88 dB + 20 dB (100 W) − 9.54 dB (3 m) = 98.46 dB SPL, 6.54 dB short of the 105 dB peak; 451 W needed, over the 150 W rating', () => {
    const spl = 88 + 10 * Math.log10(100) - 20 * Math.log10(3);
    const l = answer().channels[0]!;
    expect(l).toMatchObject({ name: 'L', maxSplDb: r2(spl), perUnitSplDb: r2(spl), sensitivity1WDb: 88, targetPeakDb: 105, headroomDb: r2(spl - 105), deficitDb: r2(105 - spl), meetsTarget: false, powerW: 100 });
    expect(l.powerNeededW).toBe(sig(100 * 10 ** ((105 - spl) / 10), 4));
    expect(l.exceedsRatedPower).toBe(true);
    expect(l.amplifierAboveRating).toBe(false);
  });

  it('a 200 W amplifier on a 120 W-rated speaker: the maximum SPL, the headroom and the bars are at the rating, and the answer says the speaker binds', () => {
    // By hand (inverse-square/power law, Kinsler et al. 2000): L is 88 dB/2.83 V into 8 Ω = 88 dB/1 W at 3 m.
    // Amplifier 88 + 10·log10(200) − 9.5424 = 101.47 dB; rating 88 + 10·log10(120) − 9.5424 = 99.25 dB; headroom −5.75 dB.
    const doc = withSpeaker(testSystem(), 'L', { amplifierPowerW: 200 });
    const rated = { ...doc, profiles: doc.profiles.map((p) => (p.id === doc.speakers[0]!.profileId ? { ...p, ratedPowerW: 120 } : p)) };
    const l = computeHeadroom(headroomRequestSchema.parse(headroomRequestFromDocument(rated))).channels[0]!;
    expect(l).toMatchObject({ binding: 'speaker', usablePowerW: 120, ratedPowerW: 120, powerW: 200, amplifierSplDb: 101.47, ratedSplDb: 99.25, maxSplDb: 99.25, headroomDb: -5.75, meetsTarget: false, amplifierAboveRating: true });
  });

  it('two subs share the 115 dB LFE peak: each is held to 115 − 20·log10 2; together they are summed in phase', () => {
    const a = answer();
    const splA = 90 + 10 * Math.log10(300) - 20 * Math.log10(4) + 20 * Math.log10(2);
    const splB = 90 + 10 * Math.log10(300) - 20 * Math.log10(5);
    expect(a.subs[0]).toMatchObject({ maxSplDb: r2(splA), targetPeakDb: r2(115 - 20 * Math.log10(2)), headroomDb: r2(splA - 115 + 20 * Math.log10(2)) });
    expect(a.subs[1]!.maxSplDb).toBe(r2(splB));
    const together = 20 * Math.log10(10 ** (splA / 20) + 10 ** (splB / 20));
    expect(a.subsCombined).toEqual({ summation: 'coherent', maxSplDb: r2(together), targetPeakDb: 115, headroomDb: r2(together - 115), meetsTarget: together >= 115, powerScale: sig(10 ** ((115 - together) / 10), 4) });
    expect(a.allMeetTarget).toBe(false);
  });

  it('the exposure table: 480 min at 85 dBA, 240 at 88, 15 at 100, 0.469 at 115', () => {
    const minutes = new Map(answer().exposure.map((e) => [e.levelDba, e.minutes]));
    expect([minutes.get(85), minutes.get(88), minutes.get(100), minutes.get(115)]).toEqual([480, 240, 15, 0.469]);
    expect(answer().safety.length).toBeGreaterThan(0);
  });
});
