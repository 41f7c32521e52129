/**
 * Writes WAV bytes for tests, independently of the reader: RIFF/WAVE as laid down in Microsoft/IBM, "Multimedia
 * Programming Interface and Data Specifications 1.0" (1991), and WAVE_FORMAT_EXTENSIBLE (Microsoft, "Multiple
 * channel audio data and WAVE files", 2001). Integer samples are round(x · 2^(n−1)) clamped to the n-bit range.
 */

export type WavSampleFormat = 'int16' | 'int24' | 'int32' | 'float32';

export const BITS: Record<WavSampleFormat, number> = { int16: 16, int24: 24, int32: 32, float32: 32 };

const ascii = (s: string) => Uint8Array.from(s, (c) => c.charCodeAt(0));

function concat(parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let at = 0;
  for (const p of parts) {
    out.set(p, at);
    at += p.length;
  }
  return out;
}

/** One chunk: id, little-endian size (the body's true length unless `sizeBytes` says otherwise), body, pad byte when odd. */
export function chunk(id: string, body: Uint8Array, sizeBytes = body.length): Uint8Array {
  const head = new Uint8Array(8);
  head.set(ascii(id.padEnd(4, ' ').slice(0, 4)));
  new DataView(head.buffer).setUint32(4, sizeBytes, true);
  return concat([head, body, new Uint8Array(body.length % 2)]);
}

/** "RIFF", size (file length − 8 unless given), "WAVE", then the chunks in order. */
export function riff(chunks: Uint8Array[], riffSizeBytes?: number): Uint8Array {
  const body = concat([ascii('WAVE'), ...chunks]);
  const head = new Uint8Array(8);
  head.set(ascii('RIFF'));
  new DataView(head.buffer).setUint32(4, riffSizeBytes ?? body.length, true);
  return concat([head, body]);
}

export interface FmtFields {
  formatTag: number;
  channels: number;
  sampleRateHz: number;
  bitsPerSample: number;
  blockAlign?: number;
  /** Write a 40-byte WAVE_FORMAT_EXTENSIBLE body (formatTag 0xFFFE) with this sub-format tag in the GUID. */
  extensibleSubFormat?: number;
}

/** The body of a fmt chunk (16 bytes, or 40 for WAVE_FORMAT_EXTENSIBLE). */
export function fmtBody(f: FmtFields): Uint8Array {
  const extensible = f.extensibleSubFormat !== undefined;
  const out = new Uint8Array(extensible ? 40 : 16);
  const v = new DataView(out.buffer);
  const blockAlign = f.blockAlign ?? (f.channels * f.bitsPerSample) / 8;
  v.setUint16(0, extensible ? 0xfffe : f.formatTag, true);
  v.setUint16(2, f.channels, true);
  v.setUint32(4, f.sampleRateHz, true);
  v.setUint32(8, f.sampleRateHz * blockAlign, true);
  v.setUint16(12, blockAlign, true);
  v.setUint16(14, f.bitsPerSample, true);
  if (extensible) {
    v.setUint16(16, 22, true); // cbSize
    v.setUint16(18, f.bitsPerSample, true); // valid bits
    v.setUint32(20, f.channels === 1 ? 0x4 : 0x3, true); // channel mask: centre, or left + right
    // KSDATAFORMAT_SUBTYPE_*: {0000xxxx-0000-0010-8000-00aa00389b71}
    const sub = f.extensibleSubFormat as number;
    out.set([sub & 0xff, (sub >> 8) & 0xff, 0, 0, 0, 0, 0x10, 0, 0x80, 0, 0, 0xaa, 0, 0x38, 0x9b, 0x71], 24);
  }
  return out;
}

/** The n-bit integer code a writer stores for x (round half away from zero, clamped). */
export function integerCode(x: number, bits: number): number {
  const full = 2 ** (bits - 1);
  return Math.max(-full, Math.min(full - 1, Math.round(x * full)));
}

/** Interleaved little-endian samples of every channel. */
export function sampleBytes(channels: ArrayLike<number>[], format: WavSampleFormat): Uint8Array {
  const frames = channels[0]?.length ?? 0;
  const width = BITS[format] / 8;
  const out = new Uint8Array(frames * channels.length * width);
  const v = new DataView(out.buffer);
  let at = 0;
  for (let i = 0; i < frames; i++) {
    for (const ch of channels) {
      const x = ch[i] as number;
      if (format === 'float32') v.setFloat32(at, x, true);
      else if (format === 'int16') v.setInt16(at, integerCode(x, 16), true);
      else if (format === 'int32') v.setInt32(at, integerCode(x, 32), true);
      else {
        const c = integerCode(x, 24) & 0xffffff;
        out.set([c & 0xff, (c >> 8) & 0xff, (c >> 16) & 0xff], at);
      }
      at += width;
    }
  }
  return out;
}

export interface WavSpec {
  sampleRateHz: number;
  format: WavSampleFormat;
  /** One array per channel, all the same length. */
  channels: ArrayLike<number>[];
  extensible?: boolean;
  /** Chunks written between fmt and data (e.g. a LIST chunk of odd size). */
  extraChunks?: Uint8Array[];
}

/** A complete WAV file. */
export function wavBytes(spec: WavSpec): Uint8Array {
  const tag = spec.format === 'float32' ? 3 : 1;
  const fmt = fmtBody({
    formatTag: tag,
    channels: spec.channels.length,
    sampleRateHz: spec.sampleRateHz,
    bitsPerSample: BITS[spec.format],
    ...(spec.extensible ? { extensibleSubFormat: tag } : {}),
  });
  return riff([chunk('fmt ', fmt), ...(spec.extraChunks ?? []), chunk('data', sampleBytes(spec.channels, spec.format))]);
}

/** A LIST/INFO chunk with an odd-sized body (so a pad byte follows it). */
export function oddListChunk(): Uint8Array {
  const text = ascii('INFOICMT\x07\x00\x00\x00invent\x00'); // an invented comment, 7 bytes with its NUL
  return chunk('LIST', text);
}

/** Byte offset of the first chunk with this id (its header), found by walking the chunks; −1 when absent. */
export function chunkOffset(bytes: Uint8Array, id: string): number {
  const v = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  let at = 12;
  while (at + 8 <= bytes.length) {
    if (String.fromCharCode(...bytes.subarray(at, at + 4)) === id) return at;
    const size = v.getUint32(at + 4, true);
    at += 8 + size + (size % 2);
  }
  return -1;
}
