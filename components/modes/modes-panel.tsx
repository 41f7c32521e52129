'use client';

import { useMemo, useRef, useState, type ReactNode } from 'react';
import { ChartExportButtons, ColumnChart, FrequencyPlot, HeatMap, chartColors, useContainerWidth, type HeatMapMarker, type PlotTrace } from '@/components/charts';
import { OutsideRoomNotice } from '@/components/editor/outside-room-notice';
import { useSystem } from '@/components/editor/system-context';
import { Notice } from '@/components/ui/notice';
import { useRoomModes, useRoomResponse, type RoomModesAnswer, type RoomResponseAnswer } from '@/lib/hooks/use-room';
import { mlpSeat } from '@/lib/system-model';
import { positionsOutsideRoom } from '@/lib/system-model/room-bounds';
import { ModeTable } from './mode-table';
import { RoomFields } from './room-fields';

/** Seat colours: the MLP in ink (thick), others in distinct hues that are neither the mains teal nor the sub amber. */
const SEAT_COLORS = ['#2563EB', '#7C3AED', '#BE185D', '#4D7C0F', '#0E7490', '#9F1239', '#57534E', '#1D4ED8'];
const SUB_COLORS = [chartColors.sub, '#92400E', '#D97706', '#78350F', '#EA580C', '#A16207', '#C2410C', '#854D0E'];

type Indices = [number, number, number];

function Verdict({ ok, testId }: { ok: boolean; testId?: string }) {
  return (
    <span data-testid={testId} className={`inline-flex items-center gap-1 rounded px-1.5 py-0.5 text-xs font-semibold ${ok ? 'bg-[#EEF8F1] text-[#14532D]' : 'bg-[#FBEDED] text-[#7F1414]'}`}>
      <span aria-hidden="true">{ok ? '✓' : '✗'}</span>
      {ok ? 'passes' : 'fails'}
    </span>
  );
}

function Stat({ label, value, note, testId }: { label: string; value: ReactNode; note?: ReactNode; testId?: string }) {
  return (
    <div className="rounded-md border border-line bg-white px-3 py-2">
      <p className="text-xs text-ink-soft">{label}</p>
      <p className="num text-lg font-semibold" data-testid={testId}>
        {value}
      </p>
      {note ? <div className="text-xs text-ink-soft">{note}</div> : null}
    </div>
  );
}

/** Room modes and seat response: mode table, third-octave counts with the Bonello verdict, proportions, seat curves, mode map, front-wall notches. */
export function ModesPanel() {
  const { doc, units } = useSystem();
  const [maxHz, setMaxHz] = useState(200);
  const [picked, setPicked] = useState<Indices | null>(null);
  const [view, setView] = useState<'seats' | 'subs'>('seats');
  const [cursorHz, setCursorHz] = useState<number | null>(null);
  const modes = useRoomModes(doc, maxHz);
  const data = modes.data;
  const firstMode = data?.modes[0];
  const mapIndices: Indices | null = picked ?? (firstMode ? [firstMode.indices[0], firstMode.indices[1], firstMode.indices[2]] : [1, 0, 0]);
  const response = useRoomResponse(doc, { mapIndices });
  const r = response.data;
  const outside = useMemo(() => positionsOutsideRoom(doc), [doc]);
  // Front-wall notches are asked only for L, C and R inside the room (see roomResponseRequestFromDocument).
  const frontOutside = outside.filter((o) => doc.speakers.some((s, i) => ['L', 'C', 'R'].includes(s.channel) && o.path.startsWith(`speakers.${i}.`)));
  const error = modes.error ?? response.error;
  const coincident = useMemo(() => new Set((data?.nearCoincident.pairs ?? []).flatMap((p) => [p.lower.join(','), p.upper.join(',')])), [data]);

  return (
    <div className="flex flex-col gap-6" data-testid="modes-panel">
      <section aria-labelledby="modes-room" className="flex flex-col gap-3">
        <h3 id="modes-room" className="text-base font-semibold">
          Room
        </h3>
        <RoomFields error={error ?? undefined} maxHz={maxHz} onMaxHz={setMaxHz} />
        {error && !error.issues.length ? <Notice kind="error">{error.message}</Notice> : null}
        {error && error.issues.some((i) => /^(seats|subs)\./.test(i.path)) ? <Notice kind="error">{error.message} — fix it on Layout.</Notice> : null}
        <OutsideRoomNotice outside={outside} title="Outside the room (nothing was moved)">
          <p className="mt-1">Changing the room never moves a seat, speaker or sub. Make the room larger again, or move them on Layout; nothing on this page is computed from them.</p>
        </OutsideRoomNotice>
      </section>

      {data ? <Summary data={data} pending={modes.pending} /> : <p className="text-sm text-ink-soft">Computing the modes…</p>}

      {data ? (
        <div className="grid gap-6 lg:grid-cols-2">
          <section aria-labelledby="modes-table" className="flex min-w-0 flex-col gap-2">
            <h3 id="modes-table" className="text-base font-semibold">
              Modes up to {maxHz} Hz
            </h3>
            <ModeTable modes={data.modes} selected={mapIndices} onSelect={setPicked} schroederHz={data.schroederHz} coincident={coincident} />
          </section>
          <ThirdOctave data={data} />
        </div>
      ) : null}

      {response.outside.length ? (
        <section aria-labelledby="modes-seats-blocked" className="flex flex-col gap-2" data-testid="seat-response-blocked">
          <h3 id="modes-seats-blocked" className="text-base font-semibold">
            Predicted response at the seats (subs only)
          </h3>
          <Notice kind="error" title="Not computed: every seat and sub must be inside the room">
            {response.outside.map((o) => (
              <span key={o.path} className="block">
                {o.message}
              </span>
            ))}
          </Notice>
        </section>
      ) : (
        <SeatResponse r={r} view={view} onView={setView} cursorHz={cursorHz} onCursorHz={setCursorHz} crossoverHz={doc.bassManagement.crossoverHz} pending={response.pending} noSubs={doc.subs.length === 0} />
      )}

      {r?.map ? <ModeMap r={r} modes={data} mapIndices={mapIndices} onPick={setPicked} units={units} /> : null}

      {r ? <QuarterWave r={r} crossoverHz={doc.bassManagement.crossoverHz} subNames={new Set(doc.subs.map((s) => s.name))} units={units} left={frontOutside.map((o) => o.message)} /> : null}
      <p className="text-xs text-ink-faint">
        Model: a rigid rectangular room, modes by Rayleigh’s formula, seat responses by modal summation damped by RT60 (Kuttruff, Room Acoustics, ch. 3). Reliable below the Schroeder frequency; real walls, openings and furniture shift and damp the modes —
        measure before you commit to seat and sub positions.
      </p>
    </div>
  );
}

function Summary({ data, pending }: { data: RoomModesAnswer; pending: boolean }) {
  const { doc } = useSystem();
  const p = data.proportions;
  return (
    <section aria-label="Room summary" aria-busy={pending} className="grid grid-cols-2 gap-3 md:grid-cols-4">
      <Stat label="Schroeder frequency" testId="schroeder-hz" value={`${data.schroederHz.toFixed(1)} Hz`} note={`V = ${data.volumeM3.toFixed(1)} m³, RT60 = ${doc.room.rt60S} s`} />
      <Stat
        label={`Modes up to ${data.statisticalCount.frequencyHz} Hz`}
        testId="mode-count"
        value={data.statisticalCount.enumerated}
        note={`Kuttruff’s estimate ${data.statisticalCount.expected.toFixed(1)} · ${data.kindCounts.axial} axial, ${data.kindCounts.tangential} tangential, ${data.kindCounts.oblique} oblique`}
      />
      <Stat
        label="Bonello criterion"
        value={data.bonello ? <Verdict ok={data.bonello.passes} testId="bonello-verdict" /> : '—'}
        note={
          data.bonello
            ? data.bonello.passes
              ? `Counts never fall from band to band (${data.bonello.startHz}–${data.bonello.stopHz} Hz)`
              : [data.bonello.decreasingAtHz.length ? `fewer modes than the band below at ${data.bonello.decreasingAtHz.join(', ')} Hz` : '', data.bonello.coincidencesAtHz.length ? `coincident modes in ${data.bonello.coincidencesAtHz.join(', ')} Hz` : '']
                  .filter(Boolean)
                  .join('; ')
            : 'Raise “Modes up to” to see complete bands'
        }
      />
      <Stat
        label="ITU-R BS.1116-3 proportions"
        value={<Verdict ok={p.passes} testId="proportion-verdict" />}
        note={
          <ul>
            {p.criteria.map((c) => (
              <li key={c.name} className={c.passes ? '' : 'text-fail'}>
                <span aria-hidden="true">{c.passes ? '✓' : '✗'}</span> {c.name}
                <span className="sr-only">{c.passes ? ' met' : ' not met'}</span>
              </li>
            ))}
            <li className="num">
              l/h = {p.lengthToHeight.toFixed(2)}, w/h = {p.widthToHeight.toFixed(2)}
            </li>
          </ul>
        }
      />
    </section>
  );
}

function ThirdOctave({ data }: { data: RoomModesAnswer }) {
  const ref = useRef<SVGSVGElement>(null);
  const decreasing = new Set(data.bonello?.decreasingAtHz ?? []);
  const coincident = new Set(data.bonello?.coincidencesAtHz ?? []);
  const columns = data.thirdOctaveBands.map((b) => ({
    id: String(b.centerHz),
    label: b.centerHz >= 100 ? b.centerHz.toFixed(0) : b.centerHz.toFixed(b.centerHz < 31 ? 1 : 0),
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
        <ChartExportButtons svgRef={ref} filename="modes-per-third-octave" subject="modes per one-third octave" csv={() => ['centerHz,count,axial,tangential,oblique', ...data.thirdOctaveBands.map((b) => `${b.centerHz},${b.count},${b.axial},${b.tangential},${b.oblique}`)].join('\n')} />
      </div>
      {columns.length ? (
        <ColumnChart ref={ref} columns={columns} title="Modes per one-third-octave band" description="Number of room modes in each IEC 61260-1 one-third-octave band; Bonello asks that the count never falls from one band to the next." xLabel="Band centre (Hz)" yLabel="Modes" />
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

function SeatResponse({ r, view, onView, cursorHz, onCursorHz, crossoverHz, pending, noSubs }: { r: RoomResponseAnswer | undefined; view: 'seats' | 'subs'; onView: (v: 'seats' | 'subs') => void; cursorHz: number | null; onCursorHz: (hz: number | null) => void; crossoverHz: number; pending: boolean; noSubs: boolean }) {
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
          return { id: `seat-${s.name}`, label: isMlp && !/\bMLP\b/.test(s.name) ? `${s.name} (MLP)` : s.name, values: s.summedDb, color: isMlp ? chartColors.sum : (SEAT_COLORS[colorIndex++ % SEAT_COLORS.length] as string), width: isMlp ? 3 : 2 };
        })
      : [
          ...(chosenSeat?.perSubDb ?? []).map((v, i) => ({ id: `sub-${i}`, label: r.subs[i]?.name ?? `Sub ${i + 1}`, values: v, color: SUB_COLORS[i % SUB_COLORS.length] as string, width: 2 })),
          { id: 'sum', label: 'Subs summed', values: chosenSeat?.summedDb ?? [], color: chartColors.sum, width: 3 },
        ];
  const markers = [
    // Narrow plots: short labels, so the two markers' labels do not run into each other.
    { hz: crossoverHz, label: narrow ? `${crossoverHz} Hz` : `${crossoverHz} Hz crossover`, color: chartColors.mains, dashed: true },
    { hz: r.schroederHz, label: narrow ? 'fS' : `Schroeder ${r.schroederHz.toFixed(0)} Hz`, color: chartColors.target, dashed: true },
  ];
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
            <input type="radio" name="modes-view" checked={view === 'seats'} onChange={() => onView('seats')} className="accent-[#0F766E]" /> Every seat, subs summed
          </label>
          <label className="inline-flex items-center gap-1.5">
            <input type="radio" name="modes-view" checked={view === 'subs'} onChange={() => onView('subs')} className="accent-[#0F766E]" /> Each sub at one seat
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
        frequencyHz={r.frequencyHz}
        minHz={15}
        maxHz={200}
        traces={traces}
        references={[{ value: 0, label: 'Seat average', color: chartColors.target }]}
        markers={markers}
        cursorHz={cursorHz}
        onCursorHz={onCursorHz}
        yAxisChars={4}
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
              frequencyHz={r.frequencyHz}
              minHz={15}
              maxHz={200}
              traces={[{ id: 'spread', label: 'Loudest − quietest seat', values: r.spread.spreadDb, color: chartColors.ink, width: 2 }]}
              markers={markers}
              cursorHz={cursorHz}
              onCursorHz={onCursorHz}
              yAxisChars={4}
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

function ModeMap({ r, modes, mapIndices, onPick, units }: { r: RoomResponseAnswer; modes: RoomModesAnswer | undefined; mapIndices: Indices | null; onPick: (i: Indices) => void; units: 'metric' | 'imperial' }) {
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
  const atSeats = doc.seats.map((s, i) => {
    const col = Math.min(map.columns - 1, Math.max(0, Math.floor((s.xM / doc.room.widthM) * map.columns)));
    const row = Math.min(map.rows - 1, Math.max(0, Math.floor((s.yM / doc.room.lengthM) * map.rows)));
    return { name: s.name, mark: s.id === doc.mlpSeatId ? 'MLP' : String(i + 1), value: map.pressure[row]?.[col] ?? NaN };
  });
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

function QuarterWave({ r, crossoverHz, subNames, units, left }: { r: RoomResponseAnswer; crossoverHz: number; subNames: ReadonlySet<string>; units: 'metric' | 'imperial'; left: string[] }) {
  if (r.quarterWave.length === 0 && left.length === 0) return null;
  return (
    <section aria-labelledby="modes-quarter" className="flex flex-col gap-2">
      <h3 id="modes-quarter" className="text-base font-semibold">
        Front-wall cancellation (quarter wave)
      </h3>
      <p className="text-xs text-ink-soft">
        The reflection from the wall behind a source cancels its output at f = c / (4d) (Allison, JAES 1974), d measured from the acoustic centre to the front wall. Keep the notch out of the source’s own band: subs close to the wall (notch above
        the crossover), mains either close or well away.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full max-w-2xl text-sm">
          <thead className="text-ink-soft">
            <tr>
              <th scope="col" className="px-2 py-1 text-left font-medium">Source</th>
              <th scope="col" className="px-2 py-1 text-right font-medium">To front wall</th>
              <th scope="col" className="px-2 py-1 text-right font-medium">Notch</th>
              <th scope="col" className="px-2 py-1 text-left font-medium">In its band?</th>
            </tr>
          </thead>
          <tbody>
            {r.quarterWave.map((q) => {
              const isSub = subNames.has(q.name);
              // A sub works below about an octave above the crossover; the mains above about an octave below it.
              const inBand = isSub ? q.notchHz < 2 * crossoverHz : q.notchHz > crossoverHz / 2;
              return (
                <tr key={q.name} className="border-t border-line">
                  <td className="px-2 py-1">{q.name}</td>
                  <td className="num px-2 py-1 text-right">{units === 'imperial' ? `${(q.distanceM / 0.3048).toFixed(2)} ft` : `${q.distanceM.toFixed(2)} m`}</td>
                  <td className="num px-2 py-1 text-right">{q.notchHz.toFixed(0)} Hz</td>
                  <td className={`px-2 py-1 ${inBand ? 'text-warn' : 'text-ok'}`}>{inBand ? (isSub ? 'yes — below 2 × crossover' : 'yes — in the mains’ band') : 'no'}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {left.length ? (
        <p className="text-xs text-fail" role="alert">
          No notch for a speaker outside the room: {left.join('; ')}.
        </p>
      ) : null}
    </section>
  );
}
