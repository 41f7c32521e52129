import { describe, expect, it } from 'vitest';
import { applyLayoutToDocument, computeLayout, layoutRequestFromDocument } from '@/lib/system-model/layout';
import { layoutRequestSchema } from '@/lib/validations/compute-layout';
import { testSystem, withSpeaker } from './test-system';

const deg = (rad: number) => (rad * 180) / Math.PI;
const DEG_36_87 = Math.round(deg(Math.atan2(1.8, 2.4)) * 100) / 100;

describe('layoutRequestFromDocument: the layout as the document says', () => {
  it('template, room, listener at the MLP, every seat, speaker and sub with the fields the channel settings need', () => {
    const doc = withSpeaker(testSystem(), 'C', { trimDb: 1, distanceOverrideM: 2.8 });
    const req = layoutRequestFromDocument(doc)!;
    expect(req).toMatchObject({ template: '3.1', temperatureC: 20, mainsDelayMs: 0, room: { lengthM: 7, widthM: 6, heightM: 3 }, listener: { xM: 3, yM: 5, zM: 1.2 } });
    expect(req.seats.map((s) => s.id)).toEqual(['mlp', 'side']);
    expect(req.speakers[1]).toEqual({ channel: 'C', xM: 3, yM: 2, zM: 1.2, aim: { kind: 'mlp' }, distanceOverrideM: 2.8, trimDb: 1 });
    expect(req.subs[0]).toEqual({ name: 'Sub A', xM: 3, yM: 1, zM: 1.2, distanceOverrideM: null, delayMs: 0, gainDb: 0 });
    expect(layoutRequestSchema.safeParse(req).success).toBe(true);
    expect(layoutRequestFromDocument({ ...doc, speakers: [] })).toBeNull();
  });
});

describe('computeLayout: the answer of POST /api/v1/layout', () => {
  const answer = (doc = testSystem(), extra = {}) => computeLayout(layoutRequestSchema.parse({ ...layoutRequestFromDocument(doc), ...extra }));

  it('L at atan(1.8 / 2.4) = 36.87° to the left, 3 m: outside ±22°–30° (warn); C straight ahead (pass); R mirrored', () => {
    const [l, c, r] = answer().speakers;
    expect(l).toMatchObject({ channel: 'L', azimuthDeg: DEG_36_87, elevationDeg: 0, distanceM: 3, distanceSource: 'geometry', geometricDistanceM: 3, status: 'warn', message: 'azimuth 36.9° is above 30°' });
    expect(c).toMatchObject({ channel: 'C', azimuthDeg: 0, status: 'pass', message: 'within the recommended range' });
    expect(r!.azimuthDeg).toBe(-DEG_36_87);
    expect(Math.abs(l!.toeInDeg)).toBe(36.9);
  });

  it('delays and trims are the channel settings: mains 5.83 ms, Sub A 2.91 ms, Sub B 0 ms; the farthest is Sub B at 5 m', () => {
    const a = answer();
    expect(a.speakers.map((s) => [s.delayMs, s.trimDb])).toEqual([[5.83, 0], [5.83, 0], [5.83, 0]]);
    expect(a.subs).toEqual([
      { name: 'Sub A', distanceM: 4, distanceSource: 'geometry', delayMs: 2.91, gainDb: 0 },
      { name: 'Sub B', distanceM: 5, distanceSource: 'geometry', delayMs: 0, gainDb: 0 },
    ]);
    expect(a.farthest).toEqual({ name: 'Sub B', distanceM: 5 });
  });

  it('the front pair spans 73.74° (over the 44°–60° range); 3.1 misses no channel; nominal positions only with a radius', () => {
    const a = answer();
    expect(a.frontPair).toEqual({ includedAngleDeg: Math.round(2 * deg(Math.atan2(1.8, 2.4)) * 100) / 100, recommended: { nominal: 60, min: 44, max: 60 }, status: 'warn' });
    expect(a.missingChannels).toEqual([]);
    expect(a.nominalPositions).toBeNull();
    const c = answer(testSystem(), { radiusM: 2 }).nominalPositions!.find((p) => p.channel === 'C')!;
    expect(c).toEqual({ channel: 'C', xM: 3, yM: 3, zM: 1.2, distanceM: 2, clamped: false });
  });

  it('a measured distance is the one the processor gets, marked measured; the geometry is still shown', () => {
    const l = answer(withSpeaker(testSystem(), 'L', { distanceOverrideM: 2.5 })).speakers[0]!;
    expect(l).toMatchObject({ distanceM: 2.5, distanceSource: 'measured', geometricDistanceM: 3 });
  });
});

describe('applyLayoutToDocument: a layout template applied', () => {
  it('2.0 removes C and keeps L and R exactly; nothing else changes', () => {
    const doc = testSystem();
    const r = applyLayoutToDocument(doc, '2.0', { radiusM: 2 });
    expect({ added: r.added, removed: r.removed, moved: r.moved }).toEqual({ added: [], removed: ['C'], moved: [] });
    expect(r.doc.speakers).toEqual([doc.speakers[0], doc.speakers[2]]);
    expect({ ...r.doc, layout: doc.layout, speakers: doc.speakers }).toEqual(doc);
    expect(r.doc.layout).toBe('2.0');
  });

  it('5.1 adds SL and SR at ±110°, 2 m from the MLP, aimed at it, with the first speaker’s profile and amplifier', () => {
    const r = applyLayoutToDocument(testSystem(), '5.1', { radiusM: 2 });
    expect(r.added).toEqual(['SL', 'SR']);
    const sl = r.doc.speakers.find((s) => s.channel === 'SL')!;
    // Azimuth +110° is to the listener's left (−x) and behind (+y): x = 3 − 2·sin 110°, y = 5 − 2·cos 110°.
    expect(sl).toEqual({
      id: 'sl',
      channel: 'SL',
      xM: Math.round((3 - 2 * Math.sin((110 * Math.PI) / 180)) * 1000) / 1000,
      yM: Math.round((5 - 2 * Math.cos((110 * Math.PI) / 180)) * 1000) / 1000,
      zM: 1.2,
      aim: { kind: 'mlp' },
      profileId: 'test-main',
      distanceOverrideM: null,
      trimDb: 0,
      amplifierPowerW: 100,
      // A new channel starts with every voicing switch in its first position.
      voicing: {},
    });
  });

  it('keepExisting false moves every channel to its nominal place and drops its measured distance', () => {
    const r = applyLayoutToDocument(withSpeaker(testSystem(), 'C', { distanceOverrideM: 2.9 }), '3.1', { radiusM: 2, keepExisting: false });
    expect(r.moved).toEqual(['L', 'C', 'R']);
    expect(r.doc.speakers[1]).toMatchObject({ channel: 'C', xM: 3, yM: 3, zM: 1.2, distanceOverrideM: null });
  });
});
