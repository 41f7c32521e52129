'use client';

import { useId } from 'react';

export interface MeasurementLabels {
  name: string;
  seat: string;
  role: string;
  runLabel: string;
}

const ROLES = [
  { value: 'mains', label: 'Mains' },
  { value: 'sub', label: 'Sub' },
  { value: 'sum', label: 'Mains + sub together' },
];

/** Longest run label the API takes. */
const MAX_RUN_LABEL = 80;

const input = 'rounded-md border border-line bg-white px-3 py-2 font-normal';

/** What a new measurement is called, where it was taken, what was playing, and what was different in this run. */
export function MeasurementFields({ labels, onChange, seatNames }: { labels: MeasurementLabels; onChange: (labels: MeasurementLabels) => void; seatNames: string[] }) {
  const id = useId();
  const set = (patch: Partial<MeasurementLabels>) => onChange({ ...labels, ...patch });
  return (
    <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
      <label className="flex flex-col gap-1 text-sm font-medium">
        Name
        <input value={labels.name} maxLength={120} onChange={(e) => set({ name: e.target.value })} className={input} />
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium">
        Seat
        <select value={labels.seat} onChange={(e) => set({ seat: e.target.value })} className={input}>
          {seatNames.map((s) => (
            <option key={s} value={s}>
              {s}
            </option>
          ))}
          <option value="">(no seat)</option>
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium">
        What was playing
        <select value={labels.role} onChange={(e) => set({ role: e.target.value })} className={input}>
          {ROLES.map((r) => (
            <option key={r.value} value={r.value}>
              {r.label}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1 text-sm font-medium">
        Run label
        <input
          value={labels.runLabel}
          maxLength={MAX_RUN_LABEL}
          placeholder="e.g. treble +2"
          onChange={(e) => set({ runLabel: e.target.value })}
          aria-describedby={`${id}-run-hint`}
          className={input}
          data-testid="run-label"
        />
        <span id={`${id}-run-hint`} className="text-xs font-normal text-ink-faint">
          Optional: what was different in this run.
        </span>
      </label>
    </div>
  );
}
