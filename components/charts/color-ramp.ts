/**
 * Seamline's diverging colour ramp for signed fields (a room mode's pressure): deep teal for
 * negative, paper white at the centre, amber to brown for positive, built from the app palette (stops in theme.ts).
 * Interpolated linearly in sRGB between stops; both ends stay darker than the middle so the
 * map prints readably in grey.
 */

import { chartColors, divergingStops } from './theme';

/** Stops from t = −1 to t = +1, evenly spaced. */
export const DIVERGING_STOPS = divergingStops;

function hexToRgb(hex: string): [number, number, number] {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

function toHex(v: number): string {
  return Math.round(Math.min(255, Math.max(0, v))).toString(16).padStart(2, '0');
}

/** `divergingColor(0)` → the paper-white centre stop, lower-case `#rrggbb`; t is clamped to [−1, 1]; NaN gives a neutral grey. */
export function divergingColor(t: number): string {
  if (Number.isNaN(t)) return chartColors.missing;
  const clamped = Math.min(1, Math.max(-1, t));
  const position = ((clamped + 1) / 2) * (DIVERGING_STOPS.length - 1);
  const i = Math.min(DIVERGING_STOPS.length - 2, Math.floor(position));
  const f = position - i;
  // i is within 0 … length − 2, so both stops exist.
  const a = hexToRgb(DIVERGING_STOPS[i] ?? DIVERGING_STOPS[0]);
  const b = hexToRgb(DIVERGING_STOPS[i + 1] ?? DIVERGING_STOPS[0]);
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
