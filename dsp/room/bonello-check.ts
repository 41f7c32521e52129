import { modeCountsPerThirdOctave, type ModeBandCount } from './mode-counts-per-third-octave';
import { nearCoincidentModes } from './near-coincident-modes';
import type { RoomMode } from './room-types';

/** Options of {@link bonelloCheck}. */
export interface BonelloOptions {
  readonly startHz?: number;
  readonly stopHz?: number;
  /** Two modes closer than this are coincident, Hz (default 0.5 — our own plain choice). */
  readonly coincidenceToleranceHz?: number;
}

/** Result of {@link bonelloCheck}. */
export interface BonelloResult {
  readonly passes: boolean;
  readonly bands: ModeBandCount[];
  /** Centres of bands holding fewer modes than the band below. */
  readonly decreasingAtHz: number[];
  /** Centres of bands with coincident modes and fewer than five modes (from memory of Bonello 1981). */
  readonly coincidencesAtHz: number[];
}

/**
 * Bonello criterion: modes per one-third octave should never decrease with frequency, and bands with fewer than
 * five modes should hold no coincident modes (Bonello, J. Audio Eng. Soc. 29(9), 1981; the five-mode detail from memory).
 * @example bonelloCheck(roomModes({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, maxHz: 250, temperatureC: 20 }).modes).passes
 */
export function bonelloCheck(modes: readonly RoomMode[], options: BonelloOptions = {}): BonelloResult {
  const bands = modeCountsPerThirdOctave(modes, { startHz: options.startHz ?? 20, stopHz: options.stopHz ?? 200 });
  const decreasingAtHz: number[] = [];
  for (let b = 1; b < bands.length; b++) {
    const here = bands[b] as ModeBandCount;
    if (here.count < (bands[b - 1] as ModeBandCount).count) decreasingAtHz.push(here.centerHz);
  }
  const coincidencesAtHz: number[] = [];
  for (const band of bands) {
    if (band.count >= 5) continue;
    if (nearCoincidentModes(band.modes, { toleranceHz: options.coincidenceToleranceHz ?? 0.5 }).length > 0) {
      coincidencesAtHz.push(band.centerHz);
    }
  }
  return { passes: decreasingAtHz.length === 0 && coincidencesAtHz.length === 0, bands, decreasingAtHz, coincidencesAtHz };
}
