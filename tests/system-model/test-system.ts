/**
 * An invented System whose distances can be worked out by hand: a 7 × 6 × 3 m room at 20 °C, the MLP at
 * (3, 5, 1.2) m, L, C and R at ear height 3.0 m from it (a 1.8–2.4–3.0 m triangle for L and R, 3.0 m straight
 * ahead for C), "Sub A" (two units) on a stand 4.0 m straight ahead, "Sub B" (one unit) 5.0 m away (a 3–4–5 m
 * triangle). Profiles, names and figures are made up for the tests.
 */
import type { SpeakerProfile, Speaker, Sub, SystemDocument } from '@/lib/validations/system';

/** Milliseconds of air path per metre at 20 °C: 1000 / (331.3·√(1 + 20/273.15)) m/s (Kinsler et al. 2000). */
export const MS_PER_METRE_20C = 1000 / (331.3 * Math.sqrt(1 + 20 / 273.15));

export const TEST_MAIN: SpeakerProfile = {
  id: 'test-main',
  name: 'Test main (invented)',
  kind: 'main',
  lowRolloff: { kind: 'sealed', cornerHz: 50, q: 0.7 },
  highRolloff: { kind: 'none' },
  sensitivityDb: 88,
  sensitivityReference: '2.83V',
  ratedPowerW: 150,
  impedanceOhm: 8,
  notes: 'Invented for the tests.',
  voicingOptions: [],
};

export const TEST_SUB: SpeakerProfile = {
  id: 'test-sub',
  name: 'Test sub (invented)',
  kind: 'sub',
  lowRolloff: { kind: 'vented', cornerHz: 20 },
  highRolloff: { kind: 'lowpass', cornerHz: 180, q: 0.7 },
  sensitivityDb: 90,
  sensitivityReference: '1W',
  ratedPowerW: 400,
  impedanceOhm: 4,
  notes: 'Invented for the tests.',
  voicingOptions: [],
};

const speaker = (channel: Speaker['channel'], xM: number, yM: number): Speaker => ({
  id: channel.toLowerCase(),
  channel,
  xM,
  yM,
  zM: 1.2,
  aim: { kind: 'mlp' },
  profileId: TEST_MAIN.id,
  distanceOverrideM: null,
  trimDb: 0,
  amplifierPowerW: 100,
  voicing: {},
});

const sub = (id: string, name: string, xM: number, count: number): Sub => ({
  id,
  name,
  xM,
  yM: 1,
  zM: 1.2,
  profileId: TEST_SUB.id,
  delayMs: 0,
  gainDb: 0,
  invert: false,
  distanceOverrideM: null,
  amplifierPowerW: 300,
  count,
  voicing: {},
  eq: [],
});

/** A fresh copy of the test System every call, so a test can never change another's. */
export function testSystem(): SystemDocument {
  return {
    schemaVersion: 1,
    layout: '3.1',
    room: { lengthM: 7, widthM: 6, heightM: 3, rt60S: 0.4, temperatureC: 20 },
    seats: [
      { id: 'mlp', name: 'Centre chair', xM: 3, yM: 5, zM: 1.2 },
      { id: 'side', name: 'Side chair', xM: 4, yM: 5, zM: 1.2 },
    ],
    mlpSeatId: 'mlp',
    speakers: [speaker('L', 1.2, 2.6), speaker('C', 3, 2), speaker('R', 4.8, 2.6)],
    subs: [sub('sub-a', 'Sub A', 3, 2), sub('sub-b', 'Sub B', 0, 1)],
    bassManagement: {
      crossoverHz: 80,
      mainsHighpass: { family: 'butterworth', order: 2 },
      subLowpass: { family: 'linkwitz-riley', order: 4 },
      lfeLowpassHz: 120,
      lfeGainDb: 10,
      mainsDelayMs: 0,
      sampleRateHz: 48000,
    },
    profiles: [structuredClone(TEST_MAIN), structuredClone(TEST_SUB)],
    notes: 'Invented test System.',
    tags: ['test'],
  };
}

/** The document with `patch` applied to the sub at index k. */
export function withSub(doc: SystemDocument, k: number, patch: Partial<Sub>): SystemDocument {
  return { ...doc, subs: doc.subs.map((s, i) => (i === k ? { ...s, ...patch } : s)) };
}

/** The document with `patch` applied to the speaker of `channel`. */
export function withSpeaker(doc: SystemDocument, channel: string, patch: Partial<Speaker>): SystemDocument {
  return { ...doc, speakers: doc.speakers.map((s) => (s.channel === channel ? { ...s, ...patch } : s)) };
}
