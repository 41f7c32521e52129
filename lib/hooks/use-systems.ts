'use client';

import useSWR from 'swr';
import { apiFetch, jsonFetcher } from '@/lib/client/api';
import type { SystemDocument } from '@/lib/validations/system';

export interface SystemSummaryItem {
  id: string;
  workspaceId: string;
  workspaceName: string;
  name: string;
  revision: number;
  tags: string[];
  ownerName: string;
  lastEditorName: string;
  updatedAt: string;
  deletedAt: string | null;
}
export interface SystemItem extends SystemSummaryItem {
  document: SystemDocument;
  role: 'owner' | 'editor' | 'viewer';
}
export interface RevisionItem {
  revision: number;
  name: string;
  authorName: string | null;
  note: string | null;
  createdAt: string;
}
export interface ShareLinkItem {
  token: string;
  url: string;
  systemId: string;
  createdByName: string | null;
  createdAt: string;
  revokedAt: string | null;
}
export interface SystemListQuery {
  q?: string;
  tag?: string;
  sort?: 'name' | '-name' | 'updated' | '-updated';
  page?: number;
  pageSize?: number;
  workspaceId?: string;
  deleted?: boolean;
}

export function systemsUrl(query: SystemListQuery = {}): string {
  const params = new URLSearchParams();
  for (const [k, v] of Object.entries(query)) {
    if (v === undefined || v === '' || v === false) continue;
    params.set(k, k === 'deleted' ? '1' : String(v));
  }
  const s = params.toString();
  return `/api/v1/systems${s ? `?${s}` : ''}`;
}

export function useSystems(query: SystemListQuery = {}) {
  return useSWR<{ items: SystemSummaryItem[]; total: number; page: number; pageSize: number; tags: string[] }>(systemsUrl(query), jsonFetcher, { keepPreviousData: true });
}

export function useRevisions(systemId: string | null) {
  return useSWR<{ items: RevisionItem[] }>(systemId ? `/api/v1/systems/${systemId}/revisions` : null, jsonFetcher);
}

export function useShareLinks(systemId: string | null) {
  return useSWR<{ items: ShareLinkItem[] }>(systemId ? `/api/v1/systems/${systemId}/share-links` : null, jsonFetcher);
}

/** Library calls, each answering the API's JSON or throwing an ApiError (409 carries `body.currentRevision`). */
export const systemsApi = {
  create: (input: { name: string; document: SystemDocument; workspaceId?: string }) => apiFetch<SystemItem>('/api/v1/systems', { method: 'POST', json: input }),
  save: (id: string, input: { name: string; document: SystemDocument; revision: number }) => apiFetch<SystemItem>(`/api/v1/systems/${id}`, { method: 'PUT', json: input }),
  rename: (id: string, name: string, revision: number) => apiFetch<SystemItem>(`/api/v1/systems/${id}`, { method: 'PATCH', json: { name, revision } }),
  duplicate: (id: string, options: { name?: string; workspaceId?: string } = {}) => apiFetch<SystemItem>(`/api/v1/systems/${id}/duplicate`, { method: 'POST', json: options }),
  remove: (id: string) => apiFetch<{ id: string; deleted: true }>(`/api/v1/systems/${id}`, { method: 'DELETE' }),
  restore: (id: string) => apiFetch<SystemItem>(`/api/v1/systems/${id}/restore`, { method: 'POST' }),
  restoreRevision: (id: string, revision: number, currentRevision: number) =>
    apiFetch<SystemItem>(`/api/v1/systems/${id}/revisions/${revision}/restore`, { method: 'POST', json: { revision: currentRevision } }),
  share: (id: string) => apiFetch<ShareLinkItem>(`/api/v1/systems/${id}/share-links`, { method: 'POST' }),
  revokeLink: (token: string) => apiFetch<ShareLinkItem>(`/api/v1/share-links/${encodeURIComponent(token)}`, { method: 'DELETE' }),
  copyShared: (token: string, workspaceId: string, name?: string) => apiFetch<SystemItem>(`/api/v1/shared/${encodeURIComponent(token)}/copy`, { method: 'POST', json: { workspaceId, ...(name ? { name } : {}) } }),
};
