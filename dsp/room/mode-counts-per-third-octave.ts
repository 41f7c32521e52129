import { fractionalOctaveBands } from '../grid/fractional-octave-bands';
import { assertPositive } from '../internal/guards';
import type { RoomMode } from './room-types';

/** Options of {@link modeCountsPerThirdOctave}. */
export interface ModeCountsOptions {
  /** Lowest band centre considered, Hz (default 20). */
  readonly startHz?: number;
  /** Highest band centre considered, Hz (default 200). */
  readonly stopHz?: number;
}

/** One one-third-octave band and the modes inside it. */
export interface ModeBandCount {
  readonly centerHz: number;
  readonly lowerHz: number;
  readonly upperHz: number;
  readonly count: number;
  readonly modes: RoomMode[];
}

/**
 * Number of modes in each IEC 61260-1 base-ten one-third-octave band (lower edge inclusive, upper exclusive).
 * @example modeCountsPerThirdOctave(roomModes({ … }).modes, { startHz: 20, stopHz: 200 })[0].count
 */
export function modeCountsPerThirdOctave(modes: readonly RoomMode[], options: ModeCountsOptions = {}): ModeBandCount[] {
  const startHz = options.startHz ?? 20;
  const stopHz = options.stopHz ?? 200;
  assertPositive('startHz', startHz);
  assertPositive('stopHz', stopHz);
  const bands = fractionalOctaveBands({ fraction: 3, startHz, stopHz });
  const result: ModeBandCount[] = [];
  for (let b = 0; b < bands.centerHz.length; b++) {
    const lowerHz = bands.lowerHz[b] as number;
    const upperHz = bands.upperHz[b] as number;
    const inBand = modes.filter((m) => m.frequencyHz >= lowerHz && m.frequencyHz < upperHz);
    result.push({ centerHz: bands.centerHz[b] as number, lowerHz, upperHz, count: inBand.length, modes: inBand });
  }
  return result;
}
