/** Where things are in a System: the MLP, profiles by id, and each source's distance to a seat (dsp's geometry). */
import { speakerAngles, type PointM } from '@/dsp';
import type { Seat, Speaker, SpeakerProfile, Sub, SystemDocument } from '@/lib/validations/system';

export const toPointM = (p: { xM: number; yM: number; zM: number }): PointM => ({ x: p.xM, y: p.yM, z: p.zM });

export function mlpSeat(doc: SystemDocument): Seat {
  const seat = doc.seats.find((s) => s.id === doc.mlpSeatId) ?? doc.seats[0];
  if (!seat) throw new RangeError('the System has no seats');
  return seat;
}

export function profileById(doc: SystemDocument, id: string): SpeakerProfile | undefined {
  return doc.profiles.find((p) => p.id === id);
}

/** The air path from a speaker or sub to a seat, from the positions: what the sound travels. */
export function geometricDistanceM(item: Speaker | Sub, seat: Seat): number {
  return speakerAngles({ listenerM: toPointM(seat), speakerM: toPointM(item) }).distanceM;
}

/**
 * The distance the processor is set to for a speaker or sub (to the MLP by default): the measured distance when the
 * System holds one (distanceOverrideM), else the positions' geometry. Processor delays align these distances.
 */
export function distanceToSeatM(doc: SystemDocument, item: Speaker | Sub, seat: Seat = mlpSeat(doc)): number {
  if (item.distanceOverrideM != null && seat.id === doc.mlpSeatId) return item.distanceOverrideM;
  return geometricDistanceM(item, seat);
}
