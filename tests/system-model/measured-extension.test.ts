import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/errors';
import { computeMeasuredExtension, type ExtensionCurvePoints } from '@/lib/system-model/measured-extension';
import { extensionRequestSchema } from '@/lib/validations/measured-extension';

/**
 * A closed-box (sealed) speaker is a second-order high-pass of corner fc and total Q:
 * |H(f)|² = x⁴ / ((1 − x²)² + x²/Q²), x = f/fc (R. H. Small, "Closed-Box Loudspeaker Systems", J. Audio Eng. Soc. 20, 1972).
 */
const sealedPower = (f: number, fcHz: number, q: number) => {
  const x = f / fcHz;
  return x ** 4 / ((1 - x * x) ** 2 + (x * x) / (q * q));
};
/** Small 1972: the −3 dB (half-power) frequency of a closed box, f3/fc = √((1/Q² − 2 + √((1/Q² − 2)² + 4)) / 2). */
const smallF3Hz = (fcHz: number, q: number) => {
  const a = 1 / (q * q) - 2;
  return fcHz * Math.sqrt((a + Math.sqrt(a * a + 4)) / 2);
};
const grid = (startHz: number, stopHz: number, perOctave: number) => Array.from({ length: Math.floor(Math.log2(stopHz / startHz) * perOctave) + 1 }, (_, i) => startHz * 2 ** (i / perOctave));
const sealedCurve = (fcHz: number, q: number, hz: number[], offsetDb = 0): ExtensionCurvePoints => ({ frequencyHz: hz, magnitudeDb: hz.map((f) => offsetDb + 10 * Math.log10(sealedPower(f, fcHz, q))) });

/**
 * An oracle independent of the code: the band's mean power by the trapezoid rule over ln f (20 000 steps, the analytic
 * curve), then the frequency below the band where the analytic curve is 3 dB below it, by bisection.
 */
function analyticPointHz(fcHz: number, q: number, dropDb: number, band = { startHz: 200, stopHz: 2000 }): number {
  const steps = 20_000;
  const a = Math.log(band.startHz);
  const h = (Math.log(band.stopHz) - a) / steps;
  let sum = 0;
  for (let i = 0; i <= steps; i++) sum += (i === 0 || i === steps ? 0.5 : 1) * sealedPower(Math.exp(a + i * h), fcHz, q);
  const target = ((sum * h) / (steps * h)) * 10 ** (-dropDb / 10);
  let lo = 1;
  let hi = band.startHz;
  for (let i = 0; i < 100; i++) {
    const mid = Math.sqrt(lo * hi);
    if (sealedPower(mid, fcHz, q) < target) lo = mid;
    else hi = mid;
  }
  return Math.sqrt(lo * hi);
}

const request = (extra: Record<string, unknown> = {}) => extensionRequestSchema.parse({ curves: [{ frequencyHz: [1, 2, 3, 4, 5, 6, 7, 8], magnitudeDb: [0, 0, 0, 0, 0, 0, 0, 0] }], ...extra });
const HZ24 = grid(10, 20000, 24);

describe('computeMeasuredExtension', () => {
  it.each([
    [50, Math.SQRT1_2, true],
    [40, 1.0, true],
    // Q 0.5 rolls off so slowly that the 200 Hz–2 kHz mean sits below the passband: only the mean-relative oracle applies.
    [60, 0.5, false],
  ])('a sealed box of fc %d Hz, Q %d: the −3 dB point within 0.5 Hz of the analytic one (Small 1972)', (fcHz, q, passbandIsMean) => {
    const answer = computeMeasuredExtension(request(), [sealedCurve(fcHz, q, HZ24)]);
    expect(Math.abs(answer.pointsHz.minus3! - analyticPointHz(fcHz, q, 3))).toBeLessThan(0.5);
    // Small's closed form is relative to the passband (0 dB); for these two the band's mean is within 0.02 dB of it.
    if (passbandIsMean) expect(Math.abs(answer.pointsHz.minus3! - smallF3Hz(fcHz, q))).toBeLessThan(0.5);
    expect(Math.abs(answer.pointsHz.minus6! - analyticPointHz(fcHz, q, 6))).toBeLessThan(0.5);
    expect(Math.abs(answer.pointsHz.minus10! - analyticPointHz(fcHz, q, 10))).toBeLessThan(0.5);
    expect(answer).toMatchObject({ averagedFrom: 1, resampled: false, lowestMeasuredHz: 10, band: { startHz: 200, stopHz: 2000 } });
  });

  it('identical seats average to each seat: the same points, mean and curve (spatial average; common practice)', () => {
    const seat = sealedCurve(45, 0.8, HZ24, 3.5);
    const one = computeMeasuredExtension(request(), [seat]);
    const three = computeMeasuredExtension(request(), [seat, seat, seat]);
    expect(three.averagedFrom).toBe(3);
    expect(three.pointsHz).toEqual(one.pointsHz);
    expect(three.meanLevelDb).toBeCloseTo(one.meanLevelDb, 9);
    three.curve.magnitudeDb.forEach((db, i) => expect(db).toBeCloseTo(seat.magnitudeDb[i]!, 3));
  });

  it('two seats 10 dB apart average in power: the mean level is 10·log10((1 + 0.1)/2) above the louder seat’s own (common practice)', () => {
    const loud = computeMeasuredExtension(request(), [sealedCurve(50, Math.SQRT1_2, HZ24)]);
    const both = computeMeasuredExtension(request(), [sealedCurve(50, Math.SQRT1_2, HZ24), sealedCurve(50, Math.SQRT1_2, HZ24, -10)]);
    expect(both.meanLevelDb - loud.meanLevelDb).toBeCloseTo(10 * Math.log10(1.1 / 2), 2);
    // The same shape at both seats: the points do not move.
    expect(Math.abs(both.pointsHz.minus3! - loud.pointsHz.minus3!)).toBeLessThan(0.05);
  });

  it('curves on different grids are resampled onto their common range, and still find the analytic −3 dB point', () => {
    const answer = computeMeasuredExtension(request(), [sealedCurve(50, Math.SQRT1_2, HZ24), sealedCurve(50, Math.SQRT1_2, grid(15, 5000, 12))]);
    expect(answer.resampled).toBe(true);
    expect(answer.lowestMeasuredHz).toBe(15);
    expect(Math.abs(answer.pointsHz.minus3! - analyticPointHz(50, Math.SQRT1_2, 3))).toBeLessThan(0.5);
  });

  it('judges a crossover against the −3 dB point: log2 of the ratio, at least half an octave to be clear (common practice)', () => {
    const seat = sealedCurve(50, Math.SQRT1_2, HZ24);
    const f3 = analyticPointHz(50, Math.SQRT1_2, 3);
    const at80 = computeMeasuredExtension(request({ crossoverHz: 80 }), [seat]).crossover!;
    expect(at80.verdict).toBe('clear');
    expect(at80.octavesAboveMinus3!).toBeCloseTo(Math.log2(80 / f3), 2);
    expect(at80.summary).toMatch(/^A crossover at 80 Hz sits 0\.6\d octaves above the in-room −3 dB point/);
    const at60 = computeMeasuredExtension(request({ crossoverHz: 60 }), [seat]).crossover!;
    expect(at60.verdict).toBe('too-close');
    expect(at60.summary).toContain(`at least ${(Math.round(f3 * Math.SQRT2 * 10) / 10).toFixed(1)} Hz`);
    // A crossover under the −3 dB point is said to sit below it (log2(30 / f3) < 0), never "−1.22 octaves above".
    const at30 = computeMeasuredExtension(request({ crossoverHz: 30 }), [seat]).crossover!;
    expect(at30.summary).toContain(`sits ${Math.abs(Math.log2(30 / f3)).toFixed(2)} octaves below the in-room −3 dB point`);
    expect(computeMeasuredExtension(request(), [seat]).crossover).toBeUndefined();
  });

  it('a curve that never falls 3 dB within its data gives null points, and a crossover near its lowest frequency is "unknown"', () => {
    const answer = computeMeasuredExtension(request({ crossoverHz: 40 }), [sealedCurve(20, Math.SQRT1_2, grid(30, 5000, 24))]);
    expect(answer.pointsHz).toEqual({ minus3: null, minus6: null, minus10: null });
    expect(answer.crossover!.verdict).toBe('unknown');
  });

  it('refuses a band outside the data (400 naming band) and curves sharing under an octave (400 naming curves)', () => {
    const refusal = (fn: () => unknown) => {
      try {
        fn();
      } catch (e) {
        return e;
      }
      return null;
    };
    const band = refusal(() => computeMeasuredExtension(request({ band: { startHz: 200, stopHz: 8000 } }), [sealedCurve(50, 0.7, grid(20, 5000, 24))]));
    expect(band).toBeInstanceOf(AppError);
    expect((band as AppError).status).toBe(400);
    expect((band as AppError).issues.map((i) => i.path)).toEqual(['band']);
    const apart = refusal(() => computeMeasuredExtension(request(), [sealedCurve(50, 0.7, grid(20, 300, 24)), sealedCurve(50, 0.7, grid(200, 5000, 24))]));
    expect((apart as AppError).issues.map((i) => i.path)).toEqual(['curves']);
  });
});
