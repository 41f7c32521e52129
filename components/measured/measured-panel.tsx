'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { useSession } from 'next-auth/react';
import { useMemo, useState } from 'react';
import { useSWRConfig } from 'swr';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import type { SharedMeasurement } from '@/lib/data/measurements';
import { useCompute } from '@/lib/hooks/use-compute';
import { deleteMeasurement, useMeasurementList, useMeasurementPoints, useSystemWorkspace, type MeasurementItem } from '@/lib/hooks/use-measurements';
import { measuredRequestFromDocument, type PredictAnswer } from '@/lib/system-model/measured';
import { MeasurementList, type CurveItem } from './measurement-list';
import { MeasuredRuns } from './measured-runs';
import { MeasurementUpload, type LocalCurve } from './measurement-upload';
import { OverlayPlot } from './overlay-plot';
import { MeasuredTime } from './measured-time';
import { PredictedBlend } from './predicted-blend';
import { SmoothingSelect } from './smoothing-select';


const SYSTEM_PATH = /^\/systems\/([0-9a-f-]{36})(?:\/|$)/i;

/**
 * The Measured panel: the workspace's measured responses (and files used on this page only),
 * overlaid on the model with smoothing and level alignment, and the blend predicted from a mains and
 * a sub measurement with the System's filters, delays, gains and polarity, with the best delay and
 * polarity found on the measured pair.
 */
export function MeasuredPanel({ shared }: { shared?: { items: SharedMeasurement[]; omitted: number } } = {}) {
  const { doc, readOnly } = useSystem();
  const { status } = useSession();
  // On a share link the System's own measurements come with the page (read-only); nothing is listed or saved.
  const signedIn = status === 'authenticated' && !shared;
  const pathname = usePathname();
  const systemId = shared ? null : (pathname.match(SYSTEM_PATH)?.[1] ?? null);
  const workspace = useSystemWorkspace(signedIn ? systemId : null);
  const listQuery = !signedIn ? null : systemId && !workspace.error ? (workspace.data ? { workspaceId: workspace.data.workspaceId } : null) : {};
  const list = useMeasurementList(listQuery);
  const { mutate } = useSWRConfig();

  const [local, setLocal] = useState<LocalCurve[]>([]);
  const [overlay, setOverlay] = useState<ReadonlySet<string>>(new Set());
  const [offsets, setOffsets] = useState<Record<string, number>>({});
  const [smoothing, setSmoothing] = useState<number>(6);
  const [pair, setPair] = useState<{ mains: string | null; sub: string | null }>({ mains: null, sub: null });
  const [subTarget, setSubTarget] = useState<number | 'all'>(() => (doc.subs.length > 1 ? 'all' : 0));
  const [deleteError, setDeleteError] = useState<string | null>(null);

  const saved = useMemo(() => shared?.items ?? list.data?.items ?? [], [shared, list.data]);
  const sharedPoints = useMemo(() => new Map((shared?.items ?? []).filter((m) => m.frequencyHz.length).map((m) => [m.id, m])), [shared]);
  const items: CurveItem[] = useMemo(
    () => [
      ...saved.map((m: MeasurementItem | SharedMeasurement) => ({ id: m.id, name: m.name, seat: m.seat, role: m.role, pointCount: m.pointCount, startHz: m.startHz, stopHz: m.stopHz, hasPhase: m.hasPhase, runLabel: m.runLabel, wav: m.sourceFormat === 'wav', local: false })),
      ...local.map((c) => ({ id: c.id, name: c.name, seat: c.seat, role: c.role, pointCount: c.frequencyHz.length, startHz: c.frequencyHz[0] ?? 0, stopHz: c.frequencyHz[c.frequencyHz.length - 1] ?? 0, hasPhase: c.phaseDeg !== null, runLabel: c.runLabel ?? null, local: true })),
    ],
    [saved, local],
  );
  const byId = useMemo(() => new Map(items.map((i) => [i.id, i])), [items]);

  // The first mains and sub measurements at one seat are picked until the user picks.
  const mainsId = pair.mains && byId.has(pair.mains) ? pair.mains : (items.find((i) => i.role === 'mains' && i.hasPhase)?.id ?? items.find((i) => i.role === 'mains')?.id ?? null);
  const mainsSeat = mainsId ? byId.get(mainsId)?.seat : null;
  const subId = pair.sub && byId.has(pair.sub) ? pair.sub : (items.find((i) => i.role === 'sub' && i.seat === mainsSeat)?.id ?? items.find((i) => i.role === 'sub')?.id ?? null);

  const savedOverlayIds = [...overlay].filter((id) => byId.get(id) && !byId.get(id)!.local && !shared);
  const points = useMeasurementPoints(savedOverlayIds);
  const overlayCurves = [...overlay]
    .map((id) => {
      const item = byId.get(id);
      if (!item) return null;
      const pts = item.local ? local.find((c) => c.id === id) : shared ? sharedPoints.get(id) : points.data?.[id];
      return pts ? { item, frequencyHz: pts.frequencyHz, magnitudeDb: pts.magnitudeDb } : null;
    })
    .filter((c): c is NonNullable<typeof c> => c !== null);

  const curveRef = (id: string | null) => {
    if (!id) return null;
    const item = byId.get(id);
    if (!item) return null;
    if (shared) {
      const m = sharedPoints.get(id);
      return m ? { frequencyHz: m.frequencyHz, magnitudeDb: m.magnitudeDb, phaseDeg: m.phaseDeg } : null;
    }
    if (!item.local) return { measurementId: id };
    const c = local.find((l) => l.id === id)!;
    return { frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb, phaseDeg: c.phaseDeg };
  };
  const mainsCurve = curveRef(mainsId);
  const subCurve = curveRef(subId);
  const predictBody = mainsCurve && subCurve ? measuredRequestFromDocument(doc, { mains: mainsCurve, sub: subCurve }, { subIndex: subTarget }, { smoothingFraction: smoothing }) : null;
  const prediction = useCompute<PredictAnswer>('/api/v1/measured/predict', predictBody);

  const canWrite = signedIn && (!systemId || (workspace.data ? workspace.data.role !== 'viewer' : false));

  async function remove(id: string) {
    setDeleteError(null);
    try {
      await deleteMeasurement(id);
      setOverlay((s) => new Set([...s].filter((x) => x !== id)));
      await mutate((key) => typeof key === 'string' && key.startsWith('/api/v1/measurements'));
    } catch (e) {
      setDeleteError(e instanceof Error ? e.message : 'Deleting failed.');
    }
  }

  const seatNames = doc.seats.map((s) => s.name);

  return (
    <div className="flex flex-col gap-4" data-testid="measured-panel">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          {shared ? null : <h2 className="text-lg font-semibold">Measured</h2>}
          <p className="max-w-3xl text-sm text-ink-soft">
            Bring measurements of the mains and the subs at a seat, each taken alone with no crossover in the processor (so they hold the speakers&apos; own roll-off, the distance
            and the room). Seamline applies this System&apos;s crossover, delays, gains and polarity to them and predicts the blend at that seat.
          </p>
          <p className="max-w-3xl text-xs text-ink-faint" data-testid="measured-filters-note">
            Each sub&apos;s processor EQ is applied too; the speakers&apos; voicing switches are not, since they were already set in the speakers when you measured.
          </p>
        </div>
        <SmoothingSelect value={smoothing} onChange={setSmoothing} testId="measured-smoothing" />
      </div>

      {shared ? (
        <Notice kind="info">
          <span data-testid="shared-measured-note">
            {shared.items.length
              ? `The measurements uploaded for this System (${shared.items.length}${shared.omitted ? `, the newest; ${shared.omitted} more are in its workspace` : ''}), read-only: tick them to overlay, and pick a mains and a sub file to see the predicted blend. Nothing here can be changed or uploaded.`
              : 'No measurements were uploaded for this System. Measurements are kept in the owner’s workspace; a share link shows only those uploaded for the shared System.'}
          </span>
        </Notice>
      ) : status === 'unauthenticated' ? (
        <Notice kind="info" title="Saving measurements needs an account">
          <p>
            Uploads are kept in a workspace&apos;s Library, so they need you to be signed in.{' '}
            <Link href={`/sign-in?callbackUrl=${encodeURIComponent(pathname)}`} className="font-medium text-mains underline">
              Sign in
            </Link>{' '}
            or{' '}
            <Link href="/sign-up" className="font-medium text-mains underline">
              create an account
            </Link>
            . You can still drop a file below to preview it and use it on this page without saving; nothing leaves this page except for the prediction.
          </p>
        </Notice>
      ) : null}
      {readOnly && !shared ? <Notice kind="info">You are a viewer of this System: you can look at the measurements and the prediction, but not change settings or upload.</Notice> : null}

      {/* Full width: an impulse response's window editor needs the room. */}
      {shared ? null : (
        <MeasurementUpload
          systemId={systemId}
          canSave={canWrite && !readOnly}
          saveBlockedReason={!signedIn ? 'Sign in to save.' : readOnly || !canWrite ? 'Viewers cannot save here.' : undefined}
          seatNames={seatNames}
          onSaved={async (answer) => {
            await mutate((key) => typeof key === 'string' && key.startsWith('/api/v1/measurements'));
            setOverlay((s) => new Set([...s, answer.id]));
          }}
          onUseLocally={(curve) => {
            const id = `local:${local.length + 1}`;
            setLocal((l) => [...l, { ...curve, id }]);
            setOverlay((s) => new Set([...s, id]));
          }}
        />
      )}

      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 xl:grid-cols-[minmax(320px,400px)_minmax(0,1fr)]">
        <div className="flex min-w-0 flex-col gap-4">
          {deleteError ? <Notice kind="error">{deleteError}</Notice> : null}
          <MeasurementList
            items={items}
            loading={signedIn && list.isLoading}
            error={list.error?.message ?? null}
            overlay={overlay}
            onToggleOverlay={(id) => setOverlay((s) => (s.has(id) ? new Set([...s].filter((x) => x !== id)) : new Set([...s, id])))}
            canDelete={canWrite && !readOnly}
            onDelete={remove}
          />
        </div>
        <div className="flex min-w-0 flex-col gap-4">
          <OverlayPlot curves={overlayCurves} offsets={offsets} onOffset={(id, db) => setOffsets((o) => ({ ...o, [id]: db }))} onClearOffsets={() => setOffsets({})} smoothing={smoothing} />
          <PredictedBlend
            items={items}
            mainsId={mainsId}
            subId={subId}
            onPick={(which, id) => setPair((p) => ({ ...p, [which]: id }))}
            subTarget={subTarget}
            onSubTarget={setSubTarget}
            prediction={prediction.data ?? null}
            pending={prediction.pending}
            error={prediction.error ?? null}
          />
          {prediction.data ? <MeasuredTime prediction={prediction.data} /> : null}
        </div>
      </div>
      <MeasuredRuns saved={saved} local={local} systemId={systemId} curveOf={curveRef} canEdit={canWrite && !readOnly} />
    </div>
  );
}
