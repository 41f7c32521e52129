'use client';

import { useId, useMemo, useRef, useState } from 'react';
import { ChartExportButtons, FrequencyPlot, traceStyles } from '@/components/charts';
import type { ProcessorOutput } from '@/lib/system-model/processor-filters';

type Shown = 'level' | 'phase';

/**
 * One output's digital filters against their analog prototype: both magnitudes, and the difference (level in dB or
 * phase in degrees) where the analog level is above the deviation floor — below it the two differ by design (the
 * digital stop band falls to nothing at the Nyquist frequency) and nobody hears it.
 */
export function DigitalAnalogPlot({ output, frequencyHz, title }: { output: ProcessorOutput; frequencyHz: Float64Array; title: string }) {
  const id = useId();
  const levelRef = useRef<SVGSVGElement>(null);
  const differenceRef = useRef<SVGSVGElement>(null);
  const [shown, setShown] = useState<Shown>('level');
  const r = output.result;
  const style = output.kind === 'main' ? traceStyles.mains : traceStyles.sub;
  const maxHz = frequencyHz[frequencyHz.length - 1] ?? 20000;
  const masked = useMemo(() => {
    if (!r) return null;
    const floor = r.deviation.floorDb;
    const keep = (values: Float64Array) => Array.from(values, (v, i) => ((r.analog.magnitudeDb[i] as number) >= floor ? v : Number.NaN));
    return { level: keep(r.difference.magnitudeDb), phase: keep(r.difference.phaseDeg) };
  }, [r]);
  if (!r || !masked) return null;
  const top = Math.max(6, Math.ceil(Math.max(...r.response.magnitudeDb, ...r.analog.magnitudeDb) + 3));
  return (
    <div className="grid min-w-0 gap-4 lg:grid-cols-2">
      <div className="flex min-w-0 flex-col gap-2">
        <FrequencyPlot
          ref={levelRef}
          title={`${title}: digital and analog level`}
          description="The level of the digital biquads at this sample rate (solid) and of the analog filters they stand for (dashed)."
          quantity="magnitude"
          frequencyHz={frequencyHz}
          maxHz={maxHz}
          yDomain={[-60, top]}
          traces={[
            { id: 'digital', label: 'Digital (biquads)', values: r.response.magnitudeDb, ...style },
            { id: 'analog', label: 'Analog prototype', values: r.analog.magnitudeDb, ...traceStyles.target },
          ]}
          aspect={0.55}
          yAxisChars={6}
        />
        <ChartExportButtons svgRef={levelRef} filename={`processor-filters-${title}-level`} subject={`${title} level`} />
      </div>
      <div className="flex min-w-0 flex-col gap-2">
        <FrequencyPlot
          ref={differenceRef}
          title={`${title}: digital minus analog, ${shown}`}
          description={`Digital minus analog ${shown === 'level' ? 'level, dB' : 'phase, degrees'}, where the analog level is above ${r.deviation.floorDb} dB (left out below it).`}
          quantity="custom"
          yLabel={shown === 'level' ? 'Digital − analog' : 'Phase difference'}
          yUnit={shown === 'level' ? 'dB' : '°'}
          valueDigits={shown === 'level' ? 4 : 3}
          frequencyHz={frequencyHz}
          maxHz={maxHz}
          traces={[{ id: 'difference', label: shown === 'level' ? 'Level difference' : 'Phase difference', values: shown === 'level' ? masked.level : masked.phase, ...style }]}
          references={[{ value: 0 }]}
          showLegend={false}
          aspect={0.55}
          yAxisChars={6}
        />
        <div className="flex flex-wrap items-center justify-between gap-2">
          <div role="radiogroup" aria-label="Difference shown" className="flex flex-wrap gap-3 text-sm">
            {(['level', 'phase'] as const).map((s) => (
              <label key={s} className="inline-flex items-center gap-1.5">
                <input type="radio" name={`${id}-difference`} checked={shown === s} onChange={() => setShown(s)} className="accent-mains" />
                {s === 'level' ? 'Level difference (dB)' : 'Phase difference (°)'}
              </label>
            ))}
          </div>
          <ChartExportButtons svgRef={differenceRef} filename={`processor-filters-${title}-difference`} subject={`${title} difference`} />
        </div>
      </div>
    </div>
  );
}
