import { describe, expect, it } from 'vitest';
import { bonelloCheck, roomModes, type RoomMode } from '@/dsp';

/** A mode at a given frequency (indices and kind do not matter to the criterion). */
const mode = (frequencyHz: number): RoomMode => ({ frequencyHz, indices: [1, 0, 0], kind: 'axial' });

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
    // …and every band that holds fewer modes than the one below is reported, none missed.
    const fewer = r.bands.filter((b, i) => i > 0 && b.count < r.bands[i - 1]!.count).map((b) => b.centerHz);
    expect(r.decreasingAtHz).toEqual(fewer);
  });
  // One-third-octave bands, base ten (published: IEC 61260-1): centres 10^(n/10) Hz, edges at the centre · 10^(±1/20):
  // 25.12 Hz (22.39–28.18), 31.62 Hz (28.18–35.48), 39.81 Hz (35.48–44.67), 50.12 Hz (44.67–56.23). Counted by hand.
  it('hand-counted modes: 2, 1, 3 modes in the 25, 31.5, 40 Hz bands decrease at 31.5 Hz only', () => {
    const r = bonelloCheck([mode(23), mode(26), mode(30), mode(37), mode(40), mode(43)], { startHz: 25, stopHz: 40 });
    expect(r.bands.map((b) => b.count)).toEqual([2, 1, 3]);
    expect(r.decreasingAtHz.map((hz) => Math.round(hz * 100) / 100)).toEqual([31.62]);
    expect(r.coincidencesAtHz).toEqual([]);
    expect(r.passes).toBe(false);
  });
  it('hand-counted modes: a decrease in the top band counts too, and rising counts with no coincidence pass', () => {
    const rising = [mode(23), mode(30), mode(33), mode(37), mode(40), mode(43)];
    expect(bonelloCheck(rising, { startHz: 25, stopHz: 40 }).passes).toBe(true);
    // The 50 Hz band (44.67–56.23 Hz, centre above 50 Hz, so stopHz 51) holds one mode, the 40 Hz band three.
    const r = bonelloCheck([...rising, mode(50)], { startHz: 25, stopHz: 51 });
    expect(r.decreasingAtHz.map((hz) => Math.round(hz * 100) / 100)).toEqual([50.12]);
    expect(r.passes).toBe(false);
  });
  it('hand-counted modes: two modes 0.2 Hz apart in a band of fewer than five are a coincidence (default tolerance 0.5 Hz)', () => {
    const r = bonelloCheck([mode(23), mode(26), mode(26.2), mode(30), mode(31), mode(33), mode(37), mode(40), mode(43)], { startHz: 25, stopHz: 40 });
    expect(r.decreasingAtHz).toEqual([]);
    expect(r.coincidencesAtHz.map((hz) => Math.round(hz * 100) / 100)).toEqual([25.12]);
    expect(r.passes).toBe(false);
  });
});
