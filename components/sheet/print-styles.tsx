import { chartColors } from '@/components/charts/theme';

export type Paper = 'A4' | 'letter';

/**
 * Print CSS for the Settings sheet. The content is laid out to fit both papers (A4 210 × 297 mm,
 * US Letter 216 × 279 mm: the narrower width and the shorter height), and `@page` asks for the
 * chosen size so the browser's print dialog starts on it.
 */
export function sheetPrintCss(paper: Paper): string {
  return `
@page { size: ${paper === 'A4' ? 'A4' : 'letter'} portrait; margin: 14mm 14mm 16mm; }
@media print {
  html, body { background: ${chartColors.surface} !important; }
  main { max-width: none !important; padding: 0 !important; }
  .settings-sheet { border: 0 !important; border-radius: 0 !important; padding: 0 !important; max-width: none !important; gap: 4mm !important; font-size: 9.5pt; }
  .settings-sheet h1 { font-size: 16pt; }
  .settings-sheet h2 { font-size: 11pt; margin-bottom: 1.5mm; }
  .settings-sheet .sheet-table { font-size: 8.5pt; }
  .settings-sheet .sheet-table thead { display: table-header-group; }
  .settings-sheet .sheet-table tr, .settings-sheet dl { break-inside: avoid; }
  .settings-sheet .sheet-block { break-inside: avoid-page; }
  .settings-sheet .overflow-x-auto { overflow: visible !important; }
  .settings-sheet * { color-adjust: exact; -webkit-print-color-adjust: exact; print-color-adjust: exact; }
  .sheet-screen-only { display: none !important; }
}`;
}

export function SheetPrintStyles({ paper }: { paper: Paper }) {
  return <style>{sheetPrintCss(paper)}</style>;
}
