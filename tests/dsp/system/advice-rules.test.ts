import { describe, expect, it } from 'vitest';
import { ADVICE_RULES, assessBlend, compareAssessments, type BlendAssessment, type PathSpec } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

/**
 * An invented assessment for the rules alone: the sum flat at `bassDb` below the reference everywhere (so any band
 * level reads bassDb), the given flatness and −3 dB point. Only the fields compareAssessments reads matter.
 */
function assessment({ crossoverHz = 80, flatnessDb = 3, minus3DbHz = 30 as number | null, bassDb = 0 }): BlendAssessment {
  const frequencyHz = Float64Array.from({ length: 8 * 48 + 1 }, (_, k) => 5 * Math.pow(2, k / 48));
  return {
    crossoverHz,
    bandHz: [crossoverHz / 2, 2 * crossoverHz],
    referenceHz: 4 * crossoverHz,
    referenceLevelDb: 0,
    flatnessDb,
    maxDeviationDb: flatnessDb,
    maxDeviationHz: crossoverHz,
    deepestDipDb: -flatnessDb,
    deepestDipHz: crossoverHz,
    crossoverLevelDb: 0,
    minus3DbHz,
    frequencyHz,
    relativeDb: new Float64Array(frequencyHz.length).fill(bassDb),
  };
}

describe('ADVICE_RULES / compareAssessments (common practice: a level change under 0.5 dB is hard to hear in the bass)', () => {
  it('the rules: 0.5 dB audible gain, 0.1 dB near-equal, a third of an octave of extension, 1 dB of bass', () => {
    expect(ADVICE_RULES).toEqual({ audibleGainDb: 0.5, nearEqualDb: 0.1, maxExtensionLossOctaves: 1 / 3, maxBassCutDb: 1 });
  });
  it('0.6 dB flatter with the same bass is worth it; 0.4 dB flatter is not worse but not worth it; 0.1 dB less flat is worse', () => {
    const before = assessment({ flatnessDb: 3 });
    const worth = compareAssessments(before, assessment({ flatnessDb: 2.4 }));
    assertInDelta(worth.flatnessGainDb, 0.6, 1e-12);
    expect([worth.keepsBass, worth.notWorse, worth.worthIt]).toEqual([true, true, true]);
    const small = compareAssessments(before, assessment({ flatnessDb: 2.6 }));
    expect([small.keepsBass, small.notWorse, small.worthIt]).toEqual([true, true, false]);
    const worse = compareAssessments(before, assessment({ flatnessDb: 3.1 }));
    expect([worse.keepsBass, worse.notWorse, worse.worthIt]).toEqual([true, false, false]);
  });
  it('the −3 dB point may rise a third of an octave: 30 → 37.5 Hz (0.32 oct) keeps the bass, 30 → 40 Hz (0.415 oct) does not', () => {
    const before = assessment({ minus3DbHz: 30 });
    const up = compareAssessments(before, assessment({ flatnessDb: 1, minus3DbHz: 37.5 }));
    assertInDelta(up.extensionLossOctaves, Math.log2(1.25), 1e-12);
    expect(up.worthIt).toBe(true);
    const tooFar = compareAssessments(before, assessment({ flatnessDb: 1, minus3DbHz: 40 }));
    expect([tooFar.keepsBass, tooFar.notWorse, tooFar.worthIt]).toEqual([false, false, false]);
    // Deeper is always fine: 30 → 20 Hz is −0.585 octave.
    assertInDelta(compareAssessments(before, assessment({ minus3DbHz: 20 })).extensionLossOctaves, Math.log2(20 / 30), 1e-12);
  });
  it('no −3 dB point above 5 Hz counts as 5 Hz: none → 6 Hz (0.26 oct) keeps the bass, none → 6.5 Hz (0.38 oct) does not', () => {
    const before = assessment({ minus3DbHz: null });
    expect(compareAssessments(before, assessment({ flatnessDb: 1, minus3DbHz: 6 })).keepsBass).toBe(true);
    expect(compareAssessments(before, assessment({ flatnessDb: 1, minus3DbHz: 6.5 })).keepsBass).toBe(false);
  });
  it('the level below the crossover may drop 1 dB: 0.9 dB less keeps the bass, 1.5 dB less does not', () => {
    const before = assessment({ bassDb: -2 });
    const little = compareAssessments(before, assessment({ flatnessDb: 1, bassDb: -2.9 }));
    assertInDelta(little.bassCutDb, 0.9, 1e-9);
    expect(little.worthIt).toBe(true);
    const much = compareAssessments(before, assessment({ flatnessDb: 1, bassDb: -3.5 }));
    assertInDelta(much.bassCutDb, 1.5, 1e-9);
    expect([much.keepsBass, much.worthIt]).toEqual([false, false]);
    // More bass is never a cut that breaks the rule.
    expect(compareAssessments(before, assessment({ flatnessDb: 1, bassDb: 2 })).keepsBass).toBe(true);
  });
  it('the bass band is the octave fc/4 … fc/2 of the lower of the two crossovers: 80 and 60 Hz → 15–30 Hz', () => {
    expect(compareAssessments(assessment({ crossoverHz: 80 }), assessment({ crossoverHz: 60 })).bassBandHz).toEqual([15, 30]);
    expect(compareAssessments(assessment({ crossoverHz: 60 }), assessment({ crossoverHz: 80 })).bassBandHz).toEqual([15, 30]);
  });
  it('on real blends: an LR4 pair with the sub inverted, put right, is worth it; the other way round is worse (published: Linkwitz 1976)', () => {
    const lr4 = (response: 'highpass' | 'lowpass', invert: boolean): PathSpec => ({ name: response, filter: { family: 'linkwitz-riley', order: 4, response, cornerHz: 80 }, gainDb: 0, delayMs: 0, invert });
    const right = assessBlend({ temperatureC: 20, crossoverHz: 80, paths: [lr4('highpass', false), lr4('lowpass', false)] });
    const inverted = assessBlend({ temperatureC: 20, crossoverHz: 80, paths: [lr4('highpass', false), lr4('lowpass', true)] });
    expect(compareAssessments(inverted, right).worthIt).toBe(true);
    expect(compareAssessments(right, inverted).notWorse).toBe(false);
  });
});
