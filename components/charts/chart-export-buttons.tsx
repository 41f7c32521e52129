'use client';

import { useState } from 'react';
import type { RefObject } from 'react';
import { downloadCsv, downloadPng, downloadSvg, frequencyCsv } from './export';
import type { FrequencyCsvData } from './export';

export interface ChartExportButtonsProps {
  /** The chart's `<svg>` (pass the same ref as the chart's `ref` prop). */
  svgRef: RefObject<SVGSVGElement | null>;
  /** File name without extension, e.g. "juniper-blend-magnitude". */
  filename: string;
  /** Curves for a CSV download; a function is called only on click. */
  csv?: FrequencyCsvData | (() => string);
  /** What is downloaded, for the buttons' accessible names (default "plot"). */
  subject?: string;
  className?: string;
}

const buttonClass =
  'inline-flex min-h-8 items-center rounded-md border border-edge bg-white px-2.5 py-1 text-sm text-ink hover:bg-paper focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-ink disabled:opacity-60';

/** "SVG", "PNG" and (with `csv`) "CSV" download buttons for one chart. */
export function ChartExportButtons({ svgRef, filename, csv, subject = 'plot', className }: ChartExportButtonsProps) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function withSvgNow(action: (svg: SVGSVGElement) => void | Promise<void>) {
    const svg = svgRef.current;
    if (!svg) return;
    setError(null);
    setBusy(true);
    try {
      await action(svg);
    } catch (e) {
      setError(e instanceof Error ? e.message : 'The download failed.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <div role="group" aria-label={`Download ${subject}`} className={['flex flex-wrap items-center gap-1.5', className].filter(Boolean).join(' ')}>
      <button type="button" className={buttonClass} aria-label={`Download ${subject} as SVG`} onClick={() => void withSvgNow((svg) => downloadSvg(svg, filename))}>
        SVG
      </button>
      <button type="button" className={buttonClass} aria-label={`Download ${subject} as PNG`} disabled={busy} aria-busy={busy} onClick={() => void withSvgNow((svg) => downloadPng(svg, filename))}>
        PNG
      </button>
      {csv ? (
        <button
          type="button"
          className={buttonClass}
          aria-label={`Download ${subject} data as CSV`}
          onClick={() => downloadCsv(typeof csv === 'function' ? csv() : frequencyCsv(csv.frequencyHz, csv.columns), filename)}
        >
          CSV
        </button>
      ) : null}
      {error ? (
        <span role="status" className="text-sm text-fail">
          {error}
        </span>
      ) : null}
    </div>
  );
}
