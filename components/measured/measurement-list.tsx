'use client';

import { useState } from 'react';
import { formatHzReadout } from '@/components/charts';
import { Button } from '@/components/ui/button';

export interface CurveItem {
  id: string;
  name: string;
  seat: string | null;
  role: string | null;
  pointCount: number;
  startHz: number;
  stopHz: number;
  hasPhase: boolean;
  /** What was different in this run ("treble +2"), when labelled. */
  runLabel?: string | null;
  /** An impulse response (WAV) transformed through its window. */
  wav?: boolean;
  /** Used on this page only, not saved. */
  local: boolean;
}

interface Props {
  items: CurveItem[];
  loading: boolean;
  error: string | null;
  overlay: ReadonlySet<string>;
  onToggleOverlay: (id: string) => void;
  canDelete: boolean;
  onDelete: (id: string) => void;
}

/** The workspace's measurements (and page-only files), each with an overlay switch. */
export function MeasurementList({ items, loading, error, overlay, onToggleOverlay, canDelete, onDelete }: Props) {
  const [confirming, setConfirming] = useState<string | null>(null);
  return (
    <section aria-labelledby="measurement-list-title" className="flex flex-col gap-2 rounded-lg border border-line bg-white p-3">
      <h3 id="measurement-list-title" className="text-sm font-semibold">
        Measurements <span className="font-normal text-ink-faint">({items.length})</span>
      </h3>
      {loading ? <p className="text-sm text-ink-faint">Loading the workspace&apos;s measurements…</p> : null}
      {error ? <p className="text-sm text-fail">{error}</p> : null}
      {!loading && items.length === 0 ? <p className="text-sm text-ink-faint">No measurements yet. Add one above.</p> : null}
      <ul className="flex flex-col divide-y divide-line" data-testid="measurement-list">
        {items.map((m) => (
          <li key={m.id} className="flex flex-wrap items-start gap-2 py-2">
            <input
              id={`overlay-${m.id}`}
              type="checkbox"
              checked={overlay.has(m.id)}
              onChange={() => onToggleOverlay(m.id)}
              className="mt-1 h-4 w-4 accent-mains"
            />
            <label htmlFor={`overlay-${m.id}`} className="min-w-0 flex-1 text-sm">
              <span className="font-medium">{m.name}</span>
              {m.runLabel ? ' ' : null}
              {m.runLabel ? <span className="ml-1.5 rounded bg-wash px-1.5 py-0.5 text-xs text-ink-soft" data-testid="run-label-tag">{m.runLabel}</span> : null}
              <span className="sr-only"> — show on the overlay</span>
              <span className="block text-xs text-ink-faint">
                {[m.role ?? 'no role', m.seat ?? 'no seat', `${m.pointCount} points`, `${formatHzReadout(m.startHz)}–${formatHzReadout(m.stopHz)}`, m.hasPhase ? 'phase' : 'no phase', m.wav ? 'from an impulse response' : null, m.local ? 'this page only' : null]
                  .filter(Boolean)
                  .join(' · ')}
              </span>
            </label>
            {canDelete && !m.local ? (
              confirming === m.id ? (
                <span className="flex gap-1">
                  <Button variant="danger" className="px-2 py-1 text-xs" onClick={() => { setConfirming(null); onDelete(m.id); }}>
                    Delete
                  </Button>
                  <Button variant="ghost" className="px-2 py-1 text-xs" onClick={() => setConfirming(null)}>
                    Keep
                  </Button>
                </span>
              ) : (
                <Button variant="ghost" className="px-2 py-1 text-xs" aria-label={`Delete ${m.name}`} onClick={() => setConfirming(m.id)}>
                  Delete…
                </Button>
              )
            ) : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
