'use client';

import useSWR from 'swr';
import { ApiError, apiFetch, jsonFetcher } from '@/lib/client/api';
import { postWithProgress } from '@/lib/client/post-with-progress';
import type { AppMeasurement, AppMeasurementSummary, AppUploadAnswer } from '@/lib/data/measurements';
import type { AppSystem } from '@/lib/data/systems';

/** The API's answers, typed by the data layer that makes them (type imports only: nothing of the server is bundled). */
export type MeasurementItem = AppMeasurementSummary;
export type MeasurementPoints = AppMeasurement;
/** POST /api/v1/measurements answers the stored measurement without its points, and the leading lines it skipped. */
export type UploadAnswer = AppUploadAnswer;

/** The caller's measurements (of one workspace when given); null skips the request (signed out). */
export function useMeasurementList(query: { workspaceId?: string } | null) {
  const key = query === null ? null : `/api/v1/measurements${query.workspaceId ? `?workspaceId=${query.workspaceId}` : ''}`;
  return useSWR<{ items: MeasurementItem[] }, ApiError>(key, jsonFetcher);
}

/** Every point of several stored measurements, fetched together (keyed by their ids). */
export function useMeasurementPoints(ids: readonly string[]) {
  const key = ids.length ? ['measurement-points', ...[...ids].sort()] : null;
  return useSWR<Record<string, MeasurementPoints>, ApiError>(key, async ([, ...list]: string[]) => {
    const rows = await Promise.all(list.map((id) => apiFetch<MeasurementPoints>(`/api/v1/measurements/${id}`)));
    return Object.fromEntries(rows.map((r) => [r.id, r]));
  }, { revalidateOnFocus: false, dedupingInterval: 60_000 });
}

/** The workspace a saved System lives in (for listing that workspace's measurements). */
export function useSystemWorkspace(systemId: string | null) {
  return useSWR<Pick<AppSystem, 'workspaceId' | 'workspaceName' | 'role'>, ApiError>(systemId ? `/api/v1/systems/${systemId}` : null, jsonFetcher, { revalidateOnFocus: false });
}

/**
 * Uploads a measurement as multipart/form-data with XMLHttpRequest, so the page can show upload
 * progress (fetch cannot). Resolves with the 201 answer; rejects with an ApiError (its issues are the
 * refused file's line errors).
 */
export async function uploadMeasurement(form: FormData, onProgress: (fraction: number) => void): Promise<UploadAnswer> {
  const answer = await postWithProgress<UploadAnswer>('/api/v1/measurements', form, {
    onProgress,
    networkMessage: 'Could not reach Seamline. Check the connection; nothing was saved.',
    failureMessage: (status) => `The upload failed (${status}).`,
  });
  onProgress(1);
  return answer;
}

export function deleteMeasurement(id: string) {
  return apiFetch<{ id: string; deleted: true }>(`/api/v1/measurements/${id}`, { method: 'DELETE' });
}
