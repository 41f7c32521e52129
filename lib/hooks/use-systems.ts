'use client';

import useSWR from 'swr';
import { apiFetch, jsonFetcher } from '@/lib/client/api';
import type { AppShareLink } from '@/lib/data/share-links';
import type { AppRevision, AppSystem } from '@/lib/data/systems';

/** The API's answers, typed by the data layer that makes them (type imports only: nothing of the server is bundled). */
export type SystemItem = AppSystem;
export type RevisionItem = AppRevision;
export type ShareLinkItem = AppShareLink;

export function useShareLinks(systemId: string | null) {
  return useSWR<{ items: ShareLinkItem[] }>(systemId ? `/api/v1/systems/${systemId}/share-links` : null, jsonFetcher);
}

/** Library calls, each answering the API's JSON or throwing an ApiError (409 carries `body.currentRevision`). */
export const systemsApi = {
  rename: (id: string, name: string, revision: number) => apiFetch<SystemItem>(`/api/v1/systems/${id}`, { method: 'PATCH', json: { name, revision } }),
  duplicate: (id: string, options: { name?: string; workspaceId?: string } = {}) => apiFetch<SystemItem>(`/api/v1/systems/${id}/duplicate`, { method: 'POST', json: options }),
  remove: (id: string) => apiFetch<{ id: string; deleted: true }>(`/api/v1/systems/${id}`, { method: 'DELETE' }),
  restore: (id: string) => apiFetch<SystemItem>(`/api/v1/systems/${id}/restore`, { method: 'POST' }),
  restoreRevision: (id: string, revision: number, currentRevision: number) =>
    apiFetch<SystemItem>(`/api/v1/systems/${id}/revisions/${revision}/restore`, { method: 'POST', json: { revision: currentRevision } }),
  setRevisionNote: (id: string, revision: number, note: string) => apiFetch<RevisionItem>(`/api/v1/systems/${id}/revisions/${revision}`, { method: 'PATCH', json: { note } }),
  share: (id: string) => apiFetch<ShareLinkItem>(`/api/v1/systems/${id}/share-links`, { method: 'POST' }),
  revokeLink: (token: string) => apiFetch<ShareLinkItem>(`/api/v1/share-links/${encodeURIComponent(token)}`, { method: 'DELETE' }),
  copyShared: (token: string, workspaceId: string, name?: string) => apiFetch<SystemItem>(`/api/v1/shared/${encodeURIComponent(token)}/copy`, { method: 'POST', json: { workspaceId, ...(name ? { name } : {}) } }),
};
