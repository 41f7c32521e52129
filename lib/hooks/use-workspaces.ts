'use client';

import useSWR from 'swr';
import { jsonFetcher } from '@/lib/client/api';
import type { AppInvitation } from '@/lib/data/invitations';
import type { AppMember, AppWorkspace } from '@/lib/data/workspaces';

/** The API's answers, typed by the data layer that makes them (type imports only: nothing of the server is bundled). */
export type WorkspaceItem = AppWorkspace;
export type MemberItem = AppMember;
export type InvitationItem = AppInvitation;

export function useWorkspaces() {
  return useSWR<{ items: WorkspaceItem[] }>('/api/v1/workspaces', jsonFetcher);
}

export function useMembers(workspaceId: string | null) {
  return useSWR<{ items: MemberItem[] }>(workspaceId ? `/api/v1/workspaces/${workspaceId}/members` : null, jsonFetcher);
}

export function useInvitations(workspaceId: string | null) {
  return useSWR<{ items: InvitationItem[] }>(workspaceId ? `/api/v1/workspaces/${workspaceId}/invitations` : null, jsonFetcher);
}
