'use client';

import { useId } from 'react';
import type { Ref } from 'react';
import { scaleLinear } from 'd3-scale';
import { finiteExtent } from './series';
import { formatNumber, formatSigned, formatValue } from './format';
import { chartSvgAttributes } from './chart-svg';
import { chartColors, chartMetrics, numberStyle, statusColors, statusWords } from './theme';
import type { ChartEmphasis, ChartStatus } from './theme';
import { useContainerWidth } from './use-container-width';

export interface Bar {
  id: string;
  /** Row label, e.g. "L", "C", "Sub 1". */
  label: string;
  value: number;
  status: ChartStatus;
  /** This row's own target (e.g. LFE 10 dB above the others); drawn as a dashed tick. */
  target?: number;
  note?: string;
}

export interface BarChartProps {
  bars: readonly Bar[];
  title: string;
  description?: string;
  /** Unit of the values, e.g. "dB SPL". */
  unit?: string;
  /** Axis title, e.g. "Maximum SPL at the MLP". */
  valueLabel?: string;
  /** One target for every row, drawn as a dashed line across the chart. */
  target?: number;
  targetLabel?: string;
  /** Value range; bars grow from the lower end (default: around the data and targets). */
  domain?: readonly [number, number];
  digits?: number;
  /** Label each bar with its difference to its target too (headroom / deficit). Default true. */
  showDifference?: boolean;
  widthPx?: number;
  emphasis?: ChartEmphasis;
  ref?: Ref<SVGSVGElement>;
  className?: string;
}

/**
 * Horizontal bars coloured by status (ok / warn / fail) against a dashed target, each bar
 * labelled with its value, e.g. headroom per channel: maximum SPL against reference level.
 */
export function BarChart(props: BarChartProps) {
  const { bars, title, description, unit, valueLabel, target, targetLabel, digits = 1, showDifference = true, emphasis = 'default', ref, className } = props;
  const m = chartMetrics(emphasis);
  const font = m.fontPx;
  const uid = `c${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const { ref: containerRef, widthPx } = useContainerWidth<HTMLDivElement>(640, props.widthPx);

  const extent = finiteExtent([bars.map((b) => b.value), bars.map((b) => b.target ?? NaN), [target ?? NaN]]) ?? [0, 1];
  const domain: [number, number] = props.domain
    ? [props.domain[0], props.domain[1]]
    : [Math.floor((extent[0] - 10) / 10) * 10, Math.ceil((extent[1] + 3) / 5) * 5];

  const targetOf = (b: Bar) => b.target ?? target;
  const valueText = (b: Bar) => {
    const t = targetOf(b);
    const base = formatValue(b.value, unit, digits);
    return showDifference && t !== undefined && Number.isFinite(b.value) ? `${base}  ${formatSigned(b.value - t, undefined, digits)}` : base;
  };

  const rowH = Math.max(28, 30 * m.space);
  const barH = rowH * 0.62;
  const labelChars = Math.max(1, ...bars.map((b) => b.label.length));
  const valueChars = Math.max(4, ...bars.map((b) => valueText(b).length));
  const margin = {
    top: 10 * m.space + (target !== undefined && targetLabel ? font + 6 : 0),
    right: valueChars * font * 0.62 + 12 * m.space,
    bottom: 2.6 * font + 14 * m.space,
    left: labelChars * font * 0.62 + 14 * m.space,
  };
  const innerW = Math.max(40, widthPx - margin.left - margin.right);
  const innerH = bars.length * rowH;
  const heightPx = Math.round(margin.top + innerH + margin.bottom);
  const x = scaleLinear().domain(domain).range([0, innerW]).clamp(true);
  const ticks = x.ticks(Math.max(2, Math.floor(innerW / (font * 5))));
  const dash = `${6 * m.lineScale} ${4 * m.lineScale}`;

  const rowText = (b: Bar) => {
    const t = targetOf(b);
    const parts = [`${b.label}: ${formatValue(b.value, unit, digits)}`];
    if (t !== undefined) parts.push(`target ${formatValue(t, unit, digits)}`, `difference ${formatSigned(b.value - t, unit, digits)}`);
    parts.push(statusWords[b.status]);
    if (b.note) parts.push(b.note);
    return parts.join(', ');
  };

  return (
    <div ref={containerRef} className={['w-full', className].filter(Boolean).join(' ')} data-chart="bar">
      <svg
        ref={ref}
        {...chartSvgAttributes(uid, widthPx, heightPx, font)}
        className="block h-auto w-full"
      >
        <title id={`${uid}-title`}>{title}</title>
        <desc id={`${uid}-desc`}>{[description, ...bars.map(rowText)].filter(Boolean).join('. ')}</desc>
        <rect x={0} y={0} width={widthPx} height={heightPx} fill={chartColors.surface} />
        <g transform={`translate(${margin.left},${margin.top})`}>
          <g aria-hidden="true">
            {ticks.map((v) => (
              <g key={v} transform={`translate(${x(v)},0)`}>
                <line y1={0} y2={innerH} stroke={chartColors.grid} />
                <text data-x-tick={v} y={innerH + 5 * m.space + font} textAnchor="middle" fill={chartColors.inkMuted} style={numberStyle}>
                  {formatNumber(v, 0)}
                </text>
              </g>
            ))}
            <line x1={0} x2={0} y1={0} y2={innerH} stroke={chartColors.axis} />
            {valueLabel || unit ? (
              <text x={innerW / 2} y={innerH + 2 * font + 12 * m.space} textAnchor="middle" fill={chartColors.ink}>
                {valueLabel && unit ? `${valueLabel} (${unit})` : (valueLabel ?? unit)}
              </text>
            ) : null}
          </g>
          {bars.map((b, i) => {
            const y = i * rowH + (rowH - barH) / 2;
            const end = Number.isFinite(b.value) ? x(b.value) : 0;
            const t = b.target;
            return (
              <g key={b.id} data-bar={b.id} data-status={b.status}>
                <title>{rowText(b)}</title>
                <text x={-8 * m.space} y={y + barH / 2} dy="0.32em" textAnchor="end" fill={chartColors.ink}>
                  {b.label}
                </text>
                <rect x={0} y={y} width={Math.max(0, end)} height={barH} rx={2} fill={statusColors[b.status]} />
                {t !== undefined && Number.isFinite(t) ? (
                  <line data-bar-target={t} x1={x(t)} x2={x(t)} y1={y - 3} y2={y + barH + 3} stroke={chartColors.target} strokeWidth={2 * m.lineScale} strokeDasharray={`${3 * m.lineScale} ${2 * m.lineScale}`} />
                ) : null}
                <text data-value={b.value} x={end + 6 * m.space} y={y + barH / 2} dy="0.32em" fill={chartColors.ink} style={numberStyle}>
                  {valueText(b)}
                </text>
              </g>
            );
          })}
          {target !== undefined && Number.isFinite(target) ? (
            <g data-target={target}>
              <line x1={x(target)} x2={x(target)} y1={-4} y2={innerH} stroke={chartColors.target} strokeWidth={1.5 * m.lineScale} strokeDasharray={dash} />
              {targetLabel ? (
                <text x={x(target)} y={-8} textAnchor="middle" fill={chartColors.target}>
                  {targetLabel}
                </text>
              ) : null}
            </g>
          ) : null}
        </g>
      </svg>
    </div>
  );
}
