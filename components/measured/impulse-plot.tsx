'use client';

import { scaleLinear } from 'd3-scale';
import { area, line } from 'd3-shape';
import { useId, useMemo, useRef, type PointerEvent } from 'react';
import { formatNumber, formatValue, useContainerWidth } from '@/components/charts';
import { chartSvgAttributes } from '@/components/charts/chart-svg';
import { chartColors, numberStyle } from '@/components/charts/theme';
import { impulseTrace, windowGainPoints } from './impulse-plot-data';

export type WindowEdge = 'start' | 'end';

/** The window as the dsp cut it (sample counts for its gain shape) and as ms. */
export interface DrawnWindow {
  sampleRateHz: number;
  startSample: number;
  lengthSamples: number;
  fadeInSamples: number;
  fadeOutSamples: number;
  startMs: number;
  lengthMs: number;
}

interface Props {
  title: string;
  samples: Float64Array;
  sampleRateHz: number;
  /** The peak's |x|: the plot shows amplitude relative to it. */
  peakAbs: number;
  arrivalMs: number;
  window: DrawnWindow;
  /** The time span shown, ms from the file's first sample. */
  spanMs: readonly [number, number];
  /** An edge was dragged to this time (ms, within the span); `done` on release. */
  onDragEdge: (edge: WindowEdge, ms: number, done: boolean) => void;
  /** Fixed width (tests); measured otherwise. */
  widthPx?: number;
}

const HANDLE_HIT_PX = 28;
const Y_DOMAIN = [-1.1, 1.1] as const;

/**
 * The impulse response (amplitude relative to its peak) against time, with the window drawn over it: the shaded span,
 * its gain shape (fades included), the peak marked with its arrival, and two edges dragged with a mouse, pen or
 * finger (pointer events). Keyboard and screen-reader users set the same window with the number fields beside it.
 */
export function ImpulsePlot({ title, samples, sampleRateHz, peakAbs, arrivalMs, window, spanMs, onDragEdge, widthPx: fixedWidth }: Props) {
  const uid = `c${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
  const { ref: containerRef, widthPx } = useContainerWidth<HTMLDivElement>(640, fixedWidth);
  const svgRef = useRef<SVGSVGElement | null>(null);
  const dragging = useRef<WindowEdge | null>(null);
  const fontPx = 12;
  const narrow = widthPx < 480;
  const heightPx = narrow ? 200 : 240;
  const margin = { top: 22, right: 14, bottom: 40, left: 44 };
  const innerW = Math.max(40, widthPx - margin.left - margin.right);
  const innerH = heightPx - margin.top - margin.bottom;

  const x = useMemo(() => scaleLinear().domain([spanMs[0], spanMs[1]]).range([0, innerW]), [spanMs, innerW]);
  const y = useMemo(() => scaleLinear().domain([Y_DOMAIN[0], Y_DOMAIN[1]]).range([innerH, 0]), [innerH]);
  const trace = useMemo(() => impulseTrace(samples, sampleRateHz, spanMs, innerW, 1 / peakAbs), [samples, sampleRateHz, spanMs, innerW, peakAbs]);
  const tracePath = useMemo(() => {
    if (trace.kind === 'line') return line<number>().x((i) => x(trace.timeMs[i] as number)).y((i) => y(trace.value[i] as number))(trace.timeMs.map((_, i) => i)) ?? '';
    return area<number>().x((i) => x(trace.timeMs[i] as number)).y0((i) => y(trace.low[i] as number)).y1((i) => y(trace.high[i] as number))(trace.timeMs.map((_, i) => i)) ?? '';
  }, [trace, x, y]);
  const gainPath = useMemo(() => line<[number, number]>().x((p) => x(p[0])).y((p) => y(p[1]))(windowGainPoints(window)) ?? '', [window, x, y]);

  const xTicks = x.ticks(Math.max(2, Math.floor(innerW / 70)));
  const step = xTicks.length > 1 ? (xTicks[1] as number) - (xTicks[0] as number) : 1;
  const xDigits = step >= 1 ? 0 : Math.ceil(-Math.log10(step) - 1e-9);
  const clampPx = (px: number) => Math.max(0, Math.min(innerW, px));
  const startPx = x(window.startMs);
  const endPx = x(window.startMs + window.lengthMs);
  const peakPx = x(arrivalMs);

  const msAt = (event: PointerEvent<SVGElement>) => {
    const rect = svgRef.current?.getBoundingClientRect();
    if (!rect || rect.width <= 0) return null;
    const px = ((event.clientX - rect.left) * widthPx) / rect.width - margin.left;
    return x.invert(clampPx(px));
  };
  const handlers = (edge: WindowEdge) => ({
    onPointerDown: (e: PointerEvent<SVGElement>) => {
      e.preventDefault();
      // preventDefault keeps the focus where it was: leave a window field being typed in, so it shows the dragged value.
      if (document.activeElement instanceof HTMLElement) document.activeElement.blur();
      e.currentTarget.setPointerCapture(e.pointerId);
      dragging.current = edge;
    },
    onPointerMove: (e: PointerEvent<SVGElement>) => {
      if (dragging.current !== edge) return;
      const ms = msAt(e);
      if (ms !== null) onDragEdge(edge, ms, false);
    },
    onPointerUp: (e: PointerEvent<SVGElement>) => {
      if (dragging.current !== edge) return;
      dragging.current = null;
      const ms = msAt(e);
      onDragEdge(edge, ms ?? (edge === 'start' ? window.startMs : window.startMs + window.lengthMs), true);
    },
    onPointerCancel: () => {
      if (dragging.current === edge) onDragEdge(edge, edge === 'start' ? window.startMs : window.startMs + window.lengthMs, true);
      dragging.current = null;
    },
  });

  const edge = (which: WindowEdge, px: number) => {
    if (px < -1 || px > innerW + 1) return null;
    return (
      <g data-edge={which} transform={`translate(${px},0)`} style={{ cursor: 'ew-resize', touchAction: 'none' }} {...handlers(which)}>
        <rect x={-HANDLE_HIT_PX / 2} y={-margin.top} width={HANDLE_HIT_PX} height={innerH + margin.top} fill="transparent" />
        <line y1={0} y2={innerH} stroke={chartColors.mains} strokeWidth={2} />
        <rect x={-5} y={innerH / 2 - 16} width={10} height={32} rx={3} fill={chartColors.surface} stroke={chartColors.mains} strokeWidth={2} />
        <line x1={-1.5} x2={-1.5} y1={innerH / 2 - 8} y2={innerH / 2 + 8} stroke={chartColors.mains} />
        <line x1={1.5} x2={1.5} y1={innerH / 2 - 8} y2={innerH / 2 + 8} stroke={chartColors.mains} />
        <text y={-8} textAnchor={which === 'start' ? (px < 40 ? 'start' : 'middle') : px > innerW - 40 ? 'end' : 'middle'} fill={chartColors.mains} fontWeight={600}>
          {which === 'start' ? 'start' : 'end'}
        </text>
      </g>
    );
  };

  const shadeFrom = clampPx(startPx);
  const shadeTo = clampPx(endPx);
  const desc = `Time from ${formatValue(spanMs[0], 'ms', xDigits)} to ${formatValue(spanMs[1], 'ms', xDigits)}; amplitude relative to the peak. The peak arrives at ${formatValue(arrivalMs, 'ms', 2)}; the window starts at ${formatValue(window.startMs, 'ms', 2)} and is ${formatValue(window.lengthMs, 'ms', 1)} long. Drag the window's edges, or type its start and length in the fields below the plot.`;

  return (
    <div ref={containerRef} className="w-full" data-testid="impulse-plot">
      <svg ref={svgRef} {...chartSvgAttributes(uid, widthPx, heightPx, fontPx)} className="block h-auto w-full select-none">
        <title id={`${uid}-title`}>{title}</title>
        <desc id={`${uid}-desc`}>{desc}</desc>
        <defs>
          <clipPath id={`${uid}-clip`}>
            <rect x={0} y={0} width={innerW} height={innerH} />
          </clipPath>
        </defs>
        <rect x={0} y={0} width={widthPx} height={heightPx} fill={chartColors.surface} />
        <g transform={`translate(${margin.left},${margin.top})`}>
          <g aria-hidden="true">
            {xTicks.map((t) => (
              <line key={`g${t}`} x1={x(t)} x2={x(t)} y1={0} y2={innerH} stroke={chartColors.gridMinor} />
            ))}
            {[-1, -0.5, 0, 0.5, 1].map((v) => (
              <line key={`h${v}`} x1={0} x2={innerW} y1={y(v)} y2={y(v)} stroke={v === 0 ? chartColors.grid : chartColors.gridMinor} />
            ))}
          </g>
          {shadeTo > shadeFrom ? <rect data-part="window" x={shadeFrom} y={0} width={shadeTo - shadeFrom} height={innerH} fill={chartColors.mains} fillOpacity={0.08} /> : null}
          <g clipPath={`url(#${uid}-clip)`}>
            <path data-part="impulse" d={tracePath} fill={trace.kind === 'band' ? chartColors.ink : 'none'} fillOpacity={trace.kind === 'band' ? 0.85 : undefined} stroke={chartColors.ink} strokeWidth={trace.kind === 'band' ? 0.6 : 1.2} strokeLinejoin="round" />
            <path data-part="window-shape" d={gainPath} fill="none" stroke={chartColors.mains} strokeWidth={2} strokeDasharray="6 4" />
          </g>
          {peakPx >= 0 && peakPx <= innerW ? (
            <g data-part="peak" pointerEvents="none">
              <line x1={peakPx} x2={peakPx} y1={0} y2={innerH} stroke={chartColors.sub} strokeWidth={1.5} strokeDasharray="2 3" />
              <text x={peakPx + (peakPx > innerW * 0.7 ? -6 : 6)} y={innerH - 8} textAnchor={peakPx > innerW * 0.7 ? 'end' : 'start'} fill={chartColors.sub} fontWeight={600} paintOrder="stroke" stroke={chartColors.surface} strokeWidth={3} style={numberStyle}>
                {`peak ${formatValue(arrivalMs, 'ms', 2)}`}
              </text>
            </g>
          ) : null}
          <g aria-hidden="true">
            <line x1={0} x2={innerW} y1={innerH} y2={innerH} stroke={chartColors.axis} />
            {xTicks.map((t) => (
              <text key={`xt${t}`} x={x(t)} y={innerH + fontPx + 6} textAnchor="middle" fill={chartColors.inkMuted} style={numberStyle}>
                {formatNumber(t, xDigits)}
              </text>
            ))}
            <text x={innerW / 2} y={innerH + 2 * fontPx + 12} textAnchor="middle" fill={chartColors.ink}>
              Time from the file&apos;s first sample (ms)
            </text>
            <line x1={0} x2={0} y1={0} y2={innerH} stroke={chartColors.axis} />
            {[-1, 0, 1].map((v) => (
              <text key={`yt${v}`} x={-6} y={y(v)} dy="0.32em" textAnchor="end" fill={chartColors.inkMuted} style={numberStyle}>
                {formatNumber(v, 0)}
              </text>
            ))}
            <text transform={`translate(${-margin.left + fontPx},${innerH / 2}) rotate(-90)`} textAnchor="middle" fill={chartColors.ink}>
              {narrow ? 'Amplitude' : 'Amplitude (peak = 1)'}
            </text>
          </g>
          {edge('start', startPx)}
          {edge('end', endPx)}
        </g>
      </svg>
    </div>
  );
}
