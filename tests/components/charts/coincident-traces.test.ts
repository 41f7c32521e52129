import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { markCoincidentTraces, tracesCoincide } from '@/components/charts/coincident-traces';
import { FrequencyPlot } from '@/components/charts/frequency-plot';
import type { PlotTrace } from '@/components/charts/plot-types';
import { logGrid } from './helpers';

// Two subs at the same distance give the same seat response: the second hides the first unless
// the legend says so and the second is drawn with gaps. Tolerance 0.01 dB (the brief's choice).
const f = logGrid(20, 200, 12);
const sub = f.map((hz) => -12 * Math.log2(hz / 80));
const trace = (id: string, values: number[], extra: Partial<PlotTrace> = {}): PlotTrace => ({ id, label: id.toUpperCase(), color: '#123456', values, ...extra });

describe('tracesCoincide(a, b)', () => {
  it('is true within 0.01 at every point and false just outside it', () => {
    expect(tracesCoincide(sub, sub.map((v) => v + 0.009))).toBe(true);
    expect(tracesCoincide(sub, sub.map((v, i) => (i === 7 ? v + 0.011 : v)))).toBe(false);
  });

  it('treats a gap as equal only to a gap at the same sample', () => {
    expect(tracesCoincide([1, NaN, 3], [1, NaN, 3])).toBe(true);
    expect(tracesCoincide([1, NaN, 3], [1, 2, 3])).toBe(false);
    expect(tracesCoincide([1, 2], [1, 2, 3])).toBe(false);
  });
});

describe('markCoincidentTraces(traces)', () => {
  it('says "same as <first>" on each copy and gives each copy its own dash slot', () => {
    const [a, b, c, d] = markCoincidentTraces([trace('s1', sub), trace('s2', [...sub]), trace('sum', sub.map((v) => v + 6)), trace('s3', sub.map((v) => v + 0.005))]);
    expect(a?.note).toBeUndefined();
    expect(a?.dash).toBeUndefined();
    expect(b?.note).toBe('same as S1');
    expect(d?.note).toBe('same as S1');
    expect(c?.note).toBeUndefined();
    // Group of three: period 3 × 8 px; copy 1 draws 8..16 px, copy 2 draws 16..24 px (the first shows in 0..8).
    expect(b?.dash).toEqual({ dashPx: 8, gapPx: 16, offsetPx: -8 });
    expect(d?.dash).toEqual({ dashPx: 8, gapPx: 16, offsetPx: -16 });
  });

  it('keeps an existing note and returns unmatched traces unchanged', () => {
    const input = [trace('a', sub, { note: 'estimated' }), trace('b', sub, { note: 'estimated' }), trace('c', sub.map((v) => -v))];
    const out = markCoincidentTraces(input);
    expect(out[1]?.note).toBe('estimated; same as A');
    expect(out[0]).toBe(input[0]);
    expect(out[2]).toBe(input[2]);
  });
});

describe('FrequencyPlot with identical traces', () => {
  it('shows "same as" in the legend and draws the copy dashed over the first', () => {
    const html = renderToStaticMarkup(
      createElement(FrequencyPlot, {
        title: 'Seat response',
        frequencyHz: f,
        quantity: 'magnitude',
        widthPx: 800,
        traces: [trace('sub1', sub, { label: 'Sub 1' }), trace('sub2', [...sub], { label: 'Sub 2' })],
      }),
    );
    expect(html).toContain('(same as Sub 1)');
    const copy = html.match(/<path[^>]*data-trace="sub2"[^>]*>/)?.[0] ?? '';
    const first = html.match(/<path[^>]*data-trace="sub1"[^>]*>/)?.[0] ?? '';
    expect(copy).toMatch(/stroke-dasharray="8 8"/);
    expect(copy).toMatch(/stroke-dashoffset="-8"/);
    expect(first).not.toMatch(/stroke-dasharray/);
  });
});
