import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { outputLines, PROCESSOR_CSV_COLUMNS, processorFiltersCsv, processorFiltersJson, processorFiltersText, sectionLine, type ProcessorFiltersFile } from '@/lib/system-model/processor-filter-exports';
import { numberedSections, processorFiltersFromDocument } from '@/lib/system-model/processor-filters';
import { computeSettingsSheet } from '@/lib/system-model/settings-sheet';
import { testSystem, withSub } from './test-system';

// The exports and the Settings sheet carry the very numbers the panel shows: all are built from
// processorFiltersFromDocument, and every coefficient reads back to the same double (JavaScript's shortest round-trip
// form, ECMA-262 Number::toString).

const COEFFICIENTS = ['b0', 'b1', 'b2', 'a1', 'a2'] as const;
const doc = () => withSub(testSystem(), 0, { name: '=Sub A, front', eq: [{ kind: 'peaking', centerHz: 45, gainDb: -4, q: 5 }] });

describe('processor filter exports', () => {
  it('CSV: one row per section with the header the brief names; parsed back with papaparse it equals the JSON export bit for bit', () => {
    const pf = processorFiltersFromDocument(doc(), { sampleRateHz: 96000 });
    const csv = processorFiltersCsv(pf);
    expect(csv.split('\r\n')[0]).toBe('output,role,filter,section,b0,b1,b2,a1,a2,sampleRateHz');
    const parsed = Papa.parse<Record<string, string>>(csv.trim(), { header: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual([...PROCESSOR_CSV_COLUMNS]);
    const file = JSON.parse(processorFiltersJson(pf, 'Test System (invented)')) as ProcessorFiltersFile;
    const fromJson = file.outputs.flatMap((o) => o.sections.map((s) => ({ label: o.label, ...s })));
    expect(parsed.data).toHaveLength(fromJson.length);
    expect(fromJson).toHaveLength(1 + 1 + 1 + 3 + 2 + 2);
    parsed.data.forEach((row, i) => {
      const j = fromJson[i]!;
      expect(row.section).toBe(String(j.section));
      expect(row.sampleRateHz).toBe('96000');
      for (const c of COEFFICIENTS) expect(Object.is(Number(row[c]), j[c]), `${c} of row ${i}: ${row[c]} against ${j[c]}`).toBe(true);
    });
    // A name a spreadsheet would run as a formula is written as text; the quoted comma keeps it one cell.
    expect(parsed.data[3]!.output).toBe("'=Sub A, front");
    expect(parsed.data[5]!.filter).toBe('Peaking −4 dB at 45 Hz, Q 5');
  });

  it('JSON: the convention, the sample rate, the sign note, every output with its filters and the same doubles as the panel’s source', () => {
    const pf = processorFiltersFromDocument(doc());
    const file = JSON.parse(processorFiltersJson(pf)) as ProcessorFiltersFile;
    expect(file.convention).toBe('H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²)');
    expect(file.sampleRateHz).toBe(48000);
    expect(file.coefficientSigns).toMatch(/negate/);
    expect(file.outputs.map((o) => o.id)).toEqual(pf.outputs.map((o) => o.id));
    pf.outputs.forEach((o, k) => {
      const sections = numberedSections(o);
      file.outputs[k]!.sections.forEach((s, i) => {
        for (const c of COEFFICIENTS) expect(Object.is(s[c], sections[i]![c])).toBe(true);
      });
    });
    expect(file.notes[0]).toMatch(/Linkwitz–Riley 4th order/);
  });

  it('plain text: a header with the convention and the sign note, then one "b0=… b1=… b2=… a1=… a2=…" line per section whose numbers read back exactly', () => {
    const pf = processorFiltersFromDocument(doc(), { sampleRateHz: 44100 });
    const text = processorFiltersText(pf, 'Test System (invented)');
    const lines = text.split('\n');
    expect(lines[0]).toBe('# Seamline processor filters — Test System (invented)');
    expect(lines).toContain('# Sample rate: 44100 Hz');
    expect(lines).toContain('# Convention: H(z) = (b0 + b1·z⁻¹ + b2·z⁻²) / (1 + a1·z⁻¹ + a2·z⁻²)');
    expect(text).toMatch(/a1 and a2 are as written in this formula\. Some processors .* negate both/);
    const sectionLines = lines.filter((l) => l.startsWith('b0='));
    const expected = pf.outputs.flatMap((o) => numberedSections(o));
    expect(sectionLines).toHaveLength(expected.length);
    sectionLines.forEach((line, i) => {
      const m = /^b0=(\S+) b1=(\S+) b2=(\S+) a1=(\S+) a2=(\S+)$/.exec(line);
      expect(m, line).not.toBeNull();
      COEFFICIENTS.forEach((c, j) => expect(Object.is(Number(m![j + 1]), expected[i]![c])).toBe(true));
    });
  });

  it('an output that cannot run at the rate: no CSV rows, its reason in the text and the JSON', () => {
    const pf = processorFiltersFromDocument(withSub(testSystem(), 1, { eq: [{ kind: 'peaking', centerHz: 5000, gainDb: -3, q: 1 }] }), { sampleRateHz: 8000 });
    const rows = Papa.parse<Record<string, string>>(processorFiltersCsv(pf).trim(), { header: true }).data;
    expect(rows.some((r) => r.output === 'Sub B')).toBe(false);
    expect(processorFiltersText(pf)).toMatch(/# Sub B: .*\n# not computed: .*Nyquist/);
    expect((JSON.parse(processorFiltersJson(pf)) as ProcessorFiltersFile).outputs[4]!.problem).toMatch(/Nyquist/);
  });

  it('copy texts: one section is its line, one output its lines in running order', () => {
    const o = processorFiltersFromDocument(doc()).outputs[3]!;
    const s = o.result!.sections[2]!;
    expect(sectionLine(s)).toBe(`b0=${s.b0} b1=${s.b1} b2=${s.b2} a1=${s.a1} a2=${s.a2}`);
    expect(outputLines(o).split('\n')).toEqual(o.result!.sections.map(sectionLine));
  });
});

describe('the Settings sheet’s Processor filters: the panel’s numbers', () => {
  it('sample rate, convention, and every section of every group equal processorFiltersFromDocument’s', () => {
    const d = doc();
    d.bassManagement.sampleRateHz = 192000;
    const sheet = computeSettingsSheet(d).processorFilters;
    const pf = processorFiltersFromDocument(d);
    expect(sheet.sampleRateHz).toBe(192000);
    expect(sheet.convention).toBe(pf.convention);
    expect(sheet.groups.map((g) => g.labels)).toEqual([['L', 'C', 'R'], ['=Sub A, front'], ['Sub B'], ['LFE']]);
    for (const g of sheet.groups) {
      const source = pf.outputs.find((o) => o.id === g.id)!;
      expect(g.sections).toEqual(numberedSections(source));
      expect(g.filters.map((f) => f.words)).toEqual(source.filters.map((f) => f.words));
      expect(g.deviation).toMatch(/^within [\d.]+ dB and [\d.]+° of the analog filter up to 20 kHz/);
    }
    expect(sheet.lfeNote).toMatch(/assumes Linkwitz–Riley 4th order/);
  });
});
