import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { toAppError } from '@/lib/errors';
import { MAX_WAV_DURATION_S, MAX_WAV_SAMPLE_RATE_HZ, MIN_WAV_SAMPLE_RATE_HZ, readWav, SUPPORTED_WAV_ENCODINGS, WavReadError } from '@/lib/measurements/read-wav';
import { assertInDelta } from '../helpers/assert-in-delta';
import { BITS, chunk, chunkOffset, fmtBody, integerCode, oddListChunk, riff, sampleBytes, wavBytes, type WavSampleFormat } from '../helpers/wav-bytes';

const FORMATS: WavSampleFormat[] = ['int16', 'int24', 'int32', 'float32'];

/** A decaying 1 kHz sine, 0.9 at most: a stand-in for an impulse response (invented). */
function decayingSine(sampleRateHz: number, frames: number): Float64Array {
  return Float64Array.from({ length: frames }, (_, i) => 0.9 * Math.exp(-i / (0.005 * sampleRateHz)) * Math.sin((2 * Math.PI * 1000 * i) / sampleRateHz));
}

/** Largest reading error of a format: half an integer step 2^−(n−1) (round to nearest), or float32's own rounding. */
function quantisationDelta(format: WavSampleFormat): number {
  return format === 'float32' ? 6e-8 : 2 ** -(BITS[format] - 1) / 2 + 1e-15;
}

/** The error readWav throws, checked to be its own and to become a 400 through the API's error mapper. */
function refusal(bytes: Uint8Array): WavReadError {
  try {
    readWav(bytes);
  } catch (e) {
    expect(e).toBeInstanceOf(WavReadError);
    expect(toAppError(e).status).toBe(400);
    return e as WavReadError;
  }
  throw new Error('expected the file to be refused');
}

const mono = (format: WavSampleFormat, samples: ArrayLike<number>, sampleRateHz = 48_000, extra: Partial<Parameters<typeof wavBytes>[0]> = {}) =>
  wavBytes({ sampleRateHz, format, channels: [samples], ...extra });

function setU32(bytes: Uint8Array, offset: number, value: number): Uint8Array {
  const out = bytes.slice();
  new DataView(out.buffer).setUint32(offset, value, true);
  return out;
}

describe('readWav reads every supported encoding alike', () => {
  const signal = decayingSine(48_000, 2400);

  it.each(FORMATS)('%s mono: the decaying sine within its quantisation step, rate, duration and depth reported', (format) => {
    const wav = readWav(mono(format, signal));
    expect(wav.sampleRateHz).toBe(48_000);
    expect(wav.channels).toBe(1);
    expect(wav.bitsPerSample).toBe(BITS[format]);
    expect(wav.format).toBe(format === 'float32' ? 'float' : 'pcm');
    expect(wav.durationS).toBeCloseTo(2400 / 48_000, 12);
    expect(wav.clipped).toBe(false);
    assertInDelta(wav.samples, signal, quantisationDelta(format), format);
  });

  it.each(FORMATS)('%s stereo with an extensible header and an odd-sized LIST chunk: the first channel is taken', (format) => {
    const second = signal.map((x, i) => (i % 7 === 0 ? 0.5 : -x));
    const bytes = wavBytes({ sampleRateHz: 44_100, format, channels: [signal, second], extensible: true, extraChunks: [oddListChunk()] });
    expect(bytes.length % 2).toBe(0); // the pad byte is there
    const wav = readWav(bytes);
    expect(wav.channels).toBe(2);
    expect(wav.sampleRateHz).toBe(44_100);
    expect(wav.bitsPerSample).toBe(BITS[format]);
    expect(wav.format).toBe(format === 'float32' ? 'float' : 'pcm');
    assertInDelta(wav.samples, signal, quantisationDelta(format), format);
  });

  it('all four depths of one signal agree with each other within the coarsest step (16-bit)', () => {
    const reads = FORMATS.map((f) => readWav(mono(f, signal)).samples);
    for (const r of reads.slice(1)) assertInDelta(r, reads[0] as Float64Array, 2 ** -15);
  });

  it('a unit impulse at sample 100 reads as one non-zero sample of exactly 0.5 (a power of two, exact in every depth)', () => {
    const impulse = new Float64Array(1000);
    impulse[100] = 0.5;
    for (const format of FORMATS) {
      const wav = readWav(mono(format, impulse, 96_000));
      expect(wav.samples[100]).toBe(0.5);
      expect(wav.samples.filter((x) => x !== 0)).toHaveLength(1);
      expect(wav.durationS).toBeCloseTo(1000 / 96_000, 12);
    }
  });

  it('unknown chunks before fmt and after data are skipped; chunks may come in any order; a subarray is read at its offset', () => {
    const samples = sampleBytes([decayingSine(8_000, 80)], 'int16');
    const fmt = chunk('fmt ', fmtBody({ formatTag: 1, channels: 1, sampleRateHz: 8_000, bitsPerSample: 16 }));
    const bytes = riff([oddListChunk(), chunk('data', samples), chunk('junk', new Uint8Array(3)), fmt]);
    assertInDelta(readWav(bytes).samples, decayingSine(8_000, 80), quantisationDelta('int16'));
    const embedded = new Uint8Array(bytes.length + 5);
    embedded.set(bytes, 5);
    assertInDelta(readWav(embedded.subarray(5)).samples, decayingSine(8_000, 80), quantisationDelta('int16'));
  });

  it('a missing pad byte after a last odd-sized chunk is tolerated (some writers omit it)', () => {
    // Three 24-bit mono samples: a 9-byte data chunk, last in the file.
    const bytes = riff([chunk('fmt ', fmtBody({ formatTag: 1, channels: 1, sampleRateHz: 8_000, bitsPerSample: 24 })), chunk('data', sampleBytes([[0.25, -0.25, 0.5]], 'int24'))]);
    const trimmed = bytes.subarray(0, bytes.length - 1);
    expect(bytes[bytes.length - 1]).toBe(0); // the pad byte removed
    expect(readWav(trimmed).samples).toEqual(Float64Array.from([0.25, -0.25, 0.5]));
  });

  it('clipped: set by the largest or smallest integer code or a float at ±1, not by 0.9 (first channel only)', () => {
    for (const format of FORMATS) {
      expect(readWav(mono(format, [0.9, -0.9, 0.1])).clipped, format).toBe(false);
      expect(readWav(mono(format, [0.1, 1, 0.1])).clipped, format).toBe(true);
      expect(readWav(mono(format, [0.1, -1, 0.1])).clipped, format).toBe(true);
      expect(readWav(wavBytes({ sampleRateHz: 48_000, format, channels: [[0.1, 0.2], [1, -1]] })).clipped, format).toBe(false);
    }
  });

  it('the rate limits are inclusive: 8 kHz and 192 kHz are read; exactly 10 s is read', () => {
    expect(readWav(mono('int16', [0.5], MIN_WAV_SAMPLE_RATE_HZ)).sampleRateHz).toBe(8_000);
    expect(readWav(mono('int16', [0.5], MAX_WAV_SAMPLE_RATE_HZ)).sampleRateHz).toBe(192_000);
    const tenSeconds = new Float64Array(MAX_WAV_DURATION_S * 8_000);
    tenSeconds[0] = 0.5;
    expect(readWav(mono('int16', tenSeconds, 8_000)).durationS).toBe(10);
  });
});

describe('readWav refuses hostile or unsupported files, naming what is wrong', () => {
  const good = mono('int16', decayingSine(48_000, 480));
  const fmtOf = (f: Partial<Parameters<typeof fmtBody>[0]>) =>
    chunk('fmt ', fmtBody({ formatTag: 1, channels: 1, sampleRateHz: 48_000, bitsPerSample: 16, ...f }));
  const dataOf = (bytes = sampleBytes([decayingSine(48_000, 48)], 'int16')) => chunk('data', bytes);

  it('not RIFF/WAVE: text, RIFX, RF64, a RIFF of another form', () => {
    expect(refusal(new TextEncoder().encode('Hz,dB\n20,-3\n25,-2\n')).message).toMatch(/begins with "Hz,d", not "RIFF"/);
    expect(refusal(Uint8Array.from([...new TextEncoder().encode('RIFX'), ...good.subarray(4)])).message).toMatch(/big-endian RIFX is not supported/);
    expect(refusal(Uint8Array.from([...new TextEncoder().encode('RF64'), ...good.subarray(4)])).message).toMatch(/RF64 is not supported/);
    expect(refusal(Uint8Array.from([...good.subarray(0, 8), ...new TextEncoder().encode('AVI '), ...good.subarray(12)])).message).toMatch(/form is "AVI ", not "WAVE"/);
    expect(refusal(Uint8Array.from([0, 1, 2, 3, ...good.subarray(4)])).message).toMatch(/begins with "\\x00\\x01\\x02\\x03"/);
  });

  it('a truncated header: empty, under 12 bytes, cut inside the fmt chunk, cut inside the data', () => {
    expect(refusal(new Uint8Array(0)).message).toMatch(/the file is 0 bytes; a WAV file begins with a 12-byte RIFF header/);
    expect(refusal(good.subarray(0, 11)).message).toMatch(/11 bytes/);
    const cutInFmt = refusal(good.subarray(0, 30));
    expect(cutInFmt.where).toBe('RIFF header');
    expect(cutInFmt.message).toMatch(/the file is truncated or its size is false/);
    const headerFixed = setU32(good.subarray(0, 30), 4, 22); // RIFF size made true to the cut file
    expect(refusal(headerFixed).message).toMatch(/"fmt " chunk at byte 12.*claims 16 bytes but only 10 remain/);
    expect(refusal(setU32(good.subarray(0, 100), 4, 92)).message).toMatch(/"data" chunk at byte 36.*claims 960 bytes but only 56 remain/);
  });

  it('chunk sizes that lie: a LIST chunk, the data chunk, a RIFF size beyond the file', () => {
    const withList = wavBytes({ sampleRateHz: 48_000, format: 'int16', channels: [decayingSine(48_000, 48)], extraChunks: [oddListChunk()] });
    const list = chunkOffset(withList, 'LIST');
    expect(refusal(setU32(withList, list + 4, 1_000_000)).message).toMatch(/"LIST" chunk at byte 36.*claims 1000000 bytes/);
    const data = chunkOffset(good, 'data');
    expect(refusal(setU32(good, data + 4, 962)).message).toMatch(/"data" chunk.*claims 962 bytes but only 960 remain/);
    expect(refusal(setU32(good, 4, good.length - 8 + 2)).message).toMatch(/RIFF size says \d+ bytes but the file has \d+/);
  });

  it('a claimed length of 2 GB (RIFF or data size) is refused without allocating it', () => {
    expect(refusal(setU32(good, 4, 2 ** 31)).message).toMatch(/RIFF size says 2147483656 bytes but the file has 1004/);
    expect(refusal(setU32(good, 4, 2 ** 32 - 1)).where).toBe('RIFF header');
    expect(refusal(setU32(good, chunkOffset(good, 'data') + 4, 2 ** 31)).message).toMatch(/claims 2147483648 bytes but only 960 remain/);
  });

  it('no fmt chunk, no data chunk, an fmt chunk too short', () => {
    expect(refusal(riff([dataOf()])).message).toMatch(/fmt chunk: the file has no fmt chunk/);
    expect(refusal(riff([fmtOf({}), oddListChunk()])).message).toMatch(/data chunk: the file has no data chunk/);
    expect(refusal(riff([])).message).toMatch(/no fmt chunk/);
    const short = refusal(riff([chunk('fmt ', fmtBody({ formatTag: 1, channels: 1, sampleRateHz: 48_000, bitsPerSample: 16 }).subarray(0, 14)), dataOf()]));
    expect(short.where).toBe('fmt chunk');
    expect(short.detail).toBe('it is 14 bytes; it needs at least 16');
    expect(short.message).toBe('The WAV file was refused: fmt chunk: it is 14 bytes; it needs at least 16.');
  });

  it('0 channels, and a block align that disagrees with channels × depth', () => {
    expect(refusal(riff([fmtOf({ channels: 0 }), dataOf()])).message).toMatch(/declares 0 channels/);
    expect(refusal(riff([fmtOf({ blockAlign: 4 }), dataOf()])).message).toMatch(/block align is 4 bytes but 1 channel of 16 bits make 2/);
  });

  it('unsupported encodings say what is supported', () => {
    expect(SUPPORTED_WAV_ENCODINGS).toBe('16-, 24- or 32-bit integer PCM or 32-bit float');
    const supported = /send 16-, 24- or 32-bit integer PCM or 32-bit float/;
    const cases: [Partial<Parameters<typeof fmtBody>[0]>, RegExp][] = [
      [{ bitsPerSample: 8 }, /8-bit integer PCM is not supported/],
      [{ bitsPerSample: 12, blockAlign: 2 }, /12-bit integer PCM is not supported/],
      [{ formatTag: 3, bitsPerSample: 64 }, /64-bit float is not supported/],
      [{ formatTag: 3, bitsPerSample: 16 }, /16-bit float is not supported/],
      [{ formatTag: 2 }, /format tag 0x0002 \(ADPCM\) is not supported/],
      [{ formatTag: 0x55 }, /format tag 0x0055 \(MPEG layer 3\) is not supported/],
      [{ formatTag: 0x1234 }, /format tag 0x1234 is not supported/],
      [{ extensibleSubFormat: 2 }, /extensible sub-format is neither PCM nor IEEE float/],
      [{ extensibleSubFormat: 3, bitsPerSample: 64 }, /64-bit float is not supported/],
    ];
    for (const [fields, message] of cases) {
      const e = refusal(riff([fmtOf(fields), dataOf()]));
      expect(e.message).toMatch(message);
      expect(e.message).toMatch(supported);
      expect(e.where).toBe('fmt chunk');
    }
    // An extensible header whose GUID tail is not the KSDATAFORMAT one (a foreign sub-format with tag 1).
    const foreign = fmtBody({ formatTag: 1, channels: 1, sampleRateHz: 48_000, bitsPerSample: 16, extensibleSubFormat: 1 });
    foreign[39] = 0x72;
    expect(refusal(riff([chunk('fmt ', foreign), dataOf()])).message).toMatch(/neither PCM nor IEEE float/);
    // An extensible tag with only a plain 16-byte body.
    const short = fmtBody({ formatTag: 0xfffe, channels: 1, sampleRateHz: 48_000, bitsPerSample: 16 });
    expect(refusal(riff([chunk('fmt ', short), dataOf()])).message).toMatch(/WAVE_FORMAT_EXTENSIBLE needs 40 bytes/);
  });

  it('sample rates outside 8–192 kHz, absurd ones included', () => {
    for (const rate of [0, 1, 7_999, 192_001, 2 ** 32 - 1]) {
      expect(refusal(riff([fmtOf({ sampleRateHz: rate }), dataOf()])).message).toMatch(new RegExp(`sample rate ${rate} Hz is outside 8–192 kHz`));
    }
  });

  it('more than 10 s, a data chunk that is not whole frames, an empty data chunk', () => {
    const long = new Float64Array(MAX_WAV_DURATION_S * 8_000 + 1);
    long[0] = 0.5;
    expect(refusal(mono('int16', long, 8_000)).message).toMatch(/the recording is 10.0001 s long; an impulse response may be at most 10 s/);
    expect(refusal(mono('float32', new Float64Array(48_000 * 11).fill(0.1))).message).toMatch(/11 s long/);
    const stereo = riff([fmtOf({ channels: 2 }), chunk('data', new Uint8Array(4 * 10 + 2).fill(1))]);
    expect(refusal(stereo).message).toMatch(/its 42 bytes are not a whole number of 4-byte frames \(2 × 16 bits\)/);
    expect(refusal(riff([fmtOf({}), chunk('data', new Uint8Array(0))])).message).toMatch(/data chunk: it holds no samples/);
  });

  it('NaN or infinite floats name the sample and its time', () => {
    for (const [bad, shown] of [[Number.NaN, 'NaN'], [Infinity, 'Infinity'], [-Infinity, '-Infinity']] as const) {
      const samples = Array.from({ length: 96 }, (_, i) => (i === 48 ? bad : 0.1));
      const e = refusal(mono('float32', samples));
      expect(e.where).toBe('data chunk, sample 49');
      expect(e.message).toContain(`the value is ${shown} (at 0.001 s)`);
    }
  });

  it('silence: all zeros, or a first channel of zeros beside a signal', () => {
    for (const format of FORMATS) expect(refusal(mono(format, new Float64Array(100))).message).toMatch(/the file holds only zeros \(silence\)/);
    const firstSilent = wavBytes({ sampleRateHz: 48_000, format: 'int24', channels: [new Float64Array(10), new Float64Array(10).fill(0.3)] });
    expect(refusal(firstSilent).message).toMatch(/the first channel holds only zeros/);
    // Below half a 16-bit step a sample rounds to zero: silence as written (the writer's rounding, common practice).
    expect(refusal(mono('int16', new Float64Array(10).fill(2 ** -17))).message).toMatch(/silence/);
  });
});

describe('readWav properties (fast-check)', () => {
  const params = fc.record({
    format: fc.constantFrom<WavSampleFormat>(...FORMATS),
    sampleRateHz: fc.integer({ min: MIN_WAV_SAMPLE_RATE_HZ, max: MAX_WAV_SAMPLE_RATE_HZ }),
    channelCount: fc.integer({ min: 1, max: 4 }),
    frames: fc.integer({ min: 1, max: 300 }),
    extensible: fc.boolean(),
    withList: fc.boolean(),
    seed: fc.integer({ min: 1, max: 2 ** 30 }),
    fullScaleAt: fc.option(fc.nat(), { nil: null }),
  });

  /** Deterministic samples in [−1, 1] from a seed (Park and Miller, "Random number generators: good ones are hard to find", 1988); sample 0 is never 0. */
  function channelsFor(p: { channelCount: number; frames: number; seed: number; fullScaleAt: number | null }): Float64Array[] {
    let s = p.seed;
    const next = () => (s = (s * 16807) % 2147483647) / 2 ** 30 - 1;
    const out = Array.from({ length: p.channelCount }, () => Float64Array.from({ length: p.frames }, () => 0.99 * next()));
    (out[0] as Float64Array)[0] = 0.25;
    if (p.fullScaleAt !== null && p.frames > 1) (out[0] as Float64Array)[1 + (p.fullScaleAt % (p.frames - 1))] = p.seed % 2 ? 1 : -1;
    return out;
  }

  it('random valid files round-trip: format, rate, channels, first channel within its step, duration, clipping', () => {
    fc.assert(
      fc.property(params, (p) => {
        const channels = channelsFor(p);
        const bytes = wavBytes({ sampleRateHz: p.sampleRateHz, format: p.format, channels, extensible: p.extensible, ...(p.withList ? { extraChunks: [oddListChunk()] } : {}) });
        const wav = readWav(bytes);
        const first = channels[0] as Float64Array;
        expect(wav.sampleRateHz).toBe(p.sampleRateHz);
        expect(wav.channels).toBe(p.channelCount);
        expect(wav.bitsPerSample).toBe(BITS[p.format]);
        expect(wav.format).toBe(p.format === 'float32' ? 'float' : 'pcm');
        expect(wav.durationS).toBeCloseTo(p.frames / p.sampleRateHz, 12);
        const bits = BITS[p.format];
        // +1 is written as the largest code, 1 − 2^−(n−1) (the writer clamps).
        const written = p.format === 'float32' ? first : first.map((x) => Math.min(x, 1 - 2 ** -(bits - 1)));
        assertInDelta(wav.samples, written, quantisationDelta(p.format));
        const atFullScale = p.format === 'float32'
          ? first.some((x) => Math.abs(x) >= 1)
          : first.some((x) => integerCode(x, bits) === -(2 ** (bits - 1)) || integerCode(x, bits) === 2 ** (bits - 1) - 1);
        expect(wav.clipped).toBe(atFullScale);
      }),
      { numRuns: 300 },
    );
  });

  const mutation = fc.oneof(
    fc.record({ kind: fc.constant('byte' as const), at: fc.nat(), value: fc.integer({ min: 0, max: 255 }) }),
    fc.record({ kind: fc.constant('u32' as const), at: fc.nat(), value: fc.oneof(fc.integer({ min: 0, max: 4096 }), fc.constant(2 ** 31), fc.constant(2 ** 32 - 1), fc.nat()) }),
    fc.record({ kind: fc.constant('cut' as const), at: fc.nat(), value: fc.constant(0) }),
  );

  it('random corruption never throws anything but WavReadError, and what is read is sane', () => {
    fc.assert(
      fc.property(params, fc.array(mutation, { minLength: 1, maxLength: 6 }), (p, mutations) => {
        let bytes = wavBytes({ sampleRateHz: p.sampleRateHz, format: p.format, channels: channelsFor(p), extensible: p.extensible, ...(p.withList ? { extraChunks: [oddListChunk()] } : {}) });
        for (const m of mutations) {
          if (bytes.length === 0) break;
          const at = m.at % bytes.length;
          if (m.kind === 'cut') bytes = bytes.subarray(0, at);
          else if (m.kind === 'byte') bytes[at] = m.value;
          else if (at + 4 <= bytes.length) new DataView(bytes.buffer, bytes.byteOffset).setUint32(at, m.value, true);
        }
        try {
          const wav = readWav(bytes);
          expect(wav.samples.length).toBeGreaterThan(0);
          expect(wav.samples.length * wav.channels * (wav.bitsPerSample / 8)).toBeLessThanOrEqual(bytes.length);
          expect(wav.samples.every(Number.isFinite)).toBe(true);
          expect(wav.durationS).toBeLessThanOrEqual(MAX_WAV_DURATION_S);
        } catch (e) {
          if (!(e instanceof WavReadError)) throw new Error(`not the reader's own error: ${String(e)}`);
        }
      }),
      { numRuns: 1500 },
    );
  });
});
