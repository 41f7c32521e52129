import { describe, expect, it } from 'vitest';
import { formatNumber, formatSigned, formatValue } from '@/components/charts/format';

describe('formatValue(value, unit, digits)', () => {
  it('uses a true minus sign and a thin space before the unit', () => {
    expect(formatValue(-3.14159, 'dB')).toBe('\u22123.1\u2009dB');
  });
  it('writes degrees without a space', () => {
    expect(formatValue(90, '°', 0)).toBe('90°');
  });
  it('writes a dash for non-finite values, without a unit', () => {
    expect(formatValue(NaN, 'dB')).toBe('—');
    expect(formatNumber(-Infinity)).toBe('—');
  });
  it('does not show negative zero', () => {
    expect(formatNumber(-0.04, 1)).toBe('0.0');
  });
  it('formatSigned adds a plus to positive values', () => {
    expect(formatSigned(3.2, 'dB')).toBe('+3.2\u2009dB');
    expect(formatSigned(-1, 'dB')).toBe('\u22121.0\u2009dB');
    expect(formatSigned(0, 'dB')).toBe('0.0\u2009dB');
  });
});
