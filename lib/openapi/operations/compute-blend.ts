import { ADVICE_RULES, FLATNESS_DEFINITION } from '@/dsp';
import { BODY_LIMIT_BYTES } from '@/lib/http';
import { blendAnswerSchema, crossoverSweepAnswerSchema, timingAnswerSchema } from '../answers/compute-blend';
import { blendRequestSchema, crossoverSweepRequestSchema, timingRequestSchema } from '@/lib/validations/compute-blend';
import type { ApiOperation } from '../types';
import { ANSWER_SHAPES } from '../answer-shapes';

const FLATNESS_TEXT = FLATNESS_DEFINITION.text;

/** The one flatness measure, as every answer that says "flatness" means it (dsp assessBlend). */
const flatnessNote = `Flatness is one measure everywhere in Seamline: the ${FLATNESS_TEXT} (fc: the crossover of the setting assessed), at ${FLATNESS_DEFINITION.pointsPerOctave} points per octave; 0 dB is perfectly flat. Every answer states it in flatness.definition.`;

/** The advice rules (dsp ADVICE_RULES, common practice). */
const rulesNote = `Advice rules: a change is advised only when, run on the whole system, it is at least ${ADVICE_RULES.audibleGainDb} dB flatter (less is hard to hear in the bass); settings within ${ADVICE_RULES.nearEqualDb} dB of each other count as equal and the smallest change wins (least delay moved, then no polarity flip); no advice may raise the system −3 dB point by more than a third of an octave nor cut the level below the crossover (the octave fc/4 … fc/2 of the lower of the two crossovers compared) by more than ${ADVICE_RULES.maxBassCutDb} dB — a setting within both limits "keeps the bass".`;

const measuredNote =
  "Run on measurements: a source's measured ({ measurementId } with a session or token, or the points inline) replaces its model; the answer's measured says which curves were used, their range and what is estimated. A stored measurement the caller may not read is a 404 (401 signed out).";

/**
 * Every route answers 401 to a refused `Authorization` (a revoked or expired token; 503 when the database that checks it
 * is down) and 429 over its limit; Timing and the Crossover sweep on a stored measurement read it with the caller's
 * rights (401, 404).
 */
const measuredComputeErrors = [400, 401, 404, 413, 415, 429, 503];

/** POST /api/v1/blend, /api/v1/crossover-sweep and /api/v1/timing. */
export const BLEND_OPERATIONS: ApiOperation[] = [
  {
    id: 'blend',
    method: 'POST',
    path: '/api/v1/blend',
    query: ANSWER_SHAPES.blend.query,
    tag: 'Compute',
    summary: 'The complex sum of up to 16 paths (crossover filter × natural roll-off × EQ × gain × polarity × delay) and its read-outs at the crossover.',
    notes: [
      'Limits: at most 16 paths and 4 000 grid points, 10 Hz–24 kHz, bodies up to 256 kB (413 beyond), JSON only (415 otherwise). Unknown fields are refused.',
      'Numbers in the answer are rounded: frequencies to 0.001 Hz, levels to 0.001 dB, phase to 0.01°, group delay to 0.001 ms; the flatness figures of metrics (flatnessDb, maxDeviationDb, deepestDipDb) to 0.01 dB and their frequencies to 0.1 Hz.',
      flatnessNote,
    ],
    access: 'public',
    body: { schema: blendRequestSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [{ status: 200, description: 'Every path and the sum on the grid, and the read-outs at the crossover.', schema: blendAnswerSchema }],
    errors: [400, 401, 413, 415, 429, 503],
    examples: [
      {
        title: 'LR4 mains high-pass, BW2 sub low-pass inverted, 2.5 ms and 3.4 m on the sub',
        body: {
          temperatureC: 20,
          grid: { startHz: 10, stopHz: 1000, pointsPerOctave: 48 },
          paths: [
            { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false },
            { name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 2.5, invert: true, distanceM: 3.4 },
          ],
        },
        executed: true,
        status: 200,
        responseExcerpt: {
          frequencyHz: [10, 10.145, 10.293],
          paths: [{ name: 'mains', magnitudeDb: [-72.249], phaseDeg: [-20.36] }],
          sum: { magnitudeDb: [-0.003], phaseDeg: [125.15], groupDelayMs: [15.274] },
          metrics: {
            crossoverHz: 80,
            crossoverSource: 'filters',
            mainsPath: 0,
            subPath: 1,
            pathLevelsDb: [-6.021, -3.01],
            sumLevelDb: -1.061,
            phaseDifferenceDeg: 87.3,
            referenceHz: 320,
            referenceLevelDb: 0.487,
            flatnessDb: 12.89,
            maxDeviationDb: -12.89,
            maxDeviationHz: 103.7,
            bandHz: [40, 160],
            deepestDipDb: -12.89,
            deepestDipHz: 103.7,
            minus3DbHz: null,
          },
        },
      },
      {
        title: 'A Butterworth order 9 is refused with the field named',
        body: {
          temperatureC: 20,
          grid: { startHz: 10, stopHz: 1000, pointsPerOctave: 48 },
          paths: [{ name: 'sub', filter: { family: 'butterworth', order: 9, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false }],
        },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', message: 'paths.0.filter.order: must be at most 8', issues: [{ path: 'paths.0.filter.order', message: 'must be at most 8' }] } },
      },
    ],
  },
  {
    id: 'crossover-sweep',
    method: 'POST',
    path: '/api/v1/crossover-sweep',
    query: ANSWER_SHAPES.crossoverSweep.query,
    tag: 'Compute',
    summary:
      'Crossover sweep on the whole system: for every candidate crossover point and slope pairing, the main channel and every sub with that crossover, at the delay shift and polarity of the subs that is flattest while keeping the bass, judged by the one flatness measure. The present setting is a row of its own; a row ranks above it only when it is worth the change.',
    notes: [
      flatnessNote,
      rulesNote,
      "Each candidate row is the request's system with that crossover and pairing, every sub's delay shifted together and every sub's polarity flipped together to the flattest setting that keeps the bass of the present one (near-equal ones going to the smallest change).",
      "Ranking: a row never ranks above the present setting unless it is worth the change — at least 0.5 dB flatter and keeping the bass, or (when the present crossover is near the mains' roll-off) clear of the roll-off without being less flat. Among the rows worth it, those clear of the roll-off come first, and within 0.5 dB of the flattest of them the smallest change (octaves from the present crossover, then delay moved, then no flip); then the present row; then the rest (keeping the bass first, clear of the roll-off first, then by flatness). So rows[0] is never worse than the present setting, and is the present row when nothing is worth the change.",
      'The editor sends one request per pairing and six candidates at a time, so its progress bar moves as rows arrive; it merges and ranks the rows with the same rule.',
      measuredNote,
      'Bodies up to 2 MB (measured curves may be sent inline), JSON only. Unknown fields are refused.',
    ],
    access: 'public',
    body: { schema: crossoverSweepRequestSchema, limitBytes: BODY_LIMIT_BYTES.measuredCurves },
    answers: [{ status: 200, description: 'Every candidate row and the present one, best first.', schema: crossoverSweepAnswerSchema }],
    errors: measuredComputeErrors,
    examples: [
      {
        title: 'Invented sealed bookshelf (62 Hz, Q 0.71) crossed at 60 Hz BW2 / LR4 to an invented sealed sub 0.31 m farther: default candidates',
        body: {
          temperatureC: 20,
          crossoverHz: 60,
          mainsHighpass: { family: 'butterworth', order: 2 },
          subLowpass: { family: 'linkwitz-riley', order: 4 },
          mains: { name: 'L', distanceM: 3.79, rolloff: { kind: 'sealed', cornerHz: 62, q: 0.71 } },
          subs: [
            {
              name: 'Sub',
              distanceM: 4.1,
              rolloff: [
                { kind: 'sealed', cornerHz: 24, q: 0.7 },
                { kind: 'lowpass', cornerHz: 200, q: 0.7 },
              ],
            },
          ],
          pairings: [{ mainsFilter: { family: 'butterworth', order: 2 }, subFilter: { family: 'linkwitz-riley', order: 4 } }],
        },
        executed: true,
        status: 200,
        responseExcerpt: {
          speedOfSoundMps: 343.215,
          flatness: { definition: FLATNESS_TEXT },
          mainsMinus3DbHz: 61.8,
          lowestClearHz: 87.4,
          candidatesHz: [40, 45, 50],
          rows: [
            {
              rank: 1,
              present: false,
              crossoverHz: 90,
              mainsFilter: { family: 'butterworth', order: 2 },
              subFilter: { family: 'linkwitz-riley', order: 4 },
              shiftMs: -1.91,
              flip: false,
              set: { mainsDelayMs: 1.91, subs: [{ name: 'Sub', delayMs: 0, invert: false }] },
              flatnessDb: 0.44,
              assessment: { flatnessDb: 0.44, maxDeviationDb: 0.44, maxDeviationHz: 104, deepestDipDb: -0.44, deepestDipHz: 45, crossoverLevelDb: 0.39, minus3DbHz: 24.5, bandHz: [45, 180] },
              gainDb: 1.21,
              extensionLossOctaves: -0.002,
              bassCutDb: 0.05,
              keepsBass: true,
              nearMainsRolloff: false,
              worthIt: true,
              mainsLowBassDb: -18.89,
            },
            {
              rank: 18,
              present: true,
              crossoverHz: 60,
              shiftMs: 0,
              flip: false,
              set: { mainsDelayMs: 0, subs: [{ name: 'Sub', delayMs: 0, invert: false }] },
              flatnessDb: 1.65,
              assessment: { flatnessDb: 1.65, maxDeviationDb: -1.65, maxDeviationHz: 30, deepestDipDb: -1.65, deepestDipHz: 30, crossoverLevelDb: -0.23, minus3DbHz: 24.5, bandHz: [30, 120] },
              gainDb: 0,
              keepsBass: true,
              nearMainsRolloff: true,
              worthIt: false,
              mainsLowBassDb: -25.1,
            },
          ],
        },
      },
      {
        title: 'A Linkwitz–Riley order 6 is refused with the field named',
        body: {
          crossoverHz: 80,
          mainsHighpass: { family: 'linkwitz-riley', order: 4 },
          subLowpass: { family: 'linkwitz-riley', order: 4 },
          mains: { distanceM: 3 },
          subs: [{ name: 'Sub', distanceM: 3 }],
          pairings: [{ mainsFilter: { family: 'linkwitz-riley', order: 6 }, subFilter: { family: 'linkwitz-riley', order: 4 } }],
        },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'pairings.0.mainsFilter.order', message: 'Linkwitz–Riley order must be 2, 4 or 8' }] } },
      },
    ],
  },
  {
    id: 'timing',
    method: 'POST',
    path: '/api/v1/timing',
    query: ANSWER_SHAPES.timing.query,
    tag: 'Compute',
    summary:
      'Timing on the whole system (the main channel and every sub, with the processor delays they run now): arrival times, the phase difference at the crossover, the flatness of the system as it is, and advice — for each sub and for all subs together — on delay and polarity, proven on the whole system, or "keep" with the reason; the Timing window and flatness against delay.',
    notes: [
      flatnessNote,
      rulesNote,
      "A sub's advice: among the delays and polarities of that sub that keep the bass, within 0.5 dB of the flattest found and at least 0.5 dB flatter than the present setting, the smallest change (least delay moved, then no flip); when there is none, keep, and the reason says whether no change gains 0.5 dB or the flatter ones give up bass.",
      "Every piece of advice states the whole system's settings to run (set), and its after is that system assessed. With several subs, follow one piece of advice (a sub's or the group's), then ask again: each is worked out on the system as it is.",
      'The group advice (2 or more subs): coordinate descent over the subs as a group and each alone, every step at least 0.05 dB flatter and keeping the bass of the present setting, at most four rounds; given (keep false) only when the result is at least 0.5 dB flatter than the present.',
      measuredNote,
      'Bodies up to 2 MB (measured curves may be sent inline), JSON only. Unknown fields are refused.',
    ],
    access: 'public',
    body: { schema: timingRequestSchema, limitBytes: BODY_LIMIT_BYTES.measuredCurves },
    answers: [{ status: 200, description: 'Arrivals, the present flatness, each sub\'s advice and Timing window, and the all-subs advice.', schema: timingAnswerSchema }],
    errors: measuredComputeErrors,
    examples: [
      {
        title: 'Two subs 3.4 m and 4.4 m from the MLP, mains 3.4 m, LR4 / LR4 at 80 Hz, subs trimmed −6 dB each, no delays yet',
        body: {
          temperatureC: 20,
          crossoverHz: 80,
          mainsHighpass: { family: 'linkwitz-riley', order: 4 },
          subLowpass: { family: 'linkwitz-riley', order: 4 },
          mains: { name: 'L', distanceM: 3.4 },
          subs: [
            { name: 'Front', distanceM: 3.4, gainDb: -6 },
            { name: 'Back', distanceM: 4.4, gainDb: -6 },
          ],
        },
        executed: true,
        status: 200,
        responseExcerpt: {
          speedOfSoundMps: 343.215,
          crossoverHz: 80,
          flatness: { definition: FLATNESS_TEXT, bandHz: [40, 160] },
          present: { flatnessDb: 1.78, maxDeviationDb: -1.78, maxDeviationHz: 84.8, deepestDipDb: -1.78, deepestDipHz: 84.8, crossoverLevelDb: -1.76, minus3DbHz: null, bandHz: [40, 160] },
          mains: { name: 'L', distanceM: 3.4, arrivalMs: 9.906, delayMs: 0, totalMs: 9.906 },
          subs: [
            {
              name: 'Front',
              distanceM: 3.4,
              arrivalMs: 9.906,
              delayMs: 0,
              totalMs: 9.906,
              invert: false,
              leadMs: 0,
              phaseDifferenceDeg: 0,
              delayPhaseDeg: 0,
              filterPhaseDeg: 0,
              advice: {
                keep: true,
                reason: 'Keep the present setting (±1.78 dB): no change found gains 0.5 dB or more of flatness (the best gains 0.11 dB), less than a listener could hear in the bass.',
                set: { mainsDelayMs: 0, subs: [{ name: 'Front', delayMs: 0, invert: false }] },
                before: { flatnessDb: 1.78 },
                after: { flatnessDb: 1.78 },
                gainDb: 0,
                extensionLossOctaves: 0,
                bassCutDb: 0,
                shiftMs: 0,
                flip: false,
              },
              timingWindowMs: [-1.35, 2.55],
              flatnessVersusDelay: { subMinusMainsDelayMs: [-20, -19.9], normalDb: [12.57, 12.43], invertedDb: [23.8, 23.49] },
            },
            {
              name: 'Back',
              arrivalMs: 12.82,
              leadMs: -2.914,
              phaseDifferenceDeg: 83.9,
              advice: {
                keep: false,
                reason: 'Flatness ±1.78 dB → ±0.02 dB (1.77 dB better); system −3 dB point below 5 Hz.',
                set: { mainsDelayMs: 2.57, subs: [{ name: 'Front', delayMs: 2.57, invert: false }, { name: 'Back', delayMs: 0, invert: false }] },
                after: { flatnessDb: 0.02 },
                gainDb: 1.77,
                shiftMs: -2.57,
                flip: false,
              },
              timingWindowMs: [-5.1, -0.7],
            },
          ],
          group: {
            keep: false,
            reason: 'Flatness ±1.78 dB → ±0.01 dB (1.77 dB better); system −3 dB point below 5 Hz.',
            set: { mainsDelayMs: 2.99, subs: [{ name: 'Front', delayMs: 3.29, invert: false }, { name: 'Back', delayMs: 0, invert: false }] },
            before: { flatnessDb: 1.78 },
            after: { flatnessDb: 0.01, minus3DbHz: null },
            gainDb: 1.77,
            extensionLossOctaves: 0,
            bassCutDb: -0.31,
          },
        },
      },
      {
        title: 'A negative sub distance is refused with the field named',
        body: { crossoverHz: 80, mainsHighpass: { family: 'linkwitz-riley', order: 4 }, subLowpass: { family: 'linkwitz-riley', order: 4 }, mains: { distanceM: 3 }, subs: [{ name: 'Sub', distanceM: -1 }] },
        executed: true,
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'subs.0.distanceM', message: 'must be at least 0 m' }] } },
      },
    ],
  },
];
