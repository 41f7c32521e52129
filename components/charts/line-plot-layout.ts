import { scaleLinear, scaleLog } from 'd3-scale';
import { formatNumber } from './format';
import type { AxisTicks } from './plot-types';
import { finiteExtent } from './series';
import type { ChartMetrics } from './theme';

/**
 * Everything a line plot computes from its data and size before drawing: the y range, the
 * margins, the pixel scales, the ticks with their labels and positions, and where the legend
 * drawn into a downloaded SVG goes. Pure, so a plot is a function of its props (see LinePlot).
 */

export interface LinePlotLayoutInput {
  /** SVG width, px. */
  widthPx: number;
  /** Fixed SVG height, px; default widthPx × aspect within 200–520 px (× metrics.space). */
  heightPx?: number;
  /** Height ÷ width when heightPx is not given. */
  aspect: number;
  metrics: ChartMetrics;
  /** The data range of y (see plotYRange). */
  yRange: readonly [number, number];
  /** A fixed y domain is used as given; an automatic one is rounded outwards to nice values. */
  yFixed: boolean;
  /** Explicit y tick values (default: about one every 36 px). */
  yTicks?: readonly number[];
  /** Characters reserved for the y tick labels (default 4). */
  yAxisChars?: number;
  /** Whether a y axis title is drawn (room for it on the left). */
  yTitle: boolean;
  /** Whether markers or bands carry labels (room for them above the plot area). */
  topLabels: boolean;
  xScaleKind: 'log' | 'linear';
  xDomain: readonly [number, number];
  xTicks: (innerWidthPx: number, fontPx: number) => AxisTicks;
  /** The visible traces, in legend order. */
  legend: readonly { label: string; note?: string }[];
}

export interface PlacedTick {
  value: number;
  label: string;
  /** Position along the axis inside the plot area, px. */
  px: number;
}

export interface LinePlotLayout {
  heightPx: number;
  margin: { top: number; right: number; bottom: number; left: number };
  innerWidthPx: number;
  innerHeightPx: number;
  /** The y domain after rounding outwards. */
  yDomain: [number, number];
  xPx: (x: number) => number;
  yPx: (y: number) => number;
  /** The x value at a px inside the plot area. */
  xAt: (px: number) => number;
  xTicks: { major: PlacedTick[]; minor: { value: number; px: number }[] };
  yTicks: PlacedTick[];
  /** Decimals of the y tick labels (from the tick step). */
  yTickDigits: number;
  /** Legend rows for downloads: one item per legend entry, at (xPx, yPx) below the plot. */
  exportLegend: { items: { xPx: number; yPx: number }[]; heightPx: number };
}

/** Decimals for tick labels `step` apart, from its order of magnitude: `decimalsForStep(0.05)` → 2, `(0.25)` → 1, `(5)` → 0. */
export function decimalsForStep(step: number): number {
  if (!(step > 0) || step >= 1) return 0;
  return Math.min(6, Math.ceil(-Math.log10(step) - 1e-9));
}

/** `axisTitle('Level', 'dB')` → `"Level (dB)"`; the degree sign is written out. */
export function axisTitle(label: string | undefined, unit: string | undefined): string {
  if (!label) return unit ?? '';
  return unit ? `${label} (${unit === '°' ? 'degrees' : unit})` : label;
}

/**
 * The y data range: the fixed domain, or the extent of every trace (shown or not, so toggling
 * does not rescale), reference line and point with 5 % padding; [lo − 1, hi + 1] for one value.
 */
export function plotYRange(
  yDomain: readonly [number, number] | undefined,
  series: readonly ArrayLike<number>[],
): [number, number] {
  if (yDomain) return [yDomain[0], yDomain[1]];
  const extent = finiteExtent(series);
  if (!extent) return [0, 1];
  const [lo, hi] = extent;
  if (lo === hi) return [lo - 1, hi + 1];
  const pad = (hi - lo) * 0.05;
  return [lo - pad, hi + pad];
}

/** The layout of a line plot; see LinePlotLayout. */
export function linePlotLayout(input: LinePlotLayoutInput): LinePlotLayout {
  const { widthPx, metrics: m, xDomain } = input;
  const heightPx = input.heightPx ?? Math.round(Math.min(520 * m.space, Math.max(200 * m.space, widthPx * input.aspect)));

  // Margins: room for the y tick labels (monospace, ≈0.62 em a character) and the axis titles.
  const yScaleProbe = scaleLinear().domain(input.yRange);
  if (!input.yFixed) yScaleProbe.nice();
  const innerGuess = heightPx - (16 + 2.6 * m.fontPx + 14) * m.space;
  const yTickValues = input.yTicks ? [...input.yTicks] : yScaleProbe.ticks(Math.max(3, Math.round(innerGuess / (36 * m.space))));
  const yStep = yTickValues.length > 1 ? Math.abs((yTickValues[1] ?? 0) - (yTickValues[0] ?? 0)) : 1;
  const yTickDigits = decimalsForStep(yStep);
  const yTickLabels = yTickValues.map((v) => formatNumber(v, yTickDigits));
  // At least four characters ("−180", "−30", "12.5") so stacked plots' plot areas line up.
  const maxChars = Math.max(input.yAxisChars ?? 4, ...yTickLabels.map((s) => s.length));
  const margin = {
    top: 12 * m.space + (input.topLabels ? m.fontPx + 4 : 0),
    right: 14 * m.space,
    bottom: 2.6 * m.fontPx + 14 * m.space,
    left: maxChars * m.fontPx * 0.62 + 10 * m.space + (input.yTitle ? m.fontPx + 8 : 0),
  };
  const innerWidthPx = Math.max(40, widthPx - margin.left - margin.right);
  const innerHeightPx = Math.max(40, heightPx - margin.top - margin.bottom);

  const xScale =
    input.xScaleKind === 'log'
      ? scaleLog().domain([xDomain[0], xDomain[1]]).range([0, innerWidthPx])
      : scaleLinear().domain([xDomain[0], xDomain[1]]).range([0, innerWidthPx]);
  const yScale = yScaleProbe.copy().range([innerHeightPx, 0]);
  const xPx = (v: number) => xScale(v);
  const yPx = (v: number) => yScale(v);
  const ticks = input.xTicks(innerWidthPx, m.fontPx);
  const [yLo, yHi] = yScale.domain();

  return {
    heightPx,
    margin,
    innerWidthPx,
    innerHeightPx,
    yDomain: [yLo ?? NaN, yHi ?? NaN],
    xPx,
    yPx,
    xAt: (px) => xScale.invert(px),
    xTicks: {
      major: ticks.major.map((t) => ({ value: t.value, label: t.label, px: xPx(t.value) })),
      minor: ticks.minor.map((v) => ({ value: v, px: xPx(v) })),
    },
    yTicks: yTickValues.map((v, i) => ({ value: v, label: yTickLabels[i] ?? '', px: yPx(v) })),
    yTickDigits,
    exportLegend: exportLegendLayout(input.legend, widthPx, margin, m.fontPx),
  };
}

/**
 * The legend drawn into a downloaded SVG (the page shows HTML buttons instead): items left to
 * right from the plot's left margin, wrapping to a new row before the right margin.
 */
function exportLegendLayout(
  legend: readonly { label: string; note?: string }[],
  widthPx: number,
  margin: { left: number; right: number },
  fontPx: number,
): { items: { xPx: number; yPx: number }[]; heightPx: number } {
  const rowH = fontPx + 10;
  let cx = margin.left;
  let row = 0;
  const items: { xPx: number; yPx: number }[] = [];
  for (const t of legend) {
    // A 20 px swatch and a 6 px gap, the text (≈0.6 em a character) and 16 px before the next item.
    const w = 26 + (t.label.length + (t.note ? t.note.length + 3 : 0)) * fontPx * 0.6 + 16;
    if (cx + w > widthPx - margin.right && cx > margin.left) {
      row += 1;
      cx = margin.left;
    }
    items.push({ xPx: cx, yPx: row * rowH + rowH / 2 });
    cx += w;
  }
  return { items, heightPx: items.length ? (row + 1) * rowH + 8 : 0 };
}
