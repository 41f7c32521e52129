'use client';

import { useMemo, useState } from 'react';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { SEAT_BALANCE_DEFAULT_LIMITS, type SeatBalanceLimits, type SubSetting } from '@/dsp';
import { applySeatBalanceToDocument, seatBalanceRequestFromDocument } from '@/lib/system-model/seat-balance-document';
import { SEAT_BALANCE_LIMITS, seatBalanceModelRequestSchema, type SeatBalanceModelRequest } from '@/lib/validations/compute-seat-balance';
import type { SystemDocument } from '@/lib/validations/system';
import { ApplyBox } from './apply-box';
import type { SeatBalanceRunMessage } from './seat-balance-messages';
import { BalancePlots } from './balance-plots';
import { BalanceSummary } from './balance-summary';
import { LimitsForm, type PlacementOption } from './limits-form';
import { PlacementSection } from './placement-section';
import { RunControls } from './run-controls';
import { SettingsTable, type SettingsRow } from './settings-table';
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
  const { run, start, cancel } = useSeatBalanceRun();

  const base = useMemo(() => seatBalanceRequestFromDocument(doc, placement.enabled ? { placementCount: placement.count } : {}), [doc, placement]);
  const checked = useMemo(() => (base.ok ? seatBalanceModelRequestSchema.safeParse({ ...base.request, limits }) : null), [base, limits]);
  const errors = useMemo(() => new Map((checked && !checked.success ? checked.error.issues : []).map((i) => [i.path.join('.'), i.message])), [checked]);
  const currentKey = base.ok ? systemKey(base.request, base.extras) : null;

  const done = run.state === 'done' ? run : null;
  const answer = done?.answer;
  const stale = done ? systemKey(done.input.request, done.input.extras) !== currentKey : false;
  const appliedDoc = useMemo<SystemDocument | null>(() => (answer ? applySeatBalanceToDocument(doc, answer) : null), [doc, answer]);
  const rows: SettingsRow[] = useMemo(() => {
    if (!done || !answer) return [];
    const present = done.input.extras.present ?? [];
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
    if (!base.ok || !checked?.success) return;
    setUndo(null);
    start({ request: checked.data, extras: base.extras });
  };

  const onApply = () => {
    if (!answer || stale) return;
    setShownRows(rows);
    setUndo({ subs: doc.subs.map((s) => ({ id: s.id, setting: settingOf(s) })) });
    update((d) => applySeatBalanceToDocument(d, answer));
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
          <LimitsForm limits={limits} onLimits={setLimits} placement={placement} onPlacement={setPlacement} maxCount={maxCount} errors={errors} disabled={false} />
        </div>
        <div className="flex min-w-0 flex-col gap-5">
          <p className="text-sm text-ink-soft">
            Seat balance sets each sub&apos;s delay, gain and polarity so the seats hear the bass alike, from the predicted response of every sub at every seat (the room model of Modes). Only the
            subs are changed; how they sit against the mains stays Timing&apos;s.
          </p>
          {base.ok ? (
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
              <BalancePlots answer={answer} />
              {answer.placements ? (
                <PlacementSection placements={answer.placements} room={doc.room} seats={done.input.request.seats} subs={done.input.request.subs} presentSpreadDb={answer.present?.meanSpreadDb} />
              ) : null}
            </>
          ) : null}
        </div>
      </div>
    </div>
  );
}
