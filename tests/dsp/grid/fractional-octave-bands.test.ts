import { describe, expect, it } from 'vitest';
import { fractionalOctaveBands, OCTAVE_RATIO_BASE_TEN } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('fractionalOctaveBands', () => {
  it('uses G = 10^(3/10) and puts a one-third-octave band at 1000 Hz (published: IEC 61260-1:2014)', () => {
    assertInDelta(OCTAVE_RATIO_BASE_TEN, 1.99526, 1e-5);
    const b = fractionalOctaveBands({ fraction: 3, startHz: 900, stopHz: 1100 });
    expect(b.centerHz.length).toBe(1);
    assertInDelta(b.centerHz[0] as number, 1000, 1e-9);
    assertInDelta((b.upperHz[0] as number) / (b.lowerHz[0] as number), Math.pow(10, 0.1), 1e-12);
  });
  it('one-third-octave centres 20–200 Hz match the nominal series 20, 25, 31.5 … 200 within 3 % (published: IEC 61260-1 nominal values)', () => {
    const nominal = [20, 25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200];
    const b = fractionalOctaveBands({ fraction: 3, startHz: 19, stopHz: 210 });
    expect(b.centerHz.length).toBe(nominal.length);
    nominal.forEach((n, i) => assertInDelta((b.centerHz[i] as number) / n, 1, 0.03));
  });
  it('even fractions put no band at exactly 1000 Hz but straddle it (IEC 61260-1 even-N rule)', () => {
    const b = fractionalOctaveBands({ fraction: 2, startHz: 500, stopHz: 2000 });
    assertInDelta((b.centerHz[1] as number) / 1000, Math.pow(OCTAVE_RATIO_BASE_TEN, 1 / 4), 1e-12);
  });
  it('throws RangeError naming fraction outside 1..48', () => {
    expect(() => fractionalOctaveBands({ fraction: 0, startHz: 20, stopHz: 200 })).toThrow(/fraction/);
    expect(() => fractionalOctaveBands({ fraction: 49, startHz: 20, stopHz: 200 })).toThrow(/fraction/);
    expect(() => fractionalOctaveBands({ fraction: 2.5, startHz: 20, stopHz: 200 })).toThrow(RangeError);
  });
});
