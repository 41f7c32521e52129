import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Client } from '../helpers/http';
import { chunk, chunkOffset, fmtBody, riff, sampleBytes, wavBytes } from '../helpers/wav-bytes';
import { freshCaller, measurementCount, uploadForm } from '../helpers/wav-upload';

/**
 * Hostile WAV files (issue 17) sent to POST /api/v1/measurements: each is answered 400, 413 or 415 with a message naming
 * the problem (and the field: `file`, `windowStartMs`, `windowLengthMs`), the caller's measurements stay as they were,
 * and the server answers a good upload normally afterwards. The files are written by tests/helpers/wav-bytes.ts
 * (RIFF/WAVE: Microsoft/IBM, "Multimedia Programming Interface and Data Specifications 1.0", 1991, published).
 */

const FS_HZ = 48_000;

/** An invented impulse: 1 s at 48 kHz, silent but for a short click whose peak (0.5) is at 10 ms. */
function click(): Float64Array {
  const x = new Float64Array(FS_HZ);
  x[480] = 0.5;
  x[481] = -0.25;
  x[482] = 0.1;
  return x;
}

const good = (format: 'int16' | 'float32' = 'int16') => wavBytes({ sampleRateHz: FS_HZ, format, channels: [click()] });

/** A copy of the bytes with a little-endian number written at `offset`. */
function patched(bytes: Uint8Array, offset: number, value: number, width: 2 | 4 = 4): Uint8Array {
  const out = bytes.slice();
  const v = new DataView(out.buffer);
  if (width === 2) v.setUint16(offset, value, true);
  else v.setUint32(offset, value, true);
  return out;
}

/** A mono 16-bit file whose fmt chunk says this sample rate (and a byte rate to match). */
const withRate = (rateHz: number) => riff([chunk('fmt ', fmtBody({ formatTag: 1, channels: 1, sampleRateHz: rateHz, bitsPerSample: 16 })), chunk('data', sampleBytes([click()], 'int16'))]);

interface Refusal {
  label: string;
  bytes: () => Uint8Array;
  type?: string;
  fields?: Record<string, string>;
  status: 400 | 413 | 415;
  message: RegExp;
  path?: string;
}

const DATA = chunkOffset(good(), 'data');
const FMT = chunkOffset(good(), 'fmt ');

const REFUSALS: Refusal[] = [
  { label: 'truncated header (10 bytes)', bytes: () => good().slice(0, 10), status: 400, message: /the file is 10 bytes; a WAV file begins with a 12-byte RIFF header/, path: 'file' },
  { label: 'truncated inside the fmt chunk', bytes: () => good().slice(0, 30), status: 400, message: /RIFF size says \d+ bytes but the file has 30/, path: 'file' },
  { label: 'truncated inside the fmt chunk, RIFF size fixed to match', bytes: () => patched(good().slice(0, 30), 4, 22), status: 400, message: /"fmt " chunk at byte 12.*claims 16 bytes but only 10 remain/, path: 'file' },
  { label: 'lying data chunk size (1000 bytes more than present)', bytes: () => { const b = good(); return patched(b, DATA + 4, new DataView(b.buffer).getUint32(DATA + 4, true) + 1000); }, status: 400, message: /"data" chunk .*claims 97000 bytes but only 96000 remain/, path: 'file' },
  { label: 'lying fmt chunk size (10 bytes)', bytes: () => riff([chunk('fmt ', fmtBody({ formatTag: 1, channels: 1, sampleRateHz: FS_HZ, bitsPerSample: 16 }).slice(0, 10)), chunk('data', sampleBytes([click()], 'int16'))]), status: 400, message: /fmt chunk: it is 10 bytes; it needs at least 16/, path: 'file' },
  { label: '0 channels', bytes: () => patched(good(), FMT + 8 + 2, 0, 2), status: 400, message: /declares 0 channels/, path: 'file' },
  { label: 'sample rate 0 Hz', bytes: () => withRate(0), status: 400, message: /sample rate 0 Hz is outside 8–192 kHz/, path: 'file' },
  { label: 'sample rate 7999 Hz', bytes: () => withRate(7999), status: 400, message: /sample rate 7999 Hz is outside 8–192 kHz/, path: 'file' },
  { label: 'sample rate 4 GHz', bytes: () => withRate(4_000_000_000), status: 400, message: /sample rate 4000000000 Hz is outside/, path: 'file' },
  { label: '2 GB claimed in the RIFF header', bytes: () => patched(good(), 4, 0x7fff_fff0), status: 400, message: /RIFF size says 2147483640 bytes but the file has 96044/, path: 'file' },
  { label: '2 GB claimed by the data chunk', bytes: () => { const b = patched(good(), DATA + 4, 0x8000_0000); return b; }, status: 400, message: /"data" chunk .*claims 2147483648 bytes/, path: 'file' },
  { label: 'NaN float sample', bytes: () => { const x = click(); x[100] = Number.NaN; return wavBytes({ sampleRateHz: FS_HZ, format: 'float32', channels: [x] }); }, status: 400, message: /sample 101.*NaN.*must be finite/, path: 'file' },
  { label: 'infinite float sample', bytes: () => { const x = click(); x[7] = Number.POSITIVE_INFINITY; return wavBytes({ sampleRateHz: FS_HZ, format: 'float32', channels: [x] }); }, status: 400, message: /sample 8.*Infinity/, path: 'file' },
  { label: '8-bit PCM (bit depth)', bytes: () => riff([chunk('fmt ', fmtBody({ formatTag: 1, channels: 1, sampleRateHz: FS_HZ, bitsPerSample: 8 })), chunk('data', new Uint8Array(4800).fill(128))]), status: 400, message: /8-bit integer PCM is not supported; send 16-, 24- or 32-bit integer PCM or 32-bit float/, path: 'file' },
  { label: 'µ-law (format)', bytes: () => riff([chunk('fmt ', fmtBody({ formatTag: 7, channels: 1, sampleRateHz: 8000, bitsPerSample: 8 })), chunk('data', new Uint8Array(800))]), status: 400, message: /format tag 0x0007 \(µ-law\) is not supported/, path: 'file' },
  { label: '11 s long (length)', bytes: () => wavBytes({ sampleRateHz: 8000, format: 'int16', channels: [Float64Array.from({ length: 88_000 }, (_, i) => (i === 40 ? 0.5 : 0))] }), status: 400, message: /11 s long; an impulse response may be at most 10 s/, path: 'file' },
  { label: 'clipping (a run of samples at full scale)', bytes: () => { const x = click(); for (let i = 480; i < 488; i++) x[i] = 1; return wavBytes({ sampleRateHz: FS_HZ, format: 'int16', channels: [x] }); }, status: 400, message: /8 samples of the first channel sit at full scale: the recording clipped\. Turn the level down and measure again/, path: 'file' },
  { label: 'clipping (float beyond ±1)', bytes: () => { const x = click(); x[480] = 1.7; x[481] = -1.2; return wavBytes({ sampleRateHz: FS_HZ, format: 'float32', channels: [x] }); }, status: 400, message: /2 samples .* full scale: the recording clipped/, path: 'file' },
  { label: 'silence (only zeros)', bytes: () => wavBytes({ sampleRateHz: FS_HZ, format: 'int24', channels: [new Float64Array(4800)] }), status: 400, message: /only zeros \(silence\)/, path: 'file' },
  { label: 'silence (below one 16-bit step)', bytes: () => wavBytes({ sampleRateHz: FS_HZ, format: 'int24', channels: [click().map((x) => x * 2 ** -16)] }), status: 400, message: /loudest sample is −102\.4 dBFS, below one step of a 16-bit file.*the recording is silent/, path: 'file' },
  { label: 'text declared as audio/wav', bytes: () => new TextEncoder().encode('Frequency,Level\n20,1\n40,2\n'), status: 400, message: /begins with "Freq", not "RIFF"/, path: 'file' },
  { label: 'a WAV declared as image/png', bytes: () => good(), type: 'image/png', status: 415, message: /sent as image\/png; send a measured response as plain text or CSV .* or an impulse response as a WAV file/, path: 'file' },
  { label: 'windowStartMs beyond the recording', bytes: () => good(), fields: { windowStartMs: '5000' }, status: 400, message: /windowStartMs must lie within the recording, 0 to 999\.979 ms/, path: 'windowStartMs' },
  { label: 'windowStartMs after the peak', bytes: () => good(), fields: { windowStartMs: '50' }, status: 400, message: /windowStartMs must be at or before the arrival \(the peak at 9\.998 ms/, path: 'windowStartMs' },
  { label: 'windowLengthMs past the end', bytes: () => good(), fields: { windowStartMs: '0', windowLengthMs: '2000' }, status: 400, message: /windowLengthMs reaches past the end of the recording: at most 1000\.000 ms/, path: 'windowLengthMs' },
  { label: 'windowLengthMs ending before the peak', bytes: () => good(), fields: { windowStartMs: '0', windowLengthMs: '5' }, status: 400, message: /windowLengthMs must reach past the arrival/, path: 'windowLengthMs' },
  { label: 'windowLengthMs below 1 ms', bytes: () => good(), fields: { windowLengthMs: '0.5' }, status: 400, message: /windowLengthMs must be at least 1/, path: 'windowLengthMs' },
  { label: 'windowStartMs not a number', bytes: () => good(), fields: { windowStartMs: 'NaN' }, status: 400, message: /windowStartMs must be a number/, path: 'windowStartMs' },
  { label: 'window fields with a text file', bytes: () => new TextEncoder().encode(['Hz,dB', ...Array.from({ length: 10 }, (_, i) => `${20 * 2 ** i},0`)].join('\n')), type: 'text/csv', fields: { windowStartMs: '0' }, status: 400, message: /windowStartMs: applies to an impulse response \(a WAV file\) only/, path: 'windowStartMs' },
];

describe('hostile WAV files on POST /api/v1/measurements', () => {
  let client: Client;
  let userId: string;
  let before = 0;
  const made: string[] = [];

  beforeAll(async () => {
    ({ client, userId } = await freshCaller('hostile-wav'));
    before = await measurementCount(userId);
  });

  afterAll(async () => {
    for (const id of made) await client.delete(`/api/v1/measurements/${id}`);
  });

  for (const r of REFUSALS) {
    it(`${r.label}: ${r.status}${r.path ? ` naming ${r.path}` : ''}, nothing stored`, async () => {
      const res = await client.post('/api/v1/measurements', uploadForm(r.bytes(), r.fields, 'hostile.wav', r.type ?? 'audio/wav'));
      expect(res.status, res.text).toBe(r.status);
      expect(res.body.error.message).toMatch(r.message);
      if (r.path) expect(res.body.error.issues?.[0]?.path, res.text).toBe(r.path);
      expect(await measurementCount(userId)).toBe(before);
    });
  }

  it('a 20 MB body is refused with 413 naming the 16 MB limit', async () => {
    const big = new Uint8Array(20 * 1024 * 1024);
    big.set(good().slice(0, 44));
    let res;
    try {
      res = await client.post('/api/v1/measurements', uploadForm(big));
    } catch {
      // The server may close the connection once it has refused the body; a second try on a new connection must answer.
      res = await client.post('/api/v1/measurements', uploadForm(big));
    }
    expect(res.status, res.text).toBe(413);
    expect(res.body.error.message).toMatch(/larger than 16 MB\. An impulse response \(WAV\) may be at most 16 MB and a text file at most 2 MB/);
    expect(await measurementCount(userId)).toBe(before);
  });

  it('afterwards the server answers normally: a good WAV is stored (201), the list answers 200', async () => {
    const up = await client.post('/api/v1/measurements', uploadForm(good('float32'), { name: 'After the hostile files (invented)' }));
    expect(up.status, up.text).toBe(201);
    made.push(up.body.id);
    // The click's peak is sample 480 (10 ms) — its parabola through 0, 0.5, −0.25 leans toward the earlier side.
    expect(up.body.arrivalMs).toBeGreaterThan(10 - 1000 / FS_HZ);
    expect(up.body.arrivalMs).toBeLessThanOrEqual(10);
    expect(await measurementCount(userId)).toBe(before + 1);
    const list = await client.get('/api/v1/measurements');
    expect(list.status).toBe(200);
    expect(list.body.items.some((x: { id: string }) => x.id === up.body.id)).toBe(true);
  });
});
