import { describe, expect, it } from 'vitest';
import { distanceToSeatM, geometricDistanceM, mlpSeat, profileById, toPointM } from '@/lib/system-model/geometry';
import { testSystem, withSpeaker, TEST_SUB } from './test-system';

/** Oracle: the test System's distances by hand (3–4–5 m triangles; see test-system.ts). */
describe('geometry: where things are in a System', () => {
  it('mlpSeat is the seat mlpSeatId names, else the first seat; no seats is a RangeError', () => {
    const doc = testSystem();
    expect(mlpSeat(doc).name).toBe('Centre chair');
    expect(mlpSeat({ ...doc, mlpSeatId: 'side' }).name).toBe('Side chair');
    expect(mlpSeat({ ...doc, mlpSeatId: 'gone' }).name).toBe('Centre chair');
    expect(() => mlpSeat({ ...doc, seats: [] })).toThrow(RangeError);
  });

  it('profileById finds a profile or answers undefined', () => {
    const doc = testSystem();
    expect(profileById(doc, 'test-sub')).toEqual(TEST_SUB);
    expect(profileById(doc, 'nothing')).toBeUndefined();
  });

  it('toPointM maps xM, yM, zM to x, y, z', () => {
    expect(toPointM({ xM: 1, yM: 2, zM: 3 })).toEqual({ x: 1, y: 2, z: 3 });
  });

  it('air paths to the MLP: L, C, R 3.0 m; Sub A 4.0 m; Sub B 5.0 m', () => {
    const doc = testSystem();
    const seat = mlpSeat(doc);
    doc.speakers.forEach((s) => expect(geometricDistanceM(s, seat)).toBeCloseTo(3, 12));
    expect(geometricDistanceM(doc.subs[0]!, seat)).toBeCloseTo(4, 12);
    expect(geometricDistanceM(doc.subs[1]!, seat)).toBeCloseTo(5, 12);
  });

  it('distanceToSeatM: a measured distance counts at the MLP only; other seats use the positions', () => {
    const doc = withSpeaker(testSystem(), 'L', { distanceOverrideM: 2.2 });
    const l = doc.speakers[0]!;
    expect(distanceToSeatM(doc, l)).toBe(2.2);
    // The side chair is 1 m to the right of the MLP: L is √(2.8² + 2.4²) m away from it.
    expect(distanceToSeatM(doc, l, doc.seats[1]!)).toBeCloseTo(Math.hypot(2.8, 2.4), 12);
  });
});
