'use client';

import Link from 'next/link';
import { useRef, useState } from 'react';
import { useRequiredText } from '@/components/ui/required-text';
import { Button } from '@/components/ui/button';
import { ApiError, apiFetch } from '@/lib/client/api';
import type { AppLesson, AppLessonSummary } from '@/lib/data/lessons';
import { DEFAULT_TRACES, isLessonPanel } from '@/lib/validations/lesson';
import type { SystemDocument } from '@/lib/validations/system';

const NEW = '__new__';

/**
 * "Add to lesson" in the System editor's toolbar (signed-in users): pick one of your Lessons or
 * start a new one, and the current document is added as a new Step (a copy: later edits of this
 * System do not change the Step).
 */
export function AddToLessonButton({ doc, name, panel }: { doc: SystemDocument; name: string; panel: string }) {
  const dialogRef = useRef<HTMLDialogElement>(null);
  const [lessons, setLessons] = useState<AppLessonSummary[] | null>(null);
  const [choice, setChoice] = useState<string>(NEW);
  const [newTitle, setNewTitle] = useState('');
  const [stepTitle, setStepTitle] = useState('');
  const [error, setError] = useState<string | null>(null);
  const stepTitleCheck = useRequiredText({ label: 'Step title', value: stepTitle, max: 200 });
  const newTitleCheck = useRequiredText({ label: 'New Lesson title', value: newTitle, max: 200 });
  const [busy, setBusy] = useState(false);
  const [added, setAdded] = useState<{ lessonId: string; lessonTitle: string; position: number } | null>(null);

  async function open() {
    setError(null);
    setAdded(null);
    setStepTitle(name);
    setLessons(null);
    dialogRef.current?.showModal();
    try {
      const { items } = await apiFetch<{ items: AppLessonSummary[] }>('/api/v1/lessons');
      const writable = items.filter((l) => l.role !== 'viewer');
      setLessons(writable);
      setChoice((c) => (c !== NEW && writable.some((l) => l.id === c) ? c : (writable[0]?.id ?? NEW)));
    } catch (e) {
      setLessons([]);
      setError(e instanceof ApiError ? e.message : 'Your Lessons could not be loaded.');
    }
  }

  async function add() {
    setBusy(true);
    setError(null);
    try {
      let lessonId = choice;
      if (choice === NEW) {
        const created = await apiFetch<AppLesson>('/api/v1/lessons', { method: 'POST', json: { title: newTitle } });
        lessonId = created.id;
      }
      const lesson = await apiFetch<AppLesson>(`/api/v1/lessons/${lessonId}/steps`, {
        method: 'POST',
        json: { step: { title: stepTitle, points: '', panel: isLessonPanel(panel) ? panel : 'blend', traces: DEFAULT_TRACES, sweep: null, document: doc } },
      });
      setAdded({ lessonId: lesson.id, lessonTitle: lesson.title, position: lesson.steps.length });
      setLessons((ls) => (ls && !ls.some((l) => l.id === lesson.id) ? [lesson, ...ls] : ls));
      setChoice(lesson.id);
      setNewTitle('');
    } catch (e) {
      setError(e instanceof ApiError ? (e.issues[0] ? `${e.issues[0].path}: ${e.issues[0].message}` : e.message) : 'Adding the Step failed; nothing was changed.');
    } finally {
      setBusy(false);
    }
  }

  const canAdd = !busy && lessons !== null && stepTitle.trim() && (choice !== NEW || newTitle.trim());

  return (
    <>
      <Button variant="secondary" onClick={open} data-testid="add-to-lesson">
        Add to lesson
      </Button>
      <dialog ref={dialogRef} aria-labelledby="add-to-lesson-title" className="m-auto w-[min(32rem,calc(100vw-2rem))] rounded-lg border border-line bg-white p-0 text-ink shadow-xl backdrop:bg-black/30">
        <form
          method="dialog"
          className="flex flex-col gap-3 p-5"
          onSubmit={(e) => {
            e.preventDefault();
            if (canAdd) void add();
          }}
        >
          <h2 id="add-to-lesson-title" className="text-lg font-semibold">
            Add this System to a Lesson
          </h2>
          <p className="text-sm text-ink-soft">The Step keeps a copy of the System as it is now; later edits here do not change it.</p>
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">Step title</span>
            <input value={stepTitle} maxLength={200} onChange={(e) => setStepTitle(e.target.value)} {...stepTitleCheck.inputProps} className={`rounded-md border px-3 py-2 ${stepTitleCheck.error ? 'border-fail' : 'border-line'}`} />
            {stepTitleCheck.message}
          </label>
          <fieldset className="flex flex-col gap-1.5 text-sm">
            <legend className="mb-1 font-medium">Lesson</legend>
            {lessons === null ? <p className="text-ink-faint">Loading your Lessons…</p> : null}
            <div className="flex max-h-56 flex-col gap-1.5 overflow-y-auto">
              {(lessons ?? []).map((l) => (
                <label key={l.id} className="flex items-center gap-2">
                  <input type="radio" name="lesson" value={l.id} checked={choice === l.id} onChange={() => setChoice(l.id)} />
                  <span>
                    {l.title} <span className="text-xs text-ink-faint">({l.workspaceName}, {l.stepCount} {l.stepCount === 1 ? 'Step' : 'Steps'})</span>
                  </span>
                </label>
              ))}
            </div>
            {lessons !== null ? (
              <label className="flex items-center gap-2">
                <input type="radio" name="lesson" value={NEW} checked={choice === NEW} onChange={() => setChoice(NEW)} />
                <span>A new Lesson</span>
              </label>
            ) : null}
            {lessons !== null && choice === NEW ? (
              <label className="ml-6 flex flex-col gap-1">
                <span className="text-xs text-ink-soft">New Lesson title</span>
                <input value={newTitle} maxLength={200} onChange={(e) => setNewTitle(e.target.value)} {...newTitleCheck.inputProps} className={`rounded-md border px-3 py-1.5 ${newTitleCheck.error ? 'border-fail' : 'border-line'}`} />
                {newTitleCheck.message}
              </label>
            ) : null}
          </fieldset>
          <div aria-live="polite">
            {error ? (
              <p role="alert" className="text-sm text-fail">
                {error}
              </p>
            ) : null}
            {added ? (
              <p className="text-sm text-tint-ink-ok" data-testid="added-to-lesson">
                Added as Step {added.position} of “{added.lessonTitle}”.{' '}
                <Link href={`/lessons/${added.lessonId}`} className="underline">
                  Open the Lesson
                </Link>
              </p>
            ) : null}
          </div>
          <div className="flex justify-end gap-2">
            <Button variant="ghost" onClick={() => dialogRef.current?.close()}>
              Close
            </Button>
            <Button type="submit" disabled={!canAdd}>
              {busy ? 'Adding…' : 'Add Step'}
            </Button>
          </div>
        </form>
      </dialog>
    </>
  );
}
