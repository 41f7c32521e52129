'use client';

import { useId, useMemo, useRef, useState } from 'react';
import { ChartExportButtons, XYPlot, chartColors, formatHzReadout, formatNumber, formatSigned, formatValue, traceStyles } from '@/components/charts';
import { useSystem } from '@/components/editor/system-context';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import { useTiming } from '@/lib/hooks/use-timing';
import type { ApiError } from '@/lib/client/api';
import { blendMainSpeaker, distanceToSeatM, toPointM } from '@/lib/system-model';
import { applyTimingAdvice, timingRequestFromDocument, type TimingAnswer } from '@/lib/system-model/timing';
import type { AdviceAnswer } from '@/lib/system-model/advice-answer';
import { speakerAngles } from '@/dsp';
import { metresToFeet } from '@/lib/units';
import type { Speaker, Sub, SystemDocument } from '@/lib/validations/system';
import { slopeShortName } from '@/components/blend/slope-select';

const geometryM = (doc: SystemDocument, item: Speaker | Sub): number => {
  const seat = doc.seats.find((s) => s.id === doc.mlpSeatId) ?? doc.seats[0];
  return seat ? speakerAngles({ listenerM: toPointM(seat), speakerM: toPointM(item) }).distanceM : 0;
};

/**
 * The distance set on the processor for a speaker or sub: editing it sets the measured distance the processor is
 * told (its delays align these); the sound still travels the positions' path, so a wrong setting shows as a phase
 * error. "Use the positions" clears it.
 */
function DistanceField({ label, doc, item, onOverride, units, error, disabled, testId }: { label: string; doc: SystemDocument; item: Speaker | Sub; onOverride: (m: number | null) => void; units: 'metric' | 'imperial'; error?: string; disabled?: boolean; testId: string }) {
  const fromGeometry = geometryM(doc, item);
  const overridden = item.distanceOverrideM != null;
  const shown = (m: number) => lengthText(m, units);
  return (
    <div className="flex flex-col gap-1">
      <NumberField label={label} length units={units} value={distanceToSeatM(doc, item)} min={0.1} max={100} step={0.01} digits={2} disabled={disabled} error={error} onChange={(v) => onOverride(v)} testId={testId} hint={overridden ? `measured; the positions give ${shown(fromGeometry)}` : 'from the positions on Layout'} />
      {overridden ? (
        <button type="button" disabled={disabled} onClick={() => onOverride(null)} className="self-start text-xs text-mains underline hover:text-ink">
          Use the positions ({shown(fromGeometry)})
        </button>
      ) : null}
    </div>
  );
}

/** The same rounding as NumberField's (two decimals), so the table and the field agree. */
const lengthText = (m: number, units: 'metric' | 'imperial') => (units === 'imperial' ? `${Number(metresToFeet(m).toFixed(2))} ft` : `${Number(m.toFixed(2))} m`);

const fieldError = (error: ApiError | undefined, path: string) => error?.field(path);

/** What a piece of advice changes, in processor settings: "Sub front left 3.20 ms (was 1.00), inverted (flip it); mains 0.00 ms (was 0.92)". */
function describeChanges(advice: AdviceAnswer, data: TimingAnswer): string {
  const parts: string[] = [];
  advice.set.subs.forEach((s, k) => {
    const now = data.subs[k];
    if (!now) return;
    const delay = Math.abs(s.delayMs - now.delayMs) >= 0.005 ? `${s.name} delay ${formatNumber(s.delayMs, 2)} ms (now ${formatNumber(now.delayMs, 2)})` : null;
    const polarity = s.invert !== now.invert ? `${delay ? '' : `${s.name} `}polarity ${s.invert ? 'inverted' : 'normal'} (flip it)` : null;
    if (delay || polarity) parts.push([delay, polarity].filter(Boolean).join(', '));
  });
  if (Math.abs(advice.set.mainsDelayMs - data.mains.delayMs) >= 0.005) parts.push(`${data.mains.name} delay ${formatNumber(advice.set.mainsDelayMs, 2)} ms (now ${formatNumber(data.mains.delayMs, 2)})`);
  return parts.length ? `Set ${parts.join('; ')}` : 'No change';
}

/** One piece of advice: "keep" with its reason, or the settings to make, what they gain, and Apply. */
function AdviceCard({ title, advice, data, testId, readOnly, onApply, children }: { title: React.ReactNode; advice: AdviceAnswer; data: TimingAnswer; testId: string; readOnly: boolean; onApply: () => void; children?: React.ReactNode }) {
  return (
    <div className="flex flex-col gap-2 rounded-md border border-line bg-white p-3" data-testid={testId}>
      <p className="text-xs text-ink-soft">{title}</p>
      {advice.keep ? (
        <p className="text-base font-semibold text-ok" data-testid={`${testId}-text`}>
          Keep the present setting
        </p>
      ) : (
        <p className="text-base font-semibold" data-testid={`${testId}-text`}>
          {describeChanges(advice, data)}
        </p>
      )}
      <p className="num text-xs text-ink-soft" data-testid={`${testId}-reason`}>
        {advice.reason}
      </p>
      {children}
      {advice.keep ? null : (
        <Button variant="secondary" className="self-start" disabled={readOnly} data-testid={`${testId}-apply`} onClick={onApply}>
          Apply
        </Button>
      )}
    </div>
  );
}

export function TimingPanel() {
  const { doc, update, units, readOnly } = useSystem();
  const id = useId();
  const [channel, setChannel] = useState<string | undefined>(undefined);
  const [shownSub, setShownSub] = useState(0);
  const [appliedNote, setAppliedNote] = useState<string | null>(null);
  const plotRef = useRef<SVGSVGElement>(null);
  const speaker = blendMainSpeaker(doc, channel);
  const request = useMemo(() => timingRequestFromDocument(doc, speaker?.channel), [doc, speaker?.channel]);
  const { data, error, pending } = useTiming(request);
  const bm = doc.bassManagement;
  const subIndex = Math.min(shownSub, Math.max(0, doc.subs.length - 1));
  const shown = data?.subs[subIndex];

  const setSub = (k: number, patch: Partial<Sub>) => update((d) => ({ ...d, subs: d.subs.map((s, i) => (i === k ? { ...s, ...patch } : s)) }));
  const setSpeaker = (sid: string, patch: Partial<Speaker>) => update((d) => ({ ...d, speakers: d.speakers.map((s) => (s.id === sid ? { ...s, ...patch } : s)) }));

  if (!speaker || doc.subs.length === 0) {
    return (
      <div className="py-4">
        <Notice kind="info" title="Nothing to time yet">
          {!speaker ? 'Add a main speaker on Layout' : 'Add a subwoofer on Layout'} to align the subs with the mains.
        </Notice>
      </div>
    );
  }

  const placed = /^(temperatureC|mains\.|subs\.\d+\.(distanceM|delayMs))/;
  const unplaced = error && (error.issues.length === 0 || error.issues.some((i) => !placed.test(i.path)));
  const curve = shown?.flatnessVersusDelay;
  const currentOffsetMs = shown ? shown.delayMs - (data?.mains.delayMs ?? 0) : 0;
  const advisedOffsetMs = currentOffsetMs + (shown?.advice.shiftMs ?? 0);
  const advisedFlatness = shown?.advice.after.flatnessDb ?? 0;
  const band = data ? `${formatHzReadout(data.flatness.bandHz[0])}–${formatHzReadout(data.flatness.bandHz[1])}` : '';

  return (
    <div className="flex flex-col gap-6 py-4">
      <div className="grid gap-6 lg:grid-cols-[minmax(16rem,20rem)_minmax(0,1fr)]">
        <form className="flex flex-col gap-4" aria-label="Timing inputs" onSubmit={(e) => e.preventDefault()}>
          <NumberField label="Air temperature" unit="°C" value={doc.room.temperatureC} min={-20} max={50} step={1} disabled={readOnly} error={fieldError(error, 'temperatureC')} onChange={(v) => update((d) => ({ ...d, room: { ...d.room, temperatureC: v } }))} testId="timing-temperature" />
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-channel`} className="text-xs font-medium text-ink-soft">
              Main channel
            </label>
            <select id={`${id}-channel`} value={speaker.channel} onChange={(e) => setChannel(e.target.value)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm">
              {doc.speakers.map((s) => (
                <option key={s.id} value={s.channel}>
                  {s.channel}
                </option>
              ))}
            </select>
          </div>
          <DistanceField label={`${speaker.channel}: distance set on the processor`} doc={doc} item={speaker} units={units} disabled={readOnly} error={fieldError(error, 'mains.distanceM')} onOverride={(m) => setSpeaker(speaker.id, { distanceOverrideM: m })} testId="timing-mains-distance" />
          {doc.subs.map((s, k) => (
            <fieldset key={s.id} className="flex flex-col gap-2 rounded-md border border-line bg-white p-3">
              <legend className="px-1 text-sm font-medium" style={{ color: k % 2 ? chartColors.sub2 : chartColors.sub }}>
                {s.name}
              </legend>
              <div className="grid grid-cols-2 gap-2">
                <NumberField label="Across (x)" length units={units} value={s.xM} min={0} max={doc.room.widthM} step={0.05} digits={2} disabled={readOnly} onChange={(v) => setSub(k, { xM: v })} testId={`timing-sub-${k}-x`} />
                <NumberField label="Into room (y)" length units={units} value={s.yM} min={0} max={doc.room.lengthM} step={0.05} digits={2} disabled={readOnly} onChange={(v) => setSub(k, { yM: v })} testId={`timing-sub-${k}-y`} />
              </div>
              <DistanceField label="Distance set on the processor" doc={doc} item={s} units={units} disabled={readOnly} error={fieldError(error, `subs.${k}.distanceM`)} onOverride={(m) => setSub(k, { distanceOverrideM: m })} testId={`timing-sub-${k}-distance`} />
            </fieldset>
          ))}
          <p className="text-xs text-ink-faint">
            Crossover {Math.round(bm.crossoverHz)} Hz, {slopeShortName(bm.mainsHighpass)} high-pass / {slopeShortName(bm.subLowpass)} low-pass (change them on Blend). Delays are the processor&apos;s: only positive, added to the sub or to the mains.
          </p>
        </form>

        <div className="flex min-w-0 flex-col gap-4" aria-busy={pending}>
          {unplaced && error ? (
            <Notice kind="error" title="Timing could not be computed">
              {error.message}
            </Notice>
          ) : null}
          {data ? (
            <>
              <div className="overflow-x-auto">
                <table className="w-full min-w-[40rem] border-collapse text-sm" data-testid="timing-arrivals">
                  <caption className="pb-2 text-left text-sm text-ink-soft">
                    Arrival at the MLP at {formatValue(doc.room.temperatureC, '°C', 0)} (c = {formatNumber(data.speedOfSoundMps, 1)} m/s) and phase at {formatHzReadout(data.crossoverHz)}
                    {pending ? <span className="ml-2 text-ink-faint">updating…</span> : null}
                  </caption>
                  <thead>
                    <tr className="border-b border-line text-left text-xs text-ink-soft">
                      <th scope="col" className="px-2 py-1.5 font-medium">Source</th>
                      <th scope="col" className="px-2 py-1.5 font-medium">Distance</th>
                      <th scope="col" className="px-2 py-1.5 font-medium">Air time</th>
                      <th scope="col" className="px-2 py-1.5 font-medium">Delay set</th>
                      <th scope="col" className="px-2 py-1.5 font-medium">Arrives</th>
                      <th scope="col" className="px-2 py-1.5 font-medium" title="mains phase minus sub phase at the crossover: from the arrival times + from the filters' own phase">Phase difference</th>
                    </tr>
                  </thead>
                  <tbody className="num whitespace-nowrap">
                    <tr className="border-b border-line">
                      <th scope="row" className="px-2 py-1.5 text-left font-medium text-mains">{data.mains.name} (mains)</th>
                      <td className="px-2 py-1.5">{lengthText(data.mains.distanceM, units)}</td>
                      <td className="px-2 py-1.5">{formatNumber(data.mains.arrivalMs, 2)} ms</td>
                      <td className="px-2 py-1.5">{formatNumber(data.mains.delayMs, 2)} ms</td>
                      <td className="px-2 py-1.5">{formatNumber(data.mains.totalMs, 2)} ms</td>
                      <td className="px-2 py-1.5 text-ink-faint">reference</td>
                    </tr>
                    {data.subs.map((s, k) => (
                      <tr key={k} className="border-b border-line">
                        <th scope="row" className="px-2 py-1.5 text-left font-medium" style={{ color: k % 2 ? chartColors.sub2 : chartColors.sub }}>
                          {s.name}
                        </th>
                        <td className="px-2 py-1.5">{lengthText(s.distanceM, units)}</td>
                        <td className="px-2 py-1.5">{formatNumber(s.arrivalMs, 2)} ms</td>
                        <td className="px-2 py-1.5">{formatNumber(s.delayMs, 2)} ms</td>
                        <td className="px-2 py-1.5">
                          {formatNumber(s.totalMs, 2)} ms <span className="text-ink-faint">({s.leadMs >= 0 ? `${formatNumber(s.leadMs, 2)} ms early` : `${formatNumber(-s.leadMs, 2)} ms late`})</span>
                        </td>
                        <td className="px-2 py-1.5" data-testid={`timing-phase-${k}`}>
                          {formatValue(s.phaseDifferenceDeg, '°', 0)}{' '}
                          <span className="text-ink-faint">
                            = {formatSigned(s.delayPhaseDeg, '°', 0)} arrival {formatSigned(s.filterPhaseDeg, '°', 0)} filters
                          </span>
                        </td>
                      </tr>
                    ))}
                  </tbody>
                </table>
              </div>

              <p className="num text-sm" data-testid="timing-present">
                Flatness now <span className="font-semibold">±{formatNumber(data.present.flatnessDb, 2)} dB</span> over {band}{' '}
                <span className="text-ink-soft">
                  (largest deviation of the sum from its level at {formatHzReadout(4 * data.crossoverHz)}, with {data.mains.name} and every sub) · system −3 dB point{' '}
                  {data.present.minus3DbHz === null ? 'below 5 Hz' : formatHzReadout(data.present.minus3DbHz)}
                </span>
              </p>
              <div className="grid gap-3 md:grid-cols-2">
                {data.subs.map((s, k) => (
                  <AdviceCard
                    key={k}
                    title={
                      <>
                        <span className="font-medium text-ink">{s.name}</span> alone, with {data.mains.name}
                        {data.subs.length > 1 ? ' and the other subs as they are' : ''}
                      </>
                    }
                    advice={s.advice}
                    data={data}
                    testId={`timing-advice-${k}`}
                    readOnly={readOnly}
                    onApply={() => {
                      update((d) => applyTimingAdvice(d, s.advice, speaker.channel));
                      setAppliedNote(`${describeChanges(s.advice, data)}.`);
                    }}
                  >
                    <p className="num text-xs text-ink-soft">
                      Timing window {formatNumber(s.timingWindowMs[0], 2)} to {formatNumber(s.timingWindowMs[1], 2)} ms (sub minus mains delay; flatness within 1 dB)
                    </p>
                  </AdviceCard>
                ))}
              </div>

              {data.group ? (
                <AdviceCard
                  title={
                    <span className="font-semibold text-ink">
                      All {data.subs.length} subs together with {data.mains.name}: each sub&apos;s delay and polarity, and the subs against the mains
                    </span>
                  }
                  advice={data.group}
                  data={data}
                  testId="timing-group"
                  readOnly={readOnly}
                  onApply={() => {
                    const group = data.group;
                    if (!group) return;
                    update((d) => applyTimingAdvice(d, group, speaker.channel));
                    setAppliedNote(`${describeChanges(group, data)}.`);
                  }}
                />
              ) : null}
              {appliedNote ? <Notice kind="ok">Applied to the System: {appliedNote}</Notice> : null}

              <section aria-label="Flatness against delay" className="flex flex-col gap-2">
                <div className="flex flex-wrap items-end justify-between gap-2">
                  <h3 className="text-sm font-semibold">
                    Flatness over {band} against the sub-minus-mains delay{data.subs.length > 1 ? '' : ` (${shown?.name})`}: lower is flatter
                  </h3>
                  {data.subs.length > 1 ? (
                    <div className="flex flex-col gap-1">
                      <label htmlFor={`${id}-shown`} className="text-xs font-medium text-ink-soft">
                        Sub shown
                      </label>
                      <select id={`${id}-shown`} value={subIndex} onChange={(e) => setShownSub(Number(e.target.value))} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm">
                        {data.subs.map((s, k) => (
                          <option key={k} value={k}>
                            {s.name}
                          </option>
                        ))}
                      </select>
                    </div>
                  ) : null}
                </div>
                {curve && shown ? (
                  <>
                    <XYPlot
                      ref={plotRef}
                      title={`Flatness against delay, ${shown.name}`}
                      description="The flatness measure of the whole system (this sub moved, everything else as it is) as the sub's delay minus the mains' delay changes; positive values delay the sub, negative the mains. Lower is flatter. Shaded: the Timing window (within 1 dB of the advised setting)."
                      x={curve.subMinusMainsDelayMs}
                      xLabel="Sub delay minus mains delay"
                      xUnit="ms"
                      yUnit="dB"
                      yLabel="Flatness (largest deviation)"
                      yDomain={[0, Math.min(24, Math.max(6, Math.ceil(Math.max(...curve.normalDb, ...curve.invertedDb))))]}
                      traces={[
                        { id: 'normal', label: 'Sub polarity normal', values: curve.normalDb, ...traceStyles.sub },
                        { id: 'inverted', label: 'Sub polarity inverted', values: curve.invertedDb, ...traceStyles.sub2, dashed: true },
                      ]}
                      band={{ from: shown.timingWindowMs[0], to: shown.timingWindowMs[1], label: 'Timing window' }}
                      points={[{ x: advisedOffsetMs, y: advisedFlatness, label: shown.advice.keep ? `Kept ±${formatNumber(advisedFlatness, 2)} dB` : `Advised ${formatSigned(advisedOffsetMs, 'ms', 2)}` }]}
                      markers={[{ x: currentOffsetMs, label: 'now', color: chartColors.target, dashed: true }]}
                      aspect={0.42}
                    />
                    <ChartExportButtons
                      svgRef={plotRef}
                      filename={`timing-${shown.name}-flatness-vs-delay`}
                      subject="flatness against delay"
                      csv={() =>
                        ['sub_minus_mains_delay_ms,flatness_normal_db,flatness_inverted_db', ...curve.subMinusMainsDelayMs.map((d, i) => `${d},${curve.normalDb[i]},${curve.invertedDb[i]}`)].join('\r\n')
                      }
                    />
                  </>
                ) : null}
              </section>
            </>
          ) : (
            <p className="text-sm text-ink-faint">{error ? '' : 'Computing…'}</p>
          )}
        </div>
      </div>
    </div>
  );
}
