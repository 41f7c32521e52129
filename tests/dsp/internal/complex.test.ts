import { describe, expect, it } from 'vitest';
import { complexLevelDb, writeTimesPolar } from '@/dsp/internal/complex';
import { assertInDelta } from '../../helpers/assert-in-delta';

// Oracles: complex products and levels worked by hand from the definitions.

describe('complexLevelDb', () => {
  it('is 20·log10|z|: |3 + 4j| = 5 → 13.9794 dB, |−1| → 0 dB, |0.1j| → −20 dB (hand computation)', () => {
    assertInDelta(complexLevelDb(3, 4), 13.9794, 1e-4, '|3 + 4j|');
    assertInDelta(complexLevelDb(-1, 0), 0, 1e-12, '|−1|');
    assertInDelta(complexLevelDb(0, 0.1), -20, 1e-12, '|0.1j|');
  });
  it('reads an exact zero as −3000 dB (the 1e-300 power floor), never −∞', () => {
    assertInDelta(complexLevelDb(0, 0), -3000, 1e-9, 'zero');
  });
});

describe('writeTimesPolar', () => {
  it('(1 + j)·2·e^(jπ/2) = −2 + 2j, level 20·log10(2√2) = 9.0309 dB, written at the index asked for only (hand computation)', () => {
    const out = { re: new Float64Array(3), im: new Float64Array(3), magnitudeDb: new Float64Array(3) };
    writeTimesPolar(out, 1, 1, 1, 2, Math.PI / 2);
    assertInDelta(out.re[1] as number, -2, 1e-15, 're');
    assertInDelta(out.im[1] as number, 2, 1e-15, 'im');
    assertInDelta(out.magnitudeDb[1] as number, 9.0309, 1e-4, 'level');
    expect([out.re[0], out.im[0], out.magnitudeDb[0], out.re[2], out.im[2], out.magnitudeDb[2]]).toEqual([0, 0, 0, 0, 0, 0]);
  });
  it('(3 − 4j)·0.5·e^(jπ) = −1.5 + 2j; (2 + 0j)·1·e^(−jπ/3) = 1 − √3·j (hand computation)', () => {
    const out = { re: new Float64Array(2), im: new Float64Array(2), magnitudeDb: new Float64Array(2) };
    writeTimesPolar(out, 0, 3, -4, 0.5, Math.PI);
    writeTimesPolar(out, 1, 2, 0, 1, -Math.PI / 3);
    assertInDelta(Array.from(out.re), [-1.5, 1], 1e-15, 're');
    assertInDelta(Array.from(out.im), [2, -Math.sqrt(3)], 1e-15, 'im');
    assertInDelta(Array.from(out.magnitudeDb), [20 * Math.log10(2.5), 20 * Math.log10(2)], 1e-12, 'level');
  });
});
