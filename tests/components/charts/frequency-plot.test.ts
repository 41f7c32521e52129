import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { FrequencyPlot, formatHzReadout, frequencyAxisTicks } from '@/components/charts/frequency-plot';
import type { FrequencyPlotProps } from '@/components/charts/frequency-plot';
import { chartMetrics, traceStyles } from '@/components/charts/theme';
import { attrNumbers, expectStrictlyIncreasing, logGrid, subpathCount, tracePathD, xTickPositions } from './helpers';

const f = logGrid(10, 1000, 12);
const flat = f.map(() => 0);
const rising = f.map((hz) => 20 * Math.log10(hz / 100));

function render(props: Partial<FrequencyPlotProps> = {}): string {
  return renderToStaticMarkup(
    createElement(FrequencyPlot, {
      title: 'Blend magnitude',
      frequencyHz: f,
      quantity: 'magnitude',
      widthPx: 800,
      traces: [
        { id: 'mains', label: 'Mains', values: rising, ...traceStyles.mains },
        { id: 'sum', label: 'Sum', values: flat, ...traceStyles.sum },
      ],
      ...props,
    }),
  );
}

describe('FrequencyPlot', () => {
  it('is an accessible image with a title and description', () => {
    const html = render();
    expect(html).toMatch(/<svg[^>]*role="img"/);
    expect(html).toMatch(/<title id="[^"]+">Blend magnitude<\/title>/);
    expect(html).toContain('aria-describedby');
    expect(html).toContain('Frequency (Hz) from 10');
  });

  it('labels 10 … 1k by default, placed left to right in order', () => {
    const ticks = xTickPositions(render());
    expect(ticks.map((t) => t.value)).toEqual([10, 20, 50, 100, 200, 500, 1000]);
    expectStrictlyIncreasing(ticks.map((t) => t.px));
    expect(ticks[0]!.px).toBeCloseTo(0, 6);
  });

  it('places ticks on a log scale: 10→100 spans the same width as 100→1k', () => {
    const ticks = xTickPositions(render());
    const px = new Map(ticks.map((t) => [t.value, t.px]));
    expect([...px.keys()]).toEqual(expect.arrayContaining([10, 100, 1000]));
    expect(px.get(100)! - px.get(10)!).toBeCloseTo(px.get(1000)! - px.get(100)!, 6);
  });

  it('labels a 20 Hz–2 kHz axis at 20, 50, 100 … 2k, the decades equally apart', () => {
    const ticks = xTickPositions(render({ minHz: 20, maxHz: 2000 }));
    expect(ticks.map((t) => t.value)).toEqual([20, 50, 100, 200, 500, 1000, 2000]);
    expect(render({ minHz: 20, maxHz: 2000 })).toMatch(/data-x-tick="1000"[^>]*>1k<\/text>/);
    const px = new Map(ticks.map((t) => [t.value, t.px]));
    expect(px.get(20)).toBeCloseTo(0, 6);
    // 20 Hz → 200 Hz is one decade of two: half the width.
    expect(px.get(200)! * 2).toBeCloseTo(px.get(2000)!, 6);
    expect(px.get(1000)! - px.get(100)!).toBeCloseTo(px.get(200)! - px.get(20)!, 6);
  });

  it('keeps only the decade labels 100 and 1k on a narrow 20 Hz–2 kHz plot', () => {
    const ticks = xTickPositions(render({ minHz: 20, maxHz: 2000, widthPx: 160 }));
    expect(ticks.map((t) => t.value)).toEqual([100, 1000]);
    expect(attrNumbers(render({ minHz: 20, maxHz: 2000, widthPx: 160 }), 'data-minor-tick')).toEqual(expect.arrayContaining([20, 50, 200, 500, 2000]));
  });

  it('extends to 20k and clamps maxHz above 20 kHz', () => {
    const wide = logGrid(10, 20_000, 6);
    const html = render({ frequencyHz: wide, maxHz: 40_000, traces: [{ id: 's', label: 'Sum', values: wide.map(() => 0), color: '#000' }] });
    const values = xTickPositions(html).map((t) => t.value);
    expect(values.at(-1)).toBe(20_000);
    expect(values).toContain(5000);
  });

  it('draws minor grid lines at 30, 40, 60 … 900 Hz', () => {
    const minors = attrNumbers(render(), 'data-minor-tick');
    expect(minors).toContain(30);
    expect(minors).toContain(900);
    expect(minors).not.toContain(100);
  });

  it('thins the labels to whole decades on a 375 px phone with the full band', () => {
    const ticks = frequencyAxisTicks(10, 20_000, 300, chartMetrics().fontPx);
    expect(ticks.major.map((t) => t.label)).toEqual(['10', '100', '1k', '10k']);
    expect(ticks.minor).toContain(20);
  });

  it('places y ticks top to bottom in decreasing value', () => {
    const html = render();
    const values = attrNumbers(html, 'data-y-tick');
    expect(values.length).toBeGreaterThanOrEqual(3);
    // The traces span −20…19.6 dB; padded by 5 % and rounded out to ±25, one tick per 36 px of 400 px is a step of 5.
    expect(values).toEqual([-25, -20, -15, -10, -5, 0, 5, 10, 15, 20, 25]);
    expectStrictlyIncreasing(values);
    const ys = [...html.matchAll(/data-y-tick="[^"]*" x="[^"]*" y="([^"]*)"/g)].map((m) => Number(m[1]));
    expectStrictlyIncreasing(ys.map((y) => -y));
  });

  it('writes the unit on the y axis title', () => {
    expect(render()).toContain('Level (dB)');
    expect(render({ quantity: 'group-delay' })).toContain('Group delay (ms)');
    expect(render({ quantity: 'phase', traces: [] })).toContain('Phase (degrees)');
  });

  it('breaks the path at NaN and Infinity values', () => {
    const values = flat.slice();
    values[10] = NaN;
    values[30] = -Infinity;
    const d = tracePathD(render({ traces: [{ id: 'sum', label: 'Sum', values, color: '#000' }] }), 'sum');
    expect(d).not.toBeNull();
    expect(subpathCount(d!)).toBe(3);
    expect(d).not.toMatch(/NaN|Infinity/);
  });

  it('does not draw phase wrap jumps from +180° to −180°', () => {
    // A phase that falls steadily and wraps twice over the band.
    const phase = f.map((_, i) => {
      const unwrapped = 170 - i * 9;
      return ((((unwrapped + 180) % 360) + 360) % 360) - 180;
    });
    const html = render({ quantity: 'phase', traces: [{ id: 'ph', label: 'Sum phase', values: phase, color: '#000' }] });
    const d = tracePathD(html, 'ph')!;
    const wraps = phase.filter((v, i) => i > 0 && Math.abs(v - phase[i - 1]!) > 180).length;
    expect(wraps).toBeGreaterThan(0);
    expect(subpathCount(d)).toBe(wraps + 1);
    expect(attrNumbers(html, 'data-y-tick')).toEqual([-180, -90, 0, 90, 180]);
  });

  it('hides a trace whose id is in `hidden` and marks its legend button not pressed', () => {
    const html = render({ hidden: new Set(['mains']), onToggle: () => {} });
    expect(tracePathD(html, 'mains')).toBeNull();
    expect(tracePathD(html, 'sum')).not.toBeNull();
    expect(html).toMatch(/<button[^>]*aria-pressed="false"[^>]*title="Show Mains"/);
    expect(html).toMatch(/<button[^>]*aria-pressed="true"[^>]*title="Hide Sum"/);
  });

  it('starts with `defaultHidden` traces hidden when it owns the legend', () => {
    expect(tracePathD(render({ defaultHidden: ['sum'] }), 'sum')).toBeNull();
  });

  it('draws reference lines dashed and vertical markers with labels', () => {
    const html = render({ references: [{ value: 0, label: 'Target' }], markers: [{ hz: 80, label: 'Crossover' }] });
    expect(html).toMatch(/data-reference="0"><line[^>]*stroke="#64748B"[^>]*stroke-dasharray="6 4"/);
    expect(html).toContain('data-marker="80"');
    expect(html).toContain('Crossover');
  });

  it('shows a controlled crosshair with a read-out of every visible trace', () => {
    const html = render({ cursorHz: 80, onCursorHz: () => {}, hidden: new Set(['mains']) });
    expect(html).toContain('data-part="crosshair"');
    expect(html).toContain('80.0\u2009Hz');
    expect(html).toContain('data-reading="sum"');
    expect(html).not.toContain('data-reading="mains"');
    expect(html).toContain('0.0\u2009dB');
  });

  it('reads the nearest sample and shows a dash where the value is missing', () => {
    const values = flat.slice();
    const i = f.findIndex((hz) => Math.abs(hz - 40) < 1e-6);
    values[i] = NaN;
    const html = render({ cursorHz: 40.5, traces: [{ id: 'sum', label: 'Sum', values, color: '#000' }] });
    expect(html).toContain('40.0\u2009Hz');
    expect(html).toMatch(/data-reading="sum">.*—/);
  });

  it('stacked plots given the same cursorHz draw their crosshairs at the same x', () => {
    const crosshairX = (html: string) => Number(html.match(/data-part="crosshair"[^>]*><line x1="([^"]+)"/)?.[1]);
    const magnitude = render({ cursorHz: 80 });
    const phase = render({ cursorHz: 80, quantity: 'phase', yDomain: undefined, traces: [{ id: 'ph', label: 'Phase', values: flat, color: '#000' }] });
    expect(crosshairX(magnitude)).toBeGreaterThan(0);
    expect(crosshairX(phase)).toBeCloseTo(crosshairX(magnitude), 6);
  });

  it('shows no crosshair when cursorHz is null', () => {
    expect(render({ cursorHz: null })).not.toContain('data-part="crosshair"');
  });

  it('scales type and lines for the projector', () => {
    const normal = render();
    const big = render({ emphasis: 'projector' });
    expect(normal).toContain('font-size:12px');
    expect(big).toContain('font-size:20px');
    const width = (html: string) => Number(html.match(/data-trace="sum"[^>]*stroke-width="([^"]+)"/)?.[1]);
    expect(width(big)).toBeGreaterThan(width(normal));
    expect(width(normal)).toBe(3);
  });

  it('uses a monospace, tabular-figure font for tick numbers', () => {
    expect(render()).toMatch(/data-x-tick="10"[^>]*style="font-family:var\(--font-mono[^"]*font-variant-numeric:tabular-nums/);
  });
});

describe('formatHzReadout(hz)', () => {
  it('writes Hz below 1 kHz and kHz above', () => {
    expect(formatHzReadout(82.37)).toBe('82.4\u2009Hz');
    expect(formatHzReadout(315.4)).toBe('315\u2009Hz');
    expect(formatHzReadout(1250)).toBe('1.25\u2009kHz');
  });
});
