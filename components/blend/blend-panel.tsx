'use client';

import dynamic from 'next/dynamic';
import { useId, useMemo, useRef, useState } from 'react';
import { ChartExportButtons, FrequencyPlot, chartColors, traceStyles, type PlotTrace } from '@/components/charts';
import { useSystem } from '@/components/editor/system-context';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import { useBlend } from '@/lib/hooks/use-blend';
import type { ApiError } from '@/lib/client/api';
import { blendMainSpeaker, blendRequestFromDocument } from '@/lib/system-model';
import type { BlendAnswer } from '@/lib/system-model/blend-compute';
import type { Slope, SystemDocument } from '@/lib/validations/system';
import { BlendReadouts } from './blend-readouts';
import { SlopeSelect, slopeShortName } from './slope-select';

// The Crossover sweep sits below the plots; it loads after them.
const CrossoverSweep = dynamic(() => import('./crossover-sweep').then((m) => m.CrossoverSweep), {
  loading: () => (
    <p role="status" className="text-sm text-ink-soft">
      Loading the Crossover sweep…
    </p>
  ),
});

const SUB_STYLES = [traceStyles.sub, traceStyles.sub2];
/** More than two subs: alternate amber and brown with dashes so each stays apart. */
function subStyle(k: number): { color: string; width: number; dashed?: boolean } {
  const base = SUB_STYLES[k % 2] ?? traceStyles.sub;
  return k >= 2 ? { ...base, dashed: true } : base;
}

const RANGES = [
  { id: 'low', label: '10 Hz – 1 kHz', stopHz: 1000 },
  { id: 'full', label: '10 Hz – 20 kHz', stopHz: 20000 },
] as const;

/** The API's error for a path field of the blend request, placed beside the control that sets it. */
function pathError(error: ApiError | undefined, pathIndex: number, field: string): string | undefined {
  return error?.field(`paths.${pathIndex}.${field}`);
}

/** The magnitude axis: −30 dB up to a little above the loudest trace shown (in 6 dB steps). */
function magnitudeDomain(data: BlendAnswer | undefined, stopHz: number): [number, number] {
  let top = 6;
  if (data) {
    const f = data.frequencyHz;
    for (const series of [data.sum.magnitudeDb, ...data.paths.map((p) => p.magnitudeDb)]) {
      for (let i = 0; i < f.length; i++) if ((f[i] as number) <= stopHz && (series[i] as number) > top - 1) top = Math.ceil(((series[i] as number) + 1) / 6) * 6;
    }
  }
  return [-30, Math.min(30, top)];
}

/** Group delay axis: the sum's range between 15 Hz and the top, clipped so a null's spike does not flatten the rest. */
function groupDelayDomain(data: BlendAnswer | undefined): [number, number] {
  if (!data) return [0, 20];
  let lo = 0;
  let hi = 5;
  data.frequencyHz.forEach((f, i) => {
    const v = data.sum.groupDelayMs[i] as number;
    if (f < 15 || !Number.isFinite(v)) return;
    lo = Math.min(lo, Math.max(-20, v));
    hi = Math.max(hi, Math.min(80, v));
  });
  return [Math.floor(lo / 5) * 5, Math.ceil(hi / 5) * 5];
}

export function BlendPanel() {
  const { doc, update, readOnly } = useSystem();
  const id = useId();
  const [channel, setChannel] = useState<string | undefined>(undefined);
  const [range, setRange] = useState<(typeof RANGES)[number]['id']>('low');
  const [cursorHz, setCursorHz] = useState<number | null>(null);
  const [hidden, setHidden] = useState<ReadonlySet<string>>(new Set());
  const magRef = useRef<SVGSVGElement>(null);
  const phaseRef = useRef<SVGSVGElement>(null);
  const gdRef = useRef<SVGSVGElement>(null);

  const stopHz = RANGES.find((r) => r.id === range)?.stopHz ?? 1000;
  const speaker = blendMainSpeaker(doc, channel);
  const request = useMemo(() => {
    const body = blendRequestFromDocument(doc, { channel: speaker?.channel, stopHz });
    if (!body) return null;
    // Show phase and group delay relative to the first arrival: the same air path taken off every
    // path changes neither the levels nor how the paths line up, and keeps the phase readable.
    const nearestM = Math.min(...body.paths.map((p) => p.distanceM ?? 0));
    const paths = body.paths.map((p) => ({ ...p, distanceM: Math.round(((p.distanceM ?? 0) - nearestM) * 1e4) / 1e4 }));
    return { ...body, paths, crossoverHz: doc.bassManagement.crossoverHz, nearestM };
  }, [doc, speaker?.channel, stopHz]);
  const { data, error, pending } = useBlend(request ? { temperatureC: request.temperatureC, grid: request.grid, paths: request.paths, crossoverHz: request.crossoverHz } : null);

  const bm = doc.bassManagement;
  const setBm = (patch: Partial<SystemDocument['bassManagement']>) => update((d) => ({ ...d, bassManagement: { ...d.bassManagement, ...patch } }));
  const setSub = (k: number, patch: Partial<SystemDocument['subs'][number]>) => update((d) => ({ ...d, subs: d.subs.map((s, i) => (i === k ? { ...s, ...patch } : s)) }));
  const toggle = (traceId: string) =>
    setHidden((h) => {
      const next = new Set(h);
      if (next.has(traceId)) next.delete(traceId);
      else next.add(traceId);
      return next;
    });

  // Errors the API names: paths.0 is the mains, paths.k (k ≥ 1) sub k − 1.
  const cornerError = error?.field('crossoverHz') ?? error?.issues.find((i) => /^paths\.\d+\.filter\.cornerHz$/.test(i.path))?.message;
  const mainsSlopeError = pathError(error, 0, 'filter');
  const subSlopeError = error?.issues.find((i) => /^paths\.[1-9]\d*\.filter\.(family|order)/.test(i.path))?.message;
  const placed = new Set<string>();
  if (error) {
    for (const i of error.issues) if (/^(crossoverHz|paths\.\d+\.(filter|delayMs|gainDb|invert))/.test(i.path)) placed.add(i.path);
  }
  const unplaced = error && (error.issues.length === 0 || error.issues.some((i) => !placed.has(i.path)));

  const traces = useMemo(() => {
    if (!data) return { magnitude: [] as PlotTrace[], phase: [] as PlotTrace[], groupDelay: [] as PlotTrace[] };
    const [mains, ...subs] = data.paths;
    const magnitude: PlotTrace[] = [];
    const phase: PlotTrace[] = [];
    if (mains) {
      magnitude.push({ id: 'mains', label: `Mains (${mains.name})`, values: mains.magnitudeDb, ...traceStyles.mains });
      phase.push({ id: 'mains', label: `Mains (${mains.name})`, values: mains.phaseDeg, ...traceStyles.mains });
    }
    subs.forEach((s, k) => {
      magnitude.push({ id: `sub-${k}`, label: s.name, values: s.magnitudeDb, ...subStyle(k) });
      phase.push({ id: `sub-${k}`, label: s.name, values: s.phaseDeg, ...subStyle(k) });
    });
    magnitude.push({ id: 'sum', label: 'Sum', values: data.sum.magnitudeDb, ...traceStyles.sum });
    phase.push({ id: 'sum', label: 'Sum', values: data.sum.phaseDeg, ...traceStyles.sum });
    return { magnitude, phase, groupDelay: [{ id: 'sum', label: 'Sum', values: data.sum.groupDelayMs, ...traceStyles.sum }] as PlotTrace[] };
  }, [data]);

  const csvData = useMemo(() => {
    if (!data) return undefined;
    const columns = [
      ...data.paths.flatMap((p, k) => [
        { name: `${k === 0 ? 'mains' : `sub${k}`}_magnitude_db`, values: p.magnitudeDb },
        { name: `${k === 0 ? 'mains' : `sub${k}`}_phase_deg`, values: p.phaseDeg },
      ]),
      { name: 'sum_magnitude_db', values: data.sum.magnitudeDb },
      { name: 'sum_phase_deg', values: data.sum.phaseDeg },
      { name: 'sum_group_delay_ms', values: data.sum.groupDelayMs },
    ];
    return { frequencyHz: data.frequencyHz, columns };
  }, [data]);
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
      <div className="grid gap-6 lg:grid-cols-[minmax(16rem,20rem)_minmax(0,1fr)]">
        <form className="flex flex-col gap-4" aria-label="Blend settings" onSubmit={(e) => e.preventDefault()}>
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-channel`} className="text-xs font-medium text-ink-soft">
              Main channel shown
            </label>
            <select id={`${id}-channel`} value={speaker.channel} onChange={(e) => setChannel(e.target.value)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm" data-testid="blend-channel">
              {doc.speakers.map((s) => (
                <option key={s.id} value={s.channel}>
                  {s.channel}
                </option>
              ))}
            </select>
          </div>
          <NumberField
            label="Crossover frequency"
            unit="Hz"
            value={bm.crossoverHz}
            min={20}
            max={300}
            step={1}
            slider
            disabled={readOnly}
            error={cornerError}
            onChange={(v) => setBm({ crossoverHz: v })}
            testId="crossover-hz"
          />
          <SlopeSelect label="Mains high-pass" value={bm.mainsHighpass} disabled={readOnly} error={mainsSlopeError} onChange={(s: Slope) => setBm({ mainsHighpass: s })} testId="mains-highpass" />
          <SlopeSelect label="Sub low-pass" value={bm.subLowpass} disabled={readOnly} error={subSlopeError} onChange={(s: Slope) => setBm({ subLowpass: s })} testId="sub-lowpass" />
          <NumberField label="Mains delay" unit="ms" value={bm.mainsDelayMs} min={0} max={100} step={0.05} digits={2} disabled={readOnly} error={pathError(error, 0, 'delayMs')} onChange={(v) => setBm({ mainsDelayMs: v })} testId="mains-delay-ms" />
          {doc.subs.map((s, k) => (
            <fieldset key={s.id} className="flex flex-col gap-2 rounded-md border border-line bg-white p-3">
              <legend className="px-1 text-sm font-medium" style={{ color: subStyle(k).color }}>
                {s.name}
              </legend>
              <NumberField label="Delay" unit="ms" value={s.delayMs} min={0} max={30} step={0.05} digits={2} slider disabled={readOnly} error={pathError(error, k + 1, 'delayMs')} onChange={(v) => setSub(k, { delayMs: v })} testId={`sub-${k}-delay-ms`} />
              <NumberField label="Gain" unit="dB" value={s.gainDb} min={-30} max={30} step={0.5} digits={1} disabled={readOnly} error={pathError(error, k + 1, 'gainDb')} onChange={(v) => setSub(k, { gainDb: v })} testId={`sub-${k}-gain-db`} />
              <label className="flex items-center gap-2 text-sm">
                <input type="checkbox" checked={s.invert} disabled={readOnly} onChange={(e) => setSub(k, { invert: e.target.checked })} className="h-4 w-4 accent-[#B45309]" data-testid={`sub-${k}-invert`} />
                Invert polarity
              </label>
              {pathError(error, k + 1, 'invert') ? <p className="text-xs text-fail">{pathError(error, k + 1, 'invert')}</p> : null}
            </fieldset>
          ))}
          <p className="text-xs text-ink-faint">
            Distances come from Layout (or the measured distance on Timing). Phase and group delay are drawn relative to the first arrival at the MLP
            {request ? ` (${(request.nearestM).toFixed(2)} m of air path taken off every path)` : ''}. Each speaker&apos;s natural roll-off comes from its Speaker profile.
          </p>
        </form>

        <div className="flex min-w-0 flex-col gap-4" aria-busy={pending}>
          <div className="flex flex-wrap items-center justify-between gap-2">
            <p className="text-sm text-ink-soft">
              <span className="font-medium text-ink">{speaker.channel}</span> with {doc.subs.length === 1 ? 'the sub' : `${doc.subs.length} subs`}: {slopeShortName(bm.mainsHighpass)} high-pass, {slopeShortName(bm.subLowpass)} low-pass at{' '}
              <span className="num">{Math.round(bm.crossoverHz)}</span> Hz, at the MLP
              {pending ? <span className="ml-2 text-ink-faint">updating…</span> : null}
            </p>
            <div role="group" aria-label="Frequency range" className="flex overflow-hidden rounded-md border border-line text-sm">
              {RANGES.map((r) => (
                <button key={r.id} type="button" aria-pressed={range === r.id} onClick={() => setRange(r.id)} className={`px-2.5 py-1 ${range === r.id ? 'bg-ink text-white' : 'bg-white text-ink hover:bg-[#EFECE4]'}`}>
                  {r.label}
                </button>
              ))}
            </div>
          </div>

          {unplaced && error ? (
            <Notice kind="error" title="The blend could not be computed">
              {error.message}
            </Notice>
          ) : null}

          <BlendReadouts metrics={data?.metrics ?? null} pathNames={data?.paths.map((p) => p.name) ?? []} />

          <section aria-label="Magnitude" className="flex flex-col gap-1">
            <FrequencyPlot
              ref={magRef}
              title="Blend magnitude"
              description={`Level of the mains, each sub and their sum at the MLP; flat target dashed at 0 dB; crossover ${Math.round(bm.crossoverHz)} Hz.`}
              quantity="magnitude"
              frequencyHz={data?.frequencyHz ?? []}
              maxHz={stopHz}
              traces={traces.magnitude}
              references={[{ value: 0, label: 'Flat target', color: chartColors.target, dashed: true }]}
              markers={markers}
              yDomain={magnitudeDomain(data, stopHz)}
              yAxisChars={4}
              hidden={hidden}
              onToggle={toggle}
              cursorHz={cursorHz}
              onCursorHz={setCursorHz}
              aspect={0.42}
            />
            <ChartExportButtons svgRef={magRef} filename={`${fileBase}-magnitude`} csv={csvData} subject="blend magnitude" />
          </section>
          <section aria-label="Phase" className="flex flex-col gap-1">
            <FrequencyPlot
              ref={phaseRef}
              title="Blend phase"
              description="Phase of the mains, each sub and the sum, wrapped to ±180°, relative to the first arrival at the MLP."
              quantity="phase"
              frequencyHz={data?.frequencyHz ?? []}
              maxHz={stopHz}
              traces={traces.phase}
              markers={markers}
              yAxisChars={4}
              hidden={hidden}
              onToggle={toggle}
              showLegend={false}
              cursorHz={cursorHz}
              onCursorHz={setCursorHz}
              aspect={0.28}
            />
            <ChartExportButtons svgRef={phaseRef} filename={`${fileBase}-phase`} csv={csvData} subject="blend phase" />
          </section>
          <section aria-label="Group delay" className="flex flex-col gap-1">
            <FrequencyPlot
              ref={gdRef}
              title="Group delay of the sum"
              description="Group delay of the summed response, ms, relative to the first arrival at the MLP."
              quantity="group-delay"
              frequencyHz={data?.frequencyHz ?? []}
              maxHz={stopHz}
              traces={traces.groupDelay}
              markers={markers}
              yDomain={groupDelayDomain(data)}
              yAxisChars={4}
              valueDigits={2}
              hidden={hidden}
              onToggle={toggle}
              showLegend={false}
              cursorHz={cursorHz}
              onCursorHz={setCursorHz}
              aspect={0.24}
            />
            <ChartExportButtons svgRef={gdRef} filename={`${fileBase}-group-delay`} csv={csvData} subject="group delay" />
          </section>
        </div>
      </div>

      <CrossoverSweep channel={speaker.channel} />
    </div>
  );
}
