import { assertIntegerInRange, assertPositive } from '../internal/guards';

/** Options of {@link fractionalOctaveBands}. */
export interface FractionalOctaveBandsOptions {
  /** N in 1/N octave, 1..48. */
  readonly fraction: number;
  readonly startHz: number;
  readonly stopHz: number;
}

/** Band centres and edges, Hz. */
export interface FractionalOctaveBands {
  readonly fraction: number;
  readonly centerHz: Float64Array;
  readonly lowerHz: Float64Array;
  readonly upperHz: Float64Array;
}

/** Base-ten octave ratio G = 10^(3/10) (IEC 61260-1:2014). */
export const OCTAVE_RATIO_BASE_TEN = Math.pow(10, 3 / 10);

/**
 * IEC 61260-1:2014 base-ten 1/N-octave bands whose mid-band frequency lies in [startHz, stopHz]:
 * fm = 1000·G^(x/N) for odd N, 1000·G^((2x+1)/(2N)) for even N; edges fm·G^(∓1/(2N)).
 * @example fractionalOctaveBands({ fraction: 3, startHz: 20, stopHz: 200 }).centerHz[0] // 19.95…
 */
export function fractionalOctaveBands({ fraction, startHz, stopHz }: FractionalOctaveBandsOptions): FractionalOctaveBands {
  assertIntegerInRange('fraction', fraction, 1, 48);
  assertPositive('startHz', startHz);
  assertPositive('stopHz', stopHz);
  if (stopHz < startHz) throw new RangeError(`stopHz must be at least startHz (got ${stopHz} < ${startHz})`);
  const g = OCTAVE_RATIO_BASE_TEN;
  const even = fraction % 2 === 0;
  // Index x of the band: solve fm(x) = f for x, take the integer range covering [startHz, stopHz].
  const xOf = (f: number): number => {
    const e = (Math.log(f / 1000) / Math.log(g)) * fraction;
    return even ? (e - 1) / 2 : e;
  };
  const tolerance = 1e-9;
  const xFirst = Math.ceil(xOf(startHz) - tolerance);
  const xLast = Math.floor(xOf(stopHz) + tolerance);
  const count = Math.max(0, xLast - xFirst + 1);
  const centerHz = new Float64Array(count);
  const lowerHz = new Float64Array(count);
  const upperHz = new Float64Array(count);
  const half = Math.pow(g, 1 / (2 * fraction));
  for (let i = 0; i < count; i++) {
    const x = xFirst + i;
    const fm = even ? 1000 * Math.pow(g, (2 * x + 1) / (2 * fraction)) : 1000 * Math.pow(g, x / fraction);
    centerHz[i] = fm;
    lowerHz[i] = fm / half;
    upperHz[i] = fm * half;
  }
  return { fraction, centerHz, lowerHz, upperHz };
}
