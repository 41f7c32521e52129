import { ADVICE_RULES, FLATNESS_DEFINITION } from '@/dsp';
import type { ApiField, ApiRouteDoc } from './types';

const slopeNote = "family 'butterworth' (order 1–8) or 'linkwitz-riley' (order 2, 4 or 8); order is the total order (LR4 = 24 dB/octave)";
const rolloffNote =
  "natural roll-off: { kind: 'none' } | { kind: 'sealed', cornerHz, q } (2nd-order high-pass) | { kind: 'vented', cornerHz } (4th-order) | { kind: 'lowpass', cornerHz, q } (a sub's upper roll-off), or an array of up to 4 of them applied together; q 0.2–10, cornerHz 1–2000 (lowpass 10–24 000)";

const eqNote =
  "EQ: up to 26 filters applied together — { kind: 'peaking', centerHz, gainDb, q } or { kind: 'low-shelf' | 'high-shelf', cornerHz, gainDb, q? | slope? } (Audio EQ Cookbook analog prototypes; gain ±24 dB, Q 0.1–20, shelf slope 0.1–1, default 1): a speaker's voicing-switch filters and the processor's EQ on that output (default none)";

const FLATNESS_TEXT = FLATNESS_DEFINITION.text;

/** The one flatness measure, as every answer that says "flatness" means it (dsp assessBlend). */
const flatnessNote = `Flatness is one measure everywhere in Seamline: the ${FLATNESS_TEXT} (fc: the crossover of the setting assessed), at ${FLATNESS_DEFINITION.pointsPerOctave} points per octave; 0 dB is perfectly flat. Every answer states it in flatness.definition.`;

/** The advice rules (dsp ADVICE_RULES, common practice). */
const rulesNote = `Advice rules: a change is advised only when, run on the whole system, it is at least ${ADVICE_RULES.audibleGainDb} dB flatter (less is hard to hear in the bass); settings within ${ADVICE_RULES.nearEqualDb} dB of each other count as equal and the smallest change wins (least delay moved, then no polarity flip); no advice may raise the system −3 dB point by more than a third of an octave nor cut the level below the crossover (the octave fc/4 … fc/2 of the lower of the two crossovers compared) by more than ${ADVICE_RULES.maxBassCutDb} dB — a setting within both limits "keeps the bass".`;

/** What an assessment of one setting holds (lib/system-model/advice-answer.ts AssessmentAnswer). */
const assessmentShape =
  '{ flatnessDb (the measure, 0.01 dB), maxDeviationDb / maxDeviationHz (the same deviation signed, and where), deepestDipDb / deepestDipHz, crossoverLevelDb (the sum at fc relative to 4·fc), minus3DbHz (system −3 dB point, 0.1 Hz; null when the sum is still above it at 5 Hz), bandHz: [fc/2, 2·fc] }';

/** The processor settings a piece of advice or a sweep row runs (SettingsAnswer). */
const settingsShape = '{ mainsDelayMs, subs: [{ name, delayMs, invert }] }: the processor delay of the main channel and of every sub (in request order) and every sub\'s polarity, to be run as they stand; every delay ≥ 0, 0.01 ms (a delay all sources would share is taken out: it changes no level)';

/** The whole system a Timing or Crossover sweep request describes (lib/validations/compute-blend.ts systemShape). */
const systemFields = (crossoverText: string): ApiField[] => [
  { name: 'temperatureC', type: 'number', unit: '°C', description: 'Air temperature, −20…50 (default 20); sets the speed of sound c = 331.3·√(1 + T/273.15).' },
  { name: 'crossoverHz', type: 'number', unit: 'Hz', required: true, description: crossoverText },
  { name: 'mainsHighpass', type: 'object', required: true, description: `{ family, order } of the mains high-pass the processor runs now; ${slopeNote}.` },
  { name: 'subLowpass', type: 'object', required: true, description: '{ family, order } of the sub low-pass the processor runs now (the same slope on every sub).' },
  { name: 'mains.name', type: 'string', description: 'Label of the main channel (default "mains").' },
  { name: 'mains.distanceM', type: 'number', unit: 'm', required: true, description: 'Main speaker to the main listening position, 0…200.' },
  { name: 'mains.delayMs', type: 'number', unit: 'ms', description: 'Processor delay on the main channel now, 0…1000 (default 0).' },
  { name: 'mains.gainDb', type: 'number', unit: 'dB', description: 'Main channel level at the seat relative to level-matched, −60…60 (default 0).' },
  { name: 'mains.rolloff', type: 'object | array', description: "The main speaker's natural roll-off: { kind: 'none' } | { kind: 'sealed', cornerHz, q } | { kind: 'vented', cornerHz }, or a chain of up to 4 (default none)." },
  { name: 'mains.eq', type: 'array', description: `The main channel's ${eqNote}.` },
  { name: 'subs[]', type: 'array', required: true, description: '1–8 subs, every one of the system, each { name, distanceM, delayMs?, gainDb?, invert?, rolloff?, eq? }.' },
  { name: 'subs[].name', type: 'string', required: true, description: '1–60 characters, echoed in the answer.' },
  { name: 'subs[].distanceM', type: 'number', unit: 'm', required: true, description: 'Sub to the main listening position, 0…200.' },
  { name: 'subs[].delayMs', type: 'number', unit: 'ms', description: 'Processor delay on this sub now, 0…1000 (default 0).' },
  { name: 'subs[].gainDb', type: 'number', unit: 'dB', description: 'This sub\'s level at the seat, −60…60 (default 0).' },
  { name: 'subs[].invert', type: 'boolean', description: 'Polarity inverted now (default false).' },
  { name: 'subs[].rolloff', type: 'object | array', description: `The sub's ${rolloffNote} (default none).` },
  { name: 'subs[].eq', type: 'array', description: `This sub's ${eqNote}.` },
  {
    name: 'mains.measured / subs[].measured',
    type: 'object',
    description:
      'Run this source on what was measured at the seat instead of its model: { measurementId } (a stored measurement you may read; needs a session) or { frequencyHz, magnitudeDb, phaseDeg? } (at most 20 000 points; no phase: a minimum-phase estimate, which holds no arrival time). The measurement holds the speaker\'s roll-off, voicing switches, air path and room, so such a source must send distanceM 0 and rolloff none, and its eq is the processor\'s only. The curves must cover fc/2 … 4·fc (mains) and fc/2 … 2·fc (subs) for every crossover point judged, else 400 naming the point. With measured mains the sweep\'s roll-off rule uses their in-room −3 dB point (level against 200 Hz–2 kHz).',
  },
];

export const BLEND_DOCS: ApiRouteDoc[] = [
  {
    id: 'blend',
    method: 'POST',
    path: '/api/v1/blend',
    summary: 'The complex sum of up to 16 paths (crossover filter × natural roll-off × EQ × gain × polarity × delay) and its read-outs at the crossover.',
    auth: 'none',
    fields: [
      { name: 'temperatureC', type: 'number', unit: '°C', required: true, description: 'Air temperature, −20…50; sets the speed of sound for distanceM.' },
      { name: 'grid.startHz', type: 'number', unit: 'Hz', required: true, description: 'First frequency (included), 10…24 000.' },
      { name: 'grid.stopHz', type: 'number', unit: 'Hz', required: true, description: 'Last frequency (reached when it falls on the log grid), above startHz, ≤ 24 000.' },
      { name: 'grid.pointsPerOctave', type: 'number', required: true, description: 'Log spacing, 1…384; at most 4 000 points in all.' },
      { name: 'paths[]', type: 'array', required: true, description: '1…16 paths, e.g. the mains first and then each sub.' },
      { name: 'paths[].name', type: 'string', required: true, description: '1–60 characters, echoed in the answer.' },
      { name: 'paths[].filter', type: 'object', required: true, description: `{ family, order, response: 'lowpass' | 'highpass' | 'none', cornerHz 10…24 000 }; ${slopeNote}. 'none' is a straight wire.` },
      { name: 'paths[].rolloff', type: 'object | array', description: `Optional ${rolloffNote}.` },
      { name: 'paths[].eq', type: 'array', description: `Optional ${eqNote}.` },
      { name: 'paths[].gainDb', type: 'number', unit: 'dB', required: true, description: 'Gain, −60…60.' },
      { name: 'paths[].delayMs', type: 'number', unit: 'ms', required: true, description: 'Processor delay, 0…1000.' },
      { name: 'paths[].invert', type: 'boolean', required: true, description: 'Polarity inverted.' },
      { name: 'paths[].distanceM', type: 'number', unit: 'm', description: 'Optional air path to the listener, 0…200; adds distanceM / c(temperatureC) to the delay, never changes level.' },
      {
        name: 'crossoverHz',
        type: 'number',
        unit: 'Hz',
        description:
          'Optional: where the metrics are read (within the grid). Absent: the geometric mean of the first high-pass and the first low-pass corner (the one corner when only one side is filtered); metrics is null when no path is filtered.',
      },
    ],
    answer: [
      { name: 'frequencyHz', type: 'number[]', unit: 'Hz', description: 'The log grid.' },
      { name: 'paths[].magnitudeDb / phaseDeg', type: 'number[]', unit: 'dB / °', description: 'Each path at the listener; phase wrapped to (−180, 180]. An exact cancellation reads −300 dB.' },
      { name: 'sum.magnitudeDb / phaseDeg / groupDelayMs', type: 'number[]', unit: 'dB / ° / ms', description: 'The complex sum; phase wrapped to (−180, 180]; group delay of the sum (delays and distances included).' },
      { name: 'metrics.crossoverHz', type: 'number', unit: 'Hz', description: "Where the read-outs are taken; crossoverSource says 'request' or 'filters'." },
      { name: 'metrics.mainsPath / subPath', type: 'number', description: 'Paths read as mains (first high-pass, else 0) and sub (first low-pass, else the next path; null with one path).' },
      { name: 'metrics.pathLevelsDb', type: 'number[]', unit: 'dB', description: 'Each path’s level at the crossover, in path order.' },
      { name: 'metrics.sumLevelDb', type: 'number', unit: 'dB', description: 'The sum’s level at the crossover.' },
      { name: 'metrics.phaseDifferenceDeg', type: 'number | null', unit: '°', description: 'Mains phase minus sub phase at the crossover, (−180, 180].' },
      { name: 'metrics.referenceHz / referenceLevelDb', type: 'number', unit: 'Hz / dB', description: 'The reference of the flatness measure: the sum at 4·fc (two octaves above the crossover, in the mains’ passband), evaluated on its own grid whatever grid the plot asks for.' },
      { name: 'metrics.flatnessDb', type: 'number', unit: 'dB', description: `The one flatness measure of Seamline (the same number Timing, the Crossover sweep and every screen use): the ${FLATNESS_TEXT}, at 48 points per octave; ≥ 0, rounded to 0.01 dB.` },
      { name: 'metrics.maxDeviationDb / maxDeviationHz', type: 'number', unit: 'dB / Hz', description: 'The same deviation with its sign (negative: a dip), 0.01 dB, and where, 0.1 Hz.' },
      { name: 'metrics.bandHz', type: '[number, number]', unit: 'Hz', description: 'The band the measure looks at: [fc/2, 2·fc].' },
      { name: 'metrics.deepestDipDb / deepestDipHz', type: 'number', unit: 'dB / Hz', description: 'Lowest level within the band relative to the reference (positive when the whole band stands above it), and where.' },
      { name: 'metrics.minus3DbHz', type: 'number | null', unit: 'Hz', description: 'System −3 dB point at the low end: where the sum first rises to the reference − 3 dB, looking up from 5 Hz; null when the sum is still above that at 5 Hz.' },
    ],
    examples: [
      {
        title: 'LR4 mains high-pass, BW2 sub low-pass inverted, 2.5 ms and 3.4 m on the sub',
        request: {
          temperatureC: 20,
          grid: { startHz: 10, stopHz: 1000, pointsPerOctave: 48 },
          paths: [
            { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false },
            { name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 2.5, invert: true, distanceM: 3.4 },
          ],
        },
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
        request: {
          temperatureC: 20,
          grid: { startHz: 10, stopHz: 1000, pointsPerOctave: 48 },
          paths: [{ name: 'sub', filter: { family: 'butterworth', order: 9, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false }],
        },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', message: 'paths.0.filter.order: must be at most 8', issues: [{ path: 'paths.0.filter.order', message: 'must be at most 8' }] } },
      },
    ],
    notes: ['Limits: at most 16 paths and 4 000 grid points, 10 Hz–24 kHz, bodies up to 256 kB (413 beyond), JSON only (415 otherwise). Unknown fields are refused.', 'Numbers in the answer are rounded: frequencies to 0.001 Hz, levels to 0.001 dB, phase to 0.01°, group delay to 0.001 ms; the flatness figures of metrics (flatnessDb, maxDeviationDb, deepestDipDb) to 0.01 dB and their frequencies to 0.1 Hz.'],
  },
  {
    id: 'crossover-sweep',
    method: 'POST',
    path: '/api/v1/crossover-sweep',
    summary:
      'Crossover sweep on the whole system: for every candidate crossover point and slope pairing, the main channel and every sub with that crossover, at the delay shift and polarity of the subs that is flattest while keeping the bass, judged by the one flatness measure. The present setting is a row of its own; a row ranks above it only when it is worth the change.',
    auth: 'none',
    fields: [
      ...systemFields('The crossover the processor runs now, 20…300: with mainsHighpass and subLowpass it is the present row.'),
      { name: 'pairings[]', type: 'array', required: true, description: `1–6 slope pairings to try, { mainsFilter: { family, order }, subFilter: { family, order } }; ${slopeNote}.` },
      { name: 'candidatesHz', type: 'number[]', unit: 'Hz', description: 'Candidate crossover points, 20…300, 1–60 of them (default 40–150 Hz in 5 Hz steps). Candidates × pairings ≤ 120 rows: the default 23 candidates allow 5 pairings, 20 or fewer allow 6; a refusal says how many pairings fit.' },
      { name: 'maxDelayMs', type: 'number', unit: 'ms', description: 'Largest shift of the subs\' delay tried either way, 1…50 (default 20).' },
    ],
    answer: [
      { name: 'speedOfSoundMps', type: 'number', unit: 'm/s', description: 'c at temperatureC, 0.001 m/s.' },
      { name: 'flatness.definition', type: 'string', description: `What flatnessDb means: "${FLATNESS_TEXT}".` },
      { name: 'mainsMinus3DbHz', type: 'number | null', unit: 'Hz', description: "The main speaker's own −3 dB point from mains.rolloff (where its level first falls 3 dB under its passband, looking down), 0.1 Hz; null with no roll-off. With measured mains: their in-room −3 dB point against their level over 200 Hz–2 kHz." },
      { name: 'measured', type: 'object | null', description: 'Null on the model. On measurements: { sources: [{ name, startHz, stopHz, phaseEstimated }], crossoverRangeHz, mainsMinus3DbHz, note }, as in the Timing answer.' },
      { name: 'lowestClearHz', type: 'number | null', unit: 'Hz', description: 'The lowest crossover clear of the mains\' roll-off: mainsMinus3DbHz × √2, half an octave above it (common practice); null with no roll-off.' },
      { name: 'candidatesHz', type: 'number[]', unit: 'Hz', description: 'The candidates tried.' },
      { name: 'rows[]', type: 'array', description: 'One row per candidate × pairing, plus the present setting as a row of its own; best first.' },
      { name: 'rows[].rank', type: 'number', description: '1 = best. See the ranking note: no row ranks above the present one unless worthIt.' },
      { name: 'rows[].present', type: 'boolean', description: 'The present setting, unchanged (shiftMs 0, flip false, set = the request\'s delays and polarities). Exactly one row.' },
      { name: 'rows[].crossoverHz / mainsFilter / subFilter', type: 'number / object / object', unit: 'Hz', description: 'The crossover point and the pairing of the row.' },
      { name: 'rows[].shiftMs', type: 'number', unit: 'ms', description: "Every sub's delay moved by this, 0.01 ms (negative: the main channel gets −shiftMs instead); within ±maxDelayMs; 0 on the present row." },
      { name: 'rows[].flip', type: 'boolean', description: "Every sub's polarity flipped from the present." },
      { name: 'rows[].set', type: 'object', unit: 'ms', description: `The processor settings the row runs, ${settingsShape}.` },
      { name: 'rows[].flatnessDb', type: 'number', unit: 'dB', description: 'The flatness measure at the row\'s setting (as assessment.flatnessDb), 0.01 dB.' },
      { name: 'rows[].assessment', type: 'object', description: `The whole system at the row's setting, levels relative to the sum at 4·fc: ${assessmentShape}.` },
      { name: 'rows[].gainDb', type: 'number', unit: 'dB', description: 'Against the present setting: its flatness minus this row\'s (positive: flatter).' },
      { name: 'rows[].extensionLossOctaves', type: 'number', unit: 'octaves', description: 'How far the system −3 dB point moved up against the present setting (negative: deeper), 0.001 octave.' },
      { name: 'rows[].bassCutDb', type: 'number', unit: 'dB', description: 'Level lost against the present setting over the octave fc/4 … fc/2 of the lower of the two crossovers (negative: gained).' },
      { name: 'rows[].keepsBass', type: 'boolean', description: 'extensionLossOctaves ≤ 1/3 and bassCutDb ≤ 1 dB.' },
      { name: 'rows[].nearMainsRolloff', type: 'boolean', description: 'crossoverHz lies below lowestClearHz (too close to the mains\' own roll-off).' },
      { name: 'rows[].worthIt', type: 'boolean', description: 'Worth changing to: keeps the bass, is no less flat than the present, and is at least 0.5 dB flatter — or, when the present crossover is near the mains\' roll-off, clear of it; never when the row is near the roll-off and the present is not. Always false on the present row.' },
      { name: 'rows[].mainsLowBassDb', type: 'number', unit: 'dB', description: 'How much low bass the mains still carry: the mains path (high-pass × roll-off) one octave below the crossover against two octaves above it.' },
    ],
    examples: [
      {
        title: 'Invented sealed bookshelf (62 Hz, Q 0.71) crossed at 60 Hz BW2 / LR4 to an invented sealed sub 0.31 m farther: default candidates',
        request: {
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
        request: {
          crossoverHz: 80,
          mainsHighpass: { family: 'linkwitz-riley', order: 4 },
          subLowpass: { family: 'linkwitz-riley', order: 4 },
          mains: { distanceM: 3 },
          subs: [{ name: 'Sub', distanceM: 3 }],
          pairings: [{ mainsFilter: { family: 'linkwitz-riley', order: 6 }, subFilter: { family: 'linkwitz-riley', order: 4 } }],
        },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'pairings.0.mainsFilter.order', message: 'Linkwitz–Riley order must be 2, 4 or 8' }] } },
      },
    ],
    notes: [
      flatnessNote,
      rulesNote,
      "Each candidate row is the request's system with that crossover and pairing, every sub's delay shifted together and every sub's polarity flipped together to the flattest setting that keeps the bass of the present one (near-equal ones going to the smallest change).",
      'Ranking: a row never ranks above the present setting unless it is worth the change — at least 0.5 dB flatter and keeping the bass, or (when the present crossover is near the mains\' roll-off) clear of the roll-off without being less flat. Among the rows worth it, those clear of the roll-off come first, and within 0.5 dB of the flattest of them the smallest change (octaves from the present crossover, then delay moved, then no flip); then the present row; then the rest (keeping the bass first, clear of the roll-off first, then by flatness). So rows[0] is never worse than the present setting, and is the present row when nothing is worth the change.',
      'The editor sends one request per pairing and six candidates at a time, so its progress bar moves as rows arrive; it merges and ranks the rows with the same rule.',
    ],
  },
  {
    id: 'timing',
    method: 'POST',
    path: '/api/v1/timing',
    summary:
      'Timing on the whole system (the main channel and every sub, with the processor delays they run now): arrival times, the phase difference at the crossover, the flatness of the system as it is, and advice — for each sub and for all subs together — on delay and polarity, proven on the whole system, or "keep" with the reason; the Timing window and flatness against delay.',
    auth: 'none',
    fields: [
      ...systemFields('The crossover the processor runs now, 20…300.'),
      { name: 'maxDelayMs', type: 'number', unit: 'ms', description: 'Largest shift of a sub\'s delay tried either way, 1…50 (default 20).' },
      { name: 'stepMs', type: 'number', unit: 'ms', description: 'Scan step, 0.01…1 (default 0.05); candidates are refined and rounded to 0.01 ms as a processor takes them.' },
    ],
    answer: [
      { name: 'speedOfSoundMps', type: 'number', unit: 'm/s', description: 'c at temperatureC (331.3·√(1 + T/273.15)), 0.001 m/s.' },
      { name: 'crossoverHz', type: 'number', unit: 'Hz', description: 'The crossover of the request.' },
      { name: 'flatness', type: 'object', unit: 'Hz', description: `{ definition: "${FLATNESS_TEXT}", bandHz: [fc/2, 2·fc] }.` },
      { name: 'present', type: 'object', description: `The whole system as it is: ${assessmentShape}.` },
      {
        name: 'mains',
        type: 'object',
        unit: 'm / ms',
        description:
          "{ name, distanceM, arrivalMs (air time distanceM / c, 0.001 ms), arrivalFrom, delayMs (processor), totalMs }. arrivalFrom 'distance' on the model; on a measured source 'measured' (the impulse response's peak, distanceM the distance that time stands for) or null with arrivalMs, distanceM and totalMs null (a curve without an arrival).",
      },
      { name: 'subs[].name / distanceM / arrivalMs / arrivalFrom / delayMs / totalMs', type: 'string / number | null', unit: 'm / ms', description: 'The same for every sub, in request order.' },
      { name: 'measured', type: 'object | null', description: 'Null on the model. On measurements: { sources: [{ name, startHz, stopHz, phaseEstimated }], crossoverRangeHz: [lo, hi] (the points the curves can judge), mainsMinus3DbHz (in-room, 0.1 Hz, or null), note (one paragraph to show beside the results) }.' },
      { name: 'subs[].invert', type: 'boolean', description: 'Polarity inverted now (as sent).' },
      { name: 'subs[].leadMs', type: 'number | null', unit: 'ms', description: "How much earlier this sub's sound arrives than the mains' (processor delays included; negative: later); null when an arrival is not known." },
      { name: 'subs[].phaseDifferenceDeg', type: 'number', unit: '°', description: 'Mains minus sub phase at the crossover with the present settings, filters’ own phase and polarity included, (−180, 180], 0.1°; = delayPhaseDeg + filterPhaseDeg (wrapped).' },
      { name: 'subs[].delayPhaseDeg / filterPhaseDeg', type: 'number | null', unit: '°', description: 'The part from arrival and processor delays alone, 360·fc·(sub total − mains total), and the rest: the filters\', roll-offs\' and polarity\'s own phase.' },
      { name: 'subs[].advice.keep / reason', type: 'boolean / string', description: 'This sub\'s delay and polarity with the main channel and every other sub as they are: keep true when no change is worth making, with the reason in one sentence (what the advice gains, or why the present setting stays).' },
      { name: 'subs[].advice.set', type: 'object', unit: 'ms', description: `The whole system's settings after the advice (the present ones when keep): ${settingsShape}.` },
      { name: 'subs[].advice.before / after', type: 'object', description: 'The assessment of the present setting and of the advised one (the same when keep), each like present.' },
      { name: 'subs[].advice.gainDb / extensionLossOctaves / bassCutDb', type: 'number', unit: 'dB / octaves / dB', description: 'Flatness before minus after; how far the system −3 dB point moved up (negative: deeper); level lost over the octave fc/4 … fc/2 (negative: gained). All 0 when keep.' },
      { name: 'subs[].advice.shiftMs / flip', type: 'number / boolean', unit: 'ms', description: "This sub's delay moved by shiftMs (negative: the main channel and the other subs get −shiftMs instead) and its polarity flipped when flip; 0 and false when keep." },
      { name: 'subs[].timingWindowMs', type: '[number, number]', unit: 'ms', description: "Timing window: this sub's delay setting minus the mains' over which the flatness stays within 1 dB of the advised setting's (same polarity, the settings around the advised one), 0.01 ms." },
      { name: 'subs[].flatnessVersusDelay', type: 'object', unit: 'ms / dB', description: "{ subMinusMainsDelayMs[], normalDb[], invertedDb[] }: the flatness measure of the whole system against this sub's delay setting minus the mains' (from the present one −maxDelayMs to +maxDelayMs, 2·stepMs apart), with the sub not inverted and inverted." },
      { name: 'group', type: 'object | null', description: 'With 2 or more subs, one piece of advice for all of them, shaped like subs[].advice without shiftMs and flip: coordinate descent over the subs as a group and each alone, every step at least 0.05 dB flatter and keeping the bass of the present setting, at most four rounds; given (keep false) only when the result is at least 0.5 dB flatter than the present. null with one sub.' },
    ],
    notes: [
      flatnessNote,
      rulesNote,
      "A sub's advice: among the delays and polarities of that sub that keep the bass, within 0.5 dB of the flattest found and at least 0.5 dB flatter than the present setting, the smallest change (least delay moved, then no flip); when there is none, keep, and the reason says whether no change gains 0.5 dB or the flatter ones give up bass.",
      'Every piece of advice states the whole system\'s settings to run (set), and its after is that system assessed. With several subs, follow one piece of advice (a sub\'s or the group\'s), then ask again: each is worked out on the system as it is.',
    ],
    examples: [
      {
        title: 'Two subs 3.4 m and 4.4 m from the MLP, mains 3.4 m, LR4 / LR4 at 80 Hz, subs trimmed −6 dB each, no delays yet',
        request: {
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
        request: { crossoverHz: 80, mainsHighpass: { family: 'linkwitz-riley', order: 4 }, subLowpass: { family: 'linkwitz-riley', order: 4 }, mains: { distanceM: 3 }, subs: [{ name: 'Sub', distanceM: -1 }] },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'subs.0.distanceM', message: 'must be at least 0 m' }] } },
      },
    ],
  },
];
