'use client';

import { downloadText, withExtension } from '@/components/charts/export';
import { processorFiltersCsv, processorFiltersJson, processorFiltersText } from '@/lib/system-model/processor-filter-exports';
import type { SystemProcessorFilters } from '@/lib/system-model/processor-filters';

const buttonClass =
  'inline-flex min-h-8 items-center rounded-md border border-edge bg-white px-2.5 py-1 text-sm text-ink hover:bg-paper focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-ink';

/** CSV, JSON and plain-text files of every section of every output (lib/system-model/processor-filter-exports.ts). */
export function ProcessorFilterDownloads({ pf }: { pf: SystemProcessorFilters }) {
  const base = `processor-filters-${pf.sampleRateHz}-hz`;
  return (
    <div role="group" aria-label="Download every section" className="flex flex-wrap items-center gap-1.5">
      <span className="text-sm text-ink-soft">Every section:</span>
      <button type="button" className={buttonClass} data-testid="pf-download-csv" onClick={() => downloadText(processorFiltersCsv(pf), withExtension(base, 'csv'), 'text/csv')}>
        CSV
      </button>
      <button type="button" className={buttonClass} data-testid="pf-download-json" onClick={() => downloadText(processorFiltersJson(pf), withExtension(base, 'json'), 'application/json')}>
        JSON
      </button>
      <button type="button" className={buttonClass} data-testid="pf-download-text" onClick={() => downloadText(processorFiltersText(pf), withExtension(base, 'txt'), 'text/plain')}>
        Text
      </button>
    </div>
  );
}
