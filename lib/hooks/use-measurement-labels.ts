'use client';

import { useSWRConfig } from 'swr';
import { apiFetch } from '@/lib/client/api';
import type { AppMeasurementSummary, MeasurementLabels } from '@/lib/data/measurements';

/**
 * Relabels a stored measurement (PATCH /api/v1/measurements/{id}: name, seat, role, runLabel; null clears the last
 * three; its points never change), then refreshes every measurement list. Rejects with an ApiError naming the field.
 */
export function useRelabelMeasurement() {
  const { mutate } = useSWRConfig();
  return async (id: string, labels: MeasurementLabels): Promise<AppMeasurementSummary> => {
    const answer = await apiFetch<AppMeasurementSummary>(`/api/v1/measurements/${id}`, { method: 'PATCH', json: labels });
    await mutate((key) => typeof key === 'string' && key.startsWith('/api/v1/measurements'));
    return answer;
  };
}
