import { BODY_LIMIT_BYTES } from '@/lib/http';
import { ROOM_LIMITS } from '@/lib/validations/compute-common';
import { headroomRequestSchema } from '@/lib/validations/compute-headroom';
import { layoutRequestSchema } from '@/lib/validations/compute-layout';
import { roomModesRequestSchema, roomResponseRequestSchema } from '@/lib/validations/compute-room';
import { headroomAnswerSchema, layoutAnswerSchema, roomModesAnswerSchema, roomResponseAnswerSchema } from '../answers/compute-room';
import type { ApiOperation } from '../types';
import { ANSWER_SHAPES } from '../answer-shapes';

// Invented example room: the 6.4 × 4.9 × 2.7 m "Juniper Lane screening room" of the demo (fictional).
const ROOM = { lengthM: 6.4, widthM: 4.9, heightM: 2.7 };
const LISTENER = { xM: 2.45, yM: 3.7, zM: 1.1 };

/** Compute routes read JSON bodies up to 256 kB; nothing touches the database. */
const computeErrors = [400, 413, 415, 429];
const computeNote = `Bodies up to 256 kB (413 beyond), JSON only (415 otherwise). Invalid input is a 400 naming the field.`;

/** POST /api/v1/room-modes, /room-response, /layout and /headroom. */
export const ROOM_OPERATIONS: ApiOperation[] = [
  {
    id: 'room-modes',
    method: 'POST',
    path: '/api/v1/room-modes',
    query: ANSWER_SHAPES.roomModes.query,
    tag: 'Compute',
    summary:
      'Every axial, tangential and oblique mode of a rectangular room up to maxHz (Rayleigh), with the Schroeder frequency, the counts per one-third octave and the Bonello verdict, near-coincident modes, the ITU-R BS.1116-3 proportion check and Kuttruff’s statistical count.',
    notes: [
      `At most ${ROOM_LIMITS.maxModes} modes are answered: a room and maxHz that would give more are refused (400 naming maxHz).`,
      'A rigid rectangular room: real walls, openings and furniture shift and damp the modes.',
      computeNote,
    ],
    access: 'public',
    body: { schema: roomModesRequestSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [{ status: 200, description: 'The mode table and the checks beside it.', schema: roomModesAnswerSchema }],
    errors: computeErrors,
    examples: [
      {
        title: 'The invented Juniper Lane room up to 200 Hz (106 modes, Schroeder 137.5 Hz)',
        body: { ...ROOM, maxHz: 200, temperatureC: 20, rt60S: 0.4 },
        executed: true,
        status: 200,
        responseExcerpt: {
          speedOfSoundMps: 343.215,
          modes: [{ frequencyHz: 26.8136, indices: [1, 0, 0], kind: 'axial' }],
          schroederHz: 137.46,
          statisticalCount: { frequencyHz: 200, expected: 107.26, enumerated: 106, source: 'published: H. Kuttruff, Room Acoustics, ch. 3' },
          thirdOctaveBands: [{ centerHz: 25.12, nominalHz: 25, lowerHz: 22.39, upperHz: 28.18, count: 1, axial: 1, tangential: 0, oblique: 0 }],
          bonello: { passes: false, coincidencesAtHz: [63.1] },
          proportions: { passes: true, lengthToHeight: 2.37, widthToHeight: 1.815 },
        },
      },
      {
        title: 'maxHz above 500 Hz is refused with the field named',
        body: { ...ROOM, maxHz: 800, temperatureC: 20, rt60S: 0.4 },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', message: 'maxHz: must be at most 500 Hz', issues: [{ path: 'maxHz', message: 'must be at most 500 Hz' }] } },
      },
    ],
  },
  {
    id: 'room-response',
    method: 'POST',
    path: '/api/v1/room-response',
    query: ANSWER_SHAPES.roomResponse.query,
    tag: 'Compute',
    summary:
      'Predicted low-frequency pressure at each seat from each sub and from the subs summed (with their gain, delay and polarity), by modal summation damped by RT60; the seat-to-seat spread; one mode’s pressure over the floor; front-wall quarter-wave notches.',
    notes: [
      'Every seat and sub must lie inside the room (400 naming the coordinate, e.g. seats.0.xM).',
      'The modal model is a rigid rectangular room: furniture, openings and soft walls move and damp the modes. Above the Schroeder frequency the prediction loses meaning.',
      computeNote,
    ],
    access: 'public',
    body: { schema: roomResponseRequestSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [{ status: 200, description: 'Each seat’s level from the subs summed and from each alone, the spread, the map and the notches.', schema: roomResponseAnswerSchema }],
    errors: computeErrors,
    examples: [
      {
        title: 'Two front-corner subs, three seats, the (1,0,0) map and a 0.5 m front-wall notch',
        body: {
          room: { ...ROOM, rt60S: 0.4, temperatureC: 20 },
          grid: { startHz: 15, stopHz: 200, pointsPerOctave: 12 },
          seats: [
            { name: 'Row 1 left', xM: 1.75, yM: 3.7, zM: 1.1 },
            { name: 'Row 1 centre', xM: 2.45, yM: 3.7, zM: 1.1 },
            { name: 'Row 1 right', xM: 3.15, yM: 3.7, zM: 1.1 },
          ],
          subs: [
            { name: 'Sub front left', xM: 0.3, yM: 0.3, zM: 0.3 },
            { name: 'Sub front right', xM: 4.6, yM: 0.3, zM: 0.3, delayMs: 0.5 },
          ],
          map: { indices: [1, 0, 0], zM: 1.1, columns: 4, rows: 5 },
          quarterWave: [{ name: 'Sub front left', distanceM: 0.5 }],
        },
        executed: true,
        status: 200,
        responseExcerpt: {
          frequencyHz: [15],
          seats: [{ name: 'Row 1 left', summedDb: [-5.8], perSubDb: [[-12.41]], bandMeanDb: -1.12 }],
          spread: { startHz: 20, stopHz: 120, meanSpreadDb: 2.74, maxSpreadDb: 17.2, maxSpreadHz: 106.9 },
          map: { indices: [1, 0, 0], kind: 'axial', frequencyHz: 26.8136, pressure: [[0.951]] },
          quarterWave: [{ name: 'Sub front left', distanceM: 0.5, notchHz: 171.61 }],
          schroederHz: 137.46,
        },
      },
      {
        title: 'A seat outside the room is refused by its path',
        body: { room: { ...ROOM, rt60S: 0.4, temperatureC: 20 }, seats: [{ name: 'Too far', xM: 7, yM: 3, zM: 1.1 }], subs: [{ name: 'Sub', xM: 0.3, yM: 0.3, zM: 0.3 }] },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'seats.0.xM', message: 'Too far is 7 m across in a 4.9 m wide room' }] } },
      },
    ],
  },
  {
    id: 'layout',
    method: 'POST',
    path: '/api/v1/layout',
    query: ANSWER_SHAPES.layout.query,
    tag: 'Compute',
    summary:
      'Each speaker’s azimuth and elevation from the MLP against its channel’s recommended range (pass/warn), the front pair’s included angle, the toe-in to aim at the MLP, a seat or a point, and the distances, delays and trims a processor needs — the same channel settings as the Settings sheet, rounded once to 0.01 m, 0.01 ms and 0.1 dB.',
    notes: [
      'Delays: each source’s distance alignment to the farthest speaker or sub (plus the mains delay for speakers and a sub’s own delay for subs), the delay every source shares taken out, so the smallest is 0. Trims: level match by distance among the speakers, 20·log10(d/d_max), plus the channel’s offset.',
      'With a room, every position must lie inside it (400 naming the coordinate; no angle is computed from a position outside).',
      computeNote,
    ],
    access: 'public',
    body: { schema: layoutRequestSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [{ status: 200, description: 'Angles with their verdicts, toe-in, and every channel’s and sub’s processor settings.', schema: layoutAnswerSchema }],
    errors: computeErrors,
    examples: [
      {
        title: 'A 5.1 at ±30° and ±110° on a 2.5 m circle: all pass, 60° front pair',
        body: {
          template: '5.1',
          temperatureC: 20,
          room: ROOM,
          listener: LISTENER,
          speakers: [
            { channel: 'L', xM: 1.2, yM: 1.5349, zM: 1.1 },
            { channel: 'C', xM: 2.45, yM: 1.2, zM: 1.1 },
            { channel: 'R', xM: 3.7, yM: 1.5349, zM: 1.1 },
            { channel: 'SL', xM: 0.1008, yM: 4.555, zM: 1.1 },
            { channel: 'SR', xM: 4.7992, yM: 4.555, zM: 1.1 },
          ],
          subs: [{ name: 'Sub', xM: 0.3, yM: 0.3, zM: 0.3 }],
        },
        executed: true,
        status: 200,
        responseExcerpt: {
          speakers: [{ channel: 'L', name: 'Front left', azimuthDeg: 30, elevationDeg: 0, distanceM: 2.5, status: 'pass', toeInDeg: 30, delayMs: 4.67, trimDb: 0, message: 'within the recommended range' }],
          frontPair: { includedAngleDeg: 60, status: 'pass' },
          subs: [{ name: 'Sub', distanceM: 4.1, delayMs: 0, gainDb: 0 }],
          farthest: { name: 'Sub', distanceM: 4.1 },
        },
      },
      {
        title: 'A mains delay, a channel offset and a sub’s own delay and gain: the Settings sheet’s numbers',
        body: {
          template: '2.0',
          temperatureC: 20,
          mainsDelayMs: 1.5,
          listener: LISTENER,
          speakers: [
            { channel: 'L', xM: 1.2, yM: 1.5349, zM: 1.1, trimDb: -1 },
            { channel: 'R', xM: 3.7, yM: 1.5349, zM: 1.1 },
          ],
          subs: [{ name: 'Sub', xM: 0.3, yM: 0.3, zM: 0.3, delayMs: 2, gainDb: -2 }],
        },
        executed: true,
        status: 200,
        responseExcerpt: {
          speakers: [{ channel: 'L', distanceM: 2.5, delayMs: 4.17, trimDb: -1 }],
          subs: [{ name: 'Sub', distanceM: 4.1, delayMs: 0, gainDb: -2 }],
        },
      },
      {
        title: 'An unknown template is refused naming the field',
        body: { template: '6.2', temperatureC: 20, listener: { xM: 2, yM: 3, zM: 1.1 }, speakers: [{ channel: 'L', xM: 1, yM: 1, zM: 1.1 }] },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'template', message: 'must be one of 2.0, 2.1, 3.1, 5.1, 7.1, 5.1.2, 5.1.4, 7.1.2, 7.1.4, 9.1.6' }] } },
      },
      {
        title: 'A speaker outside the given room is refused by its path (no angle is computed from it)',
        body: { template: '2.0', temperatureC: 20, room: ROOM, listener: LISTENER, speakers: [{ channel: 'L', xM: 40, yM: 1.5349, zM: 1.1 }, { channel: 'R', xM: 3.7, yM: 1.5349, zM: 1.1 }] },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'speakers.0.xM', message: 'L is 40 m across in a 4.9 m wide room' }] } },
      },
    ],
  },
  {
    id: 'headroom',
    method: 'POST',
    path: '/api/v1/headroom',
    query: ANSWER_SHAPES.headroom.query,
    tag: 'Compute',
    summary:
      'Maximum SPL at the MLP per channel and per sub (inverse-square law, free field plus optional room gain) against the target — 105 dB peaks per channel, 115 dB from the subs together — with the headroom or deficit, the power the target needs, the NIOSH exposure table and the safety cautions.',
    notes: [
      'Caution: figures assume clean peaks in free field; they are no licence to exceed a speaker’s rating. Loud levels damage hearing and drivers: show the answer’s safety notes with the figures. Follow local codes for mounting and electrical work.',
      computeNote,
    ],
    access: 'public',
    body: { schema: headroomRequestSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [{ status: 200, description: 'Each row’s maximum SPL against its target, the subs together, the exposure table and the cautions.', schema: headroomAnswerSchema }],
    errors: computeErrors,
    examples: [
      {
        title: '87 dB/1 W/1 m, 100 W, 3 m → 97.46 dB SPL, 7.54 dB short of 105 dB',
        body: {
          channels: [{ name: 'L', sensitivityDb: 87, sensitivityRef: '1W', impedanceOhm: 8, powerW: 100, distanceM: 3 }],
          subs: [{ name: 'Sub', sensitivityDb: 88, sensitivityRef: '1W', impedanceOhm: 4, powerW: 500, distanceM: 3.4, roomGainDb: 6 }],
        },
        executed: true,
        status: 200,
        responseExcerpt: {
          channels: [{ name: 'L', maxSplDb: 97.46, targetPeakDb: 105, headroomDb: -7.54, deficitDb: 7.54, meetsTarget: false, powerNeededW: 567.9 }],
          subs: [{ name: 'Sub', maxSplDb: 110.36, perUnitSplDb: 104.36, targetPeakDb: 115, powerNeededW: 1455 }],
          subsCombined: { maxSplDb: 110.36, headroomDb: -4.64, meetsTarget: false },
          exposure: [{ levelDba: 85, minutes: 480 }],
          safety: ['Reference level means peaks of 105 dB SPL per channel …'],
        },
      },
      {
        title: 'A sensitivity reference other than 1 W or 2.83 V is refused by its path',
        body: { channels: [{ name: 'L', sensitivityDb: 87, sensitivityRef: '1V', impedanceOhm: 8, powerW: 100, distanceM: 3 }] },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'channels.0.sensitivityRef', message: "must be '1W' or '2.83V'" }] } },
      },
    ],
  },
];
