import { Notice } from '@/components/ui/notice';
import type { SeatBalanceMeasuredDocumentRequest } from '@/lib/system-model/seat-balance-document';
import { pairStatusGrid, type MeasurementScope } from './measured-pairs';

const UPLOAD_HOW =
  'Upload one file per sub per seat on the Measured tab, each of that sub playing alone with no processing: role = the sub’s name, seat = the seat’s name, and phase measured from one timing reference for every file.';

/** Where the files come from: this System's uploads or any in its workspace (for a copy of a measured System). */
export function ScopeChoice({ scope, onScope }: { scope: MeasurementScope; onScope: (s: MeasurementScope) => void }) {
  return (
    <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
      Files from
      <select value={scope} onChange={(e) => onScope(e.target.value as MeasurementScope)} className="max-w-full rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink" data-testid="sb-measured-scope">
        <option value="system">Uploaded for this System</option>
        <option value="workspace">Anywhere in its workspace (this System’s first)</option>
      </select>
    </label>
  );
}

/** Why a measured run cannot start: the reason, a sub × seat table of what is missing or has no phase, and how to name uploads. */
export function MissingFiles({ result, subs, seats, scope }: { result: Extract<SeatBalanceMeasuredDocumentRequest, { ok: false }>; subs: readonly string[]; seats: readonly string[]; scope: MeasurementScope }) {
  const grid = pairStatusGrid(subs, seats, result.missing, result.withoutPhase);
  return (
    <Notice kind="info" title="Not every sub has a usable file at every seat">
      <p data-testid="sb-measured-reason">{result.reason}</p>
      <div className="mt-2 overflow-x-auto" role="region" aria-label="Files per sub and seat (scrolls sideways)" tabIndex={0}>
        <table className="border-collapse text-xs" data-testid="sb-measured-pairs">
          <thead>
            <tr className="text-left">
              <th scope="col" className="px-1.5 py-1 font-medium">Sub \ seat</th>
              {seats.map((s) => (
                <th key={s} scope="col" className="px-1.5 py-1 font-medium">
                  {s}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {grid.map((row) => (
              <tr key={row.sub} className="border-t border-line">
                <th scope="row" className="px-1.5 py-1 text-left font-medium">
                  {row.sub}
                </th>
                {row.cells.map((c) => (
                  <td key={c.seat} className="whitespace-nowrap px-1.5 py-1" title={c.status.kind === 'no-phase' ? c.status.file : undefined}>
                    {c.status.kind === 'ok' ? '✓ found' : c.status.kind === 'missing' ? '✗ missing' : '~ no phase'}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-2">{UPLOAD_HOW}</p>
      {scope === 'system' ? <p className="mt-1">A copy of a measured System has no files of its own: choose “Anywhere in its workspace” under Files from to use the original’s.</p> : null}
    </Notice>
  );
}

/** The stored files a measured answer was computed from. */
export function UsedFiles({ used }: { used: readonly { sub: string; seat: string; name: string }[] }) {
  return (
    <details className="text-sm" data-testid="sb-measured-used">
      <summary className="cursor-pointer text-ink-soft">Files used ({used.length})</summary>
      <ul className="mt-1 flex flex-col gap-0.5 break-words text-xs">
        {used.map((u) => (
          <li key={`${u.sub}\u0000${u.seat}`}>
            <span className="font-medium">{u.sub}</span> at <span className="font-medium">{u.seat}</span>: {u.name}
          </li>
        ))}
      </ul>
    </details>
  );
}
