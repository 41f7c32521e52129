/**
 * Seamline plot colours and sizes (SPEC §7). One place for every colour a chart draws, so the
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
} as const;

/** Ready-made trace styles; spread into a trace: `{ id: 'sum', label: 'Sum', values, ...traceStyles.sum }`. */
export const traceStyles = {
  mains: { color: chartColors.mains, width: 2 },
  sub: { color: chartColors.sub, width: 2 },
  sub2: { color: chartColors.sub2, width: 2 },
  sum: { color: chartColors.sum, width: 3 },
  target: { color: chartColors.target, width: 1.5, dashed: true },
} as const;

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
