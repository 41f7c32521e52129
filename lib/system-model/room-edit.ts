/** Document edits of the room. Changing the room never moves a seat, speaker or sub: what no longer fits is reported. */
import type { SystemDocument } from '@/lib/validations/system';
import { positionsOutsideRoom, type OutsidePosition } from './room-bounds';

type Room = SystemDocument['room'];

/**
 * The document with `patch` applied to the room and every position left exactly where it was, with the positions that
 * now lie outside the room (`positionsOutsideRoom`). Making the room larger again brings them back inside unchanged.
 */
export function withRoom(doc: SystemDocument, patch: Partial<Room>): { doc: SystemDocument; outside: OutsidePosition[] } {
  const next = { ...doc, room: { ...doc.room, ...patch } };
  return { doc: next, outside: positionsOutsideRoom(next) };
}
