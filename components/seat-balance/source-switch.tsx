export type BalanceSource = 'model' | 'measured';

/** Model (the room model of Modes) or Measurements (stored files of each sub alone at each seat); the second may be unavailable. */
export function SourceSwitch({ source, onSource, measuredUnavailable }: { source: BalanceSource; onSource: (s: BalanceSource) => void; measuredUnavailable: string | null }) {
  const option = (id: BalanceSource, label: string, disabled: boolean) => (
    <label className={`inline-flex items-center gap-1.5 ${disabled ? 'text-ink-faint' : ''}`}>
      <input type="radio" name="sb-source" value={id} checked={source === id} disabled={disabled} onChange={() => onSource(id)} className="accent-mains" data-testid={`sb-source-${id}`} /> {label}
    </label>
  );
  return (
    <fieldset className="flex flex-col gap-1 text-sm">
      <legend className="mb-1 text-sm font-medium">Balance from</legend>
      <div className="flex flex-wrap gap-x-4 gap-y-1">
        {option('model', 'Model', false)}
        {option('measured', 'Measurements', measuredUnavailable !== null)}
      </div>
      {measuredUnavailable ? (
        <p className="text-xs text-ink-soft" data-testid="sb-source-reason">
          {measuredUnavailable}
        </p>
      ) : null}
    </fieldset>
  );
}
