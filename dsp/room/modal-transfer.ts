import { positiveFrequencies } from '../internal/guards';
import { assertInsideRoom, assertRoomAndDamping, modalTransfersValidated } from './modal-transfers';
import type { PointM, RoomDimensions } from './room-types';

/** Options of {@link modalTransfer}. */
export interface ModalTransferOptions {
  readonly room: RoomDimensions;
  readonly sourceM: PointM;
  readonly receiverM: PointM;
  readonly frequencyHz: Float64Array | readonly number[];
  readonly rt60S: number;
  readonly temperatureC: number;
  /** Highest mode included, Hz (default: 1.5 × the highest frequency asked for). */
  readonly maxModeHz?: number;
}

/** Pressure per unit volume velocity, Pa/(m³/s). */
export interface ModalTransferResult {
  readonly frequencyHz: Float64Array;
  readonly re: Float64Array;
  readonly im: Float64Array;
  /** 20·log10(|p| / (1 Pa per m³/s)). */
  readonly magnitudeDb: Float64Array;
  readonly modeCount: number;
}

/**
 * Modal-sum transfer function of a rigid rectangular room (Kuttruff, "Room Acoustics", ch. 3):
 * p = jωρc²/V · Σ ψn(rs)·ψn(rr) / (Λn·(ωn² − ω² + 2jδω)), δ = 6.91/T60, ψn = cos(nLπy/L)·cos(nWπx/W)·cos(nHπz/H),
 * Λn = Π(1 for a zero index, ½ otherwise); the (0,0,0) term is the room's compliance. x across the width,
 * y along the length, z up, origin at the front-left floor corner.
 * @example modalTransfer({ room, sourceM: { x: 0.3, y: 0.3, z: 0.3 }, receiverM: { x: 2.45, y: 3.8, z: 1.1 }, frequencyHz: [40], rt60S: 0.4, temperatureC: 20 }).magnitudeDb
 */
export function modalTransfer(options: ModalTransferOptions): ModalTransferResult {
  const { room, sourceM, receiverM, rt60S, temperatureC } = options;
  assertRoomAndDamping(room, rt60S);
  assertInsideRoom('sourceM', sourceM, room);
  assertInsideRoom('receiverM', receiverM, room);
  const f = positiveFrequencies('frequencyHz', options.frequencyHz);
  const r = modalTransfersValidated(room, [sourceM], [receiverM], f, rt60S, temperatureC, options.maxModeHz);
  const curve = r.transfers[0]![0]!;
  return { frequencyHz: r.frequencyHz, re: curve.re, im: curve.im, magnitudeDb: curve.magnitudeDb, modeCount: r.modeCount };
}
