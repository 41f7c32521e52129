'use client';

import { useRef } from 'react';
import { ChartExportButtons, ColumnChart, chartColors } from '@/components/charts';
import type { RoomModesAnswer } from '@/lib/hooks/use-room';

/** Mode counts per one-third-octave band (coloured by the Bonello checks), with the near-coincident pairs. */
export function ThirdOctave({ data }: { data: RoomModesAnswer }) {
  const ref = useRef<SVGSVGElement>(null);
  const decreasing = new Set(data.bonello?.decreasingAtHz ?? []);
  const coincident = new Set(data.bonello?.coincidencesAtHz ?? []);
  const columns = data.thirdOctaveBands.map((b) => ({
    id: String(b.centerHz),
    // The IEC 61260-1 nominal label (25, 31.5, 80, 125, 160), not the exact base-ten centre (25.12, 79.43 …).
    label: String(b.nominalHz),
    value: b.count,
    color: decreasing.has(b.centerHz) ? chartColors.fail : coincident.has(b.centerHz) ? chartColors.warn : chartColors.mains,
    note: `${b.axial} axial, ${b.tangential} tangential, ${b.oblique} oblique${decreasing.has(b.centerHz) ? ' — fewer than the band below' : ''}${coincident.has(b.centerHz) ? ' — holds coincident modes' : ''}`,
  }));
  const pairs = data.nearCoincident.pairs;
  return (
    <section aria-labelledby="modes-bands" className="flex min-w-0 flex-col gap-2">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="modes-bands" className="text-base font-semibold">
          Modes per one-third octave
        </h3>
        <ChartExportButtons svgRef={ref} filename="modes-per-third-octave" subject="modes per one-third octave" csv={() => ['nominalHz,centerHz,count,axial,tangential,oblique', ...data.thirdOctaveBands.map((b) => `${b.nominalHz},${b.centerHz},${b.count},${b.axial},${b.tangential},${b.oblique}`)].join('\n')} />
      </div>
      {columns.length ? (
        <ColumnChart ref={ref} columns={columns} title="Modes per one-third-octave band" description="Number of room modes in each IEC 61260-1 one-third-octave band; Bonello asks that the count never falls from one band to the next." xLabel="Band, nominal mid-band frequency (Hz)" yLabel="Modes" />
      ) : (
        <p className="text-sm text-ink-soft">No complete band below {data.statisticalCount.frequencyHz} Hz.</p>
      )}
      <p className="text-xs text-ink-soft">
        <span className="mr-3 inline-flex items-center gap-1"><span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-sm bg-mains" />count</span>
        <span className="mr-3 inline-flex items-center gap-1"><span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-sm bg-warn" />coincident modes (within {data.bonello?.coincidenceToleranceHz ?? 0.5} Hz, band under five modes)</span>
        <span className="inline-flex items-center gap-1"><span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-sm bg-fail" />fewer than the band below</span>
      </p>
      <details className="rounded-md border border-line bg-white px-3 py-2 text-sm">
        <summary className="cursor-pointer font-medium">
          Near-coincident modes below {data.nearCoincident.belowHz.toFixed(0)} Hz <span className="num text-ink-soft">({pairs.length}{data.nearCoincident.truncated ? '+' : ''})</span>
        </summary>
        <p className="mt-1 text-xs text-ink-soft">Pairs within {data.nearCoincident.tolerancePercent} % of each other pile up into one stronger resonance.</p>
        <ul className="num mt-1 max-h-48 overflow-auto text-xs">
          {pairs.map((p) => (
            <li key={`${p.lower.join()}-${p.upper.join()}`}>
              ({p.lower.join(',')}) {p.lowerHz.toFixed(2)} Hz ↔ ({p.upper.join(',')}) {p.upperHz.toFixed(2)} Hz — {p.separationHz} Hz apart
            </li>
          ))}
        </ul>
      </details>
    </section>
  );
}
