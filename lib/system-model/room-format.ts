/** Rounding for JSON answers: small bodies, no false precision. */

/** `sig(26.8134, 5)` → 26.813 (significant digits). */
export const sig = (value: number, digits = 5): number => (Number.isFinite(value) ? Number(value.toPrecision(digits)) : value);

/** `fixed(-3.01234, 2)` → -3.01 (decimals). */
export const fixed = (value: number, decimals = 2): number => {
  if (!Number.isFinite(value)) return value;
  const f = 10 ** decimals;
  const r = Math.round(value * f) / f;
  return r === 0 ? 0 : r;
};

/** Every entry rounded with `fixed`. */
export const fixedArray = (values: ArrayLike<number>, decimals = 2): number[] => Array.from(values, (v) => fixed(v, decimals));

/** Every entry rounded with `sig`. */
export const sigArray = (values: ArrayLike<number>, digits = 5): number[] => Array.from(values, (v) => sig(v, digits));
