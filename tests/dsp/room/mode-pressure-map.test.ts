import { describe, expect, it } from 'vitest';
import { modePressureMap } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('modePressureMap (cosine mode shapes, published: Kuttruff ch. 3)', () => {
  it('(1,0,0) is +1 at the front wall, −1 at the back, 0 across the middle of the length', () => {
    const m = modePressureMap({ room: { lengthM: 6, widthM: 4, heightM: 2.5 }, indices: [1, 0, 0], zM: 1.2, columns: 4, rows: 2 });
    expect(m.pressure.length).toBe(8);
    assertInDelta(m.pressure[0] as number, Math.cos(Math.PI / 4), 1e-12);
    assertInDelta(m.pressure[4] as number, -Math.cos(Math.PI / 4), 1e-12);
    const mid = modePressureMap({ room: { lengthM: 6, widthM: 4, heightM: 2.5 }, indices: [1, 0, 0], zM: 1.2, columns: 1, rows: 1 });
    assertInDelta(mid.pressure[0] as number, 0, 1e-12);
  });
  it('throws RangeError naming columns', () => {
    expect(() => modePressureMap({ room: { lengthM: 6, widthM: 4, heightM: 2.5 }, indices: [1, 0, 0], zM: 1, columns: 0, rows: 2 })).toThrow(/columns/);
  });
});
