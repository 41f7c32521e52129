'use client';

import { useEffect, useMemo } from 'react';
import { TimeViewPlot } from '@/components/time/time-view-plot';
import { applyLessonSweepToDocument, formatSweepValue, sweepValueAt } from '@/lib/system-model/lesson-sweep';
import { computeTimeView, type TimeView } from '@/lib/system-model/time-view';
import type { LessonTrace, Sweep } from '@/lib/validations/lesson';
import type { SystemDocument } from '@/lib/validations/system';

interface TimeStepPlotProps {
  step: { document: SystemDocument; traces: LessonTrace[]; sweep: Sweep | null; title: string };
  progress?: number;
  emphasis?: 'default' | 'projector';
  /** The two plots' height together, px (the Presenter view fits them to the screen). */
  plotsHeightPx?: number;
}

/** The smallest and largest of two ranges together, or undefined when either is missing. */
const union = (a: [number, number] | undefined, b: [number, number] | undefined): [number, number] | undefined => (a && b ? [Math.min(a[0], b[0]), Math.max(a[1], b[1])] : undefined);

/** The step response's range over a view's shown traces, a little beyond the largest |value|, in tenths. */
function stepRange(view: TimeView): [number, number] {
  let lo = 0;
  let hi = 1;
  for (const t of view.traces) for (const v of t.step) [lo, hi] = [Math.min(lo, v), Math.max(hi, v)];
  return [Math.floor(lo * 10 - 0.5) / 10, Math.ceil(hi * 10 + 0.5) / 10];
}

/**
 * A Lesson Step on the time panel: the impulse and step responses of the Step's mains, subs and sum (as its traces
 * choose) at one moment of its sweep, recomputed in the browser frame by frame. A sweep keeps its axes still: the
 * close-up and the step's range hold the sweep's start and end both.
 */
export function TimeStepPlot({ step, progress = 0, emphasis = 'default', plotsHeightPx }: TimeStepPlotProps) {
  const { sweep, document } = step;
  const value = useMemo(() => (sweep ? sweepValueAt(sweep, progress) : null), [sweep, progress]);
  const doc = useMemo(() => (sweep && value ? applyLessonSweepToDocument(document, sweep, value) : document), [document, sweep, value]);
  const view = useMemo(() => computeTimeView(doc), [doc]);
  const ends = useMemo(() => (sweep ? [0, 1].map((p) => computeTimeView(applyLessonSweepToDocument(document, sweep, sweepValueAt(sweep, p)))) : null), [document, sweep]);
  const show = useMemo(() => ({ mains: step.traces.includes('mains'), subs: step.traces.includes('subs'), sum: step.traces.includes('sum') }), [step.traces]);

  // Count drawn frames for the frame-rate bench and the e2e test (after commit; never during render).
  useEffect(() => {
    window.__seamlineLessonFrames = (window.__seamlineLessonFrames ?? 0) + 1;
  }, [view]);

  if (!view) return <p className="text-ink-soft">This Step&apos;s System has no main speakers, so there is nothing to show in time.</p>;
  const [start, end] = ends ?? [];
  const closeUpMs = start && end ? union(start.closeUpMs, end.closeUpMs) : undefined;
  const stepDomain = start && end ? union(stepRange(start), stepRange(end)) : undefined;
  const big = emphasis === 'projector';
  return (
    <div className="flex flex-col gap-3" data-testid="step-plot">
      {sweep && value ? (
        <p className={`num font-semibold text-ink ${big ? 'text-5xl' : 'text-2xl'}`} data-testid="sweep-value" aria-live="off">
          {formatSweepValue(sweep, value)}
        </p>
      ) : null}
      <TimeViewPlot view={view} title={step.title} show={show} emphasis={emphasis} plotsHeightPx={plotsHeightPx} closeUpMs={closeUpMs} stepDomain={stepDomain} testId="step-time" />
    </div>
  );
}
