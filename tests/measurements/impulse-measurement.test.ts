import { describe, expect, it } from 'vitest';
import { AppError } from '@/lib/errors';
import { impulseMeasurement, MIN_PEAK_FULL_SCALE, type ImpulseWindowFields } from '@/lib/measurements/impulse-measurement';
import { uploadFormat } from '@/lib/measurements/read-upload';
import { angleDiffDeg, assertInDelta } from '../helpers/assert-in-delta';
import { wavBytes, type WavSampleFormat } from '../helpers/wav-bytes';

/** A file of `frames` samples, zero but for the given ones. */
function file(rateHz: number, frames: number, at: Record<number, number>, format: WavSampleFormat = 'float32', channels = 1): Uint8Array {
  const x = new Float64Array(frames);
  for (const [i, v] of Object.entries(at)) x[Number(i)] = v;
  return wavBytes({ sampleRateHz: rateHz, format, channels: Array.from({ length: channels }, (_, c) => (c === 0 ? x : new Float64Array(frames).fill(0.1))) });
}

/** The AppError a refused upload throws. */
function refusal(bytes: Uint8Array, fields: ImpulseWindowFields = {}): AppError {
  try {
    impulseMeasurement(bytes, fields);
  } catch (e) {
    expect(e).toBeInstanceOf(AppError);
    return e as AppError;
  }
  throw new Error('expected the file to be refused');
}

describe('impulseMeasurement: what an impulse response (WAV) stores', () => {
  it('an impulse of 0.5 at sample 37 (8 kHz): −6.02 dB at every frequency, phase −360·f·37/fs (the DFT’s shift theorem; Oppenheim & Schafer, published), wrapped; grid 10 Hz … ≤ 0.45·fs', () => {
    const { points } = impulseMeasurement(file(8000, 800, { 37: 0.5 }), {});
    expect(points).toMatchObject({ sourceFormat: 'wav', sampleRateHz: 8000, hasPhase: true, startHz: 10 });
    expect(points.pointCount).toBe(points.frequencyHz.length);
    expect(points.stopHz).toBeLessThanOrEqual(0.45 * 8000);
    expect(points.stopHz * 2 ** (1 / 48)).toBeGreaterThan(0.45 * 8000);
    expect(points.arrivalMs).toBe((37 * 1000) / 8000); // the peak alone: no neighbours to refine it
    // hand-worked: 20·log10(0.5) = −6.0206 dB
    assertInDelta(points.magnitudeDb, points.frequencyHz.map(() => 20 * Math.log10(0.5)), 1e-4, 'magnitudeDb');
    points.frequencyHz.forEach((f, i) => {
      const p = points.phaseDeg[i] as number;
      expect(p > -180 && p <= 180, `${p} in (−180, 180]`).toBe(true);
      assertInDelta(angleDiffDeg(p, (-360 * f * 37) / 8000), 0, 1e-3, `phase at ${f} Hz`);
    });
  });

  it('an inverted impulse reads 180° once its delay is taken out (hand-worked: −x = x·e^(jπ))', () => {
    const { points } = impulseMeasurement(file(48_000, 4800, { 0: -0.25 }, 'int24'), {});
    points.phaseDeg.forEach((p) => assertInDelta(angleDiffDeg(p, 180), 0, 1e-3));
  });

  it('the default window follows its documented rule: 20 ms before the peak, 500 ms long, a 10 ms fade-in and a fade-out over the last 20 %', () => {
    const { points, details } = impulseMeasurement(file(48_000, 48_000, { 4800: 0.5 }), {});
    expect(points.impulseWindow).toEqual({ startMs: 80, lengthMs: 500, fadeInMs: 10, fadeOutMs: 100 });
    expect(details.window).toMatchObject({ startIsDefault: true, lengthIsDefault: true });
    expect(details).toMatchObject({ format: 'float', bitsPerSample: 32, channels: 1, durationS: 1, frequencyResolutionHz: 2 });
    assertInDelta(details.peakDbfs, -6.02, 0.005); // hand-worked: 20·log10(0.5)
  });

  it('a window given by the caller is used as given (and said to be given)', () => {
    const { points, details } = impulseMeasurement(file(48_000, 48_000, { 4800: 0.5 }), { windowStartMs: 50, windowLengthMs: 200 });
    expect(points.impulseWindow).toMatchObject({ startMs: 50, lengthMs: 200, fadeOutMs: 40 });
    expect(details.window).toMatchObject({ startIsDefault: false, lengthIsDefault: false });
  });

  it('reads the first channel of a stereo file', () => {
    const { points } = impulseMeasurement(file(48_000, 4800, { 10: 0.5 }, 'int16', 2), {});
    assertInDelta(points.arrivalMs, 10 / 48, 1e-6); // stored to 1e-6 ms
  });
});

describe('impulseMeasurement refusals: a 400 naming the field', () => {
  it('a file it cannot read: the WAV reader’s reason, naming file', () => {
    const e = refusal(new TextEncoder().encode('Frequency,Level\n20,1\n'));
    expect(e.status).toBe(400);
    expect(e.message).toMatch(/^The WAV file was refused: RIFF header: the file begins with "Freq", not "RIFF"/);
    expect(e.issues).toEqual([{ path: 'file', message: expect.stringMatching(/^RIFF header: /) }]);
  });

  for (const format of ['int16', 'int24', 'int32', 'float32'] as WavSampleFormat[]) {
    it(`${format}: one sample at full scale is a normalised peak (kept); two are clipping (refused: turn the level down)`, () => {
      expect(impulseMeasurement(file(48_000, 4800, { 100: 1, 101: 0.4 }, format), {}).points.arrivalMs).toBeGreaterThan(0);
      const e = refusal(file(48_000, 4800, { 100: 1, 101: -1 }, format));
      expect(e.status).toBe(400);
      expect(e.issues[0]).toEqual({ path: 'file', message: expect.stringContaining('2 samples of the first channel sit at full scale: the recording clipped. Turn the level down') });
    });
  }

  it('silence: a peak below one 16-bit step is refused; one step is kept', () => {
    expect(impulseMeasurement(file(48_000, 4800, { 100: MIN_PEAK_FULL_SCALE }, 'int16'), {}).points.pointCount).toBeGreaterThan(0);
    const e = refusal(file(48_000, 4800, { 100: MIN_PEAK_FULL_SCALE / 2 }, 'int24'));
    expect(e.issues[0]).toEqual({ path: 'file', message: expect.stringContaining('the loudest sample is −96.3 dBFS') });
    expect(refusal(file(48_000, 4800, {}, 'int16')).message).toMatch(/only zeros \(silence\)/);
  });

  it('a one-sample recording is refused naming file', () => {
    expect(refusal(file(48_000, 1, { 0: 0.5 })).issues[0]).toEqual({ path: 'file', message: expect.stringContaining('at least 2') });
  });

  it('window fields outside the recording or missing the peak name windowStartMs or windowLengthMs', () => {
    const bytes = file(48_000, 48_000, { 4800: 0.5 });
    expect(refusal(bytes, { windowStartMs: 1000 }).issues[0]).toEqual({ path: 'windowStartMs', message: expect.stringMatching(/^windowStartMs must lie within the recording, 0 to 999\.979 ms/) });
    expect(refusal(bytes, { windowStartMs: 150 }).issues[0]).toEqual({ path: 'windowStartMs', message: expect.stringMatching(/^windowStartMs must be at or before the arrival \(the peak at 100\.000 ms/) });
    expect(refusal(bytes, { windowStartMs: 600, windowLengthMs: 500 }).issues[0]?.path).toBe('windowStartMs');
    expect(refusal(bytes, { windowStartMs: 0, windowLengthMs: 1200 }).issues[0]).toEqual({ path: 'windowLengthMs', message: expect.stringMatching(/^windowLengthMs reaches past the end of the recording/) });
    expect(refusal(bytes, { windowStartMs: 0, windowLengthMs: 50 }).issues[0]).toEqual({ path: 'windowLengthMs', message: expect.stringMatching(/^windowLengthMs must reach past the arrival/) });
  });
});

describe('uploadFormat: the first bytes decide, the declared type only where they cannot', () => {
  const wav = file(8000, 100, { 3: 0.5 });
  const text = new TextEncoder().encode('20,1\n40,2\n');
  it('a RIFF file is read as WAV whatever text-like or generic type it came with', () => {
    for (const type of ['', 'application/octet-stream', 'text/plain', 'audio/wav', 'audio/x-wav', 'audio/wave', 'audio/vnd.wave', 'AUDIO/WAV; codecs=1']) expect(uploadFormat(type, wav), type).toBe('wav');
  });
  it('a file declared as WAV is read as WAV even when it is not (the reader then names why)', () => {
    expect(uploadFormat('audio/x-wav', text)).toBe('wav');
  });
  it('text is text; a type that is neither text nor WAV is refused (null)', () => {
    for (const type of ['', 'text/csv', 'application/octet-stream', 'application/vnd.ms-excel']) expect(uploadFormat(type, text), type).toBe('text');
    for (const type of ['image/png', 'audio/mpeg', 'application/pdf', 'video/x-msvideo']) expect(uploadFormat(type, wav), type).toBeNull();
  });
});
