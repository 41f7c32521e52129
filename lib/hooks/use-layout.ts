'use client';

import { useCompute } from '@/lib/hooks/use-compute';
import type { LayoutAnswer } from '@/lib/system-model/layout-compute';
import { layoutRequestFromDocument } from '@/lib/system-model/layout-request';
import type { SystemDocument } from '@/lib/validations/system';

export type { LayoutAnswer, LayoutSpeakerOut } from '@/lib/system-model/layout-compute';

/** Angles, pass/warn, toe-in, delays and trims of the System's speakers (POST /api/v1/layout). */
export function useLayout(doc: SystemDocument) {
  return useCompute<LayoutAnswer>('/api/v1/layout', layoutRequestFromDocument(doc));
}
