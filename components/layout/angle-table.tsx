'use client';

import { useSystem, type UnitSystem } from '@/components/system/system-context';
import type { LayoutAnswer } from '@/lib/hooks/use-layout';
import { formatLength } from '@/lib/units';
import { LayoutBadge } from './layout-badge';
import { RowEditButton } from './row-edit-button';

type Units = UnitSystem;

/** `signed(2.25)` → "+2.3", `signed(-1)` → "−1.0", with a true minus sign. */
const signed = (v: number, digits = 1) => `${v > 0 ? '+' : v < 0 ? '−' : ''}${Math.abs(v).toFixed(digits)}`;

/** Every speaker's and sub's angles from the MLP against the recommended range, distance, toe-in, delay and trim. */
export function AngleTable({ data, units, selected, onSelect }: { data: LayoutAnswer; units: Units; selected: string | null; onSelect: (k: string) => void }) {
  const { doc } = useSystem();
  const idOf = new Map(doc.speakers.map((s) => [s.channel, s.id]));
  return (
    <section aria-labelledby="layout-table" className="flex flex-col gap-2">
      <h3 id="layout-table" className="text-base font-semibold">
        Angles, distances, delays and trims from the MLP
      </h3>
      <div className="relative overflow-x-auto rounded-md border border-line bg-white" role="region" aria-label="Angles, distances, delays and trims (scrolls sideways)" tabIndex={0}>
        <table className="w-full min-w-[56rem] text-sm" data-testid="layout-table">
          <caption className="sr-only">Each speaker’s azimuth and elevation from the MLP against the recommended range, distance, toe-in, and the delay and trim a processor needs</caption>
          <thead className="bg-paper text-left text-ink-soft">
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
                <tr key={s.channel} className={`border-t border-line align-top ${selected === key ? 'bg-tint-info' : ''}`}>
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
                    <LayoutBadge status={s.status} testId={`status-${s.channel}`} />
                    <span className="block max-w-56 text-xs text-ink-soft">{s.message}</span>
                  </td>
                  <td className="px-2 py-1.5">
                    <RowEditButton label={s.channel} onClick={() => onSelect(key)} />
                  </td>
                </tr>
              );
            })}
            {data.subs.map((s, i) => {
              const sub = doc.subs[i];
              const key = sub ? `sub:${sub.id}` : '';
              return (
                <tr key={`sub-${s.name}-${i}`} className={`border-t border-line ${selected === key ? 'bg-tint-info' : ''}`}>
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
                    <RowEditButton label={s.name} onClick={() => onSelect(key)} />
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
