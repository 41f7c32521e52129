'use client';

import { useId, useMemo, useState } from 'react';
import { markCoincidentTraces } from './coincident-traces';
import { Legend } from './legend';
import { ExportLegend, PlotCrosshair, PlotXAxis, PlotYAxis } from './line-plot-axes';
import { PlotBands, PlotGrid, PlotMarkers, PlotPoints, PlotReferences, PlotTraces } from './line-plot-layers';
import { axisTitle, linePlotLayout, plotYRange } from './line-plot-layout';
import type { LinePlotProps } from './plot-types';
import { PlotReadout } from './plot-readout';
import { nearestIndex } from './series';
import { formatNumber, formatValue } from './format';
import { chartSvgAttributes } from './chart-svg';
import { chartColors, chartMetrics } from './theme';
import { useContainerWidth } from './use-container-width';
import { useCrosshair } from './use-crosshair';

const DEFAULT_ASPECT = 0.5;

function domId(raw: string): string {
  return `c${raw.replace(/[^a-zA-Z0-9_-]/g, '')}`;
}

/** Legend state: controlled by `hidden` + `onToggle`, or owned by the plot. */
function useHiddenTraces(hidden: ReadonlySet<string> | undefined, defaultHidden: Iterable<string> | undefined, onToggle: ((id: string) => void) | undefined) {
  const [ownHidden, setOwnHidden] = useState<ReadonlySet<string>>(() => new Set(defaultHidden ?? []));
  const toggle = (id: string) => {
    if (hidden === undefined) {
      setOwnHidden((prev) => {
        const next = new Set(prev);
        if (next.has(id)) next.delete(id);
        else next.add(id);
        return next;
      });
    }
    onToggle?.(id);
  };
  return { hidden: hidden ?? ownHidden, toggle };
}

/**
 * The shared engine behind FrequencyPlot and XYPlot; use those. The layout (scales, ticks,
 * margins, legend placement) comes from linePlotLayout; the layers only draw it.
 */
export function LinePlot(props: LinePlotProps) {
  const { traces, title, description, yLabel, yUnit, yDomain, valueDigits = 1, references = [], markers = [], bands = [], points = [], showLegend = true, emphasis = 'default', aspect = DEFAULT_ASPECT, x, xScaleKind, xDomain, xLabel, formatX, breakJumpsOver, ref, className } = props;

  const m = chartMetrics(emphasis);
  const uid = domId(useId());
  const { ref: containerRef, widthPx } = useContainerWidth<HTMLDivElement>(640, props.widthPx);
  const { hidden, toggle } = useHiddenTraces(props.hidden, props.defaultHidden, props.onToggle);
  // Identical curves hide each other: the copies say "same as …" and get an offset dash.
  const marked = useMemo(() => markCoincidentTraces(traces), [traces]);
  const visible = marked.filter((t) => !hidden.has(t.id));

  // y range from every trace (not only the visible ones) so toggling does not rescale the axis.
  const yRange = useMemo(() => plotYRange(yDomain, [...traces.map((t) => t.values), references.map((r) => r.value), points.map((p) => p.y)]), [yDomain, traces, references, points]);
  const layout = linePlotLayout({
    widthPx,
    heightPx: props.heightPx,
    aspect,
    metrics: m,
    yRange,
    yFixed: Boolean(yDomain),
    yTicks: props.yTicks,
    yAxisChars: props.yAxisChars,
    yTitle: Boolean(yLabel || yUnit),
    topLabels: markers.some((k) => k.label) || bands.some((b) => b.label),
    xScaleKind,
    xDomain,
    xTicks: props.xTicks,
    legend: visible,
  });
  const { margin, innerWidthPx: innerW, innerHeightPx: innerH, heightPx } = layout;

  const crosshair = useCrosshair({
    value: props.cursor,
    onChange: props.onCursor,
    widthPx,
    bounds: [xDomain[0], xDomain[1]],
    pxToValue: (px) => {
      const inner = px - margin.left;
      if (inner < -4 || inner > innerW + 4) return null;
      return layout.xAt(Math.min(innerW, Math.max(0, inner)));
    },
    // The first key press puts the cursor at the start point; later ones move it.
    step: (current, direction, large) => (current === null ? props.startX : props.stepX(current, direction, large)),
  });

  const cursorIndex = crosshair.cursor === null ? -1 : nearestIndex(x, crosshair.cursor, xScaleKind === 'log');
  const cursorX = cursorIndex >= 0 ? (x[cursorIndex] ?? NaN) : NaN;
  const cursorShown = Number.isFinite(cursorX) && cursorX >= xDomain[0] && cursorX <= xDomain[1];
  const readings = visible.map((t) => ({ trace: t, value: cursorShown ? (t.values[cursorIndex] ?? NaN) : NaN }));

  const titleId = `${uid}-title`;
  const descId = `${uid}-desc`;
  const clipId = `${uid}-clip`;
  const autoDesc = `${xLabel} from ${formatX(xDomain[0])} to ${formatX(xDomain[1])}; ${axisTitle(yLabel, yUnit) || 'values'} from ${formatNumber(layout.yDomain[0], layout.yTickDigits)} to ${formatNumber(layout.yDomain[1], layout.yTickDigits)}. Traces: ${visible.map((t) => t.label).join(', ') || 'none shown'}.`;
  const keyHint = 'Arrow keys move the read-out.';

  return (
    <div ref={containerRef} className={['w-full', className].filter(Boolean).join(' ')} data-chart="line">
      <PlotReadout
        cursorLabel={cursorShown ? formatX(cursorX) : null}
        readings={readings.map((r) => ({ id: r.trace.id, label: r.trace.label, color: r.trace.color, text: formatValue(r.value, yUnit, valueDigits) }))}
        fontPx={m.fontPx}
      />
      <svg
        ref={ref}
        {...chartSvgAttributes(uid, widthPx, heightPx, m.fontPx)}
        tabIndex={0}
        data-export-extra-height={layout.exportLegend.heightPx}
        className="block h-auto w-full touch-pan-y select-none focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-ink"
        {...crosshair.handlers}
      >
        <title id={titleId}>{title}</title>
        <desc id={descId}>{[description, autoDesc, keyHint].filter(Boolean).join(' ')}</desc>
        <defs>
          <clipPath id={clipId}>
            <rect x={0} y={0} width={innerW} height={innerH} />
          </clipPath>
        </defs>
        <rect x={0} y={0} width={widthPx} height={heightPx} fill={chartColors.surface} />
        <g transform={`translate(${margin.left},${margin.top})`}>
          <PlotGrid layout={layout} />
          <PlotBands layout={layout} metrics={m} bands={bands} />
          <PlotReferences layout={layout} metrics={m} references={references} />
          <PlotMarkers layout={layout} metrics={m} markers={markers} xDomain={xDomain} />
          <PlotTraces layout={layout} metrics={m} traces={visible} x={x} clipId={clipId} breakJumpsOver={breakJumpsOver} xDefined={xScaleKind === 'log' ? (v: number) => v > 0 : undefined} />
          <PlotPoints layout={layout} metrics={m} points={points} />
          <PlotXAxis layout={layout} metrics={m} title={xLabel} />
          <PlotYAxis layout={layout} metrics={m} title={yLabel || yUnit ? axisTitle(yLabel, yUnit) : null} />
          {cursorShown ? <PlotCrosshair layout={layout} metrics={m} xValue={cursorX} readings={readings} /> : null}
        </g>
        <ExportLegend layout={layout} metrics={m} traces={visible} widthPx={widthPx} />
      </svg>
      {showLegend && traces.length > 0 ? (
        <div className="mt-1">
          <Legend items={marked} hidden={hidden} onToggle={toggle} emphasis={emphasis} label={`Traces of ${title}`} />
        </div>
      ) : null}
    </div>
  );
}
