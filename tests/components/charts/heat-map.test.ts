import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { HeatMap, heatMapDomain } from '@/components/charts/heat-map';
import type { HeatMapProps } from '@/components/charts/heat-map';
import { DIVERGING_STOPS, divergingColor, relativeLuminance } from '@/components/charts/color-ramp';

const widthM = 4.9;
const lengthM = 6.4;
// The (0, 1, 0) mode: pressure cos(π y / L), one row per 0.4 m.
const rows = 16;
const cols = 12;
const grid = Array.from({ length: rows }, (_, r) => Array.from({ length: cols }, () => Math.cos((Math.PI * (r + 0.5)) / rows)));

function render(props: Partial<HeatMapProps> = {}): string {
  return renderToStaticMarkup(
    createElement(HeatMap, {
      title: 'Pressure of the 0,1,0 mode',
      values: grid,
      widthM,
      lengthM,
      valueLabel: 'Relative pressure',
      widthPx: 600,
      markers: [
        { xM: 2.45, yM: 4.2, label: 'MLP', kind: 'seat' },
        { xM: 0.3, yM: 0.3, label: 'Sub 1', kind: 'sub' },
        { xM: 2.45, yM: 0.4, label: 'C', kind: 'speaker' },
      ],
      ...props,
    }),
  );
}

describe('divergingColor(t)', () => {
  it('is paper white at 0 and the end stops at ±1', () => {
    expect(divergingColor(0)).toBe('#f6f4ef');
    expect(divergingColor(-1)).toBe(DIVERGING_STOPS[0].toLowerCase());
    expect(divergingColor(1)).toBe(DIVERGING_STOPS[6].toLowerCase());
    expect(divergingColor(5)).toBe(divergingColor(1));
  });
  it('gets darker away from the centre on both sides', () => {
    const lum = (t: number) => relativeLuminance(divergingColor(t));
    for (const side of [-1, 1]) {
      for (let k = 1; k <= 10; k++) expect(lum((side * k) / 10)).toBeLessThan(lum((side * (k - 1)) / 10));
    }
  });
});

describe('heatMapDomain(values, center, domain)', () => {
  it('is symmetric about the centre', () => {
    expect(heatMapDomain([[-0.2, 0.5], [NaN, 0.1]])).toEqual([-0.5, 0.5]);
    expect(heatMapDomain([[NaN]])).toEqual([-1, 1]);
  });
});

describe('HeatMap', () => {
  it('draws one cell per grid value', () => {
    const cells = render().match(/data-part="cells"[^>]*>(.*?)<\/g>/)![1]!;
    expect(cells.match(/<rect /g)).toHaveLength(rows * cols);
  });

  it('keeps the room’s aspect ratio', () => {
    const html = render();
    const outline = html.match(/<rect x="0" y="0" width="([^"]+)" height="([^"]+)" fill="none"/)!;
    expect(Number(outline[2]) / Number(outline[1])).toBeCloseTo(lengthM / widthM, 6);
  });

  it('keeps the aspect ratio under a height limit too', () => {
    const html = render({ widthPx: 1600, maxHeightPx: 400 });
    const outline = html.match(/<rect x="0" y="0" width="([^"]+)" height="([^"]+)" fill="none"/)!;
    expect(Number(outline[2]) / Number(outline[1])).toBeCloseTo(lengthM / widthM, 6);
  });

  it('draws seats, subs and speakers on top of the cells with labels', () => {
    const html = render();
    expect(html.indexOf('data-part="overlay"')).toBeGreaterThan(html.indexOf('data-part="cells"'));
    expect(html).toMatch(/data-marker="seat"[^>]*><title>MLP \(seat\)<\/title><circle/);
    expect(html).toMatch(/data-marker="sub"[^>]*><title>Sub 1 \(sub\)<\/title><rect/);
    expect(html).toMatch(/data-marker="speaker"[^>]*><title>C \(speaker\)<\/title><path/);
  });

  it('has a colour legend from the low to the high end', () => {
    const html = render();
    const ends = [...html.matchAll(/data-legend-value="([^"]+)"/g)].map((m) => Number(m[1]));
    expect(ends[0]).toBeCloseTo(-ends[2]!, 9);
    expect(ends[1]).toBe(0);
    expect(html).toMatch(/<linearGradient[^>]*>(<stop [^>]*><\/stop>){13}<\/linearGradient>/);
  });

  it('labels both axes in metres', () => {
    const html = render();
    expect(html).toContain('Across the room (m)');
    expect(html).toContain('Into the room (m)');
    expect(html).toContain('Front wall');
  });

  it('draws a placeholder square instead of failing on a zero dimension', () => {
    expect(render({ widthM: 0 })).toContain('role="img"');
  });
});
