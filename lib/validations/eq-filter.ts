import { z } from 'zod';
import { EQ_LIMITS } from '@/dsp';
import { num } from './common';

/**
 * EQ filters as every schema takes them (the Audio EQ Cookbook's peaking filter and shelves; R. Bristow-Johnson):
 * a processor output's EQ, a voicing position's filters, the processor-filters and eq-design routes. The frequency
 * limits here are the document's; a digital filter is further refused at or above the Nyquist frequency by dsp.
 */
const gainDb = num(EQ_LIMITS.gainDb.min, EQ_LIMITS.gainDb.max, 'dB');
const q = num(EQ_LIMITS.q.min, EQ_LIMITS.q.max);

export const peakingFilterSchema = z.object({
  kind: z.literal('peaking'),
  centerHz: num(5, 192000, 'Hz'),
  gainDb,
  q,
});

export const shelfFilterSchema = z
  .object({
    kind: z.enum(['low-shelf', 'high-shelf']),
    cornerHz: num(5, 192000, 'Hz'),
    gainDb,
    /** Width as a Q; or give `slope` (the cookbook's shelf slope S, 0.1–1; 1 = steepest without overshoot). Default S = 1. */
    q: q.optional(),
    slope: num(EQ_LIMITS.slope.min, EQ_LIMITS.slope.max).optional(),
  })
  .refine((f) => f.q === undefined || f.slope === undefined, { message: 'give q or slope, not both', path: ['slope'] });

export const eqFilterSchema = z.discriminatedUnion('kind', [peakingFilterSchema, shelfFilterSchema], {
  error: "kind must be 'peaking', 'low-shelf' or 'high-shelf'",
});

export type EqFilterInput = z.infer<typeof eqFilterSchema>;
export type PeakingFilterInput = z.infer<typeof peakingFilterSchema>;
