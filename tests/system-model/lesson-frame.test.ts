import { describe, expect, it } from 'vitest';
import { blendResponse } from '@/dsp';
import { blendRequestFromDocument } from '@/lib/system-model/blend';
import { axialModesHz, computeLessonFrame, FRAME_START_HZ, FRAME_STOP_HZ, frameGridHz } from '@/lib/system-model/lesson-frame';
import { testSystem } from './test-system';

const C20 = 331.3 * Math.sqrt(1 + 20 / 273.15);

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

  it('sums the very paths POST /api/v1/blend is sent for the same document', () => {
    const doc = testSystem();
    const req = blendRequestFromDocument(doc)!;
    const expected = blendResponse({ temperatureC: req.temperatureC, frequencyHz: frameGridHz(), paths: req.paths });
    const f = computeLessonFrame(doc)!;
    expect(Array.from(f.result.sum.magnitudeDb)).toEqual(Array.from(expected.sum.magnitudeDb));
    expect(Array.from(f.result.paths[2]!.phaseDeg)).toEqual(Array.from(expected.paths[2]!.phaseDeg));
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
