'use client';

import useSWR from 'swr';
import { jsonFetcher } from '@/lib/client/api';
import type { AppAccessToken } from '@/lib/data/access-tokens';

/** A token as GET /api/v1/tokens lists it (type import only: nothing of the server is bundled). */
export type AccessTokenItem = AppAccessToken;

/** The answer of POST /api/v1/tokens: the token and, this once, its secret. */
export type CreatedAccessToken = AppAccessToken & { token: string };

/** The signed-in user's access tokens, newest first (revoked and expired ones too). */
export function useAccessTokens() {
  return useSWR<{ items: AccessTokenItem[] }>('/api/v1/tokens', jsonFetcher);
}
