/** Rounds to `decimals` places, once, at the edge (keeps −300 dB silence and integers exact; −0 becomes 0). */
export function roundTo(value: number, decimals: number): number {
  if (!Number.isFinite(value)) return value;
  const k = 10 ** decimals;
  const r = Math.round(value * k) / k;
  return r === 0 ? 0 : r;
}
