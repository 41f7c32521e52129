'use client';

import { useRef, useState } from 'react';
import { ChartExportButtons, FrequencyPlot, XYPlot, chartColors, formatNumber, traceStyles, type PlotTrace } from '@/components/charts';
import { useSystem } from '@/components/system/system-context';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import type { ApiError } from '@/lib/client/api';
import { applyMeasuredToDocument, measurementRoleKind, type PredictAnswer } from '@/lib/system-model/measured';
import type { CurveItem } from './measurement-list';

interface Props {
  items: CurveItem[];
  mainsId: string | null;
  subId: string | null;
  onPick: (which: 'mains' | 'sub', id: string) => void;
  subTarget: number | 'all';
  onSubTarget: (t: number | 'all') => void;
  prediction: PredictAnswer | null;
  pending: boolean;
  error: ApiError | null;
}

const ESTIMATED = ' (estimated phase)';
const ROLE_WORDS = { mains: 'a mains measurement', sub: 'a sub measurement', sum: 'mains and sub playing together' } as const;

/** A warning when a file's role says it is not what it was picked as (a sub file as the mains measurement, or the reverse). */
function roleMismatch(item: CurveItem | undefined, pickedAs: 'mains' | 'sub'): string | null {
  const kind = measurementRoleKind(item?.role);
  if (!item || !kind || kind === pickedAs) return null;
  return `“${item.name}” is marked as ${ROLE_WORDS[kind]} (role “${item.role}”) but is picked as the ${pickedAs} measurement: the prediction applies the ${pickedAs === 'mains' ? 'high-pass' : 'low-pass'} to it as if it were the ${pickedAs}. Pick the ${pickedAs} file, or correct its role.`;
}
const clampDelay = (v: number) => Math.min(100, Math.max(0, Math.round(v * 100) / 100));

/** Pick a mains and a sub measurement, apply the System's settings, compare the predicted sum with the measured one, and take the best delay and polarity. */
export function PredictedBlend({ items, mainsId, subId, onPick, subTarget, onSubTarget, prediction, pending, error }: Props) {
  const { doc, update, readOnly } = useSystem();
  const magRef = useRef<SVGSVGElement>(null);
  const [cursorHz, setCursorHz] = useState<number | null>(null);
  const [applied, setApplied] = useState<string | null>(null);
  const bm = doc.bassManagement;
  const subIndex = subTarget === 'all' ? 0 : subTarget;
  const sub = doc.subs[subIndex];
  const mains = mainsId ? items.find((i) => i.id === mainsId) : undefined;
  const subItem = subId ? items.find((i) => i.id === subId) : undefined;
  const seatMismatch = mains && subItem && mains.seat !== subItem.seat;

  const setSubDelay = (v: number) =>
    update((d) => {
      if (subTarget !== 'all') return { ...d, subs: d.subs.map((s, k) => (k === subTarget ? { ...s, delayMs: v } : s)) };
      const shift = v - (d.subs[0]?.delayMs ?? 0);
      return { ...d, subs: d.subs.map((s) => ({ ...s, delayMs: clampDelay(s.delayMs + shift) })) };
    });
  const setSubInvert = (invert: boolean) =>
    update((d) => ({ ...d, subs: d.subs.map((s, k) => (subTarget === 'all' || k === subTarget ? { ...s, invert: subTarget === 'all' ? (s.invert !== (invert !== (d.subs[0]?.invert ?? false))) : invert } : s)) }));
  const setSubGain = (v: number) =>
    update((d) => {
      if (subTarget !== 'all') return { ...d, subs: d.subs.map((s, k) => (k === subTarget ? { ...s, gainDb: v } : s)) };
      const shift = v - (d.subs[0]?.gainDb ?? 0);
      return { ...d, subs: d.subs.map((s) => ({ ...s, gainDb: Math.min(30, Math.max(-30, Math.round((s.gainDb + shift) * 10) / 10)) })) };
    });

  const p = prediction;
  const traces: PlotTrace[] = [];
  if (p) {
    const [pm, ps] = p.paths;
    const est = (e: boolean | undefined) => (e ? ESTIMATED : '');
    traces.push({ id: 'measured-sum', label: `Measured sum, as measured${p.measured.some((m) => m.phaseEstimated) ? ESTIMATED : ''}`, values: p.measuredSum.magnitudeDb, color: chartColors.target, width: 2 });
    if (pm) traces.push({ id: 'pred-mains', label: `${pm.name} with the System's high-pass${est(pm.phaseEstimated)}`, values: pm.magnitudeDb, ...traceStyles.mains, width: 1.5 });
    if (ps) traces.push({ id: 'pred-sub', label: `${ps.name} with the System's low-pass${est(ps.phaseEstimated)}`, values: ps.magnitudeDb, ...traceStyles.sub, width: 1.5 });
    traces.push({ id: 'pred-sum', label: `Predicted sum${p.phaseEstimated ? ESTIMATED : ''}`, values: p.predictedSum.magnitudeDb, ...traceStyles.sum });
    if (p.alignment) traces.push({ id: 'pred-best', label: 'Predicted with the best delay and polarity', values: p.alignment.recommendedSum.magnitudeDb, color: chartColors.ok, width: 2, dashed: true });
  }
  const phaseTraces: PlotTrace[] = p
    ? p.paths.map((t, k) => ({ id: `phase-${k}`, label: `${t.name}${t.phaseEstimated ? ESTIMATED : ''}`, values: t.phaseDeg, ...(k === 0 ? traceStyles.mains : traceStyles.sub) }))
    : [];
  const a = p?.alignment ?? null;

  function apply() {
    if (!a) return;
    update((d) => applyMeasuredToDocument(d, subTarget, a));
    setApplied(
      `Applied: ${subTarget === 'all' ? 'all subs' : (sub?.name ?? 'sub')} ${a.flipPolarity ? 'polarity flipped, ' : ''}${a.addTo === 'sub' ? `sub delay ${formatNumber(a.subDelayMs, 2)} ms` : `mains delay ${formatNumber(a.mainsDelayMs, 2)} ms`}. Save the System to keep it.`,
    );
  }

  const select = 'w-full min-w-0 max-w-full rounded-md border border-line bg-white px-2 py-1.5 text-sm font-normal text-ink';
  return (
    <section aria-labelledby="predict-title" className="flex flex-col gap-3 rounded-lg border border-line bg-white p-3" data-testid="predicted-blend">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="predict-title" className="text-sm font-semibold">
          Predicted blend at the seat
        </h3>
        <ChartExportButtons svgRef={magRef} filename="measured-predicted-blend" subject="prediction" />
      </div>
      <div className="grid grid-cols-[minmax(0,1fr)] gap-3 sm:grid-cols-3">
        {(['mains', 'sub'] as const).map((which) => {
          const picked = which === 'mains' ? mainsId : subId;
          return (
            <label key={which} className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
              {which === 'mains' ? 'Mains measurement' : 'Sub measurement'}
              <select className={select} value={picked ?? ''} onChange={(e) => onPick(which, e.target.value)} data-testid={`pick-${which}`}>
                {!picked ? <option value="">(none yet)</option> : null}
                {items.map((i) => (
                  <option key={i.id} value={i.id}>
                    {i.name}
                  </option>
                ))}
              </select>
            </label>
          );
        })}
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
          The sub measurement is of
          <select className={select} value={String(subTarget)} onChange={(e) => onSubTarget(e.target.value === 'all' ? 'all' : Number(e.target.value))}>
            {doc.subs.length > 1 ? <option value="all">All subs together</option> : null}
            {doc.subs.map((s, k) => (
              <option key={s.id} value={k}>
                {s.name}
              </option>
            ))}
          </select>
        </label>
      </div>
      {[roleMismatch(mains, 'mains'), roleMismatch(subItem, 'sub')].map((w) =>
        w ? (
          <Notice key={w} kind="warn">
            <span data-testid="measured-role-warning">{w}</span>
          </Notice>
        ) : null,
      )}
      {seatMismatch ? <Notice kind="warn">The two measurements are from different seats ({mains?.seat ?? 'no seat'} and {subItem?.seat ?? 'no seat'}): a prediction needs both from the same seat.</Notice> : null}

      <fieldset className="flex flex-wrap items-end gap-3 rounded-md border border-line px-3 pb-3 pt-1" disabled={readOnly}>
        <legend className="px-1 text-xs font-medium text-ink-soft">The System&apos;s settings applied (edits change the System)</legend>
        <NumberField label="Crossover" unit="Hz" value={bm.crossoverHz} min={20} max={300} step={1} onChange={(v) => update((d) => ({ ...d, bassManagement: { ...d.bassManagement, crossoverHz: v } }))} disabled={readOnly} testId="measured-crossover" />
        <NumberField label={subTarget === 'all' ? 'Sub delay (all subs)' : `${sub?.name ?? 'Sub'} delay`} unit="ms" value={sub?.delayMs ?? 0} min={0} max={100} step={0.1} slider onChange={setSubDelay} disabled={readOnly || !sub} testId="measured-sub-delay" className="min-w-56 flex-1" />
        <NumberField label={subTarget === 'all' ? 'Sub gain (all subs)' : `${sub?.name ?? 'Sub'} gain`} unit="dB" value={sub?.gainDb ?? 0} min={-30} max={30} step={0.5} digits={1} onChange={setSubGain} disabled={readOnly || !sub} />
        <NumberField label="Mains delay" unit="ms" value={bm.mainsDelayMs} min={0} max={100} step={0.1} onChange={(v) => update((d) => ({ ...d, bassManagement: { ...d.bassManagement, mainsDelayMs: v } }))} disabled={readOnly} />
        <label className="mb-1.5 flex items-center gap-2 text-sm">
          <input type="checkbox" checked={sub?.invert ?? false} onChange={(e) => setSubInvert(e.target.checked)} disabled={readOnly || !sub} className="h-4 w-4 accent-mains" />
          Sub polarity inverted
        </label>
        <p className="w-full text-xs text-ink-faint">
          High-pass {bm.mainsHighpass.family === 'butterworth' ? 'Butterworth' : 'Linkwitz–Riley'} order {bm.mainsHighpass.order}, low-pass {bm.subLowpass.family === 'butterworth' ? 'Butterworth' : 'Linkwitz–Riley'} order {bm.subLowpass.order}
          ; the measurements already hold the distances and the speakers&apos; own roll-off, so neither is added again.
        </p>
      </fieldset>

      {error ? <Notice kind="error">{error.message}</Notice> : null}
      {!mainsId || !subId ? <p className="text-sm text-ink-faint">Add or pick a mains and a sub measurement from the same seat to see the predicted blend.</p> : null}
      {p ? (
        <div className={`flex flex-col gap-3 transition-opacity ${pending ? 'opacity-70' : ''}`} aria-busy={pending}>
          <FrequencyPlot
            ref={magRef}
            title="Predicted blend from the measurements"
            description="The measured sum as measured, each measurement with the System's crossover, gain, delay and polarity applied, their predicted sum, and the sum with the best delay and polarity."
            quantity="magnitude"
            frequencyHz={p.frequencyHz}
            minHz={Math.max(10, p.frequencyHz[0] ?? 10)}
            maxHz={Math.min(20000, p.frequencyHz[p.frequencyHz.length - 1] ?? 1000)}
            traces={traces}
            markers={[{ hz: bm.crossoverHz, label: 'Crossover', dashed: true }]}
            cursorHz={cursorHz}
            onCursorHz={setCursorHz}
            aspect={0.45}
            yAxisChars={5}
          />
          <FrequencyPlot
            title="Phase of each processed measurement"
            quantity="phase"
            frequencyHz={p.frequencyHz}
            minHz={Math.max(10, p.frequencyHz[0] ?? 10)}
            maxHz={Math.min(20000, p.frequencyHz[p.frequencyHz.length - 1] ?? 1000)}
            traces={phaseTraces}
            markers={[{ hz: bm.crossoverHz, dashed: true }]}
            cursorHz={cursorHz}
            onCursorHz={setCursorHz}
            heightPx={200}
            yAxisChars={5}
          />
          {p.phaseEstimated ? (
            <p className="text-xs text-ink-soft" data-testid="estimated-phase-note">
              A file without phase: its phase is the minimum-phase estimate from its magnitude (labelled &ldquo;estimated phase&rdquo;).
            </p>
          ) : null}
          <p className="sr-only" aria-live="polite" data-testid="predicted-at-crossover">
            Predicted level near the crossover {formatNumber(p.predictedSum.magnitudeDb[Math.max(0, p.frequencyHz.findIndex((f) => f >= bm.crossoverHz))] ?? NaN, 2)} dB
          </p>

          <div className="flex flex-col gap-2 rounded-md border border-line bg-paper p-3" data-testid="measured-alignment">
            <h4 className="text-sm font-semibold">Best delay and polarity on the measured pair</h4>
            {a ? (
              <>
                <p className={`text-base font-semibold ${a.keep ? 'text-ok' : ''}`} data-testid="measured-advice">
                  {a.keep ? 'Keep the present setting' : 'Change the delays as below'}
                </p>
                <p className="num text-xs text-ink-soft">{a.reason}</p>
                <p className="text-sm" data-testid="measured-recommendation">
                  {a.keep ? 'Flattest found: ' : ''}processor delays (as on the Settings sheet) sub <span className="num font-semibold">{formatNumber(a.subDelayMs, 2)} ms</span> and mains{' '}
                  <span className="num font-semibold">{formatNumber(a.mainsDelayMs, 2)} ms</span>, sub polarity <span className="font-semibold">{a.invert ? 'inverted' : 'normal'}</span>
                  {a.flipPolarity ? ' (flipped)' : ''}
                  {a.addDelayMs < 0.01 ? ': the delays stay as they are' : `: the sub moves ${formatNumber(a.addDelayMs, 2)} ms ${a.addTo === 'sub' ? 'later' : 'earlier'} against the mains`}. Flatness within ±1 octave of the crossover{' '}
                  <span className="num">{formatNumber(a.flatnessBeforeDb, 1)} dB</span> → <span className="num">{formatNumber(a.flatnessDb, 1)} dB</span>.
                </p>
                <p className="text-sm">
                  Timing window (sub minus mains delay keeping the level at the crossover within 1 dB):{' '}
                  <span className="num font-semibold" data-testid="measured-timing-window">
                    {formatNumber(a.timingWindowMs[0], 2)} … {formatNumber(a.timingWindowMs[1], 2)} ms
                  </span>
                </p>
                <XYPlot
                  title="Level at the crossover against sub-minus-mains delay, measured pair"
                  x={a.levelVersusDelay.subMinusMainsDelayMs}
                  xLabel="Sub minus mains delay"
                  xUnit="ms"
                  yLabel="Level at crossover"
                  yUnit="dB"
                  traces={[
                    { id: 'normal', label: 'Sub normal', values: a.levelVersusDelay.normalDb, ...traceStyles.mains },
                    { id: 'inverted', label: 'Sub inverted', values: a.levelVersusDelay.invertedDb, ...traceStyles.sub },
                  ]}
                  band={{ from: a.timingWindowMs[0], to: a.timingWindowMs[1], label: 'Timing window' }}
                  points={[{ x: a.subDelayMs - a.mainsDelayMs, y: a.crossoverLevelDb, label: 'Best' }]}
                  heightPx={200}
                />
                <div className="flex flex-wrap items-center gap-2">
                  {a.keep ? null : readOnly ? (
                    <span className="text-xs text-ink-soft">Read-only here: the change is applied in the System&apos;s editor.</span>
                  ) : (
                    <Button onClick={apply}>Apply to System</Button>
                  )}
                  {applied ? <span className="text-xs text-ok" role="status">{applied}</span> : null}
                </div>
              </>
            ) : null}
            {p.alignmentNote ? <p className="text-xs text-ink-soft">{p.alignmentNote}</p> : null}
          </div>
        </div>
      ) : null}
    </section>
  );
}
