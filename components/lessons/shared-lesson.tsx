'use client';

import Link from 'next/link';
import { useState } from 'react';
import { Wordmark } from '@/components/ui/mark';
import { encodeDocument } from '@/lib/client/url-state';
import { describeSweep } from '@/lib/system-model/lesson-sweep';
import type { SharedLesson as SharedLessonData } from '@/lib/data/lessons';
import type { SystemDocument } from '@/lib/validations/system';
import { StepPlot } from './step-plot';
import { SweepButtons } from './sweep-buttons';
import { TalkingPoints } from './talking-points';
import { useSweepPlayer } from './use-sweep-player';

/** `/systems/new?s=…&panel=…`: the snapshot as a new, unsaved System in the editor (a time Step opens on Timing, where its plots are). */
export function stepEditorHref(doc: SystemDocument, panel: string, name?: string): string {
  const params = new URLSearchParams({ s: encodeDocument(doc), panel: panel === 'time' ? 'timing' : panel });
  if (name) params.set('name', name.slice(0, 200));
  return `/systems/new?${params.toString()}`;
}

/**
 * The read-only student view of a shared Lesson: one Step at a time, its plot (a sweep plays on
 * request), the talking points, and "Open this step in the editor" to play with a copy.
 */
export function SharedLesson({ lesson }: { lesson: SharedLessonData }) {
  const [index, setIndex] = useState(0);
  const step = lesson.steps[index];
  const player = useSweepPlayer(step?.sweep ?? null, `${index}`);
  const count = lesson.steps.length;

  return (
    <div className="min-h-screen bg-paper">
      <header className="border-b border-line bg-white">
        <div className="mx-auto flex max-w-5xl items-center gap-3 px-4 py-2.5">
          <Link href="/" aria-label="Seamline home">
            <Wordmark size={24} />
          </Link>
          <span className="ml-auto text-xs text-ink-faint">Shared Lesson · read only</span>
        </div>
      </header>
      <main id="main" className="mx-auto flex max-w-5xl flex-col gap-4 px-4 py-5">
        <div>
          <h1 className="text-2xl font-semibold tracking-tight">{lesson.title}</h1>
          {lesson.description ? <p className="mt-1 text-ink-soft">{lesson.description}</p> : null}
        </div>
        {!step ? (
          <p className="text-ink-soft">This Lesson has no Steps yet.</p>
        ) : (
          <>
            <nav aria-label="Steps" className="flex flex-wrap items-center gap-2">
              <button type="button" onClick={() => setIndex((i) => Math.max(0, i - 1))} disabled={index === 0} className="rounded-md border border-line bg-white px-3 py-1.5 text-sm disabled:opacity-40">
                ← Previous
              </button>
              <label className="flex items-center gap-2 text-sm">
                <span className="sr-only">Step</span>
                <select value={index} onChange={(e) => setIndex(Number(e.target.value))} className="max-w-[14rem] rounded-md border border-line bg-white px-2 py-1.5 text-sm">
                  {lesson.steps.map((s, i) => (
                    <option key={i} value={i}>
                      {i + 1}. {s.title}
                    </option>
                  ))}
                </select>
              </label>
              <span className="num text-sm text-ink-soft" data-testid="student-step-counter">
                Step {index + 1} of {count}
              </span>
              <button type="button" onClick={() => setIndex((i) => Math.min(count - 1, i + 1))} disabled={index === count - 1} className="rounded-md border border-line bg-white px-3 py-1.5 text-sm disabled:opacity-40">
                Next →
              </button>
            </nav>
            <article className="flex flex-col gap-4 rounded-lg border border-line bg-white p-4" aria-labelledby="step-title">
              <h2 id="step-title" className="text-xl font-semibold">
                {index + 1}. {step.title}
              </h2>
              <StepPlot step={step} progress={player.progress} compact />
              {step.sweep ? (
                <div className="flex flex-wrap items-center gap-2 text-sm">
                  <SweepButtons player={player} />
                  <span className="text-ink-soft">{describeSweep(step.sweep)}</span>
                </div>
              ) : null}
              <TalkingPoints text={step.points} className="text-base leading-relaxed" />
              <div>
                <Link href={stepEditorHref(step.document, step.panel, `${lesson.title} – step ${index + 1}`)} className="inline-flex rounded-md bg-mains px-3.5 py-2 text-sm font-medium text-white hover:bg-mains-dark">
                  Open this step in the editor
                </Link>
                <p className="mt-1 text-xs text-ink-faint">Opens a copy as a new, unsaved System; the Lesson stays as it is.</p>
              </div>
            </article>
          </>
        )}
      </main>
    </div>
  );
}
