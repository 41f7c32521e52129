import { BODY_LIMIT_BYTES } from '@/lib/http';
import { deletedAnswerSchema } from '@/lib/openapi/answers/library-parts';
import { measurementAnswerSchema, measurementListAnswerSchema, measurementSummaryAnswerSchema, uploadAnswerSchema } from '@/lib/openapi/answers/measurements';
import { MAX_WAV_BYTES } from '@/lib/measurements/read-wav';
import { measurementLabelsSchema, measurementListQuerySchema, measurementUploadFormSchema } from '@/lib/validations/measurement';
import type { ApiOperation } from '../types';
import { ACCESS_NOTE, BODILESS_WRITE_ERRORS, EXAMPLE, measurementParams, QUERY_READ_ERRORS, READ_ERRORS, WRITE_ERRORS } from './library-common';

/** Stored measurements: upload (text or an impulse response as WAV), list, read, relabel, delete. */

const ID = EXAMPLE.measurement;
const SYSTEM = EXAMPLE.system;
/** The upload's body limit: the largest WAV file and 64 KiB for the form's boundaries and text fields (lib/measurements/read-upload.ts). */
const UPLOAD_LIMIT_BYTES = MAX_WAV_BYTES + 64 * 1024;
const MLP = 'Row 1 centre (MLP)';

export const MEASUREMENTS_OPERATIONS: ApiOperation[] = [
  {
    id: 'measurements-upload',
    method: 'POST',
    path: '/api/v1/measurements',
    tag: 'Measurements',
    summary: 'Uploads a measured response (multipart/form-data) into the Library of a workspace where the caller is an editor or owner.',
    notes: [
      'A text file is refused with 400 (each issue names "line N, column M"): a non-numeric cell or a line of text below the first number, a frequency that is not positive or not strictly increasing (duplicates included), fewer than 8 points, phase outside ±3600°, magnitude outside ±300 dB, binary content. At most 50 issues are listed; error.totalIssues counts them all.',
      'A WAV file is refused with 400 naming the field (file, windowStartMs or windowLengthMs) and the part of the file: a header that is truncated or whose sizes are false, a format or bit depth other than those accepted (8-bit, µ-law, ADPCM…), 0 channels, a sample rate outside 8–192 kHz, more than 10 s, a float sample that is NaN or infinite, clipping (more than one sample of the first channel at full scale — the largest or smallest integer code, or ±1.0 in float; one alone is a peak normalised to full scale and is kept: record again with the level turned down), silence (no sample reaches one step of a 16-bit file, −90.3 dBFS), a window that starts outside the file or after the peak, ends before the peak or runs past the end.',
      'Every check runs before the measurement is written in one INSERT: a refused file stores nothing. A text field the form does not know is a 400.',
      '413 over 2 MB of text or 16 MB of WAV (the server stops reading a body at 16 MB and 64 kB); 415 when the body is not multipart/form-data or the file is declared as a type that is neither text nor WAV (an image, a PDF, an MP3, an archive).',
      ACCESS_NOTE,
    ],
    access: 'member',
    body: { schema: measurementUploadFormSchema, contentType: 'multipart/form-data', limitBytes: UPLOAD_LIMIT_BYTES },
    answers: [{ status: 201, description: 'The stored measurement and how the file was read.', schema: uploadAnswerSchema }],
    errors: WRITE_ERRORS,
    examples: [
      {
        title: 'Upload a mains measurement taken at the MLP',
        body: { file: 'seat-1-mains.csv', name: 'Seat 1 mains (invented)', systemId: SYSTEM, seat: MLP, role: 'mains' },
        status: 201,
        responseExcerpt: { id: ID, name: 'Seat 1 mains (invented)', pointCount: 240, startHz: 20, stopHz: 19027, hasPhase: true, sourceFormat: 'text', skippedLines: 3, firstDataLine: 4 },
      },
      {
        title: 'Upload an impulse response of a sub (48 kHz, 24-bit WAV) with the default window',
        body: { file: 'row-1-sub.wav', systemId: SYSTEM, seat: MLP, role: 'sub', runLabel: 'after moving the sub' },
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
        body: { file: 'clipped.wav' },
        status: 400,
        responseExcerpt: {
          error: {
            code: 'invalid',
            message: 'The WAV file was refused: 12 samples of the first channel sit at full scale: the recording clipped. Turn the level down and measure again (a peak a few dB below full scale is enough); a file normalised to full scale may touch it with one sample only.',
            issues: [{ path: 'file', message: '12 samples of the first channel sit at full scale: the recording clipped. …' }],
          },
        },
      },
      {
        title: 'A refused file: every line error named (nothing is stored)',
        body: { file: 'broken.csv' },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', message: 'The file was refused: line 7, column 2: magnitude: "oops" is not a number (and 1 more).', issues: [{ path: 'line 7, column 2', message: 'magnitude: "oops" is not a number' }], totalIssues: 2 } },
      },
    ],
  },
  {
    id: 'measurements-list',
    method: 'GET',
    path: '/api/v1/measurements',
    tag: 'Measurements',
    summary: 'The measurements of the caller’s workspaces, newest first (without their points), filtered by workspace, System, seat and role.',
    notes: ['A workspaceId the caller does not belong to lists nothing.'],
    access: 'member',
    query: measurementListQuerySchema,
    answers: [{ status: 200, description: 'The measurements (at most 500).', schema: measurementListAnswerSchema }],
    errors: QUERY_READ_ERRORS,
    examples: [
      { title: 'One workspace', query: `?workspaceId=${EXAMPLE.workspace}`, status: 200, responseExcerpt: { items: [{ id: ID, name: 'Row 1 centre (MLP): L mains (invented)', role: 'mains', pointCount: 240, hasPhase: true }] } },
      { title: 'The mains at one seat of one System', query: `?systemId=${SYSTEM}&seat=Row%201%20centre%20(MLP)&role=mains`, status: 200, responseExcerpt: { items: [{ id: ID, seat: MLP, role: 'mains' }] } },
    ],
  },
  {
    id: 'measurements-get',
    method: 'GET',
    path: '/api/v1/measurements/{id}',
    tag: 'Measurements',
    summary: 'One measurement with every point exactly as stored.',
    notes: [ACCESS_NOTE],
    access: 'member',
    pathParams: measurementParams,
    answers: [{ status: 200, description: 'The measurement with its points.', schema: measurementAnswerSchema }],
    errors: READ_ERRORS,
    examples: [{ title: 'Read back a stored measurement', pathParams: { id: ID }, status: 200, responseExcerpt: { id: ID, pointCount: 240, frequencyHz: [20], magnitudeDb: [84.1], phaseDeg: [12.5] } }],
  },
  {
    id: 'measurements-update',
    method: 'PATCH',
    path: '/api/v1/measurements/{id}',
    tag: 'Measurements',
    summary: 'Renames or relabels a measurement (editors and owners of its workspace); its points never change.',
    notes: ['Send at least one field; any other field is a 400. Text is trimmed.', ACCESS_NOTE],
    access: 'member',
    pathParams: measurementParams,
    body: { schema: measurementLabelsSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [{ status: 200, description: 'The measurement (without its points) with its new labels.', schema: measurementSummaryAnswerSchema }],
    errors: WRITE_ERRORS,
    examples: [
      { title: 'Label a run', pathParams: { id: ID }, body: { runLabel: 'near-wall switch on' }, status: 200, responseExcerpt: { id: ID, runLabel: 'near-wall switch on' } },
      { title: 'Clear the label and move it to another seat', pathParams: { id: ID }, body: { runLabel: null, seat: 'Row 1 left' }, status: 200, responseExcerpt: { id: ID, runLabel: null, seat: 'Row 1 left' } },
    ],
  },
  {
    id: 'measurements-delete',
    method: 'DELETE',
    path: '/api/v1/measurements/{id}',
    tag: 'Measurements',
    summary: 'Deletes a measurement (editors and owners of its workspace).',
    notes: [ACCESS_NOTE],
    access: 'member',
    pathParams: measurementParams,
    answers: [{ status: 200, description: 'Deleted.', schema: deletedAnswerSchema }],
    errors: BODILESS_WRITE_ERRORS,
    examples: [{ title: 'Delete', pathParams: { id: ID }, status: 200, responseExcerpt: { id: ID, deleted: true } }],
  },
];
