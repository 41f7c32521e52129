'use client';

import useSWR from 'swr';
import { jsonFetcher } from '@/lib/client/api';

export interface WorkspaceItem {
  id: string;
  name: string;
  personal: boolean;
  role: 'owner' | 'editor' | 'viewer';
  memberCount: number;
}
export interface MemberItem {
  userId: string;
  name: string;
  email: string;
  role: 'owner' | 'editor' | 'viewer';
  since: string;
}
export interface InvitationItem {
  id: string;
  email: string;
  role: 'owner' | 'editor' | 'viewer';
  expiresAt: string;
}

export function useWorkspaces() {
  return useSWR<{ items: WorkspaceItem[] }>('/api/v1/workspaces', jsonFetcher);
}

export function useMembers(workspaceId: string | null) {
  return useSWR<{ items: MemberItem[] }>(workspaceId ? `/api/v1/workspaces/${workspaceId}/members` : null, jsonFetcher);
}

export function useInvitations(workspaceId: string | null) {
  return useSWR<{ items: InvitationItem[] }>(workspaceId ? `/api/v1/workspaces/${workspaceId}/invitations` : null, jsonFetcher);
}
