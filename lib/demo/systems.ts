import type { Speaker, SystemDocument } from '@/lib/validations/system';
import { SYSTEM_SCHEMA_VERSION } from '@/lib/validations/system';
import { demoProfile } from './profiles';

type SpeakerSeed = Pick<Speaker, 'channel' | 'xM' | 'yM' | 'zM'> & Partial<Speaker>;

function speakers(profileId: string, amplifierPowerW: number, list: SpeakerSeed[]): Speaker[] {
  return list.map((s) => ({
    id: s.channel.toLowerCase(),
    aim: { kind: 'mlp' },
    profileId,
    distanceOverrideM: null,
    trimDb: 0,
    amplifierPowerW,
    voicing: {},
    ...s,
  }));
}

/**
 * The invented "Juniper Lane screening room": 6.4 × 4.9 × 2.7 m, 7.1.4, one sub in the front-left
 * corner and one on the right wall, three seats on the first row (README, "Demo data"). Invented for the demo.
 */
export function juniperLaneDocument(): SystemDocument {
  return {
    schemaVersion: SYSTEM_SCHEMA_VERSION,
    layout: '7.1.4',
    room: { lengthM: 6.4, widthM: 4.9, heightM: 2.7, rt60S: 0.4, temperatureC: 20 },
    seats: [
      { id: 'left', name: 'Row 1 left', xM: 1.75, yM: 3.7, zM: 1.1 },
      { id: 'mlp', name: 'Row 1 centre (MLP)', xM: 2.45, yM: 3.7, zM: 1.1 },
      { id: 'right', name: 'Row 1 right', xM: 3.15, yM: 3.7, zM: 1.1 },
    ],
    mlpSeatId: 'mlp',
    speakers: speakers('quillon-b6', 200, [
      { channel: 'L', xM: 0.79, yM: 0.3, zM: 1.0 },
      { channel: 'C', xM: 2.45, yM: 0.3, zM: 0.8 },
      { channel: 'R', xM: 4.11, yM: 0.3, zM: 1.0 },
      { channel: 'SL', xM: 0.2, yM: 4.1, zM: 1.2 },
      { channel: 'SR', xM: 4.7, yM: 4.1, zM: 1.2 },
      { channel: 'SBL', xM: 1.01, yM: 6.2, zM: 1.2 },
      { channel: 'SBR', xM: 3.89, yM: 6.2, zM: 1.2 },
      { channel: 'TFL', xM: 1.4, yM: 2.0, zM: 2.65 },
      { channel: 'TFR', xM: 3.5, yM: 2.0, zM: 2.65 },
      { channel: 'TRL', xM: 1.4, yM: 5.0, zM: 2.65 },
      { channel: 'TRR', xM: 3.5, yM: 5.0, zM: 2.65 },
    ]),
    subs: [
      { id: 'sub1', name: 'Sub front left', xM: 0.3, yM: 0.3, zM: 0.3, profileId: 'marrow-s12', delayMs: 0, gainDb: 0, invert: false, distanceOverrideM: null, amplifierPowerW: 500, count: 1, voicing: {}, eq: [] },
      { id: 'sub2', name: 'Sub right wall', xM: 4.6, yM: 2.8, zM: 0.3, profileId: 'marrow-s12', delayMs: 0, gainDb: 0, invert: false, distanceOverrideM: null, amplifierPowerW: 500, count: 1, voicing: {}, eq: [] },
    ],
    bassManagement: {
      crossoverHz: 80,
      mainsHighpass: { family: 'butterworth', order: 2 },
      subLowpass: { family: 'linkwitz-riley', order: 4 },
      lfeLowpassHz: 120,
      lfeGainDb: 10,
      mainsDelayMs: 0,
      sampleRateHz: 48000,
    },
    profiles: [demoProfile('quillon-b6'), demoProfile('marrow-s12')],
    notes: 'Invented demo room for Larkspur AV (fictional). One sub in the front-left corner, the other on the right wall 2.8 m from the front (where the client wanted it); first row of three seats at 3.7 m.',
    tags: ['demo', 'home theater', '7.1.4'],
  };
}

/** The invented two-channel "Linden Street den" (2.1: a pair of towers and one sub). */
export function lindenStreetDocument(): SystemDocument {
  return {
    schemaVersion: SYSTEM_SCHEMA_VERSION,
    layout: '2.1',
    room: { lengthM: 5.2, widthM: 3.9, heightM: 2.5, rt60S: 0.45, temperatureC: 21 },
    seats: [{ id: 'mlp', name: 'Listening chair', xM: 1.95, yM: 3.25, zM: 1.05 }],
    mlpSeatId: 'mlp',
    speakers: speakers('quillon-t8', 150, [
      { channel: 'L', xM: 0.65, yM: 1.0, zM: 1.0 },
      { channel: 'R', xM: 3.25, yM: 1.0, zM: 1.0 },
    ]),
    subs: [
      { id: 'sub1', name: 'Sub', xM: 1.2, yM: 0.35, zM: 0.3, profileId: 'marrow-v15', delayMs: 0, gainDb: -2, invert: false, distanceOverrideM: null, amplifierPowerW: 1000, count: 1, voicing: {}, eq: [] },
    ],
    bassManagement: {
      crossoverHz: 60,
      mainsHighpass: { family: 'butterworth', order: 2 },
      subLowpass: { family: 'linkwitz-riley', order: 4 },
      lfeLowpassHz: 120,
      lfeGainDb: 10,
      mainsDelayMs: 0,
      sampleRateHz: 48000,
    },
    profiles: [demoProfile('quillon-t8'), demoProfile('marrow-v15')],
    notes: 'Invented two-channel den. Towers on an equilateral triangle with the chair.',
    tags: ['demo', 'two-channel'],
  };
}

/** A plain starting point for /systems/new: a 5.1 room with one sub. */
export function newSystemDocument(): SystemDocument {
  const doc = juniperLaneDocument();
  return {
    ...doc,
    layout: '5.1',
    speakers: doc.speakers.filter((s) => ['L', 'C', 'R', 'SL', 'SR'].includes(s.channel)),
    subs: doc.subs.slice(0, 1).map((s) => ({ ...s, name: 'Sub' })),
    notes: '',
    tags: [],
  };
}
