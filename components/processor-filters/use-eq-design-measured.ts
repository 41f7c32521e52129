'use client';

import { usePathname } from 'next/navigation';
import { useSession } from 'next-auth/react';
import { useMemo, useState } from 'react';
import { measurementsInScope, type MeasurementScope } from '@/components/seat-balance/measured-pairs';
import { useMeasurementList, useSystemWorkspace } from '@/lib/hooks/use-measurements';

const SYSTEM_PATH = /^\/systems\/([0-9a-f-]{36})(?:\/|$)/i;

/**
 * The stored measurements the EQ designer may use (listed like the Measured tab and Seat balance do): why there are
 * none to use (signed out, an unsaved System), the files of this System or of its whole workspace, and a load error.
 * The request itself is built from them by eqDesignMeasuredRequestFromDocument and sent to POST /api/v1/eq-design.
 */
export function useEqDesignMeasurements(active: boolean) {
  const { status } = useSession();
  const systemId = usePathname().match(SYSTEM_PATH)?.[1] ?? null;
  const unavailable = status !== 'authenticated' ? 'Sign in and save this System to design from its stored measurements.' : !systemId ? 'Save this System first: measurements are stored with a saved System.' : null;
  const workspace = useSystemWorkspace(active && !unavailable ? systemId : null);
  const list = useMeasurementList(active && !unavailable && workspace.data ? { workspaceId: workspace.data.workspaceId } : null);
  const [scope, setScope] = useState<MeasurementScope>('system');
  const items = useMemo(() => (systemId && list.data ? measurementsInScope(list.data.items, systemId, scope) : null), [systemId, list.data, scope]);
  const loadError = workspace.error?.message ?? list.error?.message ?? null;
  return { unavailable, items, loadError, scope, setScope };
}
