import { describe, expect, it } from 'vitest';
import { checkSpeakerAngles, layoutTemplate, speakerAngles } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const mlp = { x: 2.45, y: 4, z: 1.2 };
const onCircle = (azDeg: number, r = 2.5, elDeg = 0) => {
  const a = (azDeg * Math.PI) / 180;
  const e = (elDeg * Math.PI) / 180;
  return { x: mlp.x - r * Math.cos(e) * Math.sin(a), y: mlp.y - r * Math.cos(e) * Math.cos(a), z: mlp.z + r * Math.sin(e) };
};
const channel = (label: string, id = '5.1') => layoutTemplate(id).channels.find((c) => c.label === label)!;

describe('checkSpeakerAngles', () => {
  it('front left within ±22°–30° passes, at 40° warns, on the right side is the wrong side (ITU-R BS.775-3; common practice)', () => {
    const l = layoutTemplate('5.1').channels[0]!;
    expect(checkSpeakerAngles({ channel: l, ...speakerAngles({ listenerM: mlp, speakerM: onCircle(25) }) }).status).toBe('pass');
    expect(checkSpeakerAngles({ channel: l, ...speakerAngles({ listenerM: mlp, speakerM: onCircle(40) }) }).status).toBe('warn');
    expect(checkSpeakerAngles({ channel: l, ...speakerAngles({ listenerM: mlp, speakerM: onCircle(-25) }) }).wrongSide).toBe(true);
  });
  it('the offsets say by how much, by hand: L at 40° is 10° out, at 18° 4° out, at 26° and at both ends none', () => {
    const l = channel('L');
    assertInDelta(checkSpeakerAngles({ channel: l, azimuthDeg: 40, elevationDeg: 0 }).azimuthOffDeg, 10, 1e-12);
    assertInDelta(checkSpeakerAngles({ channel: l, azimuthDeg: 18, elevationDeg: 0 }).azimuthOffDeg, 4, 1e-12);
    for (const az of [22, 26, 30]) {
      const r = checkSpeakerAngles({ channel: l, azimuthDeg: az, elevationDeg: 0 });
      expect(r).toEqual({ status: 'pass', azimuthOffDeg: 0, elevationOffDeg: 0, wrongSide: false });
    }
  });
  it('the right channel takes negative azimuths: R at −28° passes, at +28° is on the wrong side though its magnitude fits', () => {
    const r = channel('R');
    expect(checkSpeakerAngles({ channel: r, azimuthDeg: -28, elevationDeg: 0 }).status).toBe('pass');
    const wrong = checkSpeakerAngles({ channel: r, azimuthDeg: 28, elevationDeg: 0 });
    expect(wrong.wrongSide).toBe(true);
    expect(wrong.azimuthOffDeg).toBe(0);
    expect(wrong.status).toBe('warn');
  });
  it('the centre’s offset is its azimuth’s size either way, never the wrong side', () => {
    const c = channel('C');
    const r = checkSpeakerAngles({ channel: c, azimuthDeg: -3, elevationDeg: 0 });
    expect(r.wrongSide).toBe(false);
    assertInDelta(r.azimuthOffDeg, 3, 1e-12);
    expect(r.status).toBe('warn');
    expect(checkSpeakerAngles({ channel: c, azimuthDeg: 0, elevationDeg: -5 }).status).toBe('pass');
  });
  it('elevation outside the range warns by its offset: a surround 20° up is 5° over 0°–15° (ITU-R BS.775-3)', () => {
    const r = checkSpeakerAngles({ channel: channel('SL'), azimuthDeg: 110, elevationDeg: 20 });
    assertInDelta(r.elevationOffDeg, 5, 1e-12);
    expect(r.status).toBe('warn');
    assertInDelta(checkSpeakerAngles({ channel: channel('SL'), azimuthDeg: 110, elevationDeg: -2 }).elevationOffDeg, 2, 1e-12);
  });
  it('throws RangeError naming azimuthDeg and elevationDeg', () => {
    expect(() => checkSpeakerAngles({ channel: channel('L'), azimuthDeg: NaN, elevationDeg: 0 })).toThrow(/azimuthDeg/);
    expect(() => checkSpeakerAngles({ channel: channel('L'), azimuthDeg: 30, elevationDeg: Infinity })).toThrow(/elevationDeg/);
  });
});
