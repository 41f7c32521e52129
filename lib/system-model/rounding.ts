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

/**
 * Every entry rounded with {@link roundTo} (the same arithmetic, the scale computed once). A plain loop filling an
 * array of doubles: `Array.from` with a mapping function over a Float64Array cost about ten times as much, and an
 * array of unboxed doubles is also quicker for JSON.stringify — these arrays are most of every compute answer.
 */
export function roundAllTo(values: ArrayLike<number>, decimals: number): number[] {
  const k = 10 ** decimals;
  const n = values.length;
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    const v = values[i] as number;
    if (!Number.isFinite(v)) {
      out.push(v);
      continue;
    }
    const r = Math.round(v * k) / k;
    out.push(r === 0 ? 0 : r);
  }
  return out;
}

/** Every entry rounded with {@link roundToSignificant}. */
export function roundAllToSignificant(values: ArrayLike<number>, digits: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < values.length; i++) out.push(roundToSignificant(values[i] as number, digits));
  return out;
}
