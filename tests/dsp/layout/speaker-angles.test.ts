import { describe, expect, it } from 'vitest';
import { speakerAngles } from '@/dsp';
import { pointOffsetM } from '@/dsp/layout/speaker-angles';
import { assertInDelta } from '../../helpers/assert-in-delta';

const mlp = { x: 2.45, y: 4, z: 1.2 };
const onCircle = (azDeg: number, r = 2.5, elDeg = 0) => {
  const a = (azDeg * Math.PI) / 180;
  const e = (elDeg * Math.PI) / 180;
  return { x: mlp.x - r * Math.cos(e) * Math.sin(a), y: mlp.y - r * Math.cos(e) * Math.cos(a), z: mlp.z + r * Math.sin(e) };
};

describe('speakerAngles', () => {
  it('straight ahead is 0°, left is positive (ITU-R BS.2051 sign convention), behind is 180°', () => {
    assertInDelta(speakerAngles({ listenerM: mlp, speakerM: onCircle(0) }).azimuthDeg, 0, 1e-9);
    assertInDelta(speakerAngles({ listenerM: mlp, speakerM: onCircle(30) }).azimuthDeg, 30, 1e-9);
    assertInDelta(speakerAngles({ listenerM: mlp, speakerM: onCircle(-110) }).azimuthDeg, -110, 1e-9);
    assertInDelta(speakerAngles({ listenerM: mlp, speakerM: onCircle(180) }).azimuthDeg, 180, 1e-9);
    const up = speakerAngles({ listenerM: mlp, speakerM: onCircle(45, 3, 40) });
    assertInDelta(up.elevationDeg, 40, 1e-9);
    assertInDelta(up.distanceM, 3, 1e-9);
  });
  it('throws RangeError naming speakerM for NaN coordinates', () => {
    expect(() => speakerAngles({ listenerM: mlp, speakerM: { x: NaN, y: 0, z: 0 } })).toThrow(/speakerM\.x/);
  });
});

describe('pointOffsetM', () => {
  it('is to − from, coordinate by coordinate (geometry), and checks the first point first', () => {
    expect(pointOffsetM('listenerM', mlp, 'speakerM', { x: 1.2, y: 1.5, z: 1.7 })).toEqual({ x: 1.2 - 2.45, y: 1.5 - 4, z: 1.7 - 1.2 });
    expect(() => pointOffsetM('listenerM', { x: 0, y: Infinity, z: 0 }, 'speakerM', { x: NaN, y: 0, z: 0 })).toThrow(/^listenerM\.y must be a finite number/);
    expect(() => pointOffsetM('listenerM', mlp, 'aimM', null as never)).toThrow('aimM must be a point {x, y, z}');
  });
});
