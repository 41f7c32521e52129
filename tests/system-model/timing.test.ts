import { describe, expect, it } from 'vitest';
import { applyTimingToDocument, computeTiming, timingRequestFromDocument } from '@/lib/system-model/timing';
import { timingRequestSchema } from '@/lib/validations/compute-blend';
import { MS_PER_METRE_20C, TEST_MAIN, testSystem, withSub } from './test-system';

/** Oracle: the test System by hand (3, 4 and 5 m at 2.9136 ms/m; processor delays 5.83, 2.91 and 0 ms). */
describe('timingRequestFromDocument: the whole system as Timing takes it', () => {
  it('L and both subs with air paths, processor delays, level-matched gains and roll-offs; a 20 ms, 0.05 ms search', () => {
    const req = timingRequestFromDocument(testSystem())!;
    expect(req.temperatureC).toBe(20);
    expect(req.crossoverHz).toBe(80);
    expect(req.mains).toEqual({ name: 'L', distanceM: 3, delayMs: 5.83, gainDb: 0, rolloff: TEST_MAIN.lowRolloff });
    expect(req.subs.map((s) => [s.name, s.distanceM, s.delayMs, s.invert])).toEqual([
      ['Sub A', 4, 2.91, false],
      ['Sub B', 5, 0, false],
    ]);
    expect(req.subs[0]!.gainDb).toBeCloseTo(-3.5218, 4);
    expect({ maxDelayMs: req.maxDelayMs, stepMs: req.stepMs }).toEqual({ maxDelayMs: 20, stepMs: 0.05 });
    expect(timingRequestSchema.safeParse(req).success).toBe(true);
  });

  it('the document’s changes show: a sub’s own delay and polarity, another channel; no subs or no speakers → null', () => {
    // Sub B's own 1.5 ms goes on top of its alignment (0 ms); then the shared 1.5 ms is taken out of every delay.
    const req = timingRequestFromDocument(withSub(testSystem(), 1, { delayMs: 1.5, invert: true }), 'R')!;
    expect(req.mains).toMatchObject({ name: 'R', delayMs: 4.33 });
    expect(req.subs.map((s) => [s.delayMs, s.invert])).toEqual([[1.41, false], [0, true]]);
    expect(timingRequestFromDocument({ ...testSystem(), subs: [] })).toBeNull();
    expect(timingRequestFromDocument({ ...testSystem(), speakers: [] })).toBeNull();
  });
});

describe('applyTimingToDocument: a piece of advice written back', () => {
  it('exactly the settings it states (Sub B 1.5 ms later and inverted), nothing else', () => {
    const advice = { set: { mainsDelayMs: 5.83, subs: [{ name: 'Sub A', delayMs: 2.91, invert: false }, { name: 'Sub B', delayMs: 1.5, invert: true }] } };
    const out = applyTimingToDocument(testSystem(), advice);
    expect(out.subs.map((s) => [s.delayMs, s.invert])).toEqual([[0, false], [1.5, true]]);
    expect(out.bassManagement.mainsDelayMs).toBe(0);
    expect(withSub(out, 1, { delayMs: 0, invert: false })).toEqual(testSystem());
  });

  it('advice for the mains (1 ms later) moves the mains delay; applied again it changes nothing more', () => {
    const advice = { set: { mainsDelayMs: 6.83, subs: [{ name: 'Sub A', delayMs: 2.91, invert: false }, { name: 'Sub B', delayMs: 0, invert: false }] } };
    const once = applyTimingToDocument(testSystem(), advice);
    expect(once.bassManagement.mainsDelayMs).toBe(1);
    expect(applyTimingToDocument(once, advice)).toEqual(once);
    expect(applyTimingToDocument({ ...testSystem(), speakers: [] }, advice)).toEqual({ ...testSystem(), speakers: [] });
  });
});

describe('computeTiming: the answer of POST /api/v1/timing', () => {
  it('arrivals and totals from the distances: L 3 m → 8.741 ms + 5.83, Sub A 4 m → 11.655 ms + 2.91', () => {
    const a = computeTiming(timingRequestSchema.parse(timingRequestFromDocument(testSystem())));
    const r3 = (v: number) => Math.round(v * 1000) / 1000;
    expect(a.speedOfSoundMps).toBe(343.215);
    expect(a.mains).toEqual({ name: 'L', distanceM: 3, arrivalFrom: 'distance', arrivalMs: r3(3 * MS_PER_METRE_20C), delayMs: 5.83, totalMs: r3(3 * MS_PER_METRE_20C + 5.83) });
    expect(a.subs[0]).toMatchObject({ name: 'Sub A', distanceM: 4, arrivalMs: r3(4 * MS_PER_METRE_20C), delayMs: 2.91, totalMs: r3(4 * MS_PER_METRE_20C + 2.91) });
    expect(a.subs[0]!.leadMs).toBe(r3(3 * MS_PER_METRE_20C + 5.83 - (4 * MS_PER_METRE_20C + 2.91)));
    expect(a.flatness.bandHz).toEqual([40, 160]);
    expect(a.group).not.toBeNull();
    // The delay part of the phase difference: 360·fc·(sub total − mains total).
    expect(a.subs[1]!.delayPhaseDeg).toBeCloseTo((((360 * 80 * (5 * MS_PER_METRE_20C - (3 * MS_PER_METRE_20C + 5.83))) / 1000 + 540) % 360) - 180, 1);
  });
});
