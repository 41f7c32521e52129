import { assertIntegerInRange } from '../internal/guards';

/**
 * Quality factors of the second-order sections of an n-th order Butterworth (n = 1..8), ascending;
 * odd orders add one first-order section (not listed). Q_k = 1/(2·cos θ_k), θ_k the pole angles
 * from the negative real axis (Butterworth, Wireless Engineer 7, 1930).
 * @example butterworthQ(4) // [0.5412, 1.3066]
 */
export function butterworthQ(order: number): number[] {
  assertIntegerInRange('order', order, 1, 8);
  const qs: number[] = [];
  const pairs = Math.floor(order / 2);
  for (let k = 1; k <= pairs; k++) {
    const thetaRad = order % 2 === 0 ? ((2 * k - 1) * Math.PI) / (2 * order) : (k * Math.PI) / order;
    qs.push(1 / (2 * Math.cos(thetaRad)));
  }
  return qs.sort((a, b) => a - b);
}
