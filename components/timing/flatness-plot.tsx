'use client';

import { useId, useRef } from 'react';
import { ChartExportButtons, XYPlot, chartColors, formatNumber, formatSigned, traceStyles } from '@/components/charts';
import type { TimingAnswer } from '@/lib/system-model/timing';

/**
 * The flatness of the whole system against the sub-minus-mains delay for both polarities of one sub, with the
 * Timing window shaded, the advice marked and the present setting as "now"; a picker chooses the sub when there are several.
 */
export function FlatnessPlot({ data, subIndex, onSubIndex, band }: { data: TimingAnswer; subIndex: number; onSubIndex: (k: number) => void; band: string }) {
  const id = useId();
  const plotRef = useRef<SVGSVGElement>(null);
  const shown = data.subs[subIndex];
  const curve = shown?.flatnessVersusDelay;
  const currentOffsetMs = shown ? shown.delayMs - (data?.mains.delayMs ?? 0) : 0;
  const advisedOffsetMs = currentOffsetMs + (shown?.advice.shiftMs ?? 0);
  const advisedFlatness = shown?.advice.after.flatnessDb ?? 0;
  return (
    <section aria-label="Flatness against delay" className="flex flex-col gap-2">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <h3 className="text-sm font-semibold">
          Flatness over {band} against the sub-minus-mains delay{data.subs.length > 1 ? '' : ` (${shown?.name})`}: lower is flatter
        </h3>
        {data.subs.length > 1 ? (
          <div className="flex flex-col gap-1">
            <label htmlFor={`${id}-shown`} className="text-xs font-medium text-ink-soft">
              Sub shown
            </label>
            <select id={`${id}-shown`} value={subIndex} onChange={(e) => onSubIndex(Number(e.target.value))} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm">
              {data.subs.map((s, k) => (
                <option key={k} value={k}>
                  {s.name}
                </option>
              ))}
            </select>
          </div>
        ) : null}
      </div>
      {curve && shown ? (
        <>
          <XYPlot
            ref={plotRef}
            title={`Flatness against delay, ${shown.name}`}
            description="The flatness measure of the whole system (this sub moved, everything else as it is) as the sub's delay minus the mains' delay changes; positive values delay the sub, negative the mains. Lower is flatter. Shaded: the Timing window (within 1 dB of the advised setting)."
            x={curve.subMinusMainsDelayMs}
            xLabel="Sub delay minus mains delay"
            xUnit="ms"
            yUnit="dB"
            yLabel="Flatness (largest deviation)"
            yDomain={[0, Math.min(24, Math.max(6, Math.ceil(Math.max(...curve.normalDb, ...curve.invertedDb))))]}
            traces={[
              { id: 'normal', label: 'Sub polarity normal', values: curve.normalDb, ...traceStyles.sub },
              { id: 'inverted', label: 'Sub polarity inverted', values: curve.invertedDb, ...traceStyles.sub2, dashed: true },
            ]}
            band={{ from: shown.timingWindowMs[0], to: shown.timingWindowMs[1], label: 'Timing window' }}
            points={[{ x: advisedOffsetMs, y: advisedFlatness, label: shown.advice.keep ? `Kept ±${formatNumber(advisedFlatness, 2)} dB` : `Advised ${formatSigned(advisedOffsetMs, 'ms', 2)}` }]}
            markers={[{ x: currentOffsetMs, label: 'now', color: chartColors.target, dashed: true }]}
            aspect={0.42}
          />
          <ChartExportButtons
            svgRef={plotRef}
            filename={`timing-${shown.name}-flatness-vs-delay`}
            subject="flatness against delay"
            csv={() =>
              ['sub_minus_mains_delay_ms,flatness_normal_db,flatness_inverted_db', ...curve.subMinusMainsDelayMs.map((d, i) => `${d},${curve.normalDb[i]},${curve.invertedDb[i]}`)].join('\r\n')
            }
          />
        </>
      ) : null}
    </section>
  );
}
