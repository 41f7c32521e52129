'use client';

import { useRef } from 'react';
import { ChartExportButtons, HeatMap, type HeatMapMarker } from '@/components/charts';
import { useSystem } from '@/components/system/system-context';
import type { RoomModesAnswer, RoomResponseAnswer } from '@/lib/hooks/use-room';

type Indices = [number, number, number];

/** The floor map of one mode's pressure at ear height, a mode picker, and the pressure at each seat. */
export function ModeMap({ r, modes, mapIndices, onPick, units }: { r: RoomResponseAnswer; modes: RoomModesAnswer | undefined; mapIndices: Indices | null; onPick: (i: Indices) => void; units: 'metric' | 'imperial' }) {
  const { doc } = useSystem();
  const ref = useRef<SVGSVGElement>(null);
  const map = r.map!;
  // Short labels: seats a row apart would overlap with their full names; the table beside the map names them.
  const markers: HeatMapMarker[] = [
    ...doc.seats.map((s, i) => ({ xM: s.xM, yM: s.yM, label: s.id === doc.mlpSeatId ? 'MLP' : String(i + 1), kind: 'seat' as const })),
    ...doc.subs.map((s, i) => ({ xM: s.xM, yM: s.yM, label: doc.subs.length > 1 ? `Sub ${i + 1}` : 'Sub', kind: 'sub' as const })),
  ];
  const choices = (modes?.modes ?? []).slice(0, 40);
  const key = mapIndices?.join(',') ?? '';
  // The mode at each seat's own position (the answer evaluates it there, not at the nearest cell of the map).
  const atSeats = doc.seats.map((s, i) => ({ name: s.name, mark: s.id === doc.mlpSeatId ? 'MLP' : String(i + 1), value: map.seatPressure[i] ?? NaN }));
  const earLabel = units === 'imperial' ? `${(map.zM / 0.3048).toFixed(1)} ft` : `${map.zM.toFixed(2)} m`;
  return (
    <section aria-labelledby="modes-map" className="flex flex-col gap-2">
      <div className="flex flex-wrap items-end justify-between gap-2">
        <h3 id="modes-map" className="text-base font-semibold">
          Floor map of mode ({map.indices.join(',')}) — {map.kind}, {map.frequencyHz.toFixed(2)} Hz, at ear height {earLabel}
        </h3>
        <div className="flex flex-wrap items-end gap-2">
          <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
            Mode
            <select
              value={key}
              onChange={(e) => {
                const [a, b, c] = e.target.value.split(',').map(Number);
                onPick([a ?? 0, b ?? 0, c ?? 0]);
              }}
              className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink"
              data-testid="map-mode-select"
            >
              {choices.some((m) => m.indices.join(',') === key) ? null : <option value={key}>({key})</option>}
              {choices.map((m) => (
                <option key={m.indices.join(',')} value={m.indices.join(',')}>
                  ({m.indices.join(',')}) {m.frequencyHz.toFixed(1)} Hz {m.kind}
                </option>
              ))}
            </select>
          </label>
          <ChartExportButtons svgRef={ref} filename={`mode-${map.indices.join('-')}-map`} subject="mode map" />
        </div>
      </div>
      <div className="grid gap-3 lg:grid-cols-[minmax(0,1fr)_16rem]">
        <HeatMap
          ref={ref}
          values={map.pressure}
          widthM={doc.room.widthM}
          lengthM={doc.room.lengthM}
          title={`Relative pressure of mode (${map.indices.join(',')}) over the floor`}
          description="Front wall at the top. The two ends of the colour scale are opposite phase; the pale band between them is a null line. Seats are drawn in ink, subs in amber."
          valueLabel="Relative pressure"
          domain={[-1, 1]}
          markers={markers}
          maxHeightPx={480}
        />
        <div className="text-sm">
          <p className="text-xs text-ink-soft">
            A seat on the pale null line hardly hears this mode; a sub on it hardly excites it. Seats at opposite ends of the colour scale hear it in opposite phase, and seats of very different strength hear it very differently.
          </p>
          <table className="mt-2 w-full text-xs">
            <caption className="sr-only">Relative pressure of the mapped mode at each seat</caption>
            <thead>
              <tr className="text-ink-soft">
                <th scope="col" className="text-left font-medium">Seat</th>
                <th scope="col" className="text-right font-medium">Pressure</th>
              </tr>
            </thead>
            <tbody>
              {atSeats.map((s) => (
                <tr key={s.name}>
                  <td className="truncate">
                    <span className="num mr-1 inline-block min-w-7 font-semibold">{s.mark}</span>
                    {s.name}
                  </td>
                  <td className="num text-right">{Number.isFinite(s.value) ? s.value.toFixed(2) : '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </div>
    </section>
  );
}
