'use client';

import { useMemo, useState } from 'react';
import { useSystem } from '@/components/system/system-context';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { useDecimalMark } from '@/components/ui/use-decimal-mark';
import { mlpSeat } from '@/lib/system-model/geometry';
import { applyEqDesignToDocument, eqDesignRequestFromDocument } from '@/lib/system-model/eq-design';
import { eqDesignMeasuredRequestFromDocument } from '@/lib/system-model/eq-design-measured';
import type { EqDesignMeasuredRequest, EqDesignModelRequest } from '@/lib/validations/compute-eq-design';
import type { PeakingFilterInput } from '@/lib/validations/eq-filter';

/** A sub output's EQ list, as the document holds it. */
type PeakingList = PeakingFilterInput[];
import { EqDesignerApply, type EqPromise } from './eq-designer-apply';
import { defaultEqDesignerDraft, readEqDesignerDraft, type EqDesignerDraft, type EqDesignSource } from './eq-designer-draft';
import { EqDesignerForm } from './eq-designer-form';
import { EqDesignerPlot } from './eq-designer-plot';
import { EqDesignerResult } from './eq-designer-result';
import { eqDesignKey, useEqDesignRun } from './use-eq-design-run';
import { useEqDesignMeasurements } from './use-eq-design-measured';

type Built =
  | { ok: true; kind: 'model'; request: EqDesignModelRequest; key: string }
  | { ok: true; kind: 'measured'; request: EqDesignMeasuredRequest; used: { seat: string; sub?: string; name: string }[]; key: string }
  | { ok: false; reason: string };

/** What Apply wrote: the run it came from, its promise, and each sub's EQ before (for Undo). */
interface Applied {
  key: string;
  promise: EqPromise;
  before: { id: string; eq: PeakingList }[];
}

/**
 * The EQ designer for the subs (issue 16): peaking filters, cut first with boosts limited, toward a flat or house-curve
 * target at the MLP or the seats' average, on the room model (computed here, in the browser) or on stored measurements
 * (POST /api/v1/eq-design). Shows the curves, the residual before and after, the filters and the nulls left alone, and
 * applies the filters as every sub output's EQ (applyEqDesignToDocument) through the editor's one update path.
 */
export function EqDesigner() {
  const { doc, update, readOnly } = useSystem();
  const decimalMark = useDecimalMark();
  const [draft, setDraft] = useState<EqDesignerDraft>(() => defaultEqDesignerDraft());
  const measured = useEqDesignMeasurements(draft.source === 'measured');
  const source: EqDesignSource = measured.unavailable ? 'model' : draft.source;
  const reading = useMemo(() => readEqDesignerDraft({ ...draft, source }, decimalMark), [draft, source, decimalMark]);
  const { run, runModel, runMeasured } = useEqDesignRun();
  const [applied, setApplied] = useState<Applied | null>(null);

  const built = useMemo<Built | null>(() => {
    if (!reading.ok) return null;
    if (source === 'model') {
      const r = eqDesignRequestFromDocument(doc, reading.options);
      return r.ok ? { ok: true, kind: 'model', request: r.request, key: eqDesignKey(r.request) } : r;
    }
    if (!measured.items) return null;
    // The files are measured with the subs' EQ bypassed: the present EQ has no place in a measured run.
    const { at, target, band, maxFilters, maxBoostDb, maxCutDb, q } = reading.options;
    const r = eqDesignMeasuredRequestFromDocument(doc, measured.items, { at, target, band, maxFilters, maxBoostDb, maxCutDb, q });
    return r.ok ? { ok: true, kind: 'measured', request: r.request, used: r.used, key: eqDesignKey(r.request) } : r;
  }, [doc, reading, source, measured.items]);

  const done = run.state === 'done' ? run : null;
  const stale = done ? !built?.ok || built.key !== done.key : false;
  const appliedHere = done && !done.withPresentEq && applied?.key === done.key ? applied : null;
  const seatName = doc.seats.length ? mlpSeat(doc).name : '—';

  const onRun = () => {
    if (!built?.ok) return;
    if (built.kind === 'model') runModel(built.request, reading.ok && reading.options.withPresentEq);
    else runMeasured(built.request, built.used);
  };

  const onApply = () => {
    if (!done || stale || readOnly || done.withPresentEq || done.answer.filters.length === 0) return;
    const answer = done.answer;
    setApplied({ key: done.key, promise: { after: answer.residual.after, levelOffsetDb: answer.levelOffsetDb }, before: doc.subs.map((s) => ({ id: s.id, eq: s.eq })) });
    update((d) => applyEqDesignToDocument(d, answer));
  };

  const onUndo = () => {
    const kept = applied;
    if (!kept) return;
    update((d) => ({ ...d, subs: d.subs.map((s) => ({ ...s, eq: kept.before.find((b) => b.id === s.id)?.eq ?? s.eq })) }));
    setApplied(null);
  };

  // The check after Apply: the model with the EQ the subs now run, at the same options and against the design's own
  // target level, so the check's "before" is exactly what the applied EQ achieves.
  const onCheck =
    appliedHere && done?.used === null && reading.ok
      ? () => {
          const r = eqDesignRequestFromDocument(doc, { ...reading.options, withPresentEq: true, targetLevelDb: appliedHere.promise.levelOffsetDb });
          setDraft((d) => ({ ...d, source: 'model', withPresentEq: true }));
          if (r.ok) runModel(r.request, true);
        }
      : null;

  return (
    <section aria-labelledby="eqd-title" className="flex min-w-0 flex-col gap-4 rounded-lg border border-line bg-white p-3 sm:p-4" data-testid="eq-designer">
      <div className="flex flex-col gap-1">
        <h4 id="eqd-title" className="text-base font-semibold">
          EQ designer
        </h4>
        <p className="text-sm text-ink-soft">
          Peaking filters for the sub outputs, fitted to bring the subs’ response toward a target at a seat or the seats’ average: cuts first, boosts held to the limit and never into a
          deep null. Apply writes the same filters to every sub’s EQ.
        </p>
      </div>
      <div className="grid min-w-0 gap-6 lg:grid-cols-[minmax(16rem,22rem)_minmax(0,1fr)]">
        <EqDesignerForm
          draft={draft}
          onDraft={setDraft}
          errors={reading.ok ? {} : reading.errors}
          source={source}
          measuredUnavailable={measured.unavailable}
          scope={measured.scope}
          onScope={measured.setScope}
          mlpName={seatName}
          seatCount={doc.seats.length}
        />
        <div className="flex min-w-0 flex-col gap-4">
          <div className="flex flex-wrap items-center gap-3">
            <Button onClick={onRun} disabled={!built?.ok || run.state === 'running'} data-testid="eqd-run">
              {reading.ok && reading.options.withPresentEq ? 'Check the present EQ' : 'Design the EQ'}
            </Button>
            <p role="status" className="text-sm text-ink-soft" data-testid="eqd-status">
              {run.state === 'running' ? (source === 'measured' ? 'Designing on the server from the stored files…' : 'Designing…') : ''}
            </p>
          </div>
          {!reading.ok ? (
            <p className="text-sm text-fail" data-testid="eqd-invalid">
              Correct the fields marked in the form; nothing runs until then.
            </p>
          ) : source === 'measured' && measured.loadError ? (
            <Notice kind="error">{measured.loadError}</Notice>
          ) : !built ? (
            <p className="text-sm text-ink-soft">Loading the stored measurements…</p>
          ) : !built.ok ? (
            <Notice kind="info" title="The EQ designer cannot run on this yet">
              <span data-testid="eqd-reason">{built.reason}</span>
            </Notice>
          ) : null}
          {run.state === 'failed' ? (
            <Notice kind="error" title="The design stopped">
              {run.message}
            </Notice>
          ) : null}
          {done ? (
            <>
              {stale && !appliedHere ? <Notice kind="warn">The System or the options changed since this run: the figures below are for what they were then.</Notice> : null}
              <EqDesignerResult answer={done.answer} check={done.withPresentEq} elapsedMs={done.elapsedMs} />
              <EqDesignerApply
                answer={done.answer}
                check={done.withPresentEq}
                stale={stale}
                readOnly={readOnly}
                subs={doc.subs.map((s) => ({ name: s.name, eqCount: s.eq.length }))}
                applied={done.withPresentEq ? (applied?.promise ?? null) : (appliedHere?.promise ?? null)}
                onApply={onApply}
                onUndo={onUndo}
                onCheck={onCheck}
              />
              <EqDesignerPlot answer={done.answer} />
              {done.used ? (
                <details className="text-sm" data-testid="eqd-files">
                  <summary className="cursor-pointer text-ink-soft">Files used ({done.used.length})</summary>
                  <ul className="mt-1 flex flex-col gap-0.5 break-words text-xs">
                    {done.used.map((u) => (
                      <li key={`${u.sub ?? ''}\u0000${u.seat}`}>
                        {u.sub ? <span className="font-medium">{u.sub} at </span> : null}
                        <span className="font-medium">{u.seat}</span>: {u.name}
                      </li>
                    ))}
                  </ul>
                </details>
              ) : null}
            </>
          ) : null}
        </div>
      </div>
    </section>
  );
}
