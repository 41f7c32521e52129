import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { XYPlot } from '@/components/charts/xy-plot';
import type { XYPlotProps } from '@/components/charts/xy-plot';
import { attrNumbers, expectStrictlyIncreasing, tracePathD, xTickPositions } from './helpers';

const delayMs = Array.from({ length: 41 }, (_, i) => i * 0.25);
const normal = delayMs.map((d) => -6 * (1 - Math.cos(((d - 3) / 10) * Math.PI)));
const inverted = delayMs.map((d) => -6 * (1 + Math.cos(((d - 3) / 10) * Math.PI)));

function render(props: Partial<XYPlotProps> = {}): string {
  return renderToStaticMarkup(
    createElement(XYPlot, {
      title: 'Blend level at the crossover against sub delay',
      x: delayMs,
      xLabel: 'Sub delay',
      xUnit: 'ms',
      yLabel: 'Level at the crossover',
      yUnit: 'dB',
      widthPx: 600,
      traces: [
        { id: 'normal', label: 'Normal polarity', values: normal, color: '#B45309' },
        { id: 'inverted', label: 'Inverted', values: inverted, color: '#6B3A1F', dashed: true },
      ],
      ...props,
    }),
  );
}

describe('XYPlot', () => {
  it('has linear x ticks from 0 to 10 ms, evenly spaced', () => {
    const ticks = xTickPositions(render());
    // 600 px leave room for one tick about every 60 px: d3's 1-2-5 steps give one per millisecond.
    expect(ticks.map((t) => t.value)).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    expect(ticks[0]!.value).toBe(0);
    expect(ticks.at(-1)!.value).toBe(10);
    const gaps = ticks.slice(1).map((t, i) => t.px - ticks[i]!.px);
    for (const g of gaps) expect(g).toBeCloseTo(gaps[0]!, 6);
    expect(render()).toContain('Sub delay (ms)');
  });

  it('shades the Timing window band between its edges', () => {
    const html = render({ band: { from: 2, to: 4.5, label: 'Timing window' } });
    const m = html.match(/data-band="Timing window"><rect x="([^"]+)" y="0" width="([^"]+)"/);
    expect(m).not.toBeNull();
    const ticks = new Map(xTickPositions(html).map((t) => [t.value, t.px]));
    expect(Number(m![1])).toBeCloseTo(ticks.get(2)!, 6);
    expect(Number(m![1]) + Number(m![2])).toBeCloseTo((ticks.get(4)! + ticks.get(5)!) / 2, 6);
    expect(html).toContain('>Timing window</text>');
  });

  it('draws labelled point markers for the recommendation', () => {
    const html = render({ points: [{ x: 3, y: 0, label: 'Recommended: 3.0 ms' }] });
    expect(html).toContain('data-point="Recommended: 3.0 ms"');
    expect(html).toMatch(/<circle cx="[\d.]+" cy="[\d.]+" r="5"/);
  });

  it('reads out both polarities at a controlled cursor', () => {
    const html = render({ cursorX: 3, onCursorX: () => {} });
    expect(html).toContain('3.00\u2009ms');
    expect(html).toContain('data-reading="normal"');
    expect(html).toContain('data-reading="inverted"');
    expect(html).toContain('\u221212.0\u2009dB');
  });

  it('hides a trace in `hidden`', () => {
    const html = render({ hidden: new Set(['inverted']) });
    expect(tracePathD(html, 'inverted')).toBeNull();
    expect(tracePathD(html, 'normal')).not.toBeNull();
  });

  it('dashes a dashed trace', () => {
    expect(render()).toMatch(/data-trace="inverted"[^>]*stroke-dasharray="7 4"/);
  });

  it('y ticks increase', () => {
    // The traces span −12…0 dB; padded by 5 % and rounded out to −13…1, about one tick per 36 px of 300 px is a step of 2.
    const ticks = attrNumbers(render(), 'data-y-tick');
    expect(ticks).toEqual([-12, -10, -8, -6, -4, -2, 0]);
    expectStrictlyIncreasing(ticks);
  });
});
