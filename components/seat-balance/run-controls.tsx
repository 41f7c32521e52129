import { Button } from '@/components/ui/button';

/** A run's state for the controls; a `fraction` of null while running is a run whose progress is not known (a server call). */
interface RunState {
  state: 'idle' | 'running' | 'done' | 'failed' | 'cancelled';
  fraction?: number | null;
}

/** Run (a second run replaces the one going), Cancel while it runs, and the progress bar (indeterminate without a fraction). */
export function RunControls({ run, canRun, onRun, onCancel }: { run: RunState; canRun: boolean; onRun: () => void; onCancel: () => void }) {
  const known = run.state === 'running' && typeof run.fraction === 'number';
  const percent = known ? Math.round((run.fraction as number) * 100) : 0;
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
            {known ? (
              <>
                <div role="progressbar" aria-label="Seat balance progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={percent} className="h-2 w-full max-w-64 overflow-hidden rounded-full bg-wash">
                  <div className="h-full bg-mains transition-[width]" style={{ width: `${percent}%` }} />
                </div>
                <span className="num text-sm text-ink-soft">{percent}%</span>
              </>
            ) : (
              <>
                <div role="progressbar" aria-label="Seat balance progress" aria-valuetext="Working on the server" className="h-2 w-full max-w-64 overflow-hidden rounded-full bg-wash">
                  <div className="h-full w-1/3 animate-pulse rounded-full bg-mains" />
                </div>
                <span className="text-sm text-ink-soft">On the server…</span>
              </>
            )}
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
