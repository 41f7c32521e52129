'use client';

import { useMemo } from 'react';
import type { AppMeasurementSummary, SharedMeasurement } from '@/lib/data/measurements';
import { ExtensionPanel } from './extension-panel';
import { MeasurementTable } from './measurement-table';
import type { LocalCurve } from './measurement-upload';
import { RunCompare, type RunCurveBody } from './run-compare';
import type { RunItem } from './run-grid';

interface Props {
  /** The stored measurements listed on the page (the workspace's, or a share link's). */
  saved: readonly (AppMeasurementSummary | SharedMeasurement)[];
  /** Curves used on this page only. */
  local: readonly LocalCurve[];
  /** The saved System shown: only its own measurements are its runs (null: every listed one). */
  systemId: string | null;
  curveOf: (id: string) => RunCurveBody | null;
  canEdit: boolean;
}

/** Runs of this System: the seat × source table, Compare, and the in-room extension, side by side on a wide screen. */
export function MeasuredRuns({ saved, local, systemId, curveOf, canEdit }: Props) {
  const runs = useMemo<RunItem[]>(
    () => [
      ...saved
        .filter((m) => !systemId || m.systemId === systemId)
        .map((m) => ({ id: m.id, name: m.name, seat: m.seat, role: m.role, runLabel: m.runLabel, createdAt: m.createdAt, sourceFormat: m.sourceFormat, startHz: m.startHz, stopHz: m.stopHz, local: false })),
      ...local.map((c) => ({ id: c.id, name: c.name, seat: c.seat, role: c.role, runLabel: null, createdAt: null, sourceFormat: 'text' as const, startHz: c.frequencyHz[0] ?? 0, stopHz: c.frequencyHz[c.frequencyHz.length - 1] ?? 0, local: true })),
    ],
    [saved, local, systemId],
  );
  return (
    <div className="flex min-w-0 flex-col gap-4" data-testid="measured-runs">
      <MeasurementTable runs={runs} canEdit={canEdit} />
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 xl:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <RunCompare runs={runs} curveOf={curveOf} />
        <ExtensionPanel runs={runs} curveOf={curveOf} />
      </div>
    </div>
  );
}
