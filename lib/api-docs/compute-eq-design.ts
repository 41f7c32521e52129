import { EQ_DESIGN_DEFAULTS, HOUSE_CURVE_DEFINITION, NULL_DEFINITION, RESIDUAL_DEFINITION } from '@/dsp';
import type { ApiRouteDoc } from './types';

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
const D = EQ_DESIGN_DEFAULTS;

const LEVELS = '{ rmsDb, maxDb }';

export const EQ_DESIGN_DOCS: ApiRouteDoc[] = [
  {
    id: 'eq-design',
    method: 'POST',
    path: '/api/v1/eq-design',
    summary:
      `The EQ designer: up to maxFilters peaking filters (the Audio EQ Cookbook’s, R. Bristow-Johnson) for the sub outputs, bringing the subs’ response toward a target over a band, cut first. The target is flat or a house curve (${HOUSE_CURVE_DEFINITION}), plus the crossover low-pass’s own shape when the response runs through it, placed at the median of the response less that shape over the band outside the nulls. Nulls are left alone: ${NULL_DEFINITION}; no boost’s bandwidth (the cookbook’s, between its half-gain frequencies) may reach one. Search: the largest area above the target gets a cut first, then the largest below a boost (at most maxBoostDb); each filter fitted alone, then all together (Levenberg–Marquardt on the RMS error in dB); filters under 0.5 dB or worth under 0.01 dB dropped; rounded to 0.1 Hz, 0.1 dB and Q 0.01, and the residual recomputed from the rounded biquads at sampleRateHz. The residual is never worse than before: when nothing helps, no filters. Three inputs: an inline curve, the modal model of a room (the subs as they play now), or stored measurements.`,
    auth: 'none',
    fields: [
      { name: 'frequencyHz, magnitudeDb', type: 'number[] (3–4000 each)', unit: 'Hz, dB', description: 'An inline curve: the response the EQ acts on (already through whatever the output plays: roll-offs, crossover), on ascending frequencies below the Nyquist frequency. A log grid suits the designer; any spacing works (the residual weighs each point by its share of log frequency). Q is held to what two grid steps resolve, so a coarse grid gets wider filters.' },
      { name: 'targetShapeDb', type: 'number[]', unit: 'dB', description: 'With an inline curve: a shape added to the target at each frequency (e.g. the crossover low-pass, so the EQ does not fight it).' },
      { name: 'room, seats, subs', type: '{ lengthM, widthM, heightM, rt60S, temperatureC }, { name, xM, yM, zM }[] (1–16), { name, xM, yM, zM, gainDb?, delayMs?, invert?, rolloffs?, voicing?, eq? }[] (1–8)', description: 'The modal model (as room-response and seat-balance take it): the subs are summed at each seat with their present settings — gain (dB, −30–30), processor delay (ms, 0–100; alignment and own delay), polarity, natural roll-offs (up to 4, as blend’s rolloff: sealed, vented, lowpass), the filters of their back-panel switches (voicing: peaking or shelves, analog) and any EQ the processor already runs on them (eq: peaking, digital; the design then comes on top of it — leave it out to design from scratch).' },
      { name: 'at', type: '"average" | a seat’s name', description: 'Model form: the power average over the seats (default) or one seat, e.g. the MLP.' },
      { name: 'lowpass', type: '{ family, order, cornerHz }', unit: 'Hz', description: 'Model and measured forms: the crossover low-pass the sub outputs run (Butterworth 1–8, Linkwitz–Riley 2, 4, 8), as the processor’s biquads at sampleRateHz. Applied to the model and to per-sub measurements; files of all subs together already hold it.' },
      { name: 'followLowpass', type: 'boolean', description: 'Add the low-pass’s level to the target, so the EQ does not fight the crossover (default true).' },
      { name: 'grid', type: '{ startHz, stopHz, pointsPerOctave }', unit: 'Hz', description: `Model and measured forms: the log grid (default 15–200 Hz at 48 points per octave, the Modes tab’s); the band must lie within it and hold at most 400 points.` },
      { name: 'measurements', type: '{ seat, sub?, measurementId }[]', description: 'Instead of a curve or room: stored measurements, with a session and read access to each. Either each sub alone at each seat (sub named; the subs summed with `subs[]`’s present gainDb, delayMs and invert and the low-pass — which needs phase from one timing reference, except with one sub), or every sub playing together through the processor with the subs’ EQ bypassed (sub left out; magnitude is enough). Several seats are power-averaged. The files must cover the band.' },
      { name: 'target', type: "{ kind: 'flat' } | { kind: 'house', riseDb, belowHz }", description: `Default flat. House: a low-frequency rise of riseDb (0–15 dB) below belowHz (20–200 Hz), shaped as ${HOUSE_CURVE_DEFINITION}.` },
      { name: 'band', type: '{ startHz, stopHz }', unit: 'Hz', description: `Where the EQ works and the residual is measured, 10–500 Hz (default ${D.band.startHz}–${D.band.stopHz}); filter centres stay inside it.` },
      { name: 'maxFilters', type: 'integer 1–10', description: `Most filters (default ${D.maxFilters}); fewer come back when more would not help.` },
      { name: 'maxBoostDb', type: 'number 0–12', unit: 'dB', description: `Largest gain of any filter (default +${D.maxBoostDb} dB; 0 for cuts only).` },
      { name: 'maxCutDb', type: 'number 0–24', unit: 'dB', description: `Deepest cut (default ${D.maxCutDb} dB, i.e. gains down to −${D.maxCutDb} dB).` },
      { name: 'q', type: '{ min, max }', description: `The filters’ Q range, 0.1–20 (default ${D.q.min}–${D.q.max}).` },
      { name: 'sampleRateHz', type: 'number 8000–384000', unit: 'Hz', description: `The processor’s sample rate (default ${D.sampleRateHz}): the filters are evaluated, and their sections given, as its digital biquads.` },
      { name: 'nullDepthDb', type: 'number 3–40', unit: 'dB', description: `How far a dip must lie below the level around it to count as a null (default ${D.nullDepthDb} dB).` },
      { name: 'targetLevelDb', type: 'number −500–500', unit: 'dB', description: 'Where the target sits, in the input’s units (default: the median of input − target shape in the band, outside the nulls). Send a design’s levelOffsetDb with the EQ applied to check it against that design’s own target: its residual before is then what the applied EQ achieves.' },
    ],
    answer: [
      { name: 'filters', type: "{ kind: 'peaking', centerHz, gainDb, q }[]", description: 'The filters to set on every sub output (one common EQ), rounded as a processor takes them: 0.1 Hz, 0.1 dB, Q 0.01. Never a gain above maxBoostDb, never a boost reaching a null. Empty when nothing helps.' },
      { name: 'sections', type: '{ b0, b1, b2, a1, a2 }[]', description: 'The same filters as biquads at sampleRateHz, full precision, in the convention H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²).' },
      { name: 'residual', type: `{ before: ${LEVELS}, after: ${LEVELS} }`, unit: 'dB', description: `How far the response lies from the target, without and with the rounded filters: ${RESIDUAL_DEFINITION}. after.rmsDb ≤ before.rmsDb always.` },
      { name: 'nulls', type: '{ frequencyHz, depthDb, lowHz, highHz, reason }[]', description: 'The deep narrow dips left alone, deepest first: where, how deep below the level around them, their extent, and why.' },
      { name: 'frequencyHz, inputDb, targetDb, eqDb, correctedDb', type: 'number[]', unit: 'Hz, dB', description: 'The grid and, on it, the response, the target, the EQ’s own level (the rounded biquads, exact) and the response with it. The curves are relative to the target’s level: 0 dB where a flat target sits.' },
      { name: 'levelOffsetDb', type: 'number', unit: 'dB', description: 'Where the target sits in the input’s own units (an inline curve’s dB; the model’s dB re 1 Pa per m³/s of volume velocity; a measurement’s dB).' },
      { name: 'input, source, seats', type: "string, 'curve' | 'model' | 'measured', string[]", description: 'Which input was used, in words (“model at Row 1 centre”, “measured, power average of 3 seats (every sub playing together)”), and the seats it came from.' },
      { name: 'band, target, sampleRateHz, caution', type: '…, string', description: 'The band, target and sample rate used, and the safety note on boosts.' },
    ],
    examples: [
      {
        title: 'An inline curve with an invented resonance near 40 Hz, flat target',
        request: { frequencyHz: CURVE_HZ, magnitudeDb: CURVE_DB },
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
        request: { room: ROOM, seats: SEATS, subs: SUBS, at: 'Row 1 centre', lowpass: { family: 'linkwitz-riley', order: 4, cornerHz: 80 }, target: { kind: 'house', riseDb: 4, belowHz: 60 } },
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
        request: { frequencyHz: CURVE_HZ, magnitudeDb: CURVE_DB, maxBoostDb: 20 },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'maxBoostDb', message: 'must be at most 12 dB' }] } },
      },
    ],
    notes: [
      'Measured variant, with a session: { "measurements": [{ "seat": "Row 1 centre", "measurementId": "' + MEASUREMENT + '" }], "lowpass": { "family": "linkwitz-riley", "order": 4, "cornerHz": 80 } } — one file per seat of every sub playing together (upload it with role "all subs"); or name `sub` in each and give `subs` with their present settings. Without a session it is answered 401.',
      'EQ cannot fill a cancellation: move a sub or the seat, or use Seat balance, before equalising. The modal model is a rigid rectangular room; measure after applying the EQ.',
      'Boosting the sub’s low end costs amplifier and driver headroom; check the Headroom tab after EQ, and keep listening levels safe.',
    ],
  },
];
