import { fontMono, numberStyle } from './theme';

export interface PlotReadoutProps {
  /** The x at the cursor, formatted; null when no cursor is shown. */
  cursorLabel: string | null;
  readings: { id: string; label: string; color: string; text: string }[];
  fontPx: number;
}

/** The read-out row above a plot: x at the cursor, then every visible trace's value. */
export function PlotReadout({ cursorLabel, readings, fontPx }: PlotReadoutProps) {
  return (
    <div className="flex min-h-7 flex-wrap items-baseline gap-x-4 gap-y-0.5 text-ink" style={{ fontSize: fontPx + 1 }} data-part="readout">
      {cursorLabel === null ? (
        <span className="text-ink-muted">Hover, touch or focus the plot to read values.</span>
      ) : (
        <>
          <span className="font-semibold" style={numberStyle}>
            {cursorLabel}
          </span>
          {readings.map((r) => (
            <span key={r.id} className="inline-flex items-baseline gap-1.5" data-reading={r.id}>
              <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-sm" style={{ background: r.color }} />
              <span>{r.label}</span>
              <span style={{ ...numberStyle, fontFamily: fontMono }}>{r.text}</span>
            </span>
          ))}
        </>
      )}
    </div>
  );
}
