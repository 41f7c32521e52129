import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/timing/route';
import { assertInDelta } from '../helpers/assert-in-delta';
import { BW2, postTo, refusedNaming, wholeSystem, type Json } from '../helpers/compute-route';
import { speedMps, mul, add, scale, bw2, lr4, late, levelDb, type C } from '../helpers/complex-oracle';

const post = postTo(POST, '/api/v1/timing');

/** The whole system as it is: LR4 / LR4 at 80 Hz, both 3.4 m away, no delays. */
const base = (extra: Json = {}) => wholeSystem(3.4, extra);

// ---------------------------------------------------------------- an independent oracle, from the formulas


/**
 * The flatness measure from its definition (FLATNESS_DEFINITION, computed here, not by dsp): the largest deviation
 * of the sum from its level at 4·fc over fc/2 … 2·fc, at 48 points per octave.
 */
function flatnessFromDefinition(fcHz: number, sum: (fHz: number) => C): number {
  const ref = levelDb(sum(4 * fcHz));
  let worst = 0;
  for (let k = -48; k <= 48; k++) worst = Math.max(worst, Math.abs(levelDb(sum(fcHz * 2 ** (k / 48))) - ref));
  return worst;
}

/** Mains high-pass + one sub low-pass at 80 Hz, the sub `subLateMs` later at the seat (air path and processor), one path inverted or not. */
const pairSum =
  (filter: typeof lr4, subLateMs: number, invertSub: boolean, subGain = 1) =>
  (fHz: number): C =>
    add(filter(fHz / 80, 'highpass'), scale(mul(filter(fHz / 80, 'lowpass'), late(fHz, subLateMs)), invertSub ? -subGain : subGain));

/** 1 m of air at 20 °C, ms: 2.914 (published: Kinsler et al. 2000). */
const ONE_METRE_MS = 1000 / speedMps(20);

describe('POST /api/v1/timing', () => {
  it('gives arrival times from distance and temperature: 3.4 m at 20 °C = 9.906 ms (c = 343.21 m/s, Kinsler et al. 2000)', async () => {
    const { status, body: b } = await post(base());
    expect(status).toBe(200);
    assertInDelta(b.speedOfSoundMps, 343.21, 0.01, 'c');
    assertInDelta(b.mains.arrivalMs, 3.4 * 2.914, 0.002, 'mains arrival');
    assertInDelta(b.subs[0].arrivalMs, 3.4 * 2.914, 0.002, 'sub arrival');
    expect(b.mains.totalMs).toBe(b.mains.arrivalMs);
    expect(b.group).toBeNull();
  });

  it('states the one flatness measure and its band: fc/2 … 2·fc, relative to the sum at 4·fc', async () => {
    const { body: b } = await post(base({ crossoverHz: 100 }));
    expect(b.crossoverHz).toBe(100);
    expect(b.flatness.definition).toContain('4·fc');
    expect(b.flatness.definition).toContain('fc/2 … 2·fc');
    expect(b.flatness.bandHz).toEqual([50, 200]);
    expect(b.present.bandHz).toEqual([50, 200]);
  });

  it('LR4 pair at equal distances and equal delays is in phase and already flat: advice "keep" (Linkwitz 1976)', async () => {
    const { body: b } = await post(base());
    const s = b.subs[0];
    assertInDelta(s.phaseDifferenceDeg, 0, 0.1, 'phase difference');
    // LR4 low-pass + high-pass in phase is an all-pass: flat at every frequency (published: Linkwitz 1976).
    expect(b.present.flatnessDb).toBeLessThan(0.01);
    expect(b.present.minus3DbHz).toBeNull(); // flat down to DC: no −3 dB point above 5 Hz
    const a = s.advice;
    expect(a.keep).toBe(true);
    expect(a.reason).toMatch(/^Keep the present setting/);
    expect(a).toMatchObject({ shiftMs: 0, flip: false, gainDb: 0, extensionLossOctaves: 0, bassCutDb: 0 });
    expect(a.set).toEqual({ mainsDelayMs: 0, subs: [{ name: 'Sub', delayMs: 0, invert: false }] });
    expect(a.after).toEqual(a.before);
    expect(a.before).toEqual(b.present);
    // The Timing window holds the advised (= present) sub-minus-mains delay, 0 ms.
    expect(s.timingWindowMs[0]).toBeLessThanOrEqual(0);
    expect(s.timingWindowMs[1]).toBeGreaterThanOrEqual(0);
  });

  it('plots flatness against the sub-minus-mains delay, both polarities, ±maxDelayMs in 0.1 ms steps', async () => {
    const { body: b } = await post(base());
    const c = b.subs[0].flatnessVersusDelay;
    expect(c.subMinusMainsDelayMs).toHaveLength(401);
    expect(c.normalDb).toHaveLength(401);
    expect(c.invertedDb).toHaveLength(401);
    assertInDelta(c.subMinusMainsDelayMs[0], -20, 1e-6, 'scan start');
    assertInDelta(c.subMinusMainsDelayMs.at(-1), 20, 1e-6, 'scan end');
    assertInDelta(c.subMinusMainsDelayMs[1] - c.subMinusMainsDelayMs[0], 0.1, 1e-6, 'step');
    // At zero delay: in phase, flat; inverted, a null at the corner (LR4, published: Linkwitz 1976).
    const zero = c.subMinusMainsDelayMs.findIndex((d: number) => Math.abs(d) < 1e-6);
    assertInDelta(c.normalDb[zero], 0, 0.01, 'normal at 0 ms');
    expect(c.invertedDb[zero]).toBeGreaterThan(40);
    // The curve is the same measure as `present`: at the present delay it reads the present flatness.
    for (const d of [-5, 2.5, 12]) {
      const k = c.subMinusMainsDelayMs.findIndex((v: number) => Math.abs(v - d) < 1e-6);
      assertInDelta(c.normalDb[k], flatnessFromDefinition(80, pairSum(lr4, d, false)), 0.02, `normal at ${d} ms (oracle)`);
      assertInDelta(c.invertedDb[k], flatnessFromDefinition(80, pairSum(lr4, d, true)), 0.02, `inverted at ${d} ms (oracle)`);
    }
  });

  it('a sub 1 m farther arrives 2.914 ms late, 83.9° behind at 80 Hz (published: Kinsler et al. 2000)', async () => {
    const { body: b } = await post(base({ subs: [{ name: 'Sub', distanceM: 4.4 }] }));
    const s = b.subs[0];
    assertInDelta(s.leadMs, -2.914, 0.002, 'lead');
    assertInDelta(s.delayPhaseDeg, 83.9, 0.1, 'phase from the delay');
    assertInDelta(s.phaseDifferenceDeg, 83.9, 0.2, 'phase difference (LR4 adds none)');
    assertInDelta(s.filterPhaseDeg, 0, 0.2, "filters' own phase");
  });

  it('a sub 1 m too far with no compensation: advice to give the mains 2.91 ms, proven flatter on the whole system', async () => {
    const { body: b } = await post(base({ subs: [{ name: 'Sub', distanceM: 4.4 }] }));
    const a = b.subs[0].advice;
    // Present: LR4 pair with the sub 1/c later, from the formulas (Linkwitz 1976; Kinsler et al.): ±3.19 dB.
    const presentDb = flatnessFromDefinition(80, pairSum(lr4, ONE_METRE_MS, false));
    assertInDelta(presentDb, 3.19, 0.01, 'oracle present flatness');
    assertInDelta(b.present.flatnessDb, presentDb, 0.01, 'present flatness');
    expect(a.before).toEqual(b.present);
    expect(a.keep).toBe(false);
    expect(a.reason).toMatch(/^Flatness ±3\.19 dB → ±0\.0\d dB/);
    // The sub is 1 m late, so the fix is −2.914 ms of sub delay relative to the mains; the sub has no delay to
    // give up, so the mains get +2.91 ms (processors take 0.01 ms) and the sub stays at 0.
    assertInDelta(a.shiftMs, -ONE_METRE_MS, 0.01, 'advised shift');
    expect(a.flip).toBe(false);
    assertInDelta(a.set.mainsDelayMs, ONE_METRE_MS, 0.01, 'mains delay');
    expect(a.set.subs).toEqual([{ name: 'Sub', delayMs: 0, invert: false }]);
    expect(a.after.flatnessDb).toBeLessThan(a.before.flatnessDb - 0.5);
    // `after` is what the stated settings give, by the formulas: the sub is left 2.914 − 2.91 ms late.
    const residualMs = ONE_METRE_MS + a.set.subs[0].delayMs - a.set.mainsDelayMs;
    assertInDelta(a.after.flatnessDb, flatnessFromDefinition(80, pairSum(lr4, residualMs, false)), 0.01, 'after (oracle)');
    assertInDelta(a.gainDb, a.before.flatnessDb - a.after.flatnessDb, 0.011, 'gain');
    // Keeps the bass (ADVICE_RULES: ≤ 1/3 octave rise of the −3 dB point, ≤ 1 dB cut below the crossover).
    expect(a.extensionLossOctaves).toBeLessThanOrEqual(1 / 3);
    expect(a.bassCutDb).toBeLessThanOrEqual(1);
    // The Timing window holds the advised sub-minus-mains delay, −2.91 ms.
    const advised = a.set.subs[0].delayMs - a.set.mainsDelayMs;
    expect(b.subs[0].timingWindowMs[0]).toBeLessThanOrEqual(advised);
    expect(b.subs[0].timingWindowMs[1]).toBeGreaterThanOrEqual(advised);
  });

  it('a sub 1 m nearer gets the delay itself (only positive delays)', async () => {
    const { body: b } = await post(base({ subs: [{ name: 'Sub', distanceM: 2.4 }] }));
    const a = b.subs[0].advice;
    expect(a.keep).toBe(false);
    assertInDelta(a.shiftMs, ONE_METRE_MS, 0.01, 'advised shift');
    expect(a.set.mainsDelayMs).toBe(0);
    assertInDelta(a.set.subs[0].delayMs, ONE_METRE_MS, 0.01, 'sub delay');
  });

  it('advice followed is not given again: the stated settings, sent back, are kept and read as the advised "after"', async () => {
    const first = (await post(base({ subs: [{ name: 'Sub', distanceM: 4.4 }] }))).body.subs[0].advice;
    const { body: b } = await post(base({ mains: { name: 'L', distanceM: 3.4, delayMs: first.set.mainsDelayMs }, subs: [{ name: 'Sub', distanceM: 4.4, ...first.set.subs[0] }] }));
    expect(b.present).toEqual(first.after);
    expect(b.subs[0].advice.keep).toBe(true);
    expect(b.subs[0].advice.set).toEqual(first.set);
    assertInDelta(b.subs[0].leadMs, 0, 0.005, 'arrivals matched');
    // The curve's axis is the sub's setting minus the mains': it now runs around −2.91 ms.
    assertInDelta(b.subs[0].flatnessVersusDelay.subMinusMainsDelayMs[0], -20 - first.set.mainsDelayMs, 1e-6, 'axis start');
  });

  it("counts the filters' own phase: BW2 low-pass and high-pass are 180° apart at the corner, so the advice flips the sub (published: Linkwitz 1976)", async () => {
    const { body: b } = await post(base({ mainsHighpass: BW2, subLowpass: BW2 }));
    const s = b.subs[0];
    assertInDelta(Math.abs(s.phaseDifferenceDeg), 180, 0.2, 'phase difference');
    assertInDelta(Math.abs(s.filterPhaseDeg), 180, 0.2, "filters' phase");
    // BW2, same polarity: a null at the corner (published: Linkwitz 1976).
    expect(b.present.flatnessDb).toBeGreaterThan(60);
    // BW2 with one path inverted: |H|² = (1 + x²)² / (1 + x⁴), +3.01 dB at the corner against 289/257 at 4·fc, so the
    // flip alone reads 3.010 − 0.510 = 2.50 dB (Butterworth 1930; Linkwitz 1976).
    const flipOnlyDb = 10 * Math.log10(2) - 10 * Math.log10(289 / 257);
    assertInDelta(flatnessFromDefinition(80, pairSum(bw2, 0, true)), flipOnlyDb, 1e-9, 'oracle agrees with the closed form');
    const c = s.flatnessVersusDelay;
    const zero = c.subMinusMainsDelayMs.findIndex((d: number) => Math.abs(d) < 1e-6);
    assertInDelta(c.invertedDb[zero], flipOnlyDb, 0.01, 'inverted at 0 ms');
    expect(c.normalDb[zero]).toBeGreaterThan(60);
    const a = s.advice;
    expect(a.keep).toBe(false);
    expect(a.flip).toBe(true);
    expect(a.set.subs[0].invert).toBe(true);
    // At least as flat as the flip alone, and `after` is what the stated settings give.
    expect(a.after.flatnessDb).toBeLessThanOrEqual(flipOnlyDb + 0.01);
    const lateMs = a.set.subs[0].delayMs - a.set.mainsDelayMs;
    assertInDelta(a.after.flatnessDb, flatnessFromDefinition(80, pairSum(bw2, lateMs, true)), 0.01, 'after (oracle)');
  });

  it('normalDb is always the sub not inverted: a sub inverted now plots its own polarity as invertedDb, and the advice flips it back', async () => {
    const { body: b } = await post(base({ subs: [{ name: 'Sub', distanceM: 3.4, invert: true }] }));
    const s = b.subs[0];
    expect(s.invert).toBe(true);
    assertInDelta(Math.abs(s.phaseDifferenceDeg), 180, 0.1, 'phase difference');
    expect(b.present.flatnessDb).toBeGreaterThan(40); // LR4 inverted: a null at the corner (published: Linkwitz 1976)
    const c = s.flatnessVersusDelay;
    const zero = c.subMinusMainsDelayMs.findIndex((d: number) => Math.abs(d) < 1e-6);
    assertInDelta(c.normalDb[zero], 0, 0.01, 'not inverted at 0 ms');
    expect(c.invertedDb[zero]).toBeGreaterThan(40); // the present polarity: the null again
    expect(s.advice).toMatchObject({ keep: false, flip: true, shiftMs: 0 });
    expect(s.advice.set.subs[0]).toEqual({ name: 'Sub', delayMs: 0, invert: false });
    expect(s.advice.after.flatnessDb).toBeLessThan(0.01);
  });

  it('several subs: each sub’s advice moves that sub against everything else; the group advice moves them all, only with positive delays', async () => {
    const { status, body: b } = await post(base({ subs: [{ name: 'Front', distanceM: 3.4, gainDb: -6 }, { name: 'Back', distanceM: 4.4, gainDb: -6 }] }));
    expect(status).toBe(200);
    expect(b.subs).toHaveLength(2);
    // Two subs at −6 dB (×0.501 each), the Back one 1 m (2.914 ms) late: from the formulas (Linkwitz 1976; Kinsler et al.).
    const g6 = 10 ** (-6 / 20);
    const threeWay = (mainsMs: number, frontMs: number, backMs: number) => (fHz: number) =>
      add(add(mul(lr4(fHz / 80, 'highpass'), late(fHz, mainsMs)), scale(mul(lr4(fHz / 80, 'lowpass'), late(fHz, frontMs)), g6)), scale(mul(lr4(fHz / 80, 'lowpass'), late(fHz, backMs + ONE_METRE_MS)), g6));
    assertInDelta(b.present.flatnessDb, flatnessFromDefinition(80, threeWay(0, 0, 0)), 0.01, 'present (oracle)');
    // The Front sub is already with the mains: moving it alone gains less than 0.5 dB, so it keeps.
    expect(b.subs[0].advice.keep).toBe(true);
    expect(b.subs[0].advice.reason).toContain('no change found gains 0.5 dB');
    // The Back sub's own advice: the rest (mains and Front) wait for it.
    const back = b.subs[1].advice;
    expect(back.keep).toBe(false);
    expect(back.shiftMs).toBeLessThan(0);
    expect(back.set.mainsDelayMs).toBe(-back.shiftMs);
    expect(back.set.subs.map((s: Json) => s.delayMs)).toEqual([-back.shiftMs, 0]);
    expect(back.after.flatnessDb).toBeLessThan(back.before.flatnessDb - 0.5);
    const g = b.group;
    expect(g.keep).toBe(false);
    expect(g.set.subs.map((s: Json) => s.name)).toEqual(['Front', 'Back']);
    const delays = [g.set.mainsDelayMs, ...g.set.subs.map((s: Json) => s.delayMs)];
    for (const d of delays) expect(d).toBeGreaterThanOrEqual(0);
    // The latest arrival (the Back sub) waits for nothing; the nearer sources get the delay.
    expect(g.set.subs[1].delayMs).toBe(0);
    expect(g.set.mainsDelayMs).toBeGreaterThan(0);
    expect(g.set.subs[0].delayMs).toBeGreaterThan(0);
    expect(g.after.flatnessDb).toBeLessThan(g.before.flatnessDb - 0.5);
    expect(g.before).toEqual(b.present);
    // Proven: the group's settings, by the formulas, give its `after`.
    assertInDelta(g.after.flatnessDb, flatnessFromDefinition(80, threeWay(g.set.mainsDelayMs, g.set.subs[0].delayMs, g.set.subs[1].delayMs)), 0.01, 'group after (oracle)');
    expect(g).not.toHaveProperty('shiftMs');
  });

  it('the search stays within maxDelayMs', async () => {
    const { body: b } = await post(base({ subs: [{ name: 'Sub', distanceM: 4.4 }], maxDelayMs: 1 }));
    const c = b.subs[0].flatnessVersusDelay;
    assertInDelta(c.subMinusMainsDelayMs[0], -1, 1e-6, 'scan start');
    assertInDelta(c.subMinusMainsDelayMs.at(-1), 1, 1e-6, 'scan end');
    expect(Math.abs(b.subs[0].advice.shiftMs)).toBeLessThanOrEqual(1);
  });

  describe('bad fields are answered 400 with their path', () => {
    const cases: [string, string, Json][] = [
      ['crossover below 20 Hz', 'crossoverHz', base({ crossoverHz: 10 })],
      ['crossover missing', 'crossoverHz', { ...base(), crossoverHz: undefined }],
      ['Linkwitz–Riley order 3', 'mainsHighpass.order', base({ mainsHighpass: { family: 'linkwitz-riley', order: 3 } })],
      ['Butterworth order 12', 'subLowpass.order', base({ subLowpass: { family: 'butterworth', order: 12 } })],
      ['mains distance missing', 'mains.distanceM', base({ mains: { name: 'L' } })],
      ['negative mains delay', 'mains.delayMs', base({ mains: { name: 'L', distanceM: 3, delayMs: -0.5 } })],
      ['mains roll-off of a sub kind', 'mains.rolloff.kind', base({ mains: { name: 'L', distanceM: 3, rolloff: { kind: 'lowpass', cornerHz: 200, q: 0.7 } } })],
      ['negative sub distance', 'subs.1.distanceM', base({ subs: [{ name: 'A', distanceM: 3 }, { name: 'B', distanceM: -2 }] })],
      ['negative sub delay', 'subs.0.delayMs', base({ subs: [{ name: 'A', distanceM: 3, delayMs: -1 }] })],
      ['sub without a name', 'subs.0.name', base({ subs: [{ distanceM: 3 }] })],
      ['invert not boolean', 'subs.0.invert', base({ subs: [{ name: 'A', distanceM: 3, invert: 1 }] })],
      ['no subs', 'subs', base({ subs: [] })],
      ['nine subs', 'subs', base({ subs: Array.from({ length: 9 }, (_, i) => ({ name: `S${i}`, distanceM: 3 })) })],
      ['unknown sub roll-off kind', 'subs.0.rolloff.kind', base({ subs: [{ name: 'A', distanceM: 3, rolloff: { kind: 'horn', cornerHz: 20 } }] })],
      ['bad roll-off in a chain', 'subs.0.rolloff.1.q', base({ subs: [{ name: 'A', distanceM: 3, rolloff: [{ kind: 'vented', cornerHz: 20 }, { kind: 'lowpass', cornerHz: 200, q: 99 }] }] })],
      ['step of zero', 'stepMs', base({ stepMs: 0 })],
      ['delay search too long', 'maxDelayMs', base({ maxDelayMs: 60 })],
      ['temperature as text', 'temperatureC', base({ temperatureC: 'warm' })],
      ['misspelt field', 'mains', base({ mains: { name: 'L', distanceM: 3, distance: 3 } })],
    ];
    it.each(cases)('%s → %s', refusedNaming(post));
  });

  it('refuses bodies over 2 MB (room for inline measured curves) with 413 and non-JSON with 415', async () => {
    expect((await post(JSON.stringify({ ...base(), padding: 'x'.repeat(2 * 1024 * 1024 + 1024) }))).status).toBe(413);
    expect((await post('<xml/>', { 'content-type': 'application/xml' })).status).toBe(415);
  });
});
