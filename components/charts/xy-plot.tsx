'use client';

import { scaleLinear } from 'd3-scale';
import { LinePlot } from './line-plot';
import type { AxisTicks, CommonPlotProps, PointMarker, XBand, XMarker } from './plot-types';
import { finiteExtent } from './series';
import { formatNumber, formatValue } from './format';

export interface XYPlotProps extends CommonPlotProps {
  /** Shared, ascending x samples of every trace. */
  x: ArrayLike<number>;
  xLabel: string;
  /** Unit of x for the axis title and read-out, e.g. "ms". */
  xUnit?: string;
  /** Fixed x range (default: the extent of `x`). */
  xDomain?: readonly [number, number];
  /** Decimals of x in the read-out (default 2). */
  xDigits?: number;
  /** Shaded x range, e.g. `{ from: 1.2, to: 3.4, label: 'Timing window' }`. */
  band?: XBand;
  /** Labelled points, e.g. the recommended delay. */
  points?: readonly PointMarker[];
  markers?: readonly XMarker[];
  breakJumpsOver?: number;
  /** Controlled crosshair x (null = none); share it between plots like FrequencyPlot's cursorHz. */
  cursorX?: number | null;
  onCursorX?: (x: number | null) => void;
}

/**
 * Traces over linear x and y, with an optional shaded band and labelled points, e.g. the blend
 * level at the crossover against sub delay for both polarities.
 */
export function XYPlot(props: XYPlotProps) {
  const { x, xLabel, xUnit, xDigits = 2, band, points, markers, cursorX, onCursorX, ...rest } = props;
  const extent = props.xDomain ?? finiteExtent([x]) ?? [0, 1];
  const xDomain: [number, number] = extent[0] === extent[1] ? [extent[0] - 1, extent[1] + 1] : [extent[0], extent[1]];
  const span = xDomain[1] - xDomain[0];
  const xTicks = (innerW: number, fontPx: number): AxisTicks => {
    const scale = scaleLinear().domain(xDomain);
    const values = scale.ticks(Math.max(2, Math.floor(innerW / (fontPx * 5))));
    const step = values.length > 1 ? (values[1] ?? 0) - (values[0] ?? 0) : 1;
    const digits = step > 0 && step < 1 ? Math.ceil(-Math.log10(step) - 1e-9) : 0;
    return { major: values.map((v) => ({ value: v, label: formatNumber(v, digits) })), minor: [] };
  };
  const recommended = points?.[0]?.x;
  return (
    <LinePlot
      {...rest}
      x={x}
      xScaleKind="linear"
      xDomain={xDomain}
      xTicks={xTicks}
      xLabel={xUnit ? `${xLabel} (${xUnit})` : xLabel}
      formatX={(v) => formatValue(v, xUnit, xDigits)}
      stepX={(v, direction, large) => v + (direction * span) / (large ? 20 : 200)}
      startX={recommended ?? (xDomain[0] + xDomain[1]) / 2}
      bands={band ? [band] : []}
      points={points}
      markers={markers}
      cursor={cursorX}
      onCursor={onCursorX}
    />
  );
}
