import type { ApiRouteDoc } from './types';

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

const SUMMARY_TYPE = '{ meanSpreadDb, maxSpreadDb, maxSpreadHz, meanLevelDb }';

export const SEAT_BALANCE_DOCS: ApiRouteDoc[] = [
  {
    id: 'seat-balance',
    method: 'POST',
    path: '/api/v1/seat-balance',
    summary:
      'Seat balance: each sub’s delay, gain and polarity (and, when asked, where to put the subs among candidate positions) that make the seats hear the same bass. Objective: minimise the mean seat-to-seat spread over the band — at each frequency the loudest seat minus the quietest (dB), averaged over the band; exactly the meanSpreadDb of POST /api/v1/room-response for the same settings and grid — subject to an output floor: the seats’ mean level (power mean over seats and band) may fall at most maxOutputLossDb below every sub in phase at 0 ms / 0 dB. Basis: T. Welti and A. Devantier, “Low-Frequency Optimization Using Multiple Subwoofers”, JAES 54(5), 2006; T. Welti, “Subwoofers: Optimum Number and Locations”, AES 2002.',
    auth: 'none',
    fields: [
      { name: 'room', type: '{ lengthM, widthM, heightM, rt60S, temperatureC }', required: true, description: 'The room, for the modal model (lengths in m, rt60S 0.05–10 s, temperatureC −20–50 °C). Not sent with `measurements`.' },
      { name: 'seats', type: '{ name, xM, yM, zM, weight? }[] (2–16)', required: true, description: 'Listening positions, m from the front-left floor corner (x across, y into the room, z up), inside the room. weight (0–10, default 1): with unequal weights the objective at each frequency is the largest min(wa, wb)·|La − Lb| over pairs of seats (max − min when the weights are equal; weight 0 leaves a seat out). With `measurements`, seats carry only name and weight.' },
      { name: 'subs', type: '{ name, xM, yM, zM }[] (1–8)', required: true, description: 'Where the subs stand (m), inside the room. With `measurements`, only name, and optionally `present: { delayMs, gainDb, invert }` for every sub (the processor’s present settings; the answer then also holds `present` measures and is never worse than them within the limits).' },
      { name: 'band', type: '{ startHz, stopHz }', description: 'Band of the objective and the level, 10–500 Hz (default 20–120 Hz).' },
      { name: 'grid', type: '{ startHz, stopHz, pointsPerOctave }', description: 'Log-spaced frequencies (default: the band at 48 points per octave); the band must lie within it and hold at most 400 points. Modes up to 1.5 × grid.stopHz are summed, as room-response does, so the same grid gives the same numbers.' },
      { name: 'limits', type: '{ maxDelayMs?, minGainDb?, maxGainDb?, allowInvert?, maxOutputLossDb? }', description: 'The box the search stays in: delays 0…maxDelayMs (0–50 ms, default 20), gains minGainDb…maxGainDb (−30–0 and 0–12 dB, defaults −12 and +6), polarity inversion allowed (default true), output floor maxOutputLossDb (0–20 dB, default 3).' },
      { name: 'placement', type: '{ count, candidates?, defaults?, maxCombinations? }', description: 'Also rank positions: every combination of `count` subs among the candidates — the room’s four floor corners and four wall midpoints, 0.25 m from the walls and 0.25 m up (defaults, default true), plus up to 16 `{ name, xM, yM, zM }` of your own — each with its own optimised settings, best first. More than maxCombinations (1–200, default 200) are sampled with the seed, and the answer says so.' },
      { name: 'measurements', type: '{ sub, seat, measurementId }[]', description: 'Instead of the room: one stored measurement per sub per seat (sub and seat by name, as uploaded with role = the sub’s name and seat = the seat’s name). Needs a session and read access to each. Every file must have phase measured from one timing reference for the whole set; a file without phase is refused (a minimum-phase estimate is wrong for a sum of room modes at a seat).' },
      { name: 'seed', type: 'integer 0–2³¹−1 (default 1)', description: 'Seed of the search’s random draws: the same request and seed give the same answer.' },
    ],
    answer: [
      { name: 'subs', type: '{ name, xM, yM, zM, delayMs, gainDb, invert }[]', description: 'Each sub’s setting, in request order: delay (ms, 0.01 ms steps; the smallest is 0), gain (dB, 0.1 dB steps; moved down together where the floor and limits allow, so cuts are preferred to boosts) and polarity. Never worse than every sub at 0 ms / 0 dB / normal polarity.' },
      { name: 'before', type: SUMMARY_TYPE, description: 'Every sub at 0 ms, 0 dB, normal polarity: mean and largest seat-to-seat spread (dB) and where (Hz), and the seats’ mean level (dB, 0 by definition).' },
      { name: 'after', type: SUMMARY_TYPE, description: 'The same with the answer’s settings. meanLevelDb is relative to `before` and never below −maxOutputLossDb.' },
      { name: 'evaluated', type: 'number', description: 'Candidate settings the search evaluated (a seeded differential evolution over the whole box, restarted four times, each refined by a pattern search with polarity flips).' },
      { name: 'frequencyHz', type: 'number[]', unit: 'Hz', description: 'The grid points inside the band.' },
      { name: 'seats', type: '{ name, weight, beforeDb: number[], afterDb: number[] }[]', unit: 'dB', description: 'Each seat’s level at frequencyHz, before and after; 0 dB is the mean level before.' },
      { name: 'spread', type: '{ beforeDb: number[], afterDb: number[] }', unit: 'dB', description: 'Loudest minus quietest seat at each frequency, before and after.' },
      { name: 'placements', type: '{ candidates, totalCombinations, rankedCombinations, capped, ranked: { subs: { name, candidate, xM, yM, zM, delayMs, gainDb, invert }[], before, after }[] }', description: 'With `placement`: the candidate positions, how many combinations there are and how many were ranked, and the best five, best first.' },
      { name: 'source, objective, band, grid, limits', type: "'model' | 'measured', string, …", description: 'What the answer was computed from, the objective in words, and the band, grid and limits used.' },
    ],
    examples: [
      {
        title: 'The invented Juniper Lane room: a corner sub and a side-wall sub, three seats',
        request: { room: ROOM, seats: SEATS, subs: SUBS },
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
        request: { room: ROOM, seats: SEATS, subs: SUBS, placement: { count: 2 } },
        status: 200,
        responseExcerpt: {
          placements: {
            totalCombinations: 28,
            rankedCombinations: 28,
            capped: false,
            ranked: [{ subs: [{ name: 'Sub front left', candidate: 'Front wall middle', xM: 2.45, yM: 0.25, zM: 0.25, delayMs: 0, gainDb: 3.2, invert: false }], after: { meanSpreadDb: 0.86 } }],
          },
        },
      },
      {
        title: 'One seat is refused: the spread is between seats',
        request: { room: ROOM, seats: [SEATS[0]], subs: SUBS },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'seats', message: 'at least two seats are needed: the spread is between seats' }] } },
      },
    ],
    notes: [
      'Measured variant, with a session: { "seats": [{ "name": "Row 1 left" }, { "name": "Row 1 centre" }], "subs": [{ "name": "Sub front left" }, { "name": "Sub right wall" }], "measurements": [{ "sub": "Sub front left", "seat": "Row 1 left", "measurementId": "' + MEASUREMENT + '" }, …] } — every sub at every seat; without a session it is answered 401.',
      'The modal model is a rigid rectangular room; furniture, openings and soft walls move and damp the modes. Measure after applying the settings.',
      'A gain boost costs amplifier and driver headroom: check Headroom before raising a sub, and keep listening levels safe.',
    ],
  },
];
