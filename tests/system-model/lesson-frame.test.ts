import { describe, expect, it } from 'vitest';
import { blendResponse } from '@/dsp';
import { blendRequestFromDocument, computeBlend } from '@/lib/system-model/blend';
import { fromFirstArrival } from '@/lib/system-model/first-arrival';
import { blendRequestSchema } from '@/lib/validations/compute-blend';
import { axialModesHz, computeLessonFrame, FRAME_START_HZ, FRAME_STOP_HZ, frameGridHz } from '@/lib/system-model/lesson-frame';
import { testSystem } from './test-system';

const C20 = 331.3 * Math.sqrt(1 + 20 / 273.15);

/** |a − b| on the circle, degrees (0 … 180). */
const wrappedDifferenceDeg = (a: number, b: number) => Math.abs((((a - b) % 360) + 540) % 360 - 180);

describe('computeLessonFrame: a Lesson Step’s plot, computed in the browser', () => {
  it('the shown channel (L) at 3 m and the subs at 4 and 5 m, at the document’s crossover', () => {
    const f = computeLessonFrame(testSystem())!;
    expect(f.mainsName).toBe('L');
    expect(f.mainsDistanceM).toBeCloseTo(3, 12);
    expect(f.subDistancesM.map((d) => Math.round(d * 1e9) / 1e9)).toEqual([4, 5]);
    expect(f.crossoverHz).toBe(80);
    expect(f.result.paths.map((p) => p.name)).toEqual(['L', 'Sub A', 'Sub B']);
    expect(f.metrics!.crossoverHz).toBe(80);
    expect(f.assessment!.bandHz).toEqual([40, 160]);
  });

  it('sums the very paths POST /api/v1/blend is sent for the same document (phase from the first arrival, 3 m nearer)', () => {
    const doc = testSystem();
    const req = blendRequestFromDocument(doc)!;
    const expected = blendResponse({ temperatureC: req.temperatureC, frequencyHz: frameGridHz(), paths: req.paths });
    const f = computeLessonFrame(doc)!;
    expect(Array.from(f.result.sum.magnitudeDb)).toEqual(Array.from(expected.sum.magnitudeDb));
    // Issue 14: phase is drawn from the first arrival (L, 3.0 m), so every path's phase leads the absolute one by
    // 360°·f·(3 m / c) (geometry), wrapped; levels are unchanged.
    const grid = frameGridHz();
    f.result.paths[2]!.phaseDeg.forEach((deg, i) => {
      const lead = (360 * (grid[i] as number) * 3) / C20;
      expect(wrappedDifferenceDeg(deg, (expected.paths[2]!.phaseDeg[i] as number) + lead)).toBeLessThan(1e-6);
    });
  });

  it('phase from the same reference as Blend: a lone mains 3 m away reads the same as the editor, not ~8.6 turns late', () => {
    // Blend's panel sends POST /api/v1/blend its request with the first arrival taken off (components/blend/blend-panel.tsx),
    // which the route parses and answers with computeBlend.
    const doc = { ...testSystem(), subs: [] };
    const req = blendRequestFromDocument(doc)!;
    expect(req.paths).toHaveLength(1);
    expect(req.paths[0]!.distanceM).toBeCloseTo(3, 9);
    expect(req.paths[0]!.delayMs).toBe(0);
    const editor = computeBlend(blendRequestSchema.parse({ ...req, paths: fromFirstArrival(req.paths).paths, crossoverHz: doc.bassManagement.crossoverHz }));
    const f = computeLessonFrame(doc)!;
    // 640 Hz is on both grids (10 Hz · 2^6): index 6·32 of the frame's, 6·48 of the editor's.
    expect(f.result.frequencyHz[192]).toBeCloseTo(640, 9);
    expect(editor.frequencyHz[288]).toBeCloseTo(640, 3);
    expect(f.result.paths[0]!.phaseDeg[192]).toBeCloseTo(editor.paths[0]!.phaseDeg[288]!, 1);
    // At the top of the grid (≈ 1 kHz) the mains' own phase is a few degrees of high-pass lead (a filter, no flight time);
    // with the 3 m flight time it would be −360°·f·3/c ≈ −8.6 turns (geometry: 3 m / 343.2 m/s = 8.74 ms).
    const last = f.result.frequencyHz.length - 1;
    const topHz = f.result.frequencyHz[last] as number;
    expect(topHz).toBeGreaterThan(980);
    const mainsDeg = f.result.paths[0]!.phaseDeg[last] as number;
    expect(mainsDeg).toBeGreaterThan(0);
    expect(mainsDeg).toBeLessThan(45);
    // The absolute phase (flight time included), unwrapped over the same grid, trails it by exactly 360°·f·3/c.
    const absolute = blendResponse({ temperatureC: 20, frequencyHz: frameGridHz(), paths: req.paths }).paths[0]!.unwrappedPhaseDeg;
    const lead = (f.result.paths[0]!.unwrappedPhaseDeg[last] as number) - (absolute[last] as number);
    expect(lead).toBeCloseTo((360 * topHz * 3) / C20, 3);
    expect(lead / 360).toBeGreaterThan(8.5);
  });

  it('no speakers → null; the measured distance of a sub is the processor’s, shown as its distance', () => {
    expect(computeLessonFrame({ ...testSystem(), speakers: [] })).toBeNull();
    const doc = testSystem();
    const f = computeLessonFrame({ ...doc, subs: doc.subs.map((s, k) => (k === 0 ? { ...s, distanceOverrideM: 4.4 } : s)) })!;
    expect(f.subDistancesM[0]).toBe(4.4);
  });

  it('the frame grid: 10 Hz … 1 kHz at 32 points per octave (213 points), made once', () => {
    const g = frameGridHz();
    expect(g[0]).toBe(FRAME_START_HZ);
    expect(g.length).toBe(Math.floor(32 * Math.log2(FRAME_STOP_HZ / FRAME_START_HZ)) + 1);
    expect(g[32]).toBeCloseTo(20, 9);
    expect(frameGridHz()).toBe(g);
  });
});

describe('axialModesHz: a Modes Step’s markers', () => {
  it('the axial modes only, lowest first: c/2L = 24.5 Hz "1,0,0", c/2W "0,1,0", up to maxHz', () => {
    const modes = axialModesHz(testSystem(), 60);
    expect(modes[0]!.label).toBe('1,0,0');
    expect(modes[0]!.hz).toBeCloseTo(C20 / 14, 9);
    expect(modes.find((m) => m.label === '0,1,0')!.hz).toBeCloseTo(C20 / 12, 9);
    modes.forEach((m) => {
      expect(m.hz).toBeLessThanOrEqual(60);
      expect(m.label.split(',').filter((n) => n !== '0')).toHaveLength(1);
    });
  });
});
