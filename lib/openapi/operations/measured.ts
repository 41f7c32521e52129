import { BODY_LIMIT_BYTES } from '@/lib/http';
import { compareRequestSchema } from '@/lib/validations/measured-compare';
import { extensionRequestSchema } from '@/lib/validations/measured-extension';
import { predictRequestSchema } from '@/lib/validations/measurement';
import { compareAnswerSchema, extensionAnswerSchema, predictAnswerSchema } from '../answers/measured';
import type { ApiOperation } from '../types';
import { ANSWER_SHAPES } from '../answer-shapes';

/** 1/6-octave points from 20 Hz to 640 Hz: a flat (0 dB, 0°) measurement, the simplest honest example. */
const EXAMPLE_HZ = Array.from({ length: 31 }, (_, i) => Number((20 * 2 ** (i / 6)).toPrecision(5)));
const flatCurve = (withPhase: boolean) => ({
  frequencyHz: EXAMPLE_HZ,
  magnitudeDb: EXAMPLE_HZ.map(() => 0),
  ...(withPhase ? { phaseDeg: EXAMPLE_HZ.map(() => 0) } : {}),
});

/**
 * 1/6-octave points from 20 Hz to 2.56 kHz of an invented sealed mains speaker: a second-order Butterworth high-pass at
 * 50 Hz (Q 0.707; Small 1972), so its −3 dB point is 50 Hz. `offsetDb` moves the whole curve (a second seat or run).
 */
const SEALED_HZ = Array.from({ length: 43 }, (_, i) => Number((20 * 2 ** (i / 6)).toPrecision(5)));
const sealedSeat = (offsetDb: number) => ({
  frequencyHz: SEALED_HZ,
  magnitudeDb: SEALED_HZ.map((f) => Number((offsetDb + 10 * Math.log10((f / 50) ** 4 / (1 + (f / 50) ** 4))).toFixed(2))),
});
const FIRST_RUN = { name: 'Row 1 centre, first run (invented)', ...sealedSeat(0) };
const SECOND_RUN = { name: 'Row 1 centre, second run (invented)', ...sealedSeat(-1) };

const MEASUREMENT = '00000000-0000-4000-8000-000000000001';
const inlineNote = 'Inline points need no sign-in; a measurementId is read with the caller’s rights (a session or a personal access token: 401 signed out, 404 for a measurement the caller may not read).';
const bodyNote = 'Bodies up to 2 MB (413 beyond), JSON only (415 otherwise). Unknown fields are refused; invalid input is a 400 naming the field.';
/** The measured routes may read stored measurements: 401 and 404 with the caller's rights, 503 with the database down. */
const measuredErrors = [400, 401, 404, 413, 415, 429, 503];

/** POST /api/v1/measured/predict, /measured/extension and /measured/compare. */
export const MEASURED_OPERATIONS: ApiOperation[] = [
  {
    id: 'measured-predict',
    method: 'POST',
    path: '/api/v1/measured/predict',
    query: ANSWER_SHAPES.measuredPredict.query,
    tag: 'Measured',
    summary:
      'Predicts the blend at the seat from a mains and a sub measurement with the System’s crossover, gains, delays and polarity, beside the sum as measured; with the best delay and polarity on the measured pair and its Timing window.',
    notes: [
      'Each curve is taken as holding the speaker’s own roll-off, its voicing switches and the distance, so none of them is added; the processor’s EQ on that output (processorEq, up to 26 peaking or shelf filters as on /api/v1/blend) is. A curve without phase gets its minimum-phase estimate, and the answer says so.',
      'The alignment needs the curves to cover half to four times the crossover; otherwise it is null and alignmentNote says why.',
      inlineNote,
      bodyNote,
    ],
    access: 'public',
    body: { schema: predictRequestSchema, limitBytes: BODY_LIMIT_BYTES.measuredCurves },
    answers: [{ status: 200, description: 'The curves as measured and processed, the predicted and measured sums, and the best alignment.', schema: predictAnswerSchema }],
    errors: measuredErrors,
    examples: [
      {
        title: 'Two flat inline measurements (the sub file without phase), LR4 at 80 Hz, the sub set 2 ms late',
        body: {
          temperatureC: 20,
          crossoverHz: 80,
          mainsHighpass: { family: 'linkwitz-riley', order: 4 },
          subLowpass: { family: 'linkwitz-riley', order: 4 },
          mains: { curve: flatCurve(true), gainDb: 0, delayMs: 0, invert: false },
          sub: { curve: flatCurve(false), gainDb: 0, delayMs: 2, invert: false },
        },
        executed: true,
        status: 200,
        responseExcerpt: {
          frequencyHz: [20],
          phaseEstimated: true,
          paths: [{ name: 'mains', magnitudeDb: [-48.199], phaseEstimated: false }],
          predictedSum: { magnitudeDb: [-0.001], phaseDeg: [-55.67] },
          measuredSum: { magnitudeDb: [6.021] },
          alignment: { addTo: 'mains', addDelayMs: 2, subDelayMs: 0, mainsDelayMs: 0, invert: false, flatnessDb: 0, timingWindowMs: [-1.85, 1.85] },
        },
      },
      {
        title: 'A stored measurement, signed out: answered 401 (with a session or token it is read)',
        body: {
          temperatureC: 20,
          crossoverHz: 80,
          mainsHighpass: { family: 'linkwitz-riley', order: 4 },
          subLowpass: { family: 'linkwitz-riley', order: 4 },
          mains: { curve: { measurementId: MEASUREMENT }, gainDb: 0, delayMs: 0, invert: false },
          sub: { curve: flatCurve(false), gainDb: 0, delayMs: 0, invert: false },
        },
        executed: true,
        status: 401,
        responseExcerpt: { error: { code: 'unauthorized' } },
      },
    ],
  },
  {
    id: 'measured-extension',
    method: 'POST',
    path: '/api/v1/measured/extension',
    query: ANSWER_SHAPES.measuredExtension.query,
    tag: 'Measured',
    summary:
      'How low a source goes in the room: the −3, −6 and −10 dB points below its own mean level over a band, from its curve at one seat or the spatial average of several; and a crossover judged against them.',
    notes: ['400 naming the field: a band outside the data, curves sharing less than an octave, more than 40 curves, and the inline-curve rules.', inlineNote, bodyNote],
    access: 'public',
    body: { schema: extensionRequestSchema, limitBytes: BODY_LIMIT_BYTES.measuredCurves },
    answers: [{ status: 200, description: 'The mean level, the −3/−6/−10 dB points, the analysed curve and the crossover’s verdict.', schema: extensionAnswerSchema }],
    errors: measuredErrors,
    examples: [
      {
        title: 'An invented sealed mains speaker (−3 dB at 50 Hz) at two seats, the second 1 dB quieter, against a crossover at 80 Hz',
        body: { curves: [{ name: 'Row 1 centre (invented)', ...sealedSeat(0) }, { name: 'Row 1 left (invented)', ...sealedSeat(-1) }], crossoverHz: 80 },
        executed: true,
        status: 200,
        responseExcerpt: {
          band: { startHz: 200, stopHz: 2000 },
          meanLevelDb: -0.473,
          pointsHz: { minus3: 50.08, minus6: 38.11, minus10: 28.87 },
          averagedFrom: 2,
          names: ['Row 1 centre (invented)', 'Row 1 left (invented)'],
          curve: { frequencyHz: [20], magnitudeDb: [-16.501] },
          crossover: {
            crossoverHz: 80,
            octavesAboveMinus3: 0.676,
            octavesAboveMinus6: 1.07,
            verdict: 'clear',
            rule: 'keep the crossover at least half an octave above the mains’ in-room −3 dB point (common practice)',
            summary: 'A crossover at 80 Hz sits 0.68 octaves above the in-room −3 dB point (50.1 Hz) and 1.07 octaves above the −6 dB point (38.1 Hz): fine.',
          },
        },
      },
      {
        title: 'A band outside the data is refused naming it',
        body: { curves: [sealedSeat(0)], band: { startHz: 2000, stopHz: 8000 } },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'band' }] } },
      },
    ],
  },
  {
    id: 'measured-compare',
    method: 'POST',
    path: '/api/v1/measured/compare',
    query: ANSWER_SHAPES.measuredCompare.query,
    tag: 'Measured',
    summary:
      'Runs compared: each other run as its difference from a reference run (dB against frequency), smoothed, over the range every run covers; levels as measured unless a band to match them over is given.',
    notes: ['400 naming the field: runs sharing less than an octave (others), a band outside their common range (matchLevelBandHz), more than 12 others, and the inline-curve rules.', inlineNote, bodyNote],
    access: 'public',
    body: { schema: compareRequestSchema, limitBytes: BODY_LIMIT_BYTES.measuredCurves },
    answers: [{ status: 200, description: 'The common grid and each other run’s difference from the reference.', schema: compareAnswerSchema }],
    errors: measuredErrors,
    examples: [
      {
        title: 'An invented sealed mains speaker at one seat, a second run 1 dB quieter: levels as measured, 1/6-octave smoothing',
        body: { reference: FIRST_RUN, others: [SECOND_RUN], smoothingFraction: 6 },
        executed: true,
        status: 200,
        responseExcerpt: {
          frequencyHz: [20],
          rangeHz: { startHz: 20, stopHz: 2560 },
          smoothingFraction: 6,
          levels: 'as measured',
          matchLevelBandHz: null,
          reference: { name: 'Row 1 centre, first run (invented)' },
          differences: [{ name: 'Row 1 centre, second run (invented)', differenceDb: [-1], levelOffsetDb: 0, minDb: -1, maxDb: -1, largest: { differenceDb: -1, frequencyHz: 20 } }],
        },
      },
      {
        title: 'The same two runs with their levels matched over 200 Hz–2 kHz: the 1 dB is taken out',
        body: { reference: FIRST_RUN, others: [SECOND_RUN], smoothingFraction: 6, matchLevelBandHz: { startHz: 200, stopHz: 2000 } },
        executed: true,
        status: 200,
        responseExcerpt: {
          levels: 'matched',
          matchLevelBandHz: { startHz: 200, stopHz: 2000 },
          differences: [{ differenceDb: [0], levelOffsetDb: 1, largest: { differenceDb: 0, frequencyHz: 20 } }],
        },
      },
    ],
  },
];
