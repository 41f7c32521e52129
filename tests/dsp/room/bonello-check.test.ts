import { describe, expect, it } from 'vitest';
import { bonelloCheck, roomModes } from '@/dsp';

describe('bonelloCheck (published: Bonello, JAES 29(9), 1981)', () => {
  it('a cube fails (coincident modes in sparse bands)', () => {
    const { modes } = roomModes({ lengthM: 4, widthM: 4, heightM: 4, maxHz: 250, temperatureC: 20 });
    const r = bonelloCheck(modes);
    expect(r.passes).toBe(false);
    expect(r.coincidencesAtHz.length).toBeGreaterThan(0);
  });
  it('reports decreasing bands consistently with its own band counts', () => {
    const { modes } = roomModes({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, maxHz: 250, temperatureC: 20 });
    const r = bonelloCheck(modes);
    r.decreasingAtHz.forEach((hz) => {
      const i = r.bands.findIndex((b) => b.centerHz === hz);
      expect(r.bands[i]!.count).toBeLessThan(r.bands[i - 1]!.count);
    });
  });
});
