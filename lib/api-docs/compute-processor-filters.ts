import { BIQUAD_CONVENTION, EQ_LIMITS, MAX_PROCESSOR_FILTERS } from '@/dsp';
import { COEFFICIENT_SIGN_NOTE } from '@/lib/system-model/processor-filters';
import type { ApiRouteDoc } from './types';

const LR4_LOWPASS = { kind: 'crossover', family: 'linkwitz-riley', order: 4, response: 'lowpass', cornerHz: 80 };

export const PROCESSOR_FILTERS_DOCS: ApiRouteDoc[] = [
  {
    id: 'processor-filters',
    method: 'POST',
    path: '/api/v1/processor-filters',
    summary: `Filters as the digital second-order sections (biquads) a processor runs at its sample rate, in the convention ${BIQUAD_CONVENTION}; their exact digital response, the analog prototype's, and how far apart they are. Crossovers: Butterworth and Linkwitz–Riley through the bilinear transform pre-warped at the corner (A. V. Oppenheim and R. W. Schafer, "Discrete-Time Signal Processing"); EQ and all-pass: R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad filter coefficients" (W3C Audio EQ Cookbook note, 2021).`,
    auth: 'none',
    fields: [
      { name: 'sampleRateHz', type: 'number', unit: 'Hz', required: true, description: 'The processor’s sample rate, 8 000…384 000 (usually 44 100, 48 000, 96 000 or 192 000).' },
      { name: 'filters[]', type: 'array', required: true, description: `1…${MAX_PROCESSOR_FILTERS} filters in the order the processor runs them (the cascade is their product). Each one's frequency must be below the Nyquist frequency (sampleRateHz / 2): otherwise 400 naming filters.N.cornerHz (or .centerHz).` },
      { name: 'filters[] crossover', type: 'object', description: "{ kind: 'crossover', family: 'butterworth' (order 1–8) | 'linkwitz-riley' (order 2, 4, 8), order, response: 'lowpass' | 'highpass', cornerHz 5…192 000 }: ⌈order/2⌉ sections, an odd Butterworth's first-order section last (b2 = a2 = 0)." },
      { name: 'filters[] peaking', type: 'object', description: `{ kind: 'peaking', centerHz, gainDb ${EQ_LIMITS.gainDb.min}…${EQ_LIMITS.gainDb.max}, q ${EQ_LIMITS.q.min}…${EQ_LIMITS.q.max} }: one section, exactly gainDb at centerHz.` },
      { name: 'filters[] low-shelf / high-shelf', type: 'object', description: `{ kind: 'low-shelf' | 'high-shelf', cornerHz, gainDb, q? | slope? }: one section; gainDb below (low) or above (high) the corner, half of it in dB at the corner. Width as q, or the cookbook's shelf slope S ${EQ_LIMITS.slope.min}…${EQ_LIMITS.slope.max} (default 1, the steepest without overshoot), not both.` },
      { name: 'filters[] allpass', type: 'object', description: "{ kind: 'allpass', order: 1 | 2, cornerHz, q? }: one section; phase −90° (first order) or −180° (second order, q default 1/√2) at the corner, level 0 dB everywhere." },
      { name: 'grid', type: '{ startHz, stopHz, pointsPerOctave }', description: 'Log-spaced frequencies of the curves (10…24 000 Hz, at most 4 000 points); stopHz must be below the Nyquist frequency (else 400 naming grid.stopHz). Default: 10 Hz to min(20 kHz, 0.45·sampleRateHz) at 48 points per octave.' },
    ],
    answer: [
      { name: 'sampleRateHz', type: 'number', unit: 'Hz', description: 'Echoed.' },
      { name: 'convention', type: 'string', description: `"${BIQUAD_CONVENTION}". ${COEFFICIENT_SIGN_NOTE}` },
      { name: 'sections', type: '{ filter, b0, b1, b2, a1, a2 }[]', description: 'Every section in running order; filter is the index of the request filter it belongs to. Coefficients at full double precision (never rounded: JSON numbers read back to the same doubles); a0 = 1.' },
      { name: 'response', type: '{ frequencyHz, magnitudeDb, phaseDeg }', unit: 'Hz / dB / °', description: 'The cascade of the digital sections, exact (H(e^jω) evaluated, not simulated): frequency 0.001 Hz, level 0.001 dB, phase 0.01° wrapped to (−180, 180].' },
      { name: 'analog', type: '{ magnitudeDb, phaseDeg }', unit: 'dB / °', description: 'The analog prototypes on the same grid.' },
      { name: 'difference', type: '{ magnitudeDb, phaseDeg }', unit: 'dB / °', description: 'Digital minus analog at every grid point (1e-5 dB, 1e-4°); large in the stop band near the Nyquist frequency, where the bilinear transform squeezes the response to nothing.' },
      { name: 'deviation', type: '{ maxDb, maxDeg, upToHz, floorDb }', unit: 'dB / ° / Hz / dB', description: 'The largest |difference| in level and phase (3 significant digits) over the grid up to upToHz = min(20 kHz, 0.45·sampleRateHz), where the analog level is at least floorDb (−40 dB).' },
    ],
    examples: [
      {
        title: 'A sub output at 48 kHz: LR4 low-pass at 80 Hz, then a −4 dB peaking cut at 45 Hz (Q 5)',
        request: { sampleRateHz: 48000, filters: [LR4_LOWPASS, { kind: 'peaking', centerHz: 45, gainDb: -4, q: 5 }] },
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
        request: { sampleRateHz: 48000, filters: [{ ...LR4_LOWPASS, response: 'highpass', cornerHz: 24000 }] },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'filters.0.cornerHz', message: 'must be below the Nyquist frequency, 24000 Hz at a sample rate of 48000 Hz' }] } },
      },
    ],
    notes: [
      'Every section is stable: both poles inside the unit circle for any valid request.',
      'The Processor filters tab of the System editor and the Settings sheet show the same sections for a System’s outputs (each main channel’s high-pass, each sub’s low-pass and EQ, the LFE low-pass).',
    ],
  },
];
