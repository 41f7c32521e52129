import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { eqBiquad } from '@/dsp';
import { biquadLevelDb, halfAngleSines } from '@/dsp/eq/biquad-level';
import { peakingDb } from './eq-oracle';

describe('biquadLevelDb: the exact level of a biquad (the cookbook’s magnitude formula in sin²(w/2))', () => {
  it('agrees with H(e^jw) evaluated with complex.js for random cookbook peaking filters and rates, within 1e-6 dB (reference library; the direct sum loses digits at low w/fs, the formula does not)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 10, max: 500, noNaN: true }),
        fc.double({ min: -24, max: 24, noNaN: true }),
        fc.double({ min: 0.1, max: 20, noNaN: true }),
        fc.constantFrom(44100, 48000, 96000, 192000),
        fc.array(fc.double({ min: 5, max: 2000, noNaN: true }), { minLength: 1, maxLength: 8 }),
        (centerHz, gainDb, q, fs, freqs) => {
          const got = biquadLevelDb(eqBiquad({ kind: 'peaking', centerHz, gainDb, q }, fs), halfAngleSines(freqs, fs), new Float64Array(freqs.length));
          freqs.forEach((f, i) => expect(Math.abs((got[i] as number) - peakingDb({ centerHz, gainDb, q }, fs, f))).toBeLessThan(1e-6));
        },
      ),
      { numRuns: 200, seed: 16 },
    );
  });

  it('gives exactly gainDb at the centre and 0 dB near DC (cookbook: a peaking filter has its gain at f0 and unity at DC), even at 20 Hz and 384 kHz', () => {
    const bq = eqBiquad({ kind: 'peaking', centerHz: 20, gainDb: -9, q: 4 }, 384000);
    const out = biquadLevelDb(bq, halfAngleSines([20, 0.01], 384000), new Float64Array(2));
    expect(Math.abs((out[0] as number) + 9)).toBeLessThan(1e-6);
    expect(Math.abs(out[1] as number)).toBeLessThan(1e-6);
  });

  it('adds into `out` when asked (a cascade is the sum of its levels in dB)', () => {
    const phi = halfAngleSines([40, 80], 48000);
    const a = eqBiquad({ kind: 'peaking', centerHz: 40, gainDb: 6, q: 2 }, 48000);
    const b = eqBiquad({ kind: 'peaking', centerHz: 80, gainDb: -3, q: 1 }, 48000);
    const sum = biquadLevelDb(b, phi, biquadLevelDb(a, phi, new Float64Array(2)), true);
    [40, 80].forEach((f, i) => expect(sum[i]).toBeCloseTo(peakingDb({ centerHz: 40, gainDb: 6, q: 2 }, 48000, f) + peakingDb({ centerHz: 80, gainDb: -3, q: 1 }, 48000, f), 9));
  });
});
