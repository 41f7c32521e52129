import { describe, expect, it } from 'vitest';
import { systemChannelSettings } from '@/lib/system-model/channel-settings';
import { MS_PER_METRE_20C, testSystem, withSpeaker, withSub } from './test-system';

/**
 * Oracle, by hand from the definition: each delay is the alignment to the farthest source ((5 m − d)·2.9136 ms/m,
 * rounded to 0.01 ms) plus its own extra delay, minus the smallest; trims 20·log10(d / d_max among the mains) plus the
 * offset, rounded to 0.1 dB.
 */
const hundredths = (ms: number) => Math.round(ms * 100) / 100;

describe('systemChannelSettings: the System document as processor settings', () => {
  it('the test System: mains 3 m → 5.83 ms, Sub A 4 m → 2.91 ms, Sub B 5 m (the farthest) → 0 ms', () => {
    expect(hundredths(2 * MS_PER_METRE_20C)).toBe(5.83);
    expect(hundredths(1 * MS_PER_METRE_20C)).toBe(2.91);
    const s = systemChannelSettings(testSystem());
    expect(s.mains).toEqual([
      { distanceM: 3, delayMs: 5.83, trimDb: 0 },
      { distanceM: 3, delayMs: 5.83, trimDb: 0 },
      { distanceM: 3, delayMs: 5.83, trimDb: 0 },
    ]);
    expect(s.subs).toEqual([
      { distanceM: 4, delayMs: 2.91, gainDb: 0 },
      { distanceM: 5, delayMs: 0, gainDb: 0 },
    ]);
    expect(s.farthestIndex).toBe(4);
  });

  it('the document’s mains delay, sub delay, trim offset and sub gain are on top', () => {
    let doc = testSystem();
    doc = { ...doc, bassManagement: { ...doc.bassManagement, mainsDelayMs: 1 } };
    doc = withSub(doc, 1, { delayMs: 0.5, gainDb: -2.04 });
    doc = withSpeaker(doc, 'C', { trimDb: 1.5 });
    const s = systemChannelSettings(doc);
    // Totals: mains 6.83, Sub A 2.91, Sub B 0.5 → the smallest (0.5) taken out.
    expect(s.mains.map((m) => m.delayMs)).toEqual([6.33, 6.33, 6.33]);
    expect(s.subs.map((m) => m.delayMs)).toEqual([2.41, 0]);
    expect(s.mains.map((m) => m.trimDb)).toEqual([0, 1.5, 0]);
    expect(s.subs[1]!.gainDb).toBe(-2);
  });

  it('a measured distance (override) is the distance set on the processor: L at 2.0 m → 8.74 ms and −3.5 dB', () => {
    const doc = withSpeaker(testSystem(), 'L', { distanceOverrideM: 2 });
    const l = systemChannelSettings(doc).mains[0]!;
    expect(l.distanceM).toBe(2);
    expect(l.delayMs).toBe(hundredths(3 * MS_PER_METRE_20C)); // 8.74
    // Level match among the mains: 20·log10(2 / 3) = −3.52 → −3.5 dB.
    expect(l.trimDb).toBe(-3.5);
  });

  it('the same document object gives the same settings object; a changed document is computed anew', () => {
    const doc = testSystem();
    expect(systemChannelSettings(doc)).toBe(systemChannelSettings(doc));
    const moved = withSub(doc, 0, { xM: 0.5 });
    expect(systemChannelSettings(moved)).not.toBe(systemChannelSettings(doc));
    expect(systemChannelSettings(moved).subs[0]!.distanceM).not.toBe(4);
  });
});
