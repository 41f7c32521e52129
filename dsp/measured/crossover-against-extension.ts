import { assertPositive } from '../internal/guards';
import type { InRoomExtension } from './in-room-extension';

/** The rule, in words (common practice; REFERENCES.md "Common practice"). */
export const CROSSOVER_CLEARANCE_RULE = 'keep the crossover at least half an octave above the mains’ in-room −3 dB point (common practice)';
/** The rule's margin above the in-room −3 dB point, octaves (common practice). */
export const MIN_OCTAVES_ABOVE_MINUS3DB = 0.5;

/** Options of {@link crossoverAgainstExtension}. */
export interface CrossoverAgainstExtensionOptions {
  readonly crossoverHz: number;
  readonly extension: Pick<InRoomExtension, 'minus3DbHz' | 'minus6DbHz'>;
  /** The lowest frequency of the measurement: when a point is null, it lies below this. */
  readonly lowestMeasuredHz: number;
}

/**
 * 'clear': the rule holds; 'too-close': the crossover is less than half an octave above the −3 dB point;
 * 'unknown': the −3 dB point lies below the data and the data cannot show the rule holds.
 */
export type CrossoverClearance = 'clear' | 'too-close' | 'unknown';

/** How a crossover frequency sits against the mains' in-room roll-off. */
export interface CrossoverAgainstExtension {
  /** log2(crossoverHz / −6 dB point), octaves (negative: below it); null when the point is not in the data. */
  readonly octavesAboveMinus6Db: number | null;
  /** log2(crossoverHz / −3 dB point), octaves; null when the point is not in the data. */
  readonly octavesAboveMinus3Db: number | null;
  readonly clearance: CrossoverClearance;
  readonly rule: string;
}

/**
 * Where a crossover sits against the mains' in-room −3 and −6 dB points (octaves = log2 of the ratio), judged by the
 * common-practice rule: at least half an octave above the in-room −3 dB point. When the −3 dB point is below the data,
 * the rule is known to hold only if the crossover is half an octave above the lowest measured frequency.
 * @example crossoverAgainstExtension({ crossoverHz: 80, extension: { minus3DbHz: 50, minus6DbHz: 40 }, lowestMeasuredHz: 10 }).octavesAboveMinus6Db // 1
 */
export function crossoverAgainstExtension({ crossoverHz, extension, lowestMeasuredHz }: CrossoverAgainstExtensionOptions): CrossoverAgainstExtension {
  assertPositive('crossoverHz', crossoverHz);
  assertPositive('lowestMeasuredHz', lowestMeasuredHz);
  const octaves = (pointHz: number | null) => (pointHz === null ? null : Math.log2(crossoverHz / pointHz));
  const above3 = octaves(extension.minus3DbHz);
  let clearance: CrossoverClearance;
  if (above3 !== null) clearance = above3 >= MIN_OCTAVES_ABOVE_MINUS3DB ? 'clear' : 'too-close';
  else clearance = Math.log2(crossoverHz / lowestMeasuredHz) >= MIN_OCTAVES_ABOVE_MINUS3DB ? 'clear' : 'unknown';
  return {
    octavesAboveMinus6Db: octaves(extension.minus6DbHz),
    octavesAboveMinus3Db: above3,
    clearance,
    rule: CROSSOVER_CLEARANCE_RULE,
  };
}
