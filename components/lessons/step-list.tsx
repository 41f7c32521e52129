'use client';

import { useState, type KeyboardEvent } from 'react';
import type { AppLessonStep } from '@/lib/data/lessons';

/** The new order with the Step `id` moved to `to` (0-based). */
function moved(ids: string[], id: string, to: number): string[] {
  const from = ids.indexOf(id);
  if (from < 0 || to < 0 || to >= ids.length || from === to) return ids;
  const next = [...ids];
  next.splice(from, 1);
  next.splice(to, 0, id);
  return next;
}

interface StepListProps {
  steps: readonly AppLessonStep[];
  selectedId: string | null;
  canEdit: boolean;
  onSelect: (id: string) => void;
  /** Ask for the Steps in this order; `focus` keeps focus on the Step moved by keyboard. */
  onReorder: (stepIds: string[], focus?: string) => void;
}

/** The Steps in order: drag one, use Move up / Move down, or press Alt+↑/↓ on a focused Step to change the order. */
export function StepList({ steps, selectedId, canEdit, onSelect, onReorder }: StepListProps) {
  const [dragId, setDragId] = useState<string | null>(null);
  const ids = steps.map((s) => s.id);
  const reorder = (stepIds: string[], focus?: string) => {
    if (stepIds.join() === ids.join()) return;
    onReorder(stepIds, focus);
  };
  const move = (id: string, delta: number) => reorder(moved(ids, id, ids.indexOf(id) + delta), id);

  const onItemKey = (e: KeyboardEvent, id: string) => {
    if (!canEdit || !e.altKey) return;
    if (e.key === 'ArrowUp') {
      e.preventDefault();
      move(id, -1);
    } else if (e.key === 'ArrowDown') {
      e.preventDefault();
      move(id, 1);
    }
  };

  return (
    <ol className="flex flex-col gap-1.5" aria-label="Steps in order" data-testid="step-list">
      {steps.map((s, i) => (
        <li
          key={s.id}
          draggable={canEdit}
          onDragStart={(e) => {
            setDragId(s.id);
            e.dataTransfer.effectAllowed = 'move';
            e.dataTransfer.setData('text/plain', s.id);
          }}
          onDragOver={(e) => {
            if (dragId) e.preventDefault();
          }}
          onDrop={(e) => {
            e.preventDefault();
            if (dragId) reorder(moved(ids, dragId, i));
            setDragId(null);
          }}
          onDragEnd={() => setDragId(null)}
          className={`flex items-stretch gap-1 rounded-md border bg-white ${s.id === selectedId ? 'border-mains ring-1 ring-mains' : 'border-line'} ${dragId === s.id ? 'opacity-50' : ''}`}
          data-testid="step-item"
        >
          <button
            type="button"
            id={`step-item-${s.id}`}
            onClick={() => onSelect(s.id)}
            onKeyDown={(e) => onItemKey(e, s.id)}
            aria-current={s.id === selectedId ? 'true' : undefined}
            aria-keyshortcuts={canEdit ? 'Alt+ArrowUp Alt+ArrowDown' : undefined}
            className="flex min-w-0 flex-1 items-baseline gap-2 px-3 py-2 text-left text-sm"
          >
            {canEdit ? (
              <span aria-hidden="true" className="cursor-grab text-ink-faint select-none">
                ⠿
              </span>
            ) : null}
            <span className="num text-ink-faint">{i + 1}.</span>
            <span className="truncate font-medium" data-testid="step-item-title">
              {s.title}
            </span>
            {s.sweep ? <span className="ml-auto shrink-0 rounded bg-tint-warn px-1.5 text-xs text-tint-ink-warn">sweep</span> : null}
          </button>
          {canEdit ? (
            <span className="flex flex-col border-l border-line">
              <button type="button" onClick={() => move(s.id, -1)} disabled={i === 0} aria-label={`Move "${s.title}" up`} className="min-w-9 flex-1 px-2 text-xs hover:bg-wash disabled:opacity-30">
                ▲
              </button>
              <button type="button" onClick={() => move(s.id, 1)} disabled={i === steps.length - 1} aria-label={`Move "${s.title}" down`} className="min-w-9 flex-1 px-2 text-xs hover:bg-wash disabled:opacity-30">
                ▼
              </button>
            </span>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
