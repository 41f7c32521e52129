'use client';

import { useId, useMemo, useState } from 'react';
import { formatHzReadout, formatNumber, formatSigned, subTraceStyle } from '@/components/charts';
import { slopeShortName } from '@/components/blend/slope-select';
import { MainChannelSelect } from '@/components/system/main-channel-select';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import { MeasuredBasisPicker } from '@/components/measured/measured-basis-picker';
import { useMeasuredBasis } from '@/lib/hooks/use-measured-basis';
import { useTiming } from '@/lib/hooks/use-timing';
import { measuredSourcesRequest, settingsForDocument } from '@/lib/system-model/measured-sources';
import type { ApiError } from '@/lib/client/api';
import { blendMainSpeaker } from '@/lib/system-model/system-from-document';
import { applyTimingToDocument, timingRequestFromDocument } from '@/lib/system-model/timing';
import type { Speaker, Sub } from '@/lib/validations/system';
import { AdviceCard, describeChanges } from './advice-card';
import { ArrivalsTable } from './arrivals-table';
import { DistanceField } from './distance-field';
import { FlatnessPlot } from './flatness-plot';
import { TimeSection } from './time-section';

const fieldError = (error: ApiError | undefined, path: string) => error?.field(path);

/** Timing: when the mains and subs arrive at the MLP, advice on each sub's delay and polarity (and all subs together), and flatness against delay. */
export function TimingPanel() {
  const { doc, update, units, readOnly } = useSystem();
  const id = useId();
  const [channel, setChannel] = useState<string | undefined>(undefined);
  const [shownSub, setShownSub] = useState(0);
  const [appliedNote, setAppliedNote] = useState<string | null>(null);
  const speaker = blendMainSpeaker(doc, channel);
  const basis = useMeasuredBasis(speaker?.channel);
  const picks = basis.seat?.picks ?? null;
  // On measurements each source keeps its processor settings and takes its curve at the seat in place of its model.
  const request = useMemo(() => {
    const onModel = timingRequestFromDocument(doc, speaker?.channel);
    return onModel && picks ? { ...onModel, ...measuredSourcesRequest(doc, onModel, picks) } : onModel;
  }, [doc, speaker?.channel, picks]);
  const { data, error, pending } = useTiming(request);
  const bm = doc.bassManagement;
  const subIndex = Math.min(shownSub, Math.max(0, (data?.subs.length ?? doc.subs.length) - 1));
  /** A piece of advice as settings of the document's subs (one measured "All subs" source spread over every sub). */
  const forDocument = (set: { mainsDelayMs: number; subs: { name: string; delayMs: number; invert: boolean }[] }) =>
    picks && request ? { set: settingsForDocument(doc, speaker?.channel, picks, { mainsDelayMs: request.mains.delayMs ?? 0, subs: request.subs.map((s) => ({ delayMs: s.delayMs ?? 0, invert: s.invert ?? false })) }, set) } : { set };

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
  const band = data ? `${formatHzReadout(data.flatness.bandHz[0])}–${formatHzReadout(data.flatness.bandHz[1])}` : '';

  return (
    <div className="flex flex-col gap-6 py-4">
      <div className="grid gap-6 lg:grid-cols-[minmax(16rem,20rem)_minmax(0,1fr)]">
        <form className="flex flex-col gap-4" aria-label="Timing inputs" onSubmit={(e) => e.preventDefault()}>
          <NumberField label="Air temperature" unit="°C" value={doc.room.temperatureC} min={-20} max={50} step={1} disabled={readOnly} error={fieldError(error, 'temperatureC')} onChange={(v) => update((d) => ({ ...d, room: { ...d.room, temperatureC: v } }))} testId="timing-temperature" />
          <MainChannelSelect id={`${id}-channel`} label="Main channel" value={speaker.channel} speakers={doc.speakers} onChange={setChannel} />
          <MeasuredBasisPicker basis={basis} testId="timing-basis" />
          <DistanceField label={`${speaker.channel}: distance set on the processor`} doc={doc} item={speaker} units={units} disabled={readOnly} error={fieldError(error, 'mains.distanceM')} onOverride={(m) => setSpeaker(speaker.id, { distanceOverrideM: m })} testId="timing-mains-distance" />
          {doc.subs.map((s, k) => (
            <fieldset key={s.id} className="flex flex-col gap-2 rounded-md border border-line bg-white p-3">
              <legend className="px-1 text-sm font-medium" style={{ color: subTraceStyle(k).color }}>
                {s.name}
              </legend>
              <div className="grid grid-cols-2 gap-2">
                <NumberField label="Across (x)" length units={units} value={s.xM} min={0} max={doc.room.widthM} step={0.05} digits={2} disabled={readOnly} onChange={(v) => setSub(k, { xM: v })} testId={`timing-sub-${k}-x`} />
                <NumberField label="Into room (y)" length units={units} value={s.yM} min={0} max={doc.room.lengthM} step={0.05} digits={2} disabled={readOnly} onChange={(v) => setSub(k, { yM: v })} testId={`timing-sub-${k}-y`} />
              </div>
              <DistanceField label="Distance set on the processor" doc={doc} item={s} units={units} disabled={readOnly} error={fieldError(error, `subs.${k}.distanceM`)} onOverride={(m) => setSub(k, { distanceOverrideM: m })} testId={`timing-sub-${k}-distance`} />
              <p className="num text-xs text-ink-soft">
                Own delay <span data-testid={`timing-sub-${k}-own-delay`}>{formatNumber(s.delayMs, 2)} ms</span> · gain <span data-testid={`timing-sub-${k}-gain`}>{formatSigned(s.gainDb, 'dB')}</span> ·{' '}
                <span data-testid={`timing-sub-${k}-polarity`}>{s.invert ? 'inverted' : 'normal'}</span> polarity <span className="font-sans">(distance alignment is added to the delay)</span>
              </p>
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
              <p className="text-sm font-medium" data-testid="timing-ran-on">
                On {basis.label}.{data.measured ? <span className="font-normal text-ink-soft"> {data.measured.note}</span> : null}
              </p>
              <ArrivalsTable data={data} temperatureC={doc.room.temperatureC} units={units} pending={pending} />

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
                      update((d) => applyTimingToDocument(d, forDocument(s.advice.set), speaker.channel));
                      setAppliedNote(`${describeChanges(s.advice, data)}.`);
                    }}
                  >
                    <p className="num text-xs text-ink-soft">
                      Timing window {formatNumber(s.timingWindowMs[0], 2)} to {formatNumber(s.timingWindowMs[1], 2)} ms (sub minus mains delay; flatness within 1 dB)
                    </p>
                  </AdviceCard>
                ))}
              </div>

              {data.subs.length >= 2 ? (
                <p className="text-xs text-ink-soft" data-testid="timing-seat-balance-note">
                  Moving one sub&apos;s delay or polarity alone changes how alike the seats sound (see Seat balance); shifting every sub&apos;s delay by the same amount keeps it. The all-subs advice may move a sub on its own, so check Seat balance after applying it.
                </p>
              ) : null}
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
                    update((d) => applyTimingToDocument(d, forDocument(group.set), speaker.channel));
                    setAppliedNote(`${describeChanges(group, data)}.`);
                  }}
                />
              ) : null}
              {appliedNote ? <Notice kind="ok">Applied to the System: {appliedNote}</Notice> : null}

              <FlatnessPlot data={data} subIndex={subIndex} onSubIndex={setShownSub} band={band} />
              <TimeSection request={request} data={data} />
            </>
          ) : (
            <p className="text-sm text-ink-faint">{error ? '' : 'Computing…'}</p>
          )}
        </div>
      </div>
    </div>
  );
}
