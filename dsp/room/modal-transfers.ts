import { speedOfSoundMps } from '../air/speed-of-sound';
import { complexLevelDb } from '../internal/complex';
import { assertFinite, assertPositive, positiveFrequencies } from '../internal/guards';
import { roomModes } from './room-modes';
import type { PointM, RoomDimensions } from './room-types';

/** Options of {@link modalTransfers}. */
export interface ModalTransfersOptions {
  readonly room: RoomDimensions;
  /** Source points (subs), m. */
  readonly sourcesM: readonly PointM[];
  /** Receiver points (seats), m. */
  readonly receiversM: readonly PointM[];
  readonly frequencyHz: Float64Array | readonly number[];
  readonly rt60S: number;
  readonly temperatureC: number;
  /** Highest mode included, Hz (default: 1.5 × the highest frequency asked for). */
  readonly maxModeHz?: number;
}

/** One source → receiver transfer, Pa/(m³/s). */
export interface ModalTransferCurve {
  readonly re: Float64Array;
  readonly im: Float64Array;
  /** 20·log10(|p| / (1 Pa per m³/s)). */
  readonly magnitudeDb: Float64Array;
}

/** Result of {@link modalTransfers}: transfers[source][receiver]. */
export interface ModalTransfersResult {
  readonly frequencyHz: Float64Array;
  readonly transfers: ModalTransferCurve[][];
  readonly modeCount: number;
}

/** Most source × receiver pairs one call may evaluate. */
export const MAX_MODAL_PAIRS = 1024;

const RHO_AIR = 1.204;

/** Throws unless `point` lies inside the room (1e-9 m tolerance), naming `name.x` etc. */
export function assertInsideRoom(name: string, point: PointM, room: RoomDimensions): void {
  if (point === null || typeof point !== 'object') throw new RangeError(`${name} must be a point {x, y, z}`);
  assertFinite(`${name}.x`, point.x);
  assertFinite(`${name}.y`, point.y);
  assertFinite(`${name}.z`, point.z);
  const eps = 1e-9;
  if (point.x < -eps || point.x > room.widthM + eps) throw new RangeError(`${name}.x must lie within 0..widthM`);
  if (point.y < -eps || point.y > room.lengthM + eps) throw new RangeError(`${name}.y must lie within 0..lengthM`);
  if (point.z < -eps || point.z > room.heightM + eps) throw new RangeError(`${name}.z must lie within 0..heightM`);
}

/** Throws unless `room` has positive dimensions and `rt60S` is positive. */
export function assertRoomAndDamping(room: RoomDimensions, rt60S: number): void {
  if (room === null || typeof room !== 'object') throw new RangeError('room must be {lengthM, widthM, heightM}');
  assertPositive('room.lengthM', room.lengthM);
  assertPositive('room.widthM', room.widthM);
  assertPositive('room.heightM', room.heightM);
  assertPositive('rt60S', rt60S);
}

/**
 * The modal sums of every source → receiver pair after validation (see modalTransfer for the formula). The modes,
 * their shapes at each point (cosines per axis and index, computed once per point) and the resonance terms
 * 1/((ωn² − ω²)² + (2δω)²) are shared by all pairs; the loop over modes × frequencies allocates nothing.
 */
export function modalTransfersValidated(
  room: RoomDimensions,
  sources: readonly PointM[],
  receivers: readonly PointM[],
  f: Float64Array,
  rt60S: number,
  temperatureC: number,
  maxModeHz: number | undefined,
): ModalTransfersResult {
  let fMax = 0;
  for (let i = 0; i < f.length; i++) fMax = Math.max(fMax, f[i] as number);
  const maxHz = maxModeHz ?? 1.5 * fMax;
  assertPositive('maxModeHz', maxHz);
  const c = speedOfSoundMps(temperatureC);
  const { modes } = roomModes({ ...room, maxHz, temperatureC });
  const count = modes.length + 1;
  // Highest index per axis, and cos(nπ·pos/size) per point, axis and index.
  let maxL = 0;
  let maxW = 0;
  let maxH = 0;
  for (const m of modes) {
    maxL = Math.max(maxL, m.indices[0]);
    maxW = Math.max(maxW, m.indices[1]);
    maxH = Math.max(maxH, m.indices[2]);
  }
  const shapes = (p: PointM): { l: Float64Array; w: Float64Array; h: Float64Array } => {
    const table = (max: number, pos: number, size: number): Float64Array => {
      const t = new Float64Array(max + 1);
      for (let n = 0; n <= max; n++) t[n] = Math.cos((n * Math.PI * pos) / size);
      return t;
    };
    return { l: table(maxL, p.y, room.lengthM), w: table(maxW, p.x, room.widthM), h: table(maxH, p.z, room.heightM) };
  };
  const sourceShapes = sources.map(shapes);
  const receiverShapes = receivers.map(shapes);
  const pairs = sources.length * receivers.length;
  // Couplings ψ(rs)ψ(rr)/Λ, laid out [pair][mode]; mode 0 is the (0,0,0) term (coupling 1, ωn² = 0).
  const coupling = new Float64Array(count * pairs);
  const omegaSq = new Float64Array(count);
  for (let p = 0; p < pairs; p++) coupling[p * count] = 1;
  for (let m = 0; m < modes.length; m++) {
    const mode = modes[m];
    if (mode === undefined) continue;
    const [nl, nw, nh] = mode.indices;
    const lambda = (nl > 0 ? 0.5 : 1) * (nw > 0 ? 0.5 : 1) * (nh > 0 ? 0.5 : 1);
    let p = 0;
    for (const s of sourceShapes) {
      const psiS = (s.l[nl] as number) * (s.w[nw] as number) * (s.h[nh] as number);
      for (const r of receiverShapes) {
        const psiR = (r.l[nl] as number) * (r.w[nw] as number) * (r.h[nh] as number);
        coupling[p * count + m + 1] = (psiS * psiR) / lambda;
        p++;
      }
    }
    const w = 2 * Math.PI * mode.frequencyHz;
    omegaSq[m + 1] = w * w;
  }
  const delta = 6.91 / rt60S;
  const volume = room.lengthM * room.widthM * room.heightM;
  const scale = (RHO_AIR * c * c) / volume;
  const n = f.length;
  const curves: ModalTransferCurve[] = [];
  const block = new Float64Array(3 * n * pairs);
  for (let p = 0; p < pairs; p++) {
    const o = 3 * n * p;
    curves.push({ re: block.subarray(o, o + n), im: block.subarray(o + n, o + 2 * n), magnitudeDb: block.subarray(o + 2 * n, o + 3 * n) });
  }
  // Per frequency: the resonance terms a/((ωn² − ω²)² + b²) and b/(…) of every mode once, then one dot product per pair.
  const ka = new Float64Array(count);
  const kb = new Float64Array(count);
  for (let i = 0; i < n; i++) {
    const omega = 2 * Math.PI * (f[i] as number);
    const w2 = omega * omega;
    const b = 2 * delta * omega;
    const b2 = b * b;
    for (let m = 0; m < count; m++) {
      const a = (omegaSq[m] as number) - w2;
      const k = 1 / (a * a + b2);
      ka[m] = k * a;
      kb[m] = k * b;
    }
    for (let p = 0; p < pairs; p++) {
      const row = p * count;
      let sr = 0;
      let si = 0;
      for (let m = 0; m < count; m++) {
        const cp = coupling[row + m] as number;
        sr += cp * (ka[m] as number);
        si -= cp * (kb[m] as number);
      }
      // Multiply by jω·ρc²/V.
      const pr = -si * omega * scale;
      const pi = sr * omega * scale;
      const curve = curves[p] as ModalTransferCurve;
      curve.re[i] = pr;
      curve.im[i] = pi;
      curve.magnitudeDb[i] = complexLevelDb(pr, pi);
    }
  }
  const transfers: ModalTransferCurve[][] = [];
  for (let s = 0; s < sources.length; s++) transfers.push(curves.slice(s * receivers.length, (s + 1) * receivers.length));
  return { frequencyHz: Float64Array.from(f), transfers, modeCount: modes.length };
}

/**
 * Modal-sum transfer functions (Kuttruff, "Room Acoustics", ch. 3; see modalTransfer) from every source to every
 * receiver at once: the modes and resonance terms are computed once for all pairs, so 2 subs × 6 seats cost little
 * more than one pair. transfers[s][r] equals modalTransfer({ sourceM: sourcesM[s], receiverM: receiversM[r], … }).
 * @example modalTransfers({ room, sourcesM: [sub1, sub2], receiversM: seats, frequencyHz, rt60S: 0.4, temperatureC: 20 }).transfers[1][0].magnitudeDb
 */
export function modalTransfers(options: ModalTransfersOptions): ModalTransfersResult {
  const { room, sourcesM, receiversM, rt60S, temperatureC } = options;
  assertRoomAndDamping(room, rt60S);
  if (!Array.isArray(sourcesM) || sourcesM.length === 0) throw new RangeError('sourcesM must hold at least one point');
  if (!Array.isArray(receiversM) || receiversM.length === 0) throw new RangeError('receiversM must hold at least one point');
  if (sourcesM.length * receiversM.length > MAX_MODAL_PAIRS) throw new RangeError(`sourcesM × receiversM must be at most ${MAX_MODAL_PAIRS} pairs`);
  sourcesM.forEach((p, k) => assertInsideRoom(`sourcesM[${k}]`, p, room));
  receiversM.forEach((p, k) => assertInsideRoom(`receiversM[${k}]`, p, room));
  const f = positiveFrequencies('frequencyHz', options.frequencyHz);
  return modalTransfersValidated(room, sourcesM, receiversM, f, rt60S, temperatureC, options.maxModeHz);
}
