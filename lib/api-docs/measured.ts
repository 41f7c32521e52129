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

/**
 * 1/6-octave points from 20 Hz to 2.56 kHz of an invented sealed mains speaker: a second-order Butterworth high-pass at
 * 50 Hz (Q 0.707; Small 1972), so its −3 dB point is 50 Hz. `offsetDb` moves the whole curve (a second seat).
 */
const SEALED_HZ = Array.from({ length: 43 }, (_, i) => Number((20 * 2 ** (i / 6)).toPrecision(5)));
const sealedSeat = (offsetDb: number) => ({
  frequencyHz: SEALED_HZ,
  magnitudeDb: SEALED_HZ.map((f) => Number((offsetDb + 10 * Math.log10((f / 50) ** 4 / (1 + (f / 50) ** 4))).toFixed(2))),
});

const summary: ApiField[] = [
  { name: 'id', type: 'uuid', description: 'The measurement.' },
  { name: 'name', type: 'string', description: 'As given, else the file name without its extension.' },
  { name: 'seat, role', type: 'string | null', description: 'Where it was measured and which source it is; null when not given.' },
  { name: 'runLabel', type: 'string | null', description: 'What was different in this run ("treble +2", "near-wall switch on"); null when not labelled.' },
  { name: 'pointCount', type: 'integer', description: 'Data lines in a text file (at least 8), or the points of an impulse response’s log grid.' },
  { name: 'startHz', type: 'number', unit: 'Hz', description: 'First frequency.' },
  { name: 'stopHz', type: 'number', unit: 'Hz', description: 'Last frequency.' },
  { name: 'hasPhase', type: 'boolean', description: 'True when the file had a third (phase) column; always true for an impulse response.' },
  { name: 'sourceFormat', type: '"text" | "wav"', description: 'A delimited text file, or an impulse response (WAV) transformed through its window.' },
  { name: 'sampleRateHz', type: 'integer | null', unit: 'Hz', description: 'An impulse response’s sample rate; null for text.' },
  { name: 'arrivalMs', type: 'number | null', unit: 'ms', description: 'An impulse response’s arrival: its peak (largest |sample|, refined between samples by a parabola), from the file’s first sample; null for text.' },
  { name: 'impulseWindow', type: '{ startMs, lengthMs, fadeInMs, fadeOutMs } | null', unit: 'ms', description: 'The window the impulse response was read through (from the file’s first sample); null for text.' },
];

/** The WAV formats an impulse response may come in (lib/measurements/read-wav.ts). */
const WAV_FORMATS = 'RIFF/WAVE, 16-, 24- or 32-bit integer PCM or 32-bit float (plain or WAVE_FORMAT_EXTENSIBLE), mono or the first channel of several, 8–192 kHz, at most 10 s, at most 16 MB';

const curveFields = 'Either { "measurementId": uuid } (a stored measurement the caller may read; needs a session) or the points inline: { frequencyHz[], magnitudeDb[], phaseDeg[]? } (8–20 000 points, strictly increasing frequencies, |magnitude| ≤ 300 dB, |phase| ≤ 3600°).';

export const MEASURED_DOCS: ApiRouteDoc[] = [
  {
    id: 'measurements-upload',
    method: 'POST',
    path: '/api/v1/measurements',
    summary: 'Uploads a measured response (multipart/form-data) into the Library of a workspace where the caller is an editor or owner.',
    auth: 'session',
    fields: [
      { name: 'file', type: 'file (text or CSV ≤ 2 MB, or WAV ≤ 16 MB)', required: true, description: `Text: two or three numeric columns per line: frequency (Hz), magnitude (dB), optional phase (°), separated by commas, semicolons, tabs or spaces. Leading lines that do not begin with a number (notes, a header row) are skipped and counted; lines starting with # or ; are comments anywhere; decimal point, or decimal comma when the columns are not comma-separated. Or an impulse response as a WAV file (${WAV_FORMATS}): read as WAV when its first bytes are a RIFF header, whatever type it was sent as (audio/wav, audio/x-wav, audio/wave, application/octet-stream…). It is cut with the window (below), transformed with an FFT and stored as its complex response on a log grid, 10 Hz to 20 kHz (never above 0.45 × the sample rate), 48 points per octave: magnitude in dB re full scale (an impulse of 1.0 reads 0 dB) and the true phase in degrees, including the delay from the file’s first sample to the peak, wrapped to (−180, 180].` },
      { name: 'name', type: 'string', description: '1–120 characters; default: the file name.' },
      { name: 'systemId', type: 'uuid', description: 'The System it was measured for; the measurement goes to that System’s workspace (editor there).' },
      { name: 'workspaceId', type: 'uuid', description: 'Without systemId: the workspace to keep it in (default: the caller’s personal workspace).' },
      { name: 'seat', type: 'string', description: 'Where it was measured, e.g. "Row 1 centre (MLP)".' },
      { name: 'role', type: 'string', description: '"mains", "sub", "sum" or another channel label (L, C, SL…).' },
      { name: 'runLabel', type: 'string', description: '1–80 characters: what was different in this run, e.g. "treble +2", "near-wall switch on", "after moving the sub".' },
      { name: 'windowStartMs', type: 'number', unit: 'ms', description: 'WAV only: where the window starts, from the file’s first sample (0…10 000; at or before the peak). Default: 20 ms before the peak, or the first sample when the peak is earlier. A half-Hann fade-in covers min(10 ms, half the time from the start to the peak); none when the window starts at the first sample.' },
      { name: 'windowLengthMs', type: 'number', unit: 'ms', description: 'WAV only: the window’s length (1…10 000; it must reach past the peak and end within the file). Default: 500 ms, or to the end of the file when that comes first. A half-Hann fade-out covers min(20 % of the length, half the time from the peak to the end). Sent with a text file, either window field is a 400.' },
    ],
    answer: [
      ...summary,
      { name: 'skippedLines', type: 'integer', description: 'Text only: leading lines skipped because they do not begin with a number (notes, comments, the header row).' },
      { name: 'firstDataLine', type: 'integer', description: 'Text only: the 1-based line of the first number.' },
      { name: 'impulse', type: 'object', description: 'WAV only: format ("pcm" or "float"), bitsPerSample, channels (only the first is read), durationS, peakDbfs (the loudest sample, dB re full scale), window ({ startMs, lengthMs, fadeInMs, fadeOutMs, startIsDefault, lengthIsDefault }) and frequencyResolutionHz (sample rate ÷ window length: the finest detail the window can show).' },
    ],
    examples: [
      {
        title: 'Upload a mains measurement taken at the MLP',
        request: { multipart: { file: 'seat-1-mains.csv', name: 'Seat 1 mains (invented)', systemId: SYSTEM, seat: 'Row 1 centre (MLP)', role: 'mains' } },
        status: 201,
        responseExcerpt: { id: ID, name: 'Seat 1 mains (invented)', pointCount: 240, startHz: 20, stopHz: 19027, hasPhase: true, skippedLines: 3, firstDataLine: 4 },
      },
      {
        title: 'Upload an impulse response of a sub (48 kHz, 24-bit WAV) with the default window',
        request: { multipart: { file: 'row-1-sub.wav', systemId: SYSTEM, seat: 'Row 1 centre (MLP)', role: 'sub', runLabel: 'after moving the sub' } },
        status: 201,
        responseExcerpt: {
          id: ID,
          name: 'row-1-sub',
          runLabel: 'after moving the sub',
          sourceFormat: 'wav',
          sampleRateHz: 48000,
          arrivalMs: 12.4,
          impulseWindow: { startMs: 0, lengthMs: 500, fadeInMs: 0, fadeOutMs: 100 },
          pointCount: 527,
          startHz: 10,
          stopHz: 19897,
          hasPhase: true,
          impulse: { format: 'pcm', bitsPerSample: 24, channels: 1, durationS: 1, peakDbfs: -6.2, window: { startMs: 0, lengthMs: 500, fadeInMs: 0, fadeOutMs: 100, startIsDefault: true, lengthIsDefault: true }, frequencyResolutionHz: 2 },
        },
      },
      {
        title: 'A refused impulse response: the reason and the field named (nothing is stored)',
        request: { multipart: { file: 'clipped.wav' } },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', message: 'The WAV file was refused: 12 samples of the first channel sit at full scale: the recording clipped. Turn the level down and measure again (a peak a few dB below full scale is enough); a file normalised to full scale may touch it with one sample only.', issues: [{ path: 'file', message: '12 samples of the first channel sit at full scale: the recording clipped. …' }] } },
      },
      {
        title: 'A refused file: every line error named (nothing is stored)',
        request: { multipart: { file: 'broken.csv' } },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', message: 'The file was refused: line 7, column 2: magnitude: "oops" is not a number (and 1 more).', issues: [{ path: 'line 7, column 2', message: 'magnitude: "oops" is not a number' }], totalIssues: 2 } },
      },
    ],
    notes: [
      'A text file is refused with 400 (each issue names "line N, column M"): a non-numeric cell or a line of text below the first number, a frequency that is not positive or not strictly increasing (duplicates included), fewer than 8 points, phase outside ±3600°, magnitude outside ±300 dB, binary content. At most 50 issues are listed; totalIssues counts them all.',
      'A WAV file is refused with 400 naming the field (`file`, `windowStartMs` or `windowLengthMs`) and the part of the file: a header that is truncated or whose sizes are false, a format or bit depth other than those above (8-bit, µ-law, ADPCM…), 0 channels, a sample rate outside 8–192 kHz, more than 10 s, a float sample that is NaN or infinite, clipping (more than one sample of the first channel at full scale — the largest or smallest integer code, or ±1.0 in float; one alone is a peak normalised to full scale and is kept: record again with the level turned down), silence (no sample reaches one step of a 16-bit file, −90.3 dBFS), a window that starts outside the file or after the peak, ends before the peak or runs past the end.',
      'Every check runs before the measurement is written in one INSERT: a refused file stores nothing.',
      '413 over 2 MB of text or 16 MB of WAV (the server stops reading a body at 16 MB); 415 when the body is not multipart/form-data or the file is declared as a type that is neither text nor WAV (an image, a PDF, an MP3, an archive).',
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
      { name: 'seat', type: 'string', description: 'Only those measured at this seat (1–60 characters; the same text, ignoring case: "row 1 centre (mlp)" finds "Row 1 centre (MLP)").' },
      { name: 'role', type: 'string', description: 'Only those of this source ("mains", "sub", "L"…; the same text, ignoring case).' },
    ],
    answer: [{ name: 'items', type: 'MeasurementSummary[]', description: 'Each with id, workspaceId, workspaceName, systemId, name, seat, role, runLabel, pointCount, startHz, stopHz, hasPhase, sourceFormat, sampleRateHz, arrivalMs, impulseWindow, createdByName, createdAt (at most 500).' }],
    examples: [
      { title: 'One workspace', request: { query: `?workspaceId=${SYSTEM}` }, status: 200, responseExcerpt: { items: [{ id: ID, name: 'Row 1 centre (MLP): L mains (invented)', role: 'mains', pointCount: 240, hasPhase: true }] } },
      { title: 'The mains at one seat of one System', request: { query: `?systemId=${SYSTEM}&seat=Row%201%20centre%20(MLP)&role=mains` }, status: 200, responseExcerpt: { items: [{ id: ID, seat: 'Row 1 centre (MLP)', role: 'mains' }] } },
    ],
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
      { name: 'phaseDeg', type: 'number[] | null', unit: '°', description: 'Every phase as the text file gave it, or null for a two-column file; for an impulse response the true phase wrapped to (−180, 180].' },
    ],
    examples: [{ title: 'Read back a stored measurement', request: {}, status: 200, responseExcerpt: { id: ID, pointCount: 240, frequencyHz: [20], magnitudeDb: [84.1], phaseDeg: [12.5] } }],
    notes: [ACCESS],
  },
  {
    id: 'measurements-update',
    method: 'PATCH',
    path: '/api/v1/measurements/{id}',
    summary: 'Renames or relabels a measurement (editors and owners of its workspace); its points never change.',
    auth: 'session',
    fields: [
      { name: 'name', type: 'string', description: '1–120 characters.' },
      { name: 'seat', type: 'string | null', description: '1–60 characters; null clears it.' },
      { name: 'role', type: 'string | null', description: '1–20 letters, digits, spaces, +, - or _ ("mains", "sub", "L"…); null clears it.' },
      { name: 'runLabel', type: 'string | null', description: '1–80 characters; null clears it.' },
    ],
    answer: [...summary],
    examples: [
      { title: 'Label a run', request: { runLabel: 'near-wall switch on' }, status: 200, responseExcerpt: { id: ID, runLabel: 'near-wall switch on' } },
      { title: 'Clear the label and move it to another seat', request: { runLabel: null, seat: 'Row 1 left' }, status: 200, responseExcerpt: { id: ID, runLabel: null, seat: 'Row 1 left' } },
    ],
    notes: ['Send at least one field; any other field is a 400. Text is trimmed.', ACCESS],
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
      { name: 'mains, sub', type: '{ curve, gainDb, delayMs, invert, processorEq?, name? }', required: true, description: `The processor settings to apply (gain dB, delay ms ≥ 0, polarity, and processorEq: the processor's EQ on that output, up to 26 peaking or shelf filters as on /api/v1/blend) and the curve: ${curveFields} The measurement is taken as holding the speaker’s own roll-off, its voicing switches and the distance, so none of them is added.` },
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
  {
    id: 'measured-extension',
    method: 'POST',
    path: '/api/v1/measured/extension',
    summary: 'How low a source goes in the room: the −3, −6 and −10 dB points below its own mean level over a band, from its curve at one seat or the spatial average of several; and a crossover judged against them.',
    auth: 'none',
    fields: [
      { name: 'curves', type: '({ measurementId, name? } | { frequencyHz[], magnitudeDb[], phaseDeg?, name? })[]', required: true, description: `1–40 curves of the same source, one per seat. ${curveFields} A phase column is accepted and not used. Several curves are power-averaged point by point (the spatial average, 10·log10 of the mean of 10^(L/10); common practice); curves on different grids are first resampled (linear in log-frequency) onto a common 1/96-octave grid over the range they share (at least an octave).` },
      { name: 'name', type: 'string', description: 'Per curve, 1–60 characters (default: the stored name, else "Seat N").' },
      { name: 'band', type: '{ startHz, stopHz }', unit: 'Hz', description: '10…24 000 Hz, stopHz at least an octave above startHz (default 200–2000 Hz: above the room’s modes, below the tweeter; common practice). The mean level is the power mean over the band, each point weighted by its share of log-frequency. The band must lie within the data.' },
      { name: 'crossoverHz', type: 'number', unit: 'Hz', description: '20…300: a crossover to judge against the −3 and −6 dB points.' },
    ],
    answer: [
      { name: 'band', type: '{ startHz, stopHz }', unit: 'Hz', description: 'The band used.' },
      { name: 'meanLevelDb', type: 'number', unit: 'dB', description: 'The power mean of the analysed curve over the band.' },
      { name: 'pointsHz', type: '{ minus3, minus6, minus10 }', unit: 'Hz', description: 'Going down from the band, where the curve first falls 3, 6 and 10 dB below the mean (linear in log-frequency between points); null when it does not within the data (the point lies below lowestMeasuredHz).' },
      { name: 'averagedFrom', type: 'integer', description: 'How many seats’ curves were averaged (1: the curve itself).' },
      { name: 'names', type: 'string[]', description: 'Each curve’s name, in order.' },
      { name: 'resampled', type: 'boolean', description: 'True when the curves’ grids differed and each was resampled onto the common grid.' },
      { name: 'lowestMeasuredHz', type: 'number', unit: 'Hz', description: 'The lowest frequency of the analysed curve (of the range the curves share).' },
      { name: 'curve', type: '{ frequencyHz[], magnitudeDb[] }', description: 'The analysed curve: the one curve, or the seats’ spatial average.' },
      { name: 'crossover', type: 'object (with crossoverHz)', description: 'crossoverHz; octavesAboveMinus3 and octavesAboveMinus6 (log2 of crossover ÷ point; negative below it; null when the point is not in the data); verdict: "clear" (at least half an octave above the −3 dB point, or half an octave above the data when the curve never falls 3 dB), "too-close", or "unknown" (the −3 dB point lies below the data, too near to judge); rule (the rule in words; common practice); summary (one sentence).' },
    ],
    examples: [
      {
        title: 'An invented sealed mains speaker (−3 dB at 50 Hz) at two seats, the second 1 dB quieter, against a crossover at 80 Hz',
        request: { curves: [{ name: 'Row 1 centre (invented)', ...sealedSeat(0) }, { name: 'Row 1 left (invented)', ...sealedSeat(-1) }], crossoverHz: 80 },
        status: 200,
        responseExcerpt: {
          band: { startHz: 200, stopHz: 2000 },
          meanLevelDb: -0.473,
          pointsHz: { minus3: 50.08, minus6: 38.11, minus10: 28.87 },
          averagedFrom: 2,
          names: ['Row 1 centre (invented)', 'Row 1 left (invented)'],
          curve: { frequencyHz: [20], magnitudeDb: [-16.501] },
          crossover: { crossoverHz: 80, octavesAboveMinus3: 0.676, octavesAboveMinus6: 1.07, verdict: 'clear', rule: 'keep the crossover at least half an octave above the mains’ in-room −3 dB point (common practice)', summary: 'A crossover at 80 Hz sits 0.68 octaves above the in-room −3 dB point (50.1 Hz) and 1.07 octaves above the −6 dB point (38.1 Hz): fine.' },
        },
      },
    ],
    notes: [
      'Inline points need no session; a measurementId is read with the caller’s rights (401 signed out, 404 outside the workspace).',
      '400 naming the field: a band outside the data, curves sharing less than an octave, more than 40 curves, and the inline-curve rules above. The body may be up to 2 MB.',
    ],
  },
  {
    id: 'measured-compare',
    method: 'POST',
    path: '/api/v1/measured/compare',
    summary: 'Runs compared: each other run as its difference from a reference run (dB against frequency), smoothed, over the range every run covers; levels as measured unless a band to match them over is given.',
    auth: 'none',
    fields: [
      { name: 'reference', type: '{ measurementId, name? } | { frequencyHz[], magnitudeDb[], phaseDeg?, name? }', required: true, description: `The run the others are compared with. ${curveFields} A phase column is accepted and not used. name: 1–120 characters (default: the stored name, else "Reference").` },
      { name: 'others', type: '(the same)[]', required: true, description: '1–12 runs, each shown as (run − reference) in dB; name defaults to the stored name, else "Run N".' },
      { name: 'smoothingFraction', type: 'integer', description: '0 (none, default) or N of 1/N octave (1…48). Each run is smoothed on its own points (the power average over 1/N octave around each point; common practice) before the difference, so a difference that is the same at every frequency stays exactly that.' },
      { name: 'pointsPerOctave', type: 'integer', description: '6…96 (default 48): the common log grid every run is resampled to (linear in log-frequency).' },
      { name: 'matchLevelBandHz', type: '{ startHz, stopHz }', unit: 'Hz', description: 'Optional, 10…24 000 Hz, stopHz at least a third of an octave above startHz, within the runs’ common range. When given, each other run is moved so its power average over the band (each point weighted by its share of log-frequency, on its own unsmoothed points) equals the reference’s; without it no level is changed (levels as measured).' },
    ],
    answer: [
      { name: 'frequencyHz', type: 'number[]', unit: 'Hz', description: 'The common log grid: from the highest first frequency to the lowest last frequency of all runs.' },
      { name: 'rangeHz', type: '{ startHz, stopHz }', unit: 'Hz', description: 'The range every run covers (at least an octave).' },
      { name: 'smoothingFraction', type: 'integer', description: 'As asked (0: none).' },
      { name: 'levels', type: '"as measured" | "matched"', description: 'Whether the runs’ levels were matched over matchLevelBandHz.' },
      { name: 'matchLevelBandHz', type: '{ startHz, stopHz } | null', unit: 'Hz', description: 'The band used for level matching, or null.' },
      { name: 'reference', type: '{ name }', description: 'The reference run’s name.' },
      { name: 'differences', type: '{ name, differenceDb[], levelOffsetDb, minDb, maxDb, largest: { differenceDb, frequencyHz } }[]', description: 'Per other run, in order: (run + levelOffsetDb) − reference at each grid frequency (dB, smoothed as asked); levelOffsetDb, what level matching added to the run (0 as measured); the lowest and highest difference; and the difference of largest size (signed) with its frequency.' },
    ],
    examples: [
      {
        title: 'An invented sealed mains speaker at one seat, a second run 1 dB quieter: levels as measured, 1/6-octave smoothing',
        request: { reference: { name: 'Row 1 centre, first run (invented)', ...sealedSeat(0) }, others: [{ name: 'Row 1 centre, second run (invented)', ...sealedSeat(-1) }], smoothingFraction: 6 },
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
        request: { reference: { name: 'Row 1 centre, first run (invented)', ...sealedSeat(0) }, others: [{ name: 'Row 1 centre, second run (invented)', ...sealedSeat(-1) }], smoothingFraction: 6, matchLevelBandHz: { startHz: 200, stopHz: 2000 } },
        status: 200,
        responseExcerpt: {
          levels: 'matched',
          matchLevelBandHz: { startHz: 200, stopHz: 2000 },
          differences: [{ differenceDb: [0], levelOffsetDb: 1, largest: { differenceDb: 0, frequencyHz: 20 } }],
        },
      },
    ],
    notes: [
      'Inline points need no session; a measurementId is read with the caller’s rights (401 signed out, 404 outside the workspace).',
      '400 naming the field: runs sharing less than an octave (others), a band outside their common range (matchLevelBandHz), more than 12 others, and the inline-curve rules above. The body may be up to 2 MB.',
    ],
  },
];
