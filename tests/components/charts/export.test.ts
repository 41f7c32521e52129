import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { frequencyCsv, resolveCssVariables, withExtension } from '@/components/charts/export';

describe('frequencyCsv(frequencyHz, columns)', () => {
  it('writes a header and one CRLF row per frequency', () => {
    const csv = frequencyCsv([20, 40, 80], [
      { name: 'mains_db', values: [-24, -12.5, -3] },
      { name: 'sum_db', values: [-0.5, 0, 0.25] },
    ]);
    expect(csv).toBe('frequency_hz,mains_db,sum_db\r\n20,-24,-0.5\r\n40,-12.5,0\r\n80,-3,0.25');
  });

  it('leaves non-finite and missing values empty', () => {
    const csv = frequencyCsv([10, 20], [{ name: 'sub_db', values: [NaN] }, { name: 'phase_deg', values: [-Infinity, 90] }]);
    expect(csv).toBe('frequency_hz,sub_db,phase_deg\r\n10,,\r\n20,,90');
  });

  it('rounds to 6 significant digits unless asked for full precision', () => {
    expect(frequencyCsv([10 * 2 ** (1 / 48)], [])).toBe('frequency_hz\r\n10.1455');
    expect(frequencyCsv([10 * 2 ** (1 / 48)], [], { significantDigits: null })).toBe(`frequency_hz\r\n${10 * 2 ** (1 / 48)}`);
  });

  it('quotes headers that need it and reads back with papaparse', () => {
    const csv = frequencyCsv([100], [{ name: 'sum, smoothed (dB)', values: [1.5] }], { frequencyHeader: 'Frequency (Hz)' });
    expect(csv.split('\r\n')[0]).toBe('Frequency (Hz),"sum, smoothed (dB)"');
    expect(Papa.parse<string[]>(csv).data).toEqual([['Frequency (Hz)', 'sum, smoothed (dB)'], ['100', '1.5']]);
  });

  it('throws a RangeError for duplicate column names', () => {
    expect(() => frequencyCsv([1], [{ name: 'frequency_hz', values: [1] }])).toThrow(RangeError);
  });
});

describe('withExtension(filename, extension)', () => {
  it('adds the extension once and makes the name safe', () => {
    expect(withExtension('Blend: magnitude', 'svg')).toBe('Blend-magnitude.svg');
    expect(withExtension('blend.png', 'png')).toBe('blend.png');
    expect(withExtension('  ', 'csv')).toBe('chart.csv');
  });
});

describe('resolveCssVariables(css, lookup)', () => {
  it('replaces a variable with its value and keeps the fallback after it', () => {
    expect(resolveCssVariables('font-family:var(--font-mono, ui-monospace, monospace);font-variant-numeric:tabular-nums', () => "'Plex Mono'")).toBe(
      "font-family:'Plex Mono', ui-monospace, monospace;font-variant-numeric:tabular-nums",
    );
  });
  it('uses the fallback when the variable is not set', () => {
    expect(resolveCssVariables('font-family:var(--font-sans, system-ui, sans-serif)', () => '')).toBe('font-family:system-ui, sans-serif');
  });
});
