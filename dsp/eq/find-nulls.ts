import { assertFiniteArray, assertInRange, assertSameLength, curveFrequencies } from '../internal/guards';

/** A deep, narrow dip the EQ leaves alone. */
export interface EqNull {
  /** Where the dip is deepest, Hz. */
  readonly frequencyHz: number;
  /** How far below the level around it (the median over the surrounding octave), dB, > 0. */
  readonly depthDb: number;
  /** Its extent, Hz: where the dip crosses half its depth below that level (interpolated in log frequency). */
  readonly lowHz: number;
  readonly highHz: number;
  readonly reason: string;
}

/** Default depth that makes a dip a null, dB below the level around it. */
export const DEFAULT_NULL_DEPTH_DB = 8;

/** Width of the window whose median is "the level around" a point, octaves. */
const WINDOW_OCTAVES = 1;

/** The null definition in words, for the answer and the API page. */
export const NULL_DEFINITION =
  'a local minimum of the response less the target shape lying at least nullDepthDb below the median of that difference over the octave around it (±1/2 octave); its extent runs to where the difference crosses half that depth below the median (interpolated in log frequency)';

/** Options of {@link findNulls}. */
export interface FindNullsOptions {
  readonly frequencyHz: Float64Array | readonly number[];
  /** The response less the target's shape, dB (a level offset does not matter). */
  readonly deviationDb: Float64Array | readonly number[];
  /** Only minima within startHz…stopHz are reported. */
  readonly startHz: number;
  readonly stopHz: number;
  /** Default {@link DEFAULT_NULL_DEPTH_DB}. */
  readonly depthDb?: number;
}

function median(values: number[]): number {
  values.sort((a, b) => a - b);
  const m = values.length >> 1;
  return values.length % 2 === 1 ? (values[m] as number) : ((values[m - 1] as number) + (values[m] as number)) / 2;
}

/**
 * The deep narrow dips of a response that EQ must not try to fill: each local minimum (not at the grid's ends) of the
 * deviation within the band whose depth below the median of the deviation over the surrounding octave is at least
 * `depthDb` (common practice: such dips are cancellations — a boost there spends amplifier and driver headroom and
 * changes little). A wide dip pulls that median down with it, so only narrow ones qualify. Deepest first; a minimum
 * inside a deeper null's extent belongs to it.
 * @example findNulls({ frequencyHz: grid, deviationDb: curve, startHz: 20, stopHz: 120 })[0]?.frequencyHz
 */
export function findNulls({ frequencyHz, deviationDb, startHz, stopHz, depthDb = DEFAULT_NULL_DEPTH_DB }: FindNullsOptions): EqNull[] {
  assertSameLength('deviationDb', deviationDb, frequencyHz.length);
  assertFiniteArray('deviationDb', deviationDb);
  const f = curveFrequencies(frequencyHz, deviationDb);
  assertInRange('depthDb', depthDb, 1, 60);
  const d = deviationDb;
  const n = f.length;
  const half = Math.pow(2, WINDOW_OCTAVES / 2);
  const found: { i: number; level: number; depth: number }[] = [];
  let lo = 0;
  let hi = 0;
  for (let i = 1; i < n - 1; i++) {
    const fi = f[i] as number;
    // The points within ±1/2 octave, both ends included (to 1e-12, so grid points exactly half an octave away count).
    while ((f[lo] as number) < (fi / half) * (1 - 1e-12)) lo++;
    while (hi + 1 < n && (f[hi + 1] as number) <= fi * half * (1 + 1e-12)) hi++;
    if (fi < startHz || fi > stopHz) continue;
    const v = d[i] as number;
    if (!(v < (d[i - 1] as number) && v <= (d[i + 1] as number))) continue;
    const window: number[] = [];
    for (let k = lo; k <= hi; k++) window.push(d[k] as number);
    const level = median(window);
    if (level - v >= depthDb) found.push({ i, level, depth: level - v });
  }
  found.sort((a, b) => b.depth - a.depth || a.i - b.i);
  const nulls: EqNull[] = [];
  const taken: [number, number][] = [];
  for (const { i, level, depth } of found) {
    if (taken.some(([a, b]) => i >= a && i <= b)) continue;
    const edge = level - depth / 2;
    let a = i;
    let b = i;
    while (a > 0 && (d[a - 1] as number) < edge) a--;
    while (b < n - 1 && (d[b + 1] as number) < edge) b++;
    taken.push([a, b]);
    // The extent's edges where the deviation crosses the half-depth level, linear in log frequency between points.
    const cross = (inside: number, outside: number) => {
      if (outside < 0 || outside >= n) return f[inside] as number;
      const t = (edge - (d[inside] as number)) / ((d[outside] as number) - (d[inside] as number));
      return (f[inside] as number) * Math.pow((f[outside] as number) / (f[inside] as number), t);
    };
    const lowHz = cross(a, a - 1);
    const highHz = cross(b, b + 1);
    const widthOct = Math.log2(highHz / lowHz);
    nulls.push({
      frequencyHz: f[i] as number,
      depthDb: depth,
      lowHz,
      highHz,
      reason: `a dip ${depth.toFixed(1)} dB below the level around it, ${widthOct.toFixed(2)} octave wide at half its depth: a cancellation (sources or reflections out of phase at this seat); a boost would spend amplifier and driver headroom and barely fill it — move a sub or the seat, or use Seat balance`,
    });
  }
  return nulls;
}
