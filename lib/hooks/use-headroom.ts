'use client';

import { useCompute } from '@/lib/hooks/use-compute';
import type { HeadroomAnswer } from '@/lib/system-model/headroom-compute';
import { headroomRequestFromDocument, type HeadroomOptions } from '@/lib/system-model/headroom-request';
import type { SystemDocument } from '@/lib/validations/system';

export type { HeadroomAnswer, HeadroomRowOut } from '@/lib/system-model/headroom-compute';

/** Maximum SPL at the MLP against the target, per channel and per sub (POST /api/v1/headroom). */
export function useHeadroom(doc: SystemDocument, options: HeadroomOptions = {}) {
  return useCompute<HeadroomAnswer>('/api/v1/headroom', headroomRequestFromDocument(doc, options));
}
