import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readFileSync } from 'node:fs';
import { blendResponse, logFrequencyGridHz, SILENCE_DB, type FilterFamily, type PathSpec } from '@/dsp';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';

const grid = logFrequencyGridHz({ startHz: 10, stopHz: 1000, pointsPerOctave: 48 });
const pair = (family: FilterFamily, order: number, invertSub: boolean, cornerHz = 80): PathSpec[] => [
  { name: 'mains', filter: { family, order, response: 'highpass', cornerHz }, gainDb: 0, delayMs: 0, invert: false },
  { name: 'sub', filter: { family, order, response: 'lowpass', cornerHz }, gainDb: 0, delayMs: 0, invert: invertSub },
];
const at = (paths: PathSpec[], fHz: number) => blendResponse({ temperatureC: 20, frequencyHz: [fHz], paths });
const maxAbs = (a: Float64Array) => a.reduce((m, v) => Math.max(m, Math.abs(v)), 0);

describe('blendResponse — crossover sums (published: Linkwitz 1976, Self 2011)', () => {
  it('LR4 same polarity sums flat within 1e-9 dB; inverted is a deep null at the corner', () => {
    expect(maxAbs(blendResponse({ temperatureC: 20, frequencyHz: grid, paths: pair('linkwitz-riley', 4, false) }).sum.magnitudeDb)).toBeLessThan(1e-9);
    expect(at(pair('linkwitz-riley', 4, true), 80).sum.magnitudeDb[0]).toBeLessThan(-100);
  });
  it('LR8 the same', () => {
    expect(maxAbs(blendResponse({ temperatureC: 20, frequencyHz: grid, paths: pair('linkwitz-riley', 8, false) }).sum.magnitudeDb)).toBeLessThan(1e-9);
    expect(at(pair('linkwitz-riley', 8, true), 80).sum.magnitudeDb[0]).toBeLessThan(-100);
  });
  it('LR2 sums flat only with one path inverted; its all-pass group delay is 2/(2π·fc) at low frequency', () => {
    const inverted = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: pair('linkwitz-riley', 2, true) });
    expect(maxAbs(inverted.sum.magnitudeDb)).toBeLessThan(1e-9);
    expect(at(pair('linkwitz-riley', 2, false), 80).sum.magnitudeDb[0]).toBeLessThan(-100);
    assertInDelta(at(pair('linkwitz-riley', 2, true), 0.01).sum.groupDelayMs[0] as number, 2000 / (2 * Math.PI * 80), 1e-6);
  });
  it('BW2: same polarity → null at the corner; inverted → +3.01 dB', () => {
    expect(at(pair('butterworth', 2, false), 80).sum.magnitudeDb[0]).toBeLessThan(-100);
    assertInDelta(at(pair('butterworth', 2, true), 80).sum.magnitudeDb[0] as number, 3.0103, 1e-4);
  });
  it('BW3 sums flat with either polarity, outputs 90° apart (power-complementary)', () => {
    for (const inv of [false, true]) expect(maxAbs(blendResponse({ temperatureC: 20, frequencyHz: grid, paths: pair('butterworth', 3, inv) }).sum.magnitudeDb)).toBeLessThan(1e-9);
    const r = at(pair('butterworth', 3, false), 80);
    assertInDelta(Math.abs(angleDiffDeg(r.paths[0]!.phaseDeg[0] as number, r.paths[1]!.phaseDeg[0] as number)), 90, 1e-9);
  });
  it('BW4: same polarity → +3.01 dB at the corner; inverted → null', () => {
    assertInDelta(at(pair('butterworth', 4, false), 80).sum.magnitudeDb[0] as number, 3.0103, 1e-4);
    expect(at(pair('butterworth', 4, true), 80).sum.magnitudeDb[0]).toBeLessThan(-100);
  });
  it('BW1 sums flat; the outputs are 90° apart at the corner', () => {
    expect(maxAbs(blendResponse({ temperatureC: 20, frequencyHz: grid, paths: pair('butterworth', 1, false) }).sum.magnitudeDb)).toBeLessThan(1e-9);
    const r = at(pair('butterworth', 1, false), 80);
    assertInDelta(Math.abs(angleDiffDeg(r.paths[0]!.phaseDeg[0] as number, r.paths[1]!.phaseDeg[0] as number)), 90, 1e-9);
  });
  it('LR4 sum group delay at low frequency → 2·√2/(2π·fc) = 5.627 ms at 80 Hz (scipy: 5.628 ms at 1 Hz)', () => {
    assertInDelta(at(pair('linkwitz-riley', 4, false), 0.001).sum.groupDelayMs[0] as number, 5.627, 0.0005);
    assertInDelta(at(pair('linkwitz-riley', 4, false), 1).sum.groupDelayMs[0] as number, 5.628, 0.0005);
  });
  it('phase is wrapped to (−180, 180]', () => {
    const r = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [{ ...pair('butterworth', 2, true)[1]!, delayMs: 7 }] });
    for (const p of r.sum.phaseDeg) expect(p > -180 && p <= 180).toBe(true);
  });
});

interface Fixture {
  source: string;
  frequencyHz: number[];
  systems: { temperatureC: number; paths: PathSpec[]; sum: { magnitudeDb: number[]; phaseDeg: number[]; groupDelayMs: number[] } }[];
}
const fixture = JSON.parse(readFileSync(new URL('../fixtures/two-way-systems.json', import.meta.url), 'utf8')) as Fixture;

describe(`blendResponse against scipy.signal fixtures (reference library: ${fixture.source}, scripts/reference/two-way-fixtures.py)`, () => {
  it('holds at least 50 systems covering every family and order, gains, delays, distances and both polarities', () => {
    expect(fixture.systems.length).toBeGreaterThanOrEqual(50);
    const kinds = new Set(fixture.systems.flatMap((s) => s.paths.map((p) => `${p.filter.family}${p.filter.order}`)));
    for (let n = 1; n <= 8; n++) expect(kinds.has(`butterworth${n}`)).toBe(true);
    for (const n of [2, 4, 8]) expect(kinds.has(`linkwitz-riley${n}`)).toBe(true);
    expect(fixture.systems.some((s) => s.paths.some((p) => p.invert))).toBe(true);
    expect(fixture.systems.some((s) => s.paths.some((p) => p.distanceM !== undefined))).toBe(true);
  });
  fixture.systems.forEach((system, k) => {
    it(`system ${k}: magnitude within 0.01 dB, phase within 0.1° where the sum is above −40 dB, group delay within 1 %`, () => {
      const r = blendResponse({ temperatureC: system.temperatureC, frequencyHz: fixture.frequencyHz, paths: system.paths });
      let checked = 0;
      fixture.frequencyHz.forEach((fHz, i) => {
        const db = system.sum.magnitudeDb[i] as number;
        if (db <= -40) return;
        checked++;
        assertInDelta(r.sum.magnitudeDb[i] as number, db, 0.01, `dB at ${fHz}`);
        assertInDelta(angleDiffDeg(r.sum.phaseDeg[i] as number, system.sum.phaseDeg[i] as number), 0, 0.1, `phase at ${fHz}`);
        const g = system.sum.groupDelayMs[i] as number;
        assertInDelta(r.sum.groupDelayMs[i] as number, g, Math.max(0.01 * Math.abs(g), 1e-6), `group delay at ${fHz}`);
      });
      expect(checked).toBeGreaterThan(10);
    });
  });
});

const arbPath = (name: string): fc.Arbitrary<PathSpec> =>
  fc.record({
    name: fc.constant(name),
    filter: fc.oneof(
      fc.record({ family: fc.constant<FilterFamily>('butterworth'), order: fc.integer({ min: 1, max: 8 }), response: fc.constantFrom('lowpass' as const, 'highpass' as const, 'none' as const), cornerHz: fc.double({ min: 10, max: 2000, noNaN: true }) }),
      fc.record({ family: fc.constant<FilterFamily>('linkwitz-riley'), order: fc.constantFrom(2, 4, 8), response: fc.constantFrom('lowpass' as const, 'highpass' as const), cornerHz: fc.double({ min: 10, max: 2000, noNaN: true }) }),
    ),
    gainDb: fc.double({ min: -30, max: 30, noNaN: true }),
    delayMs: fc.double({ min: 0, max: 50, noNaN: true }),
    invert: fc.boolean(),
    distanceM: fc.double({ min: 0, max: 30, noNaN: true }),
  });

describe('blendResponse properties (fast-check)', () => {
  it('valid inputs always give finite outputs', () => {
    fc.assert(
      fc.property(fc.array(arbPath('p'), { minLength: 1, maxLength: 4 }), fc.double({ min: -20, max: 45, noNaN: true }), (paths, temperatureC) => {
        const r = blendResponse({ temperatureC, frequencyHz: logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 6 }), paths });
        for (const curves of [r.sum, ...r.paths]) for (const arr of [curves.magnitudeDb, curves.phaseDeg, curves.unwrappedPhaseDeg, curves.groupDelayMs]) for (const v of arr) expect(Number.isFinite(v)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
  it('LR4 and LR8 same-polarity sums are flat within 1e-9 dB for any corner (published: Linkwitz 1976)', () => {
    fc.assert(
      fc.property(fc.constantFrom(4, 8), fc.double({ min: 10, max: 5000, noNaN: true }), (order, cornerHz) => {
        const r = blendResponse({ temperatureC: 20, frequencyHz: logFrequencyGridHz({ startHz: 5, stopHz: 20000, pointsPerOctave: 6 }), paths: pair('linkwitz-riley', order, false, cornerHz) });
        expect(maxAbs(r.sum.magnitudeDb)).toBeLessThan(1e-9);
      }),
    );
  });
  it('a pure delay changes phase by exactly −360·f·τ and leaves magnitude', () => {
    fc.assert(
      fc.property(arbPath('p'), fc.double({ min: 0, max: 30, noNaN: true }), (path, extraMs) => {
        const f = logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 3 });
        const a = blendResponse({ temperatureC: 20, frequencyHz: f, paths: [path] });
        const b = blendResponse({ temperatureC: 20, frequencyHz: f, paths: [{ ...path, delayMs: path.delayMs + extraMs }] });
        f.forEach((fHz, i) => {
          assertInDelta(b.paths[0]!.magnitudeDb[i] as number, a.paths[0]!.magnitudeDb[i] as number, 1e-9);
          const expected = (-360 * fHz * extraMs) / 1000;
          assertInDelta((b.paths[0]!.unwrappedPhaseDeg[i] as number) - (a.paths[0]!.unwrappedPhaseDeg[i] as number), expected, 1e-9 * Math.max(1, Math.abs(expected)));
          // A silent sum reads SILENCE_DB with phase 0 and group delay 0 by definition; the delay shows elsewhere.
          if ((a.sum.magnitudeDb[i] as number) <= SILENCE_DB) return;
          assertInDelta(angleDiffDeg(b.sum.phaseDeg[i] as number, (a.sum.phaseDeg[i] as number) + expected), 0, 1e-6);
          assertInDelta((b.sum.groupDelayMs[i] as number) - (a.sum.groupDelayMs[i] as number), extraMs, 1e-9 * Math.max(1, extraMs));
        });
      }),
    );
  });
  it('a path plus its inverted copy is silent', () => {
    fc.assert(
      fc.property(arbPath('p'), (path) => {
        const r = blendResponse({ temperatureC: 20, frequencyHz: logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 3 }), paths: [path, { ...path, invert: !path.invert }] });
        for (const v of r.sum.magnitudeDb) expect(v).toBeLessThan(-200);
      }),
    );
  });
});

describe('blendResponse guards', () => {
  const ok = pair('butterworth', 2, false);
  it('throws RangeError naming the parameter', () => {
    expect(() => blendResponse({ temperatureC: NaN, frequencyHz: [80], paths: ok })).toThrow(/temperatureC/);
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80, NaN], paths: ok })).toThrow(/frequencyHz\[1\]/);
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [] })).toThrow(/paths/);
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: Array(17).fill(ok[0]) })).toThrow(/at most 16/);
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [{ ...ok[0]!, delayMs: -1 }] })).toThrow(/paths\[0\]\.delayMs/);
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [{ ...ok[0]!, gainDb: Infinity }] })).toThrow(/gainDb/);
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [{ ...ok[0]!, distanceM: -2 }] })).toThrow(/distanceM/);
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [{ ...ok[0]!, filter: { ...ok[0]!.filter, order: 12 } }] })).toThrow(/paths\[0\]\.filter\.order/);
  });
});
