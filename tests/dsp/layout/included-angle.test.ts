import { describe, expect, it } from 'vitest';
import { includedAngleDeg } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const mlp = { x: 2.45, y: 4, z: 1.2 };
const onCircle = (azDeg: number, r = 2.5, elDeg = 0) => {
  const a = (azDeg * Math.PI) / 180;
  const e = (elDeg * Math.PI) / 180;
  return { x: mlp.x - r * Math.cos(e) * Math.sin(a), y: mlp.y - r * Math.cos(e) * Math.cos(a), z: mlp.z + r * Math.sin(e) };
};

describe('includedAngleDeg (geometry)', () => {
  it('an equilateral listening triangle has a 60° included angle (geometry)', () => {
    assertInDelta(includedAngleDeg({ listenerM: mlp, aM: onCircle(30), bM: onCircle(-30) }), 60, 1e-9);
  });
  it('is the smaller angle between the two directions, 0…180°, whatever the distances and heights', () => {
    assertInDelta(includedAngleDeg({ listenerM: mlp, aM: onCircle(45, 1), bM: onCircle(-45, 3) }), 90, 1e-9);
    assertInDelta(includedAngleDeg({ listenerM: mlp, aM: onCircle(90), bM: onCircle(-90) }), 180, 1e-9);
    assertInDelta(includedAngleDeg({ listenerM: mlp, aM: onCircle(110), bM: onCircle(-110) }), 140, 1e-9);
    assertInDelta(includedAngleDeg({ listenerM: mlp, aM: onCircle(20, 2, 40), bM: onCircle(20, 4) }), 0, 1e-9);
    // Height does not count: the angle is taken in the floor plan (30° and −30° seen from the seat, one raised).
    assertInDelta(includedAngleDeg({ listenerM: mlp, aM: onCircle(30, 2.5, 45), bM: onCircle(-30) }), 60, 1e-9);
  });
  it('is symmetric in the two speakers', () => {
    const a = onCircle(73, 2);
    const b = onCircle(-12, 3);
    expect(includedAngleDeg({ listenerM: mlp, aM: a, bM: b })).toBe(includedAngleDeg({ listenerM: mlp, aM: b, bM: a }));
  });
  it('throws RangeError when a speaker stands on the listener in the floor plan, and names bad points', () => {
    expect(() => includedAngleDeg({ listenerM: mlp, aM: { ...mlp, z: 3 }, bM: onCircle(30) })).toThrow(RangeError);
    expect(() => includedAngleDeg({ listenerM: mlp, aM: { x: NaN, y: 0, z: 0 }, bM: onCircle(30) })).toThrow(/aM/);
  });
});
