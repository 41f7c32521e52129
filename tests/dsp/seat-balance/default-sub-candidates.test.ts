import { describe, expect, it } from 'vitest';
import { defaultSubCandidates } from '@/dsp';

// The usual first places to try a sub: the four floor corners and the four wall midpoints (Welti, AES 2002), inset
// from the walls they touch. Expected positions worked out by hand for an invented 6 × 4 × 2.5 m room.
describe('defaultSubCandidates', () => {
  const room = { lengthM: 6, widthM: 4, heightM: 2.5 };

  it('gives 8 points: 4 floor corners and 4 wall midpoints, 0.25 m in from the walls they touch and 0.25 m up', () => {
    const c = defaultSubCandidates(room);
    expect(c).toHaveLength(8);
    expect(new Set(c.map((x) => x.name)).size).toBe(8);
    expect(c.map((x) => [x.positionM.x, x.positionM.y])).toEqual([
      [0.25, 0.25],
      [2, 0.25],
      [3.75, 0.25],
      [3.75, 3],
      [3.75, 5.75],
      [2, 5.75],
      [0.25, 5.75],
      [0.25, 3],
    ]);
    expect(c.every((x) => x.positionM.z === 0.25)).toBe(true);
    expect(c.filter((x) => /corner/i.test(x.name))).toHaveLength(4);
    expect(c.filter((x) => /middle/i.test(x.name))).toHaveLength(4);
  });

  it('every point is inside the room, for other insets and heights too; each touches its walls at the inset', () => {
    for (const [insetM, heightM] of [[0, 0], [0.4, 0.3], [1, 2]] as const) {
      for (const p of defaultSubCandidates(room, insetM, heightM).map((x) => x.positionM)) {
        expect(p.x).toBeGreaterThanOrEqual(0);
        expect(p.x).toBeLessThanOrEqual(room.widthM);
        expect(p.y).toBeGreaterThanOrEqual(0);
        expect(p.y).toBeLessThanOrEqual(room.lengthM);
        expect(p.z).toBe(heightM);
        // Nearest side wall and nearest front/back wall: the inset, or half the room at a midpoint.
        expect(Math.min(p.x, room.widthM - p.x)).toBeCloseTo(p.x === room.widthM / 2 ? room.widthM / 2 : insetM, 12);
        expect(Math.min(p.y, room.lengthM - p.y)).toBeCloseTo(p.y === room.lengthM / 2 ? room.lengthM / 2 : insetM, 12);
      }
    }
  });

  it('an inset larger than half the room stops at the middle; a height above the ceiling stops at the ceiling', () => {
    const c = defaultSubCandidates({ lengthM: 1, widthM: 0.8, heightM: 0.5 }, 3, 2);
    for (const { positionM: p } of c) {
      expect(p.x).toBeCloseTo(0.4, 12);
      expect(p.y).toBeCloseTo(0.5, 12);
      expect(p.z).toBe(0.5);
    }
  });

  it('throws RangeError naming the parameter', () => {
    expect(() => defaultSubCandidates({ ...room, lengthM: 0 })).toThrow(/room\.lengthM/);
    expect(() => defaultSubCandidates({ ...room, widthM: -1 })).toThrow(/room\.widthM/);
    expect(() => defaultSubCandidates({ ...room, heightM: NaN })).toThrow(/room\.heightM/);
    expect(() => defaultSubCandidates(room, -0.1)).toThrow(/insetM/);
    expect(() => defaultSubCandidates(room, 0.25, -1)).toThrow(RangeError);
  });
});
