/** Document edits of the room: new dimensions keep every seat, speaker and sub inside the walls. */
import type { SystemDocument } from '@/lib/validations/system';

type Room = SystemDocument['room'];

const clampInside = <T extends { xM: number; yM: number; zM: number }>(p: T, room: Room): T => ({
  ...p,
  xM: Math.min(p.xM, room.widthM),
  yM: Math.min(p.yM, room.lengthM),
  zM: Math.min(p.zM, room.heightM),
});

/** The document with `patch` applied to the room; positions beyond a wall that moved in are pulled onto it. Returns how many moved. */
export function withRoom(doc: SystemDocument, patch: Partial<Room>): { doc: SystemDocument; moved: number } {
  const room = { ...doc.room, ...patch };
  let moved = 0;
  const fit = <T extends { xM: number; yM: number; zM: number }>(p: T): T => {
    const q = clampInside(p, room);
    if (q.xM !== p.xM || q.yM !== p.yM || q.zM !== p.zM) moved++;
    return q;
  };
  return { doc: { ...doc, room, seats: doc.seats.map(fit), speakers: doc.speakers.map(fit), subs: doc.subs.map(fit) }, moved };
}
