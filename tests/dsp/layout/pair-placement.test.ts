import { describe, expect, it } from 'vitest';
import { pairPlacement, speakerAngles } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const IN = 0.0254; // 1 in = 0.0254 m exactly
const mlp = { x: 2.45, y: 3.7, z: 1.1 };
const dist = (a: { x: number; y: number; z: number }, b: { x: number; y: number; z: number }) => Math.hypot(a.x - b.x, a.y - b.y, a.z - b.z);

describe('pairPlacement (geometry)', () => {
  it('123.5 in apart and 122 in from the listener: included angle 2·asin(61.75/122) = 60.82° (geometry)', () => {
    const p = pairPlacement({ listenerM: mlp, distanceM: 122 * IN, spacingM: 123.5 * IN, leftZM: mlp.z, rightZM: mlp.z });
    assertInDelta(p.includedAngleDeg, 60.82, 0.005);
    expect(p.includedAngleDeg.toFixed(1)).toBe('60.8');
    // Each speaker is the distance given from the listener and the spacing given from the other (tape-measure check).
    assertInDelta(dist(p.leftM, mlp), 122 * IN, 1e-12);
    assertInDelta(dist(p.rightM, mlp), 122 * IN, 1e-12);
    assertInDelta(dist(p.leftM, p.rightM), 123.5 * IN, 1e-12);
    assertInDelta(p.spacingM, 123.5 * IN, 1e-12);
    assertInDelta(p.earAngleDeg, p.includedAngleDeg, 1e-9); // at ear height the two angles agree
  });
  it('speakers below ear height: the angle at the ears stays 2·asin(s/2d) = 60.82°; in the floor plan it is 2·asin(s/2√(d² − Δz²))', () => {
    const p = pairPlacement({ listenerM: mlp, distanceM: 122 * IN, spacingM: 123.5 * IN, leftZM: mlp.z - 0.1, rightZM: mlp.z - 0.1 });
    assertInDelta(p.earAngleDeg, 2 * Math.asin(61.75 / 122) * (180 / Math.PI), 1e-9);
    const floorM = Math.sqrt((122 * IN) ** 2 - 0.01);
    assertInDelta(p.includedAngleDeg, 2 * Math.asin((123.5 * IN) / 2 / floorM) * (180 / Math.PI), 1e-9);
    assertInDelta(p.includedAngleDeg, 60.85, 0.001);
  });
  it('places L to the listener’s left (x smaller), R to the right, both toward the front wall, symmetric about x of the listener', () => {
    const p = pairPlacement({ listenerM: mlp, distanceM: 2, includedAngleDeg: 60, leftZM: mlp.z, rightZM: mlp.z });
    // Equilateral triangle of side 2: 1 m either side, 2·cos 30° = 1.732 m ahead (geometry).
    assertInDelta(p.leftM.x, mlp.x - 1, 1e-12);
    assertInDelta(p.rightM.x, mlp.x + 1, 1e-12);
    assertInDelta(p.leftM.y, mlp.y - Math.sqrt(3), 1e-12);
    assertInDelta(p.rightM.y, mlp.y - Math.sqrt(3), 1e-12);
    assertInDelta(p.spacingM, 2, 1e-12);
    assertInDelta(speakerAngles({ listenerM: mlp, speakerM: p.leftM }).azimuthDeg, 30, 1e-9);
    assertInDelta(speakerAngles({ listenerM: mlp, speakerM: p.rightM }).azimuthDeg, -30, 1e-9);
    expect(p.centreM).toBeNull();
  });
  it('keeps the heights: the measured distance is the straight line, so the floor distance is √(d² − Δz²) (3–4–5 triangle)', () => {
    const p = pairPlacement({ listenerM: { x: 3, y: 6, z: 1 }, distanceM: 5, includedAngleDeg: 180, leftZM: 4, rightZM: 4, centreZM: 4 });
    // Δz = 3 m, d = 5 m → 4 m in the floor plan; at ±90° straight across.
    expect(p.leftM).toEqual({ x: -1, y: 6, z: 4 });
    expect(p.rightM).toEqual({ x: 7, y: 6, z: 4 });
    expect(p.centreM).toEqual({ x: 3, y: 2, z: 4 });
    assertInDelta(p.includedAngleDeg, 180, 1e-9);
  });
  it('a surround pair at ±110° from straight ahead: behind the listener, included angle 140° (360 − 2·110)', () => {
    const p = pairPlacement({ listenerM: mlp, distanceM: 2, azimuthDeg: 110, leftZM: 1.2, rightZM: 1.2 });
    const d = Math.sqrt(4 - 0.01); // Δz = 0.1 m
    assertInDelta(p.leftM.x, mlp.x - d * Math.sin((110 * Math.PI) / 180), 1e-12);
    assertInDelta(p.leftM.y, mlp.y - d * Math.cos((110 * Math.PI) / 180), 1e-12);
    expect(p.leftM.y).toBeGreaterThan(mlp.y);
    assertInDelta(speakerAngles({ listenerM: mlp, speakerM: p.leftM }).azimuthDeg, 110, 1e-9);
    assertInDelta(speakerAngles({ listenerM: mlp, speakerM: p.rightM }).azimuthDeg, -110, 1e-9);
    assertInDelta(p.includedAngleDeg, 140, 1e-9);
  });
  it('spacing exactly twice the distance is straight across (180°); more is impossible and named', () => {
    assertInDelta(pairPlacement({ listenerM: mlp, distanceM: 1, spacingM: 2, leftZM: mlp.z, rightZM: mlp.z }).includedAngleDeg, 180, 1e-9);
    expect(() => pairPlacement({ listenerM: mlp, distanceM: 1, spacingM: 2.01, leftZM: mlp.z, rightZM: mlp.z })).toThrow(/spacingM.*twice/);
  });
  it('throws RangeError naming the parameter for impossible input', () => {
    const base = { listenerM: mlp, leftZM: mlp.z, rightZM: mlp.z };
    expect(() => pairPlacement({ ...base, distanceM: 0, spacingM: 1 })).toThrow(/distanceM/);
    expect(() => pairPlacement({ ...base, distanceM: 2 })).toThrow(/exactly one/);
    expect(() => pairPlacement({ ...base, distanceM: 2, spacingM: 1, includedAngleDeg: 60 })).toThrow(/exactly one/);
    expect(() => pairPlacement({ ...base, distanceM: 2, includedAngleDeg: 0 })).toThrow(/includedAngleDeg/);
    expect(() => pairPlacement({ ...base, distanceM: 2, includedAngleDeg: 181 })).toThrow(/includedAngleDeg/);
    expect(() => pairPlacement({ ...base, distanceM: 2, azimuthDeg: 180 })).toThrow(/azimuthDeg/);
    expect(() => pairPlacement({ ...base, distanceM: 2, spacingM: -1 })).toThrow(/spacingM/);
    expect(() => pairPlacement({ ...base, leftZM: 4, distanceM: 2, spacingM: 1 })).toThrow(/leftZM/);
    expect(() => pairPlacement({ ...base, distanceM: 2, spacingM: 1, centreZM: Number.NaN })).toThrow(/centreZM/);
    for (const bad of [() => pairPlacement({ ...base, distanceM: Number.NaN, spacingM: 1 })]) expect(bad).toThrow(RangeError);
  });
});
