/**
 * The RIFF/WAVE container (Microsoft/IBM, "Multimedia Programming Interface and Data Specifications 1.0", 1991;
 * WAVE_FORMAT_EXTENSIBLE from Microsoft's "Multiple channel audio data and WAVE files", 2001): the 12-byte RIFF
 * header, the walk over the chunks (little-endian sizes, a pad byte after an odd-sized chunk) and the fmt chunk.
 * Every size is checked against the bytes actually present before it is used.
 */

/** Refusal of a WAV file; a RangeError, so `route()` answers it with a 400. `where` names the part of the file. */
export class WavReadError extends RangeError {
  override readonly name = 'WavReadError';
  constructor(
    readonly where: string,
    readonly detail: string,
  ) {
    super(`The WAV file was refused: ${where}: ${detail}.`);
  }
}

export const MIN_WAV_SAMPLE_RATE_HZ = 8_000;
export const MAX_WAV_SAMPLE_RATE_HZ = 192_000;

export const SUPPORTED_WAV_ENCODINGS = '16-, 24- or 32-bit integer PCM or 32-bit float';

const RIFF_HEADER_BYTES = 12;
const CHUNK_HEADER_BYTES = 8;
const FMT_MIN_BYTES = 16;
const FMT_EXTENSIBLE_MIN_BYTES = 40;
const FORMAT_PCM = 0x0001;
const FORMAT_FLOAT = 0x0003;
const FORMAT_EXTENSIBLE = 0xfffe;
/** Bytes 2–15 of KSDATAFORMAT_SUBTYPE_PCM / _IEEE_FLOAT; bytes 0–1 hold the format tag (Microsoft, 2001). */
const SUBFORMAT_GUID_TAIL = [0x00, 0x00, 0x00, 0x00, 0x10, 0x00, 0x80, 0x00, 0x00, 0xaa, 0x00, 0x38, 0x9b, 0x71];

const FORMAT_NAMES: Record<number, string> = {
  0x0002: 'ADPCM',
  0x0006: 'A-law',
  0x0007: 'µ-law',
  0x0011: 'IMA ADPCM',
  0x0055: 'MPEG layer 3',
};

export interface WavFormat {
  encoding: 'pcm' | 'float';
  channels: number;
  sampleRateHz: number;
  /** The container size of one sample (a 24-bit value in a 32-bit container is 32). */
  bitsPerSample: number;
  /** Bytes of one frame (one sample of every channel). */
  frameBytes: number;
}

/** Where the data chunk's samples lie in the file. */
export interface WavDataSpan {
  offset: number;
  bytes: number;
}

const hex4 = (n: number) => `0x${n.toString(16).padStart(4, '0')}`;

/** A chunk id as text, with bytes that are not printable ASCII written as \xNN (a corrupt id stays readable). */
function chunkId(view: DataView, offset: number): string {
  let id = '';
  for (let i = 0; i < 4; i++) {
    const b = view.getUint8(offset + i);
    id += b >= 0x20 && b < 0x7f ? String.fromCharCode(b) : `\\x${b.toString(16).padStart(2, '0')}`;
  }
  return id;
}

/** Checks the RIFF header and returns the end of the RIFF body within the file. */
function riffBodyEnd(view: DataView): number {
  const length = view.byteLength;
  if (length < RIFF_HEADER_BYTES) {
    throw new WavReadError('RIFF header', `the file is ${length} byte${length === 1 ? '' : 's'}; a WAV file begins with a 12-byte RIFF header`);
  }
  const riff = chunkId(view, 0);
  if (riff !== 'RIFF') {
    const known = riff === 'RIFX' ? ' (big-endian RIFX is not supported)' : riff === 'RF64' ? ' (RF64 is not supported)' : '';
    throw new WavReadError('RIFF header', `the file begins with "${riff}", not "RIFF"${known}; send a RIFF/WAVE file`);
  }
  const form = chunkId(view, 8);
  if (form !== 'WAVE') throw new WavReadError('RIFF header', `the RIFF form is "${form}", not "WAVE"; send a WAV file`);
  const claimed = view.getUint32(4, true);
  if (claimed < 4) throw new WavReadError('RIFF header', `the RIFF size is ${claimed} bytes, too small to hold the "WAVE" form`);
  // The RIFF size counts from byte 8; a writer may leave out the pad byte of a last odd-sized chunk.
  const end = 8 + claimed;
  if (end > length + 1) {
    throw new WavReadError('RIFF header', `the RIFF size says ${end} bytes but the file has ${length}; the file is truncated or its size is false`);
  }
  return Math.min(end, length);
}

function readFmt(view: DataView, offset: number, size: number): WavFormat {
  const where = 'fmt chunk';
  if (size < FMT_MIN_BYTES) throw new WavReadError(where, `it is ${size} bytes; it needs at least ${FMT_MIN_BYTES}`);
  const tag = view.getUint16(offset, true);
  const channels = view.getUint16(offset + 2, true);
  const sampleRateHz = view.getUint32(offset + 4, true);
  const blockAlign = view.getUint16(offset + 12, true);
  const bitsPerSample = view.getUint16(offset + 14, true);
  let formatTag = tag;
  if (tag === FORMAT_EXTENSIBLE) {
    if (size < FMT_EXTENSIBLE_MIN_BYTES) {
      throw new WavReadError(where, `WAVE_FORMAT_EXTENSIBLE needs ${FMT_EXTENSIBLE_MIN_BYTES} bytes of fmt chunk; this one has ${size}`);
    }
    const guid = offset + 24;
    formatTag = view.getUint16(guid, true);
    const tailKnown = SUBFORMAT_GUID_TAIL.every((b, i) => view.getUint8(guid + 2 + i) === b);
    if (!tailKnown || (formatTag !== FORMAT_PCM && formatTag !== FORMAT_FLOAT)) {
      throw new WavReadError(where, `the extensible sub-format is neither PCM nor IEEE float; send ${SUPPORTED_WAV_ENCODINGS}`);
    }
  }
  if (formatTag !== FORMAT_PCM && formatTag !== FORMAT_FLOAT) {
    const name = FORMAT_NAMES[formatTag];
    throw new WavReadError(where, `format tag ${hex4(formatTag)}${name ? ` (${name})` : ''} is not supported; send ${SUPPORTED_WAV_ENCODINGS}`);
  }
  const encoding = formatTag === FORMAT_FLOAT ? 'float' : 'pcm';
  const depthOk = encoding === 'float' ? bitsPerSample === 32 : bitsPerSample === 16 || bitsPerSample === 24 || bitsPerSample === 32;
  if (!depthOk) {
    const what = encoding === 'float' ? `${bitsPerSample}-bit float` : `${bitsPerSample}-bit integer PCM`;
    throw new WavReadError(where, `${what} is not supported; send ${SUPPORTED_WAV_ENCODINGS}`);
  }
  if (channels === 0) throw new WavReadError(where, 'it declares 0 channels; a WAV file needs at least one');
  if (sampleRateHz < MIN_WAV_SAMPLE_RATE_HZ || sampleRateHz > MAX_WAV_SAMPLE_RATE_HZ) {
    throw new WavReadError(where, `the sample rate ${sampleRateHz} Hz is outside ${MIN_WAV_SAMPLE_RATE_HZ / 1000}–${MAX_WAV_SAMPLE_RATE_HZ / 1000} kHz`);
  }
  const frameBytes = channels * (bitsPerSample / 8);
  if (blockAlign !== frameBytes) {
    throw new WavReadError(where, `the block align is ${blockAlign} bytes but ${channels} channel${channels === 1 ? '' : 's'} of ${bitsPerSample} bits make ${frameBytes}`);
  }
  return { encoding, channels, sampleRateHz, bitsPerSample, frameBytes };
}

/**
 * Walks the chunks of a RIFF/WAVE file and returns its format and where its samples are. Unknown chunks (LIST,
 * cue, bext…) are skipped; the first fmt and the first data chunk are taken. Throws {@link WavReadError}.
 */
export function readWavChunks(view: DataView): { format: WavFormat; data: WavDataSpan } {
  const end = riffBodyEnd(view);
  let format: WavFormat | null = null;
  let data: WavDataSpan | null = null;
  let offset = RIFF_HEADER_BYTES;
  while (offset + CHUNK_HEADER_BYTES <= end && !(format && data)) {
    const id = chunkId(view, offset);
    const size = view.getUint32(offset + 4, true);
    const body = offset + CHUNK_HEADER_BYTES;
    if (size > end - body) {
      throw new WavReadError(`"${id}" chunk at byte ${offset}`, `it claims ${size} bytes but only ${end - body} remain in the file; the file is truncated or the size is false`);
    }
    if (id === 'fmt ' && !format) format = readFmt(view, body, size);
    else if (id === 'data' && !data) data = { offset: body, bytes: size };
    // Each step moves at least 8 bytes forward, so the walk ends.
    offset = body + size + (size % 2);
  }
  if (!format) throw new WavReadError('fmt chunk', 'the file has no fmt chunk, so its format is unknown');
  if (!data) throw new WavReadError('data chunk', 'the file has no data chunk, so it holds no samples');
  return { format, data };
}
