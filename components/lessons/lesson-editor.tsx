'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useEffect, useMemo, useState, type KeyboardEvent } from 'react';
import { Button, buttonClass } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import type { AppLesson, AppLessonShareLink, AppLessonStep } from '@/lib/data/lessons';
import { LESSON_PANELS, LESSON_TRACES, sweepSchema, type LessonPanel, type LessonTrace } from '@/lib/validations/lesson';
import { stepEditorHref } from './shared-lesson';
import { StepPlot } from './step-plot';
import { draftToSweep, SweepFields, sweepToDraft, type SweepDraft } from './sweep-fields';
import { TalkingPoints } from './talking-points';
import { useSweepPlayer } from './use-sweep-player';

type Status = { kind: 'idle' } | { kind: 'busy' } | { kind: 'ok'; message: string } | { kind: 'error'; message: string } | { kind: 'conflict'; message: string };

const PANEL_LABELS: Record<LessonPanel, string> = { blend: 'Blend', timing: 'Timing', modes: 'Modes', layout: 'Layout', headroom: 'Headroom' };
const TRACE_LABELS: Record<LessonTrace, string> = { mains: 'Mains', subs: 'Subs', sum: 'Sum', target: 'Flat reference', phase: 'Phase plot' };

/** The new order with the Step `id` moved to `to` (0-based). */
function moved(ids: string[], id: string, to: number): string[] {
  const from = ids.indexOf(id);
  if (from < 0 || to < 0 || to >= ids.length || from === to) return ids;
  const next = [...ids];
  next.splice(from, 1);
  next.splice(to, 0, id);
  return next;
}

/**
 * The Lesson editor: the Steps in order (drag to reorder, or Move up / Move down, or Alt+↑/↓ on a
 * focused Step), one Step's title, talking points, panel, traces and sweep, a preview of its plot,
 * and the Lesson's share links. Every change names the revision it started from.
 */
export function LessonEditor({ initial }: { initial: AppLesson }) {
  const router = useRouter();
  const [lesson, setLesson] = useState(initial);
  const [selectedId, setSelectedId] = useState<string | null>(initial.steps[0]?.id ?? null);
  const [status, setStatus] = useState<Status>({ kind: 'idle' });
  const [dragId, setDragId] = useState<string | null>(null);
  const [focusId, setFocusId] = useState<string | null>(null);
  const [links, setLinks] = useState<AppLessonShareLink[] | null>(null);
  const canEdit = lesson.role !== 'viewer';
  const selected = lesson.steps.find((s) => s.id === selectedId) ?? lesson.steps[0] ?? null;

  // After a keyboard move, keep focus on the moved Step.
  useEffect(() => {
    if (focusId) document.getElementById(`step-item-${focusId}`)?.focus();
  }, [focusId, lesson]);

  useEffect(() => {
    if (!canEdit) return;
    apiFetch<{ items: AppLessonShareLink[] }>(`/api/v1/lessons/${lesson.id}/share-links`)
      .then((r) => setLinks(r.items))
      .catch(() => setLinks([]));
  }, [lesson.id, canEdit]);

  async function run(action: () => Promise<AppLesson>, okMessage?: string): Promise<boolean> {
    setStatus({ kind: 'busy' });
    try {
      const next = await action();
      setLesson(next);
      setStatus(okMessage ? { kind: 'ok', message: okMessage } : { kind: 'idle' });
      return true;
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) setStatus({ kind: 'conflict', message: e.message });
      else setStatus({ kind: 'error', message: e instanceof ApiError ? e.message : 'That did not work; nothing was changed.' });
      return false;
    }
  }

  async function reload() {
    await run(() => apiFetch<AppLesson>(`/api/v1/lessons/${lesson.id}`), 'Reloaded the latest version.');
  }

  const ids = lesson.steps.map((s) => s.id);
  const reorder = (stepIds: string[], focus?: string) => {
    if (stepIds.join() === ids.join()) return;
    if (focus) setFocusId(focus);
    void run(() => apiFetch<AppLesson>(`/api/v1/lessons/${lesson.id}/steps/reorder`, { method: 'POST', json: { revision: lesson.revision, stepIds } }));
  };
  const move = (id: string, delta: number) => reorder(moved(ids, id, ids.indexOf(id) + delta), id);

  const onItemKey = (e: KeyboardEvent, id: string) => {
    if (!canEdit || !e.altKey) return;
    if (e.key === 'ArrowUp') {
      e.preventDefault();
      move(id, -1);
    } else if (e.key === 'ArrowDown') {
      e.preventDefault();
      move(id, 1);
    }
  };

  return (
    <div className="flex flex-col gap-4">
      <LessonHeader lesson={lesson} canEdit={canEdit} onSave={(title, description) => run(() => apiFetch<AppLesson>(`/api/v1/lessons/${lesson.id}`, { method: 'PUT', json: { title, description, revision: lesson.revision } }), 'Lesson saved.')} />

      <div aria-live="polite" className="flex flex-col gap-2">
        {status.kind === 'ok' ? <Notice kind="ok">{status.message}</Notice> : null}
        {status.kind === 'error' ? <Notice kind="error">{status.message}</Notice> : null}
        {status.kind === 'conflict' ? (
          <Notice kind="warn" title="Someone else changed this Lesson first">
            <p>{status.message}</p>
            <Button variant="secondary" className="mt-2" onClick={reload}>
              Reload the Lesson
            </Button>
          </Notice>
        ) : null}
      </div>

      <div className="grid gap-5 lg:grid-cols-[minmax(260px,340px)_1fr]">
        <section aria-labelledby="steps-heading" className="flex flex-col gap-2">
          <div className="flex items-baseline justify-between">
            <h2 id="steps-heading" className="text-lg font-semibold">
              Steps <span className="num text-sm font-normal text-ink-faint">({lesson.steps.length})</span>
            </h2>
            {lesson.steps.length ? (
              <Link href={`/lessons/${lesson.id}/present?step=${(selected?.position ?? 1)}`} className={buttonClass('primary', 'px-3 py-1.5')}>
                Present
              </Link>
            ) : null}
          </div>
          {canEdit && lesson.steps.length > 1 ? <p className="text-xs text-ink-faint">Drag a Step, or focus it and press Alt+↑ / Alt+↓, to change the order.</p> : null}
          {lesson.steps.length === 0 ? (
            <p className="rounded-md border border-dashed border-line bg-white p-3 text-sm text-ink-soft">
              No Steps yet. Open a System (or <Link href="/systems/new" className="underline">a new one</Link>), set it up for the point you want to make, and use <strong>Add to lesson</strong> in its toolbar.
            </p>
          ) : null}
          <ol className="flex flex-col gap-1.5" aria-label="Steps in order" data-testid="step-list">
            {lesson.steps.map((s, i) => (
              <li
                key={s.id}
                draggable={canEdit}
                onDragStart={(e) => {
                  setDragId(s.id);
                  e.dataTransfer.effectAllowed = 'move';
                  e.dataTransfer.setData('text/plain', s.id);
                }}
                onDragOver={(e) => {
                  if (dragId) e.preventDefault();
                }}
                onDrop={(e) => {
                  e.preventDefault();
                  if (dragId) reorder(moved(ids, dragId, i));
                  setDragId(null);
                }}
                onDragEnd={() => setDragId(null)}
                className={`flex items-stretch gap-1 rounded-md border bg-white ${s.id === selected?.id ? 'border-mains ring-1 ring-mains' : 'border-line'} ${dragId === s.id ? 'opacity-50' : ''}`}
                data-testid="step-item"
              >
                <button
                  type="button"
                  id={`step-item-${s.id}`}
                  onClick={() => setSelectedId(s.id)}
                  onKeyDown={(e) => onItemKey(e, s.id)}
                  aria-current={s.id === selected?.id ? 'true' : undefined}
                  aria-keyshortcuts={canEdit ? 'Alt+ArrowUp Alt+ArrowDown' : undefined}
                  className="flex min-w-0 flex-1 items-baseline gap-2 px-3 py-2 text-left text-sm"
                >
                  {canEdit ? (
                    <span aria-hidden="true" className="cursor-grab text-ink-faint select-none">
                      ⠿
                    </span>
                  ) : null}
                  <span className="num text-ink-faint">{i + 1}.</span>
                  <span className="truncate font-medium" data-testid="step-item-title">
                    {s.title}
                  </span>
                  {s.sweep ? <span className="ml-auto shrink-0 rounded bg-[#FBF3EA] px-1.5 text-xs text-[#6B3206]">sweep</span> : null}
                </button>
                {canEdit ? (
                  <span className="flex flex-col border-l border-line">
                    <button type="button" onClick={() => move(s.id, -1)} disabled={i === 0} aria-label={`Move "${s.title}" up`} className="flex-1 px-2 text-xs hover:bg-[#EFECE4] disabled:opacity-30">
                      ▲
                    </button>
                    <button type="button" onClick={() => move(s.id, 1)} disabled={i === lesson.steps.length - 1} aria-label={`Move "${s.title}" down`} className="flex-1 px-2 text-xs hover:bg-[#EFECE4] disabled:opacity-30">
                      ▼
                    </button>
                  </span>
                ) : null}
              </li>
            ))}
          </ol>
          {canEdit ? <ShareLinks lessonId={lesson.id} links={links} setLinks={setLinks} /> : null}
          {canEdit ? (
            <Button
              variant="ghost"
              className="mt-4 self-start text-fail"
              onClick={async () => {
                if (!window.confirm(`Delete the Lesson "${lesson.title}"? Its student links stop working.`)) return;
                try {
                  await apiFetch(`/api/v1/lessons/${lesson.id}`, { method: 'DELETE' });
                  router.push('/lessons');
                } catch (e) {
                  setStatus({ kind: 'error', message: e instanceof ApiError ? e.message : 'Deleting failed; nothing was changed.' });
                }
              }}
            >
              Delete this Lesson
            </Button>
          ) : null}
        </section>

        <section aria-label="The selected Step" className="min-w-0">
          {selected ? (
            <StepForm
              key={selected.id}
              step={selected}
              canEdit={canEdit}
              busy={status.kind === 'busy'}
              onSave={(fields) => run(() => apiFetch<AppLesson>(`/api/v1/lessons/${lesson.id}/steps/${selected.id}`, { method: 'PUT', json: { revision: lesson.revision, step: fields } }), 'Step saved.')}
              onDuplicate={async () => {
                const ok = await run(
                  () =>
                    apiFetch<AppLesson>(`/api/v1/lessons/${lesson.id}/steps`, {
                      method: 'POST',
                      json: { revision: lesson.revision, position: selected.position + 1, step: { title: `${selected.title} (copy)`, points: selected.points, panel: selected.panel, traces: selected.traces, sweep: selected.sweep, document: selected.document } },
                    }),
                  'Step duplicated.',
                );
                if (!ok) return;
              }}
              onDelete={async () => {
                if (!window.confirm(`Delete the Step "${selected.title}"?`)) return;
                const index = lesson.steps.findIndex((s) => s.id === selected.id);
                const ok = await run(() => apiFetch<AppLesson>(`/api/v1/lessons/${lesson.id}/steps/${selected.id}?revision=${lesson.revision}`, { method: 'DELETE' }), 'Step deleted.');
                if (ok) setSelectedId(lesson.steps[index + 1]?.id ?? lesson.steps[index - 1]?.id ?? null);
              }}
            />
          ) : null}
        </section>
      </div>
    </div>
  );
}

function LessonHeader({ lesson, canEdit, onSave }: { lesson: AppLesson; canEdit: boolean; onSave: (title: string, description: string) => Promise<boolean> }) {
  const [title, setTitle] = useState(lesson.title);
  const [description, setDescription] = useState(lesson.description);
  const dirty = title !== lesson.title || description !== lesson.description;
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div className="flex min-w-0 flex-1 flex-col gap-1">
        <label htmlFor="lesson-title" className="text-xs font-medium text-ink-soft">
          Lesson title
        </label>
        <input id="lesson-title" value={title} readOnly={!canEdit} maxLength={200} onChange={(e) => setTitle(e.target.value)} className="w-full max-w-2xl rounded-md border border-line bg-white px-3 py-2 text-lg font-semibold" />
        <label htmlFor="lesson-description" className="sr-only">
          Description
        </label>
        <input
          id="lesson-description"
          value={description}
          readOnly={!canEdit}
          maxLength={4000}
          placeholder="What the class will learn"
          onChange={(e) => setDescription(e.target.value)}
          className="w-full max-w-2xl rounded-md border border-line bg-white px-3 py-1.5 text-sm"
        />
        <p className="text-xs text-ink-faint">
          {lesson.workspaceName} · revision <span className="num">{lesson.revision}</span> · {canEdit ? 'you can edit' : 'read only (viewer)'}
        </p>
      </div>
      {canEdit ? (
        <Button variant="secondary" disabled={!dirty || !title.trim()} onClick={() => void onSave(title, description)}>
          Save title
        </Button>
      ) : null}
    </div>
  );
}

function ShareLinks({ lessonId, links, setLinks }: { lessonId: string; links: AppLessonShareLink[] | null; setLinks: (l: AppLessonShareLink[]) => void }) {
  const [error, setError] = useState<string | null>(null);
  return (
    <section aria-labelledby="share-heading" className="mt-4 flex flex-col gap-2 rounded-md border border-line bg-white p-3">
      <h2 id="share-heading" className="text-sm font-semibold">
        Student links
      </h2>
      <p className="text-xs text-ink-faint">Anyone with a link sees the Lesson read only, without signing in. Revoke a link to close it.</p>
      {links?.length ? (
        <ul className="flex flex-col gap-2">
          {links.map((l) => (
            <li key={l.token} className="flex flex-col gap-1">
              <input readOnly value={l.url} aria-label="Student link" className="num w-full rounded border border-line px-2 py-1 text-xs" data-testid="student-link" onFocus={(e) => e.currentTarget.select()} />
              <span className="flex gap-2">
                <button type="button" className="text-xs underline" onClick={() => void navigator.clipboard?.writeText(l.url).catch(() => undefined)}>
                  Copy
                </button>
                <button
                  type="button"
                  className="text-xs text-fail underline"
                  onClick={async () => {
                    try {
                      await apiFetch(`/api/v1/lessons/${lessonId}/share-links?token=${encodeURIComponent(l.token)}`, { method: 'DELETE' });
                      setLinks(links.filter((x) => x.token !== l.token));
                    } catch (e) {
                      setError(e instanceof ApiError ? e.message : 'Revoking failed.');
                    }
                  }}
                >
                  Revoke
                </button>
              </span>
            </li>
          ))}
        </ul>
      ) : null}
      <Button
        variant="secondary"
        className="self-start"
        onClick={async () => {
          try {
            const link = await apiFetch<AppLessonShareLink>(`/api/v1/lessons/${lessonId}/share-links`, { method: 'POST' });
            setLinks([link, ...(links ?? [])]);
            setError(null);
          } catch (e) {
            setError(e instanceof ApiError ? e.message : 'Creating the link failed.');
          }
        }}
      >
        Create a student link
      </Button>
      {error ? <p role="alert" className="text-sm text-fail">{error}</p> : null}
    </section>
  );
}

interface StepFormProps {
  step: AppLessonStep;
  canEdit: boolean;
  busy: boolean;
  onSave: (fields: { title: string; points: string; panel: LessonPanel; traces: LessonTrace[]; sweep: unknown }) => Promise<boolean>;
  onDuplicate: () => void;
  onDelete: () => void;
}

function StepForm({ step, canEdit, busy, onSave, onDuplicate, onDelete }: StepFormProps) {
  const [title, setTitle] = useState(step.title);
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
      <div className="grid gap-4 xl:grid-cols-[minmax(320px,420px)_1fr]">
        <form
          className="flex flex-col gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            if (sweepError || !title.trim()) return;
            void onSave({ title, points, panel, traces, sweep: sweepDraft ? draftToSweep(sweepDraft) : null });
          }}
        >
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">Step title</span>
            <input value={title} readOnly={!canEdit} maxLength={200} onChange={(e) => setTitle(e.target.value)} className="rounded-md border border-line bg-white px-3 py-2" data-testid="step-title" />
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
