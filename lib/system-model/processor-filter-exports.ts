/**
 * The processor filters of a System as files an integrator can type in or load: CSV (one row per section), JSON (the
 * same, structured, with the convention and the sample rate) and plain text (one section per line). Every coefficient
 * is written at full precision as JavaScript's shortest round-trip form (String(x) and JSON.stringify give the same
 * digits), so reading a file back gives the very same doubles.
 */
import Papa from 'papaparse';
import type { Biquad } from '@/dsp';
import { COEFFICIENT_SIGN_NOTE, LFE_NOTE, numberedSections, type ProcessorOutput, type SystemProcessorFilters } from './processor-filters';

/** One section as a processor's coefficient fields take it: "b0=… b1=… b2=… a1=… a2=…". */
export function sectionLine(s: Biquad): string {
  return `b0=${s.b0} b1=${s.b1} b2=${s.b2} a1=${s.a1} a2=${s.a2}`;
}

/** Every section of one output, one line each (what the panel's "copy this output" puts on the clipboard). */
export function outputLines(o: ProcessorOutput): string {
  return numberedSections(o).map(sectionLine).join('\n');
}

/** Columns of the CSV, in order. */
export const PROCESSOR_CSV_COLUMNS = ['output', 'role', 'filter', 'section', 'b0', 'b1', 'b2', 'a1', 'a2', 'sampleRateHz'] as const;

/**
 * CSV (RFC 4180, CRLF): one row per section — the output's label, the filter's role and words, the section's number
 * within the output (the order the processor runs them), the five coefficients and the sample rate. An output that
 * cannot run at this rate has no rows. Text cells that a spreadsheet would run as a formula are prefixed with '.
 */
export function processorFiltersCsv(pf: SystemProcessorFilters): string {
  const data = pf.outputs.flatMap((o) =>
    numberedSections(o).map((s) => {
      const f = o.filters[s.filter]!;
      return [o.label, f.role, f.words, s.section, s.b0, s.b1, s.b2, s.a1, s.a2, pf.sampleRateHz];
    }),
  );
  return Papa.unparse({ fields: [...PROCESSOR_CSV_COLUMNS], data }, { newline: '\r\n', escapeFormulae: true }) + '\r\n';
}

/** The JSON export's shape. */
export interface ProcessorFiltersFile {
  system?: string;
  sampleRateHz: number;
  convention: string;
  coefficientSigns: string;
  outputs: {
    id: string;
    kind: ProcessorOutput['kind'];
    label: string;
    filters: { role: string; words: string; filter: ProcessorOutput['filters'][number]['filter'] }[];
    sections: { filter: number; section: number; b0: number; b1: number; b2: number; a1: number; a2: number }[];
    problem: string | null;
  }[];
  notes: string[];
}

/** The JSON export (2-space indented): the convention, the sample rate, and every output's filters and sections. */
export function processorFiltersJson(pf: SystemProcessorFilters, systemName?: string): string {
  const file: ProcessorFiltersFile = {
    ...(systemName ? { system: systemName } : {}),
    sampleRateHz: pf.sampleRateHz,
    convention: pf.convention,
    coefficientSigns: COEFFICIENT_SIGN_NOTE,
    outputs: pf.outputs.map((o) => ({
      id: o.id,
      kind: o.kind,
      label: o.label,
      filters: o.filters.map((f) => ({ role: f.role, words: f.words, filter: f.filter })),
      sections: numberedSections(o).map(({ filter, section, b0, b1, b2, a1, a2 }) => ({ filter, section, b0, b1, b2, a1, a2 })),
      problem: o.problem,
    })),
    notes: pf.outputs.some((o) => o.kind === 'lfe') ? [LFE_NOTE] : [],
  };
  return JSON.stringify(file, null, 2) + '\n';
}

/**
 * Plain text: a header stating the convention and the sample rate, then per output a comment line (starting with #)
 * naming it and its filters, and one line per section in the convention's order.
 */
export function processorFiltersText(pf: SystemProcessorFilters, systemName?: string): string {
  const lines = [
    `# Seamline processor filters${systemName ? ` — ${systemName}` : ''}`,
    `# Sample rate: ${pf.sampleRateHz} Hz`,
    `# Convention: ${pf.convention}`,
    `# ${COEFFICIENT_SIGN_NOTE}`,
    '# One line per second-order section, in the order the output runs them; a first-order section has b2 = a2 = 0.',
  ];
  for (const o of pf.outputs) {
    lines.push('', `# ${o.label}: ${o.filters.map((f) => f.words).join('; ')}`);
    if (o.problem) lines.push(`# not computed: ${o.problem}`);
    else lines.push(outputLines(o));
  }
  if (pf.outputs.some((o) => o.kind === 'lfe')) lines.push('', `# ${LFE_NOTE}`);
  return lines.join('\n') + '\n';
}
