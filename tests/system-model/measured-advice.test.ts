/**
 * Measured's advice keeps the same rules as Timing's: a change is made only when it is at least 0.5 dB flatter
 * (common practice; dsp/system/advice-rules.ts), and applied to the document it gives exactly the flatness it promised on the
 * measured pair. The "measurements" are invented: each speaker's own response at the seat (its natural roll-off and
 * its air path, no processor filter), computed by blendResponse with the filter switched off.
 */
import { describe, expect, it } from 'vitest';
import { blendResponse, logFrequencyGridHz, type PathSpec } from '@/dsp';
import { juniperLaneDocument } from '@/lib/demo/systems';
import { applyMeasuredToDocument, computeMeasured, measuredRequestFromDocument } from '@/lib/system-model/measured';
import { systemModelFromDocument } from '@/lib/system-model/system-from-document';
import { predictRequestSchema } from '@/lib/validations/measurement';
import type { SystemDocument } from '@/lib/validations/system';

type Curve = { frequencyHz: number[]; magnitudeDb: number[]; phaseDeg: number[] };

/** What a microphone at the MLP would record from the main channel and from sub 1 alone, without the processor. */
function measuredCurves(doc: SystemDocument): { mains: Curve; sub: Curve } {
  const model = systemModelFromDocument(doc)!;
  const f = logFrequencyGridHz({ startHz: 15, stopHz: 1000, pointsPerOctave: 24 });
  const raw = (s: typeof model.mains): PathSpec => ({ name: s.name, filter: { family: 'butterworth', order: 2, response: 'none', cornerHz: 80 }, ...(s.rolloff ? { rolloff: s.rolloff } : {}), gainDb: 0, delayMs: 0, invert: false, distanceM: s.distanceM });
  const r = blendResponse({ temperatureC: model.temperatureC, frequencyHz: f, paths: [raw(model.mains), raw(model.subs[0]!)] });
  const curve = (k: number): Curve => ({ frequencyHz: Array.from(f), magnitudeDb: Array.from(r.paths[k]!.magnitudeDb), phaseDeg: Array.from(r.paths[k]!.phaseDeg) });
  return { mains: curve(0), sub: curve(1) };
}

function predict(doc: SystemDocument, curves: { mains: Curve; sub: Curve }) {
  const body = measuredRequestFromDocument(doc, { mains: curves.mains, sub: curves.sub }, { subIndex: 0 })!;
  return computeMeasured(predictRequestSchema.parse(body), curves);
}

describe('Measured: advice on the measured pair', () => {
  it('a sub 6 ms late: advice is made, and applied it gives the flatness it promised (within rounding)', () => {
    const base = juniperLaneDocument();
    const doc: SystemDocument = { ...base, subs: base.subs.map((s, k) => (k === 0 ? { ...s, delayMs: 6 } : s)) };
    const curves = measuredCurves(doc);
    const before = predict(doc, curves).alignment!;
    expect(before.keep).toBe(false);
    expect(before.flatnessBeforeDb - before.flatnessDb).toBeGreaterThanOrEqual(0.5);
    const applied = applyMeasuredToDocument(doc, 0, before);
    const after = predict(applied, curves).alignment!;
    // The applied System's present setting is the advised one: its flatness is the promised flatness.
    expect(after.flatnessBeforeDb).toBeCloseTo(before.flatnessDb, 1);
    expect(after.flatnessBeforeDb).toBeLessThan(before.flatnessBeforeDb - 0.5 + 0.05);
    // Followed once, no further change is worth making.
    expect(after.keep).toBe(true);
    expect(after.reason).toMatch(/Keep the present setting/);
  });

  it('the demo as it is (aligned by its distances): keep the present setting, with the reason', () => {
    const doc = juniperLaneDocument();
    const a = predict(doc, measuredCurves(doc)).alignment!;
    expect(a.keep).toBe(true);
    expect(a.reason).toMatch(/under the 0\.5 dB/);
  });

  it('the processor delays sent are the channel settings (the Settings sheet’s), not the document’s own fields', () => {
    const doc = juniperLaneDocument();
    const body = measuredRequestFromDocument(doc, measuredCurves(doc), { subIndex: 0 })!;
    const model = systemModelFromDocument(doc)!;
    expect(body.mains.delayMs).toBe(model.mains.delayMs);
    expect(body.mains.delayMs).toBeGreaterThan(0); // L is nearer than the subs: it waits for them
    expect(body.sub.delayMs).toBe(model.subs[0]!.delayMs);
  });
});
