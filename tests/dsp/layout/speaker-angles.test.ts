import { describe, expect, it } from 'vitest';
import { checkSpeakerAngles, includedAngleDeg, layoutTemplate, LAYOUT_TEMPLATES, speakerAngles } from '@/dsp';
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

describe('layout templates and checks', () => {
  it('5.1 follows ITU-R BS.775-3 (2012): C 0°, L/R 30° (home ±22°–30° common practice), surrounds 100°–120°', () => {
    const t = layoutTemplate('5.1');
    expect(t.channels.map((c) => c.label)).toEqual(['L', 'C', 'R', 'SL', 'SR']);
    const sl = t.channels.find((c) => c.label === 'SL')!;
    expect([sl.azimuthDeg.min, sl.azimuthDeg.max]).toEqual([100, 120]);
    const l = t.channels[0]!;
    expect([l.azimuthDeg.nominal, l.azimuthDeg.min, l.azimuthDeg.max]).toEqual([30, 22, 30]);
    expect(checkSpeakerAngles({ channel: l, ...speakerAngles({ listenerM: mlp, speakerM: onCircle(25) }) }).status).toBe('pass');
    expect(checkSpeakerAngles({ channel: l, ...speakerAngles({ listenerM: mlp, speakerM: onCircle(40) }) }).status).toBe('warn');
    expect(checkSpeakerAngles({ channel: l, ...speakerAngles({ listenerM: mlp, speakerM: onCircle(-25) }) }).wrongSide).toBe(true);
  });
  it('offers 2.0 to 9.1.6 with channel counts matching the notation', () => {
    for (const id of ['2.0', '2.1', '3.1', '5.1', '7.1', '5.1.2', '5.1.4', '7.1.2', '7.1.4', '9.1.6']) {
      const [bed, subs, heights = '0'] = id.split('.');
      const t = LAYOUT_TEMPLATES.find((x) => x.id === id)!;
      expect(t.channels.length).toBe(Number(bed) + Number(heights));
      expect(t.subwooferCount).toBe(Number(subs));
      for (const c of t.channels) expect(c.source.length).toBeGreaterThan(0);
    }
    expect(() => layoutTemplate('4.0')).toThrow(/id/);
  });
  it('an equilateral listening triangle has a 60° included angle (geometry)', () => {
    assertInDelta(includedAngleDeg({ listenerM: mlp, aM: onCircle(30), bM: onCircle(-30) }), 60, 1e-9);
  });
});
