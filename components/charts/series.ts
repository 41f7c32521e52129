import { line } from 'd3-shape';

/** Pure helpers over sampled series: nearest sample, finite extent, SVG path with breaks. */

/**
 * Index of the sample in ascending `xs` nearest to `x` (nearest in log10 when `log`), or -1 for
 * an empty series. `nearestIndex([10, 20, 40], 27, true)` → 1.
 */
export function nearestIndex(xs: ArrayLike<number>, x: number, log = false): number {
  const n = xs.length;
  if (n === 0 || !Number.isFinite(x)) return -1;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((xs[mid] ?? NaN) < x) lo = mid;
    else hi = mid;
  }
  const a = xs[lo] ?? NaN;
  const b = xs[hi] ?? NaN;
  const t = log ? Math.log10(x) : x;
  const ta = log ? Math.log10(a) : a;
  const tb = log ? Math.log10(b) : b;
  if (!Number.isFinite(tb)) return lo;
  if (!Number.isFinite(ta)) return hi;
  return Math.abs(t - ta) <= Math.abs(tb - t) ? lo : hi;
}

/** [min, max] of the finite numbers in all series, or null when there are none. */
export function finiteExtent(series: Iterable<ArrayLike<number>>): [number, number] | null {
  let min = Infinity;
  let max = -Infinity;
  for (const values of series) {
    for (let i = 0; i < values.length; i++) {
      const v = values[i];
      if (v === undefined || !Number.isFinite(v)) continue;
      if (v < min) min = v;
      if (v > max) max = v;
    }
  }
  return min <= max ? [min, max] : null;
}

export interface TracePathOptions {
  /**
   * Break the line between consecutive samples whose values differ by more than this, e.g. 180
   * for wrapped phase so the +180° → −180° jump is not drawn as a vertical stroke.
   */
  breakJumpsOver?: number;
  /** Samples whose x fails this test (e.g. x ≤ 0 on a log axis) break the line. */
  xDefined?: (x: number) => boolean;
}

type Point = readonly [number, number] | null;

const pathOf = line<Point>()
  .defined((p) => p !== null)
  .x((p) => (p as readonly [number, number])[0])
  .y((p) => (p as readonly [number, number])[1])
  .digits(2);

/**
 * SVG path data for `y` against `x` in pixel space; NaN/±Infinity values and jumps over
 * `breakJumpsOver` leave gaps (d3 `line().defined`). Returns "" when nothing is drawable.
 */
export function tracePath(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  xPx: (x: number) => number,
  yPx: (y: number) => number,
  options: TracePathOptions = {},
): string {
  const { breakJumpsOver, xDefined } = options;
  const n = Math.min(x.length, y.length);
  const points: Point[] = [];
  let previous: number | null = null;
  for (let i = 0; i < n; i++) {
    const xi = x[i] ?? NaN;
    const yi = y[i] ?? NaN;
    if (!Number.isFinite(xi) || !Number.isFinite(yi) || (xDefined && !xDefined(xi))) {
      points.push(null);
      previous = null;
      continue;
    }
    if (breakJumpsOver !== undefined && previous !== null && Math.abs(yi - previous) > breakJumpsOver) {
      points.push(null);
    }
    points.push([xPx(xi), yPx(yi)]);
    previous = yi;
  }
  return pathOf(points) ?? '';
}
