'use client';

import { LinePlot } from './line-plot';
import type { AxisTicks, CommonPlotProps, XMarker } from './plot-types';
import { logTicks, thinLogTicks } from './log-ticks';

export type FrequencyQuantity = 'magnitude' | 'phase' | 'group-delay' | 'custom';

/** A vertical marker at a frequency, e.g. `{ hz: 80, label: '80 Hz crossover' }`. */
export interface FrequencyMarker {
  hz: number;
  label?: string;
  color?: string;
  dashed?: boolean;
}

export interface FrequencyPlotProps extends CommonPlotProps {
  /** Shared, ascending sample frequencies of every trace, Hz. */
  frequencyHz: ArrayLike<number>;
  /** Lower edge of the axis, Hz (default 10). */
  minHz?: number;
  /** Upper edge of the axis, Hz (default 1000, at most 20 000). */
  maxHz?: number;
  /**
   * Presets for the y axis: magnitude (dB), phase (degrees, −180…180, wrap jumps broken) or
   * group delay (ms). Explicit yLabel/yUnit/yDomain/yTicks/breakJumpsOver win.
   */
  quantity?: FrequencyQuantity;
  /** Break the line where consecutive values differ by more than this (phase: 180). */
  breakJumpsOver?: number;
  markers?: readonly FrequencyMarker[];
  /** Controlled crosshair frequency, Hz (null = none); share one value between stacked plots. */
  cursorHz?: number | null;
  onCursorHz?: (hz: number | null) => void;
}

export const MAX_PLOT_HZ = 20_000;

/** `formatHzReadout(82.37)` → `"82.4 Hz"`, `formatHzReadout(1250)` → `"1.25 kHz"`. */
export function formatHzReadout(hz: number): string {
  if (!Number.isFinite(hz)) return '—';
  if (hz >= 1000) return `${Number((hz / 1000).toPrecision(3))}\u2009kHz`;
  return `${hz < 100 ? hz.toFixed(1) : hz.toFixed(0)}\u2009Hz`;
}

const PRESETS: Record<FrequencyQuantity, { yLabel?: string; yUnit?: string; yDomain?: [number, number]; yTicks?: number[]; breakJumpsOver?: number }> = {
  magnitude: { yLabel: 'Level', yUnit: 'dB' },
  phase: { yLabel: 'Phase', yUnit: '°', yDomain: [-180, 180], yTicks: [-180, -90, 0, 90, 180], breakJumpsOver: 180 },
  'group-delay': { yLabel: 'Group delay', yUnit: 'ms' },
  custom: {},
};

/** Labelled ticks for the axis, thinned to whole decades when the plot is too narrow. */
export function frequencyAxisTicks(minHz: number, maxHz: number, innerWidthPx: number, fontPx: number): AxisTicks {
  const ticks = logTicks(minHz, maxHz);
  const pxPerDecade = innerWidthPx / Math.log10(maxHz / minHz);
  // Widest label is three characters ("200", "10k") plus a gap.
  const major = thinLogTicks(ticks.major, pxPerDecade, fontPx * 0.62 * 3 + 8);
  const labelled = new Set(major.map((t) => t.hz));
  return {
    major: major.map((t) => ({ value: t.hz, label: t.label })),
    minor: [...ticks.minor, ...ticks.major.filter((t) => !labelled.has(t.hz)).map((t) => t.hz)].sort((a, b) => a - b),
  };
}

/**
 * Traces over a log-frequency axis (magnitude, phase, group delay) with reference lines,
 * markers, a crosshair read-out and a legend that toggles traces.
 *
 * @example
 * <FrequencyPlot title="Blend magnitude" quantity="magnitude" frequencyHz={f}
 *   traces={[{ id: 'sum', label: 'Sum', values: sumDb, ...traceStyles.sum }]}
 *   references={[{ value: 0, label: 'Target' }]} markers={[{ hz: 80, label: 'Crossover' }]} />
 */
export function FrequencyPlot(props: FrequencyPlotProps) {
  const { frequencyHz, minHz = 10, quantity = 'custom', markers = [], cursorHz, onCursorHz, ...rest } = props;
  const maxHz = Math.min(MAX_PLOT_HZ, props.maxHz ?? 1000);
  const preset = PRESETS[quantity];
  const lineMarkers: XMarker[] = markers.map((k) => ({ x: k.hz, label: k.label, color: k.color, dashed: k.dashed }));
  const first = markers.find((k) => k.hz >= minHz && k.hz <= maxHz);
  return (
    <LinePlot
      {...rest}
      yLabel={props.yLabel ?? preset.yLabel}
      yUnit={props.yUnit ?? preset.yUnit}
      yDomain={props.yDomain ?? preset.yDomain}
      yTicks={props.yTicks ?? preset.yTicks}
      breakJumpsOver={props.breakJumpsOver ?? preset.breakJumpsOver}
      x={frequencyHz}
      xScaleKind="log"
      xDomain={[minHz, maxHz]}
      xTicks={(innerW, fontPx) => frequencyAxisTicks(minHz, maxHz, innerW, fontPx)}
      xLabel="Frequency (Hz)"
      formatX={formatHzReadout}
      // 1/48 octave per arrow key, 1/3 octave with Shift.
      stepX={(hz, direction, large) => hz * 2 ** (direction / (large ? 3 : 48))}
      startX={first?.hz ?? Math.sqrt(minHz * maxHz)}
      markers={lineMarkers}
      cursor={cursorHz}
      onCursor={onCursorHz}
    />
  );
}
