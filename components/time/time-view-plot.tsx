'use client';

import { useId, useMemo, useState } from 'react';
import { XYPlot, chartMetrics, formatNumber, useContainerWidth, type ChartEmphasis } from '@/components/charts';
import type { TimeView } from '@/lib/system-model/time-view';
import { arrivalMarkers, impulseRange, plotTraces, samplesIn, shownTraces, type CompareSum, type TimeTraceChoice } from './time-traces';

const ALL: TimeTraceChoice = { mains: true, subs: true, sum: true };
/** Of the plots' height, the impulse plot's share (the step plot, the one that tells the story, gets the rest). */
const IMPULSE_SHARE = 0.44;

export interface TimeViewPlotProps {
  view: TimeView;
  /** Names the plots for screen readers and exports ("Present settings", a Step's title). */
  title: string;
  show?: TimeTraceChoice;
  compare?: CompareSum | null;
  emphasis?: ChartEmphasis;
  /** The two plots' height together, px (the Presenter view fits them to the screen); else each from its width. */
  plotsHeightPx?: number;
  /** The close-up to offer (default the view's own; a sweep passes one that holds for its whole run). */
  closeUpMs?: [number, number];
  /** Fixed y ranges (a sweep keeps its axes still). */
  stepDomain?: [number, number];
  impulseDomain?: [number, number];
  testId?: string;
}

/**
 * Two stacked plots over one time axis — the impulse response and the step response of each path in its colour and of
 * the sum in bold — with a dashed line where each path's sound arrives, the sentences read off them and what time 0
 * is. A close-up around the arrivals or the whole window; one crosshair reads both plots.
 */
export function TimeViewPlot({ view, title, show = ALL, compare = null, emphasis = 'default', plotsHeightPx, closeUpMs, stepDomain, impulseDomain, testId = 'time-view' }: TimeViewPlotProps) {
  const id = useId();
  const [whole, setWhole] = useState(false);
  const [cursorMs, setCursorMs] = useState<number | null>(null);
  const closeUp = closeUpMs ?? view.closeUpMs;
  const windowMs: [number, number] = [view.timeMs[0] as number, view.timeMs[view.timeMs.length - 1] as number];
  const rangeMs = whole ? windowMs : closeUp;
  const traces = useMemo(() => shownTraces(view, show), [view, show]);
  const [from, to] = samplesIn(view.timeMs, rangeMs);
  const x = useMemo(() => view.timeMs.subarray(from, to), [view.timeMs, from, to]);
  const impulseTraces = useMemo(() => plotTraces(traces, 'impulsePerS', compare, [from, to]), [traces, compare, from, to]);
  const stepTraces = useMemo(() => plotTraces(traces, 'step', compare, [from, to]), [traces, compare, from, to]);
  // Arrival labels closer than one label's width share it (the plot's width less its y axis, roughly).
  const { ref: boxRef, widthPx } = useContainerWidth<HTMLDivElement>(640);
  const labelPx = 0.62 * chartMetrics(emphasis).fontPx * (Math.max(0, ...traces.map((t) => t.name.length)) + 2);
  const markers = arrivalMarkers(traces, ((rangeMs[1] - rangeMs[0]) * labelPx) / Math.max(120, widthPx - 90));
  const impulse = impulseRange(view, traces, rangeMs);
  const big = emphasis === 'projector';
  const impulseHeightPx = plotsHeightPx === undefined ? undefined : Math.round(plotsHeightPx * IMPULSE_SHARE);
  const stepHeightPx = plotsHeightPx === undefined || impulseHeightPx === undefined ? undefined : plotsHeightPx - impulseHeightPx;
  const common = { x, xLabel: 'Time', xUnit: 'ms', xDigits: 2, xDomain: rangeMs, yAxisChars: 6, emphasis, cursorX: cursorMs, onCursorX: setCursorMs } as const;

  return (
    <div ref={boxRef} className="flex flex-col gap-2" data-testid={testId}>
      <div className={`flex flex-wrap items-center justify-between gap-x-4 gap-y-1 ${big ? 'text-xl' : 'text-sm'}`}>
        <p className="text-ink-soft">{view.originText}</p>
        {/* min-w-0: a fieldset is at least as wide as its content unless told otherwise, which would push a phone sideways. */}
        <fieldset className="flex min-w-0 flex-wrap items-center gap-x-3 gap-y-1">
          <legend className="sr-only">Time shown</legend>
          <label className="inline-flex items-center gap-1.5">
            <input type="radio" name={`${id}-range`} checked={!whole} onChange={() => setWhole(false)} className="accent-mains" data-testid={`${testId}-close-up`} />
            Close-up, {formatNumber(closeUp[0], 0)} to {formatNumber(closeUp[1], 0)} ms
          </label>
          <label className="inline-flex items-center gap-1.5">
            <input type="radio" name={`${id}-range`} checked={whole} onChange={() => setWhole(true)} className="accent-mains" data-testid={`${testId}-whole`} />
            Whole, {formatNumber(windowMs[0], 0)} to {formatNumber(windowMs[1], 0)} ms
          </label>
        </fieldset>
      </div>
      <XYPlot
        {...common}
        title={`${title}: impulse response`}
        description={`Impulse response h(t) of each path and of the sum, per second. Dashed vertical lines: when each path's sound arrives. ${impulse.clipped ?? ''}`}
        yLabel="Impulse response"
        yUnit="1/s"
        valueDigits={0}
        yDomain={impulseDomain ?? impulse.domain}
        traces={impulseTraces}
        markers={markers}
        showLegend={false}
        aspect={big ? 0.22 : 0.3}
        heightPx={impulseHeightPx}
      />
      <XYPlot
        {...common}
        title={`${title}: step response`}
        description="Step response of each path and of the sum: the running integral of the impulse response; a flat system's step settles at 1. Dashed vertical lines: when each path's sound arrives."
        yLabel="Step response"
        valueDigits={3}
        yDomain={stepDomain}
        traces={stepTraces}
        markers={markers.map((m) => ({ ...m, label: undefined }))}
        aspect={big ? 0.26 : 0.36}
        heightPx={stepHeightPx}
      />
      <ul className={`flex flex-col gap-1 ${big ? 'text-2xl' : 'text-sm'}`} data-testid={`${testId}-sentences`}>
        {view.sentences.map((s) => (
          <li key={s} className="font-medium text-ink">
            {s}
          </li>
        ))}
      </ul>
      {big ? (
        <p className="text-lg text-ink-soft">Dashed lines: when each sound arrives.{impulse.clipped ? ' The mains’ impulse spike runs off the top; its step shows it whole.' : ''}</p>
      ) : (
        <p className="text-xs text-ink-soft">
          {impulse.clipped ? `${impulse.clipped} ` : ''}Dashed lines: when each path’s sound arrives. {view.bandNote}
        </p>
      )}
    </div>
  );
}
