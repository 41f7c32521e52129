import { BIQUAD_CONVENTION } from '@/dsp';
import { BODY_LIMIT_BYTES } from '@/lib/http';
import { processorFiltersRequestSchema } from '@/lib/validations/compute-processor-filters';
import { processorFiltersAnswerSchema } from '../answers/compute-processor-filters';
import type { ApiOperation } from '../types';
import { ANSWER_SHAPES } from '../answer-shapes';

const LR4_LOWPASS = { kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 };

/** POST /api/v1/processor-filters. */
export const PROCESSOR_FILTERS_OPERATIONS: ApiOperation[] = [
  {
    id: 'processor-filters',
    method: 'POST',
    path: '/api/v1/processor-filters',
    query: ANSWER_SHAPES.processorFilters.query,
    tag: 'Compute',
    summary: `Filters as the digital second-order sections (biquads) a processor runs at its sample rate, in the convention ${BIQUAD_CONVENTION}; their exact digital response, the analog prototype's, and how far apart they are.`,
    notes: [
      'Crossovers: Butterworth and Linkwitz–Riley through the bilinear transform pre-warped at the corner (A. V. Oppenheim and R. W. Schafer, "Discrete-Time Signal Processing"); EQ and all-pass: R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad filter coefficients" (W3C Audio EQ Cookbook note, 2021).',
      'Each filter’s frequency must be below the Nyquist frequency (sampleRateHz / 2): otherwise 400 naming filters.N.cornerHz (or .centerHz); so must the grid’s stopHz. Every section is stable: both poles inside the unit circle for any valid request.',
      'The Processor filters tab of the System editor and the Settings sheet show the same sections for a System’s outputs (each main channel’s high-pass, each sub’s low-pass and EQ, the LFE low-pass).',
      'Bodies up to 256 kB (413 beyond), JSON only (415 otherwise). Unknown fields are refused.',
    ],
    access: 'public',
    body: { schema: processorFiltersRequestSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [{ status: 200, description: 'The sections at full precision, the digital and analog curves and their difference.', schema: processorFiltersAnswerSchema }],
    errors: [400, 413, 415, 429],
    examples: [
      {
        title: 'A sub output at 48 kHz: LR4 low-pass at 80 Hz, then a −4 dB peaking cut at 45 Hz (Q 5)',
        body: { sampleRateHz: 48000, filters: [LR4_LOWPASS, { kind: 'peaking', centerHz: 45, gainDb: -4, q: 5 }] },
        executed: true,
        status: 200,
        responseExcerpt: {
          sampleRateHz: 48000,
          convention: BIQUAD_CONVENTION,
          sections: [{ filter: 0, b0: 0.000027213807988318866, b1: 0.00005442761597663773, b2: 0.000027213807988318866, a1: -1.9851906578962615, a2: 0.9852995131282146 }],
          response: { frequencyHz: [10, 10.145, 10.293], magnitudeDb: [-0.011], phaseDeg: [-21.6] },
          analog: { magnitudeDb: [-0.011], phaseDeg: [-21.6] },
          difference: { magnitudeDb: [0], phaseDeg: [0.0002] },
          deviation: { maxDb: 0.00276, maxDeg: 0.00463, upToHz: 20000, floorDb: -40 },
        },
      },
      {
        title: 'A corner at the Nyquist frequency is refused: 24 kHz at 48 kHz',
        body: { sampleRateHz: 48000, filters: [{ ...LR4_LOWPASS, response: 'highpass', cornerHz: 24000 }] },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'filters.0.cornerHz', message: 'must be below the Nyquist frequency, 24000 Hz at a sample rate of 48000 Hz' }] } },
      },
    ],
  },
];
