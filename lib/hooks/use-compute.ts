'use client';

import { useEffect, useState } from 'react';
import useSWR from 'swr';
import { ApiError, apiFetch } from '@/lib/client/api';

/** The value, but only after it has stopped changing for `delayMs`. */
export function useDebounced<T>(value: T, delayMs = 50): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(t);
  }, [value, delayMs]);
  return settled;
}

/**
 * POSTs `body` to a compute route through SWR: debounced (~50 ms), deduplicated by the body's
 * JSON, previous data kept while the next answer comes so plots never blank. `body === null`
 * skips the request. Errors arrive as ApiError, whose `field(path)` names the field at fault.
 */
export function useCompute<T>(url: string, body: unknown | null, options: { debounceMs?: number } = {}) {
  const key = body === null ? null : JSON.stringify(body);
  const settledKey = useDebounced(key, options.debounceMs ?? 50);
  const swr = useSWR<T, ApiError>(settledKey === null ? null : [url, settledKey], ([u, k]: [string, string]) => apiFetch<T>(u, { method: 'POST', body: k, headers: { 'Content-Type': 'application/json' } }), {
    keepPreviousData: true,
    revalidateOnFocus: false,
    revalidateIfStale: false,
    dedupingInterval: 60_000,
    shouldRetryOnError: false,
  });
  return { ...swr, pending: swr.isValidating || key !== settledKey };
}
