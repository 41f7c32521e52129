import { describe, expect, it } from 'vitest';
import { blendCrossover, blendRequestFromDocument, computeBlend } from '@/lib/system-model/blend';
import { blendRequestSchema, type BlendRequest } from '@/lib/validations/compute-blend';
import { TEST_MAIN, TEST_SUB, testSystem, withSub } from './test-system';

/** Oracle: the test System by hand (3, 4 and 5 m; 5.83, 2.91 and 0 ms; Sub A 2 of 3 units, Sub B 1 of 3). */
describe('blendRequestFromDocument: what the document says, as paths', () => {
  it('L high-passed, every sub low-passed, at the crossover, with the processor delays and level-matched gains', () => {
    const req = blendRequestFromDocument(testSystem())!;
    expect(req.temperatureC).toBe(20);
    expect(req.grid).toEqual({ startHz: 10, stopHz: 1000, pointsPerOctave: 48 });
    expect(req.paths.map((p) => p.name)).toEqual(['L', 'Sub A', 'Sub B']);
    expect(req.paths[0]).toMatchObject({ filter: { family: 'butterworth', order: 2, response: 'highpass', cornerHz: 80 }, rolloff: TEST_MAIN.lowRolloff, gainDb: 0, delayMs: 5.83, invert: false });
    expect(req.paths[1]).toMatchObject({ filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, rolloff: [TEST_SUB.lowRolloff, TEST_SUB.highRolloff], delayMs: 2.91 });
    expect(req.paths.map((p) => p.distanceM)).toEqual([expect.closeTo(3, 12), expect.closeTo(4, 12), expect.closeTo(5, 12)]);
    expect(req.paths[1]!.gainDb).toBeCloseTo(20 * Math.log10(2 / 3), 12);
    expect(req.paths[2]!.gainDb).toBeCloseTo(20 * Math.log10(1 / 3), 12);
    expect(blendRequestSchema.safeParse(req).success).toBe(true);
  });

  it('a sub moved in the document moves in the request; a unit fewer changes every sub’s level', () => {
    // Sub B from (0, 1) to (3, 1): 4.0 m, like Sub A.
    const moved = blendRequestFromDocument(withSub(testSystem(), 1, { xM: 3 }))!;
    expect(moved.paths[2]!.distanceM).toBeCloseTo(4, 12);
    const fewer = blendRequestFromDocument(withSub(testSystem(), 0, { count: 1 }))!;
    expect(fewer.paths[1]!.gainDb).toBeCloseTo(20 * Math.log10(1 / 2), 12);
    expect(fewer.paths[2]!.gainDb).toBeCloseTo(20 * Math.log10(1 / 2), 12);
  });

  it('another channel, another grid; no speakers → null', () => {
    const req = blendRequestFromDocument(testSystem(), { channel: 'C', startHz: 20, stopHz: 200, pointsPerOctave: 12 })!;
    expect(req.paths[0]!.name).toBe('C');
    expect(req.grid).toEqual({ startHz: 20, stopHz: 200, pointsPerOctave: 12 });
    expect(blendRequestFromDocument({ ...testSystem(), speakers: [] })).toBeNull();
  });
});

const wire = (name: string, response: 'highpass' | 'lowpass' | 'none' = 'none', cornerHz = 80) => ({ name, filter: { family: 'butterworth' as const, order: 2, response, cornerHz }, gainDb: 0, delayMs: 0, invert: false });

describe('blendCrossover: which paths are read as mains and sub', () => {
  it('the first high-pass and the first low-pass path; the crossover the geometric mean of their corners', () => {
    const c = blendCrossover({ paths: [wire('sub', 'lowpass', 50), wire('mains', 'highpass', 200)] });
    expect(c).toEqual({ crossoverHz: 100, source: 'filters', mainsIndex: 1, subIndex: 0 });
  });

  it('the request’s crossover wins; with no filters: path 0 and path 1, and no crossover', () => {
    expect(blendCrossover({ paths: [wire('a'), wire('b')], crossoverHz: 90 })).toEqual({ crossoverHz: 90, source: 'request', mainsIndex: 0, subIndex: 1 });
    expect(blendCrossover({ paths: [wire('a'), wire('b')] })).toEqual({ crossoverHz: null, source: 'filters', mainsIndex: 0, subIndex: 1 });
    expect(blendCrossover({ paths: [wire('a', 'highpass', 60)] })).toEqual({ crossoverHz: 60, source: 'filters', mainsIndex: 0, subIndex: null });
  });
});

describe('computeBlend: the answer of POST /api/v1/blend', () => {
  const request = (crossoverHz?: number): BlendRequest => ({ temperatureC: 20, grid: { startHz: 100, stopHz: 200, pointsPerOctave: 1 }, paths: [wire('a'), wire('b')], ...(crossoverHz ? { crossoverHz } : {}) });

  it('two plain wires: each 0 dB, the sum +6.021 dB (20·log10 2) at every point, no metrics without a crossover', () => {
    const a = computeBlend(request());
    expect(a.frequencyHz).toEqual([100, 200]);
    expect(a.paths.map((p) => p.magnitudeDb)).toEqual([[0, 0], [0, 0]]);
    expect(a.sum.magnitudeDb).toEqual([6.021, 6.021]);
    expect(a.sum.phaseDeg).toEqual([0, 0]);
    expect(a.metrics).toBeNull();
  });

  it('with a crossover: path levels 0 dB, sum +6.021 dB, in phase, perfectly flat', () => {
    const m = computeBlend(request(150)).metrics!;
    expect(m).toMatchObject({ crossoverHz: 150, crossoverSource: 'request', mainsPath: 0, subPath: 1, pathLevelsDb: [0, 0], sumLevelDb: 6.021, phaseDifferenceDeg: 0, flatnessDb: 0, bandHz: [75, 300] });
  });
});
