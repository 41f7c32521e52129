import { complexLevelDb, writeTimesPolar } from '../internal/complex';
import { assertFinite, assertNonNegative, positiveFrequencies } from '../internal/guards';
import { assertInsideRoom, assertRoomAndDamping, modalTransfersValidated } from './modal-transfers';
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

/**
 * Pressure at one receiver from several sources in a rectangular room: each source's modal transfer (modes and
 * resonance terms computed once for all sources)
 * (Kuttruff, "Room Acoustics", ch. 3, damped by δ = 6.91/T60) times g·(±1)·e^(−jωτ), summed as complex numbers.
 * @example summedModalResponse({ room, sources: [{ positionM: { x: 0.3, y: 0.3, z: 0.3 } }, { positionM: { x: 4.6, y: 0.3, z: 0.3 }, delayMs: 1 }], receiverM: { x: 2.45, y: 3.7, z: 1.1 }, frequencyHz: [40], rt60S: 0.4, temperatureC: 20 }).sum.magnitudeDb
 */
export function summedModalResponse(options: SummedModalResponseOptions): SummedModalResponseResult {
  const { room, sources, receiverM, rt60S, temperatureC, maxModeHz } = options;
  if (!Array.isArray(sources) || sources.length === 0) throw new RangeError('sources must hold at least one source');
  const amplitudes = sources.map((source, s) => {
    const gainDb = source.gainDb ?? 0;
    const delayMs = source.delayMs ?? 0;
    assertFinite(`sources[${s}].gainDb`, gainDb);
    assertNonNegative(`sources[${s}].delayMs`, delayMs);
    return { amplitude: Math.pow(10, gainDb / 20) * (source.invert ? -1 : 1), delayMs };
  });
  assertRoomAndDamping(room, rt60S);
  sources.forEach((source, s) => assertInsideRoom(`sources[${s}].positionM`, source.positionM, room));
  assertInsideRoom('receiverM', receiverM, room);
  const f = positiveFrequencies('frequencyHz', options.frequencyHz);
  const t = modalTransfersValidated(room, sources.map((s) => s.positionM), [receiverM], f, rt60S, temperatureC, maxModeHz);
  const n = f.length;
  const sumRe = new Float64Array(n);
  const sumIm = new Float64Array(n);
  const perSource: ComplexPressure[] = [];
  sources.forEach((_, s) => {
    const { amplitude, delayMs } = amplitudes[s]!;
    const transfer = t.transfers[s]![0]!;
    const re = new Float64Array(n);
    const im = new Float64Array(n);
    const magnitudeDb = new Float64Array(n);
    const curves: ComplexPressure = { re, im, magnitudeDb };
    for (let i = 0; i < n; i++) {
      writeTimesPolar(curves, i, transfer.re[i] as number, transfer.im[i] as number, amplitude, -2 * Math.PI * (t.frequencyHz[i] as number) * (delayMs / 1000));
      sumRe[i] = (sumRe[i] as number) + (re[i] as number);
      sumIm[i] = (sumIm[i] as number) + (im[i] as number);
    }
    perSource.push(curves);
  });
  const magnitudeDb = new Float64Array(n);
  for (let i = 0; i < n; i++) magnitudeDb[i] = complexLevelDb(sumRe[i] as number, sumIm[i] as number);
  return { frequencyHz: t.frequencyHz, perSource, sum: { re: sumRe, im: sumIm, magnitudeDb }, modeCount: t.modeCount };
}
