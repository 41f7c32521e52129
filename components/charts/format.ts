/** Number formatting for chart read-outs and labels (true minus sign, unit after a thin space). */

const MINUS = '\u2212';

/** `formatNumber(-3.14159, 1)` → `"−3.1"`; non-finite values → `"—"`. */
export function formatNumber(value: number, digits = 1): string {
  if (!Number.isFinite(value)) return '—';
  const text = value.toFixed(digits);
  // "-0.0" reads as a negative level; show it as zero.
  if (Number(text) === 0) return (0).toFixed(digits);
  return text.replace('-', MINUS);
}

/** `formatValue(-3.1, 'dB')` → `"−3.1 dB"`, `formatValue(90, '°', 0)` → `"90°"`. */
export function formatValue(value: number, unit?: string, digits = 1): string {
  const number = formatNumber(value, digits);
  if (!unit || number === '—') return number;
  return unit === '°' ? `${number}°` : `${number}\u2009${unit}`;
}

/** `formatSigned(3.2, 'dB')` → `"+3.2 dB"` (for headroom and deviations). */
export function formatSigned(value: number, unit?: string, digits = 1): string {
  const text = formatValue(value, unit, digits);
  return Number.isFinite(value) && Number(value.toFixed(digits)) > 0 ? `+${text}` : text;
}
