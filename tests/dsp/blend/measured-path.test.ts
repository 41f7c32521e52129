import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { blendResponse, logFrequencyGridHz, pathResponse, type MeasuredResponse, type PathSpec } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

// A path run on a measurement (PathSpec.measured) must sound exactly like the modelled path whose speaker part
// (roll-off, voicing EQ, air path) was "measured": the oracle is the analog model itself, evaluated section by section
// (checked against scipy.signal in tests/dsp/filters and tests/dsp/blend; reference library), read through the
// measured curve's points instead.

const lr4Low = { family: 'linkwitz-riley' as const, order: 4, response: 'lowpass' as const, cornerHz: 80 };
const lr4High = { ...lr4Low, response: 'highpass' as const };
const none = { family: 'butterworth' as const, order: 1, response: 'none' as const, cornerHz: 80 };

/** The speaker part of a path on a dense log grid, as a measurement would hold it (wrapped phase, dB). */
function measuredSpeaker(path: PathSpec, temperatureC: number, pointsPerOctave = 96): MeasuredResponse {
  const grid = logFrequencyGridHz({ startHz: 2, stopHz: 4000, pointsPerOctave });
  const speaker: PathSpec = { name: 'speaker', filter: none, ...(path.rolloff ? { rolloff: path.rolloff } : {}), ...(path.eq ? { eq: path.eq } : {}), gainDb: 0, delayMs: 0, invert: false, distanceM: path.distanceM ?? 0 };
  const r = pathResponse(speaker, grid, temperatureC);
  return { frequencyHz: grid, magnitudeDb: r.magnitudeDb, phaseDeg: Array.from(r.re, (re, i) => (Math.atan2(r.im[i] as number, re) * 180) / Math.PI) };
}

/** The same path with its speaker part replaced by the measurement of it. */
function onMeasured(path: PathSpec, temperatureC: number): PathSpec {
  return { name: path.name, filter: path.filter, gainDb: path.gainDb, delayMs: path.delayMs, invert: path.invert, measured: measuredSpeaker(path, temperatureC) };
}

describe('a path run on a measured response', () => {
  it('a flat, zero-phase measurement changes nothing, bit for bit', () => {
    const grid = logFrequencyGridHz({ startHz: 10, stopHz: 1000, pointsPerOctave: 24 });
    const path: PathSpec = { name: 'sub', filter: lr4Low, gainDb: -2, delayMs: 3, invert: true, distanceM: 2 };
    const flat: MeasuredResponse = { frequencyHz: [1, 100_000], magnitudeDb: [0, 0], phaseDeg: [0, 0] };
    const a = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [path] });
    const b = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [{ ...path, measured: flat }] });
    expect(Array.from(b.paths[0]!.magnitudeDb)).toEqual(Array.from(a.paths[0]!.magnitudeDb));
    expect(Array.from(b.paths[0]!.unwrappedPhaseDeg)).toEqual(Array.from(a.paths[0]!.unwrappedPhaseDeg));
  });

  it('a measured pure delay of 7 ms adds 7 ms of group delay and −360·f·τ of phase (definition of delay)', () => {
    const f = logFrequencyGridHz({ startHz: 10, stopHz: 4000, pointsPerOctave: 48 });
    const delayed: MeasuredResponse = { frequencyHz: f, magnitudeDb: f.map(() => 0), phaseDeg: f.map((x) => -360 * x * 0.007) };
    const grid = logFrequencyGridHz({ startHz: 20, stopHz: 2000, pointsPerOctave: 12 });
    const path: PathSpec = { name: 'sub', filter: lr4Low, gainDb: 0, delayMs: 0, invert: false };
    const a = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [path] }).paths[0]!;
    const b = blendResponse({ temperatureC: 20, frequencyHz: grid, paths: [{ ...path, measured: delayed }] }).paths[0]!;
    for (let i = 0; i < grid.length; i++) {
      assertInDelta(b.groupDelayMs[i] as number, (a.groupDelayMs[i] as number) + 7, 1e-6);
      assertInDelta(b.magnitudeDb[i] as number, a.magnitudeDb[i] as number, 1e-9);
      const diff = (b.unwrappedPhaseDeg[i] as number) - (a.unwrappedPhaseDeg[i] as number) + 360 * (grid[i] as number) * 0.007;
      assertInDelta(diff - 360 * Math.round(diff / 360), 0, 1e-6);
    }
  });

  it('any path on the measurement of its own speaker part sums like the model: 0.01 dB, 0.5°, group delay within 0.05 ms where it changes slowly (interpolation between 96-per-octave points)', () => {
    const rolloff = fc.oneof(
      fc.constant(undefined),
      fc.record({ kind: fc.constant('sealed' as const), cornerHz: fc.double({ min: 20, max: 90, noNaN: true }), q: fc.double({ min: 0.5, max: 1.2, noNaN: true }) }),
      fc.record({ kind: fc.constant('vented' as const), cornerHz: fc.double({ min: 20, max: 70, noNaN: true }) }),
    );
    fc.assert(
      fc.property(
        rolloff,
        fc.double({ min: 0.5, max: 8, noNaN: true }),
        fc.double({ min: 0, max: 15, noNaN: true }),
        fc.double({ min: 0.5, max: 8, noNaN: true }),
        fc.boolean(),
        fc.double({ min: 40, max: 150, noNaN: true }),
        (mainsRolloff, mainsM, subDelayMs, subM, invert, cornerHz) => {
          const temperatureC = 22;
          const mains: PathSpec = { name: 'L', filter: { ...lr4High, cornerHz }, ...(mainsRolloff ? { rolloff: mainsRolloff } : {}), gainDb: 0, delayMs: 0, invert: false, distanceM: mainsM };
          const sub: PathSpec = { name: 'Sub', filter: { ...lr4Low, cornerHz }, rolloff: [{ kind: 'sealed', cornerHz: 25, q: 0.7 }], eq: [{ kind: 'peaking', centerHz: 50, gainDb: -4, q: 3 }], gainDb: 1, delayMs: subDelayMs, invert, distanceM: subM };
          const grid = logFrequencyGridHz({ startHz: 10, stopHz: 1000, pointsPerOctave: 48 });
          const model = blendResponse({ temperatureC, frequencyHz: grid, paths: [mains, sub] });
          const measured = blendResponse({ temperatureC, frequencyHz: grid, paths: [onMeasured(mains, temperatureC), onMeasured(sub, temperatureC)] });
          for (let i = 0; i < grid.length; i++) {
            if ((model.sum.magnitudeDb[i] as number) < -30) continue; // deep in a cancellation a hundredth of a dB means nothing
            assertInDelta(measured.sum.magnitudeDb[i] as number, model.sum.magnitudeDb[i] as number, 0.01);
            const d = (measured.sum.phaseDeg[i] as number) - (model.sum.phaseDeg[i] as number);
            assertInDelta(d - 360 * Math.round(d / 360), 0, 0.5);
            // The group delay is a derivative: between two points the measurement reads as a constant delay, so it may be off
            // by about the change of group delay across one point spacing (large only next to the Q 3 EQ filter).
            for (let k = 0; k < 2; k++) {
              if ((model.paths[k]!.magnitudeDb[i] as number) < -30) continue;
              const gd = model.paths[k]!.groupDelayMs;
              const local = Math.abs((gd[Math.min(i + 1, grid.length - 1)] as number) - (gd[Math.max(i - 1, 0)] as number));
              assertInDelta(measured.paths[k]!.groupDelayMs[i] as number, gd[i] as number, 0.05 + local);
            }
          }
        },
      ),
      { numRuns: 40, seed: 1702 },
    );
  });

  it('refuses a measurement it cannot read, naming the field', () => {
    const path: PathSpec = { name: 'sub', filter: lr4Low, gainDb: 0, delayMs: 0, invert: false };
    const run = (measured: MeasuredResponse) => () => blendResponse({ temperatureC: 20, frequencyHz: [50], paths: [{ ...path, measured }] });
    expect(run({ frequencyHz: [20, 10], magnitudeDb: [0, 0], phaseDeg: [0, 0] })).toThrow(/measured\.frequencyHz/);
    expect(run({ frequencyHz: [10, 20], magnitudeDb: [0, Number.NaN], phaseDeg: [0, 0] })).toThrow(/measured\.magnitudeDb/);
    expect(run({ frequencyHz: [10, 20], magnitudeDb: [0, 0], phaseDeg: [0] })).toThrow(/measured\.phaseDeg/);
  });
});
