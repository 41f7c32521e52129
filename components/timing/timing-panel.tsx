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
import { applyGroupRecommendation, applySubRecommendation, timingRequestFromDocument, type TimingSubAnswer } from '@/lib/system-model/timing';
import { speakerAngles } from '@/dsp';
import { metresToFeet } from '@/lib/units';
import type { Speaker, Sub, SystemDocument } from '@/lib/validations/system';
import { slopeShortName } from '@/components/blend/slope-select';

const geometryM = (doc: SystemDocument, item: Speaker | Sub): number => {
  const seat = doc.seats.find((s) => s.id === doc.mlpSeatId) ?? doc.seats[0];
  return seat ? speakerAngles({ listenerM: toPointM(seat), speakerM: toPointM(item) }).distanceM : 0;
};

/** A distance to the MLP: editing it sets the measured-distance override; "Use positions" clears it. */
function DistanceField({ label, doc, item, onOverride, units, error, disabled, testId }: { label: string; doc: SystemDocument; item: Speaker | Sub; onOverride: (m: number | null) => void; units: 'metric' | 'imperial'; error?: string; disabled?: boolean; testId: string }) {
  const fromGeometry = geometryM(doc, item);
  const overridden = item.distanceOverrideM != null;
  const shown = (m: number) => lengthText(m, units);
  return (
    <div className="flex flex-col gap-1">
      <NumberField label={label} length units={units} value={distanceToSeatM(doc, item)} min={0.1} max={100} step={0.01} digits={2} disabled={disabled} error={error} onChange={(v) => onOverride(v)} testId={testId} hint={overridden ? `measured; positions give ${shown(fromGeometry)}` : 'from the positions on Layout'} />
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

function describeRecommendation(r: TimingSubAnswer['recommendation']): string {
  const delay = r.addDelayMs < 0.005 ? 'No delay change' : `Add ${formatNumber(r.addDelayMs, 2)} ms to the ${r.addTo === 'sub' ? 'sub' : 'mains'}`;
  return `${delay}; sub polarity ${r.invert ? 'inverted' : 'normal'}${r.flipPolarity ? ' (flip it)' : ''}`;
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
  const curve = shown?.levelVersusDelay;
  const currentOffsetMs = shown ? shown.delayMs - (data?.mains.delayMs ?? 0) : 0;
  const recommendedOffsetMs = shown ? shown.recommendation.subDelayMs - shown.recommendation.mainsDelayMs : 0;
  const recommendedLevel = shown?.recommendation.crossoverLevelDb ?? 0;

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
          <DistanceField label={`${speaker.channel} to the MLP`} doc={doc} item={speaker} units={units} disabled={readOnly} error={fieldError(error, 'mains.distanceM')} onOverride={(m) => setSpeaker(speaker.id, { distanceOverrideM: m })} testId="timing-mains-distance" />
          {doc.subs.map((s, k) => (
            <fieldset key={s.id} className="flex flex-col gap-2 rounded-md border border-line bg-white p-3">
              <legend className="px-1 text-sm font-medium" style={{ color: k % 2 ? chartColors.sub2 : chartColors.sub }}>
                {s.name}
              </legend>
              <div className="grid grid-cols-2 gap-2">
                <NumberField label="Across (x)" length units={units} value={s.xM} min={0} max={doc.room.widthM} step={0.05} digits={2} disabled={readOnly} onChange={(v) => setSub(k, { xM: v })} testId={`timing-sub-${k}-x`} />
                <NumberField label="Into room (y)" length units={units} value={s.yM} min={0} max={doc.room.lengthM} step={0.05} digits={2} disabled={readOnly} onChange={(v) => setSub(k, { yM: v })} testId={`timing-sub-${k}-y`} />
              </div>
              <DistanceField label="Distance to the MLP" doc={doc} item={s} units={units} disabled={readOnly} error={fieldError(error, `subs.${k}.distanceM`)} onOverride={(m) => setSub(k, { distanceOverrideM: m })} testId={`timing-sub-${k}-distance`} />
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

              <div className="grid gap-3 md:grid-cols-2">
                {data.subs.map((s, k) => {
                  // A change that gains under 0.5 dB of flatness is not worth making; say so first.
                  const optional = s.recommendation.flatnessBeforeDb - s.recommendation.flatnessDb < 0.5;
                  return (
                  <div key={k} className="flex flex-col gap-2 rounded-md border border-line bg-white p-3" data-testid={`timing-recommendation-${k}`}>
                    <p className="text-xs text-ink-soft">
                      Recommended for <span className="font-medium text-ink">{s.name}</span> alone with {data.mains.name}
                    </p>
                    {optional ? (
                      <p className="text-base font-semibold text-ok">Keep the present setting: it is within 0.5 dB of the flattest.</p>
                    ) : null}
                    <p className={optional ? 'text-sm' : 'text-base font-semibold'}>
                      {optional ? <span className="text-ink-soft">Flattest found: </span> : null}
                      <span data-testid={`timing-recommendation-text-${k}`}>{describeRecommendation(s.recommendation)}</span>
                    </p>
                    <p className="num text-xs text-ink-soft">
                      sets sub {formatNumber(s.recommendation.subDelayMs, 2)} ms, mains {formatNumber(s.recommendation.mainsDelayMs, 2)} ms · flatness ±{formatNumber(s.recommendation.flatnessBeforeDb, 2)} → ±{formatNumber(s.recommendation.flatnessDb, 2)} dB · phase after {formatValue(s.recommendation.phaseDifferenceAfterDeg, '°', 0)} · Timing window {formatNumber(s.timingWindowMs[0], 2)} to {formatNumber(s.timingWindowMs[1], 2)} ms
                    </p>
                    <Button
                      variant="secondary"
                      className="self-start"
                      disabled={readOnly}
                      data-testid={`timing-apply-${k}`}
                      onClick={() => {
                        update((d) => applySubRecommendation(d, k, s));
                        setAppliedNote(`${s.name}: ${describeRecommendation(s.recommendation)}.`);
                      }}
                    >
                      Apply
                    </Button>
                  </div>
                  );
                })}
              </div>

              {data.group ? (
                <div className="flex flex-col gap-2 rounded-md border border-mains bg-[#EEF7F6] p-3" data-testid="timing-group">
                  <p className="text-sm font-semibold">All {data.group.subs.length} subs aligned to each other, then to {data.mains.name}</p>
                  <p className="num text-sm">
                    mains {formatNumber(data.group.mainsDelayMs, 2)} ms ·{' '}
                    {data.group.subs.map((g) => `${g.name} ${formatNumber(g.delayMs, 2)} ms ${g.invert ? 'inverted' : 'normal'}`).join(' · ')}
                  </p>
                  <p className="num text-xs text-ink-soft">
                    flatness ±{formatNumber(data.group.flatnessBeforeDb, 2)} dB now → ±{formatNumber(data.group.flatnessDb, 2)} dB (±1 octave of the crossover)
                  </p>
                  <Button
                    className="self-start"
                    disabled={readOnly}
                    data-testid="timing-apply-group"
                    onClick={() => {
                      const group = data.group;
                      if (!group) return;
                      update((d) => applyGroupRecommendation(d, group));
                      setAppliedNote('All subs and the mains delay set from the group alignment.');
                    }}
                  >
                    Apply to all subs
                  </Button>
                </div>
              ) : null}
              {appliedNote ? <Notice kind="ok">Applied to the System: {appliedNote}</Notice> : null}

              <section aria-label="Level at the crossover against delay" className="flex flex-col gap-2">
                <div className="flex flex-wrap items-end justify-between gap-2">
                  <h3 className="text-sm font-semibold">
                    Level at {formatHzReadout(data.crossoverHz)} against the sub-minus-mains delay{data.subs.length > 1 ? '' : ` (${shown?.name})`}
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
                      title={`Level at the crossover against delay, ${shown.name}`}
                      description="Sum of the mains and this sub at the crossover frequency as the sub's delay minus the mains' delay changes; positive values delay the sub, negative the mains. Shaded: the Timing window (within 1 dB of the recommendation)."
                      x={curve.subMinusMainsDelayMs}
                      xLabel="Sub delay minus mains delay"
                      xUnit="ms"
                      yUnit="dB"
                      yLabel="Level at the crossover"
                      yDomain={[-30, Math.max(9, Math.ceil(Math.max(...curve.normalDb, ...curve.invertedDb) / 3) * 3 + 3)]}
                      traces={[
                        { id: 'normal', label: 'Sub polarity normal', values: curve.normalDb, ...traceStyles.sub },
                        { id: 'inverted', label: 'Sub polarity inverted', values: curve.invertedDb, ...traceStyles.sub2, dashed: true },
                      ]}
                      band={{ from: shown.timingWindowMs[0], to: shown.timingWindowMs[1], label: 'Timing window' }}
                      points={[{ x: recommendedOffsetMs, y: recommendedLevel, label: `Best ${formatSigned(recommendedOffsetMs, 'ms', 2)}` }]}
                      markers={[{ x: currentOffsetMs, label: 'now', color: chartColors.target, dashed: true }]}
                      aspect={0.42}
                    />
                    <ChartExportButtons
                      svgRef={plotRef}
                      filename={`timing-${shown.name}-level-vs-delay`}
                      subject="level against delay"
                      csv={() =>
                        ['sub_minus_mains_delay_ms,normal_db,inverted_db', ...curve.subMinusMainsDelayMs.map((d, i) => `${d},${curve.normalDb[i]},${curve.invertedDb[i]}`)].join('\r\n')
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
