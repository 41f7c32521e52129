'use client';

import { useMemo, useState } from 'react';
import { chartColors, FrequencyPlot, seatColors, traceStyles, type PlotTrace } from '@/components/charts';
import type { SeatBalanceAnswer } from '@/lib/system-model/seat-balance';

type Shown = 'before' | 'present' | 'after';
const SHOWN: { id: Shown; label: string }[] = [
  { id: 'before', label: 'Before (all subs neutral)' },
  { id: 'present', label: 'Present settings' },
  { id: 'after', label: 'Recommended' },
];

const extent = (curves: readonly (readonly number[])[]): [number, number] => {
  let lo = Infinity;
  let hi = -Infinity;
  for (const c of curves) for (const v of c) if (Number.isFinite(v)) [lo, hi] = [Math.min(lo, v), Math.max(hi, v)];
  return [Math.floor(Math.max(lo, -40) / 5) * 5, Math.ceil(hi / 5) * 5];
};

/** Each seat's curve for one choice of settings (one scale for all three), and the seat-to-seat spread of all three. */
export function BalancePlots({ answer }: { answer: SeatBalanceAnswer }) {
  const [shown, setShown] = useState<Shown>('after');
  const [cursorHz, setCursorHz] = useState<number | null>(null);
  const yDomain = useMemo(() => extent(answer.seats.flatMap((s) => [s.beforeDb, s.afterDb, s.presentDb ?? []])), [answer]);
  const key = (s: SeatBalanceAnswer['seats'][number]) => (shown === 'before' ? s.beforeDb : shown === 'present' ? (s.presentDb ?? s.beforeDb) : s.afterDb);
  const seatTraces: PlotTrace[] = answer.seats.map((s, k) => ({ id: `seat-${k}`, label: s.name, values: key(s), color: seatColors[k % seatColors.length] as string, width: 2 }));
  const spreadTraces: PlotTrace[] = [
    { id: 'before', label: 'Before', values: answer.spread.beforeDb, ...traceStyles.target },
    ...(answer.spread.presentDb ? [{ id: 'present', label: 'Present', values: answer.spread.presentDb, ...traceStyles.sub }] : []),
    { id: 'after', label: 'Recommended', values: answer.spread.afterDb, ...traceStyles.sum },
  ];
  const measured = answer.source === 'measured';
  const shared = { frequencyHz: answer.frequencyHz, minHz: answer.band.startHz, maxHz: answer.band.stopHz, cursorHz, onCursorHz: setCursorHz, yAxisChars: 4 };
  return (
    <section aria-labelledby="sb-plots" className="flex min-w-0 flex-col gap-3">
      <h3 id="sb-plots" className="text-base font-semibold">
        The seats’ bass, {measured ? 'measured at the seats' : 'model'}
      </h3>
      <fieldset className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
        <legend className="sr-only">Settings shown at the seats</legend>
        {SHOWN.map((o) => (
          <label key={o.id} className="inline-flex items-center gap-1.5">
            <input type="radio" name="sb-shown" checked={shown === o.id} onChange={() => setShown(o.id)} className="accent-mains" /> {o.label}
          </label>
        ))}
      </fieldset>
      <FrequencyPlot
        title={measured ? 'Level at each seat, measured at the seats' : 'Level at each seat, model'}
        description={
          measured
            ? "Level of the subs at each seat from the stored measurements, with the settings applied to them; 0 dB is the seats' mean level with every sub neutral."
            : "Predicted level of the subs at each seat by modal summation; 0 dB is the seats' mean level with every sub neutral."
        }
        quantity="magnitude"
        yLabel="Level re before"
        yDomain={yDomain}
        traces={seatTraces}
        references={[{ value: 0, label: 'Mean before', color: chartColors.target }]}
        {...shared}
        aspect={0.42}
      />
      <h4 className="text-sm font-semibold">Seat-to-seat spread (loudest − quietest seat), {measured ? 'measured at the seats' : 'model'}</h4>
      <FrequencyPlot title={`Seat-to-seat spread before, with the present settings and recommended (${measured ? 'measured at the seats' : 'model'})`} quantity="custom" yLabel="Spread" yUnit="dB" traces={spreadTraces} {...shared} aspect={0.3} />
    </section>
  );
}
