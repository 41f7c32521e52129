import { describe, expect, it } from 'vitest';
import { modalTransfer, summedModalResponse } from '@/dsp';

const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7 };
const seat = { x: 2.45, y: 3.7, z: 1.1 };
const frequencyHz = [20, 26.81, 40, 63.5, 80, 120];
const base = { room, receiverM: seat, frequencyHz, rt60S: 0.4, temperatureC: 20 };

describe('summedModalResponse (published: Kuttruff, Room Acoustics, ch. 3; complex superposition)', () => {
  it('one source at 0 dB, no delay equals modalTransfer', () => {
    const one = summedModalResponse({ ...base, sources: [{ positionM: { x: 0.3, y: 0.3, z: 0.3 } }] });
    const ref = modalTransfer({ ...base, sourceM: { x: 0.3, y: 0.3, z: 0.3 } });
    one.sum.magnitudeDb.forEach((v, i) => expect(Math.abs(v - (ref.magnitudeDb[i] as number))).toBeLessThan(1e-9));
  });
  it('two identical sources in the same place add 6.02 dB; one inverted cancels', () => {
    const p = { x: 0.3, y: 0.3, z: 0.3 };
    const ref = modalTransfer({ ...base, sourceM: p });
    const twice = summedModalResponse({ ...base, sources: [{ positionM: p }, { positionM: p }] });
    twice.sum.magnitudeDb.forEach((v, i) => expect(Math.abs(v - (ref.magnitudeDb[i] as number) - 20 * Math.log10(2))).toBeLessThan(1e-9));
    const cancel = summedModalResponse({ ...base, sources: [{ positionM: p }, { positionM: p, invert: true }] });
    cancel.sum.magnitudeDb.forEach((v, i) => expect(v).toBeLessThan((ref.magnitudeDb[i] as number) - 100));
  });
  it('gain scales the level and a delay of half a period at 40 Hz (12.5 ms) cancels two co-located sources there', () => {
    const p = { x: 0.3, y: 0.3, z: 0.3 };
    const ref = modalTransfer({ ...base, sourceM: p });
    const louder = summedModalResponse({ ...base, sources: [{ positionM: p, gainDb: 6 }] });
    expect(Math.abs((louder.sum.magnitudeDb[2] as number) - (ref.magnitudeDb[2] as number) - 6)).toBeLessThan(1e-9);
    const halfPeriod = summedModalResponse({ ...base, sources: [{ positionM: p }, { positionM: p, delayMs: 12.5 }] });
    expect(halfPeriod.sum.magnitudeDb[2] as number).toBeLessThan((ref.magnitudeDb[2] as number) - 100);
    // The per-source curves keep their own delay: a pure delay does not change the magnitude.
    expect(Math.abs((halfPeriod.perSource[1]?.magnitudeDb[2] as number) - (ref.magnitudeDb[2] as number))).toBeLessThan(1e-9);
  });
  it('throws RangeError naming the parameter', () => {
    expect(() => summedModalResponse({ ...base, sources: [] })).toThrow(/sources/);
    expect(() => summedModalResponse({ ...base, sources: [{ positionM: { x: 0, y: 0, z: 0 }, delayMs: -1 }] })).toThrow(/sources\[0\]\.delayMs/);
  });
});
