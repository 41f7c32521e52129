import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz } from '@/dsp';
import { bandPowerAverageDb } from '@/dsp/measured/band-power-average';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('bandPowerAverageDb', () => {
  it('a flat curve averages to its level', () => {
    const f = logFrequencyGridHz({ startHz: 20, stopHz: 2000, pointsPerOctave: 12 });
    assertInDelta(bandPowerAverageDb({ frequencyHz: f, magnitudeDb: new Float64Array(f.length).fill(-4.5), startHz: 100, stopHz: 1000 }).levelDb, -4.5, 1e-12);
  });

  it('two equal halves of a band at 0 dB and −∞-ish average to 10·log10(1/2) = −3.01 dB (power average, not dB average)', () => {
    const f = logFrequencyGridHz({ startHz: 100, stopHz: 400, pointsPerOctave: 480 });
    const db = Float64Array.from(f, (hz) => (hz < 200 ? 0 : -200));
    assertInDelta(bandPowerAverageDb({ frequencyHz: f, magnitudeDb: db, startHz: 100, stopHz: 400 }).levelDb, 10 * Math.log10(0.5), 0.02);
  });

  it('a linear-spaced and a log-spaced sampling of one response give the same average (log-frequency weights)', () => {
    const response = (hz: number) => 6 * Math.log2(hz / 100); // +6 dB per octave
    const logF = logFrequencyGridHz({ startHz: 50, stopHz: 1600, pointsPerOctave: 96 });
    const linF = Float64Array.from({ length: 3100 }, (_, i) => 50 + i * 0.5);
    const a = bandPowerAverageDb({ frequencyHz: logF, magnitudeDb: logF.map(response), startHz: 100, stopHz: 800 }).levelDb;
    const b = bandPowerAverageDb({ frequencyHz: linF, magnitudeDb: linF.map(response), startHz: 100, stopHz: 800 }).levelDb;
    assertInDelta(a, b, 0.02);
  });

  it('refuses a band with no points, naming the band', () => {
    expect(() => bandPowerAverageDb({ frequencyHz: [10, 20], magnitudeDb: [0, 0], startHz: 100, stopHz: 200 })).toThrow(/100–200 Hz/);
  });
});
