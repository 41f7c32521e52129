import { z } from 'zod';
import { EQ_LIMITS } from '@/dsp';
import { num } from './common';

/**
 * EQ filters as every schema takes them (the Audio EQ Cookbook's peaking filter and shelves; R. Bristow-Johnson):
 * a processor output's EQ, a voicing position's filters, the processor-filters and eq-design routes. The frequency
 * limits here are the document's; a digital filter is further refused at or above the Nyquist frequency by dsp.
 */
const gainDb = num(EQ_LIMITS.gainDb.min, EQ_LIMITS.gainDb.max, 'dB').meta({
  description: `Gain at the centre (peaking) or of the shelf, ${EQ_LIMITS.gainDb.min}…+${EQ_LIMITS.gainDb.max} dB; a boost above a few dB asks a lot of amplifier and driver.`,
  'x-unit': 'dB',
});
const q = num(EQ_LIMITS.q.min, EQ_LIMITS.q.max).meta({ description: `Quality factor (width: higher is narrower), ${EQ_LIMITS.q.min}–${EQ_LIMITS.q.max}.` });
const filterHz = (what: string) => num(5, 192000, 'Hz').meta({ description: `${what}, 5–192 000 Hz (a digital filter must also lie below the Nyquist frequency).`, 'x-unit': 'Hz' });

export const peakingFilterSchema = z
  .object({
    kind: z.literal('peaking').meta({ description: "'peaking'." }),
    centerHz: filterHz('Centre frequency'),
    gainDb,
    q,
  })
  .meta({ id: 'PeakingFilter', description: "A peaking (bell) filter, the Audio EQ Cookbook's analog prototype." });

export const shelfFilterSchema = z
  .object({
    kind: z.enum(['low-shelf', 'high-shelf']).meta({ description: 'A low shelf lifts or cuts below cornerHz, a high shelf above it.' }),
    cornerHz: filterHz('Corner (mid-gain) frequency'),
    gainDb,
    /** Width as a Q; or give `slope` (the cookbook's shelf slope S, 0.1–1; 1 = steepest without overshoot). Default S = 1. */
    q: q.optional().meta({ description: `Width as a Q, ${EQ_LIMITS.q.min}–${EQ_LIMITS.q.max}; give q or slope, not both (neither: slope 1).` }),
    slope: num(EQ_LIMITS.slope.min, EQ_LIMITS.slope.max)
      .optional()
      .meta({ description: `The cookbook's shelf slope S, ${EQ_LIMITS.slope.min}–${EQ_LIMITS.slope.max} (1, the default: the steepest without overshoot).` }),
  })
  .refine((f) => f.q === undefined || f.slope === undefined, { message: 'give q or slope, not both', path: ['slope'] })
  .meta({ id: 'ShelfFilter', description: "A low or high shelf, the Audio EQ Cookbook's analog prototype." });

export const eqFilterSchema = z
  .discriminatedUnion('kind', [peakingFilterSchema, shelfFilterSchema], {
    error: "kind must be 'peaking', 'low-shelf' or 'high-shelf'",
  })
  .meta({ id: 'EqFilter', description: "One EQ filter (Audio EQ Cookbook, R. Bristow-Johnson): { kind: 'peaking', centerHz, gainDb, q } or { kind: 'low-shelf' | 'high-shelf', cornerHz, gainDb, q? | slope? }." });

export type EqFilterInput = z.infer<typeof eqFilterSchema>;
export type PeakingFilterInput = z.infer<typeof peakingFilterSchema>;
