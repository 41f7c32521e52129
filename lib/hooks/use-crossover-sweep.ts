'use client';

import { useCallback, useRef, useState } from 'react';
import { ApiError, apiFetch } from '@/lib/client/api';
import type { CrossoverSweepAnswer, CrossoverSweepAnswerRow } from '@/lib/system-model/crossover-sweep';
import { rankSweepRows } from '@/dsp';
import type { CrossoverSweepRequest } from '@/lib/validations/compute-blend';

/** Candidates sent per request, so the table fills in and the progress bar moves while a sweep runs. */
const CHUNK = 6;

export interface SweepState {
  rows: CrossoverSweepAnswerRow[];
  /** Requests answered / requests needed (0/0 before the first run). */
  done: number;
  total: number;
  running: boolean;
  error: ApiError | null;
  /** The mains' own −3 dB point and the lowest crossover clear of it (+ half an octave), Hz. */
  mainsMinus3DbHz: number | null;
  lowestClearHz: number | null;
  /** What the rows were ranked on when measured (null: the model). */
  measured: CrossoverSweepAnswer['measured'];
}

/**
 * Runs a Crossover sweep as a series of POST /api/v1/crossover-sweep calls (one per pairing and
 * chunk of candidates), merging the rows as they arrive and ranking them with dsp's one rule
 * (rankSweepRows). A new run cancels the previous one.
 */
export function useCrossoverSweep() {
  const [state, setState] = useState<SweepState>({ rows: [], done: 0, total: 0, running: false, error: null, mainsMinus3DbHz: null, lowestClearHz: null, measured: null });
  const runId = useRef(0);

  const run = useCallback(async (request: CrossoverSweepRequest & { candidatesHz: number[] }) => {
    const id = ++runId.current;
    const jobs: CrossoverSweepRequest[] = [];
    for (const pairing of request.pairings) {
      for (let i = 0; i < request.candidatesHz.length; i += CHUNK) jobs.push({ ...request, pairings: [pairing], candidatesHz: request.candidatesHz.slice(i, i + CHUNK) });
    }
    setState({ rows: [], done: 0, total: jobs.length, running: true, error: null, mainsMinus3DbHz: null, lowestClearHz: null, measured: null });
    let rows: CrossoverSweepAnswerRow[] = [];
    for (let k = 0; k < jobs.length; k++) {
      try {
        const answer = await apiFetch<CrossoverSweepAnswer>('/api/v1/crossover-sweep', { method: 'POST', json: jobs[k] });
        if (id !== runId.current) return;
        // Every partial answer carries the present row; the one ranking rule merges them.
        rows = rankSweepRows([...rows, ...answer.rows], request.crossoverHz);
        setState({ rows, done: k + 1, total: jobs.length, running: k + 1 < jobs.length, error: null, mainsMinus3DbHz: answer.mainsMinus3DbHz, lowestClearHz: answer.lowestClearHz, measured: answer.measured });
      } catch (e) {
        if (id !== runId.current) return;
        const error = e instanceof ApiError ? e : new ApiError(0, 'error', 'The sweep failed.');
        setState((s) => ({ ...s, running: false, error }));
        return;
      }
    }
  }, []);

  return { ...state, run };
}
