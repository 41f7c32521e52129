import { describe, expect, it } from 'vitest';
import { includedAngleDeg, speakerAngles } from '@/dsp';
import { applyPairPlacementToDocument, planPairPlacement, type PairEntry } from '@/lib/system-model/layout-pair';
import { testSystem, withSpeaker } from './test-system';

const IN = 0.0254; // exact
const mlp = { x: 3, y: 5, z: 1.2 }; // the test System's MLP
const pt = (s: { xM: number; yM: number; zM: number }) => ({ x: s.xM, y: s.yM, z: s.zM });

const plan = (entry: PairEntry, doc = testSystem(), units: 'metric' | 'imperial' = 'metric') => {
  const r = planPairPlacement(doc, entry, units);
  if (!r.ok) throw new Error(r.problems.map((p) => p.message).join('; '));
  return r.plan;
};

describe('planPairPlacement + applyPairPlacementToDocument: the front pair as measured', () => {
  it('123.5 in apart and 122 in from the MLP: 2·asin(61.75/122) = 60.82° included (geometry), only L and R move', () => {
    const doc = withSpeaker(testSystem(), 'L', { distanceOverrideM: 3.3, trimDb: 1.5 });
    const p = plan({ pair: 'front', distanceM: 122 * IN, spacingM: 123.5 * IN });
    expect(p.includedAngleDeg).toBeCloseTo(60.82, 2);
    expect(p.moves.map((m) => m.channel)).toEqual(['L', 'R']);
    const out = applyPairPlacementToDocument(doc, p);
    const [l, c, r] = out.speakers;
    // The applied document gives the same figures read back from the positions (0.1 mm rounding: within 0.01°, 0.5 mm).
    expect(includedAngleDeg({ listenerM: mlp, aM: pt(l!), bM: pt(r!) })).toBeCloseTo(60.82, 1);
    expect(speakerAngles({ listenerM: mlp, speakerM: pt(l!) }).distanceM).toBeCloseTo(122 * IN, 3);
    expect(Math.hypot(r!.xM - l!.xM, r!.yM - l!.yM)).toBeCloseTo(123.5 * IN, 3);
    // Heights, the measured distance setting, trims and the other items are kept as they were.
    expect(l).toMatchObject({ zM: 1.2, distanceOverrideM: 3.3, trimDb: 1.5, aim: { kind: 'mlp' } });
    expect(c).toEqual(doc.speakers[1]);
    expect(out.subs).toEqual(doc.subs);
    expect(out.seats).toEqual(doc.seats);
    expect(out.room).toEqual(doc.room);
    expect(doc.speakers[0]!.xM).toBe(1.2); // the input document is not changed
  });
  it('by included angle, with C on the centre line at the same distance', () => {
    const p = plan({ pair: 'front', distanceM: 2, includedAngleDeg: 60, placeCentre: true });
    const byChannel = Object.fromEntries(p.moves.map((m) => [m.channel, m]));
    // Equilateral triangle of side 2 m: ±1 m across, 1.732 m ahead; C straight ahead 2 m (geometry).
    expect(byChannel.L).toMatchObject({ xM: 2, yM: 3.2679, zM: 1.2 });
    expect(byChannel.R).toMatchObject({ xM: 4, yM: 3.2679, zM: 1.2 });
    expect(byChannel.C).toMatchObject({ xM: 3, yM: 3, zM: 1.2 });
    expect(p.spacingM).toBeCloseTo(2, 12);
  });
  it('a surround pair by angle from straight ahead', () => {
    const doc = { ...testSystem(), speakers: [...testSystem().speakers, { ...testSystem().speakers[0]!, id: 'sl', channel: 'SL' as const }, { ...testSystem().speakers[2]!, id: 'sr', channel: 'SR' as const }] };
    const p = plan({ pair: 'side', distanceM: 1.5, azimuthDeg: 90 }, doc);
    // ±90°: straight across, 1.5 m either side of the MLP (geometry).
    expect(p.moves).toEqual([
      { channel: 'SL', id: 'sl', xM: 1.5, yM: 5, zM: 1.2 },
      { channel: 'SR', id: 'sr', xM: 4.5, yM: 5, zM: 1.2 },
    ]);
    expect(p.includedAngleDeg).toBeCloseTo(180, 9);
  });
});

describe('planPairPlacement refuses impossible input with a message naming what is wrong', () => {
  const problems = (entry: PairEntry, doc = testSystem(), units: 'metric' | 'imperial' = 'metric') => {
    const r = planPairPlacement(doc, entry, units);
    expect(r.ok).toBe(false);
    return r.ok ? [] : r.problems;
  };
  it('spacing more than twice the distance', () => {
    expect(problems({ pair: 'front', distanceM: 1, spacingM: 2.5 })).toEqual([{ field: 'spacing', message: expect.stringMatching(/spacing \(2\.50 m\) is more than twice the distance \(1\.00 m\)/) }]);
  });
  it('a speaker beyond a wall: which speaker, which wall, how far, in the editor’s units', () => {
    // 6 m at ±30°: y = 5 − 6·cos 30° = −0.196 m, 0.196 m beyond the front wall (geometry).
    const found = problems({ pair: 'front', distanceM: 6, includedAngleDeg: 60 });
    expect(found.map((p) => p.message)).toEqual([expect.stringMatching(/^L would be 0\.20 m beyond the front wall/), expect.stringMatching(/^R would be 0\.20 m beyond the front wall/)]);
    // 4 m at ±90°: x = 3 ∓ 4 → −1 m (left wall) and 7 m in a 6 m wide room (right wall); 1 m = 3′ 3.4″.
    const across = problems({ pair: 'front', distanceM: 4, includedAngleDeg: 180 }, testSystem(), 'imperial');
    expect(across.map((p) => p.message)).toEqual([expect.stringMatching(/^L would be 3′ 3\.4″ beyond the left wall/), expect.stringMatching(/^R would be 3′ 3\.4″ beyond the right wall/)]);
  });
  it('a distance shorter than the height difference, a pair the System lacks, angles out of range', () => {
    expect(problems({ pair: 'front', distanceM: 0.5, spacingM: 0.5 }, withSpeaker(testSystem(), 'R', { zM: 2 }))[0]!.message).toMatch(/height difference between the MLP and R/);
    expect(problems({ pair: 'side', distanceM: 2, azimuthDeg: 110 })[0]).toEqual({ field: 'pair', message: 'The System has no SL or SR: apply a template that has them first.' });
    expect(problems({ pair: 'front', distanceM: 2, includedAngleDeg: 190 })[0]!.field).toBe('angle');
    expect(problems({ pair: 'side', distanceM: 2, azimuthDeg: 0 }, { ...testSystem(), speakers: [...testSystem().speakers, { ...testSystem().speakers[0]!, id: 'sl', channel: 'SL' as const }, { ...testSystem().speakers[2]!, id: 'sr', channel: 'SR' as const }] })[0]!.field).toBe('angle');
  });
  it('the MLP outside the room', () => {
    const doc = testSystem();
    doc.seats[0] = { ...doc.seats[0]!, yM: 9 };
    expect(problems({ pair: 'front', distanceM: 2, includedAngleDeg: 60 }, doc)[0]!.message).toMatch(/MLP is outside the room/);
  });
});
