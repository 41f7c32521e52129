import { describe, expect, it } from 'vitest';
import { blendResponse, type EqFilter } from '@/dsp';
import { DEMO_PROFILES } from '@/lib/demo/profiles';
import { juniperLaneDocument, lindenStreetDocument, newSystemDocument } from '@/lib/demo/systems';
import { blendRequestFromDocument } from '@/lib/system-model/blend';
import { computeMeasured, measuredRequestFromDocument } from '@/lib/system-model/measured';
import { systemModelFromDocument } from '@/lib/system-model/system-from-document';
import { systemModelFromRequest, systemRequestFromModel } from '@/lib/system-model/system-request';
import { timingRequestFromDocument } from '@/lib/system-model/timing';
import { pathsVoicingLine, staleVoicingChoices, voicingFilters, voicingSummary } from '@/lib/system-model/voicing';
import { timingRequestSchema } from '@/lib/validations/compute-blend';
import { predictRequestSchema } from '@/lib/validations/measurement';
import { profileFieldsSchema } from '@/lib/validations/profile';
import { systemDocumentSchema, type SpeakerProfile, type SystemDocument } from '@/lib/validations/system';
import { angleDiffDeg, assertInDelta } from '../helpers/assert-in-delta';
import { cookbookCascade } from '../helpers/cookbook-oracle';
import { testSystem, TEST_MAIN, TEST_SUB, withSpeaker, withSub } from './test-system';

// Invented switches for the tests (no real product's).
const TREBLE_UP: EqFilter = { kind: 'high-shelf', cornerHz: 3000, gainDb: 2, slope: 1 };
const TREBLE_DOWN: EqFilter = { kind: 'high-shelf', cornerHz: 3000, gainDb: -2, slope: 1 };
const WALL: EqFilter = { kind: 'low-shelf', cornerHz: 150, gainDb: -3, slope: 1 };
const BOUNDARY: EqFilter = { kind: 'low-shelf', cornerHz: 60, gainDb: -2, q: 0.7 };
const PROCESSOR_CUT: EqFilter = { kind: 'peaking', centerHz: 42, gainDb: -5, q: 4 };

const MAIN: SpeakerProfile = {
  ...TEST_MAIN,
  voicingOptions: [
    { id: 'treble', name: 'Treble', positions: [{ id: 'flat', name: '0 dB', filters: [] }, { id: 'down', name: '−2 dB', filters: [TREBLE_DOWN] }, { id: 'up', name: '+2 dB', filters: [TREBLE_UP] }] },
    { id: 'placement', name: 'Placement', positions: [{ id: 'free', name: 'Free-standing', filters: [] }, { id: 'wall', name: 'Near a wall', filters: [WALL] }] },
  ],
};
const SUB: SpeakerProfile = { ...TEST_SUB, voicingOptions: [{ id: 'boundary', name: 'Boundary', positions: [{ id: 'open', name: 'Open', filters: [] }, { id: 'wall', name: 'Near a wall', filters: [BOUNDARY] }] }] };

/** The test System with switches on both profiles. */
const voiced = (): SystemDocument => ({ ...testSystem(), profiles: [structuredClone(MAIN), structuredClone(SUB)] });

describe('voicingFilters(profile, choice)', () => {
  it('the chosen position of every switch, in the profile’s order; a switch not named is in its first position', () => {
    expect(voicingFilters(MAIN, { placement: 'wall', treble: 'up' })).toEqual([TREBLE_UP, WALL]);
    expect(voicingFilters(MAIN, { treble: 'down' })).toEqual([TREBLE_DOWN]);
    expect(voicingFilters(MAIN, {})).toEqual([]);
    expect(voicingFilters(undefined, { treble: 'up' })).toEqual([]);
  });
  it('a stale choice (unknown switch or position) falls back to the first position and is listed', () => {
    const choice = { treble: 'plus3', gone: 'x', placement: 'wall' };
    expect(voicingFilters(MAIN, choice)).toEqual([WALL]);
    expect(staleVoicingChoices(MAIN, choice)).toEqual([
      { switchId: 'treble', positionId: 'plus3', missing: 'position', switchName: 'Treble', playsAs: '0 dB' },
      { switchId: 'gone', positionId: 'x', missing: 'switch' },
    ]);
    expect(staleVoicingChoices(MAIN, { treble: 'up' })).toEqual([]);
    expect(voicingSummary(MAIN, choice)).toBe('Treble: 0 dB · Placement: Near a wall');
    expect(voicingSummary(TEST_MAIN, {})).toBeNull();
  });
});

/** Blend's path k of a document, as the Blend route evaluates it (100 points 20 Hz … 20 kHz). */
function blendPath(doc: SystemDocument, k: number, channel = 'L') {
  const body = blendRequestFromDocument(doc, { channel, startHz: 20, stopHz: 20000, pointsPerOctave: 10 })!;
  return { body, result: blendResponse({ temperatureC: body.temperatureC, frequencyHz: Array.from({ length: 100 }, (_, i) => 20 * 1000 ** (i / 99)), paths: body.paths }), k };
}

/** Path k of `after` equals path k of `before` times the cookbook prototypes of `filters` (complex.js oracle). */
function expectTimesFilters(before: SystemDocument, after: SystemDocument, k: number, filters: readonly EqFilter[], channel = 'L') {
  const a = blendPath(before, k, channel).result;
  const b = blendPath(after, k, channel).result;
  Array.from({ length: 100 }, (_, i) => 20 * 1000 ** (i / 99)).forEach((fHz, i) => {
    const { levelDb, phaseDeg } = cookbookCascade(filters, fHz);
    assertInDelta((b.paths[k]!.magnitudeDb[i] as number) - (a.paths[k]!.magnitudeDb[i] as number), levelDb, 1e-9, `path ${k} level at ${fHz.toFixed(1)} Hz`);
    assertInDelta(angleDiffDeg((b.paths[k]!.phaseDeg[i] as number) - (a.paths[k]!.phaseDeg[i] as number), phaseDeg), 0, 1e-7, `path ${k} phase at ${fHz.toFixed(1)} Hz`);
  });
}

describe('the one system model hears the voicing and each sub’s EQ', () => {
  it('L’s switches change Blend’s mains path by exactly their filters (Audio EQ Cookbook, complex.js) and nothing else', () => {
    const after = withSpeaker(voiced(), 'L', { voicing: { treble: 'up', placement: 'wall' } });
    expectTimesFilters(voiced(), after, 0, [TREBLE_UP, WALL]);
    const [before, now] = [blendPath(voiced(), 0).body.paths, blendPath(after, 0).body.paths];
    expect(now[0]!.eq).toEqual([TREBLE_UP, WALL]);
    expect({ ...now[0], eq: undefined }).toEqual({ ...before[0], eq: undefined });
    expect(now.slice(1)).toEqual(before.slice(1));
  });
  it('voicing is per speaker: C’s switch leaves L’s blend as it was, and shows on C’s', () => {
    const doc = withSpeaker(voiced(), 'C', { voicing: { placement: 'wall' } });
    expect(blendPath(doc, 0).body.paths).toEqual(blendPath(voiced(), 0).body.paths);
    expectTimesFilters(voiced(), doc, 0, [WALL], 'C');
  });
  it('a sub runs its voicing then the processor’s EQ: Blend’s sub path is the path without them times both', () => {
    const doc = withSub(voiced(), 1, { voicing: { boundary: 'wall' }, eq: [PROCESSOR_CUT] });
    expect(blendPath(doc, 2).body.paths[2]!.eq).toEqual([BOUNDARY, PROCESSOR_CUT]);
    expectTimesFilters(voiced(), doc, 2, [BOUNDARY, PROCESSOR_CUT]);
    // Sub A is untouched.
    expect(blendPath(doc, 1).body.paths[1]).toEqual(blendPath(voiced(), 1).body.paths[1]);
  });
  it('a stale choice plays as the first position: the same paths as no choice', () => {
    const stale = withSpeaker(voiced(), 'L', { voicing: { treble: 'plus3', gone: 'x' } });
    expect(blendPath(stale, 0).body.paths).toEqual(blendPath(voiced(), 0).body.paths);
    expect(systemDocumentSchema.parse(stale).speakers[0]!.voicing).toEqual({ treble: 'plus3', gone: 'x' });
    expect(pathsVoicingLine(stale, stale.speakers[0]!)).toMatchObject({ staleCount: 2 });
  });
  it('Timing and the Crossover sweep carry the EQ through their request, which the API schema takes, back to the same model', () => {
    const doc = withSub(withSpeaker(voiced(), 'L', { voicing: { placement: 'wall' } }), 0, { eq: [PROCESSOR_CUT] });
    const req = timingRequestFromDocument(doc)!;
    expect(req.mains.eq).toEqual([WALL]);
    expect(req.subs[0]!.eq).toEqual([PROCESSOR_CUT]);
    expect(req.subs[1]!.eq).toBeUndefined();
    const parsed = timingRequestSchema.parse(JSON.parse(JSON.stringify(req)));
    const model = systemModelFromDocument(doc)!;
    expect(systemModelFromRequest(parsed).mains.eq).toEqual(model.mains.eq);
    expect(systemModelFromRequest(parsed).subs[0]!.eq).toEqual(model.subs[0]!.eq);
    expect(systemRequestFromModel(systemModelFromRequest(parsed)).subs).toEqual(req.subs);
  });
  it('the line on Blend names the shown channel’s and each sub’s positions and a sub’s EQ', () => {
    const doc = withSub(withSpeaker(voiced(), 'L', { voicing: { treble: 'up' } }), 1, { eq: [PROCESSOR_CUT] });
    expect(pathsVoicingLine(doc, doc.speakers[0]!)).toEqual({
      text: 'L — Treble: +2 dB · Placement: Free-standing; Sub A — Boundary: Open; Sub B — Boundary: Open · EQ 1 filter',
      staleCount: 0,
    });
    expect(pathsVoicingLine(testSystem(), testSystem().speakers[0]!)).toBeNull();
  });
});

/** A flat invented curve with zero phase, 10 Hz … 1.28 kHz at 6 points per octave. */
const FLAT = (() => {
  const frequencyHz = Array.from({ length: 43 }, (_, i) => 10 * 2 ** (i / 6));
  return { frequencyHz, magnitudeDb: frequencyHz.map(() => 80), phaseDeg: frequencyHz.map(() => 0) };
})();

describe('Measured: the sub’s processor EQ is applied to the measured curves, the voicing is not', () => {
  const predict = (doc: SystemDocument) => {
    const body = measuredRequestFromDocument(doc, { mains: FLAT, sub: FLAT }, { subIndex: 1 })!;
    return { body, answer: computeMeasured(predictRequestSchema.parse(body), { mains: FLAT, sub: FLAT }) };
  };
  it('the request carries the sub’s EQ and not its voicing, and the schema takes it', () => {
    const doc = withSub(withSpeaker(voiced(), 'L', { voicing: { placement: 'wall' } }), 1, { voicing: { boundary: 'wall' }, eq: [PROCESSOR_CUT] });
    const { body } = predict(doc);
    expect(body.sub.processorEq).toEqual([PROCESSOR_CUT]);
    expect(body.mains.processorEq).toBeUndefined();
  });
  it('the processed sub curve is the curve without EQ times the cookbook peaking filter; the measured sum is unchanged', () => {
    const without = predict(voiced()).answer;
    const withEq = predict(withSub(voiced(), 1, { eq: [PROCESSOR_CUT] })).answer;
    withEq.frequencyHz.forEach((fHz, i) => {
      const { levelDb } = cookbookCascade([PROCESSOR_CUT], fHz);
      // The answer's levels are rounded to 0.001 dB.
      assertInDelta((withEq.paths[1]!.magnitudeDb[i] as number) - (without.paths[1]!.magnitudeDb[i] as number), levelDb, 0.0011, `sub at ${fHz} Hz`);
    });
    expect(withEq.paths[0]).toEqual(without.paths[0]);
    expect(withEq.measuredSum).toEqual(without.measuredSum);
    expect(withEq.measured).toEqual(without.measured);
  });
  it('switch positions change nothing on the measured curves (the switch was in the speaker when measured)', () => {
    const switched = withSub(withSpeaker(voiced(), 'L', { voicing: { treble: 'up', placement: 'wall' } }), 1, { voicing: { boundary: 'wall' } });
    expect(predict(switched).answer).toEqual(predict(voiced()).answer);
  });
});

describe('demo data: invented switches, first positions flat', () => {
  it('the demo profiles offer switches whose first position is flat, so the demo Systems sound as before', () => {
    const byId = new Map(DEMO_PROFILES.map((p) => [p.id, p]));
    expect(byId.get('quillon-b6')!.voicingOptions.map((o) => o.name)).toEqual(['Treble', 'Placement']);
    expect(byId.get('quillon-t8')!.voicingOptions).toHaveLength(1);
    expect(byId.get('marrow-s12')!.voicingOptions.map((o) => o.name)).toEqual(['Boundary']);
    for (const p of DEMO_PROFILES) {
      // The seed stores each as a Library profile through this schema (scripts/seed.ts).
      expect(profileFieldsSchema.safeParse(p).success).toBe(true);
      for (const o of p.voicingOptions) expect(o.positions[0]!.filters).toEqual([]);
    }
    for (const doc of [juniperLaneDocument(), lindenStreetDocument(), newSystemDocument()]) {
      expect(systemDocumentSchema.safeParse(doc).success).toBe(true);
      for (const path of blendRequestFromDocument(doc)!.paths) expect(path.eq).toBeUndefined();
    }
  });
});
