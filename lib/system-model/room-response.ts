/**
 * Room response: the System's request (`roomResponseRequestFromDocument`: every seat, every sub with its settings, the
 * front-wall notches) and the compute behind POST /api/v1/room-response (`computeRoomResponse`, assembled from
 * dsp/room: no mathematics of its own beyond averaging for the 0 dB reference and rounding).
 */
import { logFrequencyGridHz, modePressureAt, modePressureMap, nodeAlignedCellCount, quarterWaveNotchHz, schroederFrequencyHz, seatSpreadDb, speedOfSoundMps, summedModalResponse, type ModeKind } from '@/dsp';
import { ROOM_LIMITS } from '@/lib/validations/compute-common';
import type { RoomResponseRequest } from '@/lib/validations/compute-room';
import type { SystemDocument } from '@/lib/validations/system';
import { systemChannelSettings } from './channel-settings';
import { mlpSeat, toPointM } from './geometry';
import { positionsOutsideRoom } from './room-bounds';
import { roundAllTo, roundAllToSignificant, roundTo, roundToSignificant } from './rounding';

type Indices = [number, number, number];

export interface RoomResponseAnswer {
  speedOfSoundMps: number;
  frequencyHz: number[];
  modeCount: number;
  maxModeHz: number;
  schroederHz: number;
  /** Absolute level taken as 0 dB, dB re 1 Pa per m³/s of volume velocity. */
  referenceDb: number;
  subs: { name: string }[];
  seats: { name: string; summedDb: number[]; perSubDb: number[][]; bandMeanDb: number }[];
  spread: { startHz: number; stopHz: number; spreadDb: number[]; meanSpreadDb: number; maxSpreadDb: number; maxSpreadHz: number } | null;
  /**
   * One mode over the floor at zM, sampled at cell centres (rows and columns rounded to counts whose centres fall on
   * every node line, so a node reads 0), and `seatPressure`, the mode at each seat's own position, in seat order.
   */
  map: { indices: Indices; kind: ModeKind; frequencyHz: number; zM: number; columns: number; rows: number; xM: number[]; yM: number[]; pressure: number[][]; seatPressure: number[] } | null;
  quarterWave: { name: string; distanceM: number; notchHz: number }[];
}

export interface RoomResponseOptions {
  /** Mode to map over the floor, [nL, nW, nH]. */
  mapIndices?: [number, number, number] | null;
  startHz?: number;
  stopHz?: number;
  pointsPerOctave?: number;
}

/**
 * Body of POST /api/v1/room-response: every seat, every sub with its gain (and count), processor delay (the channel
 * settings': distance alignment plus its own delay) and polarity, the
 * map at the MLP's ear height, and the front-wall notch of each sub and main speaker (its distance to the front wall, y)
 * inside the room. Null when there is no sub.
 */
export function roomResponseRequestFromDocument(doc: SystemDocument, options: RoomResponseOptions = {}): RoomResponseRequest | null {
  if (doc.subs.length === 0 || doc.seats.length === 0) return null;
  const ear = mlpSeat(doc).zM;
  // A source outside the room has no front-wall distance to speak of: it is left out (the editor says why).
  const outside = new Set(positionsOutsideRoom(doc).map((o) => o.path.split('.').slice(0, 2).join('.')));
  const front = [
    ...doc.subs.filter((_, i) => !outside.has(`subs.${i}`)).map((s) => ({ name: s.name, distanceM: s.yM })),
    ...doc.speakers.filter((s, i) => ['L', 'C', 'R'].includes(s.channel) && !outside.has(`speakers.${i}`)).map((s) => ({ name: s.channel, distanceM: s.yM })),
  ].filter((q) => q.distanceM >= 0.01);
  const mapIndices = options.mapIndices;
  // Each sub's processor delay as the channel settings set it (distance alignment and its own delay), less the
  // smallest: a delay common to every sub changes no level.
  const cs = systemChannelSettings(doc).subs.map((c) => c.delayMs);
  const subDelaysMs = cs.map((d) => roundTo(d - Math.min(...cs), 2));
  return {
    room: { ...doc.room },
    grid: { startHz: options.startHz ?? 15, stopHz: options.stopHz ?? 200, pointsPerOctave: options.pointsPerOctave ?? 48 },
    seats: doc.seats.map((s) => ({ name: s.name, xM: s.xM, yM: s.yM, zM: s.zM })),
    subs: doc.subs.map((s, i) => ({ name: s.name, xM: s.xM, yM: s.yM, zM: s.zM, gainDb: Math.max(-30, Math.min(30, s.gainDb + 20 * Math.log10(s.count))), delayMs: Math.min(100, subDelaysMs[i] as number), invert: s.invert })),
    spread: { startHz: 20, stopHz: 120 },
    ...(mapIndices ? { map: { indices: mapIndices, zM: Math.min(ear, doc.room.heightM), columns: 40, rows: 50 } } : {}),
    quarterWave: front,
  };
}

/** Power mean of dB values, dB (10·log10 of the mean of 10^(L/10)). */
function powerMeanDb(values: number[]): number {
  if (values.length === 0) return 0;
  const mean = values.reduce((s, v) => s + Math.pow(10, v / 10), 0) / values.length;
  return 10 * Math.log10(mean);
}

/**
 * Modal seat responses from the subs (each with its gain, delay, polarity, and their sum), the seat-to-seat spread,
 * one mode's floor map and front-wall notches. Levels are relative: 0 dB is the power mean of the summed response
 * over all seats within the spread band.
 */
export function computeRoomResponse(input: RoomResponseRequest): RoomResponseAnswer {
  const { room, grid, seats, subs, spread, map, quarterWave } = input;
  const dims = { lengthM: room.lengthM, widthM: room.widthM, heightM: room.heightM };
  const frequencyHz = logFrequencyGridHz(grid);
  const maxModeHz = 1.5 * grid.stopHz;
  const sources = subs.map((s) => ({ positionM: toPointM(s), gainDb: s.gainDb, delayMs: s.delayMs, invert: s.invert }));
  let modeCount = 0;
  const raw = seats.map((seat) => {
    const r = summedModalResponse({ room: dims, sources, receiverM: toPointM(seat), frequencyHz, rt60S: room.rt60S, temperatureC: room.temperatureC, maxModeHz });
    modeCount = r.modeCount;
    return r;
  });
  const inBand = (f: number) => f >= spread.startHz && f <= spread.stopHz;
  const bandValues = (curve: Float64Array) => Array.from(curve).filter((_, i) => inBand(frequencyHz[i] as number));
  const allBand = raw.flatMap((r) => bandValues(r.sum.magnitudeDb));
  const referenceDb = allBand.length > 0 ? powerMeanDb(allBand) : powerMeanDb(raw.flatMap((r) => Array.from(r.sum.magnitudeDb)));
  const rel = (curve: Float64Array) => roundAllTo(Array.from(curve, (v) => v - referenceDb), 2);
  let spreadOut: RoomResponseAnswer['spread'] = null;
  if (seats.length >= 2 && allBand.length > 0) {
    const s = seatSpreadDb({ frequencyHz, seatsMagnitudeDb: raw.map((r) => r.sum.magnitudeDb), startHz: spread.startHz, stopHz: spread.stopHz });
    spreadOut = { startHz: spread.startHz, stopHz: spread.stopHz, spreadDb: roundAllTo(s.spreadDb, 2), meanSpreadDb: roundTo(s.meanSpreadDb, 2), maxSpreadDb: roundTo(s.maxSpreadDb, 2), maxSpreadHz: roundToSignificant(s.maxSpreadHz, 4) };
  }
  let mapOut: RoomResponseAnswer['map'] = null;
  if (map) {
    const [nl, nw, nh] = map.indices;
    // Cell counts whose centres fall on every node line, so a node reads 0 rather than the cosine half a cell away.
    const columns = nodeAlignedCellCount(nw, map.columns, ROOM_LIMITS.maxMapCells);
    const rows = nodeAlignedCellCount(nl, map.rows, ROOM_LIMITS.maxMapCells);
    const m = modePressureMap({ room: dims, indices: [nl, nw, nh], zM: map.zM, columns, rows });
    const c = speedOfSoundMps(room.temperatureC);
    const modeHz = (c / 2) * Math.hypot(nl / room.lengthM, nw / room.widthM, nh / room.heightM);
    const nonZero = [nl, nw, nh].filter((n) => n > 0).length;
    const pressure: number[][] = [];
    for (let r = 0; r < m.rows; r++) pressure.push(roundAllTo(m.pressure.subarray(r * m.columns, (r + 1) * m.columns), 3));
    mapOut = {
      indices: [nl, nw, nh],
      kind: nonZero === 1 ? 'axial' : nonZero === 2 ? 'tangential' : 'oblique',
      frequencyHz: roundToSignificant(modeHz, 6),
      zM: map.zM,
      columns: m.columns,
      rows: m.rows,
      xM: roundAllToSignificant(m.xM, 4),
      yM: roundAllToSignificant(m.yM, 4),
      pressure,
      // At each seat itself, not at the nearest cell.
      seatPressure: seats.map((seat) => roundTo(modePressureAt({ room: dims, indices: [nl, nw, nh], xM: seat.xM, yM: seat.yM, zM: seat.zM }), 3)),
    };
  }
  return {
    speedOfSoundMps: roundToSignificant(speedOfSoundMps(room.temperatureC), 6),
    frequencyHz: roundAllToSignificant(frequencyHz, 5),
    modeCount,
    maxModeHz: roundToSignificant(maxModeHz, 5),
    schroederHz: roundToSignificant(schroederFrequencyHz({ volumeM3: room.lengthM * room.widthM * room.heightM, rt60S: room.rt60S }), 5),
    referenceDb: roundTo(referenceDb, 2),
    subs: subs.map((s) => ({ name: s.name })),
    seats: seats.map((seat, i) => {
      const r = raw[i]!;
      return { name: seat.name, summedDb: rel(r.sum.magnitudeDb), perSubDb: r.perSource.map((p) => rel(p.magnitudeDb)), bandMeanDb: roundTo(powerMeanDb(bandValues(r.sum.magnitudeDb)) - referenceDb, 2) };
    }),
    spread: spreadOut,
    map: mapOut,
    quarterWave: quarterWave.map((q) => ({ name: q.name, distanceM: q.distanceM, notchHz: roundToSignificant(quarterWaveNotchHz({ distanceM: q.distanceM, temperatureC: room.temperatureC }), 5) })),
  };
}
