import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { blendGrid, blendResponse, blendSumResponse, isBlendGrid, logFrequencyGridHz, type FilterFamily, type PathSpec } from '@/dsp';
import { angleDiffDeg, assertInDelta } from '../../helpers/assert-in-delta';

// blendSumResponse is the sum of blendResponse computed alone; the reference here is blendResponse itself
// (checked against scipy.signal fixtures and complex.js in blend-response.test.ts).
const arbPath = (name: string): fc.Arbitrary<PathSpec> =>
  fc.record({
    name: fc.constant(name),
    filter: fc.oneof(
      fc.record({ family: fc.constant<FilterFamily>('butterworth'), order: fc.integer({ min: 1, max: 8 }), response: fc.constantFrom('lowpass' as const, 'highpass' as const, 'none' as const), cornerHz: fc.double({ min: 10, max: 2000, noNaN: true }) }),
      fc.record({ family: fc.constant<FilterFamily>('linkwitz-riley'), order: fc.constantFrom(2, 4, 8), response: fc.constantFrom('lowpass' as const, 'highpass' as const), cornerHz: fc.double({ min: 10, max: 2000, noNaN: true }) }),
    ),
    rolloff: fc.constantFrom(
      undefined,
      { kind: 'sealed' as const, cornerHz: 45, q: 0.7 },
      { kind: 'vented' as const, cornerHz: 38 },
      [{ kind: 'vented' as const, cornerHz: 22 }, { kind: 'lowpass' as const, cornerHz: 160, q: 0.8 }],
    ),
    gainDb: fc.double({ min: -30, max: 30, noNaN: true }),
    delayMs: fc.double({ min: 0, max: 50, noNaN: true }),
    invert: fc.boolean(),
    distanceM: fc.double({ min: 0, max: 30, noNaN: true }),
  });

const grid = logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 12 });

describe('blendSumResponse', () => {
  it('gives the same sum as blendResponse (1e-9 dB, 1e-9°, 1e-9 ms) for any paths, with or without a prepared grid', () => {
    const prepared = blendGrid(grid);
    fc.assert(
      fc.property(fc.array(arbPath('p'), { minLength: 1, maxLength: 5 }), fc.double({ min: -20, max: 45, noNaN: true }), (paths, temperatureC) => {
        const all = blendResponse({ temperatureC, frequencyHz: grid, paths }).sum;
        for (const frequencyHz of [grid, prepared]) {
          const { sum } = blendSumResponse({ temperatureC, frequencyHz, paths });
          grid.forEach((_, i) => {
            assertInDelta(sum.magnitudeDb[i] as number, all.magnitudeDb[i] as number, 1e-9);
            assertInDelta(angleDiffDeg(sum.phaseDeg[i] as number, all.phaseDeg[i] as number), 0, 1e-9);
            assertInDelta(sum.unwrappedPhaseDeg[i] as number, all.unwrappedPhaseDeg[i] as number, 1e-9 * Math.max(1, Math.abs(all.unwrappedPhaseDeg[i] as number)));
            assertInDelta(sum.groupDelayMs[i] as number, all.groupDelayMs[i] as number, 1e-9 * Math.max(1, Math.abs(all.groupDelayMs[i] as number)));
          });
        }
      }),
      { numRuns: 150 },
    );
  });
  it('writes into the given curves and returns them; a second call overwrites them', () => {
    const g = blendGrid([40, 80, 160]);
    const into = { magnitudeDb: new Float64Array(3), phaseDeg: new Float64Array(3), unwrappedPhaseDeg: new Float64Array(3), groupDelayMs: new Float64Array(3) };
    const lr4 = (response: 'lowpass' | 'highpass', invert: boolean): PathSpec => ({ name: response, filter: { family: 'linkwitz-riley', order: 4, response, cornerHz: 80 }, gainDb: 0, delayMs: 0, invert });
    const a = blendSumResponse({ temperatureC: 20, frequencyHz: g, paths: [lr4('highpass', false), lr4('lowpass', false)], into });
    expect(a.sum).toBe(into);
    expect(a.frequencyHz).toBe(g.frequencyHz);
    assertInDelta(into.magnitudeDb[1] as number, 0, 1e-9); // LR4 sums flat (Linkwitz 1976)
    blendSumResponse({ temperatureC: 20, frequencyHz: g, paths: [lr4('highpass', false), lr4('lowpass', true)], into });
    expect(into.magnitudeDb[1]).toBeLessThan(-100); // inverted: a null at the corner
  });
  it('a prepared grid is validated once and copied', () => {
    const source = [20, 40];
    const g = blendGrid(source);
    source[0] = 999;
    expect(Array.from(g.frequencyHz)).toEqual([20, 40]);
    assertInDelta(g.omega[1] as number, 2 * Math.PI * 40, 1e-12);
    expect(isBlendGrid(g)).toBe(true);
    expect(isBlendGrid(new Float64Array([1]))).toBe(false);
    expect(() => blendGrid([10, -1])).toThrow(/frequencyHz\[1\]/);
  });
  it('throws RangeError naming the parameter', () => {
    const p: PathSpec = { name: 'p', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false };
    expect(() => blendSumResponse({ temperatureC: 20, frequencyHz: [80], paths: [] })).toThrow(/paths/);
    expect(() => blendSumResponse({ temperatureC: NaN, frequencyHz: [80], paths: [p] })).toThrow(/temperatureC/);
    expect(() => blendSumResponse({ temperatureC: 20, frequencyHz: [80], paths: [{ ...p, delayMs: -1 }] })).toThrow(/paths\[0\]\.delayMs/);
    const short = { magnitudeDb: new Float64Array(1), phaseDeg: new Float64Array(1), unwrappedPhaseDeg: new Float64Array(1), groupDelayMs: new Float64Array(2) };
    expect(() => blendSumResponse({ temperatureC: 20, frequencyHz: [80], paths: [p], into: short })).toThrow(/into\.groupDelayMs/);
  });
});
