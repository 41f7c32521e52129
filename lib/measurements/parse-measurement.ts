/**
 * Reads a measured response from plain text or CSV: two or three numeric columns (frequency Hz,
 * magnitude dB, optional phase °) separated by commas, semicolons, tabs or spaces; any leading lines that do not
 * begin with a number (a header row, notes such as `* invented meter` or `"Date: …"`) are skipped and counted;
 * `#` and `;` comment lines anywhere; a decimal point, or a decimal comma when the columns are
 * not comma-separated (the European style `20,5;-3,25`). Shared by the upload route (server) and
 * the upload control's preview (browser), so both refuse the same files with the same messages.
 * Splitting is papaparse's; here only the checks of each cell.
 */
import Papa from 'papaparse';

export const MAX_MEASUREMENT_BYTES = 2 * 1024 * 1024;
export const MIN_MEASUREMENT_POINTS = 8;
export const MAX_ABS_PHASE_DEG = 3600;
export const MAX_ABS_MAGNITUDE_DB = 300;
/** Most line errors listed for one file. */
export const MAX_REPORTED_ISSUES = 50;

export interface MeasurementIssue {
  /** `"line 12, column 2"` (1-based), or `"file"` for the file as a whole. */
  path: string;
  message: string;
  line: number | null;
  column: number | null;
}

export type Delimiter = ',' | ';' | '\t' | ' ';

export interface ParsedMeasurement {
  frequencyHz: number[];
  magnitudeDb: number[];
  /** Null when the file has two columns. */
  phaseDeg: number[] | null;
  pointCount: number;
  startHz: number;
  stopHz: number;
  hasPhase: boolean;
  delimiter: Delimiter;
  decimalComma: boolean;
  /** 1-based line of the header row, if there was one. */
  headerLine: number | null;
  /** The header row's cells, if there was one. */
  header: string[] | null;
  /** Leading lines skipped because they do not begin with a number (comments, notes and the header included; blank lines not counted). */
  skippedLines: number;
  /** 1-based line of the first data line (the skipped lines are above it). */
  firstDataLine: number;
}

export type ParseMeasurementResult =
  | { ok: true; measurement: ParsedMeasurement }
  | { ok: false; message: string; issues: MeasurementIssue[]; totalIssues: number };

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const DECIMAL_COMMA_NUMBER = /^[+-]?\d+,\d+(?:[eE][+-]?\d+)?$/;
const COLUMN_NAMES = ['frequency', 'magnitude', 'phase'] as const;

const at = (line: number, column: number) => `line ${line}, column ${column}`;

/**
 * First byte that makes the content binary (NUL or a control character other than tab, CR, LF, FF),
 * with its 1-based line and column; null for text.
 * `findBinaryByte(new Uint8Array([0x31, 0x0a, 0x00]))` → `{ line: 2, column: 1, byte: 0 }`.
 */
export function findBinaryByte(bytes: Uint8Array | string): { line: number; column: number; byte: number } | null {
  let line = 1;
  let column = 1;
  const n = bytes.length;
  for (let i = 0; i < n; i++) {
    const b = typeof bytes === 'string' ? bytes.charCodeAt(i) : (bytes[i] as number);
    if (b === 0x0a) {
      line++;
      column = 1;
      continue;
    }
    if (b < 0x20 && b !== 0x09 && b !== 0x0d && b !== 0x0c) return { line, column, byte: b };
    if (b === 0x7f) return { line, column, byte: b };
    column++;
  }
  return null;
}

function isComment(line: string): boolean {
  const t = line.trimStart();
  return t.startsWith('#') || t.startsWith(';');
}

/** Fields of one line for a delimiter, trimmed, trailing empty fields dropped (`20;-3;` is two fields). */
function trimFields(fields: string[]): string[] {
  const out = fields.map((f) => f.trim());
  while (out.length > 1 && out[out.length - 1] === '') out.pop();
  return out;
}

function numericCell(cell: string, decimalComma: boolean): number | null {
  if (NUMBER.test(cell)) return Number(cell);
  if (decimalComma && DECIMAL_COMMA_NUMBER.test(cell)) return Number(cell.replace(',', '.'));
  return null;
}

/** Splits lines with papaparse (quotes honoured); whitespace-separated lines are split on runs of blanks. */
function splitLines(lines: string[], delimiter: Delimiter): string[][] {
  if (delimiter === ' ') {
    const tabbed = lines.map((l) => l.trim().replace(/[ \t]+/g, '\t')).join('\n');
    return (Papa.parse<string[]>(tabbed, { delimiter: '\t', newline: '\n', quoteChar: '"', skipEmptyLines: false }).data).map(trimFields);
  }
  return (Papa.parse<string[]>(lines.join('\n'), { delimiter, newline: '\n', quoteChar: '"', skipEmptyLines: false }).data).map(trimFields);
}

/** One line on its own (an unbalanced quote cannot reach into the next line). */
function splitLine(line: string, delimiter: Delimiter): string[] {
  return splitLines([line], delimiter)[0] ?? [];
}

/** Picks the separator that gives 2–3 numeric columns on most of the first data lines. */
function detectFormat(sample: string[]): { delimiter: Delimiter; decimalComma: boolean } {
  const candidates: { delimiter: Delimiter; decimalComma: boolean }[] = [
    { delimiter: '\t', decimalComma: true },
    { delimiter: ';', decimalComma: true },
    { delimiter: ',', decimalComma: false },
    { delimiter: ' ', decimalComma: true },
  ];
  let best = { score: -1, pick: candidates[3] as { delimiter: Delimiter; decimalComma: boolean } };
  for (const c of candidates) {
    if (c.delimiter !== ' ' && !sample.some((l) => l.includes(c.delimiter))) continue;
    const rows = sample.map((l) => splitLine(l, c.delimiter));
    let score = 0;
    for (const r of rows) {
      if (r.length >= 2 && r.length <= 3 && r.every((cell) => numericCell(cell, c.decimalComma) !== null)) score++;
    }
    if (score > best.score) best = { score, pick: c };
  }
  return best.pick;
}

/**
 * Parses the text of a measurement file. Every refusal names its line and column; at most
 * {@link MAX_REPORTED_ISSUES} are listed (totalIssues counts them all).
 * @example parseMeasurementText('Hz,dB\n20,-3\n…').measurement.pointCount
 */
export function parseMeasurementText(text: string): ParseMeasurementResult {
  const issues: MeasurementIssue[] = [];
  let total = 0;
  const add = (line: number | null, column: number | null, message: string) => {
    total++;
    if (issues.length < MAX_REPORTED_ISSUES) issues.push({ path: line === null ? 'file' : at(line, column ?? 1), message, line, column });
  };
  const fail = (message: string): ParseMeasurementResult => ({ ok: false, message, issues, totalIssues: total });

  const source = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const binary = findBinaryByte(source);
  if (binary) {
    add(binary.line, binary.column, `binary content (byte 0x${binary.byte.toString(16).padStart(2, '0')}): send a plain-text or CSV file`);
    return fail(`The file is not text: binary content at line ${binary.line}, column ${binary.column}.`);
  }

  // One entry per physical line, so row index + 1 is always the line number.
  const rawLines = source.split(/\r\n|\r|\n/);
  const dataLineIdx: number[] = [];
  rawLines.forEach((l, i) => {
    if (l.trim() !== '' && !isComment(l)) dataLineIdx.push(i);
  });
  if (dataLineIdx.length === 0) {
    add(null, null, 'the file holds no data lines (only blank lines or comments)');
    return fail('The file holds no data lines.');
  }

  // The separator is judged on lines that look like data (begin with a digit, sign or point), so many lines of notes on top do not sway it.
  const looksNumeric = dataLineIdx.filter((i) => /^["']?[+\-.\d]/.test((rawLines[i] as string).trimStart()));
  const sample = (looksNumeric.length ? looksNumeric : dataLineIdx).slice(0, 40).map((i) => rawLines[i] as string);
  const { delimiter, decimalComma } = detectFormat(sample);

  // Leading lines that do not begin with a number (notes, a header) are skipped and counted; the data start at the
  // first line whose first cell is a number. A line further down that is not numbers is an error naming its line.
  let start = 0;
  while (start < dataLineIdx.length && numericCell(splitLine(rawLines[dataLineIdx[start] as number] as string, delimiter)[0] ?? '', decimalComma) === null) start++;
  const leading = new Set(dataLineIdx.slice(0, start));
  const lastSkipped = start > 0 ? (dataLineIdx[start - 1] as number) : null;
  const headerLine = lastSkipped === null ? null : lastSkipped + 1;
  const header = lastSkipped === null ? null : splitLine(rawLines[lastSkipped] as string, delimiter);
  const dataStart = dataLineIdx[start] ?? rawLines.length;
  const skippedLines = rawLines.slice(0, dataStart).filter((l) => l.trim() !== '').length;
  if (start === dataLineIdx.length) {
    add(null, null, `no line begins with a number (${skippedLines} line${skippedLines === 1 ? '' : 's'} of text)`);
    return fail('The file holds no data lines: no line begins with a number.');
  }

  const kept = rawLines.map((l, i) => (l.trim() === '' || isComment(l) || leading.has(i) ? '' : l));
  const rows = splitLines(kept, delimiter);

  let columns: number | null = null;
  const frequencyHz: number[] = [];
  const magnitudeDb: number[] = [];
  const phaseDeg: number[] = [];
  let previousHz: { hz: number; line: number } | null = null;
  let firstDataLine: number | null = null;
  let lastDataLine: number | null = null;

  for (const idx of dataLineIdx.slice(start)) {
    const line = idx + 1;
    const cells = rows[idx] ?? [];
    const values = cells.map((c) => numericCell(c, decimalComma));
    if (firstDataLine === null) firstDataLine = line;
    lastDataLine = line;
    if (cells.length < 2 || cells.length > 3) {
      add(line, Math.min(cells.length, 4), `found ${cells.length} column${cells.length === 1 ? '' : 's'}; a line needs 2 (frequency, magnitude) or 3 (frequency, magnitude, phase)`);
      continue;
    }
    if (columns === null) columns = cells.length;
    else if (cells.length !== columns) {
      add(line, Math.min(cells.length, columns) + 1, `found ${cells.length} columns where the lines above have ${columns}`);
      continue;
    }
    let bad = false;
    cells.forEach((cell, k) => {
      if (values[k] === null || !Number.isFinite(values[k] as number)) {
        add(line, k + 1, `${COLUMN_NAMES[k]}: "${cell.slice(0, 40)}" is not a number`);
        bad = true;
      }
    });
    if (bad) continue;
    const hz = values[0] as number;
    const db = values[1] as number;
    const deg = columns === 3 ? (values[2] as number) : null;
    if (!(hz > 0)) add(line, 1, `frequency must be above 0 Hz (got ${hz})`);
    else if (previousHz && hz <= previousHz.hz) {
      add(line, 1, hz === previousHz.hz ? `frequency ${hz} Hz repeats line ${previousHz.line}; frequencies must strictly increase` : `frequency ${hz} Hz is below line ${previousHz.line}'s ${previousHz.hz} Hz; frequencies must strictly increase`);
    }
    if (hz > 0) previousHz = { hz, line };
    if (Math.abs(db) > MAX_ABS_MAGNITUDE_DB) add(line, 2, `magnitude ${db} dB is outside ±${MAX_ABS_MAGNITUDE_DB} dB`);
    if (deg !== null && Math.abs(deg) > MAX_ABS_PHASE_DEG) add(line, 3, `phase ${deg}° is outside ±${MAX_ABS_PHASE_DEG}°`);
    frequencyHz.push(hz);
    magnitudeDb.push(db);
    if (deg !== null) phaseDeg.push(deg);
  }

  if (total === 0 && frequencyHz.length < MIN_MEASUREMENT_POINTS) {
    const where = firstDataLine === null ? 'no data lines' : `${frequencyHz.length} on lines ${firstDataLine}–${lastDataLine}`;
    add(lastDataLine, lastDataLine === null ? null : 1, `only ${frequencyHz.length} data point${frequencyHz.length === 1 ? '' : 's'} (${where}); at least ${MIN_MEASUREMENT_POINTS} are needed`);
  }
  if (total > 0) {
    const first = issues[0] as MeasurementIssue;
    return fail(`The file was refused: ${first.path}: ${first.message}${total > 1 ? ` (and ${total - 1} more)` : ''}.`);
  }
  const hasPhase = columns === 3;
  return {
    ok: true,
    measurement: {
      frequencyHz,
      magnitudeDb,
      phaseDeg: hasPhase ? phaseDeg : null,
      pointCount: frequencyHz.length,
      startHz: frequencyHz[0] as number,
      stopHz: frequencyHz[frequencyHz.length - 1] as number,
      hasPhase,
      delimiter,
      // Said only when a number in the data used one (a tab file allows decimal commas but may not have any).
      decimalComma: decimalComma && dataLineIdx.slice(start).some((i) => /\d,\d/.test(rawLines[i] as string)),
      headerLine,
      header,
      skippedLines,
      firstDataLine: dataStart + 1,
    },
  };
}

/** Decodes bytes as UTF-8 (a Latin-1 header's "°" becomes U+FFFD, harmless) after the binary check. */
export function parseMeasurementBytes(bytes: Uint8Array): ParseMeasurementResult {
  const binary = findBinaryByte(bytes);
  if (binary) {
    return {
      ok: false,
      message: `The file is not text: binary content at line ${binary.line}, column ${binary.column}.`,
      issues: [{ path: at(binary.line, binary.column), message: `binary content (byte 0x${binary.byte.toString(16).padStart(2, '0')}): send a plain-text or CSV file`, line: binary.line, column: binary.column }],
      totalIssues: 1,
    };
  }
  return parseMeasurementText(new TextDecoder('utf-8', { fatal: false }).decode(bytes));
}

/** Media types a measurement file may come with; anything else is refused with 415. Empty: the browser did not know. */
const TEXT_TYPES = new Set(['', 'application/octet-stream', 'application/csv', 'application/x-csv', 'application/vnd.ms-excel', 'text/x-csv']);

/** True when a file's declared media type can be a text measurement. */
export function isTextMediaType(type: string): boolean {
  const t = type.split(';')[0]!.trim().toLowerCase();
  return t.startsWith('text/') || TEXT_TYPES.has(t);
}
