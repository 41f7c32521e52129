'use client';

import { useRef, useState } from 'react';
import { ChartExportButtons } from '@/components/charts';
import { OutsideRoomNotice, outsideMessage } from '@/components/editor/outside-room-notice';
import { useSystem } from '@/components/editor/system-context';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { NumberField } from '@/components/ui/number-field';
import { useLayout, type LayoutAnswer } from '@/lib/hooks/use-layout';
import { distanceToSeatM, mlpSeat } from '@/lib/system-model';
import { applyLayoutTemplate } from '@/lib/system-model/layout-request';
import type { OutsidePosition } from '@/lib/system-model/room-bounds';
import { formatLength } from '@/lib/units';
import { LAYOUT_NAMES, type LayoutName, type SystemDocument } from '@/lib/validations/system';
import { FloorPlan } from './floor-plan';

type Units = 'metric' | 'imperial';

function Badge({ status, testId }: { status: 'pass' | 'warn' | 'unlisted'; testId?: string }) {
  const style = status === 'pass' ? 'bg-[#EEF8F1] text-[#14532D]' : status === 'warn' ? 'bg-[#FBF3EA] text-[#6B3206]' : 'bg-[#F1F5F9] text-[#334155]';
  return (
    <span data-testid={testId} className={`inline-flex items-center gap-1 rounded px-1.5 py-0.5 text-xs font-semibold ${style}`}>
      <span aria-hidden="true">{status === 'pass' ? '✓' : status === 'warn' ? '!' : '–'}</span>
      {status === 'unlisted' ? 'not checked' : status}
    </span>
  );
}

const signed = (v: number, digits = 1) => `${v > 0 ? '+' : v < 0 ? '−' : ''}${Math.abs(v).toFixed(digits)}`;

/** Layout: floor plan, template, angles from the MLP with pass/warn, toe-in, distances, delays and trims. */
export function LayoutPanel() {
  const { doc, update, units, setUnits, readOnly } = useSystem();
  // While anything is outside the room, no angle, distance or delay is shown (useLayout asks for none).
  const { data, error, pending, outside } = useLayout(doc);
  const [selected, setSelected] = useState<string | null>(() => (doc.speakers[0] ? `speaker:${doc.speakers[0].id}` : null));
  const planRef = useRef<SVGSVGElement>(null);
  return (
    <div className="flex flex-col gap-6" data-testid="layout-panel">
      <TemplateBar doc={doc} units={units} setUnits={setUnits} readOnly={readOnly} update={update} mlpOutside={outside.some((o) => o.path.startsWith(`seats.${doc.seats.findIndex((s) => s.id === doc.mlpSeatId)}.`))} />
      {error ? <Notice kind="error">{error.message}</Notice> : null}
      <OutsideRoomNotice outside={outside} title="Outside the room: no angles, distances or delays until it is fixed">
        <p className="mt-1">Move each one inside (Edit, below), or make the room larger on Modes. Changing the room never moves anything.</p>
      </OutsideRoomNotice>
      {doc.speakers.length === 0 ? <Notice>No speakers yet: choose a template and apply it to place them.</Notice> : null}
      {data ? <Summary data={data} units={units} /> : null}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_22rem]">
        <section aria-labelledby="layout-plan" className="flex min-w-0 flex-col gap-2" aria-busy={pending}>
          <div className="flex flex-wrap items-center justify-between gap-2">
            <h3 id="layout-plan" className="text-base font-semibold">
              Floor plan
            </h3>
            <ChartExportButtons svgRef={planRef} filename="layout-floor-plan" subject="floor plan" />
          </div>
          <FloorPlan ref={planRef} doc={doc} layout={data} selected={selected} onSelect={setSelected} units={units} outside={outside} />
          <p className="text-xs text-ink-soft">Click a speaker, sub or seat to edit it. Faint wedges: each channel’s recommended azimuth range from the MLP; the black arc is the front pair’s included angle.</p>
        </section>
        <ItemEditor selected={selected} onSelect={setSelected} outside={outside} />
      </div>
      {outside.length ? <PositionTable outside={outside} units={units} selected={selected} onSelect={setSelected} /> : null}
      {data ? <AngleTable data={data} units={units} selected={selected} onSelect={setSelected} /> : null}
      {data ? (
        <ul className="list-disc pl-5 text-xs text-ink-soft">
          <li>Toe-in is the turn from square to the speaker’s own wall (front channels: the front wall; side surrounds: the side wall; back surrounds: the back wall) to point at its aim; hover a figure for the direction and tilt.</li>
          <li>Ranges: ITU-R BS.775-3 for 5.1 (front pair ±22°–30° is common home-theater practice); larger layouts after ITU-R BS.2051-3, from memory (hover a Recommended cell for its source).</li>
          <li>Mounting speakers on walls or ceilings: use hardware rated for the load, fix into structure, and follow local building codes; have a licensed professional do electrical or structural work.</li>
        </ul>
      ) : null}
    </div>
  );
}

function TemplateBar({ doc, units, setUnits, readOnly, update, mlpOutside }: { doc: SystemDocument; units: Units; setUnits: (u: Units) => void; readOnly: boolean; update: (fn: (d: SystemDocument) => SystemDocument) => void; mlpOutside: boolean }) {
  const [template, setTemplate] = useState<LayoutName>(doc.layout);
  const [radiusM, setRadiusM] = useState(2.5);
  const [keep, setKeep] = useState(true);
  const [message, setMessage] = useState<string | null>(null);
  const preview = applyLayoutTemplate(doc, template, { radiusM, keepExisting: keep });
  const apply = () => {
    update((d) => applyLayoutTemplate(d, template, { radiusM, keepExisting: keep }).doc);
    const parts = [preview.added.length ? `added ${preview.added.join(', ')}` : '', preview.moved.length ? `moved ${preview.moved.join(', ')}` : '', preview.removed.length ? `removed ${preview.removed.join(', ')}` : ''].filter(Boolean);
    setMessage(`${template} applied${parts.length ? `: ${parts.join('; ')}` : ' (no speaker changed)'}.`);
  };
  return (
    <section aria-labelledby="layout-template" className="flex flex-col gap-3">
      <h3 id="layout-template" className="text-base font-semibold">
        Template and listening position
      </h3>
      <div className="flex flex-wrap items-end gap-4">
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
          Layout template
          <select data-testid="layout-template" value={template} disabled={readOnly} onChange={(e) => setTemplate(e.target.value as LayoutName)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink">
            {LAYOUT_NAMES.map((n) => (
              <option key={n} value={n}>
                {n}
              </option>
            ))}
          </select>
        </label>
        <NumberField label="Place at distance from MLP" value={radiusM} onChange={setRadiusM} length units={units} unit="m" min={0.5} max={20} step={0.1} className="w-44" disabled={readOnly} />
        <label className="inline-flex items-center gap-1.5 pb-2 text-sm">
          <input type="checkbox" checked={keep} onChange={(e) => setKeep(e.target.checked)} className="accent-[#0F766E]" disabled={readOnly} />
          Keep speakers already placed
        </label>
        <Button variant="secondary" onClick={apply} disabled={readOnly || mlpOutside} data-testid="apply-template">
          {template === doc.layout ? `Re-apply ${template}` : `Apply ${template}`}
        </Button>
        <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
          Main listening position (MLP)
          <select data-testid="mlp-select" value={doc.mlpSeatId} disabled={readOnly} onChange={(e) => update((d) => ({ ...d, mlpSeatId: e.target.value }))} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink">
            {doc.seats.map((s) => (
              <option key={s.id} value={s.id}>
                {s.name}
              </option>
            ))}
          </select>
        </label>
        <div role="group" aria-label="Units" className="flex overflow-hidden rounded-md border border-line">
          {(['metric', 'imperial'] as const).map((u) => (
            <button key={u} type="button" aria-pressed={units === u} onClick={() => setUnits(u)} className={`px-3 py-1.5 text-sm ${units === u ? 'bg-ink text-white' : 'bg-white text-ink hover:bg-[#EFECE4]'}`}>
              {u === 'metric' ? 'Metres' : 'Feet / inches'}
            </button>
          ))}
        </div>
      </div>
      <p className="text-xs text-ink-soft">
        {template !== doc.layout || preview.added.length || preview.removed.length || preview.moved.length
          ? `Applying ${template} will ${[preview.added.length ? `add ${preview.added.join(', ')}` : '', preview.moved.length ? `move ${preview.moved.join(', ')}` : '', preview.removed.length ? `remove ${preview.removed.join(', ')}` : ''].filter(Boolean).join('; ') || 'only change the template'}; new speakers go to the template’s nominal angles at ${formatLength(radiusM, units)} from the MLP, pulled inside the walls. Subs stay as they are.`
          : `The System matches ${template}.`}
      </p>
      {mlpOutside ? <p className="text-xs text-fail">The MLP is outside the room: speakers are placed around it, so move it inside (or make the room larger) before applying a template.</p> : null}
      {message ? (
        <p role="status" className="text-xs text-ok">
          {message}
        </p>
      ) : null}
    </section>
  );
}

function Summary({ data, units }: { data: LayoutAnswer; units: Units }) {
  const fp = data.frontPair;
  const warns = data.speakers.filter((s) => s.status === 'warn').length;
  return (
    <section aria-label="Layout summary" className="grid grid-cols-2 gap-3 md:grid-cols-4">
      <div className="rounded-md border border-line bg-white px-3 py-2">
        <p className="text-xs text-ink-soft">Front pair included angle</p>
        <p className="num text-lg font-semibold" data-testid="included-angle">
          {fp ? `${fp.includedAngleDeg.toFixed(1)}°` : '—'} {fp ? <Badge status={fp.status} /> : null}
        </p>
        <p className="text-xs text-ink-soft">{fp ? `recommended ${fp.recommended.min}°–${fp.recommended.max}° (equilateral triangle: 60°)` : 'needs L and R'}</p>
      </div>
      <div className="rounded-md border border-line bg-white px-3 py-2">
        <p className="text-xs text-ink-soft">Angle checks</p>
        <p className="num text-lg font-semibold">
          {data.speakers.length - warns} pass · {warns} warn
        </p>
        <p className="text-xs text-ink-soft">{data.missingChannels.length ? `missing for ${data.template.id}: ${data.missingChannels.join(', ')}` : `every ${data.template.id} channel present`}</p>
      </div>
      <div className="rounded-md border border-line bg-white px-3 py-2">
        <p className="text-xs text-ink-soft">Farthest from the MLP</p>
        <p className="num text-lg font-semibold">{formatLength(data.farthest.distanceM, units)}</p>
        <p className="text-xs text-ink-soft">{data.farthest.name} (the others are aligned to its arrival)</p>
      </div>
      <div className="rounded-md border border-line bg-white px-3 py-2">
        <p className="text-xs text-ink-soft">Template</p>
        <p className="num text-lg font-semibold">{data.template.id}</p>
        <p className="text-xs text-ink-soft">
          {data.template.channels.length} speakers{data.template.subwooferCount ? ' + LFE' : ''}
        </p>
      </div>
    </section>
  );
}

/** Every seat, speaker and sub with a coordinate beyond a wall: its position with the faulty coordinate marked, and why. */
function PositionTable({ outside, units, selected, onSelect }: { outside: readonly OutsidePosition[]; units: Units; selected: string | null; onSelect: (k: string) => void }) {
  const { doc } = useSystem();
  const rows = [
    ...doc.seats.map((s, i) => ({ prefix: `seats.${i}`, key: `seat:${s.id}`, label: s.name, kind: 'Seat', p: s })),
    ...doc.speakers.map((s, i) => ({ prefix: `speakers.${i}`, key: `speaker:${s.id}`, label: s.channel, kind: 'Speaker', p: s })),
    ...doc.subs.map((s, i) => ({ prefix: `subs.${i}`, key: `sub:${s.id}`, label: s.name, kind: 'Sub', p: s })),
  ].filter((row) => outside.some((o) => o.path.startsWith(`${row.prefix}.`)));
  return (
    <section aria-labelledby="layout-outside" className="flex flex-col gap-2">
      <h3 id="layout-outside" className="text-base font-semibold">
        Positions outside the room
      </h3>
      <div className="overflow-x-auto rounded-md border border-line bg-white">
        <table className="w-full min-w-[40rem] text-sm" data-testid="outside-table">
          <caption className="sr-only">Seats, speakers and subs with a coordinate beyond a wall of the room</caption>
          <thead className="bg-[#F6F4EF] text-left text-ink-soft">
            <tr>
              <th scope="col" className="px-2 py-1.5 font-medium">Item</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">x</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">y</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">z</th>
              <th scope="col" className="px-2 py-1.5 font-medium">Problem</th>
              <th scope="col" className="px-2 py-1.5 font-medium"><span className="sr-only">Edit</span></th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => {
              const problems = outside.filter((o) => o.path.startsWith(`${row.prefix}.`));
              const cell = (c: 'xM' | 'yM' | 'zM') => {
                const bad = problems.some((o) => o.path === `${row.prefix}.${c}`);
                return (
                  <td className={`num px-2 py-1.5 text-right ${bad ? 'font-semibold text-fail' : ''}`} data-outside={bad ? 'true' : undefined}>
                    {bad ? <span aria-hidden="true">! </span> : null}
                    {formatLength(row.p[c], units)}
                    {bad ? <span className="sr-only"> (outside the room)</span> : null}
                  </td>
                );
              };
              return (
                <tr key={row.key} className={`border-t border-line align-top ${selected === row.key ? 'bg-[#EEF7F6]' : ''}`} data-testid={`outside-${row.prefix}`}>
                  <th scope="row" className="px-2 py-1.5 text-left font-semibold">
                    {row.label} <span className="block text-xs font-normal text-ink-soft">{row.kind}</span>
                  </th>
                  {cell('xM')}
                  {cell('yM')}
                  {cell('zM')}
                  <td className="px-2 py-1.5 text-xs text-fail">
                    {problems.map((o) => (
                      <span key={o.path} className="block">
                        {o.message}
                      </span>
                    ))}
                  </td>
                  <td className="px-2 py-1.5">
                    <button type="button" onClick={() => onSelect(row.key)} aria-label={`Edit ${row.label}`} className="rounded border border-line px-2 py-0.5 text-xs hover:bg-[#EFECE4]">
                      Edit
                    </button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </section>
  );
}

function AngleTable({ data, units, selected, onSelect }: { data: LayoutAnswer; units: Units; selected: string | null; onSelect: (k: string) => void }) {
  const { doc } = useSystem();
  const idOf = new Map(doc.speakers.map((s) => [s.channel, s.id]));
  return (
    <section aria-labelledby="layout-table" className="flex flex-col gap-2">
      <h3 id="layout-table" className="text-base font-semibold">
        Angles, distances, delays and trims from the MLP
      </h3>
      <div className="overflow-x-auto rounded-md border border-line bg-white">
        <table className="w-full min-w-[56rem] text-sm" data-testid="layout-table">
          <caption className="sr-only">Each speaker’s azimuth and elevation from the MLP against the recommended range, distance, toe-in, and the delay and trim a processor needs</caption>
          <thead className="bg-[#F6F4EF] text-left text-ink-soft">
            <tr>
              <th scope="col" className="px-2 py-1.5 font-medium">Channel</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">Azimuth</th>
              <th scope="col" className="px-2 py-1.5 font-medium">Recommended</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">Elevation</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">Distance</th>
              <th scope="col" className="px-2 py-1.5 text-right font-medium">Toe-in</th>
              <th scope="col" className="px-2 py-1.5 text-right align-bottom font-medium">
                Delay
                <span className="block max-w-40 text-xs font-normal">distance alignment plus the mains delay (a sub: plus its own delay)</span>
              </th>
              <th scope="col" className="px-2 py-1.5 text-right align-bottom font-medium">
                Trim
                <span className="block max-w-40 text-xs font-normal">level match by distance plus the channel’s offset (a sub: its gain)</span>
              </th>
              <th scope="col" className="px-2 py-1.5 font-medium">Check</th>
              <th scope="col" className="px-2 py-1.5 font-medium"><span className="sr-only">Edit</span></th>
            </tr>
          </thead>
          <tbody>
            {data.speakers.map((s) => {
              const key = `speaker:${idOf.get(s.channel as never) ?? s.channel.toLowerCase()}`;
              const rec = s.recommended;
              return (
                <tr key={s.channel} className={`border-t border-line align-top ${selected === key ? 'bg-[#EEF7F6]' : ''}`}>
                  <th scope="row" className="px-2 py-1.5 text-left font-semibold">
                    {s.channel} <span className="block text-xs font-normal text-ink-soft">{s.name}</span>
                  </th>
                  <td className="num px-2 py-1.5 text-right" data-testid={`azimuth-${s.channel}`}>{signed(s.azimuthDeg)}°</td>
                  <td className="num px-2 py-1.5 text-xs text-ink-soft" title={rec?.source}>
                    {rec ? (rec.side === 'centre' ? '0°' : rec.side === 'right' ? `−${rec.azimuthDeg.min}° to −${rec.azimuthDeg.max}°` : `+${rec.azimuthDeg.min}° to +${rec.azimuthDeg.max}°`) : '—'}
                    {rec ? <span className="block">elev. {rec.elevationDeg.min}°–{rec.elevationDeg.max}°</span> : null}
                  </td>
                  <td className="num px-2 py-1.5 text-right">{signed(s.elevationDeg)}°</td>
                  <td className="num px-2 py-1.5 text-right">
                    {formatLength(s.distanceM, units)}
                    {s.distanceSource === 'measured' ? <span className="block text-xs text-ink-soft">override</span> : null}
                  </td>
                  <td className="num px-2 py-1.5 text-right" title={`Turn ${s.rotationDeg >= 0 ? 'toward +x (right on the plan)' : 'toward −x (left on the plan)'} from square to its wall; tilt ${s.tiltDeg.toFixed(1)}°`}>
                    {s.toeInDeg.toFixed(1)}°
                  </td>
                  <td className="num px-2 py-1.5 text-right" data-testid={`delay-${s.channel}`}>{s.delayMs.toFixed(2)} ms</td>
                  <td className="num px-2 py-1.5 text-right" data-testid={`trim-${s.channel}`}>{signed(s.trimDb, 1)} dB</td>
                  <td className="px-2 py-1.5">
                    <Badge status={s.status} testId={`status-${s.channel}`} />
                    <span className="block max-w-56 text-xs text-ink-soft">{s.message}</span>
                  </td>
                  <td className="px-2 py-1.5">
                    <button type="button" onClick={() => onSelect(key)} aria-label={`Edit ${s.channel}`} className="rounded border border-line px-2 py-0.5 text-xs hover:bg-[#EFECE4]">
                      Edit
                    </button>
                  </td>
                </tr>
              );
            })}
            {data.subs.map((s, i) => {
              const sub = doc.subs[i];
              const key = sub ? `sub:${sub.id}` : '';
              return (
                <tr key={`sub-${s.name}-${i}`} className={`border-t border-line ${selected === key ? 'bg-[#EEF7F6]' : ''}`}>
                  <th scope="row" className="px-2 py-1.5 text-left font-semibold text-sub">
                    {s.name}
                  </th>
                  <td className="px-2 py-1.5 text-right text-ink-faint">—</td>
                  <td className="px-2 py-1.5 text-xs text-ink-soft">subs: placed for the modes</td>
                  <td className="px-2 py-1.5 text-right text-ink-faint">—</td>
                  <td className="num px-2 py-1.5 text-right">
                    {formatLength(s.distanceM, units)}
                    {s.distanceSource === 'measured' ? <span className="block text-xs text-ink-soft">override</span> : null}
                  </td>
                  <td className="px-2 py-1.5 text-right text-ink-faint">—</td>
                  <td className="num px-2 py-1.5 text-right" data-testid={`sub-delay-${i}`}>{s.delayMs.toFixed(2)} ms</td>
                  <td className="num px-2 py-1.5 text-right">
                    {signed(s.gainDb, 1)} dB<span className="block font-sans text-xs text-ink-soft">gain; level by measurement</span>
                  </td>
                  <td className="px-2 py-1.5 text-xs text-ink-soft">fine-tune on Timing</td>
                  <td className="px-2 py-1.5">
                    <button type="button" onClick={() => onSelect(key)} aria-label={`Edit ${s.name}`} className="rounded border border-line px-2 py-0.5 text-xs hover:bg-[#EFECE4]">
                      Edit
                    </button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="text-xs text-ink-soft">
        Azimuth is positive to the listener’s left. Delays: distance alignment to the farthest speaker or sub, plus the mains delay (a sub: plus its own delay from Timing), with the delay they all share taken out so the
        smallest is 0 ms; for processors that take delays directly — a processor that takes distances wants the Distance column. Trims: level match by distance (the free-field inverse-square estimate) plus the channel’s
        offset — a level match with a meter at the MLP supersedes them. These are the Settings sheet’s numbers, rounded as a processor takes them: 0.01 m, 0.01 ms, 0.1 dB.
      </p>
    </section>
  );
}

function ItemEditor({ selected, onSelect, outside }: { selected: string | null; onSelect: (k: string | null) => void; outside: readonly OutsidePosition[] }) {
  const { doc, update, units, readOnly } = useSystem();
  const [kind, id] = (selected ?? '').split(':') as ['speaker' | 'sub' | 'seat' | '', string | undefined];
  const room = doc.room;
  const lengthProps = { length: true, units, unit: 'm', step: 0.01, digits: units === 'metric' ? 2 : 2, disabled: readOnly } as const;
  // A coordinate beyond a wall keeps its value and carries the message (the field's own check only sees new input).
  const field = (label: string, value: number, max: number, onChange: (v: number) => void, testId: string, path: string) => (
    <NumberField label={label} value={value} min={0} max={max} onChange={onChange} testId={testId} error={outsideMessage(outside, path)} slider {...lengthProps} />
  );
  const choose = (
    <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
      Edit
      <select value={selected ?? ''} onChange={(e) => onSelect(e.target.value || null)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink" data-testid="layout-item-select">
        <option value="">Choose…</option>
        <optgroup label="Speakers">
          {doc.speakers.map((s) => (
            <option key={s.id} value={`speaker:${s.id}`}>
              {s.channel}
            </option>
          ))}
        </optgroup>
        <optgroup label="Subs">
          {doc.subs.map((s) => (
            <option key={s.id} value={`sub:${s.id}`}>
              {s.name}
            </option>
          ))}
        </optgroup>
        <optgroup label="Seats">
          {doc.seats.map((s) => (
            <option key={s.id} value={`seat:${s.id}`}>
              {s.name}
            </option>
          ))}
        </optgroup>
      </select>
    </label>
  );
  const body = (() => {
    if (kind === 'speaker') {
      const index = doc.speakers.findIndex((x) => x.id === id);
      const s = doc.speakers[index];
      if (!s) return null;
      const set = (patch: Partial<typeof s>) => update((d) => ({ ...d, speakers: d.speakers.map((x) => (x.id === s.id ? { ...x, ...patch } : x)) }));
      const aimValue = s.aim.kind === 'seat' ? `seat:${s.aim.seatId}` : s.aim.kind;
      return (
        <>
          {field('x — across from the left wall', s.xM, room.widthM, (v) => set({ xM: v }), 'speaker-x', `speakers.${index}.xM`)}
          {field('y — into the room from the front wall', s.yM, room.lengthM, (v) => set({ yM: v }), 'speaker-y', `speakers.${index}.yM`)}
          {field('z — height above the floor', s.zM, room.heightM, (v) => set({ zM: v }), 'speaker-z', `speakers.${index}.zM`)}
          <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
            Aim (toe-in toward)
            <select
              value={aimValue}
              disabled={readOnly}
              onChange={(e) => {
                const v = e.target.value;
                set({ aim: v === 'mlp' ? { kind: 'mlp' } : v === 'point' ? { kind: 'point', xM: mlpSeat(doc).xM, yM: mlpSeat(doc).yM } : { kind: 'seat', seatId: v.slice(5) } });
              }}
              className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink"
            >
              <option value="mlp">the MLP</option>
              {doc.seats.map((seat) => (
                <option key={seat.id} value={`seat:${seat.id}`}>
                  {seat.name}
                </option>
              ))}
              <option value="point">a point…</option>
            </select>
          </label>
          {s.aim.kind === 'point' ? (
            <div className="grid grid-cols-2 gap-2">
              <NumberField label="Aim x" value={s.aim.xM} min={-100} max={200} onChange={(v) => set({ aim: { kind: 'point', xM: v, yM: s.aim.kind === 'point' ? s.aim.yM : 0 } })} {...lengthProps} />
              <NumberField label="Aim y" value={s.aim.yM} min={-100} max={200} onChange={(v) => set({ aim: { kind: 'point', yM: v, xM: s.aim.kind === 'point' ? s.aim.xM : 0 } })} {...lengthProps} />
            </div>
          ) : null}
          <Override value={s.distanceOverrideM} defaultM={distanceToSeatM({ ...doc, speakers: [], subs: [] }, { ...s, distanceOverrideM: null })} onChange={(v) => set({ distanceOverrideM: v })} />
        </>
      );
    }
    if (kind === 'sub') {
      const index = doc.subs.findIndex((x) => x.id === id);
      const s = doc.subs[index];
      if (!s) return null;
      const set = (patch: Partial<typeof s>) => update((d) => ({ ...d, subs: d.subs.map((x) => (x.id === s.id ? { ...x, ...patch } : x)) }));
      return (
        <>
          {field('x — across from the left wall', s.xM, room.widthM, (v) => set({ xM: v }), 'sub-x', `subs.${index}.xM`)}
          {field('y — into the room from the front wall', s.yM, room.lengthM, (v) => set({ yM: v }), 'sub-y', `subs.${index}.yM`)}
          {field('z — acoustic centre height', s.zM, room.heightM, (v) => set({ zM: v }), 'sub-z', `subs.${index}.zM`)}
          <Override value={s.distanceOverrideM} defaultM={distanceToSeatM({ ...doc, speakers: [], subs: [] }, { ...s, distanceOverrideM: null })} onChange={(v) => set({ distanceOverrideM: v })} />
          <p className="text-xs text-ink-soft">Sub positions decide which modes are excited: see Modes for the seat responses.</p>
        </>
      );
    }
    if (kind === 'seat') {
      const index = doc.seats.findIndex((x) => x.id === id);
      const s = doc.seats[index];
      if (!s) return null;
      const set = (patch: Partial<typeof s>) => update((d) => ({ ...d, seats: d.seats.map((x) => (x.id === s.id ? { ...x, ...patch } : x)) }));
      return (
        <>
          {field('x — across from the left wall', s.xM, room.widthM, (v) => set({ xM: v }), 'seat-x', `seats.${index}.xM`)}
          {field('y — into the room from the front wall', s.yM, room.lengthM, (v) => set({ yM: v }), 'seat-y', `seats.${index}.yM`)}
          {field('z — ear height', s.zM, room.heightM, (v) => set({ zM: v }), 'seat-z', `seats.${index}.zM`)}
          {s.id === doc.mlpSeatId ? (
            <p className="text-xs text-ink-soft">This seat is the MLP: every angle and distance is measured from it.</p>
          ) : (
            <Button variant="secondary" disabled={readOnly} onClick={() => update((d) => ({ ...d, mlpSeatId: s.id }))}>
              Make this seat the MLP
            </Button>
          )}
        </>
      );
    }
    return <p className="text-sm text-ink-soft">Choose a speaker, sub or seat on the plan or in the list.</p>;
  })();
  return (
    <section aria-labelledby="layout-edit" className="flex flex-col gap-3 rounded-md border border-line bg-white p-3">
      <h3 id="layout-edit" className="text-base font-semibold">
        Position
      </h3>
      {choose}
      {body}
      <p className="text-xs text-ink-faint">Origin: the front-left floor corner; x across the room, y into it, z up.</p>
    </section>
  );
}

function Override({ value, defaultM, onChange }: { value: number | null; defaultM: number; onChange: (v: number | null) => void }) {
  const { units, readOnly } = useSystem();
  return (
    <div className="flex flex-col gap-1">
      <label className="inline-flex items-center gap-1.5 text-sm">
        <input type="checkbox" checked={value !== null} disabled={readOnly} onChange={(e) => onChange(e.target.checked ? Math.max(0.1, Math.round(defaultM * 100) / 100) : null)} className="accent-[#0F766E]" />
        Use a measured distance to the MLP
      </label>
      {value !== null ? <NumberField label="Measured distance" value={value} min={0.1} max={100} step={0.01} onChange={(v) => onChange(v)} length units={units} unit="m" digits={2} disabled={readOnly} /> : null}
    </div>
  );
}
