/** Linear interpolation of `values` at `hz` on an ascending grid, linear in log-frequency; clamps at the ends. */
export function interpolateLogHz(frequencyHz: ArrayLike<number>, values: ArrayLike<number>, hz: number): number {
  const n = frequencyHz.length;
  if (hz <= (frequencyHz[0] as number)) return values[0] as number;
  if (hz >= (frequencyHz[n - 1] as number)) return values[n - 1] as number;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((frequencyHz[mid] as number) <= hz) lo = mid;
    else hi = mid;
  }
  const f0 = frequencyHz[lo] as number;
  const f1 = frequencyHz[hi] as number;
  const t = Math.log(hz / f0) / Math.log(f1 / f0);
  return (values[lo] as number) + t * ((values[hi] as number) - (values[lo] as number));
}
