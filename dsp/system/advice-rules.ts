import { bandLevelDb, effectiveMinus3Hz, type BlendAssessment } from './blend-assessment';

/**
 * When a change is worth recommending (common practice; DEVELOPERS.md, "One model of the whole system"):
 * - a change in the flatness measure under 0.5 dB is hard to hear in the bass, so it is not worth making;
 * - settings within 0.1 dB of each other are near-equal: the smallest change wins (least delay added, then no flip);
 * - a setting may not raise the system −3 dB point by more than a third of an octave, nor cut the level below the
 *   crossover (the octave fc/4 … fc/2 of the lower crossover of the two) by more than 1 dB.
 */
export const ADVICE_RULES = {
  audibleGainDb: 0.5,
  nearEqualDb: 0.1,
  maxExtensionLossOctaves: 1 / 3,
  maxBassCutDb: 1,
} as const;

/** How one assessed setting compares with another (the present one). */
export interface AdviceComparison {
  /** Flatness before minus after, dB (positive: flatter). */
  readonly flatnessGainDb: number;
  /** How far the −3 dB point moved up, octaves (negative: deeper). */
  readonly extensionLossOctaves: number;
  /** Level below the crossover before minus after, dB (positive: less bass). */
  readonly bassCutDb: number;
  /** The band that bass level is read over, Hz. */
  readonly bassBandHz: readonly [number, number];
  /** Neither the −3 dB point nor the level below the crossover got worse beyond the rules. */
  readonly keepsBass: boolean;
  /** keepsBass and no less flat. */
  readonly notWorse: boolean;
  /** notWorse and at least audibleGainDb flatter. */
  readonly worthIt: boolean;
}

/** Compares `after` with `before` by the rules of {@link ADVICE_RULES}. */
export function compareAssessments(before: BlendAssessment, after: BlendAssessment): AdviceComparison {
  const top = Math.min(before.crossoverHz, after.crossoverHz) / 2;
  const bassBandHz = [top / 2, top] as const;
  const bassCutDb = bandLevelDb(before, bassBandHz[0], bassBandHz[1]) - bandLevelDb(after, bassBandHz[0], bassBandHz[1]);
  const extensionLossOctaves = Math.log2(effectiveMinus3Hz(after) / effectiveMinus3Hz(before));
  const flatnessGainDb = before.flatnessDb - after.flatnessDb;
  const keepsBass = extensionLossOctaves <= ADVICE_RULES.maxExtensionLossOctaves + 1e-9 && !(bassCutDb > ADVICE_RULES.maxBassCutDb + 1e-9);
  const notWorse = keepsBass && flatnessGainDb >= -1e-9;
  return { flatnessGainDb, extensionLossOctaves, bassCutDb, bassBandHz, keepsBass, notWorse, worthIt: notWorse && flatnessGainDb >= ADVICE_RULES.audibleGainDb - 1e-9 };
}
