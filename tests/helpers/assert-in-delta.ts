import { expect } from 'vitest';

/** Asserts |actual − expected| ≤ delta for a number or element-wise for arrays, naming the first failing index. */
export function assertInDelta(actual: number | ArrayLike<number>, expected: number | ArrayLike<number>, delta: number, label = ''): void {
  if (typeof actual === 'number' || typeof expected === 'number') {
    const a = actual as number;
    const e = expected as number;
    if (!(Math.abs(a - e) <= delta)) expect.fail(`${label} expected ${e} ± ${delta}, got ${a}`);
    return;
  }
  expect(actual.length, `${label} length`).toBe(expected.length);
  for (let i = 0; i < actual.length; i++) {
    const a = actual[i] as number;
    const e = expected[i] as number;
    if (!(Math.abs(a - e) <= delta)) expect.fail(`${label}[${i}] expected ${e} ± ${delta}, got ${a}`);
  }
}

/** Wrapped angular difference a − b in degrees, (−180, 180]. */
export function angleDiffDeg(a: number, b: number): number {
  let d = a - b;
  d -= 360 * Math.round(d / 360);
  return d;
}
