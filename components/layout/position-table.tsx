'use client';

import { useSystem, type UnitSystem } from '@/components/system/system-context';
import type { OutsidePosition } from '@/lib/system-model/room-bounds';
import { formatLength } from '@/lib/units';
import { RowEditButton } from './row-edit-button';

type Units = UnitSystem;

/** Every seat, speaker and sub with a coordinate beyond a wall: its position with the faulty coordinate marked, and why. */
export function PositionTable({ outside, units, selected, onSelect }: { outside: readonly OutsidePosition[]; units: Units; selected: string | null; onSelect: (k: string) => void }) {
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
      <div className="relative overflow-x-auto rounded-md border border-line bg-white" role="region" aria-label="Positions outside the room (scrolls sideways)" tabIndex={0}>
        <table className="w-full min-w-[40rem] text-sm" data-testid="outside-table">
          <caption className="sr-only">Seats, speakers and subs with a coordinate beyond a wall of the room</caption>
          <thead className="bg-paper text-left text-ink-soft">
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
                <tr key={row.key} className={`border-t border-line align-top ${selected === row.key ? 'bg-tint-info' : ''}`} data-testid={`outside-${row.prefix}`}>
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
                    <RowEditButton label={row.label} onClick={() => onSelect(row.key)} />
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
