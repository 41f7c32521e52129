import { z } from 'zod';
import { EQ_LIMITS, MAX_PROCESSOR_FILTERS, SAMPLE_RATE_LIMITS_HZ } from '@/dsp';
import { num } from './common';
import { gridSchema } from './compute-common';
import { peakingFilterSchema, shelfFilterSchema } from './eq-filter';
import { filterFamilySchema, refineSlopeOrder } from './slope';

/**
 * The request body of POST /api/v1/processor-filters (fields on the API page /docs/api): a sample rate and up to
 * MAX_PROCESSOR_FILTERS filters — crossover high-/low-passes, the cookbook's peaking filter and shelves, all-passes —
 * and an optional grid. Unknown keys are refused; a corner at or above the Nyquist frequency is refused naming it
 * (`filters.2.cornerHz`), and so is a grid reaching it (`grid.stopHz`).
 */

/** The highest corner any rate allows is below half the highest rate; the Nyquist check per request is below. */
const cornerHz = num(5, SAMPLE_RATE_LIMITS_HZ.max / 2, 'Hz');

const crossoverSchema = z
  .strictObject({
    kind: z.literal('crossover'),
    family: filterFamilySchema,
    order: num(1, 8).int('must be a whole number'),
    response: z.enum(['lowpass', 'highpass'], { error: "must be 'lowpass' or 'highpass'" }),
    cornerHz,
  })
  .superRefine((f, ctx) => refineSlopeOrder(f, ctx));

const peakingSchema = z.strictObject({ ...peakingFilterSchema.shape, centerHz: cornerHz });

const shelfSchema = z
  .strictObject({ ...shelfFilterSchema.shape, cornerHz })
  .refine((f) => f.q === undefined || f.slope === undefined, { message: 'give q or slope, not both', path: ['slope'] });

const allpassSchema = z
  .strictObject({
    kind: z.literal('allpass'),
    order: z.union([z.literal(1), z.literal(2)], { error: 'must be 1 or 2' }),
    cornerHz,
    q: num(EQ_LIMITS.q.min, EQ_LIMITS.q.max).optional(),
  })
  .refine((f) => f.order === 2 || f.q === undefined, { message: 'q applies to a second-order all-pass only', path: ['q'] });

export const processorFilterSchema = z.discriminatedUnion('kind', [crossoverSchema, peakingSchema, shelfSchema, allpassSchema], {
  error: "kind must be 'crossover', 'peaking', 'low-shelf', 'high-shelf' or 'allpass'",
});

/** The field holding a filter's frequency: a peaking filter's centre, every other filter's corner. */
const frequencyField = (f: { kind: string }): 'centerHz' | 'cornerHz' => (f.kind === 'peaking' ? 'centerHz' : 'cornerHz');

/** POST /api/v1/processor-filters. */
export const processorFiltersRequestSchema = z
  .strictObject({
    sampleRateHz: num(SAMPLE_RATE_LIMITS_HZ.min, SAMPLE_RATE_LIMITS_HZ.max, 'Hz'),
    filters: z.array(processorFilterSchema).min(1, 'must hold at least one filter').max(MAX_PROCESSOR_FILTERS, `must hold at most ${MAX_PROCESSOR_FILTERS} filters`),
    grid: gridSchema.optional(),
  })
  .superRefine((r, ctx) => {
    const nyquistHz = r.sampleRateHz / 2;
    const below = `must be below the Nyquist frequency, ${nyquistHz} Hz at a sample rate of ${r.sampleRateHz} Hz`;
    r.filters.forEach((f, i) => {
      const field = frequencyField(f);
      const hz = field === 'centerHz' ? (f as { centerHz: number }).centerHz : (f as { cornerHz: number }).cornerHz;
      if (hz >= nyquistHz) ctx.addIssue({ code: 'custom', path: ['filters', i, field], message: below });
    });
    if (r.grid && r.grid.stopHz >= nyquistHz) ctx.addIssue({ code: 'custom', path: ['grid', 'stopHz'], message: below });
  });

export type ProcessorFiltersRequest = z.infer<typeof processorFiltersRequestSchema>;

