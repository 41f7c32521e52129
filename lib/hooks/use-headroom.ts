'use client';

import { useCompute } from '@/lib/hooks/use-compute';
import { headroomRequestFromDocument, type HeadroomAnswer, type HeadroomOptions } from '@/lib/system-model/headroom';
import { outsideForMlpGeometry, positionsOutsideRoom } from '@/lib/system-model/room-bounds';
import type { SystemDocument } from '@/lib/validations/system';

export type { HeadroomAnswer, HeadroomRowOut } from '@/lib/system-model/headroom';

/**
 * Maximum SPL at the MLP against the target, per channel and per sub (POST /api/v1/headroom). Nothing is asked, and no
 * earlier answer is shown, while a distance would come from a position outside the room: `outside` says which.
 */
export function useHeadroom(doc: SystemDocument, options: HeadroomOptions = {}) {
  const outside = outsideForMlpGeometry(doc, positionsOutsideRoom(doc));
  const blocked = outside.length > 0;
  const result = useCompute<HeadroomAnswer>('/api/v1/headroom', blocked ? null : headroomRequestFromDocument(doc, options));
  return { ...result, data: blocked ? undefined : result.data, error: blocked ? undefined : result.error, outside };
}
