import { lindenStreetDocument } from '@/lib/demo/systems';
import type { LessonPanel, LessonTrace, Sweep } from '@/lib/validations/lesson';
import type { Slope, SystemDocument } from '@/lib/validations/system';

export interface DemoStep {
  title: string;
  points: string;
  panel: LessonPanel;
  traces: LessonTrace[];
  sweep: Sweep | null;
  document: SystemDocument;
}

const LR4: Slope = { family: 'linkwitz-riley', order: 4 };
const BW2: Slope = { family: 'butterworth', order: 2 };

/**
 * The invented "Linden Street den" made into a classroom model: the towers and the sub without
 * their natural roll-offs (so only the crossover filters shape the sum), the chair moved back so
 * that each is exactly 3.0 m away (towers at ±30° at ear height, the sub on the floor), and the
 * processor set to those 3.0 m; 80 Hz, 20 °C. Each Step changes one thing from here:
 * `subAtM` moves the sub (its processor distance stays 3.0 m unless `subSetM` says otherwise).
 */
function classroom(change: { slope?: Slope; invert?: boolean; subAtM?: number; subSetM?: number } = {}): SystemDocument {
  const base = lindenStreetDocument();
  const slope = change.slope ?? LR4;
  const mlp = { xM: 1.95, yM: 4.2, zM: 1.05 };
  // On the floor at x = 1.2 m: dx = −0.75, dz = −0.75, so y = 4.2 − √(d² − 1.125) (geometry).
  const subYM = (d: number) => Math.round((mlp.yM - Math.sqrt(d * d - 1.125)) * 1e4) / 1e4;
  const at30 = { dx: 3.0 * Math.sin(Math.PI / 6), dy: 3.0 * Math.cos(Math.PI / 6) };
  return {
    ...base,
    room: { ...base.room, temperatureC: 20 },
    seats: base.seats.map((s) => ({ ...s, ...mlp })),
    profiles: base.profiles.map((p) =>
      p.kind === 'main'
        ? { ...p, id: 'classroom-main', name: 'Classroom main (no natural roll-off; invented)', lowRolloff: { kind: 'none' } }
        : { ...p, id: 'classroom-sub', name: 'Classroom sub (no natural roll-off; invented)', lowRolloff: { kind: 'none' }, highRolloff: { kind: 'none' } },
    ),
    speakers: base.speakers.map((s) => ({
      ...s,
      xM: Math.round((s.channel === 'L' ? mlp.xM - at30.dx : mlp.xM + at30.dx) * 1e4) / 1e4,
      yM: Math.round((mlp.yM - at30.dy) * 1e4) / 1e4,
      zM: mlp.zM,
      profileId: 'classroom-main',
      distanceOverrideM: 3.0,
      trimDb: 0,
    })),
    subs: base.subs.map((s) => ({ ...s, xM: 1.2, yM: subYM(change.subAtM ?? 3.0), zM: 0.3, profileId: 'classroom-sub', distanceOverrideM: change.subSetM ?? 3.0, gainDb: 0, delayMs: 0, invert: change.invert ?? false })),
    bassManagement: { ...base.bassManagement, crossoverHz: 80, mainsHighpass: { ...slope }, subLowpass: { ...slope }, mainsDelayMs: 0 },
    notes: 'Invented classroom model for the demo Lesson: no natural roll-offs, every speaker 3.0 m from the chair and the processor set to 3.0 m, unless the Step says otherwise.',
    tags: ['demo', 'lesson'],
  };
}

const ALL: LessonTrace[] = ['mains', 'subs', 'sum', 'target'];

/** The invented demo Lesson "Why the sub and mains cancel" (README, "Demo data"). */
export function demoLesson(): { title: string; description: string; steps: DemoStep[] } {
  return {
    title: 'Why the sub and mains cancel',
    description: 'Summation through the crossover in eight Steps: slope, polarity, distance and the crossover point, and the late sub in time. Invented demo material.',
    steps: [
      {
        title: 'LR4: the two halves sum flat',
        panel: 'blend',
        traces: ALL,
        sweep: null,
        document: classroom(),
        points: [
          'Mains high-pass and sub low-pass are both **Linkwitz–Riley 4th order** at 80 Hz, same distance, same polarity.',
          '',
          '- Each half is **−6 dB** at the crossover.',
          '- The two are *in phase* at every frequency, so the voltages add: −6 dB + −6 dB = 0 dB.',
          '- The sum is flat: an all-pass, only its phase turns.',
        ].join('\n'),
      },
      {
        title: 'Flip the sub’s polarity: the null',
        panel: 'blend',
        traces: ALL,
        sweep: { parameter: 'subPolarity', from: 'normal', to: 'inverted', durationS: 6 },
        document: classroom({ invert: true }),
        points: [
          'Same LR4 pair, sub **inverted**.',
          '',
          '- Equal levels, opposite phase at 80 Hz: the sum falls into a deep **null** at the crossover.',
          '- Press space: the sweep plays normal → inverted.',
          '- Ask the class: which switch on the sub amplifier did this?',
        ].join('\n'),
      },
      {
        title: 'BW2 needs the sub inverted: +3 dB',
        panel: 'blend',
        traces: [...ALL, 'phase'],
        sweep: { parameter: 'subPolarity', from: 'inverted', to: 'normal', durationS: 6 },
        document: classroom({ slope: BW2, invert: true }),
        points: [
          '**Butterworth 2nd order** on both sides, sub inverted.',
          '',
          '- Each half is −3 dB at the corner and the two are 180° apart, so inverting one puts them in phase.',
          '- Result: a **+3 dB** bump at the crossover.',
          '- Play the sweep: back to normal polarity and the bump becomes a null.',
        ].join('\n'),
      },
      {
        title: 'BW2 without the inversion: the null',
        panel: 'blend',
        traces: [...ALL, 'phase'],
        sweep: null,
        document: classroom({ slope: BW2 }),
        points: [
          'The same BW2 pair with both in normal polarity.',
          '',
          '- The phase plot shows the halves **180° apart** at 80 Hz.',
          '- −3 dB and −3 dB in opposite phase cancel: a **null**.',
          '- Same filters as the step before; only the polarity differs: *+3 dB versus a null*.',
        ].join('\n'),
      },
      {
        title: 'One metre further: 84° late at 80 Hz',
        panel: 'timing',
        traces: [...ALL, 'phase'],
        sweep: { parameter: 'subDistanceM', from: 3.0, to: 4.0, durationS: 6 },
        document: classroom({ subAtM: 4.0 }),
        points: [
          'Back to LR4, but the sub has been moved **1 m farther** from the chair (4.0 m against 3.0 m) and the processor still thinks it is 3.0 m away.',
          '',
          '- 1 m of air at 20 °C is **2.91 ms**.',
          '- At 80 Hz one period is 12.5 ms, so 2.91 ms is **84°** of phase.',
          '- Watch the phase difference read-out grow from 0° to about 84° as the sweep moves the sub back.',
        ].join('\n'),
      },
      {
        title: 'The distance setting that fixes it',
        panel: 'timing',
        traces: ALL,
        sweep: null,
        document: classroom({ subAtM: 4.0, subSetM: 4.0 }),
        points: [
          'The sub is still 1 m farther, so its sound arrives **2.91 ms late** — unless the processor knows.',
          '',
          '- Set the sub’s **distance to 4.0 m** on the processor: it delays the **mains** by 2.91 ms (a processor only adds delay).',
          '- Both arrive together again: phase difference ≈ 0°, the sum is flat.',
          '- The Settings sheet shows that delay on every main channel.',
        ].join('\n'),
      },
      {
        title: 'Crossover sweep: 60 to 120 Hz in the den',
        panel: 'blend',
        traces: ALL,
        sweep: { parameter: 'crossoverHz', from: 60, to: 120, durationS: 8 },
        document: lindenStreetDocument(),
        points: [
          'Now the real pairing of the invented Linden Street den: the towers (BW2 high-pass, vented roll-off) and its sub (LR4 low-pass), at their real distances.',
          '',
          '- Play the sweep: the crossover moves from **60 Hz to 120 Hz**.',
          '- Where does the sum stay flattest? Where does the dip appear?',
          '- Mismatched slopes and the speakers’ own roll-offs mean the best point is not simply “80 Hz”.',
        ].join('\n'),
      },
      {
        title: 'The late sub in time: the same metre as a later step',
        panel: 'time',
        traces: ['mains', 'subs', 'sum'],
        sweep: { parameter: 'subDistanceM', from: 3.0, to: 4.0, durationS: 6 },
        document: classroom({ subAtM: 4.0 }),
        points: [
          'Back to the LR4 classroom with the sub **1 m farther** (4.0 m; the processor still set to 3.0 m), now seen **in time** instead of in phase.',
          '',
          '- Top: each path’s impulse. The mains’ is a narrow spike; the sub’s, through its low-pass, a slow hump.',
          '- Bottom: the step. The sub’s rises slowly and peaks well after the mains’: part of that is its low-pass, and **2.91 ms** is the extra metre of air.',
          '- The dashed lines mark when each sound arrives; the sentence under the plot reads the gap off the curves.',
          '- Play the sweep: the sub walks back from 3.0 m to 4.0 m and its step slides later.',
        ].join('\n'),
      },
    ],
  };
}
