'use client';

import { outsideMessage } from '@/components/system/outside-room-notice';
import { useSystem } from '@/components/system/system-context';
import { VoicingPicker } from '@/components/system/voicing-picker';
import { Button } from '@/components/ui/button';
import { NumberField } from '@/components/ui/number-field';
import { distanceToSeatM, mlpSeat, profileById } from '@/lib/system-model/geometry';
import type { OutsidePosition } from '@/lib/system-model/room-bounds';
import { DistanceOverride } from './distance-override';

type ItemKind = 'speaker' | 'sub' | 'seat';
type Position = { xM: number; yM: number; zM: number };

/** The position of the speaker, sub or seat chosen on the plan or in the list, with its own extra settings. */
export function ItemEditor({ selected, onSelect, outside }: { selected: string | null; onSelect: (k: string | null) => void; outside: readonly OutsidePosition[] }) {
  const { doc, update, units, readOnly } = useSystem();
  const [kind, id] = (selected ?? '').split(':') as [ItemKind | '', string | undefined];
  const room = doc.room;
  const lengthProps = { length: true, units, unit: 'm', step: 0.01, digits: units === 'metric' ? 2 : 2, disabled: readOnly } as const;
  // A coordinate beyond a wall keeps its value and carries the message (the field's own check only sees new input).
  const field = (label: string, value: number, max: number, onChange: (v: number) => void, testId: string, path: string) => (
    <NumberField label={label} value={value} min={0} max={max} onChange={onChange} testId={testId} error={outsideMessage(outside, path)} slider {...lengthProps} />
  );
  /** x, y and z of item `index` of its kind, each within the room. */
  const positionFields = (itemKind: ItemKind, index: number, p: Position, set: (patch: Partial<Position>) => void, zLabel: string) => (
    <>
      {field('x — across from the left wall', p.xM, room.widthM, (v) => set({ xM: v }), `${itemKind}-x`, `${itemKind}s.${index}.xM`)}
      {field('y — into the room from the front wall', p.yM, room.lengthM, (v) => set({ yM: v }), `${itemKind}-y`, `${itemKind}s.${index}.yM`)}
      {field(zLabel, p.zM, room.heightM, (v) => set({ zM: v }), `${itemKind}-z`, `${itemKind}s.${index}.zM`)}
    </>
  );
  const groups = [
    { label: 'Speakers', kind: 'speaker', items: doc.speakers.map((s) => ({ id: s.id, name: s.channel })) },
    { label: 'Subs', kind: 'sub', items: doc.subs.map((s) => ({ id: s.id, name: s.name })) },
    { label: 'Seats', kind: 'seat', items: doc.seats.map((s) => ({ id: s.id, name: s.name })) },
  ] as const;
  const choose = (
    <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
      Edit
      <select value={selected ?? ''} onChange={(e) => onSelect(e.target.value || null)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm text-ink" data-testid="layout-item-select">
        <option value="">Choose…</option>
        {groups.map((g) => (
          <optgroup key={g.kind} label={g.label}>
            {g.items.map((item) => (
              <option key={item.id} value={`${g.kind}:${item.id}`}>
                {item.name}
              </option>
            ))}
          </optgroup>
        ))}
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
          {positionFields('speaker', index, s, set, 'z — height above the floor')}
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
          <DistanceOverride value={s.distanceOverrideM} defaultM={distanceToSeatM({ ...doc, speakers: [], subs: [] }, { ...s, distanceOverrideM: null })} onChange={(v) => set({ distanceOverrideM: v })} />
          <VoicingPicker profile={profileById(doc, s.profileId)} choice={s.voicing} disabled={readOnly} onChange={(voicing) => set({ voicing })} testId="speaker-voicing" />
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
          {positionFields('sub', index, s, set, 'z — acoustic centre height')}
          <DistanceOverride value={s.distanceOverrideM} defaultM={distanceToSeatM({ ...doc, speakers: [], subs: [] }, { ...s, distanceOverrideM: null })} onChange={(v) => set({ distanceOverrideM: v })} />
          <VoicingPicker profile={profileById(doc, s.profileId)} choice={s.voicing} disabled={readOnly} onChange={(voicing) => set({ voicing })} testId="sub-voicing" />
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
          {positionFields('seat', index, s, set, 'z — ear height')}
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
