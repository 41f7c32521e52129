import { describe, expect, it } from 'vitest';
import { eqTargetDb } from '@/dsp/eq/eq-target';

// Source: R. Bristow-Johnson, "Cookbook formulae for audio EQ biquad filter coefficients" — the low shelf's analog
// prototype H(s) = A·(s² + (√A/Q)s + A)/(A·s² + (√A/Q)s + 1), A = 10^(gain/40); with S = 1, 1/Q = √((A + 1/A)(1/S − 1) + 2) = √2.
// Its level, worked here from that formula (independent of the section evaluator the code uses).
function shelfDb(riseDb: number, belowHz: number, fHz: number): number {
  const a = Math.pow(10, riseDb / 40);
  const x = fHz / belowHz;
  const k = Math.sqrt(a) * Math.SQRT2;
  const num = Math.hypot(a * (a - x * x), a * k * x);
  const den = Math.hypot(1 - a * x * x, k * x);
  return 20 * Math.log10(num / den);
}

describe('eqTargetDb: flat, or the house curve (the cookbook low shelf, S = 1)', () => {
  const f = [5, 20, 40, 60, 80, 120, 600];

  it('flat is 0 dB everywhere', () => {
    expect(Array.from(eqTargetDb({ kind: 'flat' }, f))).toEqual(f.map(() => 0));
  });

  it('a 6 dB rise below 60 Hz: 3 dB at 60 Hz (half the rise at the corner), near 6 dB far below, near 0 far above (cookbook)', () => {
    const t = eqTargetDb({ kind: 'house', riseDb: 6, belowHz: 60 }, f);
    expect(t[3]).toBeCloseTo(3, 9);
    expect(t[0]).toBeGreaterThan(5.9);
    expect(Math.abs(t[6] as number)).toBeLessThan(0.01);
    f.forEach((x, i) => expect(t[i]).toBeCloseTo(shelfDb(6, 60, x), 9));
  });

  it('never overshoots: falls monotonically from riseDb to 0 (S = 1 is the steepest shelf without overshoot)', () => {
    const grid = Array.from({ length: 200 }, (_, i) => 5 * Math.pow(2, i / 24));
    const t = eqTargetDb({ kind: 'house', riseDb: 10, belowHz: 80 }, grid);
    for (let i = 1; i < t.length; i++) expect(t[i]).toBeLessThanOrEqual((t[i - 1] as number) + 1e-12);
    expect(Math.max(...t)).toBeLessThanOrEqual(10);
  });

  it('refuses a rise above 15 dB or a corner of 0, naming the field', () => {
    expect(() => eqTargetDb({ kind: 'house', riseDb: 16, belowHz: 60 }, f)).toThrow(/target\.riseDb/);
    expect(() => eqTargetDb({ kind: 'house', riseDb: 6, belowHz: 0 }, f)).toThrow(/target\.belowHz/);
  });
});
