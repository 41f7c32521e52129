'use client';

import { useMemo, useState } from 'react';
import type { RoomModesAnswer } from '@/lib/hooks/use-room';

type Mode = RoomModesAnswer['modes'][number];
type SortKey = 'frequencyHz' | 'nL' | 'nW' | 'nH' | 'kind';
const KINDS = ['axial', 'tangential', 'oblique'] as const;
const KIND_ORDER = { axial: 0, tangential: 1, oblique: 2 } as const;

const value = (m: Mode, key: SortKey): number =>
  key === 'frequencyHz' ? m.frequencyHz : key === 'nL' ? m.indices[0] : key === 'nW' ? m.indices[1] : key === 'nH' ? m.indices[2] : KIND_ORDER[m.kind];

const sameIndices = (a: readonly number[] | null, b: readonly number[]) => a !== null && a[0] === b[0] && a[1] === b[1] && a[2] === b[2];

/** Every mode with its indices and kind: sortable by any column, filtered by kind; a row's button maps that mode. */
export function ModeTable({ modes, selected, onSelect, schroederHz, coincident }: { modes: readonly Mode[]; selected: readonly number[] | null; onSelect: (indices: [number, number, number]) => void; schroederHz: number; coincident: ReadonlySet<string> }) {
  const [sort, setSort] = useState<{ key: SortKey; dir: 1 | -1 }>({ key: 'frequencyHz', dir: 1 });
  const [kinds, setKinds] = useState<Record<(typeof KINDS)[number], boolean>>({ axial: true, tangential: true, oblique: true });
  const rows = useMemo(
    () => modes.filter((m) => kinds[m.kind]).sort((a, b) => sort.dir * (value(a, sort.key) - value(b, sort.key)) || a.frequencyHz - b.frequencyHz),
    [modes, kinds, sort],
  );
  const header = (key: SortKey, label: string, title?: string) => (
    <th scope="col" aria-sort={sort.key === key ? (sort.dir === 1 ? 'ascending' : 'descending') : 'none'} className="px-1.5 py-1.5 text-left font-medium sm:px-2">
      <button type="button" title={title} className="inline-flex items-center gap-1 rounded hover:underline" onClick={() => setSort((s) => ({ key, dir: s.key === key ? (s.dir === 1 ? -1 : 1) : 1 }))}>
        {label}
        <span aria-hidden="true" className="text-ink-faint">{sort.key === key ? (sort.dir === 1 ? '▲' : '▼') : '↕'}</span>
      </button>
    </th>
  );
  return (
    <div className="flex flex-col gap-2">
      <fieldset className="flex flex-wrap items-center gap-3 text-sm">
        <legend className="sr-only">Show mode kinds</legend>
        <span className="text-xs font-medium text-ink-soft">Show</span>
        {KINDS.map((k) => (
          <label key={k} className="inline-flex items-center gap-1.5">
            <input type="checkbox" checked={kinds[k]} onChange={(e) => setKinds((s) => ({ ...s, [k]: e.target.checked }))} className="accent-mains" />
            {k} <span className="num text-ink-faint">({modes.filter((m) => m.kind === k).length})</span>
          </label>
        ))}
        <span className="num ml-auto text-xs text-ink-soft" aria-live="polite">
          {rows.length} of {modes.length} modes
        </span>
      </fieldset>
      {/* relative: the rows' screen-reader text (absolutely positioned) stays inside this scroll box instead of widening the page. */}
      <div className="relative max-h-96 overflow-auto rounded-md border border-line bg-white">
        <table className="w-full text-xs sm:text-sm" data-testid="mode-table">
          <caption className="sr-only">Room modes: frequency, indices along the length, width and height, and kind</caption>
          <thead className="sticky top-0 bg-paper text-ink-soft">
            <tr>
              {header('frequencyHz', 'Frequency (Hz)')}
              {header('nL', 'nL', 'Index along the length')}
              {header('nW', 'nW', 'Index across the width')}
              {header('nH', 'nH', 'Index along the height')}
              {header('kind', 'Kind')}
              <th scope="col" className="px-1.5 py-1.5 text-left font-medium sm:px-2">
                Map
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((m) => {
              const key = m.indices.join(',');
              const isSelected = sameIndices(selected, m.indices);
              return (
                <tr key={key} className={`border-t border-line ${isSelected ? 'bg-tint-info' : ''} ${m.frequencyHz > schroederHz ? 'text-ink-soft' : ''}`}>
                  <td className="num px-1.5 py-1 sm:px-2">
                    {m.frequencyHz.toFixed(2)}
                    {coincident.has(key) ? (
                      <span className="ml-1.5 rounded bg-tint-warn px-1 text-xs text-tint-ink-warn" title="Near-coincident: within 2 % of another mode below the Schroeder frequency">
                        <span aria-hidden="true">≈</span>
                        <span className="sr-only">near-coincident</span>
                      </span>
                    ) : null}
                  </td>
                  <td className="num px-1.5 py-1 sm:px-2">{m.indices[0]}</td>
                  <td className="num px-1.5 py-1 sm:px-2">{m.indices[1]}</td>
                  <td className="num px-1.5 py-1 sm:px-2">{m.indices[2]}</td>
                  <td className="px-1.5 py-1 sm:px-2">{m.kind}</td>
                  <td className="px-1.5 py-1 sm:px-2">
                    <button
                      type="button"
                      aria-pressed={isSelected}
                      onClick={() => onSelect([m.indices[0], m.indices[1], m.indices[2]])}
                      className={`rounded border px-2 py-0.5 text-xs ${isSelected ? 'border-mains bg-mains text-white' : 'border-line hover:bg-wash'}`}
                    >
                      {isSelected ? 'Mapped' : 'Map'}
                      <span className="sr-only">{` mode (${key}) at ${m.frequencyHz.toFixed(1)} Hz`}</span>
                    </button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-faint">≈ marks a mode within 2 % of another below the Schroeder frequency (they pile up). Modes above the Schroeder frequency (greyed) overlap into a statistical field; their individual effect fades.</p>
    </div>
  );
}
