import { assertPositive, curveFrequencies } from '../internal/guards';
import { bandPowerAverageDb } from './band-power-average';

/** Default band the mains' mean level is taken over, Hz (common practice: above the room's modes, below the tweeter). */
export const EXTENSION_BAND_DEFAULTS = { bandStartHz: 200, bandStopHz: 2000 } as const;

/** Options of {@link inRoomExtension}. */
export interface InRoomExtensionOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  readonly magnitudeDb: Float64Array | readonly number[];
  /** The band the mean level is taken over; default 200 Hz–2 kHz. */
  readonly bandStartHz?: number;
  readonly bandStopHz?: number;
}

/** How low a speaker goes in the room, relative to its own mean level. */
export interface InRoomExtension {
  /** Power mean of the curve over the band (log-frequency weights, as bandPowerAverageDb), dB. */
  readonly meanLevelDb: number;
  readonly bandStartHz: number;
  readonly bandStopHz: number;
  /** Where the curve, going down from the band, first falls 3 dB below the mean; null when it never does in the data. */
  readonly minus3DbHz: number | null;
  readonly minus6DbHz: number | null;
  readonly minus10DbHz: number | null;
}

/**
 * Going down from the band's lowest point, the first frequency where the curve falls `dropDb` below `meanDb`,
 * interpolated linearly in log-frequency between the two grid points around the crossing; null if it never does.
 */
function pointBelowMeanHz(f: Float64Array, db: ArrayLike<number>, fromIndex: number, meanDb: number, dropDb: number): number | null {
  const target = meanDb - dropDb;
  if ((db[fromIndex] as number) <= target) return f[fromIndex] as number;
  for (let i = fromIndex; i > 0; i--) {
    const upper = db[i] as number;
    const lower = db[i - 1] as number;
    if (lower <= target) {
      const t = (upper - target) / (upper - lower);
      const fUpper = f[i] as number;
      const fLower = f[i - 1] as number;
      return fUpper * Math.pow(fLower / fUpper, t);
    }
  }
  return null;
}

/**
 * The in-room extension of a mains measurement: its mean level over a band (default 200 Hz–2 kHz; a power mean, each
 * point weighted by its share of log-frequency) and the −3, −6 and −10 dB points below it — for each, the highest
 * frequency below the band's lowest point where the curve, going down, first falls that far below the mean (linear
 * interpolation in log-frequency between grid points); null when it never falls that far within the data.
 * The −3 dB point of a sealed box follows R. H. Small, "Closed-Box Loudspeaker Systems", J. Audio Eng. Soc. 20, 1972.
 * @example inRoomExtension({ frequencyHz: [50, 100, 200, 2000], magnitudeDb: [-12, -6, 0, 0] }).minus6DbHz // 100
 */
export function inRoomExtension({ frequencyHz, magnitudeDb, bandStartHz, bandStopHz }: InRoomExtensionOptions): InRoomExtension {
  const f = curveFrequencies(frequencyHz, magnitudeDb);
  const startHz = bandStartHz ?? EXTENSION_BAND_DEFAULTS.bandStartHz;
  const stopHz = bandStopHz ?? EXTENSION_BAND_DEFAULTS.bandStopHz;
  assertPositive('bandStartHz', startHz);
  assertPositive('bandStopHz', stopHz);
  if (stopHz <= startHz) throw new RangeError(`bandStopHz must be above bandStartHz (got ${stopHz} ≤ ${startHz})`);
  let meanLevelDb: number;
  try {
    meanLevelDb = bandPowerAverageDb({ frequencyHz: f, magnitudeDb, startHz, stopHz }).levelDb;
  } catch (error) {
    if (error instanceof RangeError) throw new RangeError(`bandStartHz–bandStopHz: ${error.message}`);
    throw error;
  }
  let fromIndex = 0;
  while ((f[fromIndex] as number) < startHz) fromIndex++;
  const at = (dropDb: number) => pointBelowMeanHz(f, magnitudeDb, fromIndex, meanLevelDb, dropDb);
  return {
    meanLevelDb,
    bandStartHz: startHz,
    bandStopHz: stopHz,
    minus3DbHz: at(3),
    minus6DbHz: at(6),
    minus10DbHz: at(10),
  };
}
