'use client';

import { useRef, type KeyboardEvent } from 'react';

export const PANELS = [
  { id: 'blend', label: 'Blend' },
  { id: 'timing', label: 'Timing' },
  { id: 'modes', label: 'Modes' },
  { id: 'seat-balance', label: 'Seat balance' },
  { id: 'layout', label: 'Layout' },
  { id: 'headroom', label: 'Headroom' },
  { id: 'measured', label: 'Measured' },
  { id: 'processor-filters', label: 'Processor filters' },
] as const;

export type PanelId = (typeof PANELS)[number]['id'];

export const isPanelId = (s: string | null | undefined): s is PanelId => PANELS.some((p) => p.id === s);

/** WAI-ARIA tabs: arrow keys move between panels, Home/End jump. */
export function PanelTabs({ active, onChange }: { active: PanelId; onChange: (p: PanelId) => void }) {
  const refs = useRef<(HTMLButtonElement | null)[]>([]);
  const onKey = (e: KeyboardEvent, index: number) => {
    const last = PANELS.length - 1;
    const next = e.key === 'ArrowRight' ? (index === last ? 0 : index + 1) : e.key === 'ArrowLeft' ? (index === 0 ? last : index - 1) : e.key === 'Home' ? 0 : e.key === 'End' ? last : null;
    if (next === null) return;
    e.preventDefault();
    const panel = PANELS[next];
    if (panel) {
      onChange(panel.id);
      refs.current[next]?.focus();
    }
  };
  return (
    <div role="tablist" aria-label="System editor panels" className="flex gap-1 overflow-x-auto border-b border-line">
      {PANELS.map((p, i) => (
        <button
          key={p.id}
          ref={(el) => {
            refs.current[i] = el;
          }}
          type="button"
          role="tab"
          id={`tab-${p.id}`}
          aria-selected={active === p.id}
          aria-controls={`panel-${p.id}`}
          tabIndex={active === p.id ? 0 : -1}
          onClick={() => onChange(p.id)}
          onKeyDown={(e) => onKey(e, i)}
          className={`-mb-px whitespace-nowrap border-b-2 px-4 py-2 text-sm font-medium ${active === p.id ? 'border-mains text-ink' : 'border-transparent text-ink-soft hover:text-ink'}`}
        >
          {p.label}
        </button>
      ))}
    </div>
  );
}
