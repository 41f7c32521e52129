'use client';

import { useMemo, useRef, useState } from 'react';
import { ChartExportButtons, FrequencyPlot, chartColors, finiteExtent, formatHzReadout, formatSigned, overlayColors, subColors, type PlotTrace } from '@/components/charts';
import { useSystem } from '@/components/system/system-context';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { logFrequencyGridHz, resampleCurve, smoothFractionalOctave } from '@/dsp';
import { useCompute } from '@/lib/hooks/use-compute';
import { blendRequestFromDocument, type BlendAnswer } from '@/lib/system-model/blend';
import { measurementRoleKind, overlayAlignBandHz, overlayAlignOffsetDb } from '@/lib/system-model/measured';
import type { CurveItem } from './measurement-list';

const DISPLAY = { startHz: 10, stopHz: 20000, pointsPerOctave: 48 } as const;

interface OverlayCurve {
  item: CurveItem;
  frequencyHz: number[];
  magnitudeDb: number[];
}

interface Props {
  curves: OverlayCurve[];
  /** Offsets the user set (typed, or aligned in a band of their own); a curve without one follows the automatic alignment. */
  offsets: Record<string, number>;
  onOffset: (id: string, offsetDb: number) => void;
  /** Forget the offsets the user set: every curve follows the automatic alignment again. */
  onClearOffsets: () => void;
  smoothing: number;
}

/** Colours by role, as on every other plot (components/charts/theme.ts): the first mains file teal, sub files amber to brown, the rest hues apart from both. */
function curveColors(curves: OverlayCurve[]): string[] {
  const others = overlayColors.slice(2);
  let mains = 0;
  let subs = 0;
  let other = 0;
  return curves.map((c) => {
    const kind = measurementRoleKind(c.item.role);
    if (kind === 'mains' && mains++ === 0) return chartColors.mains;
    if (kind === 'sub') return subColors[subs++ % subColors.length] as string;
    return others[other++ % others.length] as string;
  });
}

/**
 * Chosen measurements over the model's curves, smoothed. A file holds absolute levels (often 55–90 dB SPL) and the model
 * sits at unit level (0 dB), so each curve is shifted by default to meet the model sum in its own passband (by its role),
 * and the plot says by how much; "Show absolute levels" turns that off. A typed offset, or one aligned in a band of the
 * user's, wins over the automatic one.
 */
export function OverlayPlot({ curves, offsets, onOffset, onClearOffsets, smoothing }: Props) {
  const { doc } = useSystem();
  const svgRef = useRef<SVGSVGElement>(null);
  const [band, setBand] = useState({ startHz: 100, stopHz: 400 });
  const [absolute, setAbsolute] = useState(false);
  const [alignError, setAlignError] = useState<string | null>(null);
  const modelBody = useMemo(() => blendRequestFromDocument(doc, DISPLAY), [doc]);
  const model = useCompute<BlendAnswer>('/api/v1/blend', modelBody);
  const grid = useMemo(() => logFrequencyGridHz(DISPLAY), []);
  const colors = curveColors(curves);
  const fc = doc.bassManagement.crossoverHz;

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

  // The automatic alignment of each curve: its band by role and the offset that meets the model sum there.
  const modelSum = useMemo(
    () => (model.data && model.data.frequencyHz.length === grid.length ? { frequencyHz: model.data.frequencyHz, magnitudeDb: model.data.sum.magnitudeDb } : null),
    [model.data, grid],
  );
  const auto = useMemo(
    () =>
      curves.map((c) => {
        const b = overlayAlignBandHz(c.item.role, fc, c.frequencyHz);
        const offsetDb = b && modelSum ? overlayAlignOffsetDb(modelSum, c, b) : null;
        return { band: b, offsetDb };
      }),
    [curves, fc, modelSum],
  );
  const offsetOf = (c: OverlayCurve, k: number): number => offsets[c.item.id] ?? (absolute ? 0 : (auto[k]?.offsetDb ?? 0));

  const traces: PlotTrace[] = [];
  if (modelSum && model.data) {
    traces.push({ id: 'model-sum', label: 'Model: sum', values: model.data.sum.magnitudeDb, color: chartColors.sum, width: 2, dashed: true, note: 'unit level' });
    model.data.paths.forEach((p, k) => traces.push({ id: `model-${k}`, label: `Model: ${p.name}`, values: p.magnitudeDb, color: k === 0 ? chartColors.mains : chartColors.sub, width: 1.5, dashed: true }));
  }
  curves.forEach((c, k) => {
    const offset = offsetOf(c, k);
    const values = shown[k]?.values ?? [];
    traces.push({ id: c.item.id, label: c.item.name, values: offset ? values.map((v) => v + offset) : values, color: colors[k] as string, width: 2, ...(offset ? { note: formatSigned(offset, 'dB', 1) } : {}) });
  });

  // The y range follows what is drawn: the measured curves and the model sum, not the deep skirts of hidden paths.
  const extent = finiteExtent(traces.filter((t) => t.id === 'model-sum' || !t.id.startsWith('model-')).map((t) => t.values));
  const yDomain: [number, number] | undefined = extent ? [Math.floor((Math.max(extent[0], extent[1] - 100) - 5) / 10) * 10, Math.ceil((extent[1] + 5) / 10) * 10] : undefined;

  function alignToModel(c: OverlayCurve) {
    setAlignError(null);
    if (!modelSum) return setAlignError('The model is still being computed; try again in a moment.');
    const offset = overlayAlignOffsetDb(modelSum, c, band);
    if (offset === null) return setAlignError(`${c.item.name}: no point of the file or the model lies within ${band.startHz}–${band.stopHz} Hz.`);
    onOffset(c.item.id, offset);
  }

  const autoShifted = curves.map((c, k) => ({ c, a: auto[k] })).filter(({ c, a }) => offsets[c.item.id] === undefined && a?.offsetDb !== null && a?.band);
  const manual = curves.filter((c) => offsets[c.item.id] !== undefined);
  const notAligned = curves.filter((c, k) => offsets[c.item.id] === undefined && !auto[k]?.band);

  return (
    <section aria-labelledby="overlay-title" className="flex flex-col gap-3 rounded-lg border border-line bg-white p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="overlay-title" className="text-sm font-semibold">
          Overlay on the model
        </h3>
        <ChartExportButtons svgRef={svgRef} filename="measured-overlay" subject="overlay" />
      </div>
      {curves.length === 0 ? <p className="text-sm text-ink-faint">Tick measurements in the list to overlay them on the model&apos;s curves (dashed).</p> : null}
      {curves.length ? (
        <div className="flex flex-wrap items-start gap-x-3 gap-y-1 rounded-md bg-paper px-3 py-2 text-xs text-ink-soft" data-testid="overlay-alignment-note" aria-live="polite">
          <p className="min-w-0 flex-1">
            {absolute ? (
              <>Measured curves at the levels in their files (often dB SPL), on the model&apos;s axis, whose sum is at 0 dB{manual.length ? '; typed offsets still apply' : ''}.</>
            ) : autoShifted.length ? (
              <>
                Measured curves shifted to meet the model sum:{' '}
                {autoShifted.map(({ c, a }, i) => (
                  <span key={c.item.id}>
                    {i ? '; ' : ''}
                    {c.item.name} <span className="num font-medium text-ink">{formatSigned(a!.offsetDb!, 'dB', 1)}</span> at {formatHzReadout(a!.band!.startHz)}–{formatHzReadout(a!.band!.stopHz)}
                  </span>
                ))}
                {manual.length ? `; ${manual.map((c) => c.item.name).join(', ')} by the offset set below` : ''}.
              </>
            ) : (
              <>Measured curves as set below{manual.length ? '' : ' (no shift)'}.</>
            )}
            {!absolute && notAligned.length ? ` Not shifted (the file does not cover its band): ${notAligned.map((c) => c.item.name).join(', ')}.` : ''}
          </p>
          <Button variant="secondary" className="px-2 py-1 text-xs" aria-pressed={absolute} onClick={() => setAbsolute((v) => !v)} data-testid="overlay-absolute">
            {absolute ? 'Align to the model' : 'Show absolute levels'}
          </Button>
          {manual.length ? (
            <Button variant="ghost" className="px-2 py-1 text-xs" onClick={onClearOffsets}>
              Clear my offsets
            </Button>
          ) : null}
        </div>
      ) : null}
      <FrequencyPlot
        ref={svgRef}
        title="Measurements overlaid on the model"
        description={`Measured magnitudes, smoothed${absolute ? ', at their files’ levels' : ', each shifted to meet the model sum in its passband'}, over the model's magnitude of each path and of the sum (dashed, at unit level).`}
        quantity="magnitude"
        frequencyHz={grid}
        maxHz={20000}
        traces={traces}
        defaultHidden={['model-0', ...doc.subs.map((_s, k) => `model-${k + 1}`)]}
        markers={[{ hz: fc, label: 'Crossover', dashed: true }]}
        aspect={0.42}
        {...(yDomain ? { yDomain } : {})}
      />
      {curves.length ? (
        <div className="flex flex-col gap-2">
          <div className="flex flex-wrap items-end gap-3">
            <p className="w-full text-xs text-ink-soft">Or set a curve&apos;s offset yourself, or align it to the model sum&apos;s power average over a band of your own:</p>
            <NumberField label="Band from" unit="Hz" value={band.startHz} min={10} max={20000} step={10} onChange={(v) => setBand((b) => ({ ...b, startHz: v }))} />
            <NumberField label="Band to" unit="Hz" value={band.stopHz} min={10} max={20000} step={10} onChange={(v) => setBand((b) => ({ ...b, stopHz: v }))} />
          </div>
          {alignError ? <p className="text-xs text-fail" role="alert">{alignError}</p> : null}
          <ul className="flex flex-col gap-2">
            {curves.map((c, k) => (
              <li key={c.item.id} className="flex flex-wrap items-end gap-2">
                <span aria-hidden className="mb-2 inline-block h-1 w-5 rounded" style={{ background: colors[k] }} />
                <NumberField label={`${c.item.name} offset`} unit="dB" value={offsetOf(c, k)} min={-150} max={150} step={0.5} digits={1} onChange={(v) => onOffset(c.item.id, v)} />
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
