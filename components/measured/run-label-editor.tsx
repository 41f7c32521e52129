'use client';

import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ApiError } from '@/lib/client/api';
import { useRelabelMeasurement } from '@/lib/hooks/use-measurement-labels';
import type { RunItem } from './run-grid';

interface Props {
  run: RunItem;
  seatNames: readonly string[];
  sourceNames: readonly string[];
  onDone: () => void;
}

const inputClass = 'w-full min-w-0 rounded-md border border-line bg-white px-2 py-1 text-sm text-ink';

/** Edits a stored run's run label, seat and source in place (PATCH); an emptied field clears it. */
export function RunLabelEditor({ run, seatNames, sourceNames, onDone }: Props) {
  const id = useId();
  const relabel = useRelabelMeasurement();
  const [runLabel, setRunLabel] = useState(run.runLabel ?? '');
  const [seat, setSeat] = useState(run.seat ?? '');
  const [role, setRole] = useState(run.role ?? '');
  const [error, setError] = useState<ApiError | null>(null);
  const [saving, setSaving] = useState(false);

  async function save() {
    setError(null);
    const changed: { runLabel?: string | null; seat?: string | null; role?: string | null } = {};
    const value = (v: string) => (v.trim() ? v.trim() : null);
    if (value(runLabel) !== run.runLabel) changed.runLabel = value(runLabel);
    if (value(seat) !== run.seat) changed.seat = value(seat);
    if (value(role) !== run.role) changed.role = value(role);
    if (Object.keys(changed).length === 0) return onDone();
    setSaving(true);
    try {
      await relabel(run.id, changed);
      onDone();
    } catch (e) {
      setError(e instanceof ApiError ? e : new ApiError(0, 'error', 'Saving the labels failed.'));
    } finally {
      setSaving(false);
    }
  }

  const field = (name: 'runLabel' | 'seat' | 'role') => error?.field(name);
  return (
    <form
      className="flex flex-col gap-1.5 rounded-md border border-line bg-paper p-2"
      aria-label={`Labels of ${run.name}`}
      onSubmit={(e) => {
        e.preventDefault();
        void save();
      }}
    >
      <label className="flex flex-col gap-0.5 text-xs font-medium text-ink-soft">
        Run label
        <input className={inputClass} value={runLabel} maxLength={80} onChange={(e) => setRunLabel(e.target.value)} placeholder="e.g. treble +2" data-testid="run-label-input" />
      </label>
      {field('runLabel') ? <p className="text-xs text-fail">{field('runLabel')}</p> : null}
      <label className="flex flex-col gap-0.5 text-xs font-medium text-ink-soft">
        Seat
        <input className={inputClass} value={seat} maxLength={60} list={`${id}-seats`} onChange={(e) => setSeat(e.target.value)} />
      </label>
      <datalist id={`${id}-seats`}>
        {seatNames.map((s) => (
          <option key={s} value={s} />
        ))}
      </datalist>
      {field('seat') ? <p className="text-xs text-fail">{field('seat')}</p> : null}
      <label className="flex flex-col gap-0.5 text-xs font-medium text-ink-soft">
        Source (channel, sub or role)
        <input className={inputClass} value={role} maxLength={20} list={`${id}-sources`} onChange={(e) => setRole(e.target.value)} />
      </label>
      <datalist id={`${id}-sources`}>
        {sourceNames.map((s) => (
          <option key={s} value={s} />
        ))}
      </datalist>
      {field('role') ? <p className="text-xs text-fail">{field('role')}</p> : null}
      {error && !field('runLabel') && !field('seat') && !field('role') ? (
        <p className="text-xs text-fail" role="alert">
          {error.message}
        </p>
      ) : null}
      <div className="flex gap-1">
        <Button type="submit" className="px-2 py-1 text-xs" disabled={saving}>
          {saving ? 'Saving…' : 'Save labels'}
        </Button>
        <Button variant="ghost" className="px-2 py-1 text-xs" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
