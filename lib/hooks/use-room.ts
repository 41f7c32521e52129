'use client';

import { useCompute } from '@/lib/hooks/use-compute';
import { outsideUnder, positionsOutsideRoom } from '@/lib/system-model/room-bounds';
import { roomModesRequestFromDocument, type RoomModesAnswer } from '@/lib/system-model/room-modes';
import { roomResponseRequestFromDocument, type RoomResponseAnswer, type RoomResponseOptions } from '@/lib/system-model/room-response';
import type { SystemDocument } from '@/lib/validations/system';

export type { RoomModesAnswer } from '@/lib/system-model/room-modes';
export type { RoomResponseAnswer } from '@/lib/system-model/room-response';

/** The room's modes and their checks (POST /api/v1/room-modes), debounced and kept while the next answer comes. */
export function useRoomModes(doc: SystemDocument, maxHz = 200) {
  return useCompute<RoomModesAnswer>('/api/v1/room-modes', roomModesRequestFromDocument(doc, maxHz));
}

/**
 * Predicted seat responses from the subs, the spread, a mode map and the front-wall notches (POST /api/v1/room-response).
 * Nothing is asked, and no earlier answer is shown, while a seat or a sub lies outside the room: `outside` says which.
 */
export function useRoomResponse(doc: SystemDocument, options: RoomResponseOptions = {}) {
  const all = positionsOutsideRoom(doc);
  const outside = [...outsideUnder(all, 'seats'), ...outsideUnder(all, 'subs')];
  const blocked = outside.length > 0;
  const result = useCompute<RoomResponseAnswer>('/api/v1/room-response', blocked ? null : roomResponseRequestFromDocument(doc, options));
  return { ...result, data: blocked ? undefined : result.data, error: blocked ? undefined : result.error, outside };
}
