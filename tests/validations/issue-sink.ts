import type { z } from 'zod';

/** A stand-in for zod's refinement context (`ctx` in superRefine) that keeps the issues it is given. */
export function issueSink() {
  const issues: { path: (string | number)[]; message: string }[] = [];
  const ctx = { addIssue: (i: { path?: PropertyKey[]; message?: string }) => issues.push({ path: (i.path ?? []) as (string | number)[], message: i.message ?? '' }) } as unknown as z.RefinementCtx;
  return { issues, ctx };
}
