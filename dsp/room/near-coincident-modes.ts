import { assertNonNegative } from '../internal/guards';
import type { RoomMode } from './room-types';

/** Options of {@link nearCoincidentModes}: a fixed tolerance in Hz, or a percentage of the lower mode (default 2 %). */
export interface NearCoincidentOptions {
  readonly toleranceHz?: number;
  readonly tolerancePercent?: number;
}

/** Two modes closer than the tolerance. */
export interface CoincidentPair {
  readonly lower: RoomMode;
  readonly upper: RoomMode;
  readonly separationHz: number;
}

/**
 * Pairs of modes (sorted input) whose frequencies differ by at most the tolerance; coincident modes pile up
 * into one strong resonance (Bonello, J. Audio Eng. Soc. 29(9), 1981). The 2 % default is our own plain choice.
 * @example nearCoincidentModes(modes, { toleranceHz: 0.5 })
 */
export function nearCoincidentModes(modes: readonly RoomMode[], options: NearCoincidentOptions = {}): CoincidentPair[] {
  if (options.toleranceHz !== undefined) assertNonNegative('toleranceHz', options.toleranceHz);
  if (options.tolerancePercent !== undefined) assertNonNegative('tolerancePercent', options.tolerancePercent);
  const sorted = [...modes].sort((a, b) => a.frequencyHz - b.frequencyHz);
  const limitFor = (f: number): number =>
    options.toleranceHz !== undefined ? options.toleranceHz : (f * (options.tolerancePercent ?? 2)) / 100;
  const pairs: CoincidentPair[] = [];
  for (let i = 0; i < sorted.length; i++) {
    const lower = sorted[i] as RoomMode;
    const limit = limitFor(lower.frequencyHz);
    for (let j = i + 1; j < sorted.length; j++) {
      const upper = sorted[j] as RoomMode;
      const separationHz = upper.frequencyHz - lower.frequencyHz;
      if (separationHz > limit) break;
      pairs.push({ lower, upper, separationHz });
    }
  }
  return pairs;
}
