'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import type { Sweep } from '@/lib/validations/lesson';

export interface SweepPlayer {
  /** 0 at the start of the sweep, 1 at its end. */
  progress: number;
  playing: boolean;
  toggle: () => void;
  restart: () => void;
  pause: () => void;
  /** Jumps to a point of the sweep (0–1), e.g. from a scrubber. */
  seek: (progress: number) => void;
}

/**
 * Plays a sweep with requestAnimationFrame: progress advances with the wall clock over
 * `sweep.durationS`, so the animation keeps time whatever the frame rate; it stops at the end
 * (toggling at the end starts again). `resetKey` changes (another Step) rewind to the start.
 */
export function useSweepPlayer(sweep: Sweep | null, resetKey: string): SweepPlayer {
  const [progress, setProgress] = useState(0);
  const [playing, setPlaying] = useState(false);
  const [key, setKey] = useState(resetKey);
  const progressRef = useRef(0);
  const durationMs = (sweep?.durationS ?? 6) * 1000;

  // A different Step: back to the start, stopped (state adjusted during render, not in an effect).
  if (key !== resetKey) {
    setKey(resetKey);
    setProgress(0);
    setPlaying(false);
  }

  useEffect(() => {
    progressRef.current = progress;
  }, [progress]);

  useEffect(() => {
    if (!playing || !sweep) return;
    let raf = 0;
    const start = performance.now() - progressRef.current * durationMs;
    const tick = (now: number) => {
      const p = Math.min(1, Math.max(0, (now - start) / durationMs));
      progressRef.current = p;
      setProgress(p);
      if (p >= 1) {
        setPlaying(false);
        return;
      }
      raf = requestAnimationFrame(tick);
    };
    raf = requestAnimationFrame(tick);
    return () => cancelAnimationFrame(raf);
  }, [playing, sweep, durationMs]);

  const toggle = useCallback(() => {
    if (!sweep) return;
    setPlaying((p) => {
      if (!p && progressRef.current >= 1) {
        progressRef.current = 0;
        setProgress(0);
      }
      return !p;
    });
  }, [sweep]);

  const restart = useCallback(() => {
    if (!sweep) return;
    progressRef.current = 0;
    setProgress(0);
    setPlaying(true);
  }, [sweep]);

  const pause = useCallback(() => setPlaying(false), []);
  const seek = useCallback((p: number) => {
    const v = Math.min(1, Math.max(0, p));
    progressRef.current = v;
    setProgress(v);
  }, []);

  return { progress, playing, toggle, restart, pause, seek };
}
