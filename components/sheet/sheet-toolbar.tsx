'use client';

import { useState } from 'react';
import { Button, buttonClass } from '@/components/ui/button';
import { SheetPrintStyles, type Paper } from './print-styles';

/** Print (with the paper size) and the CSV/JSON downloads; hidden on paper. */
export function SheetToolbar({ downloadBase, backHref, backLabel }: { downloadBase?: string; backHref?: string; backLabel?: string }) {
  const [paper, setPaper] = useState<Paper>('A4');
  return (
    <div className="no-print sheet-screen-only mx-auto mb-4 flex max-w-[60rem] flex-wrap items-end gap-3">
      <SheetPrintStyles paper={paper} />
      {backHref ? (
        <a href={backHref} className={buttonClass('ghost', 'px-2.5')}>
          ← {backLabel ?? 'Back'}
        </a>
      ) : null}
      <div className="ml-auto flex flex-col gap-1">
        <label htmlFor="sheet-paper" className="text-xs font-medium text-ink-soft">
          Paper
        </label>
        <select id="sheet-paper" value={paper} onChange={(e) => setPaper(e.target.value as Paper)} className="rounded-md border border-line bg-white px-2.5 py-2 text-sm">
          <option value="A4">A4</option>
          <option value="letter">US Letter</option>
        </select>
      </div>
      <Button onClick={() => window.print()}>Print</Button>
      {downloadBase ? (
        <>
          <a href={`${downloadBase}?format=csv`} className={buttonClass('secondary')} download>
            CSV
          </a>
          <a href={`${downloadBase}?format=json`} className={buttonClass('secondary')} download>
            JSON
          </a>
        </>
      ) : null}
    </div>
  );
}
