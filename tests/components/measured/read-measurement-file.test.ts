import { describe, expect, it } from 'vitest';
import { CLIPPED_MESSAGE, isWavFile, readMeasurementFile } from '@/components/measured/read-measurement-file';
import { wavBytes } from '../../helpers/wav-bytes';

// The Measured tab reads a dropped file in the browser before anything is sent (issue 17). WAV bytes come from
// tests/helpers/wav-bytes.ts (written from the RIFF/WAVE specification, independently of the reader).

const file = (bytes: Uint8Array | string, name: string, type = '') => new File([bytes as BlobPart], name, { type });
const impulse = (n: number, at: number, peak: number) => Array.from({ length: n }, (_, i) => (i === at ? peak : i === at + 1 ? -0.2 * peak : 0));

describe('isWavFile', () => {
  it('knows a WAV by "RIFF"…"WAVE" whatever its name, or by a .wav name', () => {
    const bytes = wavBytes({ sampleRateHz: 48_000, format: 'int16', channels: [[0, 0.5, 0]] });
    expect(isWavFile(bytes, 'impulse.bin')).toBe(true);
    expect(isWavFile(new TextEncoder().encode('20,-3\n'), 'sweep.WAV')).toBe(true);
    expect(isWavFile(new TextEncoder().encode('20,-3\n'), 'sweep.csv')).toBe(false);
  });
});

describe('readMeasurementFile', () => {
  it('reads a WAV impulse response: the peak at sample 1440 of 48 kHz is 30 ms (hand-worked) and the default window starts 20 ms before it, 500 ms long', async () => {
    const bytes = wavBytes({ sampleRateHz: 48_000, format: 'int24', channels: [impulse(48_000, 1440, 0.5)] });
    const stage = await readMeasurementFile(file(bytes, 'room.wav', 'audio/wav'));
    expect(stage.kind).toBe('wav');
    if (stage.kind !== 'wav') return;
    expect(stage.loaded.rec.peakIndex).toBe(1440);
    expect(Math.abs(stage.loaded.arrivalMs - 30)).toBeLessThan(1 / 48);
    expect(stage.loaded.defaults.startMs).toBeCloseTo(10, 9);
    expect(stage.loaded.defaults.lengthMs).toBeCloseTo(500, 9);
    expect(stage.loaded.peakAbs).toBeCloseTo(0.5, 4);
  });

  it('refuses a clipped recording with advice to record it again lower', async () => {
    const bytes = wavBytes({ sampleRateHz: 48_000, format: 'int16', channels: [impulse(4800, 100, 1.5)] });
    const stage = await readMeasurementFile(file(bytes, 'hot.wav'));
    expect(stage).toMatchObject({ kind: 'refused', fileName: 'hot.wav', message: CLIPPED_MESSAGE });
    expect(CLIPPED_MESSAGE).toMatch(/Record it again with the level lower/);
  });

  it('refuses a broken WAV with the reader’s words, naming the part of the file', async () => {
    const bytes = wavBytes({ sampleRateHz: 48_000, format: 'int16', channels: [impulse(64, 10, 0.5)] }).subarray(0, 30);
    const stage = await readMeasurementFile(file(bytes, 'cut.wav'));
    expect(stage.kind).toBe('refused');
    if (stage.kind === 'refused') expect(stage.message).toMatch(/^The WAV file was refused: /);
  });

  it('still reads a text file as before, and refuses text over 2 MB', async () => {
    const text = Array.from({ length: 20 }, (_, i) => `${20 + i * 10},${-3 - i * 0.1},0`).join('\n');
    expect((await readMeasurementFile(file(text, 'mains.csv', 'text/csv'))).kind).toBe('preview');
    const big = await readMeasurementFile(file('1'.repeat(2 * 1024 * 1024 + 1), 'big.csv', 'text/csv'));
    expect(big.kind).toBe('refused');
  });
});
