'use client';

import { useCompute } from './use-compute';
import type { BlendAnswer } from '@/lib/system-model/blend';
import type { BlendRequestInput } from '@/lib/validations/compute-blend';

/** POST /api/v1/blend through SWR (debounced, deduplicated, previous answer kept). `body === null` skips. */
export function useBlend(body: BlendRequestInput | null) {
  return useCompute<BlendAnswer>('/api/v1/blend', body);
}
