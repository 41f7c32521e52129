'use client';

import Link from 'next/link';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { describeSweep } from '@/lib/system-model/lesson-sweep';
import type { AppLessonStep } from '@/lib/data/lessons';
import { StepPlot } from './step-plot';
import { SweepButtons } from './sweep-buttons';
import { TalkingPoints } from './talking-points';
import { useSweepPlayer } from './use-sweep-player';

interface Props {
  lessonId: string;
  title: string;
  steps: AppLessonStep[];
  /** 1-based, from `?step=`. */
  initialStep: number;
}

const clampStep = (n: number, count: number) => Math.min(Math.max(1, Number.isFinite(n) ? Math.round(n) : 1), Math.max(1, count));

/**
 * The Presenter view: one Step at a time for a projector. ← / → (and Page Up / Page Down, as
 * presentation clickers send) change Step, space plays or pauses the sweep, R restarts it, P hides
 * the talking points, F goes full screen. The URL keeps `?step=N` so a trainer can jump.
 */
export function PresenterView({ lessonId, title, steps, initialStep }: Props) {
  const [index, setIndex] = useState(() => clampStep(initialStep, steps.length) - 1);
  const [showPoints, setShowPoints] = useState(true);
  const [fullscreen, setFullscreen] = useState(false);
  const rootRef = useRef<HTMLDivElement>(null);
  const step = steps[index];
  const player = useSweepPlayer(step?.sweep ?? null, step?.id ?? 'none');

  useEffect(() => {
    const url = new URL(window.location.href);
    url.searchParams.set('step', String(index + 1));
    window.history.replaceState(window.history.state, '', url.toString());
  }, [index]);

  useEffect(() => {
    const onChange = () => setFullscreen(Boolean(document.fullscreenElement));
    document.addEventListener('fullscreenchange', onChange);
    return () => document.removeEventListener('fullscreenchange', onChange);
  }, []);

  const go = useCallback((delta: number) => setIndex((i) => Math.min(Math.max(0, i + delta), steps.length - 1)), [steps.length]);

  const toggleFullscreen = useCallback(() => {
    if (document.fullscreenElement) void document.exitFullscreen().catch(() => undefined);
    else void rootRef.current?.requestFullscreen?.().catch(() => undefined);
  }, []);

  const { toggle, restart } = player;
  // The talking points do not change while a sweep plays: render them once per Step, not per frame.
  const points = useMemo(() => (step ? <TalkingPoints text={step.points} className="text-2xl leading-snug" /> : null), [step]);
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.altKey || e.ctrlKey || e.metaKey) return;
      const target = e.target as HTMLElement | null;
      if (target && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName))) return;
      const key = e.key;
      if (key === 'ArrowRight' || key === 'PageDown') go(1);
      else if (key === 'ArrowLeft' || key === 'PageUp') go(-1);
      else if (key === 'Home') setIndex(0);
      else if (key === 'End') setIndex(steps.length - 1);
      else if (key === ' ' || key === 'Spacebar') {
        // Space on a focused button would also click it; the view owns space.
        toggle();
      } else if (key === 'r' || key === 'R') restart();
      else if (key === 'p' || key === 'P') setShowPoints((s) => !s);
      else if (key === 'f' || key === 'F') toggleFullscreen();
      else return;
      e.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [go, steps.length, toggle, restart, toggleFullscreen]);

  if (!step) {
    return (
      <div className="fixed inset-0 z-50 flex flex-col items-center justify-center gap-4 bg-paper p-8 text-2xl">
        <p>This Lesson has no Steps yet.</p>
        <Link href={`/lessons/${lessonId}`} className="underline">
          Back to the Lesson editor
        </Link>
      </div>
    );
  }

  return (
    <div ref={rootRef} className="fixed inset-0 z-50 flex flex-col overflow-hidden bg-paper text-ink" data-testid="presenter-view">
      <div className="flex min-h-0 flex-1">
        <section aria-label="Step" className="flex min-w-0 flex-1 flex-col gap-4 overflow-y-auto px-10 pt-8 pb-4">
          <h1 className="text-5xl leading-tight font-semibold tracking-tight" data-testid="presenter-step-title">
            {step.title}
          </h1>
          <StepPlot step={step} progress={player.progress} emphasis="projector" />
          {step.sweep ? (
            <p className="text-xl text-ink-soft">
              Sweep: {describeSweep(step.sweep)} · <kbd className="num">space</kbd> {player.playing ? 'pauses' : 'plays'} · <kbd className="num">R</kbd> restarts
            </p>
          ) : null}
        </section>
        {showPoints ? (
          <aside aria-label="Talking points (presenter only)" className="w-[30%] max-w-[620px] min-w-[320px] shrink-0 overflow-y-auto border-l border-line bg-white px-8 py-8" data-testid="presenter-points">
            <h2 className="mb-4 text-lg font-semibold tracking-wide text-ink-soft uppercase">Talking points</h2>
            {points}
            {steps[index + 1] ? <p className="mt-8 border-t border-line pt-4 text-lg text-ink-soft">Next: {steps[index + 1]?.title}</p> : null}
          </aside>
        ) : null}
      </div>
      <footer className="flex flex-wrap items-center gap-3 border-t border-line bg-white px-6 py-2 text-base">
        <Link href={`/lessons/${lessonId}`} className="rounded-md px-2 py-1 text-ink-soft hover:bg-wash">
          ← {title}
        </Link>
        <span className="ml-auto" />
        <button type="button" onClick={() => go(-1)} disabled={index === 0} className="rounded-md border border-line px-3 py-1.5 disabled:opacity-40" aria-label="Previous Step">
          ←
        </button>
        <span className="num text-ink-soft" data-testid="step-counter" aria-live="polite">
          {index + 1} / {steps.length}
        </span>
        <button type="button" onClick={() => go(1)} disabled={index === steps.length - 1} className="rounded-md border border-line px-3 py-1.5 disabled:opacity-40" aria-label="Next Step">
          →
        </button>
        {step.sweep ? (
          <SweepButtons player={player} />
        ) : null}
        <button type="button" onClick={() => setShowPoints((s) => !s)} aria-pressed={showPoints} className="rounded-md border border-line px-3 py-1.5">
          {showPoints ? 'Hide points' : 'Show points'} (P)
        </button>
        <button type="button" onClick={toggleFullscreen} className="rounded-md bg-ink px-3 py-1.5 text-white">
          {fullscreen ? 'Leave full screen' : 'Full screen'} (F)
        </button>
      </footer>
    </div>
  );
}
