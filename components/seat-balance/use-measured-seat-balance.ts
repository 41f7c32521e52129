'use client';

import { usePathname } from 'next/navigation';
import { useSession } from 'next-auth/react';
import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { ApiError, apiFetch } from '@/lib/client/api';
import { useMeasurementList, useSystemWorkspace } from '@/lib/hooks/use-measurements';
import type { SeatBalanceAnswer } from '@/lib/system-model/seat-balance';
import { seatBalanceMeasuredRequestFromDocument, type SeatBalanceMeasuredDocumentRequest } from '@/lib/system-model/seat-balance-document';
import type { SystemDocument } from '@/lib/validations/system';
import { measurementsInScope, type MeasurementScope } from './measured-pairs';

const SYSTEM_PATH = /^\/systems\/([0-9a-f-]{36})(?:\/|$)/i;

type MeasuredBody = Extract<SeatBalanceMeasuredDocumentRequest, { ok: true }>['body'];

type MeasuredRun =
  | { state: 'idle' }
  | { state: 'running'; startedMs: number }
  | { state: 'done'; answer: SeatBalanceAnswer; elapsedMs: number; key: string; used: { sub: string; seat: string; name: string }[]; present: { delayMs: number; gainDb: number; invert: boolean }[] }
  | { state: 'failed'; message: string }
  | { state: 'cancelled' };

/** What a measured run depends on (the files and the System's subs, seats and settings), limits aside. */
export const measuredKey = (body: MeasuredBody) => JSON.stringify([body.seats, body.subs, body.measurements]);

/**
 * Seat balance from stored measurements: the System's files (listed like the Measured tab), the request built from them
 * (or what is missing), and one POST to /api/v1/seat-balance at a time (a new run or Cancel aborts the one going).
 */
export function useMeasuredSeatBalance(doc: SystemDocument, active: boolean) {
  const { status } = useSession();
  const systemId = usePathname().match(SYSTEM_PATH)?.[1] ?? null;
  const signedIn = status === 'authenticated';
  const unavailable = !signedIn ? 'Sign in and save this System to balance the seats from its stored measurements.' : !systemId ? 'Save this System first: measurements are stored with a saved System.' : null;
  const workspace = useSystemWorkspace(active && !unavailable ? systemId : null);
  const list = useMeasurementList(active && !unavailable && workspace.data ? { workspaceId: workspace.data.workspaceId } : null);
  const [scope, setScope] = useState<MeasurementScope>('system');
  const [run, setRun] = useState<MeasuredRun>({ state: 'idle' });
  const abort = useRef<AbortController | null>(null);

  const items = useMemo(() => (systemId && list.data ? measurementsInScope(list.data.items, systemId, scope) : null), [systemId, list.data, scope]);
  const built = useMemo(() => (items ? seatBalanceMeasuredRequestFromDocument(doc, items) : null), [doc, items]);
  const loadError = workspace.error?.message ?? list.error?.message ?? null;

  useEffect(() => () => abort.current?.abort(), []);

  const start = useCallback((body: MeasuredBody & { limits: unknown }, used: { sub: string; seat: string; name: string }[]) => {
    abort.current?.abort();
    const controller = new AbortController();
    abort.current = controller;
    const startedMs = performance.now();
    const present = doc.subs.map((s) => ({ delayMs: s.delayMs, gainDb: s.gainDb, invert: s.invert }));
    setRun({ state: 'running', startedMs });
    apiFetch<SeatBalanceAnswer>('/api/v1/seat-balance', { method: 'POST', json: body, signal: controller.signal }).then(
      (answer) => {
        if (abort.current !== controller) return;
        abort.current = null;
        setRun({ state: 'done', answer, elapsedMs: performance.now() - startedMs, key: measuredKey(body), used, present });
      },
      (e: unknown) => {
        if (abort.current !== controller) return;
        abort.current = null;
        setRun({ state: 'failed', message: e instanceof ApiError || e instanceof Error ? e.message : 'The request failed.' });
      },
    );
  }, [doc.subs]);

  const cancel = useCallback(() => {
    abort.current?.abort();
    abort.current = null;
    setRun({ state: 'cancelled' });
  }, []);

  return { unavailable, loadError, scope, setScope, built, run, start, cancel };
}
