import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { blendResponse, blendSumResponse, logFrequencyGridHz, MAX_PATH_EQ_FILTERS, type EqFilter, type PathSpec } from '@/dsp';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';
import { cookbookCascade } from '../../helpers/cookbook-oracle';

// A path's EQ (the speaker's voicing switches and the processor's EQ) checked against the Audio EQ Cookbook's analog
// prototypes evaluated independently with complex.js (reference library): tests/helpers/cookbook-oracle.ts.

const FREQUENCY_HZ = logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 12 });
// Random EQ may cut up to 6 × 24 dB: up to 1 kHz the low-passed sub stays well above the −300 dB floor of reported levels.
const RANDOM_HZ = logFrequencyGridHz({ startHz: 10, stopHz: 1000, pointsPerOctave: 12 });

const subPath = (eq?: readonly EqFilter[]): PathSpec => ({
  name: 'sub',
  filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 },
  rolloff: [{ kind: 'vented', cornerHz: 22 }, { kind: 'lowpass', cornerHz: 160, q: 0.7 }],
  gainDb: -1.5,
  delayMs: 2.3,
  invert: true,
  distanceM: 3.1,
  ...(eq ? { eq } : {}),
});
const mains: PathSpec = { name: 'L', filter: { family: 'butterworth', order: 2, response: 'highpass', cornerHz: 80 }, rolloff: { kind: 'sealed', cornerHz: 55, q: 0.71 }, gainDb: 0, delayMs: 0, invert: false, distanceM: 3.4 };

/** Checks path 1 with `eq` = path 1 without it × Π cookbook prototypes, in level (dB) and phase (deg). */
function expectPathTimesCookbook(eq: readonly EqFilter[], frequencyHz: Float64Array = FREQUENCY_HZ): void {
  const withEq = blendResponse({ temperatureC: 20, frequencyHz, paths: [mains, subPath(eq)] });
  const without = blendResponse({ temperatureC: 20, frequencyHz, paths: [mains, subPath()] });
  frequencyHz.forEach((fHz, i) => {
    const { levelDb, phaseDeg } = cookbookCascade(eq, fHz);
    assertInDelta((withEq.paths[1]!.magnitudeDb[i] as number) - (without.paths[1]!.magnitudeDb[i] as number), levelDb, 1e-9, `EQ level at ${fHz} Hz`);
    assertInDelta(angleDiffDeg((withEq.paths[1]!.phaseDeg[i] as number) - (without.paths[1]!.phaseDeg[i] as number), phaseDeg), 0, 1e-7, `EQ phase at ${fHz} Hz`);
    // The main channel has no EQ: the same numbers either way.
    expect(withEq.paths[0]!.magnitudeDb[i]).toBe(without.paths[0]!.magnitudeDb[i]);
  });
}

const eqArb: fc.Arbitrary<EqFilter> = fc.oneof(
  fc.record({ kind: fc.constant('peaking' as const), centerHz: fc.double({ min: 15, max: 15000, noNaN: true }), gainDb: fc.double({ min: -24, max: 24, noNaN: true }), q: fc.double({ min: 0.1, max: 20, noNaN: true }) }),
  fc.record({ kind: fc.constantFrom('low-shelf' as const, 'high-shelf' as const), cornerHz: fc.double({ min: 15, max: 15000, noNaN: true }), gainDb: fc.double({ min: -24, max: 24, noNaN: true }), slope: fc.double({ min: 0.1, max: 1, noNaN: true }) }),
  fc.record({ kind: fc.constantFrom('low-shelf' as const, 'high-shelf' as const), cornerHz: fc.double({ min: 15, max: 15000, noNaN: true }), gainDb: fc.double({ min: -24, max: 24, noNaN: true }), q: fc.double({ min: 0.1, max: 20, noNaN: true }) }),
);

describe('PathSpec.eq: the path times the cookbook analog prototypes (complex.js, reference library)', () => {
  it('a treble shelf, a near-wall low shelf (slope 1) and a peaking cut, each alone and together', () => {
    const treble: EqFilter = { kind: 'high-shelf', cornerHz: 3000, gainDb: 2, slope: 1 };
    const wall: EqFilter = { kind: 'low-shelf', cornerHz: 150, gainDb: -3, slope: 1 };
    const cut: EqFilter = { kind: 'peaking', centerHz: 42, gainDb: -6, q: 4 };
    expectPathTimesCookbook([treble]);
    expectPathTimesCookbook([wall]);
    expectPathTimesCookbook([cut]);
    expectPathTimesCookbook([treble, wall, cut]);
  });
  it('any 1–6 EQ filters (fast-check)', () => {
    fc.assert(fc.property(fc.array(eqArb, { minLength: 1, maxLength: 6 }), (eq) => expectPathTimesCookbook(eq, RANDOM_HZ)), { numRuns: 60 });
  });
  it('a shelf reaches gainDb far past its corner and gainDb/2 at it (Audio EQ Cookbook)', () => {
    const r = blendResponse({ temperatureC: 20, frequencyHz: [100, 1000, 20000], paths: [{ ...mains, filter: { ...mains.filter, response: 'none' }, rolloff: { kind: 'none' }, eq: [{ kind: 'high-shelf', cornerHz: 1000, gainDb: 6, slope: 1 }] }] });
    assertInDelta(r.paths[0]!.magnitudeDb[1] as number, 3, 1e-9, 'at the corner');
    assertInDelta(r.paths[0]!.magnitudeDb[2] as number, 6, 0.02, 'far above');
    assertInDelta(r.paths[0]!.magnitudeDb[0] as number, 0, 0.05, 'a decade below');
  });
});

describe('PathSpec.eq absent or empty', () => {
  it('an empty EQ leaves every path and the sum bit-for-bit unchanged', () => {
    const a = blendResponse({ temperatureC: 20, frequencyHz: FREQUENCY_HZ, paths: [mains, subPath()] });
    const b = blendResponse({ temperatureC: 20, frequencyHz: FREQUENCY_HZ, paths: [{ ...mains, eq: [] }, subPath([])] });
    expect(b.paths[1]!.magnitudeDb).toEqual(a.paths[1]!.magnitudeDb);
    expect(b.paths[1]!.unwrappedPhaseDeg).toEqual(a.paths[1]!.unwrappedPhaseDeg);
    expect(b.paths[1]!.groupDelayMs).toEqual(a.paths[1]!.groupDelayMs);
    expect(b.sum).toEqual(a.sum);
    const sa = blendSumResponse({ temperatureC: 20, frequencyHz: FREQUENCY_HZ, paths: [mains, subPath()] });
    const sb = blendSumResponse({ temperatureC: 20, frequencyHz: FREQUENCY_HZ, paths: [mains, subPath([])] });
    expect(sb.sum).toEqual(sa.sum);
  });
});

describe('PathSpec.eq errors name the field', () => {
  it('a bad filter is a RangeError naming paths[k].eq[i]', () => {
    const bad = subPath([{ kind: 'low-shelf', cornerHz: 150, gainDb: -3, slope: 1 }, { kind: 'peaking', centerHz: 40, gainDb: -3, q: 0 }]);
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [mains, bad] })).toThrow(/^paths\[1\]\.eq\[1\]\.q/);
  });
  it(`more than ${MAX_PATH_EQ_FILTERS} filters are refused`, () => {
    const many = Array.from({ length: MAX_PATH_EQ_FILTERS + 1 }, (): EqFilter => ({ kind: 'peaking', centerHz: 50, gainDb: -1, q: 2 }));
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [mains, subPath(many)] })).toThrow(RangeError);
    expect(() => blendResponse({ temperatureC: 20, frequencyHz: [80], paths: [mains, subPath(many.slice(1))] })).not.toThrow();
  });
});
