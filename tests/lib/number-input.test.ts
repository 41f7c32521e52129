import { describe, expect, it } from 'vitest';
import { decimalMarkFor, formatNumberText, parseLengthText, parseNumberText } from '@/lib/number-input';
import { assertInDelta } from '../helpers/assert-in-delta';

// Oracles: 1 ft = 0.3048 m and 1 in = 0.0254 m exactly (the international yard and pound agreement's definitions,
// from memory); the arithmetic beside each check is done by hand.
const IN = 0.0254;
const FT = 0.3048;
const value = (r: ReturnType<typeof parseLengthText>) => {
  if (!r.ok) throw new Error(r.message);
  return r.value;
};

describe('parseLengthText: lengths as people write them', () => {
  const imperial = { units: 'imperial', decimalMark: '.' } as const;
  const metric = { units: 'metric', decimalMark: '.' } as const;
  it.each([
    [`10' 2"`, 122 * IN], // 10·12 + 2 = 122 in
    ['10 ft 2 in', 122 * IN],
    ['10ft2in', 122 * IN],
    [`10′ 2″`, 122 * IN], // typographic primes
    [`10' 2`, 122 * IN], // inches implied after feet
    ['122 in', 122 * IN],
    ['122 inches', 122 * IN],
    ['10.17 ft', 10.17 * FT],
    [`10'`, 10 * FT],
    [`2"`, 2 * IN],
    ['10', 10 * FT], // a bare number is in the shown unit: feet
    ['3.1 m', 3.1],
    ['310 cm', 3.1],
    ['3100 mm', 3.1],
    [`-1' 6"`, -18 * IN], // the sign applies to the whole length
    ['−2 ft', -2 * FT], // Unicode minus
  ])('imperial field: %s', (text, metres) => {
    assertInDelta(value(parseLengthText(text, imperial)), metres, 1e-12);
  });
  it.each([
    ['3.1', 3.1],
    ['3,1', 3.1],
    ['310 cm', 3.1],
    ['3.1 m', 3.1],
    ['3.1m', 3.1],
    ['122 in', 122 * IN], // a unit typed is honoured in a metric field too
    [`10' 2"`, 122 * IN],
    ['.5', 0.5],
  ])('metric field: %s', (text, metres) => {
    assertInDelta(value(parseLengthText(text, metric)), metres, 1e-12);
  });
  it('123.5 in and 122 in are the metres a tape in inches gives (hand: ×0.0254)', () => {
    expect(value(parseLengthText('123.5 in', imperial))).toBeCloseTo(3.1369, 12);
    expect(value(parseLengthText('122 in', imperial))).toBeCloseTo(3.0988, 12);
  });
  it.each(['', ' ', 'abc', '10 fts', '3 mx', `2" 10'`, '10 2', `1' 2" 3`, '3 m 10 cm', '1..2', '-', `10' 14"`, '1,2,3'])('refuses %j with a message that says how to write a length', (text) => {
    const r = parseLengthText(text, imperial);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.message).toMatch(/122 in|less than 12/);
  });
});

describe('parseNumberText: either decimal mark, never a silent ×10', () => {
  it.each([
    ['80,5', '.', 80.5], // never 805
    ['80,5', ',', 80.5],
    ['80.5', ',', 80.5],
    ['80.5', '.', 80.5],
    ['1,250', '.', 1250], // the locale's own grouping
    ['1.250', ',', 1250],
    ['1.250', '.', 1.25],
    ['1,250', ',', 1.25],
    ['1,234.5', '.', 1234.5],
    ['1.234,5', ',', 1234.5],
    ['-3', '.', -3],
    ['−0,5', ',', -0.5],
    ['  42  ', '.', 42],
  ] as const)('%s with decimal mark %s is %d', (text, mark, expected) => {
    const r = parseNumberText(text, { decimalMark: mark });
    expect(r).toEqual({ ok: true, value: expected });
  });
  it('accepts the field’s own unit after the number, and no other', () => {
    expect(parseNumberText('80 Hz', { decimalMark: '.', unit: 'Hz' })).toEqual({ ok: true, value: 80 });
    expect(parseNumberText('80 dB', { decimalMark: '.', unit: 'Hz' }).ok).toBe(false);
  });
  it.each(['', 'abc', '1e3', '12,34.5', '1,2,3', '80,5,', 'NaN', 'Infinity'])('refuses %j', (text) => {
    const r = parseNumberText(text, { decimalMark: '.' });
    expect(r.ok).toBe(false);
  });
});

describe('round trip: shown, read back, the same number (no drift)', () => {
  it('formatNumberText uses the decimal mark and reads back to the same value', () => {
    expect(formatNumberText(80.5, 1, ',')).toBe('80,5');
    expect(formatNumberText(80.5, 1, '.')).toBe('80.5');
    expect(formatNumberText(3, 2, ',')).toBe('3');
    for (const mark of ['.', ','] as const) {
      for (const v of [0.01, 3.1, 80.5, 1234.56, -12.25]) {
        expect(parseNumberText(formatNumberText(v, 2, mark), { decimalMark: mark })).toEqual({ ok: true, value: v });
      }
    }
  });
  it('inches typed, converted once to metres and back, are the inches typed (to 1e-9 in)', () => {
    for (const inches of [1, 2, 61.75, 122, 123.5, 500]) {
      const m = value(parseLengthText(`${inches} in`, { units: 'imperial', decimalMark: '.' }));
      assertInDelta(m / IN, inches, 1e-9);
    }
  });
  it('decimalMarkFor reads the locale', () => {
    expect(decimalMarkFor('de-DE')).toBe(',');
    expect(decimalMarkFor('fr-FR')).toBe(',');
    expect(decimalMarkFor('en-US')).toBe('.');
    expect(decimalMarkFor('not a locale!')).toBe('.');
  });
});
