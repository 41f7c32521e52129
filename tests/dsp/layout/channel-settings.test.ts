import { describe, expect, it } from 'vitest';
import { channelSettings, SETTING_RESOLUTION, type ChannelSettingsOptions } from '@/dsp';

/**
 * Oracle, independent of dsp/: the speed of sound c = 331.3·√(1 + T/273.15) m/s (published: Kinsler et al.,
 * "Fundamentals of Acoustics", 4th ed., 2000), so 1 m at 20 °C is 1000/343.2146 = 2.914 ms; the inverse-square level
 * 20·log10(d/d_max). The expected settings below were worked out by hand from the definition: each source's
 * alignment (d_max − d)/c rounded to 0.01 ms, plus its extra delay, minus the smallest total; trims 20·log10(d/d_max
 * among the mains) plus the offset, rounded to 0.1 dB; distances to 0.01 m.
 */
const msPerMetre = (temperatureC: number) => 1000 / (331.3 * Math.sqrt(1 + temperatureC / 273.15));

const main = (distanceM: number, extraDelayMs = 0, trimDb = 0) => ({ distanceM, extraDelayMs, trimDb });
const sub = (distanceM: number, extraDelayMs = 0, gainDb = 0) => ({ distanceM, extraDelayMs, gainDb });
const delays = (r: ReturnType<typeof channelSettings>) => [...r.mains.map((m) => m.delayMs), ...r.subs.map((s) => s.delayMs)];

/** Hundredths as an integer: exact for a number already on the 0.01 grid. */
const cents = (x: number) => Math.round(x * 100);

describe('channelSettings: the processor settings, rounded once (published: Kinsler et al. 2000; inverse-square law)', () => {
  it('the oracle itself: 1 m at 20 °C is 2.914 ms (published), at 0 °C 3.018 ms', () => {
    expect(msPerMetre(20)).toBeCloseTo(2.914, 3);
    expect(msPerMetre(0)).toBeCloseTo(1000 / 331.3, 9);
    expect(SETTING_RESOLUTION).toEqual({ delayMs: 0.01, trimDb: 0.1, distanceM: 0.01 });
  });

  it('mains at 3 m, a sub at 4 m with 1 ms of its own: L 2.91 + 0 and sub 0 + 1, the shared 1 ms taken out → L 1.91 ms, sub 0 ms', () => {
    // L: (4 − 3) m × 2.9136 ms/m = 2.9136 → 2.91 ms, + mains delay 0 = 2.91. Sub: 0 + 1 = 1. Smallest 1 → 1.91 and 0.
    const r = channelSettings({ temperatureC: 20, mains: [main(3)], subs: [sub(4, 1)] });
    expect(r.mains).toEqual([{ distanceM: 3, delayMs: 1.91, trimDb: 0 }]);
    expect(r.subs).toEqual([{ distanceM: 4, delayMs: 0, gainDb: 0 }]);
    expect(r.farthestIndex).toBe(1); // mains first, then subs
    expect(r.farthestDistanceM).toBe(4);
  });

  it('mains only at 4, 3 and 2 m: 0 / 2.91 / 5.83 ms and 0 / −2.5 / −6.0 dB', () => {
    // 1 m × 2.9136 = 2.9136 → 2.91; 2 m × 2.9136 = 5.8273 → 5.83. 20·log10(3/4) = −2.499 → −2.5; 20·log10(2/4) = −6.021 → −6.0.
    const r = channelSettings({ temperatureC: 20, mains: [main(4), main(3), main(2)], subs: [] });
    expect(r.mains).toEqual([
      { distanceM: 4, delayMs: 0, trimDb: 0 },
      { distanceM: 3, delayMs: 2.91, trimDb: -2.5 },
      { distanceM: 2, delayMs: 5.83, trimDb: -6 },
    ]);
    expect(r.farthestIndex).toBe(0);
  });

  it('trims are among the mains only, plus each offset; a farther sub sets the delays but not the trims; sub gain is its own', () => {
    // Sub at 5 m is the farthest: L (4 m) 2.9136 → 2.91 ms, C (2 m) 8.7409 → 8.74 ms, sub 0.
    // Trims against the farthest main (4 m): L 0 + 1.0 = +1.0; C −6.0206 − 0.5 = −6.5206 → −6.5. Sub gain −2.04 → −2.0.
    const r = channelSettings({ temperatureC: 20, mains: [main(4, 0, 1), main(2, 0, -0.5)], subs: [sub(5, 0, -2.04)] });
    expect(r.mains).toEqual([
      { distanceM: 4, delayMs: 2.91, trimDb: 1 },
      { distanceM: 2, delayMs: 8.74, trimDb: -6.5 },
    ]);
    expect(r.subs).toEqual([{ distanceM: 5, delayMs: 0, gainDb: -2 }]);
    expect(r.farthestIndex).toBe(2);
  });

  it('the mains delay is added to every main channel, each sub’s delay to that sub; the smallest total becomes 0', () => {
    // Mains 2.5 m, sub 4.1 m: alignment 1.6 × 2.9136 = 4.6618 → 4.66; + 1.5 = 6.16. Sub: 0 + 0.4 = 0.4. Less 0.4: 5.76 and 0.
    const a = channelSettings({ temperatureC: 20, mains: [main(2.5, 1.5), main(2.5, 1.5)], subs: [sub(4.1, 0.4)] });
    expect(delays(a)).toEqual([5.76, 5.76, 0]);
    // A sub nearer than the mains: mains 4 m (0 ms), sub 3 m: 2.91 + 2.5 = 5.41 ms; the mains are the smallest (0).
    const b = channelSettings({ temperatureC: 20, mains: [main(4)], subs: [sub(3, 2.5)] });
    expect(delays(b)).toEqual([0, 5.41]);
    // Two subs, the nearer one with its own delay larger than the alignment gap: 3.5 m + 0 vs 3 m (1.4568 → 1.46) + 3 = 4.46;
    // mains 2 m: 1.5 × 2.9136 = 4.3705 → 4.37. Smallest 0 (the far sub).
    const c = channelSettings({ temperatureC: 20, mains: [main(2)], subs: [sub(3.5), sub(3, 3)] });
    expect(delays(c)).toEqual([4.37, 0, 4.46]);
  });

  it('air temperature: 1 m is 3.02 ms at 0 °C and 2.87 ms at 30 °C', () => {
    // 1000/331.3 = 3.0184 → 3.02; 1000/(331.3·√(1 + 30/273.15)) = 2.8652 → 2.87.
    expect(channelSettings({ temperatureC: 0, mains: [main(2)], subs: [sub(3)] }).mains[0]!.delayMs).toBe(3.02);
    expect(channelSettings({ temperatureC: 30, mains: [main(2)], subs: [sub(3)] }).mains[0]!.delayMs).toBe(2.87);
    expect(cents(msPerMetre(0))).toBe(302);
    expect(cents(msPerMetre(30))).toBe(287);
  });

  it('rounds once: distances to 0.01 m, delays to 0.01 ms, trims to 0.1 dB, and every figure is on its grid', () => {
    const r = channelSettings({ temperatureC: 21, mains: [main(3.7849174363518157), main(3.4132096331752027, 0.37, 0.25), main(2.2874658467395745)], subs: [sub(4.101524106963167, 0.123, -1.26)] });
    expect(r.mains.map((m) => m.distanceM)).toEqual([3.78, 3.41, 2.29]);
    expect(r.subs[0]!.distanceM).toBe(4.1);
    for (const m of r.mains) {
      expect(m.delayMs).toBe(Number(m.delayMs.toFixed(2)));
      expect(m.trimDb).toBe(Number(m.trimDb.toFixed(1)));
    }
    expect(r.subs[0]!.gainDb).toBe(-1.3);
    // Independently: each alignment rounded, plus the extra delay, less the smallest total, rounded to 0.01 ms.
    const c = msPerMetre(21);
    const dMax = 4.101524106963167;
    const totals = [
      Math.round((dMax - 3.7849174363518157) * c * 100) / 100 + 0,
      Math.round((dMax - 3.4132096331752027) * c * 100) / 100 + 0.37,
      Math.round((dMax - 2.2874658467395745) * c * 100) / 100 + 0,
      0 + 0.123,
    ];
    const least = Math.min(...totals);
    expect(delays(r).map(cents)).toEqual(totals.map((t) => cents(t - least)));
    // Trims against the farthest main (3.785 m): C 20·log10(3.4132/3.7849) = −0.898, + 0.25 → −0.6; SL −4.379 → −4.4.
    expect(r.mains.map((m) => m.trimDb)).toEqual([0, -0.6, -4.4]);
  });

  it('an extra delay changed by 0.01·k ms moves that source’s setting by exactly 0.01·k (while it is not the smallest), and its offset to every other source always', () => {
    // Deterministic pseudo-random layouts (a linear congruential generator), so a failure can be replayed.
    let seed = 12345;
    const rand = () => ((seed = (seed * 1103515245 + 12345) % 2 ** 31) / 2 ** 31);
    let checked = 0;
    for (let trial = 0; trial < 40; trial++) {
      const temperatureC = Math.round(-10 + 40 * rand());
      const mains = Array.from({ length: 1 + Math.floor(4 * rand()) }, () => main(1 + 5 * rand(), 0, 0));
      const subs = Array.from({ length: 1 + Math.floor(2 * rand()) }, () => sub(1 + 5 * rand(), 0, 0));
      const base: ChannelSettingsOptions = { temperatureC, mains, subs };
      // Main channels: the mains delay added to every one of them.
      const before = channelSettings(base);
      for (const k of [1, 2, 3, 7, 10, 29, 99, 150, 333, 1000]) {
        const mainsDelayMs = k / 100;
        const after = channelSettings({ ...base, mains: mains.map((m) => ({ ...m, extraDelayMs: mainsDelayMs })) });
        const subsBefore = before.subs.map((s) => cents(s.delayMs));
        const subsAfter = after.subs.map((s) => cents(s.delayMs));
        // Every main moves k hundredths against every sub.
        for (let i = 0; i < mains.length; i++) {
          for (let j = 0; j < subs.length; j++) {
            expect(cents(after.mains[i]!.delayMs) - subsAfter[j]! - (cents(before.mains[i]!.delayMs) - subsBefore[j]!)).toBe(k);
          }
        }
        // When a sub holds the smallest total both before and after, the mains' settings move by exactly k hundredths.
        if (Math.min(...subsBefore) === 0 && Math.min(...subsAfter) === 0) {
          for (let i = 0; i < mains.length; i++) {
            expect(after.mains[i]!.delayMs).toBe(Number((before.mains[i]!.delayMs + k / 100).toFixed(2)));
            checked++;
          }
        }
      }
      // One sub's own delay.
      for (const k of [1, 5, 13, 250]) {
        const after = channelSettings({ ...base, subs: subs.map((s, j) => (j === 0 ? { ...s, extraDelayMs: k / 100 } : s)) });
        const others = [...before.mains.map((m) => m.delayMs), ...before.subs.slice(1).map((s) => s.delayMs)];
        const othersAfter = [...after.mains.map((m) => m.delayMs), ...after.subs.slice(1).map((s) => s.delayMs)];
        others.forEach((o, n) => expect(cents(after.subs[0]!.delayMs) - cents(othersAfter[n]!) - (cents(before.subs[0]!.delayMs) - cents(o))).toBe(k));
        // When another source holds the smallest total both before and after, this sub's setting moves by exactly k hundredths.
        if (others.some((o) => o === 0) && othersAfter.some((o) => o === 0)) {
          expect(after.subs[0]!.delayMs).toBe(Number((before.subs[0]!.delayMs + k / 100).toFixed(2)));
          checked++;
        }
      }
    }
    expect(checked).toBeGreaterThan(50);
  });

  it('leaves its input alone, and answers nothing for nothing', () => {
    const input = Object.freeze({ temperatureC: 20, mains: Object.freeze([Object.freeze(main(3, 0.5, -1))]), subs: Object.freeze([Object.freeze(sub(4, 1, 2))]) });
    expect(() => channelSettings(input)).not.toThrow();
    expect(input.mains[0]).toEqual(main(3, 0.5, -1));
    expect(channelSettings({ temperatureC: 20, mains: [], subs: [] })).toEqual({ mains: [], subs: [], farthestIndex: -1, farthestDistanceM: 0 });
  });

  it('throws RangeError naming the parameter', () => {
    expect(() => channelSettings({ temperatureC: 20, mains: [main(3), main(0)], subs: [] })).toThrow(/mains\[1\]\.distanceM/);
    expect(() => channelSettings({ temperatureC: 20, mains: [main(3)], subs: [sub(Number.NaN)] })).toThrow(/subs\[0\]\.distanceM/);
    expect(() => channelSettings({ temperatureC: 20, mains: [main(3)], subs: [sub(4, -0.5)] })).toThrow(RangeError);
    expect(() => channelSettings({ temperatureC: 20, mains: [main(3)], subs: [sub(4, -0.5)] })).toThrow(/subs\[0\]\.extraDelayMs/);
    expect(() => channelSettings({ temperatureC: 20, mains: [main(3, 0, Number.POSITIVE_INFINITY)], subs: [] })).toThrow(/mains\[0\]\.trimDb/);
    expect(() => channelSettings({ temperatureC: 20, mains: [main(3)], subs: [sub(4, 0, Number.NaN)] })).toThrow(/subs\[0\]\.gainDb/);
  });
});
