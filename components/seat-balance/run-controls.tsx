import { Button } from '@/components/ui/button';
import type { SeatBalanceRun } from './use-seat-balance-run';

/** Run (a second run replaces the one going), Cancel while it runs, and the progress bar. */
export function RunControls({ run, canRun, onRun, onCancel }: { run: SeatBalanceRun; canRun: boolean; onRun: () => void; onCancel: () => void }) {
  const percent = run.state === 'running' ? Math.round(run.fraction * 100) : 0;
  return (
    <div className="flex flex-wrap items-center gap-3">
      <Button onClick={onRun} disabled={!canRun} data-testid="sb-run">
        {run.state === 'running' ? 'Run again' : 'Run'}
      </Button>
      {run.state === 'running' ? (
        <>
          <Button variant="secondary" onClick={onCancel} data-testid="sb-cancel">
            Cancel
          </Button>
          <div className="flex min-w-40 flex-1 items-center gap-2">
            <div role="progressbar" aria-label="Seat balance progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={percent} className="h-2 w-full max-w-64 overflow-hidden rounded-full bg-wash">
              <div className="h-full bg-mains transition-[width]" style={{ width: `${percent}%` }} />
            </div>
            <span className="num text-sm text-ink-soft">{percent}%</span>
          </div>
        </>
      ) : null}
      {run.state === 'cancelled' ? (
        <p role="status" className="text-sm text-ink-soft">
          Cancelled: nothing was changed.
        </p>
      ) : null}
    </div>
  );
}
