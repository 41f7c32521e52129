'use client';

import useSWR from 'swr';
import { jsonFetcher } from '@/lib/client/api';
import type { AccountDeletionPlan } from '@/lib/data/account-deletion-plan';

/** GET /api/v1/account/deletion-plan as the Account page shows it (type import only: nothing of the server is bundled). */
export type DeletionPlan = AccountDeletionPlan;
export type DeletionPlanWorkspace = AccountDeletionPlan['workspaces'][number];

/** What deleting the signed-in account would do; read when the section opens, never cached across visits. */
export function useDeletionPlan(enabled: boolean) {
  return useSWR<DeletionPlan>(enabled ? '/api/v1/account/deletion-plan' : null, jsonFetcher, { revalidateOnFocus: false });
}
