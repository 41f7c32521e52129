import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { ColumnChart } from '@/components/charts/column-chart';
import type { ColumnChartProps } from '@/components/charts/column-chart';
import { attrNumbers } from './helpers';

const bands = ['25', '31.5', '40', '50', '63', '80', '100', '125', '160', '200'];
const counts = [0, 1, 1, 2, 3, 4, 6, 9, 13, 19];

function render(props: Partial<ColumnChartProps> = {}): string {
  return renderToStaticMarkup(
    createElement(ColumnChart, {
      title: 'Modes per one-third octave',
      xLabel: 'One-third octave band (Hz)',
      yLabel: 'Modes',
      widthPx: 640,
      columns: bands.map((label, i) => ({ label, value: counts[i]! })),
      ...props,
    }),
  );
}

describe('ColumnChart', () => {
  it('writes a label under each column, in order', () => {
    const html = render();
    expect([...html.matchAll(/data-label="([^"]+)"/g)].map((m) => m[1])).toEqual(bands);
  });

  it('labels each column with its value', () => {
    expect(attrNumbers(render(), 'data-value')).toEqual(counts);
  });

  it('uses whole-number ticks for counts', () => {
    const ticks = attrNumbers(render(), 'data-y-tick');
    expect(ticks.every(Number.isInteger)).toBe(true);
    expect(ticks.at(-1)!).toBeGreaterThanOrEqual(19);
  });

  it('turns the labels when a 375 px screen has no room for them', () => {
    const many = Array.from({ length: 24 }, (_, i) => ({ label: `${(20 * 2 ** (i / 3)).toFixed(0)}`, value: i }));
    expect(render({ widthPx: 375, columns: many })).toContain('rotate(-45)');
    expect(render()).not.toContain('rotate(-45)');
  });
});
