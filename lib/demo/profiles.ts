import type { SpeakerProfile } from '@/lib/validations/system';

/**
 * Invented demo Speaker profiles. Every name and figure is made up for the demo; none describes
 * a real product. Their back-panel switches (Voicing options) are invented too; each switch's first position is the
 * flat one, so a speaker whose position nobody picked sounds as it did before switches existed.
 */
export const DEMO_PROFILES: SpeakerProfile[] = [
  {
    id: 'quillon-b6',
    name: 'Quillon B6 bookshelf (invented)',
    kind: 'main',
    lowRolloff: { kind: 'sealed', cornerHz: 62, q: 0.71 },
    highRolloff: { kind: 'none' },
    sensitivityDb: 86,
    sensitivityReference: '2.83V',
    ratedPowerW: 120,
    impedanceOhm: 8,
    notes: 'Invented sealed two-way bookshelf for the demo. Two invented back-panel switches: treble and placement.',
    voicingOptions: [
      {
        id: 'treble',
        name: 'Treble',
        positions: [
          { id: 'flat', name: '0 dB', filters: [] },
          { id: 'minus2', name: '−2 dB', filters: [{ kind: 'high-shelf', cornerHz: 3000, gainDb: -2, slope: 1 }] },
          { id: 'plus2', name: '+2 dB', filters: [{ kind: 'high-shelf', cornerHz: 3000, gainDb: 2, slope: 1 }] },
        ],
      },
      {
        id: 'placement',
        name: 'Placement',
        positions: [
          { id: 'free', name: 'Free-standing', filters: [] },
          { id: 'wall', name: 'Near a wall', filters: [{ kind: 'low-shelf', cornerHz: 150, gainDb: -3, slope: 1 }] },
        ],
      },
    ],
  },
  {
    id: 'quillon-t8',
    name: 'Quillon T8 tower (invented)',
    kind: 'main',
    lowRolloff: { kind: 'vented', cornerHz: 38 },
    highRolloff: { kind: 'none' },
    sensitivityDb: 89,
    sensitivityReference: '2.83V',
    ratedPowerW: 250,
    impedanceOhm: 6,
    notes: 'Invented vented floor-standing speaker for the demo. One invented back-panel switch: bass contour.',
    voicingOptions: [
      {
        id: 'bass',
        name: 'Bass contour',
        positions: [
          { id: 'normal', name: 'Normal', filters: [] },
          { id: 'reduced', name: 'Reduced', filters: [{ kind: 'low-shelf', cornerHz: 120, gainDb: -2, q: 0.6 }] },
        ],
      },
    ],
  },
  {
    id: 'marrow-s12',
    name: 'Marrow S12 sealed sub (invented)',
    kind: 'sub',
    lowRolloff: { kind: 'sealed', cornerHz: 24, q: 0.7 },
    highRolloff: { kind: 'lowpass', cornerHz: 200, q: 0.7 },
    sensitivityDb: 88,
    sensitivityReference: '1W',
    ratedPowerW: 500,
    impedanceOhm: 4,
    notes: 'Invented 12-inch sealed subwoofer with its own amplifier (rated power is the built-in amplifier). One invented switch: boundary.',
    voicingOptions: [
      {
        id: 'boundary',
        name: 'Boundary',
        positions: [
          { id: 'open', name: 'Open', filters: [] },
          { id: 'wall', name: 'Near a wall', filters: [{ kind: 'low-shelf', cornerHz: 60, gainDb: -2, slope: 1 }] },
          { id: 'corner', name: 'In a corner', filters: [{ kind: 'low-shelf', cornerHz: 60, gainDb: -4, slope: 1 }] },
        ],
      },
    ],
  },
  {
    id: 'marrow-v15',
    name: 'Marrow V15 vented sub (invented)',
    kind: 'sub',
    lowRolloff: { kind: 'vented', cornerHz: 17 },
    highRolloff: { kind: 'lowpass', cornerHz: 160, q: 0.7 },
    sensitivityDb: 92,
    sensitivityReference: '1W',
    ratedPowerW: 1000,
    impedanceOhm: 4,
    notes: 'Invented 15-inch vented subwoofer with its own amplifier.',
    voicingOptions: [],
  },
];

export function demoProfile(id: string): SpeakerProfile {
  const p = DEMO_PROFILES.find((x) => x.id === id);
  if (!p) throw new Error(`no demo profile "${id}"`);
  return structuredClone(p);
}
