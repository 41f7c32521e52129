import { describe, expect, it } from 'vitest';
import { layoutTemplate, LAYOUT_TEMPLATES } from '@/dsp';

describe('layout templates', () => {
  it('5.1 follows ITU-R BS.775-3 (2012): C 0°, L/R 30° (home ±22°–30° common practice), surrounds 100°–120°', () => {
    const t = layoutTemplate('5.1');
    expect(t.channels.map((c) => c.label)).toEqual(['L', 'C', 'R', 'SL', 'SR']);
    const sl = t.channels.find((c) => c.label === 'SL')!;
    expect([sl.azimuthDeg.min, sl.azimuthDeg.max]).toEqual([100, 120]);
    const l = t.channels[0]!;
    expect([l.azimuthDeg.nominal, l.azimuthDeg.min, l.azimuthDeg.max]).toEqual([30, 22, 30]);
    const c = t.channels[1]!;
    expect([c.side, c.azimuthDeg.nominal, c.azimuthDeg.min, c.azimuthDeg.max]).toEqual(['centre', 0, 0, 0]);
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
  it('heights (the third number) sit above ear level, the bed at or near it', () => {
    for (const t of LAYOUT_TEMPLATES) {
      const heights = Number(t.id.split('.')[2] ?? '0');
      const raised = t.channels.filter((c) => c.elevationDeg.min >= 30);
      expect(raised.length, t.id).toBe(heights);
      for (const c of t.channels.filter((x) => !raised.includes(x))) expect(c.elevationDeg.nominal, `${t.id} ${c.label}`).toBeLessThanOrEqual(10);
    }
  });
  it('every range holds its nominal angle, labels are unique, and left and right channels are mirror pairs', () => {
    for (const t of LAYOUT_TEMPLATES) {
      const labels = t.channels.map((c) => c.label);
      expect(new Set(labels).size, t.id).toBe(labels.length);
      for (const c of t.channels) {
        for (const range of [c.azimuthDeg, c.elevationDeg]) {
          expect(range.min, `${t.id} ${c.label}`).toBeLessThanOrEqual(range.nominal);
          expect(range.nominal, `${t.id} ${c.label}`).toBeLessThanOrEqual(range.max);
        }
      }
      const left = t.channels.filter((c) => c.side === 'left');
      const right = t.channels.filter((c) => c.side === 'right');
      expect(right.length, t.id).toBe(left.length);
      left.forEach((l, k) => {
        const r = right[k]!;
        expect(r.label.slice(0, -1), `${t.id} ${l.label}`).toBe(l.label.slice(0, -1));
        expect([r.azimuthDeg, r.elevationDeg]).toEqual([l.azimuthDeg, l.elevationDeg]);
      });
    }
  });
});
