'use client';

import { useId } from 'react';
import type { Ref } from 'react';
import { scaleBand, scaleLinear } from 'd3-scale';
import { formatNumber } from './format';
import { chartSvgAttributes } from './chart-svg';
import { chartColors, chartMetrics, numberStyle } from './theme';
import type { ChartEmphasis } from './theme';
import { useContainerWidth } from './use-container-width';

export interface Column {
  id?: string;
  /** Label under the column, e.g. "63" for the 63 Hz one-third octave band. */
  label: string;
  value: number;
  color?: string;
  /** Extra words for the accessible description, e.g. "coincident modes". */
  note?: string;
}

export interface ColumnChartProps {
  columns: readonly Column[];
  title: string;
  description?: string;
  /** Title under the labels, e.g. "One-third octave band (Hz)". */
  xLabel?: string;
  /** Axis title, e.g. "Modes". */
  yLabel?: string;
  /** Decimals of the values (default 0, counts). */
  digits?: number;
  /** Top of the value axis (default: the largest value, rounded up). */
  maxValue?: number;
  /** Default colour of the columns (default mains teal). */
  color?: string;
  widthPx?: number;
  heightPx?: number;
  emphasis?: ChartEmphasis;
  ref?: Ref<SVGSVGElement>;
  className?: string;
}

/** Vertical columns with a label under each and its value on top, e.g. modes per one-third octave. */
export function ColumnChart(props: ColumnChartProps) {
  const { columns, title, description, xLabel, yLabel, digits = 0, color = chartColors.mains, emphasis = 'default', ref, className } = props;
  const m = chartMetrics(emphasis);
  const font = m.fontPx;
  const uid = `c${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const { ref: containerRef, widthPx } = useContainerWidth<HTMLDivElement>(640, props.widthPx);

  const finite = columns.map((c) => c.value).filter(Number.isFinite);
  const top = props.maxValue ?? Math.max(1, ...finite);
  const y0 = scaleLinear().domain([0, top]).nice();
  let yTicks = y0.ticks(5);
  if (digits === 0) yTicks = yTicks.filter((v) => Number.isInteger(v));

  const labelChars = Math.max(1, ...columns.map((c) => c.label.length));
  const yChars = Math.max(1, ...yTicks.map((v) => formatNumber(v, digits).length));
  const left = yChars * font * 0.62 + 10 * m.space + (yLabel ? font + 8 : 0);
  const right = 10 * m.space;
  const innerW = Math.max(40, widthPx - left - right);
  const band = scaleBand<number>().domain(columns.map((_, i) => i)).range([0, innerW]).paddingInner(0.2).paddingOuter(0.1);
  // Turn the labels when they do not fit under their columns.
  const rotate = labelChars * font * 0.62 + 4 > band.step();
  const labelH = rotate ? labelChars * font * 0.62 * 0.71 + font : font + 4;
  const margin = { top: font + 10 * m.space, right, bottom: labelH + 8 * m.space + (xLabel ? font + 10 : 0), left };
  const heightPx = props.heightPx ?? Math.round(Math.min(420 * m.space, Math.max(200 * m.space, widthPx * 0.45)));
  const innerH = Math.max(40, heightPx - margin.top - margin.bottom);
  const y = y0.copy().range([innerH, 0]);

  return (
    <div ref={containerRef} className={['w-full', className].filter(Boolean).join(' ')} data-chart="column">
      <svg
        ref={ref}
        {...chartSvgAttributes(uid, widthPx, heightPx, font)}
        className="block h-auto w-full"
      >
        <title id={`${uid}-title`}>{title}</title>
        <desc id={`${uid}-desc`}>
          {[description, ...columns.map((c) => `${c.label}: ${formatNumber(c.value, digits)}${c.note ? ` (${c.note})` : ''}`)].filter(Boolean).join('. ')}
        </desc>
        <rect x={0} y={0} width={widthPx} height={heightPx} fill={chartColors.surface} />
        <g transform={`translate(${margin.left},${margin.top})`}>
          <g aria-hidden="true">
            {yTicks.map((v) => (
              <g key={v}>
                <line x1={0} x2={innerW} y1={y(v)} y2={y(v)} stroke={chartColors.grid} />
                <text data-y-tick={v} x={-6 * m.space} y={y(v)} dy="0.32em" textAnchor="end" fill={chartColors.inkMuted} style={numberStyle}>
                  {formatNumber(v, digits)}
                </text>
              </g>
            ))}
            <line x1={0} x2={innerW} y1={innerH} y2={innerH} stroke={chartColors.axis} />
            {yLabel ? (
              <text transform={`translate(${-margin.left + font},${innerH / 2}) rotate(-90)`} textAnchor="middle" fill={chartColors.ink}>
                {yLabel}
              </text>
            ) : null}
            {xLabel ? (
              <text x={innerW / 2} y={innerH + labelH + 8 * m.space + font} textAnchor="middle" fill={chartColors.ink}>
                {xLabel}
              </text>
            ) : null}
          </g>
          {columns.map((c, i) => {
            const x0 = band(i) ?? 0;
            const w = band.bandwidth();
            const v = Number.isFinite(c.value) ? Math.max(0, c.value) : 0;
            const cx = x0 + w / 2;
            return (
              <g key={c.id ?? `${i}`} data-column={c.label}>
                <rect x={x0} y={y(v)} width={w} height={innerH - y(v)} fill={c.color ?? color} rx={1.5} />
                <text data-value={c.value} x={cx} y={y(v) - 4} textAnchor="middle" fill={chartColors.ink} style={numberStyle}>
                  {formatNumber(c.value, digits)}
                </text>
                <text
                  data-label={c.label}
                  transform={rotate ? `translate(${cx},${innerH + 6 * m.space}) rotate(-45)` : `translate(${cx},${innerH + 4 * m.space + font})`}
                  textAnchor={rotate ? 'end' : 'middle'}
                  dy={rotate ? '0.7em' : undefined}
                  fill={chartColors.inkMuted}
                  style={numberStyle}
                >
                  {c.label}
                </text>
              </g>
            );
          })}
        </g>
      </svg>
    </div>
  );
}
