'use client';

import type { SystemDocument } from '@/lib/validations/system';

// Placeholder until Lessons land (issue 7): renders nothing.
export function AddToLessonButton(props: { doc: SystemDocument; name: string; panel: string }) {
  void props;
  return null;
}
