'use client';

import { useEffect, useMemo } from 'react';
import { FrequencyPlot, traceStyles, chartColors, type FrequencyMarker, type PlotTrace } from '@/components/charts';
import { applyLessonSweepToDocument, formatSweepValue, sweepValueAt } from '@/lib/system-model/lesson-sweep';
import { axialModesHz, computeLessonFrame, FRAME_START_HZ } from '@/lib/system-model/lesson-frame';
import type { LessonPanel, LessonTrace, Sweep } from '@/lib/validations/lesson';
import type { SystemDocument } from '@/lib/validations/system';
import { TimeStepPlot } from './time-step-plot';

export interface StepPlotStep {
  document: SystemDocument;
  panel: LessonPanel;
  traces: LessonTrace[];
  sweep: Sweep | null;
  title: string;
}

const SUB_STYLES = [traceStyles.sub, traceStyles.sub2];

interface StepPlotProps {
  step: StepPlotStep;
  progress?: number;
  emphasis?: 'default' | 'projector';
  compact?: boolean;
  /** The height of the plots together, px (the Presenter view fits them to the screen); else each from its width. */
  plotsHeightPx?: number;
}

/** Of the plots' height, the magnitude plot's share when the phase plot is shown under it. */
const MAGNITUDE_SHARE = 0.56;

declare global {
  interface Window {
    /** Frames the Lesson plot has drawn (read by scripts/bench-ui-sweep.ts and the e2e test). */
    __seamlineLessonFrames?: number;
  }
}

const fmt = (v: number | null | undefined, digits = 1, unit = '') => {
  if (v == null || !Number.isFinite(v)) return '—';
  const text = Math.abs(v).toFixed(digits);
  // No "−0.0": a value that rounds to zero has no sign.
  return `${v < 0 && Number(text) !== 0 ? '\u2212' : ''}${text}${unit ? `\u2009${unit}` : ''}`;
};

/** Levels below −60 dB read as a null (an exact cancellation is −300 dB in dsp/). */
const fmtDb = (v: number) => (Number.isFinite(v) && v < -60 ? 'null (below −60 dB)' : `${v > 0.05 ? '+' : ''}${fmt(v, 1, 'dB')}`);

/** The plot of one Step: in time for a 'time' Step (impulse and step responses), else over frequency. */
export function StepPlot(props: StepPlotProps) {
  return props.step.panel === 'time' ? <TimeStepPlot {...props} /> : <FrequencyStepPlot {...props} />;
}

/**
 * The plot of one Step at one moment of its sweep (`progress` 0–1): magnitude of the mains, each
 * sub and the sum, the phase when asked, and the read-outs at the crossover. Recomputed from dsp/
 * in the browser on every call, so a sweep animates frame by frame. The phase is drawn from the first arrival at the
 * MLP, as Blend draws it (lib/system-model/lesson-frame.ts).
 */
function FrequencyStepPlot({ step, progress = 0, emphasis = 'default', compact = false, plotsHeightPx }: StepPlotProps) {
  const { sweep } = step;
  const value = useMemo(() => (sweep ? sweepValueAt(sweep, progress) : null), [sweep, progress]);
  const doc = useMemo(() => (sweep && value ? applyLessonSweepToDocument(step.document, sweep, value) : step.document), [step.document, sweep, value]);
  const frame = useMemo(() => computeLessonFrame(doc), [doc]);
  const modes = useMemo(() => (step.panel === 'modes' ? axialModesHz(step.document, 200) : []), [step.panel, step.document]);

  // Count drawn frames for the frame-rate bench (after commit; never during render).
  useEffect(() => {
    window.__seamlineLessonFrames = (window.__seamlineLessonFrames ?? 0) + 1;
  }, [frame]);

  if (!frame) return <p className="text-ink-soft">This Step&apos;s System has no main speakers, so there is no blend to show.</p>;
  const { result, metrics, assessment } = frame;
  const show = new Set(step.traces);
  const traces: PlotTrace[] = [];
  const first = result.paths[0];
  if (show.has('mains') && first) traces.push({ id: 'mains', label: `Mains (${first.name})`, values: first.magnitudeDb, ...traceStyles.mains });
  if (show.has('subs')) {
    result.paths.slice(1).forEach((p, i) => traces.push({ id: `sub-${i}`, label: p.name, values: p.magnitudeDb, ...(SUB_STYLES[i % 2] ?? traceStyles.sub) }));
  }
  if (show.has('sum') || traces.length === 0) traces.push({ id: 'sum', label: 'Sum', values: result.sum.magnitudeDb, ...traceStyles.sum });
  const markers: FrequencyMarker[] = [{ hz: frame.crossoverHz, label: `Crossover ${Math.round(frame.crossoverHz)} Hz`, dashed: true }];
  for (const m of modes.slice(0, 8)) markers.push({ hz: m.hz, label: undefined, color: chartColors.inkMuted, dashed: true });
  const references = show.has('target') && assessment ? [{ value: assessment.referenceLevelDb, label: 'Flat' }] : [];
  const phaseTraces: PlotTrace[] = [];
  if (show.has('phase')) {
    if (first) phaseTraces.push({ id: 'mains-phase', label: 'Mains phase', values: first.phaseDeg, ...traceStyles.mains });
    result.paths.slice(1).forEach((p, i) => phaseTraces.push({ id: `sub-${i}-phase`, label: `${p.name} phase`, values: p.phaseDeg, ...(SUB_STYLES[i % 2] ?? traceStyles.sub) }));
  }
  const big = emphasis === 'projector';
  const magnitudeHeightPx = plotsHeightPx === undefined ? undefined : Math.round(phaseTraces.length ? plotsHeightPx * MAGNITUDE_SHARE : plotsHeightPx);
  const phaseHeightPx = plotsHeightPx === undefined || magnitudeHeightPx === undefined ? undefined : plotsHeightPx - magnitudeHeightPx;
  const readouts: { label: string; value: string; id: string }[] =
    metrics && assessment
      ? [
          { id: 'sum', label: 'Sum at crossover', value: fmtDb(metrics.sumLevelDb) },
          { id: 'phase', label: 'Phase difference there', value: fmt(metrics.phaseDifferenceDeg, 0, '°') },
          { id: 'dip', label: 'Deepest dip (fc/2 … 2·fc)', value: `${fmtDb(assessment.deepestDipDb)} at ${Math.round(assessment.deepestDipHz)}\u2009Hz` },
        ]
      : [];
  if (step.panel === 'timing') {
    readouts.push({ id: 'distances', label: 'Distances to the MLP', value: `mains ${frame.mainsDistanceM.toFixed(2)} m · sub ${frame.subDistancesM.map((d) => d.toFixed(2)).join(', ')} m` });
  }

  const readoutList = readouts.length ? (
        <dl className={`grid gap-x-6 gap-y-1 ${big ? 'grid-cols-3 text-2xl' : 'grid-cols-1 text-sm sm:grid-cols-3'}`}>
          {readouts.map((r) => (
            <div key={r.id} className="flex flex-col">
              <dt className="text-ink-soft">{r.label}</dt>
              <dd className="num font-semibold" data-testid={`readout-${r.id}`}>
                {r.value}
              </dd>
            </div>
          ))}
        </dl>
  ) : null;

  return (
    <div className="flex flex-col gap-3" data-testid="step-plot">
      {sweep && value ? (
        <p className={`num font-semibold text-ink ${big ? 'text-5xl' : 'text-2xl'}`} data-testid="sweep-value" aria-live="off">
          {formatSweepValue(sweep, value)}
        </p>
      ) : null}
      {big ? readoutList : null}
      <FrequencyPlot
        title={`${step.title}: level of mains, sub and sum`}
        quantity="magnitude"
        frequencyHz={result.frequencyHz}
        minHz={FRAME_START_HZ}
        maxHz={1000}
        yDomain={[-30, 10]}
        yTicks={[-30, -24, -18, -12, -6, 0, 6]}
        traces={traces}
        references={references}
        markers={markers}
        emphasis={emphasis}
        aspect={compact ? 0.45 : big ? (phaseTraces.length ? 0.3 : 0.4) : 0.5}
        heightPx={magnitudeHeightPx}
      />
      {phaseTraces.length ? (
        <FrequencyPlot
          title={`${step.title}: phase`}
          description="Phase of the mains and each sub, wrapped to ±180°, relative to the first arrival at the MLP."
          quantity="phase"
          frequencyHz={result.frequencyHz}
          minHz={FRAME_START_HZ}
          maxHz={1000}
          traces={phaseTraces}
          // The magnitude plot's legend already names these colours when it shows the mains and the subs.
          showLegend={!(show.has('mains') && show.has('subs'))}
          emphasis={emphasis}
          aspect={big ? 0.18 : 0.3}
          heightPx={phaseHeightPx}
        />
      ) : null}
      {!big ? readoutList : null}
      {step.panel === 'modes' && modes.length ? (
        <p className={big ? 'text-xl text-ink-soft' : 'text-xs text-ink-soft'}>Dashed grey lines: the room&apos;s first axial modes ({modes.slice(0, 8).map((m) => `${m.hz.toFixed(0)} Hz`).join(', ')}).</p>
      ) : null}
    </div>
  );
}
