import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/errors';
import { applyMeasuredToDocument, computeMeasured, measuredRequestFromDocument, measurementRoleKind, overlayAlignBandHz, overlayAlignOffsetDb } from '@/lib/system-model/measured';
import { predictRequestSchema } from '@/lib/validations/measurement';
import { testSystem, withSpeaker, withSub } from './test-system';

/** A flat invented curve, 15 Hz … 1.92 kHz at one point per octave, no phase. */
const flat = { frequencyHz: [15, 30, 60, 120, 240, 480, 960, 1920], magnitudeDb: [80, 80, 80, 80, 80, 80, 80, 80], phaseDeg: null };
const curves = { mains: flat, sub: flat };

/** Oracle: the test System by hand (processor delays 5.83, 2.91 and 0 ms; see channel-settings.test). */
describe('measuredRequestFromDocument: the two curves with the System’s settings', () => {
  it('the mains channel’s trim and processor delay; the chosen sub’s gain, processor delay and polarity', () => {
    const doc = withSub(withSpeaker(testSystem(), 'L', { trimDb: -1 }), 1, { gainDb: 2, invert: true });
    const req = measuredRequestFromDocument(doc, curves, { subIndex: 1 }, { smoothingFraction: 6 })!;
    expect(req.temperatureC).toBe(20);
    expect(req.crossoverHz).toBe(80);
    expect(req.mainsHighpass).toEqual({ family: 'butterworth', order: 2 });
    expect(req.subLowpass).toEqual({ family: 'linkwitz-riley', order: 4 });
    expect(req.mains).toEqual({ name: 'L', curve: flat, gainDb: -1, delayMs: 5.83, invert: false });
    expect(req.sub).toEqual({ name: 'Sub B', curve: flat, gainDb: 2, delayMs: 0, invert: true });
    expect(req.smoothingFraction).toBe(6);
    expect(predictRequestSchema.safeParse(req).success).toBe(true);
  });

  it('"all" takes the first sub’s settings under the name "All subs"; smoothing defaults to none', () => {
    const req = measuredRequestFromDocument(testSystem(), curves, { subIndex: 'all' })!;
    expect(req.sub).toMatchObject({ name: 'All subs', delayMs: 2.91, gainDb: 0 });
    expect(req.smoothingFraction).toBe(0);
  });

  it('a sub that is not there, or no speakers → null', () => {
    expect(measuredRequestFromDocument(testSystem(), curves, { subIndex: 5 })).toBeNull();
    expect(measuredRequestFromDocument({ ...testSystem(), speakers: [] }, curves, { subIndex: 0 })).toBeNull();
  });
});

describe('applyMeasuredToDocument: the measured-pair recommendation written back', () => {
  it('one sub: its processor delay becomes the advised one (2.91 → 4.00 ms: +1.09 ms of its own) and its polarity; the other sub and the mains keep theirs', () => {
    const out = applyMeasuredToDocument(testSystem(), 0, { subDelayMs: 4, mainsDelayMs: 5.83, invert: true, flipPolarity: true });
    expect(out.subs.map((s) => [s.delayMs, s.invert])).toEqual([[1.09, true], [0, false]]);
    expect(out.bassManagement.mainsDelayMs).toBe(0);
    expect(withSub(out, 0, { delayMs: 0, invert: false })).toEqual(testSystem());
  });

  it('the mains 1 ms later: the other subs move with the mains, so their timing against the mains is kept', () => {
    const out = applyMeasuredToDocument(testSystem(), 0, { subDelayMs: 2.91, mainsDelayMs: 6.83, invert: false, flipPolarity: false });
    expect(out.bassManagement.mainsDelayMs).toBe(1);
    expect(out.subs.map((s) => s.delayMs)).toEqual([0, 1]);
  });

  it('"all": every sub moves by the first sub’s change and flips with it', () => {
    const out = applyMeasuredToDocument(testSystem(), 'all', { subDelayMs: 3.91, mainsDelayMs: 5.83, invert: true, flipPolarity: true });
    expect(out.subs.map((s) => [s.delayMs, s.invert])).toEqual([[1, true], [1, true]]);
    expect(out.bassManagement.mainsDelayMs).toBe(0);
  });
});

describe('computeMeasured: refusals', () => {
  it('curves sharing less than an octave are a 400 naming sub.curve', () => {
    const req = predictRequestSchema.parse(measuredRequestFromDocument(testSystem(), curves, { subIndex: 0 }));
    const narrow = { frequencyHz: [600, 650, 700, 750, 800, 850, 900, 950], magnitudeDb: [80, 80, 80, 80, 80, 80, 80, 80], phaseDeg: null };
    let thrown: unknown;
    try {
      computeMeasured(req, { mains: flat, sub: narrow });
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(AppError);
    expect((thrown as AppError).status).toBe(400);
    expect((thrown as AppError).issues.map((i) => i.path)).toEqual(['sub.curve']);
  });
});

describe('the overlay’s automatic level alignment and role checks', () => {
  it('a role says what was playing: sub/LFE, sum, a mains or channel label, or unknown (common practice in naming files)', () => {
    expect(['sub', 'Sub A', 'LFE', 'mains', 'L', 'SL', 'sum', 'Mains + sub together', null, ' '].map((r) => measurementRoleKind(r))).toEqual(['sub', 'sub', 'sub', 'mains', 'mains', 'mains', 'sum', 'sum', null, null]);
  });

  it('the band by role: mains 2·fc … 8·fc, sub fc/3 … fc, other fc/2 … 2·fc, clipped to the file; null under a third of an octave (arithmetic by hand)', () => {
    const wide = [10, 20000];
    expect(overlayAlignBandHz('mains', 80, wide)).toEqual({ startHz: 160, stopHz: 640 });
    expect(overlayAlignBandHz('sub', 80, wide)).toEqual({ startHz: 27, stopHz: 80 });
    expect(overlayAlignBandHz('sum', 80, wide)).toEqual({ startHz: 40, stopHz: 160 });
    expect(overlayAlignBandHz(null, 100, [60, 20000])).toEqual({ startHz: 60, stopHz: 200 });
    // 160 … 200 Hz is 0.32 octave (log2 1.25), just under a third: no band.
    expect(overlayAlignBandHz('mains', 80, [10, 200])).toBeNull();
  });

  it('an absolute-SPL file (the model’s shape plus 72.4 dB) is shifted by exactly −72.4 dB; no overlap → null', () => {
    const hz = Array.from({ length: 49 }, (_, i) => 20 * 2 ** (i / 8));
    const model = { frequencyHz: hz, magnitudeDb: hz.map((f) => -3 * Math.log2(f / 20) / 6) };
    const file = { frequencyHz: hz, magnitudeDb: model.magnitudeDb.map((v) => v + 72.4) };
    expect(overlayAlignOffsetDb(model, file, { startHz: 40, stopHz: 120 })).toBe(-72.4);
    expect(overlayAlignOffsetDb(model, { frequencyHz: [1000, 2000], magnitudeDb: [80, 80] }, { startHz: 40, stopHz: 120 })).toBeNull();
  });
});
