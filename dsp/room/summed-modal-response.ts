import { LN_POWER_TO_DB } from '../internal/angles';
import { assertFinite, assertNonNegative } from '../internal/guards';
import { modalTransfer } from './modal-transfer';
import type { PointM, RoomDimensions } from './room-types';

/** One source (a sub) of {@link summedModalResponse}: where it is and what the processor does to it. */
export interface ModalSource {
  readonly positionM: PointM;
  /** Level change, dB (default 0). */
  readonly gainDb?: number;
  /** Processor delay, ms ≥ 0 (default 0); the air path is already in the modal sum. */
  readonly delayMs?: number;
  /** Polarity inverted (default false). */
  readonly invert?: boolean;
}

/** Options of {@link summedModalResponse}. */
export interface SummedModalResponseOptions {
  readonly room: RoomDimensions;
  readonly sources: readonly ModalSource[];
  readonly receiverM: PointM;
  readonly frequencyHz: Float64Array | readonly number[];
  readonly rt60S: number;
  readonly temperatureC: number;
  readonly maxModeHz?: number;
}

/** Complex pressure per unit volume velocity, Pa/(m³/s), of each source (with its gain, delay, polarity) and of their sum. */
export interface ComplexPressure {
  readonly re: Float64Array;
  readonly im: Float64Array;
  /** 20·log10(|p| / (1 Pa per m³/s)). */
  readonly magnitudeDb: Float64Array;
}

/** Result of {@link summedModalResponse}. */
export interface SummedModalResponseResult {
  readonly frequencyHz: Float64Array;
  readonly perSource: ComplexPressure[];
  readonly sum: ComplexPressure;
  readonly modeCount: number;
}

const toDb = (re: number, im: number): number => LN_POWER_TO_DB * Math.log(re * re + im * im + 1e-300);

/**
 * Pressure at one receiver from several sources in a rectangular room: each source's modal transfer
 * (Kuttruff, "Room Acoustics", ch. 3, damped by δ = 6.91/T60) times g·(±1)·e^(−jωτ), summed as complex numbers.
 * @example summedModalResponse({ room, sources: [{ positionM: { x: 0.3, y: 0.3, z: 0.3 } }, { positionM: { x: 4.6, y: 0.3, z: 0.3 }, delayMs: 1 }], receiverM: { x: 2.45, y: 3.7, z: 1.1 }, frequencyHz: [40], rt60S: 0.4, temperatureC: 20 }).sum.magnitudeDb
 */
export function summedModalResponse(options: SummedModalResponseOptions): SummedModalResponseResult {
  const { room, sources, receiverM, rt60S, temperatureC, maxModeHz } = options;
  if (!Array.isArray(sources) || sources.length === 0) throw new RangeError('sources must hold at least one source');
  const perSource: ComplexPressure[] = [];
  let frequencyHz: Float64Array | null = null;
  let modeCount = 0;
  let sumRe: Float64Array | null = null;
  let sumIm: Float64Array | null = null;
  sources.forEach((source, s) => {
    const gainDb = source.gainDb ?? 0;
    const delayMs = source.delayMs ?? 0;
    assertFinite(`sources[${s}].gainDb`, gainDb);
    assertNonNegative(`sources[${s}].delayMs`, delayMs);
    const t = modalTransfer({ room, sourceM: source.positionM, receiverM, frequencyHz: options.frequencyHz, rt60S, temperatureC, maxModeHz });
    frequencyHz = t.frequencyHz;
    modeCount = t.modeCount;
    const n = t.frequencyHz.length;
    sumRe ??= new Float64Array(n);
    sumIm ??= new Float64Array(n);
    const amplitude = Math.pow(10, gainDb / 20) * (source.invert ? -1 : 1);
    const re = new Float64Array(n);
    const im = new Float64Array(n);
    const magnitudeDb = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      const phase = -2 * Math.PI * (t.frequencyHz[i] as number) * (delayMs / 1000);
      const cr = amplitude * Math.cos(phase);
      const ci = amplitude * Math.sin(phase);
      const a = t.re[i] as number;
      const b = t.im[i] as number;
      re[i] = a * cr - b * ci;
      im[i] = a * ci + b * cr;
      magnitudeDb[i] = toDb(re[i] as number, im[i] as number);
      sumRe[i] = (sumRe[i] as number) + (re[i] as number);
      sumIm[i] = (sumIm[i] as number) + (im[i] as number);
    }
    perSource.push({ re, im, magnitudeDb });
  });
  const re = sumRe as unknown as Float64Array;
  const im = sumIm as unknown as Float64Array;
  const magnitudeDb = new Float64Array(re.length);
  for (let i = 0; i < re.length; i++) magnitudeDb[i] = toDb(re[i] as number, im[i] as number);
  return { frequencyHz: frequencyHz as unknown as Float64Array, perSource, sum: { re, im, magnitudeDb }, modeCount };
}
