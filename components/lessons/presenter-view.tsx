'use client';

import Link from 'next/link';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { describeSweep } from '@/lib/system-model/lesson-sweep';
import type { AppLessonStep } from '@/lib/data/lessons';
import { StepPlot } from './step-plot';
import { SweepButtons } from './sweep-buttons';
import { TalkingPoints } from './talking-points';
import { usePlotsFit, useWideScreen } from './use-plots-fit';
import { useSweepPlayer } from './use-sweep-player';

interface Props {
  lessonId: string;
  title: string;
  steps: AppLessonStep[];
  /** 1-based, from `?step=`. */
  initialStep: number;
}

/** Previous / Next: large on a phone (a thumb's width, half the footer each), compact on a projector. */
const NAV_BUTTON = 'h-12 flex-1 rounded-md border border-line px-3 text-lg disabled:opacity-40 lg:h-auto lg:flex-none lg:py-1.5 lg:text-base';

const clampStep = (n: number, count: number) => Math.min(Math.max(1, Number.isFinite(n) ? Math.round(n) : 1), Math.max(1, count));

/**
 * The Presenter view: one Step at a time for a projector (the plots fitted to the screen), and on a phone a student's
 * follow-along (one column, large Previous / Next). ← / → (and Page Up / Page Down, as
 * presentation clickers send) change Step, space plays or pauses the sweep, R restarts it, P hides
 * the talking points, F goes full screen. The URL keeps `?step=N` so a trainer can jump.
 */
export function PresenterView({ lessonId, title, steps, initialStep }: Props) {
  const [index, setIndex] = useState(() => clampStep(initialStep, steps.length) - 1);
  const [showPoints, setShowPoints] = useState(true);
  const [fullscreen, setFullscreen] = useState(false);
  const rootRef = useRef<HTMLDivElement>(null);
  const wide = useWideScreen();
  const { stageRef, plotsHeightPx } = usePlotsFit();
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
  const points = useMemo(() => (step ? <TalkingPoints text={step.points} className="text-lg leading-snug lg:text-2xl" /> : null), [step]);
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

  // Projector: the Step and its plots fitted to the screen, the talking points beside them. Phone (below 1024 px): a
  // student's follow-along, one scrolling column (title, plot at full width, talking points) over large
  // Previous / Next buttons.
  return (
    <div ref={rootRef} className="fixed inset-0 z-50 flex flex-col overflow-hidden bg-paper text-ink" data-testid="presenter-view">
      <div className="flex min-h-0 flex-1 flex-col overflow-y-auto lg:flex-row lg:overflow-hidden">
        <section aria-label="Step" className="flex min-w-0 flex-col gap-3 px-4 pt-4 pb-4 lg:flex-1 lg:gap-4 lg:overflow-hidden lg:px-10 lg:pt-8">
          <h1 className="text-2xl leading-tight font-semibold tracking-tight break-words lg:text-5xl" data-testid="presenter-step-title">
            {step.title}
          </h1>
          <div ref={wide ? stageRef : undefined} className="lg:min-h-0 lg:flex-1 lg:overflow-y-auto" data-testid="presenter-stage">
            <div>
              <StepPlot step={step} progress={player.progress} emphasis={wide ? 'projector' : 'default'} plotsHeightPx={wide ? plotsHeightPx : undefined} />
            </div>
          </div>
          {step.sweep ? (
            <p className="text-base text-ink-soft lg:text-xl">
              Sweep: {describeSweep(step.sweep)}
              <span className="hidden lg:inline">
                {' '}
                · <kbd className="num">space</kbd> {player.playing ? 'pauses' : 'plays'} · <kbd className="num">R</kbd> restarts
              </span>
            </p>
          ) : null}
        </section>
        {showPoints || !wide ? (
          <aside aria-label={wide ? 'Talking points (presenter only)' : 'Talking points'} className="border-t border-line bg-white px-4 py-5 lg:w-[30%] lg:max-w-[620px] lg:min-w-[320px] lg:shrink-0 lg:overflow-y-auto lg:border-t-0 lg:border-l lg:px-8 lg:py-8" data-testid="presenter-points">
            <h2 className="mb-3 text-sm font-semibold tracking-wide text-ink-soft uppercase lg:mb-4 lg:text-lg">Talking points</h2>
            {points}
            {steps[index + 1] ? <p className="mt-6 border-t border-line pt-4 text-base text-ink-soft lg:mt-8 lg:text-lg">Next: {steps[index + 1]?.title}</p> : null}
          </aside>
        ) : null}
      </div>
      <footer className="flex flex-wrap items-center gap-2 border-t border-line bg-white px-3 py-2 text-base lg:gap-3 lg:px-6">
        <Link href={`/lessons/${lessonId}`} className="order-1 w-full truncate rounded-md px-2 py-1 text-sm text-ink-soft hover:bg-wash lg:order-none lg:w-auto lg:text-base">
          ← {title}
        </Link>
        <span className="hidden lg:ml-auto lg:block" />
        <button type="button" onClick={() => go(-1)} disabled={index === 0} className={`${NAV_BUTTON} order-2 lg:order-none`} aria-label="Previous Step">
          ←<span className="lg:hidden"> Previous</span>
        </button>
        <span className="num order-2 px-1 text-ink-soft lg:order-none" data-testid="step-counter" aria-live="polite">
          {index + 1} / {steps.length}
        </span>
        <button type="button" onClick={() => go(1)} disabled={index === steps.length - 1} className={`${NAV_BUTTON} order-2 lg:order-none`} aria-label="Next Step">
          <span className="lg:hidden">Next </span>→
        </button>
        {step.sweep ? (
          <span className="order-3 flex gap-2 lg:order-none lg:gap-3">
            <SweepButtons player={player} />
          </span>
        ) : null}
        <button type="button" onClick={() => setShowPoints((s) => !s)} aria-pressed={showPoints} className="hidden rounded-md border border-line px-3 py-1.5 lg:block">
          {showPoints ? 'Hide points' : 'Show points'} (P)
        </button>
        <button type="button" onClick={toggleFullscreen} className="hidden rounded-md bg-ink px-3 py-1.5 text-white lg:block">
          {fullscreen ? 'Leave full screen' : 'Full screen'} (F)
        </button>
      </footer>
    </div>
  );
}
