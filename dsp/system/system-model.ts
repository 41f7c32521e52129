import type { MeasuredResponse, PathSpec } from '../blend/blend-types';
import type { EqFilter, FilterShape, RolloffChain } from '../filters/filter-types';
import { withoutCommonDelayMs } from '../timing/remove-common-delay';

/** One source of the system as it sounds at the seat: its air path, its processor delay, level and polarity. */
export interface SystemSource {
  readonly name: string;
  /** Air path to the seat, m. */
  readonly distanceM: number;
  /** Processor delay of this source (distance alignment and any extra delay, as the processor runs it), ms ≥ 0. */
  readonly delayMs: number;
  /** Level at the seat relative to level-matched sources, dB. */
  readonly gainDb: number;
  readonly invert: boolean;
  /** The speaker's natural roll-off(s): a main's low roll-off; a sub's [low, upper] roll-offs. */
  readonly rolloff?: RolloffChain;
  /** The EQ this source runs: its speaker's voicing-switch filters and, for a sub, the processor's EQ on its output. */
  readonly eq?: readonly EqFilter[];
  /**
   * This source as measured at the seat, used instead of its model: the measurement holds the speaker's roll-off,
   * voicing, air path and room, so a measured source has no roll-off, voicing EQ or distance of its own (distanceM 0).
   */
  readonly measured?: MeasuredResponse;
}

/** Bass management: the crossover point and the two slopes. */
export interface CrossoverSetting {
  readonly crossoverHz: number;
  readonly mainsHighpass: FilterShape;
  readonly subLowpass: FilterShape;
}

/** One main channel and every sub, as the processor runs them: the whole system behind every plot and piece of advice. */
export interface SystemModel extends CrossoverSetting {
  readonly temperatureC: number;
  readonly mains: SystemSource;
  readonly subs: readonly SystemSource[];
}

/**
 * The paths of a system: the main channel (high-pass at the crossover × its roll-off × its EQ) first, then every sub
 * (low-pass at the crossover × its roll-offs × its EQ), each with its gain, polarity, processor delay and air path. Every evaluation of
 * a System — Blend, the Crossover sweep, Timing, Lessons, Measured — sums exactly these.
 * @example systemPaths(model).length // 1 + model.subs.length
 */
export function systemPaths(model: SystemModel): PathSpec[] {
  const { crossoverHz } = model;
  const path = (s: SystemSource, filter: PathSpec['filter']): PathSpec => ({
    name: s.name,
    filter,
    ...(s.rolloff !== undefined ? { rolloff: s.rolloff } : {}),
    ...(s.eq !== undefined && s.eq.length > 0 ? { eq: s.eq } : {}),
    gainDb: s.gainDb,
    delayMs: s.delayMs,
    invert: s.invert,
    distanceM: s.distanceM,
    ...(s.measured !== undefined ? { measured: s.measured } : {}),
  });
  return [
    path(model.mains, { ...model.mainsHighpass, response: 'highpass', cornerHz: crossoverHz }),
    ...model.subs.map((s) => path(s, { ...model.subLowpass, response: 'lowpass', cornerHz: crossoverHz })),
  ];
}

/**
 * The model with sub k's delay moved by changes[k].shiftMs and its polarity flipped when changes[k].flip; processor
 * delays stay positive: whatever would go below 0 is added to every other source instead, and the delay all sources
 * then share is taken out (a common delay changes no level).
 */
export function retimeSources(model: SystemModel, changes: readonly { readonly shiftMs: number; readonly flip: boolean }[]): SystemModel {
  const [mainsDelayMs, ...subDelaysMs] = withoutCommonDelayMs([model.mains.delayMs, ...model.subs.map((s, k) => s.delayMs + (changes[k]?.shiftMs ?? 0))]);
  return {
    ...model,
    mains: { ...model.mains, delayMs: mainsDelayMs as number },
    subs: model.subs.map((s, k) => ({ ...s, delayMs: subDelaysMs[k] as number, invert: changes[k]?.flip ? !s.invert : s.invert })),
  };
}
