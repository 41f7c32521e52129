'use client';

import { traceDash } from './coincident-traces';
import type { TraceDash } from './plot-types';
import { chartMetrics } from './theme';
import type { ChartEmphasis } from './theme';

export interface LegendItem {
  id: string;
  label: string;
  color: string;
  width?: number;
  dashed?: boolean;
  /** Explicit dash (a trace drawn over an identical one); wins over `dashed`. */
  dash?: TraceDash;
  note?: string;
}

export interface LegendProps {
  items: readonly LegendItem[];
  hidden: ReadonlySet<string>;
  onToggle: (id: string) => void;
  emphasis?: ChartEmphasis;
  /** Accessible name of the group, e.g. "Traces of Magnitude". */
  label: string;
}

/** Legend whose items are toggle buttons (aria-pressed = trace shown). */
export function Legend({ items, hidden, onToggle, emphasis = 'default', label }: LegendProps) {
  const m = chartMetrics(emphasis);
  const swatchW = 22 * m.space;
  const swatchH = 10 * m.space;
  return (
    <div role="group" aria-label={label} className="flex flex-wrap gap-x-1 gap-y-1" style={{ fontSize: m.fontPx + 1 }}>
      {items.map((item) => {
        const shown = !hidden.has(item.id);
        return (
          <button
            key={item.id}
            type="button"
            aria-pressed={shown}
            onClick={() => onToggle(item.id)}
            title={shown ? `Hide ${item.label}` : `Show ${item.label}`}
            style={{ font: 'inherit' }}
            className="inline-flex min-h-8 items-center gap-1.5 rounded-md px-2 py-1 text-ink hover:bg-paper focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-ink aria-[pressed=false]:text-ink-quiet"
          >
            <svg width={swatchW} height={swatchH} aria-hidden="true" focusable="false">
              <line
                x1={1}
                x2={swatchW - 1}
                y1={swatchH / 2}
                y2={swatchH / 2}
                stroke={item.color}
                strokeWidth={(item.width ?? 2) * m.lineScale}
                {...traceDash(item, 0.75 * m.space, '5 3')}
                opacity={shown ? 1 : 0.35}
              />
            </svg>
            <span className={shown ? undefined : 'line-through decoration-1'}>{item.label}</span>
            {item.note ? <span className="text-[0.85em] text-ink-muted">({item.note})</span> : null}
          </button>
        );
      })}
    </div>
  );
}
