'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useEffect, useState } from 'react';
import { Button, buttonClass } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import type { AppLesson, AppLessonShareLink } from '@/lib/data/lessons';
import { LessonHeader } from './lesson-header';
import { StepForm } from './step-form';
import { StepList } from './step-list';
import { StudentLinks } from './student-links';

type Status = { kind: 'idle' } | { kind: 'busy' } | { kind: 'ok'; message: string } | { kind: 'error'; message: string } | { kind: 'conflict'; message: string };

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

  const reorder = (stepIds: string[], focus?: string) => {
    if (focus) setFocusId(focus);
    void run(() => apiFetch<AppLesson>(`/api/v1/lessons/${lesson.id}/steps/reorder`, { method: 'POST', json: { revision: lesson.revision, stepIds } }));
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

      {/* One column on a phone: minmax(0, 1fr), so a long Step title is truncated instead of widening the page past the screen. */}
      <div className="grid grid-cols-1 gap-5 lg:grid-cols-[minmax(260px,340px)_minmax(0,1fr)]">
        <section aria-labelledby="steps-heading" className="flex min-w-0 flex-col gap-2">
          <div className="flex items-baseline justify-between gap-2">
            <h2 id="steps-heading" className="text-lg font-semibold">
              Steps <span className="num text-sm font-normal text-ink-faint">({lesson.steps.length})</span>
            </h2>
            {lesson.steps.length ? (
              <Link href={`/lessons/${lesson.id}/present?step=${(selected?.position ?? 1)}`} className={buttonClass('primary', 'shrink-0 px-3 py-1.5')}>
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
          <StepList steps={lesson.steps} selectedId={selected?.id ?? null} canEdit={canEdit} onSelect={setSelectedId} onReorder={reorder} />
          {canEdit ? <StudentLinks lessonId={lesson.id} links={links} setLinks={setLinks} /> : null}
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
