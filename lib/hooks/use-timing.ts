'use client';

import { useCompute } from './use-compute';
import type { TimingAnswer } from '@/lib/system-model/timing';
import type { TimingRequestInput } from '@/lib/validations/compute-blend';

/** POST /api/v1/timing through SWR (debounced, deduplicated, previous answer kept). `body === null` skips. */
export function useTiming(body: TimingRequestInput | null) {
  return useCompute<TimingAnswer>('/api/v1/timing', body);
}
