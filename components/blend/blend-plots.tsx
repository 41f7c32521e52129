'use client';

import { useMemo, useRef } from 'react';
import { ChartExportButtons, FrequencyPlot, chartColors, type FrequencyCsvData, type FrequencyMarker, type FrequencyPlotProps } from '@/components/charts';
import type { BlendAnswer } from '@/lib/system-model/blend';
import { blendCsv, blendTraces, groupDelayDomain, magnitudeDomain } from './blend-series';

type SectionProps = Omit<FrequencyPlotProps, 'ref'> & { label: string; filename: string; subject: string; csv: FrequencyCsvData | undefined; className: string };

/** One plot of Blend with its download buttons below it. */
function BlendPlotSection({ label, filename, subject, csv, className, ...plot }: SectionProps) {
  const ref = useRef<SVGSVGElement>(null);
  return (
    <section aria-label={label} className={`flex flex-col gap-1 ${className}`}>
      <FrequencyPlot ref={ref} {...plot} />
      <ChartExportButtons svgRef={ref} filename={filename} csv={csv} subject={subject} />
    </section>
  );
}

interface BlendPlotsProps {
  data: BlendAnswer | undefined;
  stopHz: number;
  crossoverHz: number;
  markers: FrequencyMarker[];
  /** File names start with this, e.g. "blend-L-80hz". */
  fileBase: string;
  hidden: ReadonlySet<string>;
  onToggle: (traceId: string) => void;
  cursorHz: number | null;
  onCursorHz: (hz: number | null) => void;
}

/**
 * Magnitude, phase and group delay of the blend, stacked under one crosshair and one legend (on the magnitude plot).
 * On a narrow screen Blend's panel places the magnitude plot above its settings and the other two below (max-lg:order-*).
 */
export function BlendPlots({ data, stopHz, crossoverHz, markers, fileBase, hidden, onToggle, cursorHz, onCursorHz }: BlendPlotsProps) {
  const traces = useMemo(() => blendTraces(data), [data]);
  const csv = useMemo(() => blendCsv(data), [data]);
  // The three plots share the band, the markers, the hidden traces and the crosshair, with their plot areas lined up.
  const shared = { frequencyHz: data?.frequencyHz ?? [], maxHz: stopHz, markers, yAxisChars: 4, hidden, onToggle, cursorHz, onCursorHz, csv };
  return (
    <>
      <BlendPlotSection
        label="Magnitude"
        className="max-lg:order-2"
        filename={`${fileBase}-magnitude`}
        subject="blend magnitude"
        title="Blend magnitude"
        description={`Level of the mains, each sub and their sum at the MLP; flat target dashed at 0 dB; crossover ${Math.round(crossoverHz)} Hz.`}
        quantity="magnitude"
        traces={traces.magnitude}
        references={[{ value: 0, label: 'Flat target', color: chartColors.target, dashed: true }]}
        yDomain={magnitudeDomain(data, stopHz)}
        aspect={0.42}
        {...shared}
      />
      <BlendPlotSection
        label="Phase"
        className="max-lg:order-5"
        filename={`${fileBase}-phase`}
        subject="blend phase"
        title="Blend phase"
        description="Phase of the mains, each sub and the sum, wrapped to ±180°, relative to the first arrival at the MLP."
        quantity="phase"
        traces={traces.phase}
        showLegend={false}
        aspect={0.28}
        {...shared}
      />
      <BlendPlotSection
        label="Group delay"
        className="max-lg:order-5"
        filename={`${fileBase}-group-delay`}
        subject="group delay"
        title="Group delay of the sum"
        description="Group delay of the summed response, ms, relative to the first arrival at the MLP."
        quantity="group-delay"
        traces={traces.groupDelay}
        yDomain={groupDelayDomain(data)}
        valueDigits={2}
        showLegend={false}
        aspect={0.24}
        {...shared}
      />
    </>
  );
}
