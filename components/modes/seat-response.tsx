'use client';

import { useRef, useState } from 'react';
import { ChartExportButtons, FrequencyPlot, chartColors, seatColors, subColors, useContainerWidth, type PlotTrace } from '@/components/charts';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { mlpSeat } from '@/lib/system-model/geometry';
import type { RoomResponseAnswer } from '@/lib/hooks/use-room';

interface SeatResponseProps {
  r: RoomResponseAnswer | undefined;
  view: 'seats' | 'subs';
  onView: (v: 'seats' | 'subs') => void;
  cursorHz: number | null;
  onCursorHz: (hz: number | null) => void;
  crossoverHz: number;
  pending: boolean;
  noSubs: boolean;
}

/** Predicted low-frequency response at every seat (or of each sub at one seat), and the seat-to-seat spread. */
export function SeatResponse({ r, view, onView, cursorHz, onCursorHz, crossoverHz, pending, noSubs }: SeatResponseProps) {
  const { doc } = useSystem();
  const plotRef = useRef<SVGSVGElement>(null);
  const spreadRef = useRef<SVGSVGElement>(null);
  const mlpName = mlpSeat(doc).name;
  const [seatForSubs, setSeatForSubs] = useState<string | null>(null);
  const { ref: widthRef, widthPx } = useContainerWidth<HTMLElement>(1000);
  const narrow = widthPx < 720;
  if (noSubs) return <Notice>Add a sub on Layout to see the predicted seat responses.</Notice>;
  if (!r) return <p className="text-sm text-ink-soft">Computing the seat responses…</p>;
  const chosenSeat = r.seats.find((s) => s.name === (seatForSubs ?? mlpName)) ?? r.seats[0];
  let colorIndex = 0;
  const traces: PlotTrace[] =
    view === 'seats'
      ? r.seats.map((s) => {
          const isMlp = s.name === mlpName;
          return { id: `seat-${s.name}`, label: isMlp && !/\bMLP\b/.test(s.name) ? `${s.name} (MLP)` : s.name, values: s.summedDb, color: isMlp ? chartColors.sum : (seatColors[colorIndex++ % seatColors.length] as string), width: isMlp ? 3 : 2 };
        })
      : [
          ...(chosenSeat?.perSubDb ?? []).map((v, i) => ({ id: `sub-${i}`, label: r.subs[i]?.name ?? `Sub ${i + 1}`, values: v, color: subColors[i % subColors.length] as string, width: 2 })),
          { id: 'sum', label: 'Subs summed', values: chosenSeat?.summedDb ?? [], color: chartColors.sum, width: 3 },
        ];
  const markers = [
    // Narrow plots: short labels, so the two markers' labels do not run into each other.
    { hz: crossoverHz, label: narrow ? `${crossoverHz} Hz` : `${crossoverHz} Hz crossover`, color: chartColors.mains, dashed: true },
    { hz: r.schroederHz, label: narrow ? 'fS' : `Schroeder ${r.schroederHz.toFixed(0)} Hz`, color: chartColors.target, dashed: true },
  ];
  // Both plots share the band, the markers and one crosshair, with their plot areas lined up.
  const sharedAxis = { frequencyHz: r.frequencyHz, minHz: 15, maxHz: 200, markers, cursorHz, onCursorHz, yAxisChars: 4 };
  return (
    <section ref={widthRef} aria-labelledby="modes-seats" aria-busy={pending} className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h3 id="modes-seats" className="text-base font-semibold">
          Predicted response at the seats (subs only)
        </h3>
        <ChartExportButtons svgRef={plotRef} filename="modes-seat-response" subject="seat response" csv={{ frequencyHz: r.frequencyHz, columns: traces.map((t) => ({ name: `${t.label} (dB)`, values: t.values })) }} />
      </div>
      <div className="flex flex-wrap items-end gap-4 text-sm">
        <fieldset className="flex items-center gap-3">
          <legend className="sr-only">Curves</legend>
          <label className="inline-flex items-center gap-1.5">
            <input type="radio" name="modes-view" checked={view === 'seats'} onChange={() => onView('seats')} className="accent-mains" /> Every seat, subs summed
          </label>
          <label className="inline-flex items-center gap-1.5">
            <input type="radio" name="modes-view" checked={view === 'subs'} onChange={() => onView('subs')} className="accent-mains" /> Each sub at one seat
          </label>
        </fieldset>
        {view === 'subs' ? (
          <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
            Seat
            <select value={chosenSeat?.name} onChange={(e) => setSeatForSubs(e.target.value)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink">
              {r.seats.map((s) => (
                <option key={s.name} value={s.name}>
                  {s.name}
                </option>
              ))}
            </select>
          </label>
        ) : null}
      </div>
      <p className="text-xs text-ink-soft">Dashed lines: the crossover (teal) and the Schroeder frequency fS (slate); above fS the modal prediction loses meaning. Each sub’s gain, delay and polarity from the System are applied.</p>
      <FrequencyPlot
        ref={plotRef}
        title="Predicted low-frequency response at each seat"
        description="Modal summation of the subs (with their gain, delay and polarity) at each seat; 0 dB is the average over the seats from 20 to 120 Hz."
        quantity="magnitude"
        yLabel="Level re seat average"
        traces={traces}
        references={[{ value: 0, label: 'Seat average', color: chartColors.target }]}
        {...sharedAxis}
        aspect={0.42}
      />
      {r.spread ? (
        <div className="grid gap-3 lg:grid-cols-[1fr_16rem]">
          <div className="min-w-0">
            <div className="flex flex-wrap items-center justify-between gap-2">
              <h4 className="text-sm font-semibold">Seat-to-seat spread</h4>
              <ChartExportButtons svgRef={spreadRef} filename="modes-seat-spread" subject="seat-to-seat spread" csv={{ frequencyHz: r.frequencyHz, columns: [{ name: 'spread (dB)', values: r.spread.spreadDb }] }} />
            </div>
            <FrequencyPlot
              ref={spreadRef}
              title="Seat-to-seat spread"
              description="Difference between the loudest and the quietest seat at each frequency."
              quantity="custom"
              yLabel="Spread"
              yUnit="dB"
              traces={[{ id: 'spread', label: 'Loudest − quietest seat', values: r.spread.spreadDb, color: chartColors.ink, width: 2 }]}
              {...sharedAxis}
              aspect={0.25}
              showLegend={false}
            />
          </div>
          <dl className="grid grid-cols-2 content-start gap-2 text-sm lg:grid-cols-1">
            <div className="rounded-md border border-line bg-white px-3 py-2">
              <dt className="text-xs text-ink-soft">Mean spread {r.spread.startHz}–{r.spread.stopHz} Hz</dt>
              <dd className="num text-lg font-semibold" data-testid="mean-spread">
                {r.spread.meanSpreadDb.toFixed(1)} dB
              </dd>
            </div>
            <div className="rounded-md border border-line bg-white px-3 py-2">
              <dt className="text-xs text-ink-soft">Largest spread</dt>
              <dd className="num text-lg font-semibold">
                {r.spread.maxSpreadDb.toFixed(1)} dB <span className="text-sm font-normal text-ink-soft">at {r.spread.maxSpreadHz.toFixed(0)} Hz</span>
              </dd>
            </div>
            {r.seats.map((s) => (
              <div key={s.name} className="flex justify-between gap-2 text-xs">
                <dt className="truncate text-ink-soft">{s.name}</dt>
                <dd className="num">{s.bandMeanDb > 0 ? '+' : ''}{s.bandMeanDb.toFixed(1)} dB</dd>
              </div>
            ))}
          </dl>
        </div>
      ) : (
        <p className="text-xs text-ink-soft">Add a second seat to see the seat-to-seat spread.</p>
      )}
    </section>
  );
}
