'use client';

import { useId, useMemo, useState } from 'react';
import type { Ref } from 'react';
import { scaleLinear, scaleLog } from 'd3-scale';
import { Legend } from './legend';
import { finiteExtent, nearestIndex, tracePath } from './series';
import { formatNumber, formatValue } from './format';
import { chartColors, chartMetrics, fontMono, fontSans, numberStyle } from './theme';
import type { ChartEmphasis } from './theme';
import { useContainerWidth } from './use-container-width';
import { useCrosshair } from './use-crosshair';

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

const DEFAULT_ASPECT = 0.5;

function domId(raw: string): string {
  return `c${raw.replace(/[^a-zA-Z0-9_-]/g, '')}`;
}

function decimalsForStep(step: number): number {
  if (!(step > 0) || step >= 1) return 0;
  return Math.min(6, Math.ceil(-Math.log10(step) - 1e-9));
}

function axisTitle(label: string | undefined, unit: string | undefined): string {
  if (!label) return unit ?? '';
  return unit ? `${label} (${unit === '°' ? 'degrees' : unit})` : label;
}

/** The shared engine behind FrequencyPlot and XYPlot; use those. */
export function LinePlot(props: LinePlotProps) {
  const {
    traces,
    title,
    description,
    yLabel,
    yUnit,
    yDomain,
    yTicks,
    valueDigits = 1,
    references = [],
    markers = [],
    bands = [],
    points = [],
    showLegend = true,
    emphasis = 'default',
    aspect = DEFAULT_ASPECT,
    x,
    xScaleKind,
    xDomain,
    xLabel,
    formatX,
    breakJumpsOver,
    ref,
    className,
  } = props;

  const m = chartMetrics(emphasis);
  const uid = domId(useId());
  const { ref: containerRef, widthPx } = useContainerWidth<HTMLDivElement>(640, props.widthPx);

  // Legend state: controlled by `hidden` + `onToggle`, or owned here.
  const [ownHidden, setOwnHidden] = useState<ReadonlySet<string>>(() => new Set(props.defaultHidden ?? []));
  const hidden = props.hidden ?? ownHidden;
  const toggle = (id: string) => {
    if (props.hidden === undefined) {
      setOwnHidden((prev) => {
        const next = new Set(prev);
        if (next.has(id)) next.delete(id);
        else next.add(id);
        return next;
      });
    }
    props.onToggle?.(id);
  };
  const visible = traces.filter((t) => !hidden.has(t.id));

  // y range from every trace (not only the visible ones) so toggling does not rescale the axis.
  const yRange = useMemo((): [number, number] => {
    if (yDomain) return [yDomain[0], yDomain[1]];
    const extent = finiteExtent([...traces.map((t) => t.values), references.map((r) => r.value), points.map((p) => p.y)]);
    if (!extent) return [0, 1];
    const [lo, hi] = extent;
    if (lo === hi) return [lo - 1, hi + 1];
    const pad = (hi - lo) * 0.05;
    return [lo - pad, hi + pad];
  }, [yDomain, traces, references, points]);

  const heightPx =
    props.heightPx ?? Math.round(Math.min(520 * m.space, Math.max(200 * m.space, widthPx * aspect)));

  // Margins: room for the y tick labels (monospace, ≈0.62 em a character) and the axis titles.
  const yScaleProbe = scaleLinear().domain(yRange);
  if (!yDomain) yScaleProbe.nice();
  const innerGuess = heightPx - (16 + 2.6 * m.fontPx + 14) * m.space;
  const yTickValues = yTicks ? [...yTicks] : yScaleProbe.ticks(Math.max(3, Math.round(innerGuess / (36 * m.space))));
  const yStep = yTickValues.length > 1 ? Math.abs((yTickValues[1] ?? 0) - (yTickValues[0] ?? 0)) : 1;
  const yTickDigits = decimalsForStep(yStep);
  const yTickLabels = yTickValues.map((v) => formatNumber(v, yTickDigits));
  // At least four characters ("−180", "−30", "12.5") so stacked plots' plot areas line up.
  const maxChars = Math.max(props.yAxisChars ?? 4, ...yTickLabels.map((s) => s.length));
  const margin = {
    top: 12 * m.space + (markers.some((k) => k.label) || bands.some((b) => b.label) ? m.fontPx + 4 : 0),
    right: 14 * m.space,
    bottom: 2.6 * m.fontPx + 14 * m.space,
    left: maxChars * m.fontPx * 0.62 + 10 * m.space + (yLabel || yUnit ? m.fontPx + 8 : 0),
  };
  const innerW = Math.max(40, widthPx - margin.left - margin.right);
  const innerH = Math.max(40, heightPx - margin.top - margin.bottom);

  const xScale =
    xScaleKind === 'log'
      ? scaleLog().domain([xDomain[0], xDomain[1]]).range([0, innerW])
      : scaleLinear().domain([xDomain[0], xDomain[1]]).range([0, innerW]);
  const yScale = yScaleProbe.copy().range([innerH, 0]);
  const xPx = (v: number) => xScale(v);
  const yPx = (v: number) => yScale(v);
  const ticks = props.xTicks(innerW, m.fontPx);

  const crosshair = useCrosshair({
    value: props.cursor,
    onChange: props.onCursor,
    widthPx,
    bounds: [xDomain[0], xDomain[1]],
    pxToValue: (px) => {
      const inner = px - margin.left;
      if (inner < -4 || inner > innerW + 4) return null;
      return xScale.invert(Math.min(innerW, Math.max(0, inner)));
    },
    // The first key press puts the cursor at the start point; later ones move it.
    step: (current, direction, large) => (current === null ? props.startX : props.stepX(current, direction, large)),
  });

  const cursorIndex = crosshair.cursor === null ? -1 : nearestIndex(x, crosshair.cursor, xScaleKind === 'log');
  const cursorX = cursorIndex >= 0 ? (x[cursorIndex] ?? NaN) : NaN;
  const cursorShown = Number.isFinite(cursorX) && cursorX >= xDomain[0] && cursorX <= xDomain[1];
  const readings = visible.map((t) => ({ trace: t, value: cursorShown ? (t.values[cursorIndex] ?? NaN) : NaN }));

  const xDefined = xScaleKind === 'log' ? (v: number) => v > 0 : undefined;
  const lw = (w: number) => w * m.lineScale;
  const font = m.fontPx;
  const titleId = `${uid}-title`;
  const descId = `${uid}-desc`;
  const clipId = `${uid}-clip`;
  const autoDesc = `${xLabel} from ${formatX(xDomain[0])} to ${formatX(xDomain[1])}; ${axisTitle(yLabel, yUnit) || 'values'} from ${formatNumber(yScale.domain()[0] ?? NaN, yTickDigits)} to ${formatNumber(yScale.domain()[1] ?? NaN, yTickDigits)}. Traces: ${visible.map((t) => t.label).join(', ') || 'none shown'}.`;

  // Legend drawn into the SVG only for downloads (the page shows the HTML buttons instead).
  const exportLegend = (() => {
    const rowH = font + 10;
    let cx = margin.left;
    let row = 0;
    const items: { t: (typeof visible)[number]; x: number; y: number }[] = [];
    for (const t of visible) {
      const w = 26 + (t.label.length + (t.note ? t.note.length + 3 : 0)) * font * 0.6 + 16;
      if (cx + w > widthPx - margin.right && cx > margin.left) {
        row += 1;
        cx = margin.left;
      }
      items.push({ t, x: cx, y: row * rowH + rowH / 2 });
      cx += w;
    }
    return { items, heightPx: items.length ? (row + 1) * rowH + 8 : 0 };
  })();

  const keyHint = 'Arrow keys move the read-out.';

  return (
    <div ref={containerRef} className={['w-full', className].filter(Boolean).join(' ')} data-chart="line">
      <Readout
        cursorLabel={cursorShown ? formatX(cursorX) : null}
        readings={readings.map((r) => ({ id: r.trace.id, label: r.trace.label, color: r.trace.color, text: formatValue(r.value, yUnit, valueDigits) }))}
        fontPx={font}
      />
      <svg
        ref={ref}
        xmlns="http://www.w3.org/2000/svg"
        width={widthPx}
        height={heightPx}
        viewBox={`0 0 ${widthPx} ${heightPx}`}
        role="img"
        aria-labelledby={titleId}
        aria-describedby={descId}
        tabIndex={0}
        data-export-extra-height={exportLegend.heightPx}
        className="block h-auto w-full touch-pan-y select-none focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-[#18202A]"
        style={{ fontFamily: fontSans, fontSize: font }}
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
          <g data-part="grid" aria-hidden="true">
            {ticks.minor.map((v) => (
              <line key={`n${v}`} data-minor-tick={v} x1={xPx(v)} x2={xPx(v)} y1={0} y2={innerH} stroke={chartColors.gridMinor} strokeWidth={1} />
            ))}
            {ticks.major.map((t) => (
              <line key={`j${t.value}`} x1={xPx(t.value)} x2={xPx(t.value)} y1={0} y2={innerH} stroke={chartColors.grid} strokeWidth={1} />
            ))}
            {yTickValues.map((v) => (
              <line key={`y${v}`} x1={0} x2={innerW} y1={yPx(v)} y2={yPx(v)} stroke={chartColors.grid} strokeWidth={1} />
            ))}
          </g>

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

          <g data-part="references">
            {references.map((r, i) => {
              const y = yPx(r.value);
              if (!Number.isFinite(y) || y < 0 || y > innerH) return null;
              const color = r.color ?? chartColors.target;
              return (
                <g key={`r${i}`} data-reference={r.value}>
                  <line x1={0} x2={innerW} y1={y} y2={y} stroke={color} strokeWidth={lw(1.5)} strokeDasharray={r.dashed === false ? undefined : `${6 * m.lineScale} ${4 * m.lineScale}`} />
                  {r.label ? (
                    <text x={innerW - 4} y={y - 4} textAnchor="end" fill={color}>
                      {r.label}
                    </text>
                  ) : null}
                </g>
              );
            })}
          </g>

          <g data-part="markers">
            {markers.map((k, i) => {
              if (k.x < xDomain[0] || k.x > xDomain[1]) return null;
              const xm = xPx(k.x);
              const color = k.color ?? chartColors.target;
              return (
                <g key={`k${i}`} data-marker={k.x}>
                  <line x1={xm} x2={xm} y1={0} y2={innerH} stroke={color} strokeWidth={lw(1.25)} strokeDasharray={k.dashed ? `${4 * m.lineScale} ${3 * m.lineScale}` : undefined} />
                  {k.label ? (
                    <text x={xm} y={-6} textAnchor={xm > innerW * 0.85 ? 'end' : xm < innerW * 0.15 ? 'start' : 'middle'} fill={color}>
                      {k.label}
                    </text>
                  ) : null}
                </g>
              );
            })}
          </g>

          <g data-part="traces" clipPath={`url(#${clipId})`}>
            {visible.map((t) => (
              <path
                key={t.id}
                data-trace={t.id}
                d={tracePath(x, t.values, xPx, yPx, { breakJumpsOver, xDefined })}
                fill="none"
                stroke={t.color}
                strokeWidth={lw(t.width ?? 2)}
                strokeDasharray={t.dashed ? `${7 * m.lineScale} ${4 * m.lineScale}` : undefined}
                strokeLinejoin="round"
                strokeLinecap="round"
              />
            ))}
          </g>

          <g data-part="points">
            {points.map((p, i) => {
              const px = xPx(p.x);
              const py = yPx(p.y);
              if (!Number.isFinite(px) || !Number.isFinite(py)) return null;
              const color = p.color ?? chartColors.ink;
              const right = px > innerW * 0.7;
              return (
                <g key={`p${i}`} data-point={p.label}>
                  <circle cx={px} cy={py} r={5 * m.space} fill={color} stroke={chartColors.surface} strokeWidth={2 * m.lineScale} />
                  <text x={px + (right ? -9 : 9) * m.space} y={py - 8 * m.space} textAnchor={right ? 'end' : 'start'} fill={color} fontWeight={600} paintOrder="stroke" stroke={chartColors.surface} strokeWidth={3} strokeLinejoin="round">
                    {p.label}
                  </text>
                </g>
              );
            })}
          </g>

          <g data-part="x-axis" aria-hidden="true">
            <line x1={0} x2={innerW} y1={innerH} y2={innerH} stroke={chartColors.axis} strokeWidth={1} />
            {ticks.major.map((t) => (
              <g key={`xt${t.value}`} transform={`translate(${xPx(t.value)},${innerH})`}>
                <line y1={0} y2={5 * m.space} stroke={chartColors.axis} strokeWidth={1} />
                <text data-x-tick={t.value} y={5 * m.space + font + 1} textAnchor="middle" fill={chartColors.inkMuted} style={numberStyle}>
                  {t.label}
                </text>
              </g>
            ))}
            <text x={innerW / 2} y={innerH + 5 * m.space + 2 * font + 8 * m.space} textAnchor="middle" fill={chartColors.ink}>
              {xLabel}
            </text>
          </g>

          <g data-part="y-axis" aria-hidden="true">
            <line x1={0} x2={0} y1={0} y2={innerH} stroke={chartColors.axis} strokeWidth={1} />
            {yTickValues.map((v, i) => (
              <text key={`yt${v}`} data-y-tick={v} x={-6 * m.space} y={yPx(v)} dy="0.32em" textAnchor="end" fill={chartColors.inkMuted} style={numberStyle}>
                {yTickLabels[i]}
              </text>
            ))}
            {yLabel || yUnit ? (
              <text transform={`translate(${-margin.left + font},${innerH / 2}) rotate(-90)`} textAnchor="middle" fill={chartColors.ink}>
                {axisTitle(yLabel, yUnit)}
              </text>
            ) : null}
          </g>

          {cursorShown ? (
            <g data-part="crosshair" data-export-exclude="" aria-hidden="true" pointerEvents="none">
              <line x1={xPx(cursorX)} x2={xPx(cursorX)} y1={0} y2={innerH} stroke={chartColors.ink} strokeOpacity={0.55} strokeWidth={lw(1)} />
              {readings.map(({ trace, value }) => {
                const cy = yPx(value);
                if (!Number.isFinite(value) || cy < 0 || cy > innerH) return null;
                return <circle key={trace.id} cx={xPx(cursorX)} cy={cy} r={3.5 * m.space} fill={trace.color} stroke={chartColors.surface} strokeWidth={1.5 * m.lineScale} />;
              })}
            </g>
          ) : null}
        </g>

        {exportLegend.heightPx > 0 ? (
          <g data-export-only="" visibility="hidden" transform={`translate(0,${heightPx})`}>
            <rect x={0} y={0} width={widthPx} height={exportLegend.heightPx} fill={chartColors.surface} />
            {exportLegend.items.map(({ t, x: lx, y: ly }) => (
              <g key={t.id} transform={`translate(${lx},${ly})`}>
                <line x1={0} x2={20} y1={0} y2={0} stroke={t.color} strokeWidth={lw(t.width ?? 2)} strokeDasharray={t.dashed ? '5 3' : undefined} />
                <text x={26} y={0} dy="0.32em" fill={chartColors.ink}>
                  {t.note ? `${t.label} (${t.note})` : t.label}
                </text>
              </g>
            ))}
          </g>
        ) : null}
      </svg>
      {showLegend && traces.length > 0 ? (
        <div className="mt-1">
          <Legend items={traces} hidden={hidden} onToggle={toggle} emphasis={emphasis} label={`Traces of ${title}`} />
        </div>
      ) : null}
    </div>
  );
}

interface ReadoutProps {
  cursorLabel: string | null;
  readings: { id: string; label: string; color: string; text: string }[];
  fontPx: number;
}

/** The read-out row above a plot: x at the cursor, then every visible trace's value. */
function Readout({ cursorLabel, readings, fontPx }: ReadoutProps) {
  return (
    <div className="flex min-h-7 flex-wrap items-baseline gap-x-4 gap-y-0.5 text-[#18202A]" style={{ fontSize: fontPx + 1 }} data-part="readout">
      {cursorLabel === null ? (
        <span className="text-[#4B5563]">Hover, touch or focus the plot to read values.</span>
      ) : (
        <>
          <span className="font-semibold" style={numberStyle}>
            {cursorLabel}
          </span>
          {readings.map((r) => (
            <span key={r.id} className="inline-flex items-baseline gap-1.5" data-reading={r.id}>
              <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-sm" style={{ background: r.color }} />
              <span>{r.label}</span>
              <span style={{ ...numberStyle, fontFamily: fontMono }}>{r.text}</span>
            </span>
          ))}
        </>
      )}
    </div>
  );
}
