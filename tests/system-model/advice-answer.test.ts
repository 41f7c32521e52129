import { describe, expect, it } from 'vitest';
import type { AdviceComparison, BlendAssessment, SystemModel } from '@/dsp';
import { adviceAnswer, adviceReason, assessmentAnswer, FLATNESS_TEXT, settingsAnswer } from '@/lib/system-model/advice-answer';

/** Assessments and comparisons written by hand (the oracle is the rounding and wording the answer promises). */
const assessment = (flatnessDb: number, minus3DbHz: number | null = 38.123): BlendAssessment => ({
  crossoverHz: 80,
  bandHz: [40, 160],
  referenceHz: 320,
  referenceLevelDb: -1.23456,
  flatnessDb,
  maxDeviationDb: -flatnessDb,
  maxDeviationHz: 63.456,
  deepestDipDb: -flatnessDb - 0.004,
  deepestDipHz: 71.25,
  crossoverLevelDb: -0.126,
  minus3DbHz,
  frequencyHz: new Float64Array(0),
  relativeDb: new Float64Array(0),
});

const comparison = (flatnessGainDb: number): AdviceComparison => ({
  flatnessGainDb,
  extensionLossOctaves: 0.01234,
  bassCutDb: -0.456,
  bassBandHz: [20, 40],
  keepsBass: true,
  notWorse: true,
  worthIt: flatnessGainDb >= 0.5,
});

const model: SystemModel = {
  temperatureC: 20,
  crossoverHz: 80,
  mainsHighpass: { family: 'butterworth', order: 2 },
  subLowpass: { family: 'linkwitz-riley', order: 4 },
  mains: { name: 'L', distanceM: 3, delayMs: 1.2345, gainDb: 0, invert: false },
  subs: [{ name: 'Sub A', distanceM: 4, delayMs: 0.004, gainDb: 0, invert: true }],
};

describe('advice as the API answers it', () => {
  it('assessmentAnswer rounds dB to 0.01 and Hz to 0.1, and keeps a missing −3 dB point as null', () => {
    expect(assessmentAnswer(assessment(3.14159))).toEqual({
      flatnessDb: 3.14,
      maxDeviationDb: -3.14,
      maxDeviationHz: 63.5,
      deepestDipDb: -3.15,
      deepestDipHz: 71.3,
      crossoverLevelDb: -0.13,
      minus3DbHz: 38.1,
      bandHz: [40, 160],
    });
    expect(assessmentAnswer(assessment(1, null)).minus3DbHz).toBeNull();
  });

  it('settingsAnswer: the processor delays to 0.01 ms and each sub’s polarity', () => {
    expect(settingsAnswer(model)).toEqual({ mainsDelayMs: 1.23, subs: [{ name: 'Sub A', delayMs: 0, invert: true }] });
  });

  it('adviceReason: a change states both flatness figures, the gain and the −3 dB point', () => {
    expect(adviceReason(false, assessment(3), assessment(1.5, 41.04), 1.5, comparison(1.5))).toBe('Flatness ±3.00 dB → ±1.50 dB (1.50 dB better); system −3 dB point 41.0 Hz.');
    expect(adviceReason(false, assessment(3), assessment(1.5, null), 1.5, comparison(1.5))).toMatch(/system −3 dB point below 5 Hz\.$/);
  });

  it('adviceReason: keeping says why — too small a gain, or the flatter settings give up bass', () => {
    expect(adviceReason(true, assessment(2), assessment(2), 1.8, comparison(0))).toBe(
      'Keep the present setting (±2.00 dB): no change found gains 0.5 dB or more of flatness (the best gains 0.20 dB), less than a listener could hear in the bass.',
    );
    expect(adviceReason(true, assessment(3), assessment(3), 1, comparison(0))).toMatch(/^Keep the present setting \(±3\.00 dB\): the flatter settings found \(down to ±1\.00 dB\) raise the −3 dB point/);
  });

  it('adviceAnswer carries the settings, both assessments and the comparison, rounded', () => {
    const a = adviceAnswer(false, assessment(3), assessment(1.5), model, comparison(1.5), 1.5);
    expect(a.keep).toBe(false);
    expect(a.set.mainsDelayMs).toBe(1.23);
    expect(a.before.flatnessDb).toBe(3);
    expect(a.after.flatnessDb).toBe(1.5);
    expect({ gainDb: a.gainDb, extensionLossOctaves: a.extensionLossOctaves, bassCutDb: a.bassCutDb }).toEqual({ gainDb: 1.5, extensionLossOctaves: 0.012, bassCutDb: -0.46 });
    expect(FLATNESS_TEXT).toMatch(/4·fc/);
  });
});
