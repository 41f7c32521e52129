/**
 * What people type into a number field, read once into SI: plain numbers with either decimal mark, and lengths the way
 * they are written on site — `10' 2"`, `10 ft 2 in`, `122 in`, `10.17 ft`, `3.1 m`, `310 cm`, `3,1`. Input handling,
 * not mathematics, so it lives in lib/ (pure, no DOM). Conversions: 1 ft = 0.3048 m, 1 in = 0.0254 m (exact, by
 * definition of the international foot and inch).
 */
import { M_PER_FT } from './units';

export type DecimalMark = '.' | ',';

/** The result of reading a field's text: the value, or a message that says what is wrong and how to write it. */
export type ParseResult = { ok: true; value: number } | { ok: false; message: string };

const M_PER_IN = 0.0254;

/** The decimal mark of a locale (e.g. "de-DE" → ","; "en-US" → "."), from the platform's own number formatting. */
export function decimalMarkFor(locale: string | undefined): DecimalMark {
  try {
    const part = new Intl.NumberFormat(locale).formatToParts(1.5).find((p) => p.type === 'decimal');
    return part?.value === ',' ? ',' : '.';
  } catch {
    return '.';
  }
}

/** Unicode minus, primes and typographic quotes as the plain characters the grammar reads. */
function normalise(text: string): string {
  return text
    .trim()
    .replace(/[\u2212\u2012\u2013]/g, '-')
    .replace(/[\u2032\u2019\u00b4`]/g, "'")
    .replace(/[\u2033\u201d\u201c]|''/g, '"')
    .replace(/\u00a0|\u202f/g, ' ');
}

/**
 * Digits with at most one decimal mark and, optionally, the locale's grouping: `80,5` and `80.5` are 80.5 everywhere
 * (never 805); `1,250` is 1250 where the locale's decimal mark is "." and `1.250` is 1250 where it is ",".
 * Returns NaN when the digits cannot be read.
 */
function readDigits(token: string, decimalMark: DecimalMark): number {
  if (!/^\d*[.,]?\d*$|^\d{1,3}([.,]\d{3})+([.,]\d+)?$/.test(token) || !/\d/.test(token)) return Number.NaN;
  const group = decimalMark === '.' ? ',' : '.';
  const commas = (token.match(/,/g) ?? []).length;
  const dots = (token.match(/\./g) ?? []).length;
  if (commas && dots) {
    // Both marks: the last one is the decimal mark, the other groups thousands.
    const last = token.lastIndexOf(',') > token.lastIndexOf('.') ? ',' : '.';
    const other = last === ',' ? '.' : ',';
    const [whole, frac] = [token.slice(0, token.lastIndexOf(last)), token.slice(token.lastIndexOf(last) + 1)];
    if (whole.includes(last) || !/^\d{1,3}(\.\d{3})*$|^\d{1,3}(,\d{3})*$/.test(whole)) return Number.NaN;
    return Number(`${whole.split(other).join('')}.${frac}`);
  }
  const mark = commas ? ',' : dots ? '.' : null;
  if (!mark) return Number(token);
  const count = commas || dots;
  // The locale's grouping mark in whole groups of three is grouping; otherwise a single mark is the decimal mark.
  if (mark === group && /^\d{1,3}([.,]\d{3})+$/.test(token)) return Number(token.split(mark).join(''));
  if (count > 1) return Number.NaN;
  return Number(token.replace(mark, '.'));
}

const NUMBER = String.raw`(\d[\d.,]*|[.,]\d+)`;

/**
 * A plain number as typed: either decimal mark, a leading sign, and optionally the field's own unit after it
 * (`80 Hz` in a field in Hz).
 * @example parseNumberText('80,5', { decimalMark: '.' }) // { ok: true, value: 80.5 }
 */
export function parseNumberText(text: string, { decimalMark, unit }: { decimalMark: DecimalMark; unit?: string }): ParseResult {
  const t = normalise(text);
  if (t === '') return { ok: false, message: 'type a number' };
  const m = new RegExp(`^([-+])?\\s*${NUMBER}\\s*(.*)$`).exec(t);
  const rest = m?.[3]?.trim() ?? '';
  const unitOk = rest === '' || (unit !== undefined && rest.toLowerCase() === unit.toLowerCase());
  const n = m && unitOk ? readDigits(m[2]!, decimalMark) : Number.NaN;
  if (!Number.isFinite(n)) return { ok: false, message: `“${text.trim()}” is not a number${unit ? ` of ${unit}` : ''}` };
  return { ok: true, value: m![1] === '-' ? -n : n };
}

const UNIT_M: Record<string, number> = {
  "'": M_PER_FT,
  ft: M_PER_FT,
  foot: M_PER_FT,
  feet: M_PER_FT,
  '"': M_PER_IN,
  in: M_PER_IN,
  inch: M_PER_IN,
  inches: M_PER_IN,
  m: 1,
  metre: 1,
  metres: 1,
  meter: 1,
  meters: 1,
  cm: 0.01,
  mm: 0.001,
};

const LENGTH_HELP = `write e.g. 10' 2", 10 ft 2 in, 122 in, 10.17 ft, 3.1 m or 310 cm`;

/**
 * A length as typed, in metres. A unit typed is always honoured (`122 in` in a metric field is 3.0988 m); a bare number
 * is in the field's shown unit (feet when `units` is imperial, metres otherwise). Feet then inches may be combined
 * (`10' 2"`, `10 ft 2 in`, `10' 2`); a sign applies to the whole length.
 * @example parseLengthText(`10' 2"`, { units: 'imperial', decimalMark: '.' }) // { ok: true, value: 3.0988 }
 */
export function parseLengthText(text: string, { units, decimalMark }: { units: 'metric' | 'imperial'; decimalMark: DecimalMark }): ParseResult {
  const t = normalise(text).toLowerCase();
  if (t === '') return { ok: false, message: `type a length: ${LENGTH_HELP.slice(6)}` };
  const bad: ParseResult = { ok: false, message: `“${text.trim()}” is not a length: ${LENGTH_HELP}` };
  const signMatch = /^([-+])?\s*(.*)$/.exec(t)!;
  const sign = signMatch[1] === '-' ? -1 : 1;
  const part = new RegExp(`^${NUMBER}\\s*(ft|feet|foot|inches|inch|in|metres|metre|meters|meter|mm|cm|m|'|")?\\s*`);
  const parts: { n: number; unit: string | undefined }[] = [];
  let rest = signMatch[2]!;
  while (rest !== '' && parts.length < 3) {
    const m = part.exec(rest);
    if (!m) return bad;
    // A unit word must end there: "10 fts" or "3 mx" is not a length.
    if (m[2] && /^[a-z]/.test(m[2]) && /^[a-z]/.test(rest.slice(m[0].trimEnd().length))) return bad;
    parts.push({ n: readDigits(m[1]!, decimalMark), unit: m[2] });
    rest = rest.slice(m[0].length);
  }
  if (rest !== '' || parts.length === 0 || parts.some((p) => !Number.isFinite(p.n))) return bad;
  const perUnit = (u: string | undefined) => (u === undefined ? (units === 'imperial' ? M_PER_FT : 1) : UNIT_M[u]!);
  if (parts.length === 1) return { ok: true, value: sign * parts[0]!.n * perUnit(parts[0]!.unit) };
  // Two parts: feet, then inches (the second unit may be left out: 10' 2).
  const [feet, inches] = parts as [(typeof parts)[0], (typeof parts)[0]];
  const isFeet = feet.unit !== undefined && UNIT_M[feet.unit] === M_PER_FT;
  const isInches = inches.unit === undefined || UNIT_M[inches.unit] === M_PER_IN;
  if (parts.length !== 2 || !isFeet || !isInches) return bad;
  if (inches.n >= 12) return { ok: false, message: `“${text.trim()}”: inches after feet must be less than 12` };
  return { ok: true, value: sign * (feet.n * M_PER_FT + inches.n * M_PER_IN) };
}

/**
 * A number for a field: at most `digits` decimals, trailing zeros dropped, the given decimal mark, no grouping
 * (so it reads back as the same number).
 * @example formatNumberText(80.5, 1, ',') // "80,5"
 */
export function formatNumberText(value: number, digits: number, decimalMark: DecimalMark): string {
  const s = String(Number(value.toFixed(digits)));
  return decimalMark === ',' ? s.replace('.', ',') : s;
}
