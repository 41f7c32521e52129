/** Fractional-octave smoothing choices (0: none), the same in every Measured view. */
const SMOOTHING_CHOICES = [0, 1, 2, 3, 6, 12, 24, 48] as const;

/** The labelled "Smoothing" select of the Measured views (overlay and Compare). */
export function SmoothingSelect({ value, onChange, testId }: { value: number; onChange: (fraction: number) => void; testId: string }) {
  return (
    <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
      Smoothing
      <select value={value} onChange={(e) => onChange(Number(e.target.value))} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink" data-testid={testId}>
        {SMOOTHING_CHOICES.map((n) => (
          <option key={n} value={n}>
            {n === 0 ? 'None' : `1/${n} octave`}
          </option>
        ))}
      </select>
    </label>
  );
}
