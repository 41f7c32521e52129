'use client';

import { useCompute } from '@/lib/hooks/use-compute';
import { layoutRequestFromDocument, type LayoutAnswer } from '@/lib/system-model/layout';
import { positionsOutsideRoom } from '@/lib/system-model/room-bounds';
import type { SystemDocument } from '@/lib/validations/system';

export type { LayoutAnswer } from '@/lib/system-model/layout';

/**
 * Angles, pass/warn, toe-in, delays and trims of the System's speakers (POST /api/v1/layout). Nothing is asked, and no
 * earlier answer is shown, while a seat, speaker or sub lies outside the room: `outside` says which.
 */
export function useLayout(doc: SystemDocument) {
  const outside = positionsOutsideRoom(doc);
  const blocked = outside.length > 0;
  const result = useCompute<LayoutAnswer>('/api/v1/layout', blocked ? null : layoutRequestFromDocument(doc));
  return { ...result, data: blocked ? undefined : result.data, error: blocked ? undefined : result.error, outside };
}
