import { traceDash } from './coincident-traces';
import type { LinePlotLayout } from './line-plot-layout';
import type { PlotTrace, PointMarker, ReferenceLine, XBand, XMarker } from './plot-types';
import { tracePath } from './series';
import { chartColors } from './theme';
import type { ChartMetrics } from './theme';

/** The layers inside a line plot's area, back to front: grid, bands, references, markers, traces, points. */

interface LayerProps {
  layout: LinePlotLayout;
  metrics: ChartMetrics;
}

/** Vertical grid lines at the minor and major x ticks, horizontal ones at the y ticks. */
export function PlotGrid({ layout }: { layout: LinePlotLayout }) {
  const { innerWidthPx: innerW, innerHeightPx: innerH } = layout;
  return (
    <g data-part="grid" aria-hidden="true">
      {layout.xTicks.minor.map((t) => (
        <line key={`n${t.value}`} data-minor-tick={t.value} x1={t.px} x2={t.px} y1={0} y2={innerH} stroke={chartColors.gridMinor} strokeWidth={1} />
      ))}
      {layout.xTicks.major.map((t) => (
        <line key={`j${t.value}`} x1={t.px} x2={t.px} y1={0} y2={innerH} stroke={chartColors.grid} strokeWidth={1} />
      ))}
      {layout.yTicks.map((t) => (
        <line key={`y${t.value}`} x1={0} x2={innerW} y1={t.px} y2={t.px} stroke={chartColors.grid} strokeWidth={1} />
      ))}
    </g>
  );
}

/** Shaded x ranges with edge lines and an optional label above the plot area. */
export function PlotBands({ layout, metrics, bands }: LayerProps & { bands: readonly XBand[] }) {
  const { innerWidthPx: innerW, innerHeightPx: innerH, xPx } = layout;
  const lw = (w: number) => w * metrics.lineScale;
  return (
    <g data-part="bands">
      {bands.map((b, i) => {
        const x0 = Math.max(0, Math.min(innerW, xPx(Math.min(b.from, b.to))));
        const x1 = Math.max(0, Math.min(innerW, xPx(Math.max(b.from, b.to))));
        const color = b.color ?? chartColors.band;
        return (
          <g key={`b${i}`} data-band={b.label ?? ''}>
            <rect x={x0} y={0} width={Math.max(0, x1 - x0)} height={innerH} fill={color} fillOpacity={0.12} />
            <line x1={x0} x2={x0} y1={0} y2={innerH} stroke={color} strokeOpacity={0.5} strokeWidth={lw(1)} />
            <line x1={x1} x2={x1} y1={0} y2={innerH} stroke={color} strokeOpacity={0.5} strokeWidth={lw(1)} />
            {b.label ? (
              <text x={(x0 + x1) / 2} y={-6} textAnchor="middle" fill={color} fontWeight={600}>
                {b.label}
              </text>
            ) : null}
          </g>
        );
      })}
    </g>
  );
}

/** Horizontal reference lines (dashed unless `dashed: false`), labelled at the right end. */
export function PlotReferences({ layout, metrics, references }: LayerProps & { references: readonly ReferenceLine[] }) {
  const { innerWidthPx: innerW, innerHeightPx: innerH, yPx } = layout;
  return (
    <g data-part="references">
      {references.map((r, i) => {
        const y = yPx(r.value);
        if (!Number.isFinite(y) || y < 0 || y > innerH) return null;
        const color = r.color ?? chartColors.target;
        return (
          <g key={`r${i}`} data-reference={r.value}>
            <line x1={0} x2={innerW} y1={y} y2={y} stroke={color} strokeWidth={1.5 * metrics.lineScale} strokeDasharray={r.dashed === false ? undefined : `${6 * metrics.lineScale} ${4 * metrics.lineScale}`} />
            {r.label ? (
              <text x={innerW - 4} y={y - 4} textAnchor="end" fill={color}>
                {r.label}
              </text>
            ) : null}
          </g>
        );
      })}
    </g>
  );
}

/** Vertical markers inside the x domain, labelled above the plot area (kept inside near the edges). */
export function PlotMarkers({ layout, metrics, markers, xDomain }: LayerProps & { markers: readonly XMarker[]; xDomain: readonly [number, number] }) {
  const { innerWidthPx: innerW, innerHeightPx: innerH, xPx } = layout;
  return (
    <g data-part="markers">
      {markers.map((k, i) => {
        if (k.x < xDomain[0] || k.x > xDomain[1]) return null;
        const xm = xPx(k.x);
        const color = k.color ?? chartColors.target;
        return (
          <g key={`k${i}`} data-marker={k.x}>
            <line x1={xm} x2={xm} y1={0} y2={innerH} stroke={color} strokeWidth={1.25 * metrics.lineScale} strokeDasharray={k.dashed ? `${4 * metrics.lineScale} ${3 * metrics.lineScale}` : undefined} />
            {k.label ? (
              <text x={xm} y={-6} textAnchor={xm > innerW * 0.85 ? 'end' : xm < innerW * 0.15 ? 'start' : 'middle'} fill={color}>
                {k.label}
              </text>
            ) : null}
          </g>
        );
      })}
    </g>
  );
}

/** One path per visible trace, clipped to the plot area. */
export function PlotTraces({ layout, metrics, traces, x, clipId, breakJumpsOver, xDefined }: LayerProps & { traces: readonly PlotTrace[]; x: ArrayLike<number>; clipId: string; breakJumpsOver?: number; xDefined?: (x: number) => boolean }) {
  return (
    <g data-part="traces" clipPath={`url(#${clipId})`}>
      {traces.map((t) => (
        <path
          key={t.id}
          data-trace={t.id}
          d={tracePath(x, t.values, layout.xPx, layout.yPx, { breakJumpsOver, xDefined })}
          fill="none"
          stroke={t.color}
          strokeWidth={(t.width ?? 2) * metrics.lineScale}
          {...traceDash(t, metrics.lineScale, `${7 * metrics.lineScale} ${4 * metrics.lineScale}`)}
          strokeLinejoin="round"
          strokeLinecap="round"
        />
      ))}
    </g>
  );
}

/** Labelled points; the label goes to the left of points in the right 30 % of the plot. */
export function PlotPoints({ layout, metrics, points }: LayerProps & { points: readonly PointMarker[] }) {
  const { innerWidthPx: innerW, xPx, yPx } = layout;
  return (
    <g data-part="points">
      {points.map((p, i) => {
        const px = xPx(p.x);
        const py = yPx(p.y);
        if (!Number.isFinite(px) || !Number.isFinite(py)) return null;
        const color = p.color ?? chartColors.ink;
        const right = px > innerW * 0.7;
        return (
          <g key={`p${i}`} data-point={p.label}>
            <circle cx={px} cy={py} r={5 * metrics.space} fill={color} stroke={chartColors.surface} strokeWidth={2 * metrics.lineScale} />
            <text x={px + (right ? -9 : 9) * metrics.space} y={py - 8 * metrics.space} textAnchor={right ? 'end' : 'start'} fill={color} fontWeight={600} paintOrder="stroke" stroke={chartColors.surface} strokeWidth={3} strokeLinejoin="round">
              {p.label}
            </text>
          </g>
        );
      })}
    </g>
  );
}
