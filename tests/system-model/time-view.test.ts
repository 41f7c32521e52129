import { describe, expect, it } from 'vitest';
import { filterResponse } from '@/dsp/filters/filter-response';
import { logFrequencyGridHz } from '@/dsp/grid/log-frequency-grid';
import { systemModelFromRequest } from '@/lib/system-model/system-request';
import { computeTimeView, measuredTimeView, modelWithSettings, timeViewOfModel, type TimeTrace, type TimeView } from '@/lib/system-model/time-view';
import { applyTimingToDocument, computeTiming, timingRequestFromDocument } from '@/lib/system-model/timing';
import fixture from '../dsp/fixtures/time-view-scipy.json';
import { assertInDelta } from '../helpers/assert-in-delta';
import { MS_PER_METRE_20C, testSystem, withSub } from './test-system';

const sampleMs = 1000 / 8000;
const trace = (view: TimeView, id: string) => view.traces.find((t) => t.id === id) as TimeTrace;
const valueAt = (view: TimeView, values: Float64Array, ms: number) => values[Math.round((ms - (view.timeMs[0] as number)) / sampleMs)] as number;

describe('computeTimeView: the System’s paths and their sum in time', () => {
  // Oracle: the test System by hand (L 3 m, Sub A 4 m, Sub B 5 m at 2.9136 ms/m; processor delays 5.83, 2.91 and 0 ms
  // from the channel settings' distance alignment), so all three arrive 5 × 2.9136 = 14.57 ms after the processor's input.
  it('L, Sub A, Sub B and the sum over −20 … 300 ms at 8 kHz; each arrival is its processor delay plus its air path (hand-worked)', () => {
    const view = computeTimeView(testSystem())!;
    expect(view.traces.map((t) => [t.id, t.name, t.role])).toEqual([
      ['mains', 'L', 'mains'],
      ['sub-0', 'Sub A', 'sub'],
      ['sub-1', 'Sub B', 'sub'],
      ['sum', 'Sum', 'sum'],
    ]);
    expect(view.timeMs[0]).toBeCloseTo(-20, 9);
    expect(view.timeMs[view.timeMs.length - 1]).toBeCloseTo(300, 9);
    assertInDelta(trace(view, 'mains').arrivalMs!, 5.83 + 3 * MS_PER_METRE_20C, 1e-9, 'L');
    assertInDelta(trace(view, 'sub-0').arrivalMs!, 2.91 + 4 * MS_PER_METRE_20C, 1e-9, 'Sub A');
    assertInDelta(trace(view, 'sub-1').arrivalMs!, 5 * MS_PER_METRE_20C, 1e-9, 'Sub B');
    // Nothing of a path comes before its sound can arrive (a causal filter; common practice): 1 ms or more before it, |h|
    // stays below 0.01 % of its peak (the Gaussian band limit smears an onset by a fraction of a millisecond, no more).
    for (const t of view.traces.slice(0, 3)) {
      const peak = Math.max(...t.impulsePerS.map(Math.abs));
      view.timeMs.forEach((ms, i) => {
        if (ms < (t.arrivalMs as number) - 1) expect(Math.abs(t.impulsePerS[i] as number), `${t.name} at ${ms} ms`).toBeLessThan(1e-4 * peak);
      });
    }
  });

  it('linearity: the sum’s impulse is the paths’ impulses added (to 1e-9 /s)', () => {
    const view = computeTimeView(withSub(testSystem(), 1, { delayMs: 6, invert: true }))!;
    const paths = view.traces.filter((t) => t.role !== 'sum');
    view.timeMs.forEach((ms, i) => assertInDelta(trace(view, 'sum').impulsePerS[i] as number, paths.reduce((s, t) => s + (t.impulsePerS[i] as number), 0), 1e-9, `sum at ${ms} ms`));
  });

  it('10 ms more processor delay on Sub B moves its whole impulse 10 ms later against the mains (the shift theorem; common practice), and the sentence says so', () => {
    const before = computeTimeView(testSystem())!;
    // Sub B's own 10 ms: the channel settings then take the delay all share (2.91 ms) out of every source.
    const after = computeTimeView(withSub(testSystem(), 1, { delayMs: 10 }))!;
    const [b, lb, a, la] = [trace(before, 'sub-1'), trace(before, 'mains'), trace(after, 'sub-1'), trace(after, 'mains')];
    assertInDelta(a.arrivalMs! - la.arrivalMs! - (b.arrivalMs! - lb.arrivalMs!), 10, 1e-9, 'arrival against the mains');
    const shiftMs = a.arrivalMs! - b.arrivalMs!;
    assertInDelta(shiftMs, 10 - 2.91, 1e-9, 'arrival');
    assertInDelta(a.stepPeakMs - b.stepPeakMs, shiftMs, sampleMs, 'step peak');
    // Sub B is low-passed at 80 Hz and 180 Hz: linear interpolation between 0.125 ms samples is exact to 0.1 % of its peak.
    const interpolated = (ms: number) => {
      const x = (ms - (after.timeMs[0] as number)) / sampleMs;
      const i = Math.floor(x);
      return (a.impulsePerS[i] as number) + (x - i) * ((a.impulsePerS[i + 1] as number) - (a.impulsePerS[i] as number));
    };
    const scale = Math.max(...b.impulsePerS.map(Math.abs));
    for (let ms = -10; ms < 280; ms += 0.5) assertInDelta(interpolated(ms + shiftMs), valueAt(before, b.impulsePerS, ms), 1e-3 * scale, `h at ${ms} ms`);
    expect(after.sentences[1]).toBe(`Sub B’s step peaks ${(a.stepPeakMs - la.stepPeakMs).toFixed(1)} ms after the mains’ (L); its sound arrives ${(a.arrivalMs! - la.arrivalMs!).toFixed(2)} ms after theirs.`);
    expect(after.sentences[1]).toContain('arrives 10.00 ms after theirs');
  });

  it('an inverted sub: its step is the normal one negated (to 1e-12) and the sentence says so; another channel names it; no speakers → null', () => {
    const view = computeTimeView(withSub(testSystem(), 0, { invert: true }), { channel: 'R' })!;
    const normal = computeTimeView(testSystem(), { channel: 'R' })!;
    expect(trace(view, 'mains').name).toBe('R');
    assertInDelta(trace(view, 'sub-0').step, trace(normal, 'sub-0').step.map((v) => -v), 1e-12, 'inverted step');
    expect(view.sentences[0]).toMatch(/^Sub A’s step peaks .* the mains’ \(R\).*\(polarity inverted: its step goes negative\)\.$/);
    expect(computeTimeView({ ...testSystem(), speakers: [] })).toBeNull();
  });

  it('the close-up starts 5 ms before the first arrival (in 5 ms) and ends after every step peak', () => {
    const view = computeTimeView(withSub(testSystem(), 1, { delayMs: 10 }))!;
    expect(view.closeUpMs[0]).toBe(5); // first arrival 14.57 ms
    expect(view.closeUpMs[1]).toBeGreaterThan(Math.max(...view.traces.map((t) => t.stepPeakMs)));
    expect(view.closeUpMs[1]).toBeLessThanOrEqual(300);
  });
});

describe('timeViewOfModel: the system Timing assessed, with a piece of its advice', () => {
  it('from the Timing request it is the document’s view (distances to 0.1 mm: arrivals within 1e-3 ms); with the advice’s settings it is the view of the document the Apply button writes (arrivals against the mains within 0.01 ms, the processor’s rounding)', () => {
    // Sub A told it is 3 m farther than it is: its sound comes 8.74 ms early against the mains, and Timing advises a change.
    const doc = withSub(testSystem(), 0, { distanceOverrideM: 7 });
    const request = timingRequestFromDocument(doc)!;
    const model = systemModelFromRequest(request);
    const fromDoc = computeTimeView(doc)!;
    const fromRequest = timeViewOfModel(model);
    fromDoc.traces.forEach((t, i) => {
      if (t.arrivalMs !== null) assertInDelta(fromRequest.traces[i]!.arrivalMs!, t.arrivalMs, 1e-3, `${t.name} arrival`);
    });
    const advice = computeTiming(request).subs[0]!.advice;
    expect(advice.keep).toBe(false);
    const advised = timeViewOfModel(modelWithSettings(model, advice.set));
    const applied = computeTimeView(applyTimingToDocument(doc, advice))!;
    const lead = (v: TimeView, id: string) => trace(v, id).arrivalMs! - trace(v, 'mains').arrivalMs!;
    for (const id of ['sub-0', 'sub-1']) assertInDelta(lead(advised, id), lead(applied, id), 0.01, `${id} against the mains`);
    expect(trace(advised, 'sub-0').inverted).toBe(advice.set.subs[0]!.invert);
  });
});

describe('measuredTimeView: measured curves in time', () => {
  const gridHz = logFrequencyGridHz({ startHz: 10, stopHz: 20_000, pointsPerOctave: 48 });
  const lr4 = filterResponse({ filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, frequencyHz: gridHz });
  const scipyLr4 = fixture.cases.find((c) => c.name === 'lr4-lowpass-80')!;
  // An LR4 low-pass at 80 Hz measured 5 ms late at 92 dB: an impulse upload whose peak arrived at 5 ms.
  const delayedDeg = Array.from(gridHz, (f, i) => (lr4.phaseDeg[i] as number) - 360 * f * 0.005);
  const measured = { name: 'Sub at the centre chair', role: 'sub', frequencyHz: Array.from(gridHz), magnitudeDb: Array.from(lr4.magnitudeDb, (v) => v + 92), phaseDeg: delayedDeg, arrivalMs: 5 };

  it('with phase: the window follows the file’s arrival (−15 … 305 ms), the impulse peaks at scipy’s LR4 peak + 5 ms within one sample, the step ends at 1 (level relative to its highest point)', () => {
    const view = measuredTimeView([measured]);
    const t = view.traces[0]!;
    expect([view.timeMs[0], view.timeMs[view.timeMs.length - 1]]).toEqual([-15, 305]);
    expect(t).toMatchObject({ role: 'sub', arrivalMs: 5, phaseEstimated: false });
    assertInDelta(t.impulsePeakMs, scipyLr4.peakMs + 5, sampleMs, 'impulse peak (scipy.signal.impulse + 5 ms)');
    assertInDelta(t.step[t.step.length - 1] as number, 1, 0.01, 'final step');
    expect(view.sentences[0]).toContain('the impulse file’s peak arrived at 5.00 ms');
  });

  it('without phase: the minimum-phase estimate (an LR4 low-pass is minimum phase) peaks at scipy’s undelayed LR4 peak — the 5 ms is lost — and the view says it holds no arrival time', () => {
    const view = measuredTimeView([{ ...measured, phaseDeg: null }]);
    const t = view.traces[0]!;
    expect(t).toMatchObject({ arrivalMs: null, phaseEstimated: true });
    assertInDelta(t.impulsePeakMs, scipyLr4.peakMs, 2 * sampleMs, 'impulse peak (scipy.signal.impulse, no delay)');
    expect(view.sentences[0]).toMatch(/minimum-phase estimate .* holds no arrival time/);
  });

  it('a mains and a sub measured from one reference: the sentence gives the step peaks’ difference read off the traces', () => {
    const flatDeg = Array.from(gridHz, (f) => -360 * f * 0.002);
    const view = measuredTimeView([{ name: 'Mains', role: 'mains', frequencyHz: Array.from(gridHz), magnitudeDb: Array.from(gridHz, () => 85), phaseDeg: flatDeg, arrivalMs: null }, { ...measured, arrivalMs: null }]);
    const [m, s] = view.traces;
    expect(view.sentences[2]).toBe(`Sub at the centre chair’s step peaks ${(s!.stepPeakMs - m!.stepPeakMs).toFixed(1)} ms after Mains’s, if both were measured from one timing reference.`);
    expect(() => measuredTimeView([])).toThrow(/curves/);
  });
});
