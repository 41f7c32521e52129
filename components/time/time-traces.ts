import { chartColors, overlayColors, subTraceStyle, traceStyles, type PlotTrace, type XMarker } from '@/components/charts';
import type { TimeTrace, TimeView } from '@/lib/system-model/time-view';

/** Which of a view's traces to draw (a Lesson Step's choice of mains, subs and sum). */
export interface TimeTraceChoice {
  mains: boolean;
  subs: boolean;
  sum: boolean;
}

/** A sum to draw faintly beside the view's own, e.g. the present settings' beside the recommended ones. */
export interface CompareSum {
  label: string;
  impulsePerS: Float64Array;
  step: Float64Array;
}

/** Colours as Blend draws them: the mains teal, each sub its amber or brown, the sum bold ink; other measured curves apart. */
export function timeTraceStyle(t: TimeTrace, k: number): { color: string; width: number; dashed?: boolean } {
  if (t.role === 'mains') return traceStyles.mains;
  if (t.role === 'sub') return subTraceStyle(t.subIndex ?? 0);
  if (t.role === 'sum') return traceStyles.sum;
  return { color: overlayColors[(k + 2) % overlayColors.length] as string, width: 2 };
}

export function shownTraces(view: TimeView, choice: TimeTraceChoice): TimeTrace[] {
  const shown = view.traces.filter((t) => (t.role === 'mains' ? choice.mains : t.role === 'sub' ? choice.subs : t.role === 'sum' ? choice.sum : true));
  return shown.length ? shown : view.traces.filter((t) => t.role === 'sum');
}

/** The samples [from, to) that cover a time range (one more either side, so the lines reach the plot's edges). */
export function samplesIn(timeMs: Float64Array, rangeMs: readonly [number, number]): [number, number] {
  const first = timeMs[0] as number;
  const stepMs = timeMs.length > 1 ? (timeMs[1] as number) - first : 1;
  const from = Math.max(0, Math.floor((rangeMs[0] - first) / stepMs) - 1);
  const to = Math.min(timeMs.length, Math.ceil((rangeMs[1] - first) / stepMs) + 2);
  return [from, Math.max(from + 1, to)];
}

/**
 * The plot traces of one quantity over samples [from, to) (a close-up draws only what it shows), the compared sum
 * (dashed grey) first so the view's own draw over it.
 */
export function plotTraces(traces: readonly TimeTrace[], quantity: 'impulsePerS' | 'step', compare: CompareSum | null, [from, to]: [number, number]): PlotTrace[] {
  const out: PlotTrace[] = [];
  if (compare) out.push({ id: 'compare', label: compare.label, values: compare[quantity].subarray(from, to), color: chartColors.target, width: 2, dashed: true });
  traces.forEach((t, k) => out.push({ id: t.id, label: t.name, values: t[quantity].subarray(from, to), ...timeTraceStyle(t, k), ...(t.phaseEstimated ? { note: 'minimum phase, estimated' } : {}) }));
  return out;
}

/**
 * A dashed line in its colour where each path's sound arrives. Names label the lines at the top; arrivals closer than
 * `labelGapMs` share one label, on the first of them, naming them all (so labels never sit on each other).
 */
export function arrivalMarkers(traces: readonly TimeTrace[], labelGapMs: number): XMarker[] {
  const lines = traces.flatMap((t, k) => (t.arrivalMs === null ? [] : [{ x: t.arrivalMs, name: t.name, color: timeTraceStyle(t, k).color }])).sort((a, b) => a.x - b.x);
  const out: XMarker[] = [];
  let labelled: { marker: XMarker; names: string[] } | null = null;
  for (const line of lines) {
    const marker: XMarker = { x: line.x, color: line.color, dashed: true };
    if (labelled && line.x - labelled.marker.x < labelGapMs) {
      labelled.names.push(line.name);
      labelled.marker.label = labelled.names.join(', ');
    } else {
      labelled = { marker, names: [line.name] };
      marker.label = line.name;
    }
    out.push(marker);
  }
  return out;
}

/** The largest |value| of some series inside a time range. */
function largest(timeMs: Float64Array, series: readonly Float64Array[], rangeMs: readonly [number, number]): number {
  let m = 0;
  for (const values of series) {
    timeMs.forEach((t, i) => {
      if (t >= rangeMs[0] && t <= rangeMs[1]) m = Math.max(m, Math.abs(values[i] as number));
    });
  }
  return m;
}

/**
 * The impulse plot's y range. A main channel's impulse is a spike many times taller than a sub's (its band reaches
 * kHz, a sub's 100 Hz or so): when it is more than four times the subs' tallest, the range follows the subs (and the
 * sum's tail after the spike) and the spike runs off the plot, said in `clipped`.
 */
export function impulseRange(view: TimeView, traces: readonly TimeTrace[], rangeMs: readonly [number, number]): { domain: [number, number] | undefined; clipped: string | null } {
  const slow = traces.filter((t) => t.role === 'sub' || t.role === 'measured');
  const fast = traces.filter((t) => t.role === 'mains' || t.role === 'sum');
  if (!slow.length || !fast.length) return { domain: undefined, clipped: null };
  const slowPeak = largest(view.timeMs, slow.map((t) => t.impulsePerS), rangeMs);
  const fastPeak = largest(view.timeMs, fast.map((t) => t.impulsePerS), rangeMs);
  if (!(slowPeak > 0) || fastPeak <= 4 * slowPeak) return { domain: undefined, clipped: null };
  const top = niceCeiling(1.6 * slowPeak);
  return { domain: [-top, top], clipped: `The mains’ impulse is a narrow spike (${Math.round(fastPeak).toLocaleString('en')} /s at its top), drawn off the scale so the subs’ slower impulses show; the step below shows it whole.` };
}

/** 1, 1.5, 2, 2.5, 3, 4, 5, 6 or 8 times a power of ten, at or above v. */
function niceCeiling(v: number): number {
  const p = Math.pow(10, Math.floor(Math.log10(v)));
  return ([1, 1.5, 2, 2.5, 3, 4, 5, 6, 8, 10].find((m) => m * p >= v) ?? 10) * p;
}
