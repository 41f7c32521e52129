import { describe, expect, it } from 'vitest';
import { geometricDistanceM, mlpSeat } from '@/lib/system-model/geometry';
import { applyLessonSweepToDocument, describeSweep, formatSweepValue, sweepChoices, sweepValueAt, type SweepValue } from '@/lib/system-model/lesson-sweep';
import type { Sweep } from '@/lib/validations/lesson';
import { testSystem } from './test-system';

const delay: Sweep = { parameter: 'subDelayMs', from: 0, to: 6, durationS: 4 };
const crossover: Sweep = { parameter: 'crossoverHz', from: 40, to: 160, durationS: 4 };
const polarity: Sweep = { parameter: 'subPolarity', from: 'normal', to: 'inverted', durationS: 4 };
const slopes: Sweep = { parameter: 'filter', from: 'butterworth-2', to: 'butterworth-4', durationS: 4 };
const number = (value: number): SweepValue => ({ kind: 'number', value });

describe('sweepValueAt: the value at a moment of the animation', () => {
  it('linear for a delay (3 ms half-way), geometric for the crossover (80 Hz half-way from 40 to 160 Hz)', () => {
    expect(sweepValueAt(delay, 0.5)).toEqual(number(3));
    expect(sweepValueAt(crossover, 0.5)).toEqual(number(80));
  });

  it('progress is held within 0 … 1 (and NaN is the start)', () => {
    expect(sweepValueAt(delay, -1)).toEqual(number(0));
    expect(sweepValueAt(delay, 2)).toEqual(number(6));
    expect(sweepValueAt(delay, Number.NaN)).toEqual(number(0));
  });

  it('discrete choices each hold an equal share: polarity switches at half-way; BW2 → LR2 → BW3 → BW4 in quarters', () => {
    expect(sweepValueAt(polarity, 0.49)).toEqual({ kind: 'polarity', inverted: false });
    expect(sweepValueAt(polarity, 0.5)).toEqual({ kind: 'polarity', inverted: true });
    expect(sweepChoices(slopes).map((c) => (c.kind === 'filter' ? c.choice : ''))).toEqual(['butterworth-2', 'linkwitz-riley-2', 'butterworth-3', 'butterworth-4']);
    expect(sweepValueAt(slopes, 0.3)).toEqual({ kind: 'filter', choice: 'linkwitz-riley-2' });
    expect(sweepValueAt(slopes, 1)).toEqual({ kind: 'filter', choice: 'butterworth-4' });
  });
});

describe('applyLessonSweepToDocument: the swept value in the document, nothing else', () => {
  it('sub delay: every sub’s own delay (never below 0)', () => {
    const doc = testSystem();
    const out = applyLessonSweepToDocument(doc, delay, number(2.5));
    expect(out.subs.map((s) => s.delayMs)).toEqual([2.5, 2.5]);
    expect({ ...out, subs: doc.subs }).toEqual(doc);
    expect(applyLessonSweepToDocument(doc, delay, number(-1)).subs.map((s) => s.delayMs)).toEqual([0, 0]);
  });

  it('polarity, crossover and slopes: the one field each', () => {
    const doc = testSystem();
    expect(applyLessonSweepToDocument(doc, polarity, { kind: 'polarity', inverted: true }).subs.map((s) => s.invert)).toEqual([true, true]);
    expect(applyLessonSweepToDocument(doc, crossover, number(95)).bassManagement).toEqual({ ...doc.bassManagement, crossoverHz: 95 });
    const lr2 = { family: 'linkwitz-riley', order: 2 };
    expect(applyLessonSweepToDocument(doc, slopes, { kind: 'filter', choice: 'linkwitz-riley-2' }).bassManagement).toEqual({ ...doc.bassManagement, mainsHighpass: lr2, subLowpass: lr2 });
  });

  it('mains gain: every speaker’s trim', () => {
    const out = applyLessonSweepToDocument(testSystem(), { parameter: 'mainsGainDb', from: -3, to: 3, durationS: 4 }, number(-1.5));
    expect(out.speakers.map((s) => s.trimDb)).toEqual([-1.5, -1.5, -1.5]);
  });

  it('sub distance: each sub slides along y (same x and height) to that distance from the MLP; one that cannot stays', () => {
    const doc = testSystem();
    const out = applyLessonSweepToDocument(doc, { parameter: 'subDistanceM', from: 2, to: 6, durationS: 4 }, number(2.5));
    // Sub A is straight ahead of the MLP: 2.5 m away is y = 5 − 2.5 = 2.5 m. Sub B is 3 m to the side: never 2.5 m away.
    expect(out.subs[0]).toEqual({ ...doc.subs[0], yM: 2.5 });
    expect(geometricDistanceM(out.subs[0]!, mlpSeat(out))).toBeCloseTo(2.5, 12);
    expect(out.subs[1]).toEqual(doc.subs[1]);
  });

  it('a value of the wrong kind changes nothing', () => {
    const doc = testSystem();
    expect(applyLessonSweepToDocument(doc, delay, { kind: 'polarity', inverted: true })).toBe(doc);
    expect(applyLessonSweepToDocument(doc, slopes, number(3))).toBe(doc);
  });
});

describe('formatSweepValue and describeSweep: the words on screen', () => {
  it('"sub delay 2.5 ms", "crossover 84 Hz", "mains gain −1.5 dB", "slopes LR2", "sub polarity inverted"', () => {
    expect(formatSweepValue(delay, number(2.5))).toBe('sub delay 2.5\u2009ms');
    expect(formatSweepValue(crossover, number(83.7))).toBe('crossover 84\u2009Hz');
    expect(formatSweepValue({ parameter: 'mainsGainDb', from: -3, to: 3, durationS: 4 }, number(-1.5))).toBe('mains gain \u22121.5\u2009dB');
    expect(formatSweepValue(slopes, { kind: 'filter', choice: 'linkwitz-riley-2' })).toBe('slopes LR2');
    expect(formatSweepValue(polarity, { kind: 'polarity', inverted: true })).toBe('sub polarity inverted');
  });

  it('"sub delay from 0.0 ms to 6.0 ms over 4 s"', () => {
    expect(describeSweep(delay)).toBe('sub delay from 0.0\u2009ms to 6.0\u2009ms over 4 s');
  });
});
