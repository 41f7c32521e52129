'use client';

import Link from 'next/link';
import { useMemo, useState } from 'react';
import { Button } from '@/components/ui/button';
import { useRequiredText } from '@/components/ui/required-text';
import type { AppLessonStep } from '@/lib/data/lessons';
import { LESSON_PANELS, LESSON_TRACES, sweepSchema, type LessonPanel, type LessonTrace } from '@/lib/validations/lesson';
import { stepEditorHref } from './shared-lesson';
import { StepPlot } from './step-plot';
import { draftToSweep, SweepFields, sweepToDraft, type SweepDraft } from './sweep-fields';
import { TalkingPoints } from './talking-points';
import { useSweepPlayer } from './use-sweep-player';

const PANEL_LABELS: Record<LessonPanel, string> = { blend: 'Blend', timing: 'Timing', modes: 'Modes', layout: 'Layout', headroom: 'Headroom', time: 'Impulse and step' };
const TRACE_LABELS: Record<LessonTrace, string> = { mains: 'Mains', subs: 'Subs', sum: 'Sum', target: 'Flat reference', phase: 'Phase plot' };

interface StepFormProps {
  step: AppLessonStep;
  canEdit: boolean;
  busy: boolean;
  onSave: (fields: { title: string; points: string; panel: LessonPanel; traces: LessonTrace[]; sweep: unknown }) => Promise<boolean>;
  onDuplicate: () => void;
  onDelete: () => void;
}

/** One Step's title, talking points, panel, traces and sweep, with Save, Duplicate and Delete, and a live preview of its plot. */
export function StepForm({ step, canEdit, busy, onSave, onDuplicate, onDelete }: StepFormProps) {
  const [title, setTitle] = useState(step.title);
  const titleCheck = useRequiredText({ label: 'Step title', value: title, max: 200 });
  const [points, setPoints] = useState(step.points);
  const [panel, setPanel] = useState<LessonPanel>(step.panel);
  const [traces, setTraces] = useState<LessonTrace[]>(step.traces);
  const [sweepDraft, setSweepDraft] = useState<SweepDraft>(sweepToDraft(step.sweep));
  const parsedSweep = useMemo(() => (sweepDraft ? sweepSchema.safeParse(draftToSweep(sweepDraft)) : null), [sweepDraft]);
  const sweep = parsedSweep?.success ? parsedSweep.data : null;
  const sweepError = parsedSweep && !parsedSweep.success ? parsedSweep.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ') : undefined;
  const preview = useMemo(() => ({ document: step.document, panel, traces, sweep, title: title || 'Untitled Step' }), [step.document, panel, traces, sweep, title]);
  const player = useSweepPlayer(sweep, `${step.id}:${JSON.stringify(sweep)}`);
  const dirty = title !== step.title || points !== step.points || panel !== step.panel || traces.join() !== step.traces.join() || JSON.stringify(sweepDraft ? draftToSweep(sweepDraft) : null) !== JSON.stringify(step.sweep);

  return (
    <div className="flex flex-col gap-4">
      <div className="grid grid-cols-1 gap-4 xl:grid-cols-[minmax(320px,420px)_minmax(0,1fr)]">
        <form
          className="flex min-w-0 flex-col gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            if (sweepError || !title.trim()) return;
            void onSave({ title, points, panel, traces, sweep: sweepDraft ? draftToSweep(sweepDraft) : null });
          }}
        >
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">Step title</span>
            <input value={title} readOnly={!canEdit} maxLength={200} onChange={(e) => setTitle(e.target.value)} {...titleCheck.inputProps} className={`rounded-md border bg-white px-3 py-2 ${titleCheck.error ? 'border-fail' : 'border-line'}`} data-testid="step-title" />
            {titleCheck.message}
          </label>
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">Talking points</span>
            <textarea value={points} readOnly={!canEdit} rows={8} maxLength={8000} onChange={(e) => setPoints(e.target.value)} className="rounded-md border border-line bg-white px-3 py-2 font-mono text-[13px]" aria-describedby="points-hint" data-testid="step-points" />
            <span id="points-hint" className="text-xs text-ink-faint">
              A blank line starts a paragraph; “- ” starts a bullet; **bold**, *italic*.
            </span>
          </label>
          <div className="grid grid-cols-2 gap-3">
            <label className="flex flex-col gap-1 text-sm">
              <span className="font-medium">Panel</span>
              <select value={panel} disabled={!canEdit} onChange={(e) => setPanel(e.target.value as LessonPanel)} className="rounded-md border border-line bg-white px-2.5 py-2">
                {LESSON_PANELS.map((p) => (
                  <option key={p} value={p}>
                    {PANEL_LABELS[p]}
                  </option>
                ))}
              </select>
            </label>
            <fieldset className="flex flex-col gap-1 text-sm">
              <legend className="font-medium">Traces shown</legend>
              {LESSON_TRACES.map((t) => (
                <label key={t} className="flex items-center gap-2">
                  <input type="checkbox" disabled={!canEdit} checked={traces.includes(t)} onChange={(e) => setTraces(e.target.checked ? LESSON_TRACES.filter((x) => x === t || traces.includes(x)) : traces.filter((x) => x !== t))} />
                  {TRACE_LABELS[t]}
                </label>
              ))}
            </fieldset>
          </div>
          {canEdit ? <SweepFields value={sweepDraft} onChange={setSweepDraft} error={sweepError} /> : null}
          {canEdit ? (
            <div className="flex flex-wrap gap-2">
              <Button type="submit" disabled={!dirty || busy || Boolean(sweepError) || !title.trim()} data-testid="save-step">
                Save Step
              </Button>
              <Button variant="secondary" onClick={onDuplicate} disabled={busy}>
                Duplicate
              </Button>
              <Button variant="ghost" className="text-fail" onClick={onDelete} disabled={busy}>
                Delete Step
              </Button>
            </div>
          ) : null}
          <Link href={stepEditorHref(step.document, panel, title)} className="text-sm underline">
            Open this Step&apos;s System in the editor
          </Link>
        </form>
        <div className="flex min-w-0 flex-col gap-3 rounded-lg border border-line bg-white p-4" aria-label="Preview">
          <div className="flex flex-wrap items-center gap-2">
            <h3 className="mr-auto font-semibold">Preview</h3>
            {sweep ? (
              <>
                <Button variant="secondary" onClick={player.toggle} data-testid="preview-sweep-toggle">
                  {player.playing ? 'Pause sweep' : 'Play sweep'}
                </Button>
                <Button variant="ghost" onClick={player.restart}>
                  Restart
                </Button>
              </>
            ) : null}
          </div>
          <StepPlot step={preview} progress={player.progress} />
          <div className="border-t border-line pt-3">
            <h4 className="mb-1 text-xs font-semibold tracking-wide text-ink-soft uppercase">Talking points as shown</h4>
            <TalkingPoints text={points} className="text-sm" />
          </div>
        </div>
      </div>
    </div>
  );
}
