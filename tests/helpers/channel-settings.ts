/**
 * Shared by the channel-settings agreement tests: the demo Systems (as they are and with every extra setting
 * non-zero), an RFC 4180 reader for the Settings sheet CSV, and a reader of the Settings sheet's cells in HTML.
 * Free of test-runner imports, so vitest and Playwright specs both use it.
 */
import { juniperLaneDocument, lindenStreetDocument } from '@/lib/demo/systems';
import { systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';

export interface Case {
  label: string;
  doc: SystemDocument;
}

/** Both demo Systems as shipped, and each with a mains delay, channel offsets, sub delays and gains and an override. */
export function channelSettingsCases(): Case[] {
  const juniper = juniperLaneDocument();
  const linden = lindenStreetDocument();
  const juniperTuned: SystemDocument = {
    ...juniper,
    bassManagement: { ...juniper.bassManagement, mainsDelayMs: 1.25 },
    speakers: juniper.speakers.map((s) => (s.channel === 'C' ? { ...s, trimDb: 0.5 } : s.channel === 'SL' ? { ...s, trimDb: -1.25 } : s.channel === 'TRR' ? { ...s, distanceOverrideM: 2.345 } : s)),
    subs: juniper.subs.map((s, j) => ({ ...s, delayMs: j === 0 ? 0.8 : 1.37, gainDb: j === 0 ? -1.5 : 0.24 })),
  };
  const lindenTuned: SystemDocument = {
    ...linden,
    bassManagement: { ...linden.bassManagement, mainsDelayMs: 0.37 },
    speakers: linden.speakers.map((s, i) => (i === 0 ? { ...s, trimDb: -0.7, distanceOverrideM: 2.75 } : s)),
    subs: linden.subs.map((s) => ({ ...s, delayMs: 3.1 })),
  };
  const cases = [
    { label: 'Juniper Lane screening room', doc: juniper },
    { label: 'Linden Street den', doc: linden },
    { label: 'Juniper Lane, mains delay 1.25 ms, C +0.5 dB, SL −1.25 dB, TRR measured, sub delays and gains', doc: juniperTuned },
    { label: 'Linden Street, mains delay 0.37 ms, L −0.7 dB and measured, sub delay 3.1 ms', doc: lindenTuned },
  ];
  for (const c of cases) if (!systemDocumentSchema.safeParse(c.doc).success) throw new Error(`${c.label} is not a valid System`);
  return cases;
}

/** Rows of an RFC 4180 CSV (quoted fields, doubled quotes, CRLF), as arrays of strings. */
export function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]!;
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        field += '"';
        i++;
      } else if (ch === '"') quoted = false;
      else field += ch;
    } else if (ch === '"') quoted = true;
    else if (ch === ',') {
      row.push(field);
      field = '';
    } else if (ch === '\r' && text[i + 1] === '\n') {
      row.push(field);
      rows.push(row);
      row = [];
      field = '';
      i++;
    } else field += ch;
  }
  if (field !== '' || row.length) rows.push([...row, field]);
  return rows;
}

/** The CSV's rows as records keyed by the header. */
export function csvRecords(text: string): Record<string, string>[] {
  const [header, ...rows] = parseCsv(text);
  return rows.map((r) => Object.fromEntries(header!.map((h, i) => [h, r[i] ?? ''])));
}

/** The visible text of the element with `data-testid="id"` up to its first nested element (React's `<!-- -->` removed). */
export function cellText(html: string, testId: string): string {
  const m = new RegExp(`data-testid="${testId.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}"[^>]*>([\\s\\S]*?)</td>`).exec(html);
  if (!m) throw new Error(`no cell data-testid="${testId}" in the markup`);
  return m[1]!.replace(/<!-- -->/g, '').split('<')[0]!.replace(/&#x27;/g, "'").trim();
}

/** How the sheet writes a signed level: "+1.0", "−4.4", "0.0". */
export const signedText = (x: number, digits: number) => `${x > 0 ? '+' : x < 0 ? '−' : ''}${Math.abs(x).toFixed(digits)}`;
