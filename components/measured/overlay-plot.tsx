'use client';

import { useMemo, useRef, useState } from 'react';
import { ChartExportButtons, FrequencyPlot, chartColors, finiteExtent, formatSigned, overlayColors, type PlotTrace } from '@/components/charts';
import { useSystem } from '@/components/system/system-context';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { bandPowerAverageDb, logFrequencyGridHz, resampleCurve, smoothFractionalOctave } from '@/dsp';
import { useCompute } from '@/lib/hooks/use-compute';
import { blendRequestFromDocument, type BlendAnswer } from '@/lib/system-model/blend';
import type { CurveItem } from './measurement-list';

export const OVERLAY_COLORS = overlayColors;

const DISPLAY = { startHz: 10, stopHz: 20000, pointsPerOctave: 48 } as const;

interface OverlayCurve {
  item: CurveItem;
  frequencyHz: number[];
  magnitudeDb: number[];
}

interface Props {
  curves: OverlayCurve[];
  offsets: Record<string, number>;
  onOffset: (id: string, offsetDb: number) => void;
  smoothing: number;
}

/** Chosen measurements over the model's curves, smoothed, each shifted by its level offset. */
export function OverlayPlot({ curves, offsets, onOffset, smoothing }: Props) {
  const { doc } = useSystem();
  const svgRef = useRef<SVGSVGElement>(null);
  const [band, setBand] = useState({ startHz: 100, stopHz: 400 });
  const [alignError, setAlignError] = useState<string | null>(null);
  const modelBody = useMemo(() => blendRequestFromDocument(doc, DISPLAY), [doc]);
  const model = useCompute<BlendAnswer>('/api/v1/blend', modelBody);
  const grid = useMemo(() => logFrequencyGridHz(DISPLAY), []);

  // Smoothed on each file's own points (right for dense files), then resampled to the display grid; blank outside the file's range.
  const shown = useMemo(
    () =>
      curves.map((c) => {
        const smoothed = smoothing > 0 ? smoothFractionalOctave({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb, fraction: smoothing }).magnitudeDb : c.magnitudeDb;
        const r = resampleCurve({ frequencyHz: c.frequencyHz, magnitudeDb: smoothed, targetHz: grid });
        const lo = c.frequencyHz[0] ?? 0;
        const hi = c.frequencyHz[c.frequencyHz.length - 1] ?? 0;
        return { id: c.item.id, values: Array.from(r.magnitudeDb, (v, i) => ((grid[i] as number) < lo * (1 - 1e-9) || (grid[i] as number) > hi * (1 + 1e-9) ? NaN : v)) };
      }),
    [curves, smoothing, grid],
  );

  const traces: PlotTrace[] = [];
  if (model.data && model.data.frequencyHz.length === grid.length) {
    traces.push({ id: 'model-sum', label: 'Model: sum', values: model.data.sum.magnitudeDb, color: chartColors.sum, width: 2, dashed: true, note: 'unit level' });
    model.data.paths.forEach((p, k) => traces.push({ id: `model-${k}`, label: `Model: ${p.name}`, values: p.magnitudeDb, color: k === 0 ? chartColors.mains : chartColors.sub, width: 1.5, dashed: true }));
  }
  curves.forEach((c, k) => {
    const offset = offsets[c.item.id] ?? 0;
    const values = shown[k]?.values ?? [];
    traces.push({
      id: c.item.id,
      label: c.item.name,
      values: offset ? values.map((v) => v + offset) : values,
      color: OVERLAY_COLORS[k % OVERLAY_COLORS.length] as string,
      width: 2,
      ...(offset ? { note: formatSigned(offset, "dB", 1) } : {}),
    });
  });

  // The y range follows what is drawn: the measured curves and the model sum, not the deep skirts of hidden paths.
  const extent = finiteExtent(traces.filter((t) => t.id === 'model-sum' || !t.id.startsWith('model-')).map((t) => t.values));
  const yDomain: [number, number] | undefined = extent ? [Math.floor((Math.max(extent[0], extent[1] - 100) - 5) / 10) * 10, Math.ceil((extent[1] + 5) / 10) * 10] : undefined;

  function alignToModel(c: OverlayCurve) {
    setAlignError(null);
    if (!model.data) return setAlignError('The model is still being computed; try again in a moment.');
    try {
      const target = bandPowerAverageDb({ frequencyHz: model.data.frequencyHz, magnitudeDb: model.data.sum.magnitudeDb, ...band }).levelDb;
      const own = bandPowerAverageDb({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb, ...band }).levelDb;
      onOffset(c.item.id, Math.round((target - own) * 10) / 10);
    } catch (e) {
      setAlignError(`${c.item.name}: ${e instanceof Error ? e.message : 'cannot be aligned in that band'}.`);
    }
  }

  return (
    <section aria-labelledby="overlay-title" className="flex flex-col gap-3 rounded-lg border border-line bg-white p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="overlay-title" className="text-sm font-semibold">
          Overlay on the model
        </h3>
        <ChartExportButtons svgRef={svgRef} filename="measured-overlay" subject="overlay" />
      </div>
      {curves.length === 0 ? <p className="text-sm text-ink-faint">Tick measurements in the list to overlay them on the model&apos;s curves (dashed).</p> : null}
      <FrequencyPlot
        ref={svgRef}
        title="Measurements overlaid on the model"
        description="Measured magnitudes, smoothed and level-shifted, over the model's magnitude of each path and of the sum (dashed, at unit level)."
        quantity="magnitude"
        frequencyHz={grid}
        maxHz={20000}
        traces={traces}
        defaultHidden={['model-0', ...doc.subs.map((_s, k) => `model-${k + 1}`)]}
        markers={[{ hz: doc.bassManagement.crossoverHz, label: 'Crossover', dashed: true }]}
        aspect={0.42}
        {...(yDomain ? { yDomain } : {})}
      />
      {curves.length ? (
        <div className="flex flex-col gap-2">
          <div className="flex flex-wrap items-end gap-3">
            <p className="w-full text-xs text-ink-soft">Level-align a curve by an offset, or to the model sum&apos;s power average over a band:</p>
            <NumberField label="Band from" unit="Hz" value={band.startHz} min={10} max={20000} step={10} onChange={(v) => setBand((b) => ({ ...b, startHz: v }))} />
            <NumberField label="Band to" unit="Hz" value={band.stopHz} min={10} max={20000} step={10} onChange={(v) => setBand((b) => ({ ...b, stopHz: v }))} />
          </div>
          {alignError ? <p className="text-xs text-fail" role="alert">{alignError}</p> : null}
          <ul className="flex flex-col gap-2">
            {curves.map((c, k) => (
              <li key={c.item.id} className="flex flex-wrap items-end gap-2">
                <span aria-hidden className="mb-2 inline-block h-1 w-5 rounded" style={{ background: OVERLAY_COLORS[k % OVERLAY_COLORS.length] }} />
                <NumberField label={`${c.item.name} offset`} unit="dB" value={offsets[c.item.id] ?? 0} min={-150} max={150} step={0.5} digits={1} onChange={(v) => onOffset(c.item.id, v)} />
                <Button variant="secondary" className="px-2 py-1.5 text-xs" onClick={() => alignToModel(c)}>
                  Align to model in band
                </Button>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}
