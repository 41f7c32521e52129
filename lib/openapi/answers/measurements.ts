import { z } from 'zod';
import type { AppMeasurement, AppMeasurementSummary, AppUploadAnswer } from '@/lib/data/measurements';
import type { ImpulseDetails } from '@/lib/measurements/impulse-measurement';
import { isoTime, itemsOf, rowId, type Same } from './library-parts';

/** Answers of the measurement routes: upload, list, read, relabel (delete answers `deletedAnswerSchema`). */

const windowShape = {
  startMs: z.number().meta({ description: 'Where the window starts, from the file’s first sample.', 'x-unit': 'ms' }),
  lengthMs: z.number().meta({ description: 'The window’s length.', 'x-unit': 'ms' }),
  fadeInMs: z.number().meta({ description: 'The half-Hann fade-in at its start (0 when it starts at the first sample).', 'x-unit': 'ms' }),
  fadeOutMs: z.number().meta({ description: 'The half-Hann fade-out at its end.', 'x-unit': 'ms' }),
};

const summaryShape = {
  id: rowId('The measurement.'),
  workspaceId: rowId('Its workspace.'),
  workspaceName: z.string().meta({ description: 'That workspace’s name.' }),
  systemId: rowId('The System it was uploaded for').nullable().meta({ description: 'The System it was uploaded for; null when none.' }),
  name: z.string().meta({ description: 'As given, else the file name without its extension.' }),
  seat: z.string().nullable().meta({ description: 'Where it was measured; null when not given.' }),
  role: z.string().nullable().meta({ description: 'Which source it is ("mains", "sub", "L"…); null when not given.' }),
  pointCount: z.number().int().meta({ description: 'Data lines in a text file (at least 8), or the points of an impulse response’s log grid.' }),
  startHz: z.number().meta({ description: 'The first frequency.', 'x-unit': 'Hz' }),
  stopHz: z.number().meta({ description: 'The last frequency.', 'x-unit': 'Hz' }),
  hasPhase: z.boolean().meta({ description: 'True when the file had a third (phase) column; always true for an impulse response.' }),
  runLabel: z.string().nullable().meta({ description: 'What was different in this run ("treble +2", "near-wall switch on"); null when not labelled.' }),
  sourceFormat: z.enum(['text', 'wav']).meta({ description: 'text: a delimited text file (or inline points); wav: an impulse response transformed through its window.' }),
  sampleRateHz: z.number().nullable().meta({ description: 'An impulse response’s sample rate; null for text.', 'x-unit': 'Hz' }),
  arrivalMs: z
    .number()
    .nullable()
    .meta({ description: 'An impulse response’s arrival: its peak (largest |sample|, refined between samples by a parabola), from the file’s first sample; null for text.', 'x-unit': 'ms' }),
  impulseWindow: z.strictObject(windowShape).nullable().meta({ description: 'The window an impulse response was read through (ms from the file’s first sample); null for text.' }),
  createdByName: z.string().nullable().meta({ description: 'Who uploaded it; null when that account is gone.' }),
  createdAt: isoTime('When it was uploaded.'),
};

export const measurementSummaryAnswerSchema = z.strictObject(summaryShape).meta({ id: 'MeasurementSummary', description: 'A measurement without its points.' });

export const measurementListAnswerSchema = itemsOf(measurementSummaryAnswerSchema, 'The measurements, newest first (at most 500), without their points.');

export const measurementAnswerSchema = z
  .strictObject({
    ...summaryShape,
    frequencyHz: z.array(z.number()).meta({ description: 'Every frequency, as parsed.', 'x-unit': 'Hz' }),
    magnitudeDb: z.array(z.number()).meta({ description: 'Every magnitude (dB re full scale for an impulse response).', 'x-unit': 'dB' }),
    phaseDeg: z
      .array(z.number())
      .nullable()
      .meta({ description: 'Every phase as the text file gave it, or null for a two-column file; for an impulse response the true phase wrapped to (−180, 180].', 'x-unit': '°' }),
  })
  .meta({ description: 'One measurement with every point exactly as stored.' });

const impulseDetailsSchema = z
  .strictObject({
    format: z.enum(['pcm', 'float']).meta({ description: 'Integer PCM or 32-bit float.' }),
    bitsPerSample: z.number().int().meta({ description: '16, 24 or 32.' }),
    channels: z.number().int().meta({ description: 'Channels in the file; only the first is read.' }),
    durationS: z.number().meta({ description: 'The file’s length.', 'x-unit': 's' }),
    peakDbfs: z.number().meta({ description: 'The loudest sample of the first channel, dB re full scale.', 'x-unit': 'dB' }),
    window: z
      .strictObject({
        ...windowShape,
        startIsDefault: z.boolean().meta({ description: 'True when the start was the default (20 ms before the peak).' }),
        lengthIsDefault: z.boolean().meta({ description: 'True when the length was the default (500 ms, or to the end of the file).' }),
      })
      .meta({ description: 'The window used, and whether its start and length were the defaults.' }),
    frequencyResolutionHz: z.number().meta({ description: 'Sample rate ÷ window length: the finest detail the window can show.', 'x-unit': 'Hz' }),
  })
  .meta({ description: 'WAV only: the file and the window it was read through.' });

export const uploadAnswerSchema = z
  .strictObject({
    ...summaryShape,
    skippedLines: z.number().int().optional().meta({ description: 'Text only: leading lines skipped because they do not begin with a number (notes, comments, the header row).' }),
    firstDataLine: z.number().int().optional().meta({ description: 'Text only: the 1-based line of the first number.' }),
    impulse: impulseDetailsSchema.optional(),
  })
  .meta({ description: 'The stored measurement (without its points) and how the file was read.' });

// Each answer schema is the type its data function returns (the upload's `impulse`: what impulseMeasurement describes).
const _summary: Same<z.output<typeof measurementSummaryAnswerSchema>, AppMeasurementSummary> = true;
const _measurement: Same<z.output<typeof measurementAnswerSchema>, AppMeasurement> = true;
const _upload: Same<z.output<typeof uploadAnswerSchema>, Omit<AppUploadAnswer, 'impulse'> & { impulse?: ImpulseDetails }> = true;
void [_summary, _measurement, _upload];
