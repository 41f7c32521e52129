import { assertFinite, assertIntegerInRange, assertPositive } from '../internal/guards';

/** Reference level per screen channel, dB SPL, at −20 dBFS pink noise (SMPTE RP 200). */
export const REFERENCE_LEVEL_DB = 85;
/** Peak level per channel at reference, dB SPL (85 + 20). */
export const REFERENCE_PEAK_DB = 105;
/** LFE peak level, dB SPL: +10 dB in-band gain on top of 105 (common practice, LFE convention). */
export const LFE_PEAK_DB = 115;

/** Options of {@link maxSplDb}. */
export interface MaxSplOptions {
  /** Sensitivity, dB SPL at 1 m for 1 W or for 2.83 V. */
  readonly sensitivityDb: number;
  readonly sensitivityRef: '1W' | '2.83V';
  /** Nominal impedance, Ω (turns a 2.83 V rating into a 1 W one). */
  readonly impedanceOhm: number;
  readonly powerW: number;
  readonly distanceM: number;
  /** Identical units driven together (≥ 1). */
  readonly count: number;
  /** Boundary / room gain added on top of free field, dB (default 0). */
  readonly roomGainDb?: number;
  /** 'coherent' (+20·log10 N, in phase at low frequency, default) or 'power' (+10·log10 N, uncorrelated). */
  readonly summation?: 'coherent' | 'power';
}

/** Result of {@link maxSplDb}. */
export interface MaxSplResult {
  readonly splDb: number;
  readonly perUnitSplDb: number;
  readonly sensitivity1WDb: number;
  readonly countGainDb: number;
}

/** Validates MaxSplOptions. */
export function assertMaxSplOptions(o: MaxSplOptions): void {
  assertFinite('sensitivityDb', o.sensitivityDb);
  if (o.sensitivityRef !== '1W' && o.sensitivityRef !== '2.83V') throw new RangeError(`sensitivityRef must be '1W' or '2.83V' (got ${String(o.sensitivityRef)})`);
  assertPositive('impedanceOhm', o.impedanceOhm);
  assertPositive('powerW', o.powerW);
  assertPositive('distanceM', o.distanceM);
  assertIntegerInRange('count', o.count, 1, 1000);
  if (o.roomGainDb !== undefined) assertFinite('roomGainDb', o.roomGainDb);
  if (o.summation !== undefined && o.summation !== 'coherent' && o.summation !== 'power') {
    throw new RangeError(`summation must be 'coherent' or 'power' (got ${String(o.summation)})`);
  }
}

/**
 * Maximum SPL at the seat: S(1 W) + 10·log10(P) − 20·log10(d) + count gain + room gain, dB SPL (inverse-square law,
 * Kinsler et al., 2000). A 2.83 V rating is 1 W into 8 Ω: S(1 W) = S(2.83 V) − 10·log10(8 / Z).
 * @example maxSplDb({ sensitivityDb: 87, sensitivityRef: '1W', impedanceOhm: 8, powerW: 100, distanceM: 3, count: 1 }).splDb // 97.46
 */
export function maxSplDb(options: MaxSplOptions): MaxSplResult {
  assertMaxSplOptions(options);
  const sensitivity1WDb =
    options.sensitivityRef === '1W' ? options.sensitivityDb : options.sensitivityDb - 10 * Math.log10(8 / options.impedanceOhm);
  const perUnitSplDb = sensitivity1WDb + 10 * Math.log10(options.powerW) - 20 * Math.log10(options.distanceM);
  const countGainDb = (options.summation === 'power' ? 10 : 20) * Math.log10(options.count);
  return { splDb: perUnitSplDb + countGainDb + (options.roomGainDb ?? 0), perUnitSplDb, sensitivity1WDb, countGainDb };
}
