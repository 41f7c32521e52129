import { z } from 'zod';

/** The crossover filter families: Butterworth (orders 1–8) and Linkwitz–Riley (2, 4 or 8). */
export const FILTER_FAMILIES = ['butterworth', 'linkwitz-riley'] as const;

export const filterFamilySchema = z.enum(FILTER_FAMILIES, { error: "must be 'butterworth' or 'linkwitz-riley'" }).meta({
  description: "The crossover filter family: 'butterworth' (orders 1–8) or 'linkwitz-riley' (two Butterworth filters of half the order in cascade: orders 2, 4 or 8).",
});

/**
 * A Linkwitz–Riley slope is two Butterworth filters of half its order in cascade; the product offers orders 2, 4 and 8.
 * Adds the issue at `path` (the order's path relative to the refined object) for any other order.
 */
export function refineSlopeOrder(slope: { family: string; order: number }, ctx: z.RefinementCtx, path: (string | number)[] = ['order']): void {
  if (slope.family === 'linkwitz-riley' && ![2, 4, 8].includes(slope.order)) {
    ctx.addIssue({ code: 'custom', path, message: 'Linkwitz–Riley order must be 2, 4 or 8' });
  }
}
