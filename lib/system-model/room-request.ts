/** From the System document to the bodies of POST /api/v1/room-modes and /api/v1/room-response. */
import type { SystemDocument } from '@/lib/validations/system';
import type { RoomModesRequest, RoomResponseRequest } from '@/lib/validations/compute-room';
import { mlpSeat } from './index';
import { positionsOutsideRoom } from './room-bounds';

/** Body of POST /api/v1/room-modes for the System's room. */
export function roomModesRequestFromDocument(doc: SystemDocument, maxHz = 200): RoomModesRequest {
  const { lengthM, widthM, heightM, temperatureC, rt60S } = doc.room;
  return { lengthM, widthM, heightM, maxHz, temperatureC, rt60S };
}

export interface RoomResponseOptions {
  /** Mode to map over the floor, [nL, nW, nH]. */
  mapIndices?: [number, number, number] | null;
  startHz?: number;
  stopHz?: number;
  pointsPerOctave?: number;
}

/**
 * Body of POST /api/v1/room-response: every seat, every sub with its gain (and count), delay and polarity, the
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
  return {
    room: { ...doc.room },
    grid: { startHz: options.startHz ?? 15, stopHz: options.stopHz ?? 200, pointsPerOctave: options.pointsPerOctave ?? 48 },
    seats: doc.seats.map((s) => ({ name: s.name, xM: s.xM, yM: s.yM, zM: s.zM })),
    subs: doc.subs.map((s) => ({ name: s.name, xM: s.xM, yM: s.yM, zM: s.zM, gainDb: Math.max(-30, Math.min(30, s.gainDb + 20 * Math.log10(s.count))), delayMs: s.delayMs, invert: s.invert })),
    spread: { startHz: 20, stopHz: 120 },
    ...(mapIndices ? { map: { indices: mapIndices, zM: Math.min(ear, doc.room.heightM), columns: 40, rows: 50 } } : {}),
    quarterWave: front,
  };
}
