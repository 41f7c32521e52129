import { speedOfSoundMps } from '../air/speed-of-sound';
import { LN_POWER_TO_DB } from '../internal/angles';
import { assertFinite, assertPositive, positiveFrequencies } from '../internal/guards';
import { roomModes } from './room-modes';
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

const RHO_AIR = 1.204;

function assertInside(name: string, point: PointM, room: RoomDimensions): void {
  if (point === null || typeof point !== 'object') throw new RangeError(`${name} must be a point {x, y, z}`);
  assertFinite(`${name}.x`, point.x);
  assertFinite(`${name}.y`, point.y);
  assertFinite(`${name}.z`, point.z);
  const eps = 1e-9;
  if (point.x < -eps || point.x > room.widthM + eps) throw new RangeError(`${name}.x must lie within 0..widthM`);
  if (point.y < -eps || point.y > room.lengthM + eps) throw new RangeError(`${name}.y must lie within 0..lengthM`);
  if (point.z < -eps || point.z > room.heightM + eps) throw new RangeError(`${name}.z must lie within 0..heightM`);
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
  if (room === null || typeof room !== 'object') throw new RangeError('room must be {lengthM, widthM, heightM}');
  assertPositive('room.lengthM', room.lengthM);
  assertPositive('room.widthM', room.widthM);
  assertPositive('room.heightM', room.heightM);
  assertPositive('rt60S', rt60S);
  assertInside('sourceM', sourceM, room);
  assertInside('receiverM', receiverM, room);
  const f = positiveFrequencies('frequencyHz', options.frequencyHz);
  let fMax = 0;
  for (let i = 0; i < f.length; i++) fMax = Math.max(fMax, f[i] as number);
  const maxModeHz = options.maxModeHz ?? 1.5 * fMax;
  assertPositive('maxModeHz', maxModeHz);
  const c = speedOfSoundMps(temperatureC);
  const { modes } = roomModes({ ...room, maxHz: maxModeHz, temperatureC });
  const count = modes.length + 1;
  // Per mode: coupling ψ(rs)ψ(rr)/Λ and ωn²; index 0 is the (0,0,0) term.
  const coupling = new Float64Array(count);
  const omegaSq = new Float64Array(count);
  coupling[0] = 1;
  omegaSq[0] = 0;
  const shape = (n: number, pos: number, size: number): number => Math.cos((n * Math.PI * pos) / size);
  for (let m = 0; m < modes.length; m++) {
    const mode = modes[m];
    if (mode === undefined) continue;
    const [nl, nw, nh] = mode.indices;
    const psiS = shape(nl, sourceM.y, room.lengthM) * shape(nw, sourceM.x, room.widthM) * shape(nh, sourceM.z, room.heightM);
    const psiR = shape(nl, receiverM.y, room.lengthM) * shape(nw, receiverM.x, room.widthM) * shape(nh, receiverM.z, room.heightM);
    const lambda = (nl > 0 ? 0.5 : 1) * (nw > 0 ? 0.5 : 1) * (nh > 0 ? 0.5 : 1);
    coupling[m + 1] = (psiS * psiR) / lambda;
    const w = 2 * Math.PI * mode.frequencyHz;
    omegaSq[m + 1] = w * w;
  }
  const delta = 6.91 / rt60S;
  const volume = room.lengthM * room.widthM * room.heightM;
  const scale = (RHO_AIR * c * c) / volume;
  const n = f.length;
  const re = new Float64Array(n);
  const im = new Float64Array(n);
  const magnitudeDb = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const omega = 2 * Math.PI * (f[i] as number);
    const w2 = omega * omega;
    const b = 2 * delta * omega;
    const b2 = b * b;
    let sr = 0;
    let si = 0;
    for (let m = 0; m < count; m++) {
      const a = (omegaSq[m] as number) - w2;
      const k = (coupling[m] as number) / (a * a + b2);
      sr += k * a;
      si -= k * b;
    }
    // Multiply by jω·ρc²/V.
    const pr = -si * omega * scale;
    const pi = sr * omega * scale;
    re[i] = pr;
    im[i] = pi;
    magnitudeDb[i] = LN_POWER_TO_DB * Math.log(pr * pr + pi * pi + 1e-300);
  }
  return { frequencyHz: Float64Array.from(f), re, im, magnitudeDb, modeCount: modes.length };
}
