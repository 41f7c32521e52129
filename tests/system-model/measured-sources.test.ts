import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz, pathResponse, systemPaths, type SystemSource } from '@/dsp';
import { applyCrossoverSweepToDocument, computeCrossoverSweep, crossoverSweepRequestFromDocument } from '@/lib/system-model/crossover-sweep';
import { measuredCrossoverRangeHz, measuredSourcesRequest, spreadAllSubsSettings, type CurvePoints } from '@/lib/system-model/measured-sources';
import { systemModelFromDocument } from '@/lib/system-model/system-from-document';
import { computeTiming, timingRequestFromDocument } from '@/lib/system-model/timing';
import { crossoverSweepRequestSchema, timingRequestSchema } from '@/lib/validations/compute-blend';
import type { SystemDocument } from '@/lib/validations/system';
import { assertInDelta } from '../helpers/assert-in-delta';
import { testSystem } from './test-system';

// Issue 17: decisions on measured curves. The oracle is the model itself (its analog sections are checked against
// scipy.signal elsewhere; reference library): curves "measured" from each source's speaker part — roll-offs, voicing,
// air path — on a 96-per-octave grid must give the model's ranking, delays and polarity through the same request path
// a client uses (measuredSourcesRequest → the zod schema → computeCrossoverSweep / computeTiming).

const LR4 = { family: 'linkwitz-riley' as const, order: 4 };
const BW2 = { family: 'butterworth' as const, order: 2 };

/** What a microphone at the MLP would record of one source alone, nothing in the processor (wrapped phase, as files hold it). */
function speakerAtSeat(s: SystemSource, temperatureC: number, topHz = 4000): CurvePoints {
  const grid = logFrequencyGridHz({ startHz: 5, stopHz: topHz, pointsPerOctave: 96 });
  const none = { family: 'butterworth' as const, order: 1, response: 'none' as const, cornerHz: 100 };
  // The sub's processor EQ is not in a measurement; the voicing is (it is in the speaker). The test System has none of either.
  const r = pathResponse({ name: s.name, filter: none, ...(s.rolloff ? { rolloff: s.rolloff } : {}), gainDb: 0, delayMs: 0, invert: false, distanceM: s.distanceM }, grid, temperatureC);
  return { frequencyHz: Array.from(grid), magnitudeDb: Array.from(r.magnitudeDb), phaseDeg: Array.from(r.re, (re, i) => (Math.atan2(r.im[i] as number, re) * 180) / Math.PI) };
}

function measuredCurves(doc: SystemDocument, topHz?: number) {
  const model = systemModelFromDocument(doc)!;
  return { mains: speakerAtSeat(model.mains, model.temperatureC, topHz), subs: model.subs.map((s) => speakerAtSeat(s, model.temperatureC)) };
}

const inline = (c: CurvePoints) => ({ frequencyHz: [...c.frequencyHz], magnitudeDb: [...c.magnitudeDb], phaseDeg: c.phaseDeg ? [...c.phaseDeg] : null });

describe('the Crossover sweep and Timing on measured curves', () => {
  const doc = testSystem();
  const curves = measuredCurves(doc);
  const options = { pairings: [{ mainsFilter: LR4, subFilter: LR4 }, { mainsFilter: BW2, subFilter: LR4 }], candidatesHz: [50, 60, 70, 80, 90, 100, 120] };
  const onModelRequest = crossoverSweepRequestFromDocument(doc, options)!;
  const measuredRequest = crossoverSweepRequestSchema.parse({
    ...onModelRequest,
    ...measuredSourcesRequest(doc, onModelRequest, { mains: inline(curves.mains), subs: { kind: 'each', curves: curves.subs.map(inline) } }),
  });

  it('the request carries each source measured: distance 0, no roll-off, the curve; the schema accepts it', () => {
    expect(measuredRequest.mains).toMatchObject({ distanceM: 0, rolloff: { kind: 'none' } });
    expect(measuredRequest.subs.every((s) => s.distanceM === 0 && s.measured !== undefined)).toBe(true);
    expect(measuredRequest.subs.map((s) => s.delayMs)).toEqual(onModelRequest.subs.map((s) => s.delayMs));
  });

  it('ranks the rows as the model does: flatness within 0.05 dB, delays within 0.05 ms; the answer says what it ran on', () => {
    const onModel = computeCrossoverSweep(onModelRequest);
    const onMeasured = computeCrossoverSweep(measuredRequest, curves);
    const key = (r: (typeof onModel.rows)[number]) => `${r.crossoverHz}/${r.mainsFilter.family}/${r.present}`;
    const clear = onModel.rows.filter((r, i, all) => all.every((o, j) => j === i || Math.abs(o.flatnessDb - r.flatnessDb) > 0.1)).map(key);
    expect(onMeasured.rows.map(key).filter((k) => clear.includes(k))).toEqual(onModel.rows.map(key).filter((k) => clear.includes(k)));
    for (const row of onModel.rows) {
      const twin = onMeasured.rows.find((r) => key(r) === key(row))!;
      assertInDelta(twin.flatnessDb, row.flatnessDb, 0.05);
      twin.set.subs.forEach((s, k) => assertInDelta(s.delayMs, row.set.subs[k]!.delayMs, 0.05));
    }
    expect(onModel.measured).toBeNull();
    expect(onMeasured.measured!.sources.map((s) => s.phaseEstimated)).toEqual([false, false, false]);
    // The mains' in-room −3 dB point (sealed 50 Hz, Q 0.7: |H|² = x⁴/(x⁴ + (1/Q² − 2)x² + 1), by hand) ≈ the roll-off's.
    assertInDelta(onMeasured.mainsMinus3DbHz!, onModel.mainsMinus3DbHz!, 0.5);
  });

  it('the top measured row, applied to the System and run again on the same measurements, is what it promised and no worse than the present', () => {
    const onMeasured = computeCrossoverSweep(measuredRequest, curves);
    const top = onMeasured.rows[0]!;
    const present = onMeasured.rows.find((r) => r.present)!;
    const applied = applyCrossoverSweepToDocument(doc, top);
    const again = crossoverSweepRequestFromDocument(applied, { ...options, candidatesHz: [top.crossoverHz] })!;
    const rerun = computeCrossoverSweep(crossoverSweepRequestSchema.parse({ ...again, ...measuredSourcesRequest(applied, again, { mains: inline(curves.mains), subs: { kind: 'each', curves: curves.subs.map(inline) } }) }), curves);
    const nowPresent = rerun.rows.find((r) => r.present)!;
    assertInDelta(nowPresent.flatnessDb, top.flatnessDb, 0.02);
    expect(nowPresent.flatnessDb).toBeLessThanOrEqual(present.flatnessDb + 1e-9);
  });

  it('Timing on the measurements recommends what the model recommends; an arrival comes from an impulse’s peak or is not known', () => {
    const onModel = computeTiming(timingRequestFromDocument(doc)!);
    const req = timingRequestFromDocument(doc)!;
    const measuredTiming = timingRequestSchema.parse({ ...req, ...measuredSourcesRequest(doc, req, { mains: inline(curves.mains), subs: { kind: 'each', curves: curves.subs.map(inline) } }) });
    const withArrivals = { mains: { ...curves.mains, arrivalMs: 8.75 }, subs: curves.subs.map((c, k) => (k === 0 ? { ...c, arrivalMs: 11.5 } : c)) };
    const onMeasured = computeTiming(measuredTiming, withArrivals);
    onModel.subs.forEach((s, k) => {
      const m = onMeasured.subs[k]!;
      expect(m.advice.keep).toBe(s.advice.keep);
      assertInDelta(m.advice.set.subs[k]!.delayMs, s.advice.set.subs[k]!.delayMs, 0.05);
      expect(m.advice.set.subs[k]!.invert).toBe(s.advice.set.subs[k]!.invert);
      assertInDelta(m.phaseDifferenceDeg, s.phaseDifferenceDeg, 0.5);
    });
    expect(onMeasured.mains).toMatchObject({ arrivalMs: 8.75, arrivalFrom: 'measured', totalMs: 8.75 + req.mains.delayMs });
    expect(onMeasured.subs[0]!.leadMs).toBeCloseTo(8.75 + req.mains.delayMs - (11.5 + req.subs[0]!.delayMs), 6);
    expect(onMeasured.subs[1]).toMatchObject({ arrivalMs: null, arrivalFrom: null, totalMs: null, leadMs: null, delayPhaseDeg: null });
  });

  it('refuses crossover points the curves cannot judge, naming the field and the range', () => {
    const short = measuredCurves(doc, 400); // the mains stop just under 400 Hz: crossovers up to a quarter of that
    const topHz = short.mains.frequencyHz[short.mains.frequencyHz.length - 1]!;
    expect(measuredCrossoverRangeHz(short.mains, short.subs)).toEqual([10, topHz / 4]);
    expect(() => computeCrossoverSweep(measuredRequest, short)).toThrow(/candidatesHz\.5: .*from 10 to 99\.3 Hz; 100 Hz needs the mains measured over 50–400 Hz/);
  });

  it('a result on every sub measured together moves every sub by the same shift and flips them together (by hand)', () => {
    const before = { mainsDelayMs: 0, subs: [{ delayMs: 1, invert: false }, { delayMs: 3, invert: true }] };
    const spread = spreadAllSubsSettings(before, { mainsDelayMs: 0, subs: [{ delayMs: 1, invert: false }] }, { mainsDelayMs: 0.5, subs: [{ delayMs: 3.25, invert: true }] });
    expect(spread).toEqual({ mainsDelayMs: 0.5, subs: [{ delayMs: 3.25, invert: true }, { delayMs: 5.25, invert: false }] });
    expect(systemPaths(systemModelFromDocument(doc)!).length).toBe(3);
  });
});
