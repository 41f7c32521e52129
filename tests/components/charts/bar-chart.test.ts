import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { BarChart } from '@/components/charts/bar-chart';
import type { BarChartProps } from '@/components/charts/bar-chart';
import { chartColors } from '@/components/charts/theme';

function render(props: Partial<BarChartProps> = {}): string {
  return renderToStaticMarkup(
    createElement(BarChart, {
      title: 'Headroom per channel',
      unit: 'dB SPL',
      valueLabel: 'Maximum SPL at the MLP',
      target: 105,
      targetLabel: 'Reference peaks',
      widthPx: 500,
      bars: [
        { id: 'L', label: 'L', value: 110.2, status: 'ok' },
        { id: 'C', label: 'C', value: 106, status: 'warn' },
        { id: 'LFE', label: 'Sub 1', value: 111, status: 'fail', target: 115 },
      ],
      ...props,
    }),
  );
}

const barWidth = (html: string, id: string) => Number(html.match(new RegExp(`data-bar="${id}"[^]*?<rect x="0" y="[^"]+" width="([^"]+)"`))?.[1]);

describe('BarChart', () => {
  it('colours each bar by its status', () => {
    const html = render();
    expect(html).toMatch(new RegExp(`data-bar="L" data-status="ok">.*?fill="${chartColors.ok}"`));
    expect(html).toMatch(new RegExp(`data-bar="C" data-status="warn">.*?fill="${chartColors.warn}"`));
    expect(html).toMatch(new RegExp(`data-bar="LFE" data-status="fail">.*?fill="${chartColors.fail}"`));
  });

  it('makes bar lengths grow with the value', () => {
    const html = render();
    expect(barWidth(html, 'L')).toBeGreaterThan(barWidth(html, 'C'));
    expect(barWidth(html, 'LFE')).toBeGreaterThan(barWidth(html, 'L'));
  });

  it('draws the target as a dashed line and a row target as a dashed tick', () => {
    const html = render();
    expect(html).toMatch(/data-target="105"><line[^>]*stroke-dasharray/);
    expect(html).toContain('data-bar-target="115"');
    expect(html).toContain('Reference peaks');
  });

  it('labels each value with its difference to the target', () => {
    const html = render();
    expect(html).toContain('110.2\u2009dB SPL  +5.2');
    expect(html).toContain('111.0\u2009dB SPL  \u22124.0');
  });

  it('describes every row, with its status in words', () => {
    expect(render()).toContain('Sub 1: 111.0\u2009dB SPL, target 115.0\u2009dB SPL, difference \u22124.0\u2009dB SPL, Fails');
  });
});
