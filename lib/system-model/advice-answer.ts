/**
 * Advice as the API answers it and the screens show it: the one flatness measure and the bass read-outs of a
 * setting, the settings a piece of advice would run, and the plain reason when the present setting is kept.
 * Rounded once, here, at the edge.
 */
import { ADVICE_RULES, FLATNESS_DEFINITION, type AdviceComparison, type BlendAssessment, type SystemModel } from '@/dsp';
import { roundTo } from './rounding';

/** One setting's assessment (levels relative to the sum at 4·fc). */
export interface AssessmentAnswer {
  /** The flatness measure: largest deviation of the sum from its level at 4·fc over fc/2 … 2·fc, dB ≥ 0. */
  flatnessDb: number;
  /** The same with its sign, and where. */
  maxDeviationDb: number;
  maxDeviationHz: number;
  deepestDipDb: number;
  deepestDipHz: number;
  crossoverLevelDb: number;
  /** System −3 dB point, Hz; null when the sum is still above it at 5 Hz. */
  minus3DbHz: number | null;
  /** The flatness band, Hz. */
  bandHz: [number, number];
}

export function assessmentAnswer(a: BlendAssessment): AssessmentAnswer {
  return {
    flatnessDb: roundTo(a.flatnessDb, 2),
    maxDeviationDb: roundTo(a.maxDeviationDb, 2),
    maxDeviationHz: roundTo(a.maxDeviationHz, 1),
    deepestDipDb: roundTo(a.deepestDipDb, 2),
    deepestDipHz: roundTo(a.deepestDipHz, 1),
    crossoverLevelDb: roundTo(a.crossoverLevelDb, 2),
    minus3DbHz: a.minus3DbHz === null ? null : roundTo(a.minus3DbHz, 1),
    bandHz: [roundTo(a.bandHz[0], 1), roundTo(a.bandHz[1], 1)],
  };
}

/** The processor delays and polarities a piece of advice runs (the main channel's, then each sub's). */
export interface SettingsAnswer {
  mainsDelayMs: number;
  subs: { name: string; delayMs: number; invert: boolean }[];
}

export function settingsAnswer(model: SystemModel): SettingsAnswer {
  return { mainsDelayMs: roundTo(model.mains.delayMs, 2), subs: model.subs.map((s) => ({ name: s.name, delayMs: roundTo(s.delayMs, 2), invert: s.invert })) };
}

/** A piece of advice: change to `set`, or keep the present setting (`keep`, with the reason). */
export interface AdviceAnswer {
  keep: boolean;
  /** One sentence: what the advice does and what it gains, or why the present setting stays. */
  reason: string;
  set: SettingsAnswer;
  before: AssessmentAnswer;
  after: AssessmentAnswer;
  /** Flatness before minus after, dB. */
  gainDb: number;
  /** −3 dB point moved up by, octaves (negative: deeper). */
  extensionLossOctaves: number;
  /** Level below the crossover lost, dB (negative: gained). */
  bassCutDb: number;
}

const dB = (v: number) => `±${v.toFixed(2)} dB`;

/** The reason text of a piece of advice (or of keeping the present setting). */
export function adviceReason(keep: boolean, present: BlendAssessment, after: BlendAssessment, flattestDb: number, comparison: AdviceComparison): string {
  const threshold = ADVICE_RULES.audibleGainDb;
  if (!keep) {
    const m3 = after.minus3DbHz === null ? 'below 5 Hz' : `${after.minus3DbHz.toFixed(1)} Hz`;
    return `Flatness ${dB(present.flatnessDb)} → ${dB(after.flatnessDb)} (${comparison.flatnessGainDb.toFixed(2)} dB better); system −3 dB point ${m3}.`;
  }
  const gain = present.flatnessDb - flattestDb;
  if (gain >= threshold) {
    return `Keep the present setting (${dB(present.flatnessDb)}): the flatter settings found (down to ${dB(flattestDb)}) raise the −3 dB point by more than a third of an octave or cut the bass below the crossover by more than 1 dB.`;
  }
  return `Keep the present setting (${dB(present.flatnessDb)}): no change found gains ${threshold} dB or more of flatness (the best gains ${Math.max(0, gain).toFixed(2)} dB), less than a listener could hear in the bass.`;
}

export function adviceAnswer(keep: boolean, present: BlendAssessment, after: BlendAssessment, model: SystemModel, comparison: AdviceComparison, flattestDb: number): AdviceAnswer {
  return {
    keep,
    reason: adviceReason(keep, present, after, flattestDb, comparison),
    set: settingsAnswer(model),
    before: assessmentAnswer(present),
    after: assessmentAnswer(after),
    gainDb: roundTo(comparison.flatnessGainDb, 2),
    extensionLossOctaves: roundTo(comparison.extensionLossOctaves, 3),
    bassCutDb: roundTo(comparison.bassCutDb, 2),
  };
}

/** The flatness measure's definition, as every answer states it. */
export const FLATNESS_TEXT = FLATNESS_DEFINITION.text;
