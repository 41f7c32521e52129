/**
 * Seamline colours and plot sizes. One place for every colour a component draws in SVG or script (Tailwind
 * classes use the tokens of tailwind.config.ts, the same values), so the
 * palette stays consistent across pages and a dark theme can later swap this object.
 */

export const chartColors = {
  paper: '#F6F4EF',
  surface: '#FFFFFF',
  ink: '#18202A',
  inkMuted: '#4B5563',
  grid: '#E5E2DA',
  gridMinor: '#F0EEE8',
  axis: '#9A968C',
  mains: '#0F766E',
  sub: '#B45309',
  // Second sub: a deep brown, darker than the first sub's amber so the two stay apart in print.
  sub2: '#6B3A1F',
  sum: '#18202A',
  target: '#64748B',
  ok: '#2F6F4E',
  warn: '#B45309',
  fail: '#B91C1C',
  band: '#0F766E',
  // The outline of the Seamline mark (the same warm grey as the app's rules).
  frame: '#D9D4C7',
  // A heat-map cell without a value.
  missing: '#d1d5db',
} as const;

/** The diverging ramp for signed fields (a room mode's pressure), from −1 to +1: teal, paper white, amber to brown. */
export const divergingStops = ['#0B4F4A', '#0F766E', '#6FB3A8', '#F6F4EF', '#E3A669', '#B45309', '#6B3A1F'] as const;

/** Measured responses overlaid on one plot, in order: the mains teal, the sub amber, then hues apart from both. */
export const overlayColors = ['#0F766E', '#B45309', '#1D4ED8', '#7C3AED', '#BE185D', '#4D7C0F', '#6B3A1F', '#0E7490'] as const;

/** Seat curves on Modes: distinct hues that are neither the mains teal nor the sub amber (the MLP is drawn in ink). */
export const seatColors = ['#2563EB', '#7C3AED', '#BE185D', '#4D7C0F', '#0E7490', '#9F1239', '#57534E', '#1D4ED8'] as const;

/** One curve per sub at a seat on Modes: ambers, browns and oranges, the first the sub colour. */
export const subColors = [chartColors.sub, '#92400E', '#D97706', '#78350F', '#EA580C', '#A16207', '#C2410C', '#854D0E'] as const;

/** Ready-made trace styles; spread into a trace: `{ id: 'sum', label: 'Sum', values, ...traceStyles.sum }`. */
export const traceStyles = {
  mains: { color: chartColors.mains, width: 2 },
  sub: { color: chartColors.sub, width: 2 },
  sub2: { color: chartColors.sub2, width: 2 },
  sum: { color: chartColors.sum, width: 3 },
  target: { color: chartColors.target, width: 1.5, dashed: true },
} as const;

/** Sub k's trace style (0-based): amber and brown alternate, and from the third sub on they are dashed so each stays apart. */
export function subTraceStyle(k: number): { color: string; width: number; dashed?: boolean } {
  const base = k % 2 ? traceStyles.sub2 : traceStyles.sub;
  return k >= 2 ? { ...base, dashed: true } : base;
}

export type ChartStatus = 'ok' | 'warn' | 'fail';

export const statusColors: Record<ChartStatus, string> = {
  ok: chartColors.ok,
  warn: chartColors.warn,
  fail: chartColors.fail,
};

export const statusWords: Record<ChartStatus, string> = {
  ok: 'OK',
  warn: 'Warning',
  fail: 'Fails',
};

/** `projector` scales type and lines up for the Presenter view on a 1920×1080 screen. */
export type ChartEmphasis = 'default' | 'projector';

export interface ChartMetrics {
  /** Tick and label type, px. */
  fontPx: number;
  /** Multiplier for line widths. */
  lineScale: number;
  /** Multiplier for margins and marker sizes. */
  space: number;
}

export function chartMetrics(emphasis: ChartEmphasis = 'default'): ChartMetrics {
  return emphasis === 'projector'
    ? { fontPx: 20, lineScale: 1.8, space: 1.7 }
    : { fontPx: 12, lineScale: 1, space: 1 };
}

// The var() fallback (not a font list after var()) is what applies when the variable is unset,
// e.g. in a downloaded SVG file opened outside the app.
export const fontSans = 'var(--font-sans, system-ui, sans-serif)';
export const fontMono = 'var(--font-mono, ui-monospace, monospace)';

/** Inline style for numbers: monospace with tabular figures so read-outs do not jitter. */
export const numberStyle = { fontFamily: fontMono, fontVariantNumeric: 'tabular-nums' } as const;
