'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import type { SeatBalanceAnswer } from '@/lib/system-model/seat-balance';
import type { SeatBalanceRunMessage, SeatBalanceWorkerMessage } from './seat-balance-messages';

export type SeatBalanceRun =
  | { state: 'idle' }
  | { state: 'running'; fraction: number; startedMs: number }
  | { state: 'done'; answer: SeatBalanceAnswer; elapsedMs: number; input: SeatBalanceRunMessage }
  | { state: 'failed'; message: string }
  | { state: 'cancelled' };

/**
 * Runs the Seat balance search in a Web Worker so the page stays responsive: `start` posts a run (a run already going
 * is terminated and replaced), `cancel` terminates the worker. One worker per run; it is ended with the run.
 */
export function useSeatBalanceRun() {
  const [run, setRun] = useState<SeatBalanceRun>({ state: 'idle' });
  const worker = useRef<Worker | null>(null);
  const runId = useRef(0);

  const stop = useCallback(() => {
    worker.current?.terminate();
    worker.current = null;
  }, []);

  useEffect(() => stop, [stop]);

  const start = useCallback(
    (input: Omit<SeatBalanceRunMessage, 'runId'>) => {
      stop();
      const id = ++runId.current;
      const startedMs = performance.now();
      const w = new Worker(new URL('./seat-balance.worker.ts', import.meta.url), { type: 'module' });
      worker.current = w;
      setRun({ state: 'running', fraction: 0, startedMs });
      w.onmessage = (e: MessageEvent<SeatBalanceWorkerMessage>) => {
        const m = e.data;
        if (m.runId !== id || worker.current !== w) return;
        if (m.kind === 'progress') setRun({ state: 'running', fraction: m.fraction, startedMs });
        else {
          stop();
          setRun(m.kind === 'answer' ? { state: 'done', answer: m.answer, elapsedMs: performance.now() - startedMs, input: { ...input, runId: id } } : { state: 'failed', message: m.message });
        }
      };
      w.onerror = (e) => {
        if (worker.current !== w) return;
        stop();
        setRun({ state: 'failed', message: e.message || 'The search could not be started in this browser.' });
      };
      const message: SeatBalanceRunMessage = { ...input, runId: id };
      w.postMessage(message);
    },
    [stop],
  );

  const cancel = useCallback(() => {
    stop();
    runId.current += 1;
    setRun({ state: 'cancelled' });
  }, [stop]);

  return { run, start, cancel };
}
