import { z } from 'zod';
import { EQ_LIMITS, MAX_PROCESSOR_FILTERS, SAMPLE_RATE_LIMITS_HZ } from '@/dsp';
import { num } from './common';
import { gridSchema } from './compute-common';
import { peakingFilterSchema, shelfFilterSchema } from './eq-filter';
import { filterFamilySchema, refineSlopeOrder } from './slope';

/**
 * The request body of POST /api/v1/processor-filters (each field's words sit on it as `.meta`): a sample rate and up to
 * MAX_PROCESSOR_FILTERS filters — crossover high-/low-passes, the cookbook's peaking filter and shelves, all-passes —
 * and an optional grid. Unknown keys are refused; a corner at or above the Nyquist frequency is refused naming it
 * (`filters.2.cornerHz`), and so is a grid reaching it (`grid.stopHz`).
 */

/** The highest corner any rate allows is below half the highest rate; the Nyquist check per request is below. */
const hzLimit = num(5, SAMPLE_RATE_LIMITS_HZ.max / 2, 'Hz');
const belowNyquist = `below the Nyquist frequency (sampleRateHz / 2), else 400 naming filters.N`;
const cornerHz = hzLimit.meta({ description: `The corner frequency, 5–${SAMPLE_RATE_LIMITS_HZ.max / 2} Hz and ${belowNyquist}.cornerHz.`, 'x-unit': 'Hz' });
const centerHz = hzLimit.meta({ description: `The centre frequency, 5–${SAMPLE_RATE_LIMITS_HZ.max / 2} Hz and ${belowNyquist}.centerHz.`, 'x-unit': 'Hz' });

const crossoverSchema = z
  .strictObject({
    kind: z.literal('crossover').meta({ description: 'A crossover high- or low-pass.' }),
    family: filterFamilySchema,
    order: num(1, 8).int('must be a whole number').meta({ description: 'Butterworth 1–8, Linkwitz–Riley 2, 4 or 8.' }),
    response: z.enum(['lowpass', 'highpass'], { error: "must be 'lowpass' or 'highpass'" }).meta({ description: 'Low-pass or high-pass.' }),
    cornerHz,
  })
  .superRefine((f, ctx) => refineSlopeOrder(f, ctx))
  .meta({ description: 'A crossover high- or low-pass through the bilinear transform pre-warped at the corner: ⌈order/2⌉ sections, an odd Butterworth’s first-order section last (b2 = a2 = 0).' });

const peakingSchema = z
  .strictObject({ ...peakingFilterSchema.shape, centerHz })
  .meta({ description: `The cookbook’s peaking filter: one section, exactly gainDb (${EQ_LIMITS.gainDb.min}…${EQ_LIMITS.gainDb.max} dB) at centerHz, Q ${EQ_LIMITS.q.min}…${EQ_LIMITS.q.max}.` });

const shelfSchema = z
  .strictObject({ ...shelfFilterSchema.shape, cornerHz })
  .refine((f) => f.q === undefined || f.slope === undefined, { message: 'give q or slope, not both', path: ['slope'] })
  .meta({
    description: `The cookbook’s low or high shelf: one section; gainDb below (low) or above (high) the corner, half of it in dB at the corner. Width as q, or the shelf slope S ${EQ_LIMITS.slope.min}…${EQ_LIMITS.slope.max} (default 1, the steepest without overshoot), not both.`,
  });

const allpassSchema = z
  .strictObject({
    kind: z.literal('allpass').meta({ description: 'An all-pass.' }),
    order: z.union([z.literal(1), z.literal(2)], { error: 'must be 1 or 2' }).meta({ description: 'First or second order.' }),
    cornerHz,
    q: num(EQ_LIMITS.q.min, EQ_LIMITS.q.max).optional().meta({ description: `Second order only: Q ${EQ_LIMITS.q.min}…${EQ_LIMITS.q.max} (default 1/√2).` }),
  })
  .refine((f) => f.order === 2 || f.q === undefined, { message: 'q applies to a second-order all-pass only', path: ['q'] })
  .meta({ description: 'An all-pass: one section; phase −90° (first order) or −180° (second order) at the corner, level 0 dB everywhere.' });

export const processorFilterSchema = z.discriminatedUnion('kind', [crossoverSchema, peakingSchema, shelfSchema, allpassSchema], {
  error: "kind must be 'crossover', 'peaking', 'low-shelf', 'high-shelf' or 'allpass'",
});

/** The field holding a filter's frequency: a peaking filter's centre, every other filter's corner. */
const frequencyField = (f: { kind: string }): 'centerHz' | 'cornerHz' => (f.kind === 'peaking' ? 'centerHz' : 'cornerHz');

/** POST /api/v1/processor-filters. */
export const processorFiltersRequestSchema = z
  .strictObject({
    sampleRateHz: num(SAMPLE_RATE_LIMITS_HZ.min, SAMPLE_RATE_LIMITS_HZ.max, 'Hz').meta({
      description: `The processor’s sample rate, ${SAMPLE_RATE_LIMITS_HZ.min}…${SAMPLE_RATE_LIMITS_HZ.max} Hz (usually 44 100, 48 000, 96 000 or 192 000).`,
      'x-unit': 'Hz',
    }),
    filters: z
      .array(processorFilterSchema)
      .min(1, 'must hold at least one filter')
      .max(MAX_PROCESSOR_FILTERS, `must hold at most ${MAX_PROCESSOR_FILTERS} filters`)
      .meta({ description: `1…${MAX_PROCESSOR_FILTERS} filters in the order the processor runs them (the cascade is their product).` }),
    grid: gridSchema.optional().meta({
      description:
        'Log-spaced frequencies of the curves (10…24 000 Hz, at most 4 000 points); stopHz must be below the Nyquist frequency (else 400 naming grid.stopHz). Default: 10 Hz to min(20 kHz, 0.45·sampleRateHz) at 48 points per octave.',
    }),
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

