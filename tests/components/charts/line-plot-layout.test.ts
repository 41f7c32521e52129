import { describe, expect, it } from 'vitest';
import { axisTitle, decimalsForStep, linePlotLayout, plotYRange } from '@/components/charts/line-plot-layout';
import type { LinePlotLayoutInput } from '@/components/charts/line-plot-layout';
import type { AxisTicks } from '@/components/charts/plot-types';

// Default emphasis: 12 px type, lines and spaces at 1×.
const metrics = { fontPx: 12, lineScale: 1, space: 1 };
const ticksAt = (values: number[]) => (): AxisTicks => ({ major: values.map((v) => ({ value: v, label: String(v) })), minor: [] });

/** 400 × 200 px, y fixed at 0–10 with ticks 0, 5, 10, linear x 0–100 with ticks 0, 50, 100. */
function input(overrides: Partial<LinePlotLayoutInput> = {}): LinePlotLayoutInput {
  return {
    widthPx: 400,
    heightPx: 200,
    aspect: 0.5,
    metrics,
    yRange: [0, 10],
    yFixed: true,
    yTicks: [0, 5, 10],
    yTitle: false,
    topLabels: false,
    xScaleKind: 'linear',
    xDomain: [0, 100],
    xTicks: ticksAt([0, 50, 100]),
    legend: [],
    ...overrides,
  };
}

// Hand-computed for the example above:
//   left   = 4 characters × 12 px × 0.62 + 10 = 39.76   (the y labels "0", "5", "10" fit in the 4 reserved)
//   right  = 14, top = 12, bottom = 2.6 × 12 + 14 = 45.2
//   plot area 400 − 39.76 − 14 = 346.24 wide, 200 − 12 − 45.2 = 142.8 high.
describe('linePlotLayout(input)', () => {
  it('reserves margins for the tick labels and axis titles', () => {
    const layout = linePlotLayout(input());
    expect(layout.margin.left).toBeCloseTo(39.76, 9);
    expect(layout.margin.right).toBe(14);
    expect(layout.margin.top).toBe(12);
    expect(layout.margin.bottom).toBeCloseTo(45.2, 9);
    expect(layout.innerWidthPx).toBeCloseTo(346.24, 9);
    expect(layout.innerHeightPx).toBeCloseTo(142.8, 9);
  });

  it('adds room for a y title on the left (12 + 8 px) and for marker labels on top (12 + 4 px)', () => {
    const layout = linePlotLayout(input({ yTitle: true, topLabels: true }));
    expect(layout.margin.left).toBeCloseTo(59.76, 9);
    expect(layout.margin.top).toBe(28);
    expect(layout.innerWidthPx).toBeCloseTo(326.24, 9);
    expect(layout.innerHeightPx).toBeCloseTo(126.8, 9);
  });

  it('places every x tick: 0, 50 and 100 at 0, 173.12 and 346.24 px', () => {
    const { xTicks } = linePlotLayout(input());
    expect(xTicks.major.map((t) => t.value)).toEqual([0, 50, 100]);
    expect(xTicks.major.map((t) => t.label)).toEqual(['0', '50', '100']);
    const px = xTicks.major.map((t) => t.px);
    expect(px).toHaveLength(3);
    [0, 173.12, 346.24].forEach((expected, i) => expect(px[i]).toBeCloseTo(expected, 9));
  });

  it('places every y tick top-down: 10 at 0 px, 5 at 71.4 px, 0 at 142.8 px, labelled without decimals', () => {
    const { yTicks, yTickDigits } = linePlotLayout(input());
    expect(yTicks.map((t) => t.value)).toEqual([0, 5, 10]);
    expect(yTicks.map((t) => t.label)).toEqual(['0', '5', '10']);
    [142.8, 71.4, 0].forEach((expected, i) => expect(yTicks[i]?.px).toBeCloseTo(expected, 9));
    expect(yTickDigits).toBe(0);
  });

  it('puts log-axis decades equally apart: 10, 100, 1k at 0, ½ and all of the width', () => {
    const layout = linePlotLayout(input({ xScaleKind: 'log', xDomain: [10, 1000], xTicks: ticksAt([10, 100, 1000]) }));
    [0, 173.12, 346.24].forEach((expected, i) => expect(layout.xTicks.major[i]?.px).toBeCloseTo(expected, 9));
    expect(layout.xAt(173.12)).toBeCloseTo(100, 9);
  });

  it('passes the plot-area width and the font size to the x tick function, and places its minor ticks', () => {
    const seen: number[][] = [];
    const layout = linePlotLayout(
      input({
        xTicks: (innerWidthPx, fontPx) => {
          seen.push([innerWidthPx, fontPx]);
          return { major: [], minor: [25, 75] };
        },
      }),
    );
    expect(seen).toHaveLength(1);
    expect(seen[0]?.[0]).toBeCloseTo(346.24, 9);
    expect(seen[0]?.[1]).toBe(12);
    expect(layout.xTicks.minor.map((t) => t.value)).toEqual([25, 75]);
    [86.56, 259.68].forEach((expected, i) => expect(layout.xTicks.minor[i]?.px).toBeCloseTo(expected, 9));
  });

  it('rounds an automatic y range outwards and ticks it about every 36 px', () => {
    // [−0.4, 9.6] rounds out to [−1, 10]; 138.8 px of guessed height / 36 ≈ 4 ticks → a step of 2.
    const layout = linePlotLayout(input({ yRange: [-0.4, 9.6], yFixed: false, yTicks: undefined }));
    expect(layout.yDomain).toEqual([-1, 10]);
    expect(layout.yTicks.map((t) => t.value)).toEqual([0, 2, 4, 6, 8, 10]);
    expect(layout.yTicks[0]?.px).toBeCloseTo((142.8 * 10) / 11, 9);
    expect(layout.yTicks[5]?.px).toBeCloseTo(0, 9);
  });

  it('widens the left margin for y labels longer than the reserved characters', () => {
    // "−0.05" is 5 characters: 5 × 12 × 0.62 + 10 = 47.2; the labels take two decimals from the 0.05 step.
    const layout = linePlotLayout(input({ yRange: [-0.05, 0.05], yTicks: [-0.05, 0, 0.05] }));
    expect(layout.yTicks.map((t) => t.label)).toEqual(['\u22120.05', '0.00', '0.05']);
    expect(layout.margin.left).toBeCloseTo(47.2, 9);
  });

  it('sizes the height from the width and aspect within 200–520 px', () => {
    expect(linePlotLayout(input({ heightPx: undefined, widthPx: 800, aspect: 0.5 })).heightPx).toBe(400);
    expect(linePlotLayout(input({ heightPx: undefined, widthPx: 300, aspect: 0.5 })).heightPx).toBe(200);
    expect(linePlotLayout(input({ heightPx: undefined, widthPx: 1600, aspect: 0.5 })).heightPx).toBe(520);
  });

  it('lays the download legend out in rows of 22 px, wrapping before the right margin', () => {
    // Item widths: 26 + characters × 7.2 + 16 → "Sum" 63.6, "Mains (estimated)" 164.4, the third 193.2.
    const { exportLegend } = linePlotLayout(input({ legend: [{ label: 'Sum' }, { label: 'Mains', note: 'estimated' }, { label: 'Very long trace label' }] }));
    expect(exportLegend.items).toHaveLength(3);
    const expected = [
      [39.76, 11],
      [103.36, 11],
      [39.76, 33],
    ];
    exportLegend.items.forEach((item, i) => {
      expect(item.xPx).toBeCloseTo(expected[i]![0]!, 9);
      expect(item.yPx).toBeCloseTo(expected[i]![1]!, 9);
    });
    expect(exportLegend.heightPx).toBe(52);
  });

  it('draws no download legend when no trace is shown', () => {
    expect(linePlotLayout(input()).exportLegend).toEqual({ items: [], heightPx: 0 });
  });
});

describe('plotYRange(yDomain, series)', () => {
  it('keeps a fixed domain', () => {
    expect(plotYRange([-30, 6], [[100]])).toEqual([-30, 6]);
  });
  it('pads the finite extent of every series by 5 % each side', () => {
    expect(plotYRange(undefined, [[0, NaN, 4], [10, -Infinity]])).toEqual([-0.5, 10.5]);
  });
  it('opens a single value to ±1 and falls back to 0–1 without data', () => {
    expect(plotYRange(undefined, [[3, 3]])).toEqual([2, 4]);
    expect(plotYRange(undefined, [[NaN], []])).toEqual([0, 1]);
  });
});

describe('decimalsForStep(step) and axisTitle(label, unit)', () => {
  it('gives the decimals that tell ticks apart', () => {
    expect(decimalsForStep(5)).toBe(0);
    expect(decimalsForStep(0.5)).toBe(1);
    expect(decimalsForStep(0.25)).toBe(1);
    expect(decimalsForStep(0.05)).toBe(2);
    expect(decimalsForStep(0)).toBe(0);
  });
  it('writes the unit in brackets and the degree sign as a word', () => {
    expect(axisTitle('Level', 'dB')).toBe('Level (dB)');
    expect(axisTitle('Phase', '°')).toBe('Phase (degrees)');
    expect(axisTitle(undefined, 'ms')).toBe('ms');
    expect(axisTitle('Spread', undefined)).toBe('Spread');
  });
});
