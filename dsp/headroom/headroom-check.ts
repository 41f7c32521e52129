import { assertFinite } from '../internal/guards';
import { maxSplDb, type MaxSplOptions } from './max-spl';

/** Options of {@link headroomCheck}. */
export interface HeadroomCheckOptions extends MaxSplOptions {
  /** Target peak, dB SPL (REFERENCE_PEAK_DB per channel, LFE_PEAK_DB for the subs). */
  readonly targetPeakDb: number;
}

/** Result of {@link headroomCheck}. */
export interface HeadroomCheckResult {
  readonly maxSplDb: number;
  readonly targetPeakDb: number;
  /** maxSplDb − targetPeakDb; negative is a deficit. */
  readonly headroomDb: number;
  /** max(0, targetPeakDb − maxSplDb). */
  readonly deficitDb: number;
  readonly meetsTarget: boolean;
  /** Amplifier power per unit that reaches the target exactly: P·10^((target − max)/10), W. */
  readonly powerNeededW: number;
}

/**
 * Headroom of a channel or sub group against a target peak (inverse-square law; reference levels per SMPTE RP 200).
 * @example headroomCheck({ sensitivityDb: 87, sensitivityRef: '1W', impedanceOhm: 8, powerW: 100, distanceM: 3, count: 1, targetPeakDb: 105 }).powerNeededW // ≈ 567
 */
export function headroomCheck(options: HeadroomCheckOptions): HeadroomCheckResult {
  assertFinite('targetPeakDb', options.targetPeakDb);
  const { splDb } = maxSplDb(options);
  const headroomDb = splDb - options.targetPeakDb;
  return {
    maxSplDb: splDb,
    targetPeakDb: options.targetPeakDb,
    headroomDb,
    deficitDb: Math.max(0, -headroomDb),
    meetsTarget: headroomDb >= 0,
    powerNeededW: options.powerW * Math.pow(10, -headroomDb / 10),
  };
}
