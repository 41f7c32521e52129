'use client';

import { useMemo, useState } from 'react';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { SEAT_BALANCE_DEFAULT_LIMITS, type SeatBalanceLimits, type SubSetting } from '@/dsp';
import { applySeatBalanceToDocument, seatBalanceRequestFromDocument } from '@/lib/system-model/seat-balance-document';
import { SEAT_BALANCE_LIMITS, seatBalanceMeasuredRequestSchema, seatBalanceModelRequestSchema, type SeatBalanceModelRequest } from '@/lib/validations/compute-seat-balance';
import type { SystemDocument } from '@/lib/validations/system';
import { ApplyBox } from './apply-box';
import type { SeatBalanceRunMessage } from './seat-balance-messages';
import { BalancePlots } from './balance-plots';
import { BalanceSummary } from './balance-summary';
import { LimitsForm, type PlacementOption } from './limits-form';
import { MissingFiles, ScopeChoice, UsedFiles } from './measured-files';
import { PlacementSection } from './placement-section';
import { RunControls } from './run-controls';
import { SettingsTable, type SettingsRow } from './settings-table';
import { SourceSwitch, type BalanceSource } from './source-switch';
import { measuredKey, useMeasuredSeatBalance } from './use-measured-seat-balance';
import { useSeatBalanceRun } from './use-seat-balance-run';

/** The candidate spots a placement search draws from (the four floor corners and four wall midpoints). */
const CANDIDATE_SPOTS = 8;

/** The request paths the limits form shows a message beside; any other problem is shown above the results. */
const FORM_FIELDS = new Set(['limits.maxDelayMs', 'limits.minGainDb', 'limits.maxGainDb', 'limits.maxOutputLossDb', 'placement.count']);

/** What a run depends on in the System: if any of it changes, the answer no longer describes the System. */
const systemKey = (request: SeatBalanceModelRequest, extras: SeatBalanceRunMessage['extras']) => JSON.stringify([request.room, request.seats, request.subs, extras]);

const settingOf = (s: SubSetting): SubSetting => ({ delayMs: s.delayMs, gainDb: s.gainDb, invert: s.invert });

/** Seat balance: each sub's delay, gain and polarity (and, if asked, positions) so every seat hears the same bass. */
export function SeatBalancePanel() {
  const { doc, update, readOnly } = useSystem();
  const [limits, setLimits] = useState<SeatBalanceLimits>({ ...SEAT_BALANCE_DEFAULT_LIMITS });
  const maxCount = Math.min(CANDIDATE_SPOTS, SEAT_BALANCE_LIMITS.maxSubs);
  const [placement, setPlacement] = useState<PlacementOption>(() => ({ enabled: false, count: Math.min(maxCount, Math.max(1, doc.subs.length)) }));
  const [undo, setUndo] = useState<{ subs: { id: string; setting: SubSetting }[] } | null>(null);
  const { run: modelRun, start, cancel: cancelModel } = useSeatBalanceRun();
  const [chosenSource, setSource] = useState<BalanceSource>('model');
  const measured = useMeasuredSeatBalance(doc, chosenSource === 'measured');
  const source: BalanceSource = measured.unavailable ? 'model' : chosenSource;
  const fromFiles = source === 'measured';
  const built = fromFiles ? measured.built : null;

  const base = useMemo(() => seatBalanceRequestFromDocument(doc, placement.enabled ? { placementCount: placement.count } : {}), [doc, placement]);
  const checked = useMemo(() => {
    if (fromFiles) return built?.ok ? seatBalanceMeasuredRequestSchema.safeParse({ ...built.body, limits }) : null;
    return base.ok ? seatBalanceModelRequestSchema.safeParse({ ...base.request, limits }) : null;
  }, [fromFiles, built, base, limits]);
  const errors = useMemo(() => new Map((checked && !checked.success ? checked.error.issues : []).map((i) => [i.path.join('.'), i.message])), [checked]);
  const currentKey = base.ok ? systemKey(base.request, base.extras) : null;

  const mRun = measured.run;
  const run = fromFiles ? mRun : modelRun;
  // One shape for both sources: the answer, the System's own settings when it ran, and whether the System changed since.
  const done = useMemo(() => {
    if (fromFiles) return mRun.state === 'done' ? { ...mRun, stale: !built?.ok || measuredKey(built.body) !== mRun.key } : null;
    if (modelRun.state !== 'done') return null;
    return { answer: modelRun.answer, elapsedMs: modelRun.elapsedMs, present: modelRun.input.extras.present ?? [], used: null, stale: systemKey(modelRun.input.request, modelRun.input.extras) !== currentKey };
  }, [fromFiles, mRun, built, modelRun, currentKey]);
  const answer = done?.answer;
  const stale = done?.stale ?? false;
  // Measured files carry no processing: a measured answer's delays are the whole processor delay, alignment included.
  const appliedDoc = useMemo<SystemDocument | null>(() => (answer ? applySeatBalanceToDocument(doc, answer, { delaysIncludeAlignment: answer.source === 'measured' }) : null), [doc, answer]);
  const rows: SettingsRow[] = useMemo(() => {
    if (!done || !answer) return [];
    const present = done.present;
    // Before Apply the mapping is read from the System as it is; after it, from the settings the run started from.
    return answer.subs.map((s, i) => ({
      name: s.name,
      present: present[i] ?? { delayMs: 0, gainDb: 0, invert: false },
      recommended: settingOf((stale ? null : appliedDoc?.subs[i]) ?? s),
      searched: settingOf(s),
    }));
  }, [done, answer, stale, appliedDoc]);
  const [shownRows, setShownRows] = useState<SettingsRow[]>([]);

  const onRun = () => {
    if (!checked?.success) return;
    setUndo(null);
    if (fromFiles) {
      if (built?.ok) measured.start({ ...built.body, limits }, built.used);
    } else if (base.ok) start({ request: checked.data as SeatBalanceModelRequest, extras: base.extras });
  };
  const cancel = fromFiles ? measured.cancel : cancelModel;
  const onSource = (s: BalanceSource) => {
    setUndo(null);
    setSource(s);
  };

  const onApply = () => {
    if (!answer || stale) return;
    setShownRows(rows);
    setUndo({ subs: doc.subs.map((s) => ({ id: s.id, setting: settingOf(s) })) });
    update((d) => applySeatBalanceToDocument(d, answer, { delaysIncludeAlignment: answer.source === 'measured' }));
  };

  const onUndo = () => {
    const kept = undo;
    if (!kept) return;
    update((d) => ({ ...d, subs: d.subs.map((s) => ({ ...s, ...(kept.subs.find((k) => k.id === s.id)?.setting ?? {}) })) }));
    setUndo(null);
  };

  return (
    <div className="flex flex-col gap-6 py-4" data-testid="seat-balance-panel">
      <div className="grid gap-6 lg:grid-cols-[minmax(16rem,20rem)_minmax(0,1fr)]">
        <div className="flex flex-col gap-4">
          <SourceSwitch source={source} onSource={onSource} measuredUnavailable={measured.unavailable} />
          {fromFiles ? <ScopeChoice scope={measured.scope} onScope={measured.setScope} /> : null}
          <LimitsForm
            limits={limits}
            onLimits={setLimits}
            placement={placement}
            onPlacement={setPlacement}
            maxCount={maxCount}
            errors={errors}
            disabled={false}
            placementNote={fromFiles ? 'Ranking positions needs the model: the files hold the subs where they stood.' : null}
          />
        </div>
        <div className="flex min-w-0 flex-col gap-5">
          <p className="text-sm text-ink-soft">
            Seat balance sets each sub&apos;s delay, gain and polarity so the seats hear the bass alike,{' '}
            {fromFiles
              ? 'from stored measurements of each sub alone at each seat, with phase (the search runs on the server).'
              : 'from the predicted response of every sub at every seat (the room model of Modes).'}{' '}
            Only the subs are changed; how they sit against the mains stays Timing&apos;s.
          </p>
          {fromFiles ? (
            measured.loadError ? (
              <Notice kind="error">{measured.loadError}</Notice>
            ) : !built ? (
              <p className="text-sm text-ink-soft" role="status">
                Loading the stored measurements…
              </p>
            ) : built.ok ? (
              <RunControls run={run} canRun={Boolean(checked?.success)} onRun={onRun} onCancel={cancel} />
            ) : (
              <MissingFiles result={built} subs={doc.subs.map((s) => s.name)} seats={doc.seats.map((s) => s.name)} scope={measured.scope} />
            )
          ) : base.ok ? (
            <RunControls run={run} canRun={Boolean(checked?.success)} onRun={onRun} onCancel={cancel} />
          ) : (
            <Notice kind="info" title="Seat balance cannot run on this System yet">
              <span data-testid="sb-reason">{base.reason}</span>
            </Notice>
          )}
          {[...errors].filter(([path]) => !FORM_FIELDS.has(path)).map(([path, message]) => (
            <Notice key={path} kind="error">
              {path ? `${path}: ` : ''}
              {message}
            </Notice>
          ))}
          {run.state === 'failed' ? <Notice kind="error" title="The search stopped">{run.message}</Notice> : null}
          {done && answer ? (
            <>
              {stale && !undo ? <Notice kind="warn">The System changed since this run: the figures below are for the settings and positions it had then.</Notice> : null}
              <BalanceSummary answer={answer} elapsedMs={done.elapsedMs} />
              <SettingsTable rows={undo ? shownRows : rows} />
              <ApplyBox answer={answer} rows={undo ? shownRows : rows} stale={stale} readOnly={readOnly} applied={undo !== null} onApply={onApply} onUndo={onUndo} />
              {done.used ? <UsedFiles used={done.used} /> : null}
              <BalancePlots answer={answer} />
              {answer.placements && modelRun.state === 'done' && !fromFiles ? (
                <PlacementSection placements={answer.placements} room={doc.room} seats={modelRun.input.request.seats} subs={modelRun.input.request.subs} presentSpreadDb={answer.present?.meanSpreadDb} />
              ) : null}
            </>
          ) : null}
        </div>
      </div>
    </div>
  );
}
