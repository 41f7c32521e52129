/**
 * Rounding of every answer and document value, done once, at the edge: small JSON bodies, no false precision.
 * Non-finite values pass through unchanged; −0 becomes 0 (so an answer never shows "-0").
 */

/** Rounds to `decimals` places: `roundTo(-3.01234, 2)` → −3.01 (keeps −300 dB silence and integers exact). */
export function roundTo(value: number, decimals: number): number {
  if (!Number.isFinite(value)) return value;
  const k = 10 ** decimals;
  const r = Math.round(value * k) / k;
  return r === 0 ? 0 : r;
}

/** Rounds to `digits` significant digits: `roundToSignificant(26.8134, 5)` → 26.813. */
export function roundToSignificant(value: number, digits: number): number {
  if (!Number.isFinite(value)) return value;
  const r = Number(value.toPrecision(digits));
  return r === 0 ? 0 : r;
}

/** Every entry rounded with {@link roundTo}. */
export function roundAllTo(values: ArrayLike<number>, decimals: number): number[] {
  return Array.from(values, (v) => roundTo(v, decimals));
}

/** Every entry rounded with {@link roundToSignificant}. */
export function roundAllToSignificant(values: ArrayLike<number>, digits: number): number[] {
  return Array.from(values, (v) => roundToSignificant(v, digits));
}
