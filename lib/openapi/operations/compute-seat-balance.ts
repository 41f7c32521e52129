import { BODY_LIMIT_BYTES } from '@/lib/http';
import { seatBalanceRequestSchema } from '@/lib/validations/compute-seat-balance';
import { seatBalanceAnswerSchema } from '../answers/compute-seat-balance';
import type { ApiOperation } from '../types';
import { ANSWER_SHAPES } from '../answer-shapes';

// Invented example: the 6.4 × 4.9 × 2.7 m "Juniper Lane screening room" of the demo (fictional).
const ROOM = { lengthM: 6.4, widthM: 4.9, heightM: 2.7, rt60S: 0.4, temperatureC: 20 };
const SEATS = [
  { name: 'Row 1 left', xM: 1.75, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 centre', xM: 2.45, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 right', xM: 3.15, yM: 3.7, zM: 1.1 },
];
const SUBS = [
  { name: 'Sub front left', xM: 0.3, yM: 0.3, zM: 0.3 },
  { name: 'Sub right wall', xM: 4.6, yM: 2.8, zM: 0.3 },
];
const MEASUREMENT = '00000000-0000-4000-8000-000000000001';
const MEASUREMENT_2 = '00000000-0000-4000-8000-000000000002';

/** POST /api/v1/seat-balance. */
export const SEAT_BALANCE_OPERATIONS: ApiOperation[] = [
  {
    id: 'seat-balance',
    method: 'POST',
    path: '/api/v1/seat-balance',
    query: ANSWER_SHAPES.seatBalance.query,
    tag: 'Compute',
    summary:
      'Seat balance: each sub’s delay, gain and polarity (and, when asked, where to put the subs among candidate positions) that make the seats hear the same bass, from the modal model of the room or from stored measurements of every sub at every seat.',
    notes: [
      'Objective: minimise the mean seat-to-seat spread over the band — at each frequency the loudest seat minus the quietest (dB), averaged over the band; exactly the meanSpreadDb of POST /api/v1/room-response for the same settings and grid — subject to an output floor: the seats’ mean level (power mean over seats and band) may fall at most maxOutputLossDb below every sub in phase at 0 ms / 0 dB. Basis: T. Welti and A. Devantier, “Low-Frequency Optimization Using Multiple Subwoofers”, JAES 54(5), 2006; T. Welti, “Subwoofers: Optimum Number and Locations”, AES 2002.',
      'Two forms: the modal model (room, seats and subs with positions; no sign-in needed), or — a body with `measurements` — one stored measurement per sub per seat, read with the caller’s rights (a session or a personal access token: 401 signed out, 404 for a measurement the caller may not read). Without `present` settings the measured answer is never worse than every sub at 0 ms / 0 dB; with them, never worse than them either.',
      'The modal model is a rigid rectangular room; furniture, openings and soft walls move and damp the modes. Measure after applying the settings.',
      'Caution: a gain boost costs amplifier and driver headroom. Check Headroom before raising a sub, and keep listening levels safe.',
      'Bodies up to 256 kB (413 beyond), JSON only (415 otherwise). Invalid input is a 400 naming the field.',
    ],
    access: 'public',
    body: { schema: seatBalanceRequestSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [{ status: 200, description: 'Each sub’s setting, the spread and level before and after, each seat’s curve, and the ranked placements when asked.', schema: seatBalanceAnswerSchema }],
    errors: [400, 401, 404, 413, 415, 429, 503],
    examples: [
      {
        title: 'The invented Juniper Lane room: a corner sub and a side-wall sub, three seats',
        body: { room: ROOM, seats: SEATS, subs: SUBS },
        executed: true,
        status: 200,
        responseExcerpt: {
          subs: [{ name: 'Sub front left', xM: 0.3, yM: 0.3, zM: 0.3, delayMs: 0, gainDb: 0, invert: false }],
          before: { meanSpreadDb: 9.32, maxSpreadDb: 31.93, maxSpreadHz: 34.62, meanLevelDb: 0 },
          after: { meanSpreadDb: 4.06, maxSpreadDb: 16.36, maxSpreadHz: 42.38, meanLevelDb: -0.86 },
          evaluated: 11966,
          frequencyHz: [20],
          seats: [{ name: 'Row 1 left', beforeDb: [-4.66], afterDb: [-7.37] }],
        },
      },
      {
        title: 'Where two subs should go: every pair of the eight default positions, ranked',
        body: { room: ROOM, seats: SEATS, subs: SUBS, placement: { count: 2 } },
        executed: true,
        status: 200,
        responseExcerpt: {
          placements: {
            totalCombinations: 28,
            rankedCombinations: 28,
            capped: false,
            ranked: [{ subs: [{ name: 'Sub front left', candidate: 'Front wall middle', xM: 2.45, yM: 0.25, zM: 0.25, delayMs: 0, gainDb: 0.5, invert: false }], after: { meanSpreadDb: 0.86 } }],
          },
        },
      },
      {
        title: 'One seat is refused: the spread is between seats',
        body: { room: ROOM, seats: [SEATS[0]], subs: SUBS },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'seats', message: 'at least two seats are needed: the spread is between seats' }] } },
      },
      {
        title: 'From stored measurements, signed out: answered 401 (with a session or token, every sub at every seat is read)',
        body: {
          seats: [{ name: 'Row 1 left' }, { name: 'Row 1 centre' }],
          subs: [{ name: 'Sub front left' }],
          measurements: [
            { sub: 'Sub front left', seat: 'Row 1 left', measurementId: MEASUREMENT },
            { sub: 'Sub front left', seat: 'Row 1 centre', measurementId: MEASUREMENT_2 },
          ],
        },
        executed: true,
        status: 401,
        responseExcerpt: { error: { code: 'unauthorized' } },
      },
    ],
  },
];
