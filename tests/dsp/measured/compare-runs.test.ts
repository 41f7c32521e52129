import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz } from '@/dsp';
import { compareRuns } from '@/dsp/measured/compare-runs';
import { assertInDelta } from '../../helpers/assert-in-delta';

// Differences from a reference (common practice: comparing runs of one source as "difference from reference" curves).
// The oracle is built by construction: a run made as reference + d(f) must come back as d(f).

const grid = (startHz: number, stopHz: number, pointsPerOctave: number) => Array.from(logFrequencyGridHz({ startHz, stopHz, pointsPerOctave }));
const curveArb = (length: number) => fc.array(fc.double({ min: -60, max: 30, noNaN: true }), { minLength: length, maxLength: length });
const SMOOTHING = [0, 1, 2, 3, 6, 12, 24, 48];

describe('compareRuns (difference from a reference run; common practice)', () => {
  it('a run made as reference + a tilt a + b·log2(f/100 Hz) comes back as exactly that tilt, no smoothing (property; by construction)', () => {
    const hz = grid(20, 2000, 24);
    fc.assert(
      fc.property(curveArb(hz.length), fc.double({ min: -12, max: 12, noNaN: true }), fc.double({ min: -3, max: 3, noNaN: true }), (ref, a, b) => {
        const tilt = (f: number) => a + b * Math.log2(f / 100);
        const other = hz.map((f, i) => (ref[i] as number) + tilt(f));
        const r = compareRuns({ reference: { frequencyHz: hz, magnitudeDb: ref }, others: [{ frequencyHz: hz, magnitudeDb: other }], smoothingFraction: 0 });
        // Resampling is linear in log-frequency, so a tilt linear in log2(f) is carried exactly between grid points.
        assertInDelta(r.differences[0]!.differenceDb, Array.from(r.frequencyHz, tilt), 1e-9);
      }),
      { numRuns: 100 },
    );
  });

  it('a constant difference stays that constant after any smoothing (property, on a 1/24- and a 1/40-octave grid; smoothing is a power mean)', () => {
    const grids = [grid(10, 20000, 24), grid(15, 4000, 40)];
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -40, max: 20, noNaN: true }), { minLength: 6, maxLength: 6 }),
        fc.double({ min: -20, max: 20, noNaN: true }),
        fc.constantFrom(...SMOOTHING),
        fc.constantFrom(0, 1),
        (shape, c, fraction, g) => {
          // Any shape (a few sines in log-frequency) on the grid, the run c dB away from it.
          const curve = (f: number) => shape.reduce((s, amp, k) => s + (amp / 4) * Math.sin((k + 1) * 3 * Math.log2(f) + k), 0);
          const hz = grids[g]!;
          const r = compareRuns({
            reference: { frequencyHz: hz, magnitudeDb: hz.map(curve) },
            others: [{ frequencyHz: hz, magnitudeDb: hz.map((f) => curve(f) + c) }],
            smoothingFraction: fraction,
          });
          assertInDelta(r.differences[0]!.differenceDb, new Float64Array(r.frequencyHz.length).fill(c), 1e-9);
          expect(r.differences[0]!.levelOffsetDb).toBe(0);
        },
      ),
      { numRuns: 120 },
    );
  });

  it('the grid is the range every run covers; the largest difference and where (worked by hand: a 4 dB triangle peaking at 200 Hz)', () => {
    const refHz = grid(10, 20000, 48);
    const otherHz = grid(25, 1600, 48);
    // Triangle in log-frequency: 0 outside 100–400 Hz, rising to −4 dB at 200 Hz.
    const bump = (f: number) => -4 * Math.max(0, 1 - Math.abs(Math.log2(f / 200)));
    const r = compareRuns({
      reference: { frequencyHz: refHz, magnitudeDb: refHz.map(() => 80) },
      others: [{ frequencyHz: otherHz, magnitudeDb: otherHz.map((f) => 80 + bump(f)) }],
      smoothingFraction: 0,
    });
    expect(r.startHz).toBe(25);
    assertInDelta(r.stopHz, 1600, 1e-9);
    assertInDelta(r.frequencyHz[0] as number, 25, 1e-12);
    assertInDelta(r.frequencyHz[r.frequencyHz.length - 1] as number, 1600, 1e-9);
    const d = r.differences[0]!;
    assertInDelta(d.largestDb, -4, 1e-9);
    assertInDelta(d.largestHz, 200, 1e-9);
    assertInDelta(d.minDb, -4, 1e-9);
    assertInDelta(d.maxDb, 0, 1e-9);
    expect(d.levelOffsetDb).toBe(0);
  });

  it('levels as measured unless a band is given; matching a run c dB away over a band takes c out (by construction)', () => {
    const hz = grid(20, 20000, 24);
    const ref = hz.map((f) => 85 - 10 * Math.log10(1 + (40 / f) ** 4));
    const other = ref.map((v) => v + 7.25);
    const asMeasured = compareRuns({ reference: { frequencyHz: hz, magnitudeDb: ref }, others: [{ frequencyHz: hz, magnitudeDb: other }], smoothingFraction: 3 });
    assertInDelta(asMeasured.differences[0]!.largestDb, 7.25, 1e-9);
    const matched = compareRuns({ reference: { frequencyHz: hz, magnitudeDb: ref }, others: [{ frequencyHz: hz, magnitudeDb: other }], smoothingFraction: 3, matchLevelBandHz: { startHz: 200, stopHz: 2000 } });
    assertInDelta(matched.differences[0]!.levelOffsetDb, -7.25, 1e-9);
    assertInDelta(matched.differences[0]!.differenceDb, new Float64Array(matched.frequencyHz.length).fill(0), 1e-9);
  });

  it('matching over a band where the runs differ by a step (worked by hand): +6.02 dB (power ×4) over the top half of a log-symmetric band offsets by −10·log10(2.5)', () => {
    // 1/1000-octave grid over 100–400 Hz: the band's two octaves each weigh one half, so the mean power is (1 + 4)/2.
    const hz = grid(100, 400, 1000);
    const ref = hz.map(() => 0);
    const step = hz.map((f) => (f > 200 ? 20 * Math.log10(2) : 0));
    const r = compareRuns({ reference: { frequencyHz: hz, magnitudeDb: ref }, others: [{ frequencyHz: hz, magnitudeDb: step }], smoothingFraction: 0, matchLevelBandHz: { startHz: 100, stopHz: 400 } });
    assertInDelta(r.differences[0]!.levelOffsetDb, -10 * Math.log10(2.5), 2e-3);
  });

  it('refuses what it cannot compare, naming the field', () => {
    const hz = grid(20, 2000, 6);
    const run = { frequencyHz: hz, magnitudeDb: hz.map(() => 0) };
    expect(() => compareRuns({ reference: run, others: [], smoothingFraction: 0 })).toThrow(/others must hold/);
    expect(() => compareRuns({ reference: run, others: [run], smoothingFraction: 5.5 })).toThrow(/smoothingFraction/);
    expect(() => compareRuns({ reference: run, others: [run], smoothingFraction: 49 })).toThrow(/smoothingFraction/);
    const narrow = grid(1500, 2500, 24);
    expect(() => compareRuns({ reference: run, others: [{ frequencyHz: narrow, magnitudeDb: narrow.map(() => 0) }], smoothingFraction: 0 })).toThrow(/share .* at least 1 octave/);
    expect(() => compareRuns({ reference: run, others: [{ frequencyHz: [20, 10], magnitudeDb: [0, 0] }], smoothingFraction: 0 })).toThrow(/others\[0\]\.frequencyHz/);
    expect(() => compareRuns({ reference: run, others: [run], smoothingFraction: 0, matchLevelBandHz: { startHz: 200, stopHz: 5000 } })).toThrow(/matchLevelBandHz .* within/);
    expect(() => compareRuns({ reference: run, others: [run], smoothingFraction: 0, matchLevelBandHz: { startHz: 400, stopHz: 200 } })).toThrow(/matchLevelBandHz.stopHz/);
  });
});
