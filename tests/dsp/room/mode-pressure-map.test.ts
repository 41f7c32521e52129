import { describe, expect, it } from 'vitest';
import { modePressureAt, modePressureMap, nodeAlignedCellCount } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const room = { lengthM: 6, widthM: 4, heightM: 2.5 };

describe('modePressureMap (cosine mode shapes, published: Kuttruff ch. 3)', () => {
  it('(1,0,0) is +1 at the front wall, −1 at the back, 0 across the middle of the length', () => {
    const m = modePressureMap({ room, indices: [1, 0, 0], zM: 1.2, columns: 4, rows: 2 });
    expect(m.pressure.length).toBe(8);
    assertInDelta(m.pressure[0] as number, Math.cos(Math.PI / 4), 1e-12);
    assertInDelta(m.pressure[4] as number, -Math.cos(Math.PI / 4), 1e-12);
    const mid = modePressureMap({ room, indices: [1, 0, 0], zM: 1.2, columns: 1, rows: 1 });
    assertInDelta(mid.pressure[0] as number, 0, 1e-12);
  });

  it('a cell centre on a node line reads exactly 0: (1,0,0) on 51 rows, row 25 at L/2; (2,0,0) on 50 rows, rows 12 and 37 at L/4 and 3L/4 (geometry)', () => {
    const one = modePressureMap({ room, indices: [1, 0, 0], zM: 1.2, columns: 3, rows: 51 });
    assertInDelta(one.yM[25] as number, room.lengthM / 2, 1e-12);
    expect(Array.from(one.pressure.subarray(25 * 3, 26 * 3), Math.abs)).toEqual([0, 0, 0]);
    const two = modePressureMap({ room, indices: [2, 0, 0], zM: 1.2, columns: 1, rows: 50 });
    assertInDelta(two.yM[12] as number, room.lengthM / 4, 1e-12);
    expect([Math.abs(two.pressure[12] as number), Math.abs(two.pressure[37] as number)]).toEqual([0, 0]);
    // Every other cell is the cosine at its centre.
    one.yM.forEach((y, r) => assertInDelta(one.pressure[r * 3] as number, Math.cos((Math.PI * y) / room.lengthM), 1e-12));
  });

  it('throws RangeError naming columns', () => {
    expect(() => modePressureMap({ room, indices: [1, 0, 0], zM: 1, columns: 0, rows: 2 })).toThrow(/columns/);
  });
});

describe('modePressureAt (the value read at a seat)', () => {
  it('(1,0,0) is 0 at y = L/2 and cos(π·y/L) at the MLP itself (geometry)', () => {
    expect(Math.abs(modePressureAt({ room, indices: [1, 0, 0], xM: 2, yM: 3, zM: 1.2 }))).toBeLessThan(1e-12);
    // An MLP at y = 3.7 m of a 6 m room: cos(π·3.7/6) = −0.35837… (hand computation).
    const mlp = modePressureAt({ room, indices: [1, 0, 0], xM: 1.7, yM: 3.7, zM: 1.1 });
    assertInDelta(mlp, Math.cos((Math.PI * 3.7) / 6), 1e-12);
    assertInDelta(mlp, -0.35837, 1e-5);
  });

  it('multiplies the three axes: (1,1,1) at (W/3 across, L/3 along, H/3 up) is cos(π/3)³ = 1/8 (geometry)', () => {
    assertInDelta(modePressureAt({ room, indices: [1, 1, 1], xM: 4 / 3, yM: 2, zM: 2.5 / 3 }), 0.125, 1e-12);
  });

  it('throws RangeError naming the coordinate', () => {
    expect(() => modePressureAt({ room, indices: [1, 0, 0], xM: 1, yM: NaN, zM: 1 })).toThrow(/yM/);
  });
});

describe('nodeAlignedCellCount (n × an odd number puts a cell centre on every node (2k+1)·L/(2n), geometry)', () => {
  it('rounds up to the nearest such count, down when above the maximum, and leaves n = 0 alone', () => {
    expect(nodeAlignedCellCount(1, 50, 100)).toBe(51);
    expect(nodeAlignedCellCount(2, 50, 100)).toBe(50);
    expect(nodeAlignedCellCount(3, 50, 100)).toBe(51);
    expect(nodeAlignedCellCount(4, 50, 100)).toBe(52);
    expect(nodeAlignedCellCount(1, 100, 100)).toBe(99);
    expect(nodeAlignedCellCount(0, 40, 100)).toBe(40);
  });
});
