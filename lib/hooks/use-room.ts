'use client';

import { useCompute } from '@/lib/hooks/use-compute';
import type { RoomModesAnswer, RoomResponseAnswer } from '@/lib/system-model/room-compute';
import { roomModesRequestFromDocument, roomResponseRequestFromDocument, type RoomResponseOptions } from '@/lib/system-model/room-request';
import type { SystemDocument } from '@/lib/validations/system';

export type { RoomModesAnswer, RoomResponseAnswer } from '@/lib/system-model/room-compute';

/** The room's modes and their checks (POST /api/v1/room-modes), debounced and kept while the next answer comes. */
export function useRoomModes(doc: SystemDocument, maxHz = 200) {
  return useCompute<RoomModesAnswer>('/api/v1/room-modes', roomModesRequestFromDocument(doc, maxHz));
}

/** Predicted seat responses from the subs, the spread, a mode map and the front-wall notches (POST /api/v1/room-response). */
export function useRoomResponse(doc: SystemDocument, options: RoomResponseOptions = {}) {
  return useCompute<RoomResponseAnswer>('/api/v1/room-response', roomResponseRequestFromDocument(doc, options));
}
