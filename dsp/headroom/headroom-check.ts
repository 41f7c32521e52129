import { assertFinite } from '../internal/guards';
import { maxSplDb, type MaxSplOptions } from './max-spl';
import { powerLimit } from './power-limit';

/** Options of {@link headroomCheck}. */
export interface HeadroomCheckOptions extends MaxSplOptions {
  /** Target peak, dB SPL (REFERENCE_PEAK_DB per channel, LFE_PEAK_DB for the subs). */
  readonly targetPeakDb: number;
  /** The speaker's rated power, W: when the amplifier (powerW) is above it, the rating is the limit. Absent: the amplifier is. */
  readonly ratedPowerW?: number;
}

/** Result of {@link headroomCheck}. */
export interface HeadroomCheckResult {
  /** Maximum SPL at the binding limit (the lower of the amplifier's power and the speaker's rating), dB SPL. */
  readonly maxSplDb: number;
  /** Maximum SPL with the amplifier's full power, dB SPL. */
  readonly amplifierSplDb: number;
  /** Maximum SPL at the speaker's rated power, dB SPL; null without a rating. */
  readonly ratedSplDb: number | null;
  /** Which limit sets maxSplDb. */
  readonly binding: 'amplifier' | 'speaker';
  /** min(powerW, ratedPowerW), W. */
  readonly usablePowerW: number;
  readonly targetPeakDb: number;
  /** maxSplDb − targetPeakDb (at the binding limit); negative is a deficit. */
  readonly headroomDb: number;
  /** max(0, targetPeakDb − maxSplDb). */
  readonly deficitDb: number;
  readonly meetsTarget: boolean;
  /** Power per unit that reaches the target exactly: usable·10^((target − max)/10), W. */
  readonly powerNeededW: number;
}

/**
 * Headroom of a channel or sub group against a target peak (inverse-square law; reference levels per SMPTE RP 200), at
 * the binding limit: the amplifier's power, or the speaker's rating when the amplifier is above it (the maximum SPL at
 * the rating is 10·log10(rated / amplifier) dB from the amplifier's).
 * @example headroomCheck({ sensitivityDb: 87, sensitivityRef: '1W', impedanceOhm: 8, powerW: 100, distanceM: 3, count: 1, targetPeakDb: 105 }).powerNeededW // ≈ 567
 */
export function headroomCheck(options: HeadroomCheckOptions): HeadroomCheckResult {
  assertFinite('targetPeakDb', options.targetPeakDb);
  const amplifierSplDb = maxSplDb(options).splDb;
  const { usablePowerW, binding } = powerLimit({ amplifierPowerW: options.powerW, ...(options.ratedPowerW === undefined ? {} : { ratedPowerW: options.ratedPowerW }) });
  const ratedSplDb = options.ratedPowerW === undefined ? null : maxSplDb({ ...options, powerW: options.ratedPowerW }).splDb;
  const splDb = binding === 'speaker' ? (ratedSplDb as number) : amplifierSplDb;
  const headroomDb = splDb - options.targetPeakDb;
  return {
    maxSplDb: splDb,
    amplifierSplDb,
    ratedSplDb,
    binding,
    usablePowerW,
    targetPeakDb: options.targetPeakDb,
    headroomDb,
    deficitDb: Math.max(0, -headroomDb),
    meetsTarget: headroomDb >= 0,
    powerNeededW: usablePowerW * Math.pow(10, -headroomDb / 10),
  };
}
