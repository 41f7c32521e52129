'use client';

import dynamic from 'next/dynamic';
import { useMemo, useState } from 'react';
import { chartColors } from '@/components/charts';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { useBlend } from '@/lib/hooks/use-blend';
import { blendRequestFromDocument } from '@/lib/system-model/blend';
import { fromFirstArrival } from '@/lib/system-model/first-arrival';
import { blendMainSpeaker } from '@/lib/system-model/system-from-document';
import { pathsVoicingLine } from '@/lib/system-model/voicing';
import { BlendPlots } from './blend-plots';
import { BlendReadouts } from './blend-readouts';
import { BlendSettings } from './blend-settings';
import { slopeShortName } from './slope-select';

// The Crossover sweep sits below the plots; it loads after them.
const CrossoverSweep = dynamic(() => import('./crossover-sweep').then((m) => m.CrossoverSweep), {
  loading: () => (
    <p role="status" className="text-sm text-ink-soft">
      Loading the Crossover sweep…
    </p>
  ),
});

const RANGES = [
  { id: 'low', label: '10 Hz – 1 kHz', stopHz: 1000 },
  { id: 'full', label: '10 Hz – 20 kHz', stopHz: 20000 },
] as const;

/** Blend: how the main channel shown and the subs sum through the crossover at the MLP, with its settings beside it. */
export function BlendPanel() {
  const { doc } = useSystem();
  const [channel, setChannel] = useState<string | undefined>(undefined);
  const [range, setRange] = useState<(typeof RANGES)[number]['id']>('low');
  const [cursorHz, setCursorHz] = useState<number | null>(null);
  const [hidden, setHidden] = useState<ReadonlySet<string>>(new Set());

  const stopHz = RANGES.find((r) => r.id === range)?.stopHz ?? 1000;
  const speaker = blendMainSpeaker(doc, channel);
  const request = useMemo(() => {
    const body = blendRequestFromDocument(doc, { channel: speaker?.channel, stopHz });
    if (!body) return null;
    // Phase and group delay relative to the first arrival at the MLP (the reference every Lesson frame uses too).
    const { paths, nearestM } = fromFirstArrival(body.paths);
    return { ...body, paths, crossoverHz: doc.bassManagement.crossoverHz, nearestM };
  }, [doc, speaker?.channel, stopHz]);
  const { data, error, pending } = useBlend(request ? { temperatureC: request.temperatureC, grid: request.grid, paths: request.paths, crossoverHz: request.crossoverHz } : null);

  const bm = doc.bassManagement;
  const voicing = speaker ? pathsVoicingLine(doc, speaker) : null;
  const toggle = (traceId: string) =>
    setHidden((h) => {
      const next = new Set(h);
      if (next.has(traceId)) next.delete(traceId);
      else next.add(traceId);
      return next;
    });

  const placed = new Set<string>();
  if (error) {
    for (const i of error.issues) if (/^(crossoverHz|paths\.\d+\.(filter|delayMs|gainDb|invert))/.test(i.path)) placed.add(i.path);
  }
  const unplaced = error && (error.issues.length === 0 || error.issues.some((i) => !placed.has(i.path)));

  const markers = [{ hz: bm.crossoverHz, label: `${Math.round(bm.crossoverHz)} Hz crossover`, color: chartColors.target, dashed: true }];
  const fileBase = `blend-${speaker?.channel ?? 'mains'}-${Math.round(bm.crossoverHz)}hz`;

  if (!speaker || doc.subs.length === 0) {
    return (
      <div className="py-4">
        <Notice kind="info" title="Nothing to blend yet">
          {!speaker ? 'Add a main speaker on Layout' : 'Add a subwoofer on Layout'} to see how the mains and subs sum through the crossover.
        </Notice>
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-6 py-4">
      {/* Wide: the settings beside the plots. Narrow (one column): the summary and the magnitude plot first, the settings
          right under it, then the read-outs, phase and group delay (the plots' column dissolves into the grid; order-*). */}
      <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(16rem,20rem)_minmax(0,1fr)]">
        <div className="max-lg:order-3">
          <BlendSettings channel={speaker.channel} onChannel={setChannel} error={error} nearestM={request ? request.nearestM : null} />
        </div>

        <div className="flex min-w-0 flex-col gap-4 max-lg:contents" aria-busy={pending}>
          <div className="flex flex-wrap items-center justify-between gap-2 max-lg:order-1">
            <p className="text-sm text-ink-soft">
              <span className="font-medium text-ink">{speaker.channel}</span> with {doc.subs.length === 1 ? 'the sub' : `${doc.subs.length} subs`}: {slopeShortName(bm.mainsHighpass)} high-pass, {slopeShortName(bm.subLowpass)} low-pass at{' '}
              <span className="num">{Math.round(bm.crossoverHz)}</span> Hz, at the MLP
              {pending ? <span className="ml-2 text-ink-faint">updating…</span> : null}
            </p>
            <div role="group" aria-label="Frequency range" className="flex overflow-hidden rounded-md border border-line text-sm">
              {RANGES.map((r) => (
                <button key={r.id} type="button" aria-pressed={range === r.id} onClick={() => setRange(r.id)} className={`px-2.5 py-1 ${range === r.id ? 'bg-ink text-white' : 'bg-white text-ink hover:bg-wash'}`}>
                  {r.label}
                </button>
              ))}
            </div>
          </div>
          {voicing ? (
            <p className="-mt-2 text-xs text-ink-soft max-lg:order-1" data-testid="blend-voicing-line">
              <span className="font-medium">Voicing:</span> {voicing.text}
              {voicing.staleCount > 0 ? <span className="text-warn-strong">{`${voicing.text ? ' · ' : ''}${voicing.staleCount} switch choice${voicing.staleCount === 1 ? '' : 's'} no longer on the profile (first position used)`}</span> : null}
            </p>
          ) : null}

          {unplaced && error ? (
            <div className="max-lg:order-1">
              <Notice kind="error" title="The blend could not be computed">
                {error.message}
              </Notice>
            </div>
          ) : null}

          <div className="max-lg:order-4">
            <BlendReadouts metrics={data?.metrics ?? null} pathNames={data?.paths.map((p) => p.name) ?? []} />
          </div>

          <BlendPlots data={data} stopHz={stopHz} crossoverHz={bm.crossoverHz} markers={markers} fileBase={fileBase} hidden={hidden} onToggle={toggle} cursorHz={cursorHz} onCursorHz={setCursorHz} />
        </div>
      </div>

      <CrossoverSweep channel={speaker.channel} />
    </div>
  );
}
