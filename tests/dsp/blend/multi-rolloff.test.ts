import { describe, expect, it } from 'vitest';
import Complex from 'complex.js';
import { readFileSync } from 'node:fs';
import { alignSubToMains, blendResponse, blendSumResponse, crossoverSweep, logFrequencyGridHz, type SystemModel, rolloffResponse, rolloffSections, type PathSpec, type RolloffSpec } from '@/dsp';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';

interface Fixture {
  source: string;
  frequencyHz: number[];
  systems: { temperatureC: number; paths: PathSpec[]; subMagnitudeDb: number[]; sum: { magnitudeDb: number[]; phaseDeg: number[]; groupDelayMs: number[] } }[];
}
const fixture = JSON.parse(readFileSync(new URL('../fixtures/multi-rolloff-systems.json', import.meta.url), 'utf8')) as Fixture;

describe(`paths with several roll-offs against scipy.signal fixtures (reference library: ${fixture.source}, scripts/reference/multi-rolloff-fixtures.py)`, () => {
  it('every sub carries a low and an upper roll-off', () => {
    expect(fixture.systems.length).toBeGreaterThanOrEqual(20);
    for (const s of fixture.systems) {
      const r = s.paths[1]!.rolloff as RolloffSpec[];
      expect(r.length).toBeGreaterThanOrEqual(2);
      expect(['sealed', 'vented']).toContain(r[0]!.kind);
      expect(r[1]!.kind).toBe('lowpass');
    }
  });
  fixture.systems.forEach((system, k) => {
    it(`system ${k}: sub level within 0.01 dB; sum magnitude 0.01 dB, phase 0.1° where above −40 dB, group delay 1 %`, () => {
      const r = blendResponse({ temperatureC: system.temperatureC, frequencyHz: fixture.frequencyHz, paths: system.paths });
      const alone = blendSumResponse({ temperatureC: system.temperatureC, frequencyHz: fixture.frequencyHz, paths: system.paths });
      let checked = 0;
      fixture.frequencyHz.forEach((fHz, i) => {
        const subDb = system.subMagnitudeDb[i] as number;
        if (subDb > -120) assertInDelta(r.paths[1]!.magnitudeDb[i] as number, subDb, 0.01, `sub dB at ${fHz}`);
        const db = system.sum.magnitudeDb[i] as number;
        if (db <= -40) return;
        checked++;
        assertInDelta(r.sum.magnitudeDb[i] as number, db, 0.01, `dB at ${fHz}`);
        assertInDelta(alone.sum.magnitudeDb[i] as number, db, 0.01, `sum-only dB at ${fHz}`);
        assertInDelta(angleDiffDeg(r.sum.phaseDeg[i] as number, system.sum.phaseDeg[i] as number), 0, 0.1, `phase at ${fHz}`);
        const g = system.sum.groupDelayMs[i] as number;
        assertInDelta(r.sum.groupDelayMs[i] as number, g, Math.max(0.01 * Math.abs(g), 1e-6), `group delay at ${fHz}`);
      });
      expect(checked).toBeGreaterThan(10);
    });
  });
});

/** A roll-off's H(s) as a polynomial ratio in s evaluated with complex.js (reference library). */
function rolloffByPolynomial(r: RolloffSpec, fHz: number): Complex {
  const s = new Complex(0, 2 * Math.PI * fHz);
  if (r.kind === 'none') return new Complex(1, 0);
  const w0 = 2 * Math.PI * r.cornerHz;
  if (r.kind === 'vented') {
    // B4 high-pass: s⁴ / Π (s − p_k), Butterworth poles ω0·e^(jπ(2k+3)/8).
    let den = new Complex(1, 0);
    for (let k = 1; k <= 4; k++) den = den.mul(s.sub(new Complex({ abs: w0, arg: (Math.PI * (2 * k + 3)) / 8 })));
    return s.pow(4).div(den);
  }
  const den = s.mul(s).add(s.mul(w0 / r.q)).add(w0 * w0);
  return (r.kind === 'sealed' ? s.mul(s) : new Complex(w0 * w0, 0)).div(den);
}

describe('rolloffResponse / rolloffSections with a list of roll-offs', () => {
  const low: RolloffSpec = { kind: 'vented', cornerHz: 22 };
  const high: RolloffSpec = { kind: 'lowpass', cornerHz: 160, q: 0.8 };
  const grid = logFrequencyGridHz({ startHz: 5, stopHz: 5000, pointsPerOctave: 6 });
  it('a list is the product of its roll-offs (complex.js polynomial product)', () => {
    const r = rolloffResponse({ rolloff: [low, high, { kind: 'sealed', cornerHz: 40, q: 1.1 }], frequencyHz: grid });
    grid.forEach((fHz, i) => {
      const h = rolloffByPolynomial(low, fHz).mul(rolloffByPolynomial(high, fHz)).mul(rolloffByPolynomial({ kind: 'sealed', cornerHz: 40, q: 1.1 }, fHz));
      assertInDelta(r.re[i] as number, h.re, 1e-12 * Math.max(1, h.abs()));
      assertInDelta(r.im[i] as number, h.im, 1e-12 * Math.max(1, h.abs()));
    });
  });
  it('a one-element list and an empty list equal the single roll-off and none', () => {
    expect(rolloffSections([low])).toEqual(rolloffSections(low));
    expect(rolloffSections([])).toEqual([]);
    expect(rolloffSections([low, high]).length).toBe(3);
  });
  it('the sub path in a blend is its filter × both roll-offs', () => {
    const sub: PathSpec = { name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, rolloff: [low, high], gainDb: 0, delayMs: 0, invert: false };
    const withBoth = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [sub] });
    const onlyFilter = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [{ ...sub, rolloff: undefined }] });
    const lowDb = rolloffResponse({ rolloff: low, frequencyHz: grid }).magnitudeDb;
    const highDb = rolloffResponse({ rolloff: high, frequencyHz: grid }).magnitudeDb;
    grid.forEach((_, i) => assertInDelta(withBoth.paths[0]!.magnitudeDb[i] as number, (onlyFilter.paths[0]!.magnitudeDb[i] as number) + (lowDb[i] as number) + (highDb[i] as number), 1e-9));
  });
  it('throws RangeError naming the roll-off at fault', () => {
    expect(() => rolloffSections([low, { kind: 'lowpass', cornerHz: 160, q: 0 }])).toThrow(/rolloff\[1\]\.q/);
    expect(() => rolloffSections([{ kind: 'horn' } as never])).toThrow(/rolloff\[0\]\.kind/);
    expect(() => rolloffSections([low, low, low, low, low])).toThrow(/at most 4/);
    const sub: PathSpec = { name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, rolloff: [low, { kind: 'vented', cornerHz: -1 }], gainDb: 0, delayMs: 0, invert: false };
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [sub] })).toThrow(/paths\[0\]\.rolloff\[1\]\.cornerHz/);
  });
});

describe('crossover sweep and Timing with several roll-offs', () => {
  const subRolloff: RolloffSpec[] = [{ kind: 'sealed', cornerHz: 24, q: 0.7 }, { kind: 'lowpass', cornerHz: 180, q: 0.7 }];
  it('a sub’s low roll-off changes the sweep only through the sub: a roll-off far below the band barely matters', () => {
    const model = (rolloff: SystemModel['subs'][number]['rolloff']): SystemModel => ({
      temperatureC: 20,
      crossoverHz: 80,
      mainsHighpass: { family: 'linkwitz-riley', order: 4 },
      subLowpass: { family: 'linkwitz-riley', order: 4 },
      mains: { name: 'L', distanceM: 3, delayMs: 0, gainDb: 0, invert: false, rolloff: [{ kind: 'sealed', cornerHz: 60, q: 0.707 }] },
      subs: [{ name: 'sub', distanceM: 3, delayMs: 0, gainDb: 0, invert: false, rolloff }],
    });
    const sweep = (rolloff: SystemModel['subs'][number]['rolloff']) => crossoverSweep({ model: model(rolloff), pairings: [{ mainsFilter: { family: 'linkwitz-riley', order: 4 }, subFilter: { family: 'linkwitz-riley', order: 4 } }], candidatesHz: [80, 120] });
    const both = sweep(subRolloff);
    const upperOnly = sweep(subRolloff[1]!);
    const tooHigh = sweep([{ kind: 'sealed', cornerHz: 70, q: 0.7 }, subRolloff[1]!]);
    const at = (rows: typeof both.rows, hz: number) => rows.find((r) => r.crossoverHz === hz && !r.present)!;
    // A 24 Hz sealed sub shifts the flatness band around 120 Hz by little; a 70 Hz one by much more.
    expect(Math.abs(at(both.rows, 120).flatnessDb - at(upperOnly.rows, 120).flatnessDb)).toBeLessThan(0.5);
    expect(at(both.rows, 120).flatnessDb).not.toBe(at(upperOnly.rows, 120).flatnessDb);
    expect(Math.abs(at(tooHigh.rows, 80).flatnessDb - at(upperOnly.rows, 80).flatnessDb)).toBeGreaterThan(0.5);
  });
  it('Timing accepts a sub path with two roll-offs and its recommendation is never less flat than the current setting', () => {
    const mains: PathSpec = { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, rolloff: [{ kind: 'sealed', cornerHz: 55, q: 0.7 }], gainDb: 0, delayMs: 0, invert: false, distanceM: 3 };
    const sub: PathSpec = { name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, rolloff: subRolloff, gainDb: 0, delayMs: 0, invert: false, distanceM: 4.2 };
    const r = alignSubToMains({ temperatureC: 20, crossoverHz: 80, mains, sub });
    expect(Number.isFinite(r.flatnessDb)).toBe(true);
    expect(r.flatnessDb).toBeLessThanOrEqual(r.flatnessBeforeDb + 1e-9);
  });
});
