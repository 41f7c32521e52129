import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { alignSubToMains, blendResponse, logFrequencyGridHz, type FilterFamily, type PathSpec } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const mains: PathSpec = { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false, distanceM: 3 };
const sub: PathSpec = { name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false, distanceM: 4 };

/** Flatness as its definition states it (largest |sum − sum at 4·fc| over fc/2 … 2·fc), measured independently through blendResponse. */
function flatnessOf(m: PathSpec, s: PathSpec, crossoverHz: number, extraSubMs: number, flip: boolean): number {
  const grid = logFrequencyGridHz({ startHz: crossoverHz / 2, stopHz: crossoverHz * 4 * (1 + 1e-12), pointsPerOctave: 48 });
  const r = blendResponse({
    temperatureC: 20,
    frequencyHz: grid,
    paths: [
      { ...m, delayMs: m.delayMs + Math.max(0, -extraSubMs) },
      { ...s, delayMs: s.delayMs + Math.max(0, extraSubMs), invert: flip ? !s.invert : s.invert },
    ],
  });
  const mag = r.sum.magnitudeDb;
  const ref = mag[mag.length - 1] as number;
  let worst = 0;
  for (let i = 0; i < mag.length; i++) if ((r.frequencyHz[i] as number) <= crossoverHz * 2 * (1 + 1e-9)) worst = Math.max(worst, Math.abs((mag[i] as number) - ref));
  return worst;
}

describe('alignSubToMains', () => {
  it('an LR4 pair with the sub 1 m farther gets 2.914 ms added to the mains, same polarity, flat (published: Linkwitz 1976; Kinsler et al. for c)', () => {
    const r = alignSubToMains({ temperatureC: 20, crossoverHz: 80, mains, sub });
    expect(r.addTo).toBe('mains');
    assertInDelta(r.delayMs, 2.9137, 0.003);
    expect(r.invertSub).toBe(false);
    expect(r.flatnessDb).toBeLessThan(0.01);
    assertInDelta(r.phaseDifferenceDeg, 83.9, 0.1);
    expect(r.windowMs[0]).toBeLessThanOrEqual(r.relativeDelayMs);
    expect(r.windowMs[1]).toBeGreaterThanOrEqual(r.relativeDelayMs);
    expect(r.levelVersusDelay.delayMs.length).toBe(r.levelVersusDelay.normalDb.length);
  });
  it('level versus delay: the inverted curve is the normal one shifted by half a period at the crossover (common practice)', () => {
    const r = alignSubToMains({ temperatureC: 20, crossoverHz: 80, mains, sub: { ...sub, distanceM: 3 } });
    const { delayMs, normalDb, invertedDb } = r.levelVersusDelay;
    const zero = delayMs.findIndex((d) => Math.abs(d) < 1e-9);
    expect(normalDb[zero]).toBeGreaterThan(-0.01);
    expect(invertedDb[zero]).toBeLessThan(-40);
    // At the crossover f, −1 = e^(−jπ) = a delay of half a period T/2 = 1/(2f): A − B·e^(−jωd) = A + B·e^(−jω(d + T/2)),
    // so inverted(d) = normal(d + 6.25 ms) at 80 Hz for every delay d (geometry). Compared as powers, so the nulls of
    // either curve (levels far below 0 dB) count by how much power they hold, not by their size in dB.
    for (const s of [{ ...sub, distanceM: 3 }, sub, { ...sub, distanceM: 5.5, gainDb: -4, invert: true }]) {
      const curve = alignSubToMains({ temperatureC: 20, crossoverHz: 80, mains, sub: s }).levelVersusDelay;
      const halfPeriodMs = 1000 / (2 * 80);
      let compared = 0;
      curve.delayMs.forEach((d, k) => {
        const j = curve.delayMs.findIndex((e) => Math.abs(e - (d + halfPeriodMs)) < 1e-6);
        if (j < 0) return;
        compared++;
        const power = (db: number) => Math.pow(10, db / 10);
        assertInDelta(power(curve.invertedDb[k] as number), power(curve.normalDb[j] as number), 1e-9, `inverted at ${d} ms vs normal at ${d + halfPeriodMs} ms`);
      });
      // ±20 ms in 0.05 ms steps: every delay up to 20 − 6.25 ms has a partner.
      expect(compared).toBe(Math.round((40 - halfPeriodMs) / 0.05) + 1);
    }
  });
  const arbPath = (response: 'highpass' | 'lowpass') =>
    fc.record({
      name: fc.constant(response),
      filter: fc.oneof(
        fc.record({ family: fc.constant<FilterFamily>('butterworth'), order: fc.integer({ min: 1, max: 8 }), response: fc.constant(response), cornerHz: fc.constant(80) }),
        fc.record({ family: fc.constant<FilterFamily>('linkwitz-riley'), order: fc.constantFrom(2, 4, 8), response: fc.constant(response), cornerHz: fc.constant(80) }),
      ),
      gainDb: fc.double({ min: -3, max: 3, noNaN: true }),
      delayMs: fc.double({ min: 0, max: 5, noNaN: true }),
      invert: fc.boolean(),
      distanceM: fc.double({ min: 0.5, max: 6, noNaN: true }),
    });
  it('the recommended delay is as flat as the best of a brute-force search over delay and polarity (property)', () => {
    fc.assert(
      fc.property(arbPath('highpass'), arbPath('lowpass'), (m, s) => {
        const r = alignSubToMains({ temperatureC: 20, crossoverHz: 80, mains: m, sub: s, maxDelayMs: 10 });
        const achieved = flatnessOf(m, s, 80, r.relativeDelayMs, r.flipPolarity);
        assertInDelta(achieved, r.flatnessDb, 1e-6);
        let brute = Infinity;
        for (let d = -10; d <= 10 + 1e-9; d += 0.1) for (const flip of [false, true]) brute = Math.min(brute, flatnessOf(m, s, 80, d, flip));
        expect(r.flatnessDb).toBeLessThanOrEqual(brute + 1e-6);
        expect(r.delayMs).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: 12 },
    );
  });
  it('throws RangeError naming crossoverHz, maxDelayMs and the sub’s fields', () => {
    expect(() => alignSubToMains({ temperatureC: 20, crossoverHz: 0, mains, sub })).toThrow(/crossoverHz/);
    expect(() => alignSubToMains({ temperatureC: 20, crossoverHz: 80, mains, sub, maxDelayMs: -1 })).toThrow(/maxDelayMs/);
    expect(() => alignSubToMains({ temperatureC: 20, crossoverHz: 80, mains, sub: { ...sub, distanceM: NaN } })).toThrow(/sub\.distanceM/);
  });
});
