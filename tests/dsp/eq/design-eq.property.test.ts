/**
 * Properties of designEq over random responses (fast-check): sums of random resonances and hollows, a random smooth
 * tilt, random deep narrow notches (cookbook peaking filters of −15…−30 dB), random options. The judge is independent of
 * the designer: the EQ's level from the cookbook formula evaluated with complex.js and the residual from its definition
 * (eq-oracle.ts); the nulls and the level offset are the answer's own (they define what it promises).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { designEq, logFrequencyGridHz, type EqTarget } from '@/dsp';
import { bandwidthOctaves, cascadeDb, residualOf } from './eq-oracle';

/** The house curve's level, from the cookbook low shelf's analog prototype with S = 1 (see eq-target.test.ts). */
function shelfDb(riseDb: number, belowHz: number, fHz: number): number {
  const a = Math.pow(10, riseDb / 40);
  const x = fHz / belowHz;
  const k = Math.sqrt(a) * Math.SQRT2;
  return 20 * Math.log10(Math.hypot(a * (a - x * x), a * k * x) / Math.hypot(1 - a * x * x, k * x));
}

/** A number from min to max in steps of `step` (fast-check's doubles favour extremes such as 1e-300; these spread evenly). */
const stepped = (min: number, max: number, step: number) => fc.integer({ min: Math.round(min / step), max: Math.round(max / step) }).map((k) => k * step);

const responseArb = fc.record({
  pointsPerOctave: fc.constantFrom(24, 48, 96),
  offsetDb: stepped(-60, 60, 0.1),
  tiltDbPerOctave: stepped(-4, 4, 0.1),
  bumps: fc.array(fc.record({ hz: stepped(18, 140, 0.1), db: stepped(-12, 12, 0.1), octaves: stepped(0.04, 0.6, 0.01) }), { maxLength: 6 }),
  notches: fc.array(fc.record({ centerHz: stepped(22, 115, 0.1), gainDb: stepped(-30, -15, 0.1), q: stepped(5, 15, 0.1) }), { maxLength: 2 }),
});

const optionsArb = fc.record({
  maxFilters: fc.integer({ min: 1, max: 10 }),
  maxBoostDb: stepped(0, 6, 0.01),
  maxCutDb: stepped(2, 20, 0.01),
  q: fc.record({ min: stepped(0.3, 1, 0.001), max: stepped(2, 15, 0.001) }),
  sampleRateHz: fc.constantFrom(44100, 48000, 96000),
  target: fc.oneof(fc.constant<EqTarget>({ kind: 'flat' }), fc.record({ kind: fc.constant('house' as const), riseDb: stepped(0, 10, 0.1), belowHz: stepped(30, 100, 0.1) })),
});

type Response = typeof responseArb extends fc.Arbitrary<infer T> ? T : never;

function makeResponse(r: Response): { grid: Float64Array; input: number[] } {
  const grid = logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: r.pointsPerOctave });
  const notches = cascadeDb(r.notches, 48000, grid);
  const input = Array.from(grid, (f, i) => r.offsetDb + r.tiltDbPerOctave * Math.log2(f / 50) + r.bumps.reduce((s, b) => s + b.db * Math.exp(-0.5 * (Math.log2(f / b.hz) / b.octaves) ** 2), 0) + notches[i]!);
  return { grid, input };
}

const onStep = (v: number, step: number) => Math.abs(v / step - Math.round(v / step)) < 1e-9;

describe('designEq over random responses (fast-check)', () => {
  it('keeps its limits, never boosts into a reported null, and never makes the residual worse (recomputed by the oracle)', () => {
    fc.assert(
      fc.property(responseArb, optionsArb, (r, o) => {
        const { grid, input } = makeResponse(r);
        const d = designEq({ frequencyHz: grid, magnitudeDb: input, ...o });
        const what = JSON.stringify({ r, o, filters: d.filters, nulls: d.nulls.map((n) => [n.lowHz, n.highHz]) });
        expect(d.filters.length, what).toBeLessThanOrEqual(o.maxFilters);
        for (const f of d.filters) {
          expect(f.gainDb, what).toBeLessThanOrEqual(o.maxBoostDb);
          expect(f.gainDb, what).toBeGreaterThanOrEqual(-o.maxCutDb);
          expect(Math.abs(f.gainDb), what).toBeGreaterThanOrEqual(0.5);
          expect(f.q, what).toBeGreaterThanOrEqual(o.q.min);
          expect(f.q, what).toBeLessThanOrEqual(o.q.max);
          expect(f.centerHz, what).toBeGreaterThanOrEqual(20 - 0.05);
          expect(f.centerHz, what).toBeLessThanOrEqual(120 + 0.05);
          expect(onStep(f.centerHz, 0.1) && onStep(f.gainDb, 0.1) && onStep(f.q, 0.01), what).toBe(true);
          if (f.gainDb > 0) {
            // The boost's band, the cookbook's (R. Bristow-Johnson): f0·2^(±BW/2), 1/Q = 2·sinh(ln 2 / 2 · BW).
            const half = Math.pow(2, bandwidthOctaves(f.q) / 2);
            for (const n of d.nulls) {
              expect(f.centerHz / half > n.frequencyHz || f.centerHz * half < n.frequencyHz, `${what}: boost reaches a null`).toBe(true);
              expect(f.centerHz / half > n.highHz || f.centerHz * half < n.lowHz, `${what}: boost reaches a null's extent`).toBe(true);
            }
          }
        }
        d.nulls.forEach((n, i) => {
          expect(n.depthDb, what).toBeGreaterThanOrEqual(8);
          if (i > 0) expect(n.depthDb, what).toBeLessThanOrEqual(d.nulls[i - 1]!.depthDb);
        });
        const target = Array.from(grid, (f) => d.levelOffsetDb + (o.target.kind === 'house' ? shelfDb(o.target.riseDb, o.target.belowHz, f) : 0));
        const eq = cascadeDb(d.filters, o.sampleRateHz, grid);
        const before = residualOf(grid, input, target, d.band, d.nulls);
        const after = residualOf(grid, input.map((v, i) => v + eq[i]!), target, d.band, d.nulls);
        expect(after.rmsDb, what).toBeLessThanOrEqual(before.rmsDb + 1e-9);
        expect(Math.abs(after.rmsDb - d.residual.after.rmsDb), what).toBeLessThan(1e-6);
        expect(Math.abs(before.rmsDb - d.residual.before.rmsDb), what).toBeLessThan(1e-6);
        if (d.filters.length > 0) expect(after.rmsDb, what).toBeLessThan(before.rmsDb);
      }),
      { numRuns: 80, seed: 1602 },
    );
  });

  it('a flat response with a flat target gives no filters, whatever the level and options', () => {
    fc.assert(
      fc.property(stepped(-100, 100, 0.1), optionsArb, fc.constantFrom(24, 48, 96), (levelDb, o, ppo) => {
        const grid = logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: ppo });
        const d = designEq({ frequencyHz: grid, magnitudeDb: Array.from(grid, () => levelDb), ...o, target: { kind: 'flat' } });
        expect(d.filters).toEqual([]);
        expect(d.residual.after.rmsDb).toBe(0);
      }),
      { numRuns: 40, seed: 1603 },
    );
  });
});
