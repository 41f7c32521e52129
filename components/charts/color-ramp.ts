/**
 * Seamline's diverging colour ramp for signed fields (a room mode's pressure): deep teal for
 * negative, paper white at the centre, amber to brown for positive, built from the SPEC palette.
 * Interpolated linearly in sRGB between stops; both ends stay darker than the middle so the
 * map prints readably in grey.
 */

/** Stops from t = −1 to t = +1, evenly spaced. */
export const DIVERGING_STOPS = ['#0B4F4A', '#0F766E', '#6FB3A8', '#F6F4EF', '#E3A669', '#B45309', '#6B3A1F'] as const;

function hexToRgb(hex: string): [number, number, number] {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

function toHex(v: number): string {
  return Math.round(Math.min(255, Math.max(0, v))).toString(16).padStart(2, '0');
}

/** `divergingColor(0)` → `"#f6f4ef"`; t is clamped to [−1, 1]; NaN gives a neutral grey. */
export function divergingColor(t: number): string {
  if (Number.isNaN(t)) return '#d1d5db';
  const clamped = Math.min(1, Math.max(-1, t));
  const position = ((clamped + 1) / 2) * (DIVERGING_STOPS.length - 1);
  const i = Math.min(DIVERGING_STOPS.length - 2, Math.floor(position));
  const f = position - i;
  const a = hexToRgb(DIVERGING_STOPS[i] ?? '#000000');
  const b = hexToRgb(DIVERGING_STOPS[i + 1] ?? '#000000');
  return `#${toHex(a[0] + (b[0] - a[0]) * f)}${toHex(a[1] + (b[1] - a[1]) * f)}${toHex(a[2] + (b[2] - a[2]) * f)}`;
}

/** Relative luminance (WCAG 2.x) of a #rrggbb colour, 0 (black) to 1 (white). */
export function relativeLuminance(hex: string): number {
  const channel = (c: number) => {
    const s = c / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  };
  const [r, g, b] = hexToRgb(hex);
  return 0.2126 * channel(r) + 0.7152 * channel(g) + 0.0722 * channel(b);
}
