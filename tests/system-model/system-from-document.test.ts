import { describe, expect, it } from 'vitest';
import { blendMainSpeaker, retimeDocument, subLevelMatchDb, systemModelFromDocument, timingSettingsOf } from '@/lib/system-model/system-from-document';
import type { SystemDocument } from '@/lib/validations/system';
import { TEST_MAIN, TEST_SUB, testSystem, withSpeaker, withSub } from './test-system';

/** Oracle: the test System worked by hand (distances 3, 4 and 5 m; delays 5.83, 2.91 and 0 ms; see channel-settings.test). */
describe('systemModelFromDocument: the whole system the processor runs', () => {
  it('the shown main channel (L by default) and every sub, with air paths, processor delays, levels and roll-offs', () => {
    const model = systemModelFromDocument(testSystem())!;
    expect(model.temperatureC).toBe(20);
    expect(model.crossoverHz).toBe(80);
    expect(model.mainsHighpass).toEqual({ family: 'butterworth', order: 2 });
    expect(model.subLowpass).toEqual({ family: 'linkwitz-riley', order: 4 });
    expect(model.mains.name).toBe('L');
    expect(model.mains.distanceM).toBeCloseTo(3, 12);
    expect(model.mains.delayMs).toBe(5.83);
    expect(model.mains.gainDb).toBe(0);
    expect(model.mains.invert).toBe(false);
    expect(model.mains.rolloff).toEqual(TEST_MAIN.lowRolloff);
    expect(model.subs.map((s) => s.name)).toEqual(['Sub A', 'Sub B']);
    expect(model.subs[0]!.distanceM).toBeCloseTo(4, 12);
    expect(model.subs[1]!.distanceM).toBeCloseTo(5, 12);
    expect(model.subs.map((s) => s.delayMs)).toEqual([2.91, 0]);
    expect(model.subs[0]!.rolloff).toEqual([TEST_SUB.lowRolloff, TEST_SUB.highRolloff]);
  });

  it('sub levels are matched by units: Sub A (2 of 3 units) 20·log10(2/3) = −3.52 dB, Sub B (1 of 3) −9.54 dB, plus each sub’s gain', () => {
    const doc = withSub(testSystem(), 1, { gainDb: 2 });
    const model = systemModelFromDocument(doc)!;
    expect(model.subs[0]!.gainDb).toBeCloseTo(-3.5218, 4);
    expect(model.subs[1]!.gainDb).toBeCloseTo(-9.5424 + 2, 4);
    expect(subLevelMatchDb(doc, doc.subs[0]!)).toBeCloseTo(20 * Math.log10(2 / 3), 12);
  });

  it('a measured distance changes the processor delay, not the air path the sound travels', () => {
    const model = systemModelFromDocument(withSub(testSystem(), 0, { distanceOverrideM: 4.5 }))!;
    expect(model.subs[0]!.distanceM).toBeCloseTo(4, 12);
    // (5 − 4.5) m × 2.9136 ms/m = 1.457 → 1.46 ms.
    expect(model.subs[0]!.delayMs).toBe(1.46);
  });

  it('another channel on request; an unknown one falls back to L; no speakers → null', () => {
    const doc = withSpeaker(testSystem(), 'R', { trimDb: -1.5 });
    expect(systemModelFromDocument(doc, 'R')!.mains).toMatchObject({ name: 'R', gainDb: -1.5 });
    expect(systemModelFromDocument(doc, 'TFL')!.mains.name).toBe('L');
    expect(blendMainSpeaker({ ...doc, speakers: doc.speakers.filter((s) => s.channel !== 'L') })!.channel).toBe('C');
    expect(systemModelFromDocument({ ...doc, speakers: [] })).toBeNull();
  });
});

/** The document with the fields retimeDocument may write put back to the test System's, to check nothing else changed. */
const timingFieldsReset = (doc: SystemDocument): SystemDocument => ({
  ...doc,
  bassManagement: { ...doc.bassManagement, mainsDelayMs: 0 },
  subs: doc.subs.map((s) => ({ ...s, delayMs: 0, invert: false })),
});

describe('retimeDocument: a change of timing written back, positive delays only', () => {
  const before = () => timingSettingsOf(systemModelFromDocument(testSystem())!);

  it('Sub A 1.234 ms later: its own delay moves by 1.23 ms (whole hundredths); nothing else changes', () => {
    const doc = testSystem();
    const b = before();
    const after = { ...b, subs: b.subs.map((s, k) => (k === 0 ? { ...s, delayMs: s.delayMs + 1.234 } : s)) };
    const out = retimeDocument(doc, b, after);
    expect(out.subs.map((s) => s.delayMs)).toEqual([1.23, 0]);
    expect(out.bassManagement.mainsDelayMs).toBe(0);
    expect(timingFieldsReset(out)).toEqual(testSystem());
    expect(doc).toEqual(testSystem()); // not mutated
  });

  it('the mains 2 ms earlier: no negative delay — both subs get 2 ms instead, the mains stay at 0', () => {
    const b = before();
    const out = retimeDocument(testSystem(), b, { ...b, mainsDelayMs: b.mainsDelayMs - 2 });
    expect(out.bassManagement.mainsDelayMs).toBe(0);
    expect(out.subs.map((s) => s.delayMs)).toEqual([2, 2]);
  });

  it('the delay every source shares is taken out, so the smallest is 0', () => {
    const doc = { ...withSub(withSub(testSystem(), 0, { delayMs: 3 }), 1, { delayMs: 4 }), bassManagement: { ...testSystem().bassManagement, mainsDelayMs: 5 } };
    const b = timingSettingsOf(systemModelFromDocument(doc)!);
    const out = retimeDocument(doc, b, b);
    expect([out.bassManagement.mainsDelayMs, ...out.subs.map((s) => s.delayMs)]).toEqual([2, 0, 1]);
  });

  it('each sub takes its new polarity; a delay beyond 100 ms is held at the schema’s 100 ms', () => {
    const doc = withSub(testSystem(), 1, { delayMs: 99 });
    const b = timingSettingsOf(systemModelFromDocument(doc)!);
    const out = retimeDocument(doc, b, { ...b, subs: b.subs.map((s, k) => (k === 1 ? { delayMs: s.delayMs + 5, invert: true } : s)) });
    expect(out.subs.map((s) => s.invert)).toEqual([false, true]);
    expect(out.subs[1]!.delayMs).toBe(100);
  });
});
