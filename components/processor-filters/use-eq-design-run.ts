'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import { ApiError, apiFetch } from '@/lib/client/api';
import { computeEqDesign, type EqDesignAnswer } from '@/lib/system-model/eq-design';
import type { EqDesignMeasuredRequest, EqDesignModelRequest } from '@/lib/validations/compute-eq-design';

/** What a finished run knows besides the answer: what it ran on (`key`), whether it included the present EQ, the files used. */
export interface EqDesignDone {
  state: 'done';
  answer: EqDesignAnswer;
  key: string;
  withPresentEq: boolean;
  used: { seat: string; sub?: string; name: string }[] | null;
  elapsedMs: number;
}

export type EqDesignRun = { state: 'idle' } | { state: 'running' } | EqDesignDone | { state: 'failed'; message: string };

/** What a request depends on: a run whose key differs from the System's present one no longer describes it. */
export const eqDesignKey = (request: EqDesignModelRequest | EqDesignMeasuredRequest) => JSON.stringify(request);

/**
 * One EQ design at a time: on the model in the browser (computeEqDesign, a few tens of ms, after the "Designing…" state
 * has painted), or on stored measurements through POST /api/v1/eq-design (the server reads the files). A newer run
 * supersedes an older one; leaving the panel aborts a request still going.
 */
export function useEqDesignRun() {
  const [run, setRun] = useState<EqDesignRun>({ state: 'idle' });
  const ticket = useRef(0);
  const abort = useRef<AbortController | null>(null);
  useEffect(() => () => abort.current?.abort(), []);

  const begin = useCallback(() => {
    abort.current?.abort();
    abort.current = null;
    setRun({ state: 'running' });
    return ++ticket.current;
  }, []);

  const runModel = useCallback((request: EqDesignModelRequest, withPresentEq: boolean) => {
    const id = begin();
    setTimeout(() => {
      if (ticket.current !== id) return;
      const startedMs = performance.now();
      try {
        const answer = computeEqDesign(request);
        setRun({ state: 'done', answer, key: eqDesignKey(request), withPresentEq, used: null, elapsedMs: performance.now() - startedMs });
      } catch (e) {
        setRun({ state: 'failed', message: e instanceof Error ? e.message : 'The design failed.' });
      }
    }, 0);
  }, [begin]);

  const runMeasured = useCallback((request: EqDesignMeasuredRequest, used: { seat: string; sub?: string; name: string }[]) => {
    const id = begin();
    const controller = new AbortController();
    abort.current = controller;
    const startedMs = performance.now();
    apiFetch<EqDesignAnswer>('/api/v1/eq-design', { method: 'POST', json: request, signal: controller.signal }).then(
      (answer) => {
        if (ticket.current !== id) return;
        abort.current = null;
        setRun({ state: 'done', answer, key: eqDesignKey(request), withPresentEq: false, used, elapsedMs: performance.now() - startedMs });
      },
      (e: unknown) => {
        if (ticket.current !== id) return;
        abort.current = null;
        setRun({ state: 'failed', message: e instanceof ApiError || e instanceof Error ? e.message : 'The request failed.' });
      },
    );
  }, [begin]);

  return { run, runModel, runMeasured };
}
