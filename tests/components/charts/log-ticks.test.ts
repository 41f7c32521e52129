import { describe, expect, it } from 'vitest';
import { formatHz, logTicks, thinLogTicks } from '@/components/charts/log-ticks';

describe('logTicks(minHz, maxHz)', () => {
  it('labels 10, 20, 50, 100, 200, 500, 1k over the default 10 Hz–1 kHz', () => {
    const { major } = logTicks(10, 1000);
    expect(major.map((t) => t.hz)).toEqual([10, 20, 50, 100, 200, 500, 1000]);
    expect(major.map((t) => t.label)).toEqual(['10', '20', '50', '100', '200', '500', '1k']);
  });

  it('reaches 20k labels at the top of the audio band', () => {
    const { major } = logTicks(10, 20_000);
    expect(major.map((t) => t.label)).toEqual(['10', '20', '50', '100', '200', '500', '1k', '2k', '5k', '10k', '20k']);
  });

  it('puts minor grid lines at the other 1–9 × decade multiples, without the major ones', () => {
    const { minor } = logTicks(10, 100);
    expect(minor).toEqual([30, 40, 60, 70, 80, 90]);
  });

  it('keeps only ticks inside the range (bounds inclusive)', () => {
    const { major, minor } = logTicks(25, 450);
    expect(major.map((t) => t.hz)).toEqual([50, 100, 200]);
    expect(Math.min(...minor)).toBe(30);
    expect(Math.max(...minor)).toBe(400);
  });

  it('has no binary noise below 1 Hz', () => {
    expect(logTicks(0.1, 1).minor).toContain(0.3);
  });

  it('throws a RangeError for a non-positive or inverted range', () => {
    expect(() => logTicks(0, 100)).toThrow(RangeError);
    expect(() => logTicks(100, 10)).toThrow(RangeError);
  });
});

describe('formatHz(hz)', () => {
  it('writes kilohertz with a k suffix', () => {
    expect(formatHz(2000)).toBe('2k');
    expect(formatHz(1500)).toBe('1.5k');
    expect(formatHz(500)).toBe('500');
    expect(formatHz(NaN)).toBe('—');
  });
});

describe('thinLogTicks(major, pxPerDecade, labelWidthPx)', () => {
  const { major } = logTicks(10, 20_000);
  it('keeps every label when 1× and 2× are far enough apart', () => {
    expect(thinLogTicks(major, 200, 30)).toHaveLength(major.length);
  });
  it('keeps only whole decades when crowded', () => {
    expect(thinLogTicks(major, 60, 30).map((t) => t.label)).toEqual(['10', '100', '1k', '10k']);
  });
});
