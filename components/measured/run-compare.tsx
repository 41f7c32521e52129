'use client';

import { useMemo, useRef, useState } from 'react';
import { ChartExportButtons, FrequencyPlot, finiteExtent, formatHzReadout, formatSigned, overlayColors, type PlotTrace } from '@/components/charts';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import { useCompute } from '@/lib/hooks/use-compute';
import type { CompareAnswer } from '@/lib/system-model/measured-compare';
import { runCaption, type RunItem } from './run-grid';
import { SmoothingSelect } from './smoothing-select';

/** A run as the compare route takes it: a stored id, or the points of a curve used on this page only. */
export type RunCurveBody = { measurementId: string } | { frequencyHz: readonly number[]; magnitudeDb: readonly number[]; phaseDeg?: readonly number[] | null };

interface Props {
  runs: readonly RunItem[];
  curveOf: (id: string) => RunCurveBody | null;
}

/** None, then finest to coarsest: 1/48 … 1/1 octave. */
const DEFAULT_BAND = { startHz: 200, stopHz: 2000 };
const MAX_OTHERS = 12;

/** The range every chosen run covers, and a level-matching band within it (200 Hz–2 kHz where it fits, else the top octave). */
function commonRange(runs: readonly RunItem[]): { startHz: number; stopHz: number; band: { startHz: number; stopHz: number } } | null {
  if (runs.length < 2) return null;
  const startHz = Math.max(...runs.map((r) => r.startHz));
  const stopHz = Math.min(...runs.map((r) => r.stopHz));
  if (!(stopHz >= 2 * startHz)) return { startHz, stopHz, band: DEFAULT_BAND };
  const lo = Math.ceil(Math.max(DEFAULT_BAND.startHz, startHz));
  const hi = Math.floor(Math.min(DEFAULT_BAND.stopHz, stopHz));
  const band = hi >= lo * 2 ? { startHz: lo, stopHz: hi } : { startHz: Math.ceil(stopHz / 2), stopHz: Math.floor(stopHz) };
  return { startHz, stopHz, band };
}

/** The first seat and source with two runs or more (e.g. a voicing switch's two positions): its oldest run against the rest. */
function defaultPick(runs: readonly RunItem[]): { reference: string; others: string[] } | null {
  const groups = new Map<string, RunItem[]>();
  for (const r of runs) {
    const key = `${(r.seat ?? '').toLowerCase()}|${(r.role ?? '').toLowerCase()}`;
    groups.set(key, [...(groups.get(key) ?? []), r]);
  }
  const group = [...groups.values()].find((g) => g.length >= 2);
  if (group) return { reference: group[0]!.id, others: group.slice(1, 1 + MAX_OTHERS).map((r) => r.id) };
  return runs.length >= 2 ? { reference: runs[0]!.id, others: [runs[1]!.id] } : null;
}

const label = (run: RunItem) => `${runCaption(run)}${run.runLabel ? ` — ${run.name}` : ''}`.slice(0, 160);

/**
 * Compare: a reference run and others shown as their difference from it (dB against log frequency), smoothed, on the
 * range they all cover; levels as measured unless "match levels" is ticked (then each run is moved to the reference's
 * power average over a band shown and editable). Computed by POST /api/v1/measured/compare.
 */
export function RunCompare({ runs, curveOf }: Props) {
  const svgRef = useRef<SVGSVGElement>(null);
  const ordered = useMemo(() => [...runs].sort((a, b) => (a.createdAt ?? '\uffff').localeCompare(b.createdAt ?? '\uffff')), [runs]);
  const byId = useMemo(() => new Map(ordered.map((r) => [r.id, r])), [ordered]);
  const [picked, setPicked] = useState<{ reference: string; others: string[] } | null>(null);
  const [smoothing, setSmoothing] = useState<number>(6);
  const [matchLevels, setMatchLevels] = useState(false);
  const [bandEdit, setBandEdit] = useState<{ startHz: number; stopHz: number } | null>(null);

  const fallback = useMemo(() => defaultPick(ordered), [ordered]);
  const pick = useMemo(
    () => (picked && byId.has(picked.reference) ? { reference: picked.reference, others: picked.others.filter((id) => byId.has(id) && id !== picked.reference) } : fallback),
    [picked, byId, fallback],
  );
  const range = useMemo(() => commonRange(pick ? [pick.reference, ...pick.others].map((id) => byId.get(id)).filter((r): r is RunItem => r !== undefined) : []), [pick, byId]);
  const band = useMemo(() => bandEdit ?? range?.band ?? DEFAULT_BAND, [bandEdit, range]);

  const body = useMemo(() => {
    if (!pick || pick.others.length === 0) return null;
    const curve = (id: string) => {
      const run = byId.get(id);
      const c = curveOf(id);
      return run && c ? { name: (run.runLabel ?? run.name).slice(0, 120), ...c } : null;
    };
    const reference = curve(pick.reference);
    const others = pick.others.map(curve);
    if (!reference || others.some((o) => o === null)) return null;
    return { reference, others, smoothingFraction: smoothing, ...(matchLevels ? { matchLevelBandHz: band } : {}) };
  }, [pick, byId, curveOf, smoothing, matchLevels, band]);
  const answer = useCompute<CompareAnswer>('/api/v1/measured/compare', body);
  const a = body ? (answer.data ?? null) : null;

  const setReference = (id: string) => setPicked({ reference: id, others: (pick?.others ?? []).filter((o) => o !== id) });
  const toggleOther = (id: string) => {
    const others = pick?.others ?? [];
    const next = others.includes(id) ? others.filter((o) => o !== id) : [...others, id].slice(0, MAX_OTHERS);
    setPicked({ reference: pick?.reference ?? id, others: next });
  };

  const traces: PlotTrace[] = (a?.differences ?? []).map((d, k) => ({ id: `diff-${k}`, label: `${d.name} − ${a!.reference.name}`, values: d.differenceDb, color: overlayColors[(k + 2) % overlayColors.length] as string, width: 2 }));
  const extent = finiteExtent(traces.map((t) => t.values));
  const yDomain: [number, number] | undefined = extent ? [Math.min(-3, Math.floor(extent[0] - 1)), Math.max(3, Math.ceil(extent[1] + 1))] : undefined;
  const smoothingWords = smoothing === 0 ? 'no smoothing' : `1/${smoothing}-octave smoothing`;

  return (
    <section aria-labelledby="compare-title" className="flex min-w-0 flex-col gap-3 rounded-lg border border-line bg-white p-3" data-testid="run-compare">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="compare-title" className="text-sm font-semibold">
          Compare runs
        </h3>
        {a ? <ChartExportButtons svgRef={svgRef} filename="measured-compare" subject="comparison" /> : null}
      </div>
      {ordered.length < 2 ? <p className="text-sm text-ink-faint">Compare needs two runs or more: add measurements above.</p> : null}
      {ordered.length >= 2 ? (
        <div className="grid grid-cols-[minmax(0,1fr)] gap-3 md:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
          <div className="flex min-w-0 flex-col gap-2">
            <label className="flex min-w-0 flex-col gap-1 text-xs font-medium text-ink-soft">
              Reference run
              <select className="w-full min-w-0 rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink" value={pick?.reference ?? ''} onChange={(e) => setReference(e.target.value)} data-testid="compare-reference">
                {ordered.map((r) => (
                  <option key={r.id} value={r.id}>
                    {label(r)}
                  </option>
                ))}
              </select>
            </label>
            <SmoothingSelect value={smoothing} onChange={setSmoothing} testId="compare-smoothing" />
          </div>
          <fieldset className="flex min-w-0 flex-col gap-1">
            <legend className="text-xs font-medium text-ink-soft">Shown as differences from the reference (up to {MAX_OTHERS})</legend>
            <ul className="flex max-h-48 flex-col gap-1 overflow-y-auto rounded-md border border-line p-2" data-testid="compare-others">
              {ordered
                .filter((r) => r.id !== pick?.reference)
                .map((r) => (
                  <li key={r.id}>
                    <label className="flex items-start gap-2 text-xs">
                      <input type="checkbox" className="mt-0.5 h-4 w-4 shrink-0 accent-mains" checked={pick?.others.includes(r.id) ?? false} onChange={() => toggleOther(r.id)} />
                      <span className="min-w-0 break-words">{label(r)}</span>
                    </label>
                  </li>
                ))}
            </ul>
          </fieldset>
        </div>
      ) : null}
      {ordered.length >= 2 ? (
        <div className="flex flex-wrap items-end gap-3 rounded-md bg-paper px-3 py-2 text-xs text-ink-soft">
          <label className="flex items-center gap-1.5 self-center font-medium text-ink">
            <input type="checkbox" className="h-4 w-4 accent-mains" checked={matchLevels} onChange={(e) => setMatchLevels(e.target.checked)} data-testid="compare-match-levels" />
            Match levels over {formatHzReadout(band.startHz)}–{formatHzReadout(band.stopHz)}
          </label>
          <NumberField label="Band from" unit="Hz" value={band.startHz} min={10} max={24000} step={10} onChange={(v) => setBandEdit({ ...band, startHz: v })} />
          <NumberField label="Band to" unit="Hz" value={band.stopHz} min={10} max={24000} step={10} onChange={(v) => setBandEdit({ ...band, stopHz: v })} />
          <p className="w-full" data-testid="compare-levels-note" aria-live="polite">
            {matchLevels
              ? `Levels matched: each run is moved so its power average over ${formatHzReadout(band.startHz)}–${formatHzReadout(band.stopHz)} equals the reference’s${a ? ` (${a.differences.map((d) => `${d.name} ${formatSigned(d.levelOffsetDb, 'dB', 2)}`).join('; ')})` : ''}.`
              : `Levels as measured: no level matching. Tick the box to match them over the band ${formatHzReadout(band.startHz)}–${formatHzReadout(band.stopHz)} (the power average over it).`}{' '}
            {a ? `Common range ${formatHzReadout(a.rangeHz.startHz)}–${formatHzReadout(a.rangeHz.stopHz)}, ${smoothingWords}.` : null}
          </p>
        </div>
      ) : null}
      {answer.error && body ? <Notice kind="error">{answer.error.message}</Notice> : null}
      {pick && pick.others.length === 0 ? <p className="text-sm text-ink-faint">Tick one run or more to compare with the reference.</p> : null}
      {a ? (
        <>
          <FrequencyPlot
            ref={svgRef}
            title="Runs as differences from the reference"
            description={`Each run minus the reference run (${a.reference.name}), dB, ${smoothingWords}, ${a.levels === 'matched' ? 'levels matched over the band' : 'levels as measured'}.`}
            frequencyHz={a.frequencyHz}
            minHz={a.rangeHz.startHz}
            maxHz={a.rangeHz.stopHz}
            yLabel="Difference"
            yUnit="dB"
            traces={traces}
            references={[{ value: 0, label: 'Reference' }]}
            markers={a.matchLevelBandHz ? [{ hz: a.matchLevelBandHz.startHz, label: 'Band', dashed: true }, { hz: a.matchLevelBandHz.stopHz, dashed: true }] : []}
            valueDigits={2}
            aspect={0.42}
            {...(yDomain ? { yDomain } : {})}
          />
          <ul className="flex flex-col gap-1 text-xs text-ink-soft" data-testid="compare-readouts" aria-live="polite">
            {a.differences.map((d, k) => (
              <li key={k} data-testid="compare-readout">
                <span className="font-medium text-ink">{d.name}</span> against {a.reference.name}: largest difference{' '}
                <span className="num font-semibold text-ink" data-testid="compare-largest-db">
                  {formatSigned(d.largest.differenceDb, 'dB', 2)}
                </span>{' '}
                at <span className="num">{formatHzReadout(d.largest.frequencyHz)}</span>; from <span className="num">{formatSigned(d.minDb, 'dB', 2)}</span> to <span className="num">{formatSigned(d.maxDb, 'dB', 2)}</span>.
              </li>
            ))}
          </ul>
        </>
      ) : body && answer.pending ? (
        <p className="text-sm text-ink-faint" aria-live="polite">
          Comparing…
        </p>
      ) : null}
    </section>
  );
}
