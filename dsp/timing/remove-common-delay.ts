import { assertFinite } from '../internal/guards';

/**
 * Processor delays with the delay they all share taken out: each minus the smallest, so the smallest is 0 ms and none
 * is negative (a processor takes positive delays only; a delay common to every source changes no level or phase
 * between them — common practice). The differences between the delays are kept exactly as given.
 * @example withoutCommonDelayMs([2.5, 1, 4]) // [1.5, 0, 3]
 */
export function withoutCommonDelayMs(delaysMs: readonly number[]): number[] {
  let commonMs = Infinity;
  delaysMs.forEach((d, i) => {
    assertFinite(`delaysMs[${i}]`, d);
    if (d < commonMs) commonMs = d;
  });
  return delaysMs.map((d) => d - commonMs);
}
