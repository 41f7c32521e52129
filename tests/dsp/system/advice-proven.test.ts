/**
 * Every piece of advice Seamline gives is proven by applying it: over random Systems (1–4 subs, every slope family and
 * order, roll-offs, distances, temperatures, measured distances), the Crossover sweep's top row (and every row ranked
 * above the present setting), Timing's per-sub advice and the all-subs advice are written into the document exactly
 * as the editor's Apply buttons do, and the blend is recomputed from the applied document. The flatness measure is
 * never worse and the −3 dB point never rises by more than a third of an octave (common practice; the rules are dsp/system/advice-rules.ts).
 *
 * The oracle is independent of the advice code: the blend of the applied document is evaluated through the editor's
 * own route (blendRequestFromDocument → blendResponse) and the measure is computed here from its definition.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { blendResponse, FLATNESS_DEFINITION } from '@/dsp';
import { juniperLaneDocument, lindenStreetDocument } from '@/lib/demo/systems';
import { blendRequestFromDocument } from '@/lib/system-model/blend';
import { applyCrossoverSweepToDocument, computeCrossoverSweep, crossoverSweepRequestFromDocument } from '@/lib/system-model/crossover-sweep';
import { applyTimingToDocument, computeTiming, timingRequestFromDocument } from '@/lib/system-model/timing';
import { crossoverSweepRequestSchema, timingRequestSchema } from '@/lib/validations/compute-blend';
import { systemDocumentSchema, type Slope, type SpeakerProfile, type SystemDocument } from '@/lib/validations/system';

/** Flatness (largest |sum − sum at 4·fc| over fc/2 … 2·fc at 48 points per octave) and the −3 dB point, from the definition. */
function blendOf(doc: SystemDocument): { flatnessDb: number; minus3Hz: number } {
  const fcHz = doc.bassManagement.crossoverHz;
  const ppo = FLATNESS_DEFINITION.pointsPerOctave;
  const f: number[] = [];
  for (let k = Math.floor(ppo * Math.log2(5 / fcHz)); k <= 2 * ppo; k++) f.push(fcHz * 2 ** (k / ppo));
  const req = blendRequestFromDocument(doc)!;
  const mag = blendResponse({ temperatureC: req.temperatureC, frequencyHz: f, paths: req.paths }).sum.magnitudeDb;
  const ref = mag[mag.length - 1] as number;
  let flatnessDb = 0;
  f.forEach((hz, i) => {
    if (hz >= fcHz / 2 - 1e-9 && hz <= 2 * fcHz + 1e-9) flatnessDb = Math.max(flatnessDb, Math.abs((mag[i] as number) - ref));
  });
  let minus3Hz = f[0] as number;
  for (let i = 0; i < f.length; i++) {
    if ((mag[i] as number) - ref >= -3) {
      minus3Hz = f[i] as number;
      break;
    }
  }
  return { flatnessDb, minus3Hz };
}

/** The rule every applied piece of advice must keep, with the figures in the message when it does not. */
function expectNotWorse(before: SystemDocument, after: SystemDocument, what: string) {
  systemDocumentSchema.parse(after);
  const a = blendOf(before);
  const b = blendOf(after);
  const context = `${what}: flatness ${a.flatnessDb.toFixed(3)} → ${b.flatnessDb.toFixed(3)} dB, −3 dB point ${a.minus3Hz.toFixed(1)} → ${b.minus3Hz.toFixed(1)} Hz`;
  expect(b.flatnessDb, context).toBeLessThanOrEqual(a.flatnessDb + 1e-6);
  // One grid step (1/48 octave) of slack: this oracle reads the −3 dB point at grid points, not interpolated.
  expect(Math.log2(b.minus3Hz / a.minus3Hz), context).toBeLessThanOrEqual(1 / 3 + 1 / 48 + 1e-9);
}

const slopeArb: fc.Arbitrary<Slope> = fc.oneof(
  fc.integer({ min: 1, max: 8 }).map((order) => ({ family: 'butterworth' as const, order })),
  fc.constantFrom(2, 4, 8).map((order) => ({ family: 'linkwitz-riley' as const, order })),
);
const hundredths = (min: number, max: number) => fc.integer({ min: Math.round(min * 100), max: Math.round(max * 100) }).map((v) => v / 100);
const mainProfileArb: fc.Arbitrary<SpeakerProfile['lowRolloff']> = fc.oneof(
  fc.constant({ kind: 'none' as const }),
  fc.record({ kind: fc.constant('sealed' as const), cornerHz: fc.integer({ min: 30, max: 110 }), q: fc.constantFrom(0.5, 0.707, 1) }),
  fc.record({ kind: fc.constant('vented' as const), cornerHz: fc.integer({ min: 25, max: 90 }) }),
);
const subArb = fc.record({
  x: fc.double({ min: 0.05, max: 0.95, noNaN: true }),
  y: fc.double({ min: 0.02, max: 0.98, noNaN: true }),
  delayMs: hundredths(0, 8),
  gainDb: fc.constantFrom(-3, 0, 2),
  invert: fc.boolean(),
  measured: fc.option(hundredths(1, 7), { nil: null }),
});

/** A random System: the Juniper Lane room with random crossover, slopes, roll-offs, temperature, L position and 1–4 subs. */
const systemArb = fc
  .record({
    crossoverHz: fc.integer({ min: 40, max: 150 }),
    mainsHighpass: slopeArb,
    subLowpass: slopeArb,
    mainsRolloff: mainProfileArb,
    subLow: fc.oneof(fc.constant({ kind: 'none' as const }), fc.record({ kind: fc.constant('sealed' as const), cornerHz: fc.integer({ min: 15, max: 35 }), q: fc.constantFrom(0.5, 0.7) })),
    subHigh: fc.oneof(fc.constant({ kind: 'none' as const }), fc.record({ kind: fc.constant('lowpass' as const), cornerHz: fc.integer({ min: 120, max: 300 }), q: fc.constantFrom(0.5, 0.7) })),
    temperatureC: fc.integer({ min: -5, max: 35 }),
    mainsDelayMs: hundredths(0, 3),
    lx: fc.double({ min: 0.3, max: 2.2, noNaN: true }),
    subs: fc.array(subArb, { minLength: 1, maxLength: 4 }),
  })
  .map((r): SystemDocument => {
    const base = juniperLaneDocument();
    const { widthM, lengthM } = base.room;
    return {
      ...base,
      room: { ...base.room, temperatureC: r.temperatureC },
      profiles: base.profiles.map((p) => (p.kind === 'main' ? { ...p, lowRolloff: r.mainsRolloff } : { ...p, lowRolloff: r.subLow, highRolloff: r.subHigh })),
      speakers: base.speakers.map((s) => (s.channel === 'L' ? { ...s, xM: r.lx } : s)),
      subs: r.subs.map((s, k) => ({
        ...base.subs[0]!,
        id: `sub${k + 1}`,
        name: `Sub ${k + 1}`,
        xM: Math.round(s.x * widthM * 100) / 100,
        yM: Math.round(s.y * lengthM * 100) / 100,
        delayMs: s.delayMs,
        gainDb: s.gainDb,
        invert: s.invert,
        distanceOverrideM: s.measured,
      })),
      bassManagement: { ...base.bassManagement, crossoverHz: r.crossoverHz, mainsHighpass: r.mainsHighpass, subLowpass: r.subLowpass, mainsDelayMs: r.mainsDelayMs },
    };
  });

const LR4: Slope = { family: 'linkwitz-riley', order: 4 };

describe('advice proven by applying it to the document (property, random Systems)', () => {
  it('Timing: every sub’s advice and the all-subs advice, applied, are never less flat and keep the −3 dB point', () => {
    let applied = 0;
    fc.assert(
      fc.property(systemArb, (doc) => {
        const request = timingRequestSchema.parse(timingRequestFromDocument(doc));
        const answer = computeTiming(request);
        answer.subs.forEach((s, k) => {
          if (s.advice.keep) {
            // Keeping is only said when no change gains 0.5 dB (or the flatter ones give up bass).
            expect(s.advice.gainDb).toBe(0);
            return;
          }
          expect(s.advice.gainDb).toBeGreaterThanOrEqual(0.5 - 0.01);
          expectNotWorse(doc, applyTimingToDocument(doc, s.advice), `sub ${k + 1} advice`);
          applied++;
        });
        if (answer.group && !answer.group.keep) {
          expectNotWorse(doc, applyTimingToDocument(doc, answer.group), 'all-subs advice');
          applied++;
        }
      }),
      { numRuns: 40, seed: 20261202 },
    );
    // Not vacuous: random Systems are mostly misaligned, so most of them get advice to follow.
    expect(applied).toBeGreaterThan(20);
  });

  it('Crossover sweep: the top row and every row ranked above the present setting, applied, are never less flat and keep the −3 dB point', () => {
    let applied = 0;
    fc.assert(
      fc.property(systemArb, fc.uniqueArray(fc.integer({ min: 40, max: 150 }), { minLength: 2, maxLength: 6 }), (doc, candidatesHz) => {
        const pairings = [{ mainsFilter: doc.bassManagement.mainsHighpass, subFilter: doc.bassManagement.subLowpass }, { mainsFilter: LR4, subFilter: LR4 }];
        const request = crossoverSweepRequestSchema.parse(crossoverSweepRequestFromDocument(doc, { pairings, candidatesHz }));
        const { rows } = computeCrossoverSweep(request);
        const presentRank = rows.findIndex((r) => r.present);
        expect(presentRank).toBeGreaterThanOrEqual(0);
        for (const row of rows.slice(0, presentRank)) {
          expectNotWorse(doc, applyCrossoverSweepToDocument(doc, row), `sweep row ${row.rank} (${row.crossoverHz} Hz)`);
          applied++;
        }
      }),
      { numRuns: 25, seed: 20261203 },
    );
    expect(applied).toBeGreaterThan(20);
  });

  it('on both demo Systems: the advice applied is never worse, and advice applied twice asks for nothing more', () => {
    for (const doc of [juniperLaneDocument(), lindenStreetDocument()]) {
      const answer = computeTiming(timingRequestSchema.parse(timingRequestFromDocument(doc)));
      for (const advice of [...answer.subs.map((s) => s.advice), ...(answer.group ? [answer.group] : [])]) {
        if (advice.keep) continue;
        const applied = applyTimingToDocument(doc, advice);
        expectNotWorse(doc, applied, 'demo advice');
        // Followed once, the same advice is not given again (no "add 8.44 ms" after "apply to all subs").
        const again = computeTiming(timingRequestSchema.parse(timingRequestFromDocument(applied)));
        for (const s of again.subs) expect(s.advice.keep, s.advice.reason).toBe(true);
      }
      const sweep = computeCrossoverSweep(crossoverSweepRequestSchema.parse(crossoverSweepRequestFromDocument(doc, { pairings: [{ mainsFilter: LR4, subFilter: LR4 }], candidatesHz: [40, 60, 80, 100, 120, 150] })));
      const top = sweep.rows[0]!;
      if (!top.present) expectNotWorse(doc, applyCrossoverSweepToDocument(doc, top), 'demo sweep top row');
    }
  });
});
