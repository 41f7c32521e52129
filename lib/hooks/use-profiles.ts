'use client';

import useSWR from 'swr';
import { apiFetch, jsonFetcher } from '@/lib/client/api';
import type { AppProfile } from '@/lib/data/profiles';
import type { ProfileFields } from '@/lib/validations/profile';

/** A Library Speaker profile as the API answers it (the data layer's type; a type import only). */
export type ProfileItem = AppProfile;

/** Speaker profiles of the caller's workspaces (optionally one workspace, one kind). */
export function useProfiles(query: { workspaceId?: string; kind?: 'main' | 'sub'; q?: string } = {}) {
  const params = new URLSearchParams(Object.entries(query).filter((e): e is [string, string] => !!e[1]));
  const s = params.toString();
  return useSWR<{ items: ProfileItem[]; total: number }>(`/api/v1/profiles${s ? `?${s}` : ''}`, jsonFetcher);
}

export const profilesApi = {
  create: (input: ProfileFields & { workspaceId?: string }) => apiFetch<ProfileItem>('/api/v1/profiles', { method: 'POST', json: input }),
  update: (id: string, fields: ProfileFields) => apiFetch<ProfileItem>(`/api/v1/profiles/${id}`, { method: 'PUT', json: fields }),
  remove: (id: string) => apiFetch<{ id: string; deleted: true }>(`/api/v1/profiles/${id}`, { method: 'DELETE' }),
};
