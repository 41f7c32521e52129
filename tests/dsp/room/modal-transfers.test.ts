import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz, modalTransfer, modalTransfers } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

// modalTransfers evaluates Kuttruff's modal sum ("Room Acoustics", ch. 3) for many pairs at once; its reference here is
// modalTransfer (checked against the published room-mode figures, Rayleigh 1896, in modal-transfer.test.ts).
const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7 };
const grid = logFrequencyGridHz({ startHz: 15, stopHz: 300, pointsPerOctave: 24 });
const subs = [{ x: 0.3, y: 0.3, z: 0.3 }, { x: 4.6, y: 0.3, z: 0.3 }, { x: 2.45, y: 6.4, z: 0 }];
const seats = [1.5, 2.45, 3.4].flatMap((x) => [3.8, 4.8].map((y) => ({ x, y, z: 1.1 })));

describe('modalTransfers', () => {
  it('every pair equals modalTransfer for that source and receiver (1e-9 dB, re/im to 1e-12 relative)', () => {
    const all = modalTransfers({ room, sourcesM: subs, receiversM: seats, frequencyHz: grid, rt60S: 0.4, temperatureC: 20, maxModeHz: 300 });
    expect(all.transfers.length).toBe(subs.length);
    subs.forEach((sourceM, s) => {
      expect(all.transfers[s]!.length).toBe(seats.length);
      seats.forEach((receiverM, r) => {
        const one = modalTransfer({ room, sourceM, receiverM, frequencyHz: grid, rt60S: 0.4, temperatureC: 20, maxModeHz: 300 });
        const t = all.transfers[s]![r]!;
        expect(all.modeCount).toBe(one.modeCount);
        grid.forEach((_, i) => {
          assertInDelta(t.magnitudeDb[i] as number, one.magnitudeDb[i] as number, 1e-9);
          const size = Math.hypot(one.re[i] as number, one.im[i] as number);
          assertInDelta(t.re[i] as number, one.re[i] as number, 1e-12 * size);
          assertInDelta(t.im[i] as number, one.im[i] as number, 1e-12 * size);
        });
      });
    });
  });
  it('is reciprocal across the two lists (published: Kuttruff ch. 3, reciprocity)', () => {
    const ab = modalTransfers({ room, sourcesM: [subs[0]!], receiversM: [seats[2]!], frequencyHz: grid, rt60S: 0.5, temperatureC: 20 });
    const ba = modalTransfers({ room, sourcesM: [seats[2]!], receiversM: [subs[0]!], frequencyHz: grid, rt60S: 0.5, temperatureC: 20 });
    assertInDelta(ab.transfers[0]![0]!.magnitudeDb, ba.transfers[0]![0]!.magnitudeDb, 1e-9);
  });
  it('throws RangeError naming the parameter', () => {
    const base = { room, sourcesM: subs, receiversM: seats, frequencyHz: [40], rt60S: 0.4, temperatureC: 20 };
    expect(() => modalTransfers({ ...base, sourcesM: [] })).toThrow(/sourcesM/);
    expect(() => modalTransfers({ ...base, receiversM: [] })).toThrow(/receiversM/);
    expect(() => modalTransfers({ ...base, receiversM: [seats[0]!, { x: 1, y: 9, z: 1 }] })).toThrow(/receiversM\[1\]\.y/);
    expect(() => modalTransfers({ ...base, sourcesM: [{ x: NaN, y: 1, z: 1 }] })).toThrow(/sourcesM\[0\]\.x/);
    expect(() => modalTransfers({ ...base, rt60S: -1 })).toThrow(/rt60S/);
    expect(() => modalTransfers({ ...base, frequencyHz: [0] })).toThrow(/frequencyHz\[0\]/);
    expect(() => modalTransfers({ ...base, sourcesM: Array(40).fill(subs[0]), receiversM: Array(40).fill(seats[0]) })).toThrow(/at most 1024/);
  });
});
