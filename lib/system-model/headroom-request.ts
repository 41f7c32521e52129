/** From the System document to the body of POST /api/v1/headroom. */
import type { HeadroomRequest } from '@/lib/validations/compute-room';
import type { SystemDocument } from '@/lib/validations/system';
import { distanceToSeatM, profileById } from './index';

export interface HeadroomOptions {
  /** Boundary gain added to the mains, dB (default 0: free field). */
  mainsRoomGainDb?: number;
  /** Room gain of the subs, dB (default 0). */
  subsRoomGainDb?: number;
  subSummation?: 'coherent' | 'power';
}

const clampDistance = (d: number) => Math.min(100, Math.max(0.1, d));

/** One row per speaker and per sub, with its profile's sensitivity, impedance and rating, its amplifier and its distance to the MLP. */
export function headroomRequestFromDocument(doc: SystemDocument, options: HeadroomOptions = {}): HeadroomRequest | null {
  const row = (name: string, profileId: string, powerW: number, distanceM: number, count: number, roomGainDb: number) => {
    const p = profileById(doc, profileId);
    if (!p) return null;
    return { name, sensitivityDb: p.sensitivityDb, sensitivityRef: p.sensitivityReference, impedanceOhm: p.impedanceOhm, powerW, distanceM: clampDistance(distanceM), count, roomGainDb, ratedPowerW: p.ratedPowerW };
  };
  const channels = doc.speakers.map((s) => row(s.channel, s.profileId, s.amplifierPowerW, distanceToSeatM(doc, s), 1, options.mainsRoomGainDb ?? 0)).filter((r) => r !== null);
  const subs = doc.subs.map((s) => row(s.name, s.profileId, s.amplifierPowerW, distanceToSeatM(doc, s), s.count, options.subsRoomGainDb ?? 0)).filter((r) => r !== null);
  if (channels.length === 0 && subs.length === 0) return null;
  return { channels, subs, subSummation: options.subSummation ?? 'coherent' };
}
