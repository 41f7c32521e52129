'use client';

import { useMemo, useRef, useState } from 'react';
import { ChartExportButtons, FrequencyPlot, chartColors, formatHzReadout, formatValue, traceStyles } from '@/components/charts';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import { useCompute } from '@/lib/hooks/use-compute';
import type { ExtensionAnswer } from '@/lib/system-model/measured-extension';
import { runGrid, type RunItem, type SourceColumn } from './run-grid';
import type { RunCurveBody } from './run-compare';

interface Props {
  runs: readonly RunItem[];
  curveOf: (id: string) => RunCurveBody | null;
}

const AVERAGE = 'average';
const MAINS_BAND = { startHz: 200, stopHz: 2000 };
const selectClass = 'w-full min-w-0 rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink';

/** The band a source's level is taken over by default: 200 Hz–2 kHz for the mains (common practice); for a sub, half the crossover to the crossover (its passband). */
function defaultBand(column: SourceColumn | undefined, crossoverHz: number) {
  return column?.kind === 'sub' ? { startHz: Math.round(crossoverHz / 2), stopHz: Math.round(crossoverHz) } : MAINS_BAND;
}

const point = (hz: number | null, lowestHz: number) => (hz === null ? `below ${formatHzReadout(lowestHz)}` : formatHzReadout(hz));

/**
 * How low a source goes in the room: for one run, or the seats' spatial average (power average of the newest run at each
 * seat that has the source; common practice), the −3, −6 and −10 dB points below its own level over a band, the rule in
 * words, what it means for the System's crossover, and a plot relative to the band level. From POST /api/v1/measured/extension.
 */
export function ExtensionPanel({ runs, curveOf }: Props) {
  const { doc } = useSystem();
  const svgRef = useRef<SVGSVGElement>(null);
  const grid = useMemo(() => runGrid(doc, runs), [doc, runs]);
  const crossoverHz = doc.bassManagement.crossoverHz;
  // Sources with runs; each with its runs and the newest run per seat (for the spatial average).
  const sources = useMemo(
    () =>
      grid.columns
        .map((column) => {
          const perSeat = grid.rows.map((r) => grid.cells.get(`${r.key}|${column.key}`) ?? []).filter((cell) => cell.length > 0);
          return { column, runs: perSeat.flat(), newestPerSeat: perSeat.map((cell) => cell[cell.length - 1]!).filter((r) => r.seat) };
        })
        .filter((s) => s.runs.length > 0)
        // The mains first, and among them the source measured at the most seats (its spatial average is the default).
        .sort((a, b) => Number(b.column.kind === 'mains') - Number(a.column.kind === 'mains') || b.newestPerSeat.length - a.newestPerSeat.length),
    [grid],
  );
  const [sourceKey, setSourceKey] = useState<string | null>(null);
  const [choice, setChoice] = useState<string | null>(null);
  const [bandEdit, setBandEdit] = useState<Record<string, { startHz: number; stopHz: number }>>({});

  const source = sources.find((s) => s.column.key === sourceKey) ?? sources[0];
  const canAverage = (source?.newestPerSeat.length ?? 0) >= 2;
  const pickedRun = source?.runs.find((r) => r.id === choice);
  const useAverage = choice === AVERAGE ? canAverage : !pickedRun && canAverage;
  const run = pickedRun ?? (useAverage ? undefined : source?.runs[0]);
  const band = (source && bandEdit[source.column.key]) ?? defaultBand(source?.column, crossoverHz);
  const isMains = source?.column.kind === 'mains';

  const body = useMemo(() => {
    const chosen = useAverage ? (source?.newestPerSeat ?? []) : run ? [run] : [];
    if (chosen.length === 0) return null;
    const curves = chosen.map((r) => {
      const c = curveOf(r.id);
      return c ? { name: (r.seat ?? r.name).slice(0, 60), ...c } : null;
    });
    if (curves.some((c) => c === null)) return null;
    return { curves, band, ...(isMains ? { crossoverHz } : {}) };
  }, [useAverage, source, run, curveOf, band, isMains, crossoverHz]);
  const answer = useCompute<ExtensionAnswer>('/api/v1/measured/extension', body);
  const a = body ? (answer.data ?? null) : null;

  if (sources.length === 0) {
    return (
      <section aria-labelledby="extension-title" className="flex flex-col gap-2 rounded-lg border border-line bg-white p-3" data-testid="extension-panel">
        <h3 id="extension-title" className="text-sm font-semibold">
          In-room extension
        </h3>
        <p className="text-sm text-ink-faint">Add a measurement of the mains (a channel alone) to see how low they go in this room.</p>
      </section>
    );
  }

  const relative = a ? a.curve.magnitudeDb.map((v) => v - a.meanLevelDb) : [];
  const lowestHz = a?.lowestMeasuredHz ?? 10;
  const pts = a ? ([['−3 dB', a.pointsHz.minus3], ['−6 dB', a.pointsHz.minus6], ['−10 dB', a.pointsHz.minus10]] as const) : [];
  const verdictKind = a?.crossover?.verdict === 'clear' ? 'ok' : a?.crossover?.verdict === 'too-close' ? 'warn' : 'info';

  return (
    <section aria-labelledby="extension-title" className="flex min-w-0 flex-col gap-3 rounded-lg border border-line bg-white p-3" data-testid="extension-panel">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="extension-title" className="text-sm font-semibold">
          In-room extension
        </h3>
        {a ? <ChartExportButtons svgRef={svgRef} filename="measured-extension" subject="extension" /> : null}
      </div>
      <div className="grid grid-cols-[minmax(0,1fr)] gap-2 sm:grid-cols-2">
        <label className="flex min-w-0 flex-col gap-1 text-xs font-medium text-ink-soft">
          Source
          <select className={selectClass} value={source?.column.key ?? ''} onChange={(e) => { setSourceKey(e.target.value); setChoice(null); }} data-testid="extension-source">
            {sources.map((s) => (
              <option key={s.column.key} value={s.column.key}>
                {s.column.label} ({s.column.title}, {s.runs.length} run{s.runs.length === 1 ? '' : 's'})
              </option>
            ))}
          </select>
        </label>
        <label className="flex min-w-0 flex-col gap-1 text-xs font-medium text-ink-soft">
          Curve
          <select className={selectClass} value={useAverage ? AVERAGE : (run?.id ?? '')} onChange={(e) => setChoice(e.target.value)} data-testid="extension-curve">
            {canAverage ? <option value={AVERAGE}>Spatial average of {source!.newestPerSeat.length} seats (power average)</option> : null}
            {source?.runs.map((r) => (
              <option key={r.id} value={r.id}>
                {[r.seat ?? 'no seat', r.runLabel ?? r.name].join(' · ')}
              </option>
            ))}
          </select>
        </label>
      </div>
      <div className="flex flex-wrap items-end gap-3">
        <NumberField label="Band from" unit="Hz" value={band.startHz} min={10} max={24000} step={10} onChange={(v) => source && setBandEdit((b) => ({ ...b, [source.column.key]: { ...band, startHz: v } }))} />
        <NumberField label="Band to" unit="Hz" value={band.stopHz} min={10} max={24000} step={10} onChange={(v) => source && setBandEdit((b) => ({ ...b, [source.column.key]: { ...band, stopHz: v } }))} />
      </div>
      <p className="text-xs text-ink-soft" data-testid="extension-rule">
        The level of reference is the curve&apos;s power average over {formatHzReadout(band.startHz)}–{formatHzReadout(band.stopHz)}
        {a ? <> ({formatValue(a.meanLevelDb, 'dB', 1)})</> : null}; going down from the band, each point is where the curve first falls 3, 6 or 10 dB below it.
        {useAverage && a ? ` The curve is the power average of the newest run at each of ${a.averagedFrom} seats (${a.names.join(', ')}; common practice).` : ''}
        {isMains ? '' : ' The crossover is judged on the mains only.'}
      </p>
      {answer.error && body ? <Notice kind="error">{answer.error.message}</Notice> : null}
      {a ? (
        <>
          <dl className="grid grid-cols-3 gap-2 text-center" data-testid="extension-points">
            {pts.map(([name, hz]) => (
              <div key={name} className="rounded-md bg-paper px-2 py-1.5">
                <dt className="text-xs text-ink-soft">{name} point</dt>
                <dd className="num text-sm font-semibold text-ink">{point(hz, lowestHz)}</dd>
              </div>
            ))}
          </dl>
          {a.crossover ? (
            <Notice kind={verdictKind}>
              <span data-testid="extension-verdict">{a.crossover.summary}</span> <span className="text-xs">Rule: {a.crossover.rule}.</span>
            </Notice>
          ) : null}
          <FrequencyPlot
            ref={svgRef}
            title="In-room extension: the curve relative to its band level"
            description={`The ${useAverage ? 'seats’ spatial average' : 'measured curve'} minus its power average over the band, with the −3, −6 and −10 dB points and the crossover marked.`}
            frequencyHz={a.curve.frequencyHz}
            minHz={Math.max(10, a.curve.frequencyHz[0] ?? 10)}
            maxHz={Math.min(20000, a.curve.frequencyHz[a.curve.frequencyHz.length - 1] ?? 1000, band.stopHz * 2)}
            yLabel="Level re band"
            yUnit="dB"
            yDomain={[-30, 10]}
            traces={[{ id: 'curve', label: useAverage ? 'Spatial average' : (run?.runLabel ?? run?.name ?? 'Curve'), values: relative, ...(source?.column.kind === 'sub' ? traceStyles.sub : traceStyles.mains) }]}
            references={[{ value: 0, label: 'Band level' }, { value: -3, label: '−3 dB' }, { value: -6, label: '−6 dB' }, { value: -10, label: '−10 dB' }]}
            markers={[
              // Only the −3 dB point is labelled on the plot (the three are listed above it), so labels do not collide on a phone.
              ...pts.filter(([, hz]) => hz !== null).map(([name, hz]) => ({ hz: hz as number, ...(name === '−3 dB' ? { label: name } : {}), color: chartColors.mains })),
              ...(isMains ? [{ hz: crossoverHz, label: 'Crossover', dashed: true, color: chartColors.sub }] : []),
            ]}
            showLegend={false}
            aspect={0.4}
          />
        </>
      ) : body && answer.pending ? (
        <p className="text-sm text-ink-faint" aria-live="polite">
          Working out the extension…
        </p>
      ) : null}
    </section>
  );
}
