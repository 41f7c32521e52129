import { describe, expect, it } from 'vitest';
import { fractionalOctaveBands, nominalMidbandHz } from '@/dsp';

// Published: IEC 61260-1:2014 Annex E (nominal mid-band frequencies, the R10 series of ISO 266), 20 Hz – 20 kHz.
const THIRD_OCTAVE_NOMINAL_HZ = [
  20, 25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200, 250, 315, 400, 500, 630, 800, 1000, 1250, 1600, 2000, 2500, 3150, 4000, 5000, 6300, 8000, 10000, 12500,
  16000, 20000,
];
const OCTAVE_NOMINAL_HZ = [31.5, 63, 125, 250, 500, 1000, 2000, 4000, 8000, 16000];

describe('nominalMidbandHz(exactHz, fraction)', () => {
  it('labels every one-third-octave band 20 Hz – 20 kHz with the published nominal value (published: IEC 61260-1, nominal mid-band frequencies)', () => {
    const bands = fractionalOctaveBands({ fraction: 3, startHz: 19, stopHz: 21000 });
    expect(Array.from(bands.centerHz, (hz) => nominalMidbandHz(hz, 3))).toEqual(THIRD_OCTAVE_NOMINAL_HZ);
  });

  it('labels the octave bands 31.5 Hz – 16 kHz with the published nominal value (published: IEC 61260-1)', () => {
    const bands = fractionalOctaveBands({ fraction: 1, startHz: 30, stopHz: 17000 });
    expect(Array.from(bands.centerHz, (hz) => nominalMidbandHz(hz, 1))).toEqual(OCTAVE_NOMINAL_HZ);
  });

  it('reads the bands the issue saw: 25.12 → 25, 79.43 → 80, 125.9 → 125, 158.5 → 160', () => {
    expect([25.12, 79.43, 125.9, 158.5].map((hz) => nominalMidbandHz(hz, 3))).toEqual([25, 80, 125, 160]);
  });

  it('repeats the series ×10 per decade below 20 Hz too: 10, 12.5, 16 and 1.25', () => {
    expect([10, 12.589, 15.849, 1.2589].map((hz) => nominalMidbandHz(hz, 3))).toEqual([10, 12.5, 16, 1.25]);
  });

  it('rounds other fractions to 3 significant digits (leading 1–4) or 2 (leading 5–9) (from memory: IEC 61260-1:2014 5.5)', () => {
    // One-sixth octave either side of 1 kHz: 1000·10^(±0.025) = 1059.25… and 944.06… (hand computation).
    expect(nominalMidbandHz(1000 * 10 ** 0.025, 6)).toBe(1060);
    expect(nominalMidbandHz(1000 * 10 ** -0.025, 6)).toBe(940);
  });

  it('refuses a non-positive frequency or a fraction outside 1..48, naming the parameter', () => {
    expect(() => nominalMidbandHz(0, 3)).toThrow(/exactHz/);
    expect(() => nominalMidbandHz(100, 0)).toThrow(/fraction/);
  });
});
