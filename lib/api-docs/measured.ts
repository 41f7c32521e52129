import type { ApiField, ApiRouteDoc } from './types';

// Measurements need a session (the next-auth cookie); their examples are documented, not executed.
// The predict example with inline points needs none, so the docs test runs it against the server.
const ID = '3c9a7e21-5b4d-4f60-8e1a-9d2c7b6a5f40';
const SYSTEM = '6b0d6f8e-3c1a-4d2b-9f4e-2a7c5e1d9b30';
const ACCESS = 'Anonymous callers get 401; callers outside the workspace get 404 (as if it did not exist); viewers get 403 on writes.';

/** 1/6-octave points from 20 Hz to 640 Hz: a flat (0 dB, 0°) measurement, the simplest honest example. */
const EXAMPLE_HZ = Array.from({ length: 31 }, (_, i) => Number((20 * 2 ** (i / 6)).toPrecision(5)));
const flatCurve = (withPhase: boolean) => ({
  frequencyHz: EXAMPLE_HZ,
  magnitudeDb: EXAMPLE_HZ.map(() => 0),
  ...(withPhase ? { phaseDeg: EXAMPLE_HZ.map(() => 0) } : {}),
});

const summary: ApiField[] = [
  { name: 'id', type: 'uuid', description: 'The measurement.' },
  { name: 'name', type: 'string', description: 'As given, else the file name without its extension.' },
  { name: 'pointCount', type: 'integer', description: 'Data lines in the file (at least 8).' },
  { name: 'startHz', type: 'number', unit: 'Hz', description: 'First frequency.' },
  { name: 'stopHz', type: 'number', unit: 'Hz', description: 'Last frequency.' },
  { name: 'hasPhase', type: 'boolean', description: 'True when the file had a third (phase) column.' },
];

const curveFields = 'Either { "measurementId": uuid } (a stored measurement the caller may read; needs a session) or the points inline: { frequencyHz[], magnitudeDb[], phaseDeg[]? } (8–20 000 points, strictly increasing frequencies, |magnitude| ≤ 300 dB, |phase| ≤ 3600°).';

export const MEASURED_DOCS: ApiRouteDoc[] = [
  {
    id: 'measurements-upload',
    method: 'POST',
    path: '/api/v1/measurements',
    summary: 'Uploads a measured response (multipart/form-data) into the Library of a workspace where the caller is an editor or owner.',
    auth: 'session',
    fields: [
      { name: 'file', type: 'file (text or CSV, ≤ 2 MB)', required: true, description: 'Two or three numeric columns per line: frequency (Hz), magnitude (dB), optional phase (°), separated by commas, semicolons, tabs or spaces. Leading lines that do not begin with a number (notes, a header row) are skipped and counted; lines starting with # or ; are comments anywhere; decimal point, or decimal comma when the columns are not comma-separated.' },
      { name: 'name', type: 'string', description: '1–120 characters; default: the file name.' },
      { name: 'systemId', type: 'uuid', description: 'The System it was measured for; the measurement goes to that System’s workspace (editor there).' },
      { name: 'workspaceId', type: 'uuid', description: 'Without systemId: the workspace to keep it in (default: the caller’s personal workspace).' },
      { name: 'seat', type: 'string', description: 'Where it was measured, e.g. "Row 1 centre (MLP)".' },
      { name: 'role', type: 'string', description: '"mains", "sub", "sum" or another channel label (L, C, SL…).' },
    ],
    answer: [
      ...summary,
      { name: 'skippedLines', type: 'integer', description: 'Leading lines skipped because they do not begin with a number (notes, comments, the header row).' },
      { name: 'firstDataLine', type: 'integer', description: 'The 1-based line of the first number.' },
    ],
    examples: [
      {
        title: 'Upload a mains measurement taken at the MLP',
        request: { multipart: { file: 'seat-1-mains.csv', name: 'Seat 1 mains (invented)', systemId: SYSTEM, seat: 'Row 1 centre (MLP)', role: 'mains' } },
        status: 201,
        responseExcerpt: { id: ID, name: 'Seat 1 mains (invented)', pointCount: 240, startHz: 20, stopHz: 19027, hasPhase: true, skippedLines: 3, firstDataLine: 4 },
      },
      {
        title: 'A refused file: every line error named (nothing is stored)',
        request: { multipart: { file: 'broken.csv' } },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', message: 'The file was refused: line 7, column 2: magnitude: "oops" is not a number (and 1 more).', issues: [{ path: 'line 7, column 2', message: 'magnitude: "oops" is not a number' }], totalIssues: 2 } },
      },
    ],
    notes: [
      'Refused with 400 (each issue names "line N, column M"): a non-numeric cell or a line of text below the first number, a frequency that is not positive or not strictly increasing (duplicates included), fewer than 8 points, phase outside ±3600°, magnitude outside ±300 dB, binary content. At most 50 issues are listed; totalIssues counts them all.',
      '413 over 2 MB; 415 when the body is not multipart/form-data or the file is declared as a type that is not text (an image, a PDF, an archive).',
      ACCESS,
    ],
  },
  {
    id: 'measurements-list',
    method: 'GET',
    path: '/api/v1/measurements',
    summary: 'The measurements of the caller’s workspaces, newest first (without their points).',
    auth: 'session',
    fields: [
      { name: 'workspaceId', type: 'uuid', description: 'Only one workspace.' },
      { name: 'systemId', type: 'uuid', description: 'Only those uploaded for one System.' },
    ],
    answer: [{ name: 'items', type: 'MeasurementSummary[]', description: 'Each with id, workspaceId, workspaceName, systemId, name, seat, role, pointCount, startHz, stopHz, hasPhase, createdByName, createdAt.' }],
    examples: [{ title: 'One workspace', request: { query: `?workspaceId=${SYSTEM}` }, status: 200, responseExcerpt: { items: [{ id: ID, name: 'Row 1 centre (MLP): L mains (invented)', role: 'mains', pointCount: 240, hasPhase: true }] } }],
    notes: [ACCESS],
  },
  {
    id: 'measurements-get',
    method: 'GET',
    path: '/api/v1/measurements/{id}',
    summary: 'One measurement with every point exactly as uploaded.',
    auth: 'session',
    fields: [],
    answer: [
      ...summary,
      { name: 'frequencyHz', type: 'number[]', unit: 'Hz', description: 'Every frequency, as parsed.' },
      { name: 'magnitudeDb', type: 'number[]', unit: 'dB', description: 'Every magnitude.' },
      { name: 'phaseDeg', type: 'number[] | null', unit: '°', description: 'Every phase, or null for a two-column file.' },
    ],
    examples: [{ title: 'Read back a stored measurement', request: {}, status: 200, responseExcerpt: { id: ID, pointCount: 240, frequencyHz: [20], magnitudeDb: [84.1], phaseDeg: [12.5] } }],
    notes: [ACCESS],
  },
  {
    id: 'measurements-delete',
    method: 'DELETE',
    path: '/api/v1/measurements/{id}',
    summary: 'Deletes a measurement (editors and owners of its workspace).',
    auth: 'session',
    fields: [],
    answer: [{ name: 'id, deleted', type: 'uuid, true', description: 'What was deleted.' }],
    examples: [{ title: 'Delete', request: {}, status: 200, responseExcerpt: { id: ID, deleted: true } }],
    notes: [ACCESS],
  },
  {
    id: 'measured-predict',
    method: 'POST',
    path: '/api/v1/measured/predict',
    summary: 'Predicts the blend at the seat from a mains and a sub measurement with the System’s crossover, gains, delays and polarity, beside the sum as measured; with the best delay and polarity on the measured pair and its Timing window.',
    auth: 'none',
    fields: [
      { name: 'temperatureC', type: 'number', unit: '°C', required: true, description: '−20…50 (the speed of sound of the delay scan).' },
      { name: 'crossoverHz', type: 'number', unit: 'Hz', required: true, description: '20…300: the corner of both filters.' },
      { name: 'mainsHighpass, subLowpass', type: '{ family, order }', required: true, description: 'Butterworth orders 1–8 or Linkwitz–Riley 2, 4, 8.' },
      { name: 'mains, sub', type: '{ curve, gainDb, delayMs, invert, eq?, name? }', required: true, description: `The processor settings to apply (gain dB, delay ms ≥ 0, polarity, and eq: the processor's EQ on that output, up to 26 peaking or shelf filters as on /api/v1/blend) and the curve: ${curveFields} The measurement is taken as holding the speaker’s own roll-off, its voicing switches and the distance, so none of them is added.` },
      { name: 'smoothingFraction', type: 'integer', description: '0 (none, default) or N of 1/N octave (1…48) for every returned magnitude.' },
      { name: 'pointsPerOctave', type: 'integer', description: '6…96 (default 48): the shared grid both curves are resampled to.' },
      { name: 'maxDelayMs', type: 'number', unit: 'ms', description: '1…50 (default 20): the widest delay the search tries on either side.' },
    ],
    answer: [
      { name: 'frequencyHz', type: 'number[]', unit: 'Hz', description: 'The shared log grid: the curves’ common range within 10 Hz … max(1 kHz, 4.5 × crossover).' },
      { name: 'phaseEstimated', type: 'boolean', description: 'True when a curve had no phase and its minimum-phase estimate was used (each trace says so too).' },
      { name: 'measured', type: '{ name, magnitudeDb, phaseDeg, phaseEstimated }[]', description: 'Each curve on the grid, as measured.' },
      { name: 'paths', type: '{ name, magnitudeDb, phaseDeg, phaseEstimated }[]', description: 'Each curve with its settings applied.' },
      { name: 'predictedSum', type: '{ magnitudeDb, phaseDeg }', description: 'The complex sum of the processed curves.' },
      { name: 'measuredSum', type: '{ magnitudeDb, phaseDeg }', description: 'The complex sum of the curves as measured (no processing).' },
      { name: 'alignment', type: 'object | null', description: 'keep (true when the best setting is under 0.5 dB flatter than the present: keep it), reason, addTo, addDelayMs, subDelayMs and mainsDelayMs (processor delays, as on the Settings sheet), invert, flipPolarity, flatnessBeforeDb, flatnessDb, crossoverLevelDb, timingWindowMs [from, to] (sub minus mains), levelVersusDelay, recommendedSum. Null when the curves do not cover half to four times the crossover (alignmentNote says why).' },
    ],
    examples: [
      {
        title: 'Two flat inline measurements (the sub file without phase), LR4 at 80 Hz, the sub set 2 ms late',
        request: {
          temperatureC: 20,
          crossoverHz: 80,
          mainsHighpass: { family: 'linkwitz-riley', order: 4 },
          subLowpass: { family: 'linkwitz-riley', order: 4 },
          mains: { curve: flatCurve(true), gainDb: 0, delayMs: 0, invert: false },
          sub: { curve: flatCurve(false), gainDb: 0, delayMs: 2, invert: false },
        },
        status: 200,
        responseExcerpt: {
          frequencyHz: [20],
          phaseEstimated: true,
          paths: [{ name: 'mains', magnitudeDb: [-48.2], phaseEstimated: false }],
          predictedSum: { magnitudeDb: [0], phaseDeg: [-14.9] },
          measuredSum: { magnitudeDb: [6.02] },
          alignment: { addTo: 'mains', addDelayMs: 2, subDelayMs: 0, mainsDelayMs: 0, invert: false, flatnessDb: 0, timingWindowMs: [-1.85, 1.85] },
        },
      },
    ],
    notes: ['Inline points need no session; a measurementId is read with the caller’s rights (401 signed out, 404 outside the workspace).'],
  },
];
