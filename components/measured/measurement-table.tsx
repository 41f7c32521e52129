'use client';

import { useMemo, useState } from 'react';
import { useSystem } from '@/components/system/system-context';
import { Button } from '@/components/ui/button';
import { runGrid, type RunItem } from './run-grid';
import { RunLabelEditor } from './run-label-editor';

interface Props {
  runs: readonly RunItem[];
  /** Stored runs can be relabelled (editors and owners). */
  canEdit: boolean;
}

const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

function FormatBadge({ run }: { run: RunItem }) {
  const wav = run.sourceFormat === 'wav';
  return (
    <span className={`rounded px-1 py-px text-[10px] font-semibold uppercase tracking-wide ${wav ? 'bg-tint-info text-mains' : 'bg-tint-plain text-tint-ink-plain'}`} title={wav ? 'An impulse response (WAV) read through its window' : 'A delimited text file (or points)'}>
      {wav ? 'WAV' : 'text'}
    </span>
  );
}

/**
 * What was measured where: rows are seats (the System's, then other seat names found), columns are sources (the System's
 * main channels as its layout names them and each sub, then "mains", "sub", "sum" or other roles found). Each cell lists
 * its runs (run label, name, date, text or WAV); a gap says "not measured". Scrolls inside its own box on a phone.
 */
export function MeasurementTable({ runs, canEdit }: Props) {
  const { doc } = useSystem();
  const grid = useMemo(() => runGrid(doc, runs), [doc, runs]);
  const [editing, setEditing] = useState<string | null>(null);
  const [onlyMeasured, setOnlyMeasured] = useState(false);
  const filled = (columnKey: string) => grid.rows.some((r) => (grid.cells.get(`${r.key}|${columnKey}`)?.length ?? 0) > 0);
  const columns = onlyMeasured ? grid.columns.filter((c) => filled(c.key)) : grid.columns;
  const seatNames = grid.rows.filter((r) => r.key !== 'no-seat').map((r) => r.label);
  const sourceNames = [...grid.columns.filter((c) => c.ofSystem).map((c) => c.label), 'mains', 'sub', 'sum'];
  const gaps = grid.rows.reduce((n, r) => n + grid.columns.filter((c) => c.ofSystem && r.ofSystem && !grid.cells.get(`${r.key}|${c.key}`)?.length).length, 0);

  return (
    <section aria-labelledby="run-table-title" className="flex min-w-0 flex-col gap-2 rounded-lg border border-line bg-white p-3" data-testid="measurement-table">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <div className="min-w-0">
          <h3 id="run-table-title" className="text-sm font-semibold">
            Seats and sources
          </h3>
          <p className="text-xs text-ink-soft">
            Each measurement by where it was taken and what was playing; several runs of one source at one seat are told apart by their run label.{' '}
            {runs.length ? `${runs.length} run${runs.length === 1 ? '' : 's'}; ${gaps} of this System’s seat and source pairs not measured.` : 'No runs yet.'}
          </p>
        </div>
        <label className="flex items-center gap-1.5 text-xs text-ink-soft">
          <input type="checkbox" className="h-4 w-4 accent-mains" checked={onlyMeasured} onChange={(e) => setOnlyMeasured(e.target.checked)} />
          Only sources with runs
        </label>
      </div>
      <div className="max-w-full overflow-x-auto rounded-md border border-line" tabIndex={0} role="region" aria-label="Seats and sources table (scrolls sideways)">
        <table className="min-w-full border-collapse text-left text-xs">
          <caption className="sr-only">Runs per seat (rows) and source (columns); “not measured” marks a gap.</caption>
          <thead className="bg-paper">
            <tr>
              <th scope="col" className="sticky left-0 z-10 border-b border-r border-line bg-paper px-2 py-1.5 font-semibold">
                Seat
              </th>
              {columns.map((c) => (
                <th key={c.key} scope="col" className="border-b border-line px-2 py-1.5 align-bottom font-semibold" title={c.title}>
                  <span className={c.kind === 'sub' ? 'text-sub' : c.kind === 'mains' ? 'text-mains' : 'text-ink'}>{c.label}</span>
                  <span className="block whitespace-nowrap font-normal text-ink-faint">{c.title}</span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {grid.rows.map((r) => (
              <tr key={r.key} className="border-b border-line last:border-b-0" data-testid="run-table-row">
                <th scope="row" className="sticky left-0 z-10 max-w-[8rem] border-r border-line bg-white px-2 py-1.5 align-top font-medium">
                  {r.label}
                  {r.ofSystem ? null : <span className="block font-normal text-ink-faint">{r.key === 'no-seat' ? '' : 'not a seat of this System'}</span>}
                </th>
                {columns.map((c) => {
                  const cell = grid.cells.get(`${r.key}|${c.key}`) ?? [];
                  return (
                    <td key={c.key} className="min-w-[9rem] px-2 py-1.5 align-top" data-testid={`run-cell-${r.label}-${c.label}`}>
                      {cell.length === 0 ? (
                        <span className="text-ink-faint">not measured</span>
                      ) : (
                        <ul className="flex flex-col gap-1.5">
                          {cell.map((run) => (
                            <li key={run.id} className="flex flex-col gap-0.5" data-testid="run-entry">
                              <span className="flex flex-wrap items-center gap-1">
                                <span className="font-medium text-ink">{run.runLabel ?? 'no run label'}</span>
                                <FormatBadge run={run} />
                              </span>
                              <span className="break-words text-ink-soft">{run.name}</span>
                              <span className="text-ink-faint">{run.createdAt ? dateFormat.format(new Date(run.createdAt)) : 'this page only'}</span>
                              {canEdit && !run.local ? (
                                editing === run.id ? (
                                  <RunLabelEditor run={run} seatNames={seatNames} sourceNames={sourceNames} onDone={() => setEditing(null)} />
                                ) : (
                                  <Button variant="ghost" className="self-start px-1.5 py-0.5 text-xs" aria-label={`Edit the labels of ${run.name}`} onClick={() => setEditing(run.id)}>
                                    Edit labels
                                  </Button>
                                )
                              ) : null}
                            </li>
                          ))}
                        </ul>
                      )}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
