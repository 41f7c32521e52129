import { describe, expect, it } from 'vitest';
import { finiteExtent, nearestIndex, tracePath } from '@/components/charts/series';
import { subpathCount } from './helpers';

const identity = (v: number) => v;

describe('nearestIndex(xs, x, log)', () => {
  it('finds the nearest sample linearly', () => {
    expect(nearestIndex([0, 1, 2, 3], 1.4)).toBe(1);
    expect(nearestIndex([0, 1, 2, 3], 1.6)).toBe(2);
    expect(nearestIndex([0, 1, 2, 3], -5)).toBe(0);
    expect(nearestIndex([0, 1, 2, 3], 99)).toBe(3);
  });
  it('measures nearness in log10 on a log axis (29 Hz is nearer 40 than 20 in octaves)', () => {
    expect(nearestIndex([10, 20, 40], 29, false)).toBe(1);
    expect(nearestIndex([10, 20, 40], 29, true)).toBe(2);
    expect(nearestIndex([10, 20, 40], 28, true)).toBe(1);
  });
  it('returns -1 for an empty series or a non-finite x', () => {
    expect(nearestIndex([], 1)).toBe(-1);
    expect(nearestIndex([1, 2], NaN)).toBe(-1);
  });
});

describe('finiteExtent(series)', () => {
  it('ignores NaN and infinities', () => {
    expect(finiteExtent([[1, NaN, -Infinity], [Infinity, -2, 5]])).toEqual([-2, 5]);
  });
  it('is null when nothing is finite', () => {
    expect(finiteExtent([[NaN], []])).toBeNull();
  });
});

describe('tracePath(x, y, xPx, yPx, options)', () => {
  it('draws one subpath through finite values', () => {
    expect(tracePath([0, 1, 2], [0, 1, 0], identity, identity)).toBe('M0,0L1,1L2,0');
  });
  it('breaks the line at NaN and ±Infinity (line().defined)', () => {
    const d = tracePath([0, 1, 2, 3, 4, 5], [0, 1, NaN, 3, -Infinity, 5], identity, identity);
    expect(subpathCount(d)).toBe(3);
    expect(d).not.toContain('NaN');
    expect(d).not.toContain('Infinity');
  });
  it('breaks wrapped phase where consecutive values differ by more than 180°', () => {
    const d = tracePath([0, 1, 2, 3], [170, 179, -179, -170], identity, identity, { breakJumpsOver: 180 });
    expect(d).toBe('M0,170L1,179M2,-179L3,-170');
  });
  it('keeps a continuous line without the jump option', () => {
    expect(subpathCount(tracePath([0, 1, 2, 3], [170, 179, -179, -170], identity, identity))).toBe(1);
  });
  it('breaks where xDefined rejects x (0 Hz on a log axis)', () => {
    const d = tracePath([0, 1, 2], [1, 2, 3], identity, identity, { xDefined: (v) => v > 0 });
    expect(d).toBe('M1,2L2,3');
  });
  it('is empty when nothing can be drawn', () => {
    expect(tracePath([0, 1], [NaN, NaN], identity, identity)).toBe('');
  });
});
