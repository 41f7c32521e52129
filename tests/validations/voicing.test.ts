import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { blendRequestSchema, timingRequestSchema } from '@/lib/validations/compute-blend';
import { predictRequestSchema } from '@/lib/validations/measurement';
import { profileFieldsSchema } from '@/lib/validations/profile';
import { speakerProfileSchema, systemDocumentSchema } from '@/lib/validations/system';
import { testSystem, TEST_MAIN } from '../system-model/test-system';

// Voicing options on a Speaker profile, the voicing chosen per speaker and sub, each sub's processor EQ, and the EQ the
// compute requests carry: accepted as written, refused with the field's path. Switches and names are invented.

const pathsOf = (schema: z.ZodType, body: unknown): string[] => {
  const r = schema.safeParse(body);
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
};

const TREBLE = {
  id: 'treble',
  name: 'Treble',
  positions: [
    { id: 'flat', name: '0 dB', filters: [] },
    { id: 'up', name: '+2 dB', filters: [{ kind: 'high-shelf', cornerHz: 3000, gainDb: 2, slope: 1 }] },
  ],
};
const profile = (voicingOptions: unknown) => ({ ...TEST_MAIN, voicingOptions });

describe('speakerProfileSchema.voicingOptions', () => {
  it('accepts switches of 2–6 positions of up to 4 filters; absent means none', () => {
    expect(speakerProfileSchema.parse(profile([TREBLE])).voicingOptions).toEqual([TREBLE]);
    const without: Partial<typeof TEST_MAIN> = { ...TEST_MAIN };
    delete without.voicingOptions;
    expect(speakerProfileSchema.parse(without).voicingOptions).toEqual([]);
    expect(profileFieldsSchema.safeParse({ ...without, voicingOptions: [TREBLE] }).success).toBe(true);
  });
  it('refuses with the field path', () => {
    expect(pathsOf(speakerProfileSchema, profile([{ ...TREBLE, positions: [TREBLE.positions[0]] }]))).toEqual(['voicingOptions.0.positions']);
    expect(pathsOf(speakerProfileSchema, profile([{ ...TREBLE, positions: [TREBLE.positions[0], { ...TREBLE.positions[1], id: 'flat' }] }]))).toEqual(['voicingOptions.0.positions.1.id']);
    expect(pathsOf(speakerProfileSchema, profile([TREBLE, { ...TREBLE, name: 'Treble again' }]))).toEqual(['voicingOptions.1.id']);
    expect(pathsOf(speakerProfileSchema, profile([TREBLE, { ...TREBLE, id: 'b' }, { ...TREBLE, id: 'c' }, { ...TREBLE, id: 'd' }, { ...TREBLE, id: 'e' }]))).toEqual(['voicingOptions']);
    expect(pathsOf(speakerProfileSchema, profile([{ ...TREBLE, name: ' ' }]))).toEqual(['voicingOptions.0.name']);
    expect(pathsOf(speakerProfileSchema, profile([{ ...TREBLE, id: 'no spaces' }]))).toEqual(['voicingOptions.0.id']);
    const filters = (f: unknown[]) => profile([{ ...TREBLE, positions: [TREBLE.positions[0], { ...TREBLE.positions[1], filters: f }] }]);
    const shelf = TREBLE.positions[1]!.filters[0]!;
    expect(pathsOf(speakerProfileSchema, filters([shelf, shelf, shelf, shelf, shelf]))).toEqual(['voicingOptions.0.positions.1.filters']);
    expect(pathsOf(speakerProfileSchema, filters([{ ...shelf, q: 0.7 }]))).toEqual(['voicingOptions.0.positions.1.filters.0.slope']);
    expect(pathsOf(speakerProfileSchema, filters([{ ...shelf, gainDb: 30 }]))).toEqual(['voicingOptions.0.positions.1.filters.0.gainDb']);
    expect(pathsOf(speakerProfileSchema, filters([{ kind: 'notch', cornerHz: 100, gainDb: 0 }]))).toEqual(['voicingOptions.0.positions.1.filters.0.kind']);
    expect(pathsOf(speakerProfileSchema, filters([{ kind: 'peaking', centerHz: 40, gainDb: -3 }]))).toEqual(['voicingOptions.0.positions.1.filters.0.q']);
  });
});

describe('the System document: voicing per speaker and sub, each sub’s EQ', () => {
  it('accepts a choice (kept even when the profile has no such switch) and peaking EQ on a sub; both default empty', () => {
    const doc = testSystem();
    doc.speakers[0]!.voicing = { treble: 'up', gone: 'x' };
    doc.subs[0]!.eq = [{ kind: 'peaking', centerHz: 42, gainDb: -5, q: 4 }];
    const parsed = systemDocumentSchema.parse(doc);
    expect(parsed.speakers[0]!.voicing).toEqual({ treble: 'up', gone: 'x' });
    expect(parsed.subs[0]!.eq).toHaveLength(1);
    const bare = JSON.parse(JSON.stringify(testSystem())) as { speakers: Record<string, unknown>[]; subs: Record<string, unknown>[] };
    delete bare.speakers[0]!.voicing;
    delete bare.subs[0]!.voicing;
    delete bare.subs[0]!.eq;
    const read = systemDocumentSchema.parse(bare);
    expect([read.speakers[0]!.voicing, read.subs[0]!.voicing, read.subs[0]!.eq]).toEqual([{}, {}, []]);
  });
  it('refuses with the field path', () => {
    const withSubEq = (eq: unknown) => ({ ...testSystem(), subs: testSystem().subs.map((s, i) => (i === 1 ? { ...s, eq } : s)) });
    const cut = { kind: 'peaking', centerHz: 42, gainDb: -5, q: 4 };
    // A sub's processor EQ is peaking filters only: a shelf is refused at its kind (and the peaking fields it lacks).
    expect(pathsOf(systemDocumentSchema, withSubEq([{ kind: 'low-shelf', cornerHz: 60, gainDb: -2 }]))).toContain('subs.1.eq.0.kind');
    expect(pathsOf(systemDocumentSchema, withSubEq(Array.from({ length: 11 }, () => cut)))).toEqual(['subs.1.eq']);
    expect(pathsOf(systemDocumentSchema, withSubEq([{ ...cut, q: 0 }]))).toEqual(['subs.1.eq.0.q']);
    const badChoice = { ...testSystem(), speakers: testSystem().speakers.map((s, i) => (i === 2 ? { ...s, voicing: { treble: 'not ok' } } : s)) };
    expect(pathsOf(systemDocumentSchema, badChoice)).toEqual(['speakers.2.voicing.treble']);
  });
});

describe('the compute requests’ EQ (POST /api/v1/blend, /timing, /crossover-sweep, /measured/predict)', () => {
  const path = { name: 'sub', filter: { family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false };
  const blend = (eq: unknown) => ({ temperatureC: 20, grid: { startHz: 10, stopHz: 1000, pointsPerOctave: 12 }, paths: [{ ...path, filter: { ...path.filter, response: 'highpass' } }, { ...path, eq }] });
  const cut = { kind: 'peaking', centerHz: 42, gainDb: -5, q: 4 };
  it('a path takes up to 26 peaking or shelf filters', () => {
    expect(blendRequestSchema.parse(blend([cut, { kind: 'low-shelf', cornerHz: 60, gainDb: -2, slope: 0.8 }])).paths[1]!.eq).toHaveLength(2);
    expect(pathsOf(blendRequestSchema, blend(Array.from({ length: 26 }, () => cut)))).toEqual([]);
    expect(pathsOf(blendRequestSchema, blend(Array.from({ length: 27 }, () => cut)))).toEqual(['paths.1.eq']);
    expect(pathsOf(blendRequestSchema, blend([{ ...cut, centerHz: -1 }]))).toEqual(['paths.1.eq.0.centerHz']);
  });
  it('Timing’s mains and subs take EQ; a bad filter names its path', () => {
    const timing = { crossoverHz: 80, mainsHighpass: { family: 'butterworth', order: 2 }, subLowpass: { family: 'linkwitz-riley', order: 4 }, mains: { distanceM: 3, eq: [cut] }, subs: [{ name: 'Sub', distanceM: 4, eq: [cut] }] };
    expect(timingRequestSchema.parse(timing).subs[0]!.eq).toEqual([cut]);
    expect(pathsOf(timingRequestSchema, { ...timing, subs: [{ name: 'Sub', distanceM: 4, eq: [{ ...cut, gainDb: 25 }] }] })).toEqual(['subs.0.eq.0.gainDb']);
    expect(pathsOf(timingRequestSchema, { ...timing, mains: { distanceM: 3, eq: 'flat' } })).toEqual(['mains.eq']);
  });
  it('the predict request’s sub takes the processor’s EQ', () => {
    const curve = { frequencyHz: [20, 40, 80, 160, 320, 640, 1280, 2560], magnitudeDb: [0, 0, 0, 0, 0, 0, 0, 0] };
    const body = { temperatureC: 20, crossoverHz: 80, mainsHighpass: { family: 'butterworth', order: 2 }, subLowpass: { family: 'linkwitz-riley', order: 4 }, mains: { curve, gainDb: 0, delayMs: 0, invert: false }, sub: { curve, gainDb: 0, delayMs: 0, invert: false, processorEq: [cut] } };
    expect(predictRequestSchema.parse(body).sub.processorEq).toEqual([cut]);
    expect(pathsOf(predictRequestSchema, { ...body, sub: { ...body.sub, processorEq: [{ ...cut, q: 50 }] } })).toEqual(['sub.processorEq.0.q']);
  });
});
