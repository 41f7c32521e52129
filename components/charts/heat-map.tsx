'use client';

import { useId, useState } from 'react';
import type { PointerEvent, Ref } from 'react';
import { scaleLinear } from 'd3-scale';
import { divergingColor } from './color-ramp';
import { finiteExtent } from './series';
import { formatNumber, formatValue } from './format';
import { chartSvgAttributes } from './chart-svg';
import { chartColors, chartMetrics, numberStyle } from './theme';
import type { ChartEmphasis } from './theme';
import { useContainerWidth } from './use-container-width';

export interface HeatMapMarker {
  /** Across the room from the left wall, m. */
  xM: number;
  /** Into the room from the front wall, m. */
  yM: number;
  label: string;
  kind: 'seat' | 'sub' | 'speaker';
}

export interface HeatMapProps {
  /**
   * Grid of values, `values[row][column]`: row 0 at the front wall (y = 0), column 0 at the left
   * wall (x = 0); cells cover the floor evenly. NaN cells are drawn grey.
   */
  values: readonly ArrayLike<number>[];
  /** Room width (x, across), m. */
  widthM: number;
  /** Room length (y, into the room), m. */
  lengthM: number;
  title: string;
  description?: string;
  /** Name of the quantity for the colour legend, e.g. "Relative pressure". */
  valueLabel?: string;
  unit?: string;
  /** Colour range; default symmetric about `center` from the largest deviation. */
  domain?: readonly [number, number];
  /** Value drawn as paper white (default 0). */
  center?: number;
  digits?: number;
  markers?: readonly HeatMapMarker[];
  widthPx?: number;
  /** Upper bound for the map's height, px (default 560); the room's aspect ratio is kept. */
  maxHeightPx?: number;
  emphasis?: ChartEmphasis;
  ref?: Ref<SVGSVGElement>;
  className?: string;
}

const MARKER_COLORS = { seat: chartColors.ink, sub: chartColors.sub, speaker: chartColors.mains } as const;

/** Colour range [low, high] for the values, symmetric about `center` unless given. */
export function heatMapDomain(values: readonly ArrayLike<number>[], center = 0, domain?: readonly [number, number]): [number, number] {
  if (domain) return [domain[0], domain[1]];
  const extent = finiteExtent(values);
  if (!extent) return [center - 1, center + 1];
  const r = Math.max(Math.abs(extent[0] - center), Math.abs(extent[1] - center)) || 1;
  return [center - r, center + r];
}

/**
 * A floor-plan map of a 2-D field (e.g. one room mode's pressure) on a diverging colour ramp,
 * with seats, subs and speakers drawn on top, metre axes and a colour legend. Front wall at top.
 */
export function HeatMap(props: HeatMapProps) {
  const { values, title, description, valueLabel = 'Value', unit, center = 0, digits = 2, markers = [], maxHeightPx = 560, emphasis = 'default', ref, className } = props;
  // While a dimension is being typed it can be 0 or empty; draw a unit square rather than fail.
  const sized = props.widthM > 0 && props.lengthM > 0 && Number.isFinite(props.widthM * props.lengthM);
  const widthM = sized ? props.widthM : 1;
  const lengthM = sized ? props.lengthM : 1;
  const m = chartMetrics(emphasis);
  const font = m.fontPx;
  const uid = `c${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const { ref: containerRef, widthPx } = useContainerWidth<HTMLDivElement>(640, props.widthPx);
  const [hover, setHover] = useState<{ xM: number; yM: number; value: number } | null>(null);

  const [lo, hi] = heatMapDomain(values, center, props.domain);
  const toT = (v: number) => (v >= center ? (hi === center ? 0 : (v - center) / (hi - center)) : center === lo ? 0 : -(center - v) / (center - lo));

  const rows = values.length;
  const cols = Math.max(0, ...values.map((r) => r.length));
  const margin = { top: font + 12 * m.space, right: 12 * m.space, bottom: 2.6 * font + 12 * m.space, left: 4 * font * 0.62 + 10 * m.space + font + 8 };
  const legendH = 2.6 * font + 24 * m.space;
  const availW = Math.max(40, widthPx - margin.left - margin.right);
  const availH = Math.max(40, maxHeightPx * m.space - margin.top - margin.bottom);
  // One scale for both axes keeps the room's proportions.
  const pxPerM = Math.min(availW / widthM, availH / lengthM);
  const mapW = widthM * pxPerM;
  const mapH = lengthM * pxPerM;
  const offsetX = margin.left + (availW - mapW) / 2;
  const heightPx = Math.round(margin.top + mapH + margin.bottom + legendH);
  const x = scaleLinear().domain([0, widthM]).range([0, mapW]);
  const y = scaleLinear().domain([0, lengthM]).range([0, mapH]);
  const xTicks = x.ticks(Math.max(2, Math.floor(mapW / (font * 4))));
  const yTicks = y.ticks(Math.max(2, Math.floor(mapH / (font * 3))));
  const cellW = cols ? mapW / cols : 0;
  const cellH = rows ? mapH / rows : 0;
  const legendW = Math.min(availW, 320 * m.space);
  const legendX = margin.left + (availW - legendW) / 2;
  const legendY = margin.top + mapH + margin.bottom;
  const stops = Array.from({ length: 13 }, (_, i) => -1 + i / 6);

  const onPointerMove = (event: PointerEvent<SVGSVGElement>) => {
    const rect = event.currentTarget.getBoundingClientRect();
    if (rect.width <= 0) return;
    const k = widthPx / rect.width;
    const px = (event.clientX - rect.left) * k - offsetX;
    const py = (event.clientY - rect.top) * k - margin.top;
    if (px < 0 || py < 0 || px > mapW || py > mapH || !cols || !rows) {
      setHover(null);
      return;
    }
    const c = Math.min(cols - 1, Math.floor(px / cellW));
    const r = Math.min(rows - 1, Math.floor(py / cellH));
    setHover({ xM: x.invert(px), yM: y.invert(py), value: values[r]?.[c] ?? NaN });
  };

  const markerShape = (k: HeatMapMarker) => {
    const s = 6 * m.space;
    const fill = MARKER_COLORS[k.kind];
    const stroke = { stroke: chartColors.surface, strokeWidth: 2 * m.lineScale };
    if (k.kind === 'seat') return <circle r={s} fill={fill} {...stroke} />;
    if (k.kind === 'sub') return <rect x={-s} y={-s} width={2 * s} height={2 * s} rx={1.5} fill={fill} {...stroke} />;
    return <path d={`M0,${-s * 1.2}L${s * 1.1},${s * 0.8}L${-s * 1.1},${s * 0.8}Z`} fill={fill} {...stroke} />;
  };

  return (
    <div ref={containerRef} className={['w-full', className].filter(Boolean).join(' ')} data-chart="heat-map">
      <div className="min-h-7 text-ink" style={{ fontSize: font + 1 }} data-part="readout">
        {hover ? (
          <span style={numberStyle}>
            x {formatNumber(hover.xM, 2)} m, y {formatNumber(hover.yM, 2)} m: {valueLabel} {formatValue(hover.value, unit, digits)}
          </span>
        ) : (
          <span className="text-ink-muted">Hover or touch the map to read values.</span>
        )}
      </div>
      <svg
        ref={ref}
        {...chartSvgAttributes(uid, widthPx, heightPx, font)}
        className="block h-auto w-full touch-pan-y select-none"
        onPointerMove={onPointerMove}
        onPointerDown={onPointerMove}
        onPointerLeave={(event) => {
          if (event.pointerType === 'mouse') setHover(null);
        }}
      >
        <title id={`${uid}-title`}>{title}</title>
        <desc id={`${uid}-desc`}>
          {[
            description,
            `Floor plan ${formatNumber(widthM, 2)} m wide and ${formatNumber(lengthM, 2)} m long, front wall at the top. ${valueLabel} from ${formatValue(lo, unit, digits)} to ${formatValue(hi, unit, digits)}.`,
            ...markers.map((k) => `${k.kind} ${k.label} at x ${formatNumber(k.xM, 2)} m, y ${formatNumber(k.yM, 2)} m`),
          ]
            .filter(Boolean)
            .join(' ')}
        </desc>
        <defs>
          <linearGradient id={`${uid}-ramp`} x1="0" x2="1" y1="0" y2="0">
            {stops.map((t) => (
              <stop key={t} offset={(t + 1) / 2} stopColor={divergingColor(t)} />
            ))}
          </linearGradient>
        </defs>
        <rect x={0} y={0} width={widthPx} height={heightPx} fill={chartColors.surface} />
        <g transform={`translate(${offsetX},${margin.top})`}>
          <g data-part="cells" shapeRendering="crispEdges">
            {values.map((row, r) =>
              Array.from({ length: row.length }, (_, c) => {
                const v = row[c] ?? NaN;
                // A hair of overlap hides seams between cells when the map is scaled.
                return <rect key={`${r}-${c}`} x={c * cellW} y={r * cellH} width={cellW + 0.5} height={cellH + 0.5} fill={Number.isFinite(v) ? divergingColor(toT(v)) : divergingColor(NaN)} />;
              }),
            )}
          </g>
          <rect x={0} y={0} width={mapW} height={mapH} fill="none" stroke={chartColors.ink} strokeWidth={1.5 * m.lineScale} />
          <text x={mapW / 2} y={-6} textAnchor="middle" fill={chartColors.inkMuted}>
            Front wall
          </text>
          <g aria-hidden="true">
            {xTicks.map((v) => (
              <text key={`x${v}`} data-x-tick={v} x={x(v)} y={mapH + 5 * m.space + font} textAnchor="middle" fill={chartColors.inkMuted} style={numberStyle}>
                {formatNumber(v, Number.isInteger(v) ? 0 : 1)}
              </text>
            ))}
            <text x={mapW / 2} y={mapH + 2 * font + 10 * m.space} textAnchor="middle" fill={chartColors.ink}>
              Across the room (m)
            </text>
            {yTicks.map((v) => (
              <text key={`y${v}`} data-y-tick={v} x={-6 * m.space} y={y(v)} dy="0.32em" textAnchor="end" fill={chartColors.inkMuted} style={numberStyle}>
                {formatNumber(v, Number.isInteger(v) ? 0 : 1)}
              </text>
            ))}
            <text transform={`translate(${-(offsetX - 2) + font},${mapH / 2}) rotate(-90)`} textAnchor="middle" fill={chartColors.ink}>
              Into the room (m)
            </text>
          </g>
          <g data-part="overlay">
            {markers.map((k, i) => {
              const mx = x(k.xM);
              const my = y(k.yM);
              const right = mx > mapW * 0.7;
              return (
                <g key={`${k.kind}-${i}`} data-marker={k.kind} transform={`translate(${mx},${my})`}>
                  <title>{`${k.label} (${k.kind})`}</title>
                  {markerShape(k)}
                  <text x={(right ? -10 : 10) * m.space} dy="0.32em" textAnchor={right ? 'end' : 'start'} fill={chartColors.ink} fontWeight={600} paintOrder="stroke" stroke={chartColors.surface} strokeWidth={3} strokeLinejoin="round">
                    {k.label}
                  </text>
                </g>
              );
            })}
          </g>
        </g>
        <g data-part="color-legend" transform={`translate(${legendX},${legendY})`} aria-hidden="true">
          <text x={legendW / 2} y={font} textAnchor="middle" fill={chartColors.ink}>
            {unit ? `${valueLabel} (${unit})` : valueLabel}
          </text>
          <rect x={0} y={font + 6} width={legendW} height={12 * m.space} fill={`url(#${uid}-ramp)`} stroke={chartColors.axis} strokeWidth={0.5} />
          {[lo, center, hi].map((v, i) => (
            <text key={i} data-legend-value={v} x={(i * legendW) / 2} y={font + 6 + 12 * m.space + font + 2} textAnchor={i === 0 ? 'start' : i === 2 ? 'end' : 'middle'} fill={chartColors.inkMuted} style={numberStyle}>
              {formatNumber(v, digits)}
            </text>
          ))}
        </g>
      </svg>
    </div>
  );
}
