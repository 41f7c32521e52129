'use client';

import { useEffect, useMemo, useState } from 'react';
import { FrequencyPlot, traceStyles } from '@/components/charts';
import { chartColors } from '@/components/charts/theme';
import { impulseToResponse, type ImpulseResponseCurve } from '@/dsp/measured/impulse-to-response';
import { impulseWindow } from '@/dsp/measured/impulse-window';
import type { WavImpulse } from '@/lib/measurements/read-wav';
import { hzWords, lowestResolvedHz, type WindowChoice } from './impulse-plot-data';

/** Wait this long after the window last moved before transforming it again, ms. */
const DEBOUNCE_MS = 180;

/** The complex response of the recording through a window (the same dsp as the upload route), or why it cannot be had. */
export function windowedResponse(wav: WavImpulse, choice: WindowChoice): { ok: true; curve: ImpulseResponseCurve } | { ok: false; message: string } {
  try {
    return { ok: true, curve: impulseToResponse({ window: impulseWindow({ samples: wav.samples, sampleRateHz: wav.sampleRateHz, ...choice }) }) };
  } catch (e) {
    return { ok: false, message: e instanceof Error ? e.message : 'The window cannot be transformed.' };
  }
}

function useDebounced<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}

const sameWindow = (a: WindowChoice, b: WindowChoice) => Math.abs(a.startMs - b.startMs) < 1e-9 && Math.abs(a.lengthMs - b.lengthMs) < 1e-9;

/** Level range shown: from 50 dB below the highest level to 5 dB above it, in 10 dB steps. */
function levelDomain(curves: readonly ArrayLike<number>[]): [number, number] | undefined {
  let top = -Infinity;
  for (const c of curves) for (let i = 0; i < c.length; i++) top = Math.max(top, c[i] as number);
  if (!Number.isFinite(top)) return undefined;
  const hi = Math.ceil((top + 5) / 10) * 10;
  return [hi - 60, hi];
}

/**
 * The magnitude (dB against log frequency) of the recording through the window, recomputed a moment after the window
 * stops moving; the default window's curve is drawn dashed beside it when the window differs.
 */
export function WindowedResponsePreview({ wav, window, defaults }: { wav: WavImpulse; window: WindowChoice; defaults: WindowChoice }) {
  const settled = useDebounced(window, DEBOUNCE_MS);
  const current = useMemo(() => windowedResponse(wav, settled), [wav, settled]);
  const fallback = useMemo(() => windowedResponse(wav, defaults), [wav, defaults]);
  const showDefault = !sameWindow(settled, defaults) && fallback.ok;
  const pending = !sameWindow(settled, window);
  const maxHz = Math.min(20_000, 0.45 * wav.sampleRateHz);
  const lowestHz = lowestResolvedHz(settled.lengthMs);

  if (!current.ok) {
    return (
      <p role="alert" className="text-sm text-fail">
        {current.message}
      </p>
    );
  }
  const traces = [
    { id: 'window', label: 'Through this window', values: current.curve.magnitudeDb, ...traceStyles.mains },
    ...(showDefault && fallback.ok ? [{ id: 'default', label: 'Through the default window', values: fallback.curve.magnitudeDb, color: chartColors.inkMuted, width: 1.5, dashed: true }] : []),
  ];
  return (
    <div className="flex min-w-0 flex-col gap-1" data-testid="windowed-preview" aria-busy={pending}>
      <p className="text-sm font-medium" aria-hidden="true">
        Magnitude through the window
      </p>
      <FrequencyPlot
        title="Magnitude through the window"
        description={`The recording's level through the window from ${settled.startMs.toFixed(2)} ms, ${settled.lengthMs.toFixed(1)} ms long.`}
        quantity="magnitude"
        frequencyHz={current.curve.frequencyHz}
        minHz={10}
        maxHz={maxHz}
        yDomain={levelDomain(traces.map((t) => t.values))}
        traces={traces}
        markers={lowestHz >= 10 && lowestHz < maxHz ? [{ hz: lowestHz, label: `≈ ${hzWords(lowestHz)} Hz`, color: chartColors.warn, dashed: true }] : []}
        heightPx={220}
        showLegend={showDefault}
      />
      <p className="text-xs text-ink-faint" aria-live="polite">
        {pending ? 'Updating…' : `Level in dB relative to a full-scale impulse; ${current.curve.frequencyHz.length} points, 48 per octave.`}
      </p>
    </div>
  );
}
