import { describe, expect, it } from 'vitest';
import { interpolateLogHz } from '@/dsp/internal/interpolate';
import { assertInDelta } from '../../helpers/assert-in-delta';

describe('interpolateLogHz (linear in log-frequency; common practice for responses on a log grid)', () => {
  const f = [10, 100, 1000];
  const v = [0, 20, -10];
  it('at the geometric mean of two grid points gives the mean of their values (by hand)', () => {
    assertInDelta(interpolateLogHz(f, v, Math.sqrt(10 * 100)), 10, 1e-12);
    assertInDelta(interpolateLogHz(f, v, Math.sqrt(100 * 1000)), 5, 1e-12);
  });
  it('a third of a decade up is a third of the way: 10^(1 + 1/3) Hz → 20/3 (by hand)', () => {
    assertInDelta(interpolateLogHz(f, v, Math.pow(10, 1 + 1 / 3)), 20 / 3, 1e-12);
  });
  it('a value linear in log2(f) is reproduced exactly between any two points (definition)', () => {
    const grid = [20, 31, 47, 80, 125, 333];
    const line = (hz: number) => 6 * Math.log2(hz / 20) - 4;
    const values = grid.map(line);
    for (let hz = 20; hz <= 333; hz *= 1.07) assertInDelta(interpolateLogHz(grid, values, hz), line(hz), 1e-9, `${hz} Hz`);
  });
  it('returns the grid values at the grid points and clamps beyond the ends', () => {
    expect(interpolateLogHz(f, v, 100)).toBe(20);
    expect(interpolateLogHz(f, v, 1000)).toBe(-10);
    expect(interpolateLogHz(f, v, 1)).toBe(0);
    expect(interpolateLogHz(f, v, 5000)).toBe(-10);
  });
});
