import { describe, expect, it } from 'vitest';
import {
  MAX_MEASUREMENT_BYTES,
  MAX_REPORTED_ISSUES,
  findBinaryByte,
  isTextMediaType,
  parseMeasurementBytes,
  parseMeasurementText,
  type ParseMeasurementResult,
} from '@/lib/measurements/parse-measurement';

/** n log-spaced points from 20 Hz at `perOctave` points per octave: "f<sep>dB[<sep>deg]" lines. */
function logLines(n: number, perOctave: number, sep = ',', phase = true): string[] {
  return Array.from({ length: n }, (_, i) => {
    const f = 20 * 2 ** (i / perOctave);
    const db = -3 + Math.sin(i / 5);
    const deg = ((i * 7) % 360) - 180;
    return [f.toPrecision(8), db.toFixed(3), ...(phase ? [deg.toFixed(2)] : [])].join(sep);
  });
}

function refused(r: ParseMeasurementResult) {
  if (r.ok) throw new Error('expected the file to be refused');
  return r;
}
function accepted(r: ParseMeasurementResult) {
  if (!r.ok) throw new Error(`expected the file to parse, got: ${r.message} ${JSON.stringify(r.issues.slice(0, 3))}`);
  return r.measurement;
}

describe('parseMeasurementText accepts the documented formats', () => {
  it('comma-separated with a header row and # / ; comment lines', () => {
    const text = ['# invented test file', 'Frequency (Hz),Magnitude (dB),Phase (deg)', '; another comment', ...logLines(10, 24)].join('\n');
    const m = accepted(parseMeasurementText(text));
    expect(m.pointCount).toBe(10);
    expect(m.headerLine).toBe(2);
    expect(m.header).toEqual(['Frequency (Hz)', 'Magnitude (dB)', 'Phase (deg)']);
    expect(m.hasPhase).toBe(true);
    expect(m.delimiter).toBe(',');
    expect(m.startHz).toBe(20);
    expect(m.phaseDeg).toHaveLength(10);
    // Lines 1–3 (a comment, the header, a comment) come before the first number: three skipped (counted by hand).
    expect(m.skippedLines).toBe(3);
    expect(m.firstDataLine).toBe(4);
  });

  it('a tab-separated file with note lines on top (*, ", ;, #, text) skips them and says how many', () => {
    // An invented meter's export: five lines of notes and a header before the numbers (counted by hand).
    const notes = ['* Invented meter export', '"Seat: MLP"', '; mic calibration applied', '# 2026-01-01', 'Sweep notes: 1/48 octave', 'Freq\tSPL\tPhase'];
    const m = accepted(parseMeasurementText([...notes, ...logLines(10, 24, '\t')].join('\n')));
    expect(m.delimiter).toBe('\t');
    expect(m.decimalComma).toBe(false); // decimal points only in this file
    expect(m.pointCount).toBe(10);
    expect(m.skippedLines).toBe(6);
    expect(m.firstDataLine).toBe(7);
    expect(m.headerLine).toBe(6);
    expect(m.header).toEqual(['Freq', 'SPL', 'Phase']);
    expect(m.startHz).toBe(20);
    // A note with an unbalanced quote does not swallow the lines below it.
    const quoted = accepted(parseMeasurementText(['"Unbalanced quote note', ...logLines(9, 12, '\t', false)].join('\n')));
    expect([quoted.skippedLines, quoted.pointCount, quoted.firstDataLine]).toEqual([1, 9, 2]);
  });

  it('a file that begins with numbers skips nothing', () => {
    const m = accepted(parseMeasurementText(logLines(9, 12, '\t').join('\n')));
    expect([m.skippedLines, m.headerLine, m.firstDataLine]).toEqual([0, null, 1]);
  });

  it('European-style: semicolons with decimal commas', () => {
    const text = ['Frequenz;Pegel;Phase', '20,5;-3,25;10,5', '25;-2,5;8', '31,5;-1,75;6', '40;-1;4', '50;-0,5;2', '63;0;0', '80;0,25;-2', '100;0,5;-4,125'].join('\r\n');
    const m = accepted(parseMeasurementText(text));
    expect(m.delimiter).toBe(';');
    expect(m.decimalComma).toBe(true);
    expect(m.frequencyHz).toEqual([20.5, 25, 31.5, 40, 50, 63, 80, 100]);
    expect(m.magnitudeDb[0]).toBe(-3.25);
    expect(m.phaseDeg?.[7]).toBe(-4.125);
  });

  it('tab-separated and space-separated (runs of blanks), two columns, no header', () => {
    const tab = accepted(parseMeasurementText(logLines(12, 12, '\t', false).join('\n')));
    expect(tab.delimiter).toBe('\t');
    expect(tab.hasPhase).toBe(false);
    expect(tab.phaseDeg).toBeNull();
    const spaced = accepted(parseMeasurementText(logLines(12, 12, '   ', true).map((l) => `  ${l} `).join('\n')));
    expect(spaced.delimiter).toBe(' ');
    expect(spaced.pointCount).toBe(12);
  });

  it('a 1/24-octave file from 20 Hz to 20 kHz keeps every point exactly', () => {
    const lines = logLines(240, 24);
    const m = accepted(parseMeasurementText(lines.join('\n')));
    expect(m.pointCount).toBe(240);
    expect(m.frequencyHz[239]).toBe(Number(lines[239]!.split(',')[0]));
    expect(m.magnitudeDb[100]).toBe(Number(lines[100]!.split(',')[1]));
  });

  it('a linear-spaced file (0.5 Hz steps, as an FFT gives) parses', () => {
    const lines = Array.from({ length: 2000 }, (_, i) => `${0.5 * (i + 1)} ${(-1 - i * 0.001).toFixed(4)}`);
    const m = accepted(parseMeasurementText(lines.join('\n')));
    expect(m.pointCount).toBe(2000);
    expect(m.startHz).toBe(0.5);
    expect(m.stopHz).toBe(1000);
  });

  it('a trailing separator and a byte-order mark are harmless', () => {
    const m = accepted(parseMeasurementText(`\ufeff${logLines(9, 6, ';').map((l) => `${l};`).join('\n')}`));
    expect(m.pointCount).toBe(9);
    expect(m.hasPhase).toBe(true);
  });

  it('a 2 MB file parses (time printed, not asserted)', () => {
    const lines: string[] = [];
    let bytes = 0;
    for (let i = 0; bytes < MAX_MEASUREMENT_BYTES - 64; i++) {
      const l = `${(1 + i * 0.01).toFixed(2)},${(-2 + Math.sin(i)).toFixed(6)},${(((i * 13) % 3600) / 10 - 180).toFixed(2)}`;
      if (bytes + l.length + 1 > MAX_MEASUREMENT_BYTES) break;
      lines.push(l);
      bytes += l.length + 1;
    }
    const text = lines.join('\n');
    const t0 = performance.now();
    const m = accepted(parseMeasurementBytes(new TextEncoder().encode(text)));
    console.log(`parse-measurement: ${(text.length / 1024 / 1024).toFixed(2)} MB, ${m.pointCount} points in ${(performance.now() - t0).toFixed(0)} ms`);
    expect(text.length).toBeLessThanOrEqual(MAX_MEASUREMENT_BYTES);
    expect(m.pointCount).toBe(lines.length);
  });
});

describe('parseMeasurementText refuses bad files, naming the line and the column', () => {
  const base = () => ['Hz,dB,deg', ...logLines(10, 24)];

  it('a non-numeric cell', () => {
    const lines = base();
    lines[4] = '28.28,abc,12';
    const r = refused(parseMeasurementText(lines.join('\n')));
    expect(r.issues[0]).toMatchObject({ path: 'line 5, column 2', line: 5, column: 2 });
    expect(r.issues[0]!.message).toContain('"abc" is not a number');
    expect(r.message).toContain('line 5, column 2');
  });

  it('a frequency that is not positive', () => {
    const lines = ['0,-3,0', ...logLines(10, 24)];
    const r = refused(parseMeasurementText(lines.join('\n')));
    expect(r.issues[0]).toMatchObject({ path: 'line 1, column 1' });
    expect(r.issues[0]!.message).toContain('above 0 Hz');
    const negative = refused(parseMeasurementText(['-5;1;0', ...logLines(10, 24, ';')].join('\n')));
    expect(negative.issues[0]!.path).toBe('line 1, column 1');
  });

  it('a duplicated frequency and a decreasing one', () => {
    const lines = base();
    lines[6] = lines[5]!; // line 7 repeats line 6
    const dup = refused(parseMeasurementText(lines.join('\n')));
    expect(dup.issues[0]).toMatchObject({ path: 'line 7, column 1' });
    expect(dup.issues[0]!.message).toContain('repeats line 6');
    const down = base();
    down[8] = '21,-3,0';
    const r = refused(parseMeasurementText(down.join('\n')));
    expect(r.issues[0]).toMatchObject({ path: 'line 9, column 1' });
    expect(r.issues[0]!.message).toContain('strictly increase');
  });

  it('fewer than 8 points', () => {
    const r = refused(parseMeasurementText(['# short', 'Hz,dB', '20,1', '40,2', '80,3', '160,4', '320,5'].join('\n')));
    expect(r.issues).toHaveLength(1);
    expect(r.issues[0]!.path).toBe('line 7, column 1');
    expect(r.issues[0]!.message).toContain('only 5 data points (5 on lines 3–7)');
  });

  it('phase outside ±3600° and magnitude outside ±300 dB', () => {
    const lines = base();
    const keepHz = (i: number, rest: string) => `${lines[i]!.split(',')[0]},${rest}`;
    lines[3] = keepHz(3, '-3,3600.5');
    lines[9] = keepHz(9, '301,0');
    const r = refused(parseMeasurementText(lines.join('\n')));
    expect(r.issues.map((i) => i.path)).toEqual(['line 4, column 3', 'line 10, column 2']);
    expect(r.issues[0]!.message).toContain('±3600°');
    expect(r.issues[1]!.message).toContain('±300 dB');
  });

  it('binary content names the line and column of the first binary byte', () => {
    const text = `${logLines(3, 24).join('\n')}\n20\u0000abc`;
    const r = refused(parseMeasurementText(text));
    expect(r.issues[0]!.path).toBe('line 4, column 3');
    expect(r.issues[0]!.message).toContain('binary content');
    const png = new Uint8Array([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0x00, 0x00]);
    const p = refused(parseMeasurementBytes(png));
    expect(p.issues[0]!.path).toBe('line 2, column 1');
    expect(findBinaryByte('ok\n\tok')).toBeNull();
  });

  it('a wrong column count and a mix of 2 and 3 columns', () => {
    const lines = base();
    lines[2] = '22.4,-3,0,7';
    lines[5] = '30,-3';
    const r = refused(parseMeasurementText(lines.join('\n')));
    expect(r.issues.map((i) => i.path)).toEqual(['line 3, column 4', 'line 6, column 3']);
  });

  it('lists every line error up to the cap and counts them all', () => {
    const lines = ['Hz,dB', ...Array.from({ length: 80 }, (_, i) => `${i + 1},x`)];
    const r = refused(parseMeasurementText(lines.join('\n')));
    expect(r.issues).toHaveLength(MAX_REPORTED_ISSUES);
    expect(r.totalIssues).toBe(80);
    expect(r.issues[49]!.path).toBe('line 51, column 2');
    expect(r.message).toContain('(and 79 more)');
  });

  it('a note line between the numbers is still an error naming its line (only leading lines are skipped)', () => {
    const lines = ['* notes on top', 'Hz\tdB', ...logLines(10, 24, '\t', false)];
    lines.splice(6, 0, '* a note in the middle'); // becomes line 7
    const r = refused(parseMeasurementText(lines.join('\n')));
    expect(r.issues[0]).toMatchObject({ line: 7 });
    expect(r.message).toContain('line 7');
  });

  it('only lines of text: refused, saying no line begins with a number', () => {
    const r = refused(parseMeasurementText('* one\n"two"\nthree\tfour'));
    expect(r.issues[0]!.message).toContain('no line begins with a number (3 lines of text)');
  });

  it('an empty file or one of comments only', () => {
    expect(refused(parseMeasurementText('')).issues[0]!.path).toBe('file');
    expect(refused(parseMeasurementText('# nothing\n; here\n\n')).issues[0]!.message).toContain('no data lines');
  });
});

describe('isTextMediaType', () => {
  it('accepts text and the types browsers give CSV files; refuses images, PDFs, archives', () => {
    for (const t of ['text/plain', 'text/csv; charset=utf-8', '', 'application/octet-stream', 'application/vnd.ms-excel']) expect(isTextMediaType(t), t).toBe(true);
    for (const t of ['image/png', 'application/pdf', 'application/zip', 'audio/wav']) expect(isTextMediaType(t), t).toBe(false);
  });
});
