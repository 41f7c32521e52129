import { createElement, createRef } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import * as charts from '@/components/charts';

describe('components/charts index', () => {
  it('re-exports every chart and the export helpers', () => {
    for (const name of ['FrequencyPlot', 'XYPlot', 'BarChart', 'HeatMap', 'ColumnChart', 'ChartExportButtons', 'frequencyCsv', 'downloadSvg', 'downloadPng', 'logTicks'] as const) {
      expect(typeof charts[name]).toBe('function');
    }
  });

  it('ChartExportButtons offers SVG and PNG, and CSV only when given data', () => {
    const svgRef = createRef<SVGSVGElement>();
    const without = renderToStaticMarkup(createElement(charts.ChartExportButtons, { svgRef, filename: 'blend' }));
    expect(without).toContain('>SVG</button>');
    expect(without).toContain('>PNG</button>');
    expect(without).not.toContain('CSV');
    const withCsv = renderToStaticMarkup(
      createElement(charts.ChartExportButtons, { svgRef, filename: 'blend', subject: 'blend magnitude', csv: { frequencyHz: [20], columns: [{ name: 'sum_db', values: [0] }] } }),
    );
    expect(withCsv).toContain('aria-label="Download blend magnitude data as CSV"');
  });
});
