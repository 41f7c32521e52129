import { ADVICE_RULES, compareAssessments, type AdviceComparison } from './advice-rules';
import { assessBlend, type BlendAssessment } from './blend-assessment';
import { systemPaths, type SystemModel } from './system-model';
import { searchTiming, smallestChange, type FlatnessVersusShift, type TimingSearchOptions } from './timing-search';

/** A piece of Timing advice: what to set, proven on the whole system, or "keep the present setting" and why. */
export interface TimingAdvice {
  /** True when no change is worth making (the gain would be under ADVICE_RULES.audibleGainDb). */
  readonly keep: boolean;
  readonly present: BlendAssessment;
  /** The system after the advice (the present one when keep). */
  readonly after: BlendAssessment;
  readonly model: SystemModel;
  readonly comparison: AdviceComparison;
  /** The flattest setting found, even one that gives up bass, for the reason text. */
  readonly flattestDb: number;
}

/** Per-sub advice: the delay and polarity of one sub against the rest of the system, or keep. */
export interface SubTimingAdvice extends TimingAdvice {
  readonly subIndex: number;
  readonly shiftMs: number;
  readonly flip: boolean;
  readonly curve: FlatnessVersusShift;
  /** Shifts (same polarity as the advice) whose flatness stays within 1 dB of the advised setting's: the Timing window, ms. */
  readonly windowMs: readonly [number, number];
}

const assess = (m: SystemModel): BlendAssessment => assessBlend({ temperatureC: m.temperatureC, paths: systemPaths(m), crossoverHz: m.crossoverHz });

/** The contiguous shifts around `atMs` (one polarity) whose flatness stays within 1 dB of `levelDb`. */
function windowAround(curve: FlatnessVersusShift, flip: boolean, atMs: number, levelDb: number): [number, number] {
  const v = flip ? curve.flippedDb : curve.normalDb;
  const d = curve.shiftMs;
  let k = 0;
  for (let i = 0; i < d.length; i++) if (Math.abs((d[i] as number) - atMs) < Math.abs((d[k] as number) - atMs)) k = i;
  let lo = k;
  let hi = k;
  while (lo > 0 && (v[lo - 1] as number) <= levelDb + 1) lo--;
  while (hi < d.length - 1 && (v[hi + 1] as number) <= levelDb + 1) hi++;
  return [Math.min(d[lo] as number, atMs), Math.max(d[hi] as number, atMs)];
}

/**
 * Timing advice for one sub: its delay and polarity with the main channel and every other sub as they are
 * (searchTiming). Among the settings that keep the bass, within ADVICE_RULES.audibleGainDb of the flattest and at
 * least that much flatter than the present, the smallest change (least delay moved, then no flip); none: "keep".
 * @example subTimingAdvice(model, 0).keep
 */
export function subTimingAdvice(model: SystemModel, subIndex: number, options: TimingSearchOptions = {}): SubTimingAdvice {
  const r = searchTiming(model, [subIndex], { ...options, withCurve: true });
  const curve = r.curve as FlatnessVersusShift;
  // Near-equal to the flattest (within what a listener could hear) and audibly flatter than the present: the smallest such change.
  const flattestKept = r.candidates[0]?.assessment.flatnessDb ?? r.present.flatnessDb;
  const ceiling = Math.min(flattestKept + ADVICE_RULES.audibleGainDb, r.present.flatnessDb - ADVICE_RULES.audibleGainDb);
  const chosen = smallestChange(r.candidates, ceiling);
  const keep = chosen === null || !chosen.comparison.worthIt;
  const advised = keep || chosen === null ? { shiftMs: 0, flip: false, model, assessment: r.present, comparison: compareAssessments(r.present, r.present) } : chosen;
  return {
    keep,
    present: r.present,
    after: advised.assessment,
    model: advised.model,
    comparison: advised.comparison,
    flattestDb: Math.min(r.flattest.flatnessDb, flattestKept),
    subIndex,
    shiftMs: advised.shiftMs,
    flip: advised.flip,
    curve,
    windowMs: windowAround(curve, advised.flip, advised.shiftMs, advised.assessment.flatnessDb),
  };
}

/**
 * Timing advice for all subs together: coordinate descent over the subs as a group and each sub alone (searchTiming),
 * every step flatter by the measure and keeping the bass of the present setting, until no step gains 0.05 dB (at most
 * four rounds); made only when the result is at least ADVICE_RULES.audibleGainDb flatter than the present.
 * @example groupTimingAdvice(model).model.subs[1].delayMs
 */
export function groupTimingAdvice(model: SystemModel, options: TimingSearchOptions = {}): TimingAdvice {
  const present = assess(model);
  let current = model;
  let currentA = present;
  let flattestDb = present.flatnessDb;
  const everySub = model.subs.map((_, k) => k);
  const movers: number[][] = [everySub, ...(model.subs.length > 1 ? everySub.map((k) => [k]) : [])];
  for (let round = 0; round < 4; round++) {
    let improved = false;
    for (const moved of movers) {
      const r = searchTiming(current, moved, { ...options, baseline: present, withCurve: false });
      flattestDb = Math.min(flattestDb, r.flattest.flatnessDb);
      if (r.best.assessment.flatnessDb < currentA.flatnessDb - 0.05 && r.best.comparison.keepsBass) {
        current = r.best.model;
        currentA = r.best.assessment;
        improved = true;
      }
    }
    if (!improved) break;
  }
  const comparison = compareAssessments(present, currentA);
  const keep = !comparison.worthIt;
  return keep
    ? { keep, present, after: present, model, comparison: compareAssessments(present, present), flattestDb }
    : { keep, present, after: currentA, model: current, comparison, flattestDb };
}

