import { traceDash } from './coincident-traces';
import type { LinePlotLayout } from './line-plot-layout';
import type { PlotTrace } from './plot-types';
import { chartColors, numberStyle } from './theme';
import type { ChartMetrics } from './theme';

/** The axes, the crosshair and the download-only legend of a line plot. */

interface AxisProps {
  layout: LinePlotLayout;
  metrics: ChartMetrics;
}

/** The x axis line, its labelled ticks and its title. */
export function PlotXAxis({ layout, metrics: m, title }: AxisProps & { title: string }) {
  const { innerWidthPx: innerW, innerHeightPx: innerH } = layout;
  return (
    <g data-part="x-axis" aria-hidden="true">
      <line x1={0} x2={innerW} y1={innerH} y2={innerH} stroke={chartColors.axis} strokeWidth={1} />
      {layout.xTicks.major.map((t) => (
        <g key={`xt${t.value}`} transform={`translate(${t.px},${innerH})`}>
          <line y1={0} y2={5 * m.space} stroke={chartColors.axis} strokeWidth={1} />
          <text data-x-tick={t.value} y={5 * m.space + m.fontPx + 1} textAnchor="middle" fill={chartColors.inkMuted} style={numberStyle}>
            {t.label}
          </text>
        </g>
      ))}
      <text x={innerW / 2} y={innerH + 5 * m.space + 2 * m.fontPx + 8 * m.space} textAnchor="middle" fill={chartColors.ink}>
        {title}
      </text>
    </g>
  );
}

/** The y axis line, its tick labels and (when given) its rotated title. */
export function PlotYAxis({ layout, metrics: m, title }: AxisProps & { title: string | null }) {
  const { innerHeightPx: innerH } = layout;
  return (
    <g data-part="y-axis" aria-hidden="true">
      <line x1={0} x2={0} y1={0} y2={innerH} stroke={chartColors.axis} strokeWidth={1} />
      {layout.yTicks.map((t) => (
        <text key={`yt${t.value}`} data-y-tick={t.value} x={-6 * m.space} y={t.px} dy="0.32em" textAnchor="end" fill={chartColors.inkMuted} style={numberStyle}>
          {t.label}
        </text>
      ))}
      {title !== null ? (
        <text transform={`translate(${-layout.margin.left + m.fontPx},${innerH / 2}) rotate(-90)`} textAnchor="middle" fill={chartColors.ink}>
          {title}
        </text>
      ) : null}
    </g>
  );
}

/** The vertical crosshair at `xValue` with a dot on every reading inside the plot area; left out of downloads. */
export function PlotCrosshair({ layout, metrics: m, xValue, readings }: AxisProps & { xValue: number; readings: readonly { trace: PlotTrace; value: number }[] }) {
  const { innerHeightPx: innerH } = layout;
  const x = layout.xPx(xValue);
  return (
    <g data-part="crosshair" data-export-exclude="" aria-hidden="true" pointerEvents="none">
      <line x1={x} x2={x} y1={0} y2={innerH} stroke={chartColors.ink} strokeOpacity={0.55} strokeWidth={m.lineScale} />
      {readings.map(({ trace, value }) => {
        const cy = layout.yPx(value);
        if (!Number.isFinite(value) || cy < 0 || cy > innerH) return null;
        return <circle key={trace.id} cx={x} cy={cy} r={3.5 * m.space} fill={trace.color} stroke={chartColors.surface} strokeWidth={1.5 * m.lineScale} />;
      })}
    </g>
  );
}

/** The legend drawn below the plot only in downloaded files (hidden on the page). */
export function ExportLegend({ layout, metrics: m, traces, widthPx }: AxisProps & { traces: readonly PlotTrace[]; widthPx: number }) {
  const legend = layout.exportLegend;
  if (legend.heightPx <= 0) return null;
  return (
    <g data-export-only="" visibility="hidden" transform={`translate(0,${layout.heightPx})`}>
      <rect x={0} y={0} width={widthPx} height={legend.heightPx} fill={chartColors.surface} />
      {traces.map((t, i) => {
        const at = legend.items[i];
        if (!at) return null;
        return (
          <g key={t.id} transform={`translate(${at.xPx},${at.yPx})`}>
            <line x1={0} x2={20} y1={0} y2={0} stroke={t.color} strokeWidth={(t.width ?? 2) * m.lineScale} {...traceDash(t, 0.75, '5 3')} />
            <text x={26} y={0} dy="0.32em" fill={chartColors.ink}>
              {t.note ? `${t.label} (${t.note})` : t.label}
            </text>
          </g>
        );
      })}
    </g>
  );
}
