import { describe, expect, it } from 'vitest';
import { rolloffMinus3DbHz } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

// −3 dB points by hand from the magnitudes of the published roll-offs, x = f/fc, g = 10^(−3/10):
// vented B4 (Thiele 1971): |H|² = x⁸/(1 + x⁸) = g → x = (g/(1 − g))^(1/8);
// sealed (Small 1972): |H|² = x⁴/((1 − x²)² + x²/Q²); Q = 1/√2 gives x⁴/(1 + x⁴) → x = (g/(1 − g))^(1/4);
// Q = 1/2 gives (x²/(1 + x²))² → x² = √g/(1 − √g).
const g = Math.pow(10, -0.3);

describe('rolloffMinus3DbHz', () => {
  it('vented 50 Hz (B4, Thiele 1971): 50.03 Hz, just above the corner where it reads −3.01 dB', () => {
    const expected = 50 * Math.pow(g / (1 - g), 1 / 8);
    assertInDelta(expected, 50.0296, 1e-4);
    assertInDelta(rolloffMinus3DbHz({ kind: 'vented', cornerHz: 50 }) as number, expected, 1e-3 * expected);
  });
  it('sealed Q = 0.707 at 40 Hz → 40.05 Hz; sealed Q = 0.5 at 40 Hz → 62.3 Hz (Small 1972)', () => {
    const butterworth = 40 * Math.pow(g / (1 - g), 1 / 4);
    assertInDelta(rolloffMinus3DbHz({ kind: 'sealed', cornerHz: 40, q: Math.SQRT1_2 }) as number, butterworth, 1e-3 * butterworth);
    const critical = 40 * Math.sqrt(Math.sqrt(g) / (1 - Math.sqrt(g)));
    assertInDelta(critical, 62.28, 0.01);
    assertInDelta(rolloffMinus3DbHz({ kind: 'sealed', cornerHz: 40, q: 0.5 }) as number, critical, 1e-3 * critical);
  });
  it('only the high-pass roll-offs count: a sub’s upper (low-pass) roll-off in the chain changes nothing', () => {
    const sealed = { kind: 'sealed' as const, cornerHz: 30, q: 0.9 };
    expect(rolloffMinus3DbHz([sealed, { kind: 'lowpass', cornerHz: 150, q: 0.7 }])).toBe(rolloffMinus3DbHz(sealed));
    expect(rolloffMinus3DbHz([{ kind: 'lowpass', cornerHz: 150, q: 0.7 }])).toBeNull();
  });
  it('two roll-offs together: two B4 at 50 Hz fall 6 dB at the corner, so the −3 dB point lies above it (by hand: x⁸ = √g/(1 − √g))', () => {
    const expected = 50 * Math.pow(Math.sqrt(g) / (1 - Math.sqrt(g)), 1 / 8);
    assertInDelta(rolloffMinus3DbHz([{ kind: 'vented', cornerHz: 50 }, { kind: 'vented', cornerHz: 50 }]) as number, expected, 1e-3 * expected);
  });
  it('null for no roll-off', () => {
    expect(rolloffMinus3DbHz(undefined)).toBeNull();
    expect(rolloffMinus3DbHz({ kind: 'none' })).toBeNull();
    expect(rolloffMinus3DbHz([])).toBeNull();
  });
});
