import { describe, expect, it } from 'vitest';
import { fastAtan2, sinCos } from '@/dsp/internal/fast-math';

// The reference is the JavaScript engine's own Math.atan2, Math.sin and Math.cos (a second evaluation by another route);
// the claim is "accurate to a few ulp": atan2 within 3 units of 2^−52 relative to the angle, sin/cos within 1e-15
// plus the rounding of the argument's reduction by π/2 (2e-16·|x|).

/** Deterministic points spread over many scales (a small linear congruential generator, common practice). */
function points(count: number, seed: number): number[] {
  let s = seed;
  const out: number[] = [];
  for (let i = 0; i < count; i++) {
    s = (s * 1103515245 + 12345) % 2147483648;
    const u = s / 2147483648;
    s = (s * 1103515245 + 12345) % 2147483648;
    const scale = Math.pow(10, -6 + 12 * (s / 2147483648));
    out.push((2 * u - 1) * scale);
  }
  return out;
}

describe('fastAtan2', () => {
  it('equals Math.atan2 within 3 ulp of the angle on every quadrant and scale', () => {
    const xs = points(400, 1);
    const ys = points(40, 2);
    let worstUlp = 0;
    for (const x of xs) {
      for (const y of ys) {
        const expected = Math.atan2(y, x);
        worstUlp = Math.max(worstUlp, Math.abs(fastAtan2(y, x) - expected) / (Number.EPSILON * Math.abs(expected)));
      }
    }
    expect(worstUlp).toBeLessThan(3);
  });
  it('edge cases: the axes, the diagonals and atan2(0, 0) = 0 (definition)', () => {
    expect(fastAtan2(0, 0)).toBe(0);
    expect(fastAtan2(1, 0)).toBe(Math.PI / 2);
    expect(fastAtan2(-1, 0)).toBe(-Math.PI / 2);
    expect(fastAtan2(0, 1)).toBe(0);
    expect(fastAtan2(0, -1)).toBe(Math.PI);
    for (const [y, x, expected] of [
      [1, 1, Math.PI / 4],
      [1, -1, (3 * Math.PI) / 4],
      [-1, -1, (-3 * Math.PI) / 4],
      [-1, 1, -Math.PI / 4],
      [Math.sqrt(3), 1, Math.PI / 3],
      [1, Math.sqrt(3), Math.PI / 6],
    ] as const) {
      expect(Math.abs(fastAtan2(y, x) - expected)).toBeLessThan(4e-16 * Math.PI);
    }
  });
});

describe('sinCos', () => {
  it('equals Math.sin and Math.cos within 1e-15 (relative to max(1, |x|)·1e-16 for large x) for |x| up to 1e6', () => {
    const out = new Float64Array(3);
    let worst = 0;
    for (const x of [...points(2000, 3), 0, Math.PI / 4, Math.PI / 2, Math.PI, 1e5 + 0.3, -999999.5]) {
      sinCos(x, out, 1);
      const tolerance = 1e-15 + 2e-16 * Math.abs(x);
      worst = Math.max(worst, (Math.abs((out[1] as number) - Math.sin(x)) + Math.abs((out[2] as number) - Math.cos(x))) / tolerance);
    }
    expect(worst).toBeLessThan(1);
    expect(out[0]).toBe(0);
  });
  it('every quadrant: sin and cos of 0, π/2, π, 3π/2 (definition)', () => {
    const out = new Float64Array(2);
    for (const [x, s, c] of [
      [0, 0, 1],
      [Math.PI / 2, 1, 0],
      [Math.PI, 0, -1],
      [(3 * Math.PI) / 2, -1, 0],
      [-Math.PI / 2, -1, 0],
    ] as const) {
      sinCos(x, out, 0);
      expect(Math.abs((out[0] as number) - s)).toBeLessThan(1e-15);
      expect(Math.abs((out[1] as number) - c)).toBeLessThan(1e-15);
    }
  });
  it('falls back to Math.sin/cos beyond 1e6 and for non-finite input', () => {
    const out = new Float64Array(2);
    sinCos(3e7, out, 0);
    expect(out[0]).toBe(Math.sin(3e7));
    expect(out[1]).toBe(Math.cos(3e7));
    sinCos(NaN, out, 0);
    expect(Number.isNaN(out[0])).toBe(true);
  });
});
