'use client';

import type { ReactNode } from 'react';
import { useSystem } from '@/components/system/system-context';
import { StatusPill } from '@/components/ui/status-pill';
import type { RoomModesAnswer } from '@/lib/hooks/use-room';

/** A pass/fail pill: "✓ passes" or "✗ fails". */
function Verdict({ ok, testId }: { ok: boolean; testId?: string }) {
  return (
    <StatusPill tone={ok ? 'ok' : 'fail'} icon={ok ? '✓' : '✗'} testId={testId}>
      {ok ? 'passes' : 'fails'}
    </StatusPill>
  );
}

/** One figure of the summary: a label, the value, an optional note. */
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

/** Schroeder frequency, mode count, the Bonello criterion and the room proportions at a glance. */
export function RoomSummary({ data, pending }: { data: RoomModesAnswer; pending: boolean }) {
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
