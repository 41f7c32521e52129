import { describe, expect, it } from 'vitest';
import { nominalSpeakerPosition, speakerAngles } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const listenerM = { x: 2.45, y: 3.7, z: 1.1 };

describe('nominalSpeakerPosition (geometry: the inverse of speakerAngles)', () => {
  it('30° left at 2 m lies at x − 1, y − √3 (equilateral triangle geometry)', () => {
    const p = nominalSpeakerPosition({ listenerM, azimuthDeg: 30, elevationDeg: 0, radiusM: 2 }).positionM;
    assertInDelta(p.x, 1.45, 1e-12, 'x');
    assertInDelta(p.y, 3.7 - Math.sqrt(3), 1e-12, 'y');
    assertInDelta(p.z, 1.1, 1e-12, 'z');
  });
  it('round-trips through speakerAngles for many directions', () => {
    for (const az of [-150, -110, -30, 0, 45, 90, 135]) {
      for (const el of [0, 30, 45]) {
        const { positionM } = nominalSpeakerPosition({ listenerM, azimuthDeg: az, elevationDeg: el, radiusM: 1.5 });
        const a = speakerAngles({ listenerM, speakerM: positionM });
        assertInDelta(a.azimuthDeg, az, 1e-9, `az ${az}`);
        assertInDelta(a.elevationDeg, el, 1e-9, `el ${el}`);
        assertInDelta(a.distanceM, 1.5, 1e-9, 'distance');
      }
    }
  });
  it('stops at the wall (less the margin) in the same direction when the room is too small', () => {
    const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7 };
    const r = nominalSpeakerPosition({ listenerM, azimuthDeg: 90, elevationDeg: 0, radiusM: 5, room, marginM: 0.2 });
    expect(r.clamped).toBe(true);
    assertInDelta(r.positionM.x, 0.2, 1e-12, 'x at the left wall');
    assertInDelta(speakerAngles({ listenerM, speakerM: r.positionM }).azimuthDeg, 90, 1e-9, 'azimuth kept');
    const up = nominalSpeakerPosition({ listenerM, azimuthDeg: 45, elevationDeg: 45, radiusM: 4, room, marginM: 0.05 });
    assertInDelta(up.positionM.z, 2.65, 1e-12, 'z at the ceiling');
    expect(nominalSpeakerPosition({ listenerM, azimuthDeg: 0, elevationDeg: 0, radiusM: 2, room }).clamped).toBe(false);
  });
  it('throws RangeError naming the parameter', () => {
    expect(() => nominalSpeakerPosition({ listenerM, azimuthDeg: 0, elevationDeg: 0, radiusM: 0 })).toThrow(/radiusM/);
    expect(() => nominalSpeakerPosition({ listenerM, azimuthDeg: NaN, elevationDeg: 0, radiusM: 1 })).toThrow(/azimuthDeg/);
  });
});
