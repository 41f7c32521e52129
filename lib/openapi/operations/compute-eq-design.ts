import { HOUSE_CURVE_DEFINITION, NULL_DEFINITION } from '@/dsp';
import { BODY_LIMIT_BYTES } from '@/lib/http';
import { eqDesignRequestSchema } from '@/lib/validations/compute-eq-design';
import { eqDesignAnswerSchema } from '../answers/compute-eq-design';
import type { ApiOperation } from '../types';
import { ANSWER_SHAPES } from '../answer-shapes';

// Invented examples: the 6.4 × 4.9 × 2.7 m "Juniper Lane screening room" of the demo (fictional) with two front-corner
// subs, and a made-up curve with a resonance near 40 Hz.
const ROOM = { lengthM: 6.4, widthM: 4.9, heightM: 2.7, rt60S: 0.4, temperatureC: 20 };
const SEATS = [
  { name: 'Row 1 left', xM: 1.75, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 centre', xM: 2.45, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 right', xM: 3.15, yM: 3.7, zM: 1.1 },
];
const SUBS = [
  { name: 'Sub front left', xM: 0.3, yM: 0.3, zM: 0.3, rolloffs: [{ kind: 'vented', cornerHz: 22 }] },
  { name: 'Sub front right', xM: 4.6, yM: 0.3, zM: 0.3, rolloffs: [{ kind: 'vented', cornerHz: 22 }] },
];
const CURVE_HZ = [20, 22.4, 25.2, 28.3, 31.7, 35.6, 40, 44.9, 50.4, 56.6, 63.5, 71.3, 80, 89.8, 100.8, 113.1];
const CURVE_DB = [0, 0.2, 0.5, 1.3, 3.2, 6.4, 7, 4.1, 1.8, 0.7, 0.3, 0.1, 0, -0.2, -0.1, 0];
const MEASUREMENT = '00000000-0000-4000-8000-000000000001';

/** POST /api/v1/eq-design. */
export const EQ_DESIGN_OPERATIONS: ApiOperation[] = [
  {
    id: 'eq-design',
    method: 'POST',
    path: '/api/v1/eq-design',
    query: ANSWER_SHAPES.eqDesign.query,
    tag: 'Compute',
    summary:
      'The EQ designer: up to maxFilters peaking filters (the Audio EQ Cookbook’s, R. Bristow-Johnson) for the sub outputs, bringing the subs’ response toward a target over a band, cut first, never worse than no EQ. Three inputs: an inline curve, the modal model of a room (the subs as they play now), or stored measurements.',
    notes: [
      `The target is flat or a house curve (${HOUSE_CURVE_DEFINITION}), plus the crossover low-pass’s own shape when the response runs through it, placed at the median of the response less that shape over the band outside the nulls.`,
      `Nulls are left alone: ${NULL_DEFINITION}; no boost’s bandwidth (the cookbook’s, between its half-gain frequencies) may reach one.`,
      'Search: the largest area above the target gets a cut first, then the largest below a boost (at most maxBoostDb); each filter fitted alone, then all together (Levenberg–Marquardt on the RMS error in dB); filters under 0.5 dB or worth under 0.01 dB dropped; rounded to 0.1 Hz, 0.1 dB and Q 0.01, and the residual recomputed from the rounded biquads at sampleRateHz. The residual is never worse than before: when nothing helps, no filters.',
      'Which form a body is: with `measurements`, stored measurements (read with the caller’s rights: a session or a personal access token; 401 signed out, 404 for a measurement the caller may not read) — one file per seat of every sub playing together (uploaded with role "all subs"), or name `sub` in each and give `subs` with their present settings; with `frequencyHz`, an inline curve; otherwise the modal model (`room`, `seats`, `subs`).',
      'EQ cannot fill a cancellation: move a sub or the seat, or use Seat balance, before equalising. The modal model is a rigid rectangular room; measure after applying the EQ.',
      'Caution: boosting the sub’s low end costs amplifier and driver headroom; check the Headroom tab after EQ, and keep listening levels safe.',
      'Bodies up to 256 kB (413 beyond), JSON only (415 otherwise). Invalid input is a 400 naming the field.',
    ],
    access: 'public',
    body: { schema: eqDesignRequestSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [{ status: 200, description: 'The filters, their sections, the residual before and after, the nulls left alone and the curves.', schema: eqDesignAnswerSchema }],
    errors: [400, 401, 404, 413, 415, 429, 503],
    examples: [
      {
        title: 'An inline curve with an invented resonance near 40 Hz, flat target',
        body: { frequencyHz: CURVE_HZ, magnitudeDb: CURVE_DB },
        executed: true,
        status: 200,
        responseExcerpt: {
          filters: [{ kind: 'peaking', centerHz: 38.3, gainDb: -9, q: 2.54 }],
          sections: [{ b0: 0.9989328185372426, b1: -1.9966667741619417, b2: 0.9977590487614613, a1: -1.9966667741619417, a2: 0.9966918672987038 }],
          residual: { before: { rmsDb: 2.65, maxDb: 6.6 }, after: { rmsDb: 0.09, maxDb: 0.18 } },
          nulls: [],
          levelOffsetDb: 0.4,
          input: 'the curve given',
        },
      },
      {
        title: 'The invented Juniper Lane room at the MLP: two front-corner subs through an LR4 low-pass at 80 Hz, a 4 dB house curve below 60 Hz',
        body: { room: ROOM, seats: SEATS, subs: SUBS, at: 'Row 1 centre', lowpass: { family: 'linkwitz-riley', order: 4, cornerHz: 80 }, target: { kind: 'house', riseDb: 4, belowHz: 60 } },
        executed: true,
        status: 200,
        responseExcerpt: {
          input: 'model at Row 1 centre',
          filters: [{ kind: 'peaking', centerHz: 88.4, gainDb: -15, q: 9.91 }],
          residual: { before: { rmsDb: 8.34 }, after: { rmsDb: 4.12 } },
          nulls: [{ frequencyHz: 96.63, depthDb: 21.4, lowHz: 95.47, highHz: 97.94, reason: 'a dip 21.4 dB below the level around it…' }],
          frequencyHz: [15],
          targetDb: [3.97],
        },
      },
      {
        title: 'A boost limit above 12 dB is refused',
        body: { frequencyHz: CURVE_HZ, magnitudeDb: CURVE_DB, maxBoostDb: 20 },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'maxBoostDb', message: 'must be at most 12 dB' }] } },
      },
      {
        title: 'From a stored measurement of every sub playing together, signed out: answered 401 (with a session or token it is read)',
        body: { measurements: [{ seat: 'Row 1 centre', measurementId: MEASUREMENT }], lowpass: { family: 'linkwitz-riley', order: 4, cornerHz: 80 } },
        executed: true,
        status: 401,
        responseExcerpt: { error: { code: 'unauthorized' } },
      },
    ],
  },
];
