import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz, modalTransfer, roomModes } from '@/dsp';

const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7 };
const grid = logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });

describe('modalTransfer (published: Kuttruff, Room Acoustics, ch. 3)', () => {
  it('a corner source and corner receiver show a peak near the first length mode 26.81 Hz', () => {
    const r = modalTransfer({ room, sourceM: { x: 0, y: 0, z: 0 }, receiverM: { x: 4.9, y: 6.4, z: 2.7 }, frequencyHz: logFrequencyGridHz({ startHz: 22, stopHz: 32, pointsPerOctave: 400 }), rt60S: 0.4, temperatureC: 20 });
    let best = 0;
    r.magnitudeDb.forEach((v, i) => { if (v > (r.magnitudeDb[best] as number)) best = i; });
    expect(Math.abs((r.frequencyHz[best] as number) - 26.81)).toBeLessThan(0.5);
  });
  it('a receiver on the null plane of (1,0,0) (y = L/2) hears much less of it than one at the wall', () => {
    const at = (y: number) => modalTransfer({ room, sourceM: { x: 0.2, y: 0.2, z: 0.2 }, receiverM: { x: 2.45, y, z: 1.2 }, frequencyHz: [26.81], rt60S: 0.4, temperatureC: 20 }).magnitudeDb[0] as number;
    expect(at(3.2)).toBeLessThan(at(6.3) - 6);
  });
  it('is reciprocal: swapping source and receiver gives the same response (published: Kuttruff ch. 3, reciprocity)', () => {
    const a = modalTransfer({ room, sourceM: { x: 0.3, y: 0.4, z: 0.3 }, receiverM: { x: 2, y: 4, z: 1.1 }, frequencyHz: grid, rt60S: 0.5, temperatureC: 20 });
    const b = modalTransfer({ room, sourceM: { x: 2, y: 4, z: 1.1 }, receiverM: { x: 0.3, y: 0.4, z: 0.3 }, frequencyHz: grid, rt60S: 0.5, temperatureC: 20 });
    a.magnitudeDb.forEach((v, i) => expect(Math.abs(v - (b.magnitudeDb[i] as number))).toBeLessThan(1e-9));
  });
  it('uses the modes of roomModes up to maxModeHz', () => {
    const r = modalTransfer({ room, sourceM: { x: 0, y: 0, z: 0 }, receiverM: { x: 1, y: 1, z: 1 }, frequencyHz: [50], rt60S: 0.4, temperatureC: 20, maxModeHz: 200 });
    expect(r.modeCount).toBe(roomModes({ ...room, maxHz: 200, temperatureC: 20 }).modes.length);
  });
  it('throws RangeError naming the parameter for points outside the room and bad rt60S', () => {
    expect(() => modalTransfer({ room, sourceM: { x: 9, y: 0, z: 0 }, receiverM: { x: 1, y: 1, z: 1 }, frequencyHz: [50], rt60S: 0.4, temperatureC: 20 })).toThrow(/sourceM\.x/);
    expect(() => modalTransfer({ room, sourceM: { x: 0, y: 0, z: 0 }, receiverM: { x: 1, y: 1, z: 1 }, frequencyHz: [50], rt60S: 0, temperatureC: 20 })).toThrow(/rt60S/);
  });
});
