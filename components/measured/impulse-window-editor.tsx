'use client';

import { useId, useMemo, useState } from 'react';
import { formatValue } from '@/components/charts';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { DEFAULT_PRE_ARRIVAL_MS, DEFAULT_WINDOW_LENGTH_MS, impulseWindow } from '@/dsp/measured/impulse-window';
import { clampWindow, hzWords, lowestResolvedHz, snapToSampleMs, viewSpanMs, windowLimits, type ImpulseView, type WindowChoice } from './impulse-plot-data';
import { ImpulsePlot, type WindowEdge } from './impulse-plot';
import type { LoadedWav } from './read-measurement-file';
import { WindowedResponsePreview } from './windowed-response-preview';

interface Props {
  fileName: string;
  loaded: LoadedWav;
  window: WindowChoice;
  onWindow: (window: WindowChoice) => void;
}

const VIEWS: { value: ImpulseView; label: string }[] = [
  { value: 'peak', label: 'Around the peak' },
  { value: 'window', label: 'The window' },
  { value: 'file', label: 'The whole file' },
];

const ms = (v: number, digits = 2) => formatValue(v, 'ms', digits);

/** "48 kHz, 24-bit integer, mono, 1.00 s" */
function fileFacts({ wav }: LoadedWav): string {
  const rate = wav.sampleRateHz % 1000 === 0 ? `${wav.sampleRateHz / 1000} kHz` : `${(wav.sampleRateHz / 1000).toFixed(1)} kHz`;
  const encoding = wav.format === 'float' ? '32-bit float' : `${wav.bitsPerSample}-bit integer`;
  const channels = wav.channels === 1 ? 'mono' : `the first of ${wav.channels} channels`;
  return `${rate}, ${encoding}, ${channels}, ${wav.durationS.toFixed(2)} s`;
}

/** The default window in words, with what the file's edges changed. */
function defaultWords(loaded: LoadedWav): string {
  const { defaults, arrivalMs } = loaded;
  const base = `${DEFAULT_PRE_ARRIVAL_MS} ms before the peak, ${DEFAULT_WINDOW_LENGTH_MS} ms long`;
  const notes = [
    arrivalMs - defaults.startMs < DEFAULT_PRE_ARRIVAL_MS - 0.5 ? 'here it starts at the file’s first sample' : null,
    defaults.lengthMs < DEFAULT_WINDOW_LENGTH_MS - 0.5 ? `here it ends at the file’s end, ${ms(defaults.lengthMs, 1)} long` : null,
  ].filter(Boolean);
  return notes.length ? `${base} (${notes.join('; ')})` : base;
}

/**
 * The window an impulse response is read through, set on its plot (drag the edges) or in two number fields, with the
 * default a click away, what the window's length means for the bass, and the magnitude through the window beside it.
 */
export function ImpulseWindowEditor({ fileName, loaded, window, onWindow }: Props) {
  const id = useId();
  const { wav, rec, arrivalMs, peakAbs, defaults } = loaded;
  const [view, setView] = useState<ImpulseView>('window');
  // While an edge is dragged the time axis holds still, so the edge stays under the pointer.
  const [heldSpan, setHeldSpan] = useState<[number, number] | null>(null);
  const durationMs = (wav.samples.length * 1000) / wav.sampleRateHz;
  const span = heldSpan ?? viewSpanMs(view, { durationMs, arrivalMs, window });
  const drawn = useMemo(() => impulseWindow({ samples: wav.samples, sampleRateHz: wav.sampleRateHz, ...window }), [wav, window]);
  const limits = windowLimits(rec, window.startMs);
  const isDefault = Math.abs(window.startMs - defaults.startMs) < 1e-9 && Math.abs(window.lengthMs - defaults.lengthMs) < 1e-9;
  const lowestHz = lowestResolvedHz(drawn.lengthMs);
  const afterPeakMs = drawn.startMs + drawn.lengthMs - arrivalMs;

  const dragEdge = (edge: WindowEdge, atMs: number, done: boolean) => {
    setHeldSpan(done ? null : span);
    const t = snapToSampleMs(atMs, wav.sampleRateHz);
    const endMs = window.startMs + window.lengthMs;
    if (edge === 'start') {
      const startMs = Math.max(0, Math.min(limits.maxStartMs, t));
      onWindow(clampWindow(rec, { startMs, lengthMs: endMs - startMs }));
    } else onWindow(clampWindow(rec, { startMs: window.startMs, lengthMs: t - window.startMs }));
  };

  return (
    <section aria-labelledby={`${id}-title`} className="flex flex-col gap-3" data-testid="impulse-window-editor">
      <div>
        <h4 id={`${id}-title`} className="text-sm font-semibold">
          Impulse response and its window
        </h4>
        <p className="text-sm text-ink-soft" data-testid="wav-facts">
          <span className="font-medium text-ink">{fileName}</span>: {fileFacts(loaded)}. The peak arrives at{' '}
          <span className="num font-medium text-ink" data-testid="wav-arrival">
            {ms(arrivalMs)}
          </span>{' '}
          from the file&apos;s first sample.
        </p>
      </div>

      <div className="grid min-w-0 gap-4 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="flex min-w-0 flex-col gap-2">
          <fieldset className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
            <legend className="sr-only">Time span shown on the impulse plot</legend>
            <span className="text-xs font-medium text-ink-soft" aria-hidden="true">
              Show
            </span>
            {VIEWS.map((v) => (
              <label key={v.value} className="flex items-center gap-1.5">
                <input type="radio" name={`${id}-view`} value={v.value} checked={view === v.value} onChange={() => setView(v.value)} className="accent-mains" />
                {v.label}
              </label>
            ))}
          </fieldset>
          <ImpulsePlot
            title={`Impulse response of ${fileName} with the window`}
            samples={wav.samples}
            sampleRateHz={wav.sampleRateHz}
            peakAbs={peakAbs}
            arrivalMs={arrivalMs}
            window={drawn}
            spanMs={span}
            onDragEdge={dragEdge}
          />
          <div className="flex flex-wrap items-end gap-3">
            <NumberField
              label="Window start"
              unit="ms"
              value={window.startMs}
              onChange={(v) => onWindow(clampWindow(rec, { startMs: v, lengthMs: window.lengthMs }))}
              min={0}
              max={Number(limits.maxStartMs.toFixed(6))}
              step={1}
              digits={2}
              hint="from the file’s first sample"
              testId="window-start"
            />
            <NumberField
              label="Window length"
              unit="ms"
              value={window.lengthMs}
              onChange={(v) => onWindow(clampWindow(rec, { startMs: window.startMs, lengthMs: v }))}
              min={Number(limits.minLengthMs.toFixed(6))}
              max={Number(limits.maxLengthMs.toFixed(6))}
              step={10}
              digits={2}
              hint={`at most ${ms(limits.maxLengthMs, 1)} from this start`}
              testId="window-length"
            />
          </div>
          <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <Button variant="secondary" onClick={() => onWindow(defaults)} disabled={isDefault}>
              Default window
            </Button>
            <p className="text-xs text-ink-soft" data-testid="window-default-note">
              The default: {defaultWords(loaded)}.
            </p>
          </div>
        </div>
        <WindowedResponsePreview wav={wav} window={window} defaults={defaults} />
      </div>

      <div className="rounded-md border border-line bg-paper px-3 py-2 text-sm" data-testid="window-meaning">
        <p>
          A <span className="num">{ms(drawn.lengthMs, drawn.lengthMs < 10 ? 1 : 0)}</span> window resolves down to about{' '}
          <span className="num font-medium">{hzWords(lowestHz)} Hz</span> (about one over its length). It keeps what arrives up to{' '}
          <span className="num">{ms(afterPeakMs, 1)}</span> after the peak: the direct sound and the room&apos;s reflections within that time.
        </p>
        <p className="mt-1 text-ink-soft">
          A shorter window smooths the bass and leaves out the room&apos;s later reflections; a longer one keeps more of the room, and more of its noise.
        </p>
        {lowestHz >= 20 ? (
          <p className="mt-1 font-medium text-warn-strong" data-testid="window-short-warning">
            This window is too short for the bass: below about {hzWords(lowestHz)} Hz the curve is smoothed, not what a listener hears in the room.
          </p>
        ) : null}
      </div>
    </section>
  );
}
