import type { Ref } from 'react';
import type { ChartEmphasis } from './theme';

/** The data shapes a line plot draws: traces, reference lines, markers, bands, points and axis ticks. */

/** One drawn series over the plot's shared x samples. */
export interface PlotTrace {
  id: string;
  label: string;
  color: string;
  /** One value per x sample; NaN/±Infinity leave a gap. */
  values: ArrayLike<number>;
  /** Stroke width in px before emphasis scaling (default 2; the sum ≈ 3). */
  width?: number;
  dashed?: boolean;
  /** Short qualifier shown in the legend, e.g. "minimum phase, estimated". */
  note?: string;
  /** Set by the plot for a trace that coincides with an earlier one (see markCoincidentTraces). */
  dash?: TraceDash;
}

/** An explicit dash pattern, px before emphasis scaling: dash, gap, and where the pattern starts. */
export interface TraceDash {
  dashPx: number;
  gapPx: number;
  offsetPx: number;
}

/** Horizontal line at a y value, e.g. the flat target at 0 dB. */
export interface ReferenceLine {
  value: number;
  label?: string;
  color?: string;
  /** Default true (targets are dashed slate). */
  dashed?: boolean;
}

/** Vertical line at an x value, e.g. the crossover frequency. */
export interface XMarker {
  x: number;
  label?: string;
  color?: string;
  dashed?: boolean;
}

/** Shaded x range, e.g. the Timing window. */
export interface XBand {
  from: number;
  to: number;
  label?: string;
  color?: string;
}

/** A labelled point, e.g. the recommended sub delay. */
export interface PointMarker {
  x: number;
  y: number;
  label: string;
  color?: string;
}

export interface AxisTicks {
  major: { value: number; label: string }[];
  minor: number[];
}

/** Props shared by FrequencyPlot and XYPlot. */
export interface CommonPlotProps {
  traces: readonly PlotTrace[];
  /** Accessible name of the plot (also its SVG `<title>`). */
  title: string;
  /** Longer text for the SVG `<desc>`. */
  description?: string;
  yLabel?: string;
  /** Unit for the y axis label and read-out, e.g. "dB", "°", "ms". */
  yUnit?: string;
  /** Fixed y range; default: the extent of all traces and reference lines, rounded outwards. */
  yDomain?: readonly [number, number];
  /** Explicit y tick values (default: about one every 36 px). */
  yTicks?: readonly number[];
  /**
   * Width reserved for y tick labels, in characters (default 4). Give stacked plots the same
   * value so their plot areas line up under one shared crosshair.
   */
  yAxisChars?: number;
  /** Decimals in the read-out (default 1). */
  valueDigits?: number;
  references?: readonly ReferenceLine[];
  /** Controlled set of hidden trace ids; pair with `onToggle`. */
  hidden?: ReadonlySet<string>;
  /** Trace ids hidden at first when the plot owns the legend state. */
  defaultHidden?: Iterable<string>;
  onToggle?: (id: string) => void;
  /** Default true. */
  showLegend?: boolean;
  /** Fixed width in px (default: the container's width). */
  widthPx?: number;
  /** Fixed height in px (default: width × aspect, within 200–520 px). */
  heightPx?: number;
  /** Height ÷ width when heightPx is not given (default 0.5). */
  aspect?: number;
  emphasis?: ChartEmphasis;
  /** The rendered `<svg>`, e.g. for ChartExportButtons. */
  ref?: Ref<SVGSVGElement>;
  className?: string;
}

export interface LinePlotProps extends CommonPlotProps {
  x: ArrayLike<number>;
  xScaleKind: 'log' | 'linear';
  xDomain: readonly [number, number];
  xTicks: (innerWidthPx: number, fontPx: number) => AxisTicks;
  xLabel: string;
  formatX: (x: number) => string;
  stepX: (current: number, direction: 1 | -1, large: boolean) => number;
  /** Where keyboard navigation starts. */
  startX: number;
  breakJumpsOver?: number;
  markers?: readonly XMarker[];
  bands?: readonly XBand[];
  points?: readonly PointMarker[];
  cursor?: number | null;
  onCursor?: (x: number | null) => void;
}
