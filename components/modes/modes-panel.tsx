'use client';

import { useMemo, useState } from 'react';
import { OutsideRoomNotice } from '@/components/system/outside-room-notice';
import { useSystem } from '@/components/system/system-context';
import { Notice } from '@/components/ui/notice';
import { useRoomModes, useRoomResponse } from '@/lib/hooks/use-room';
import { positionsOutsideRoom } from '@/lib/system-model/room-bounds';
import { ModeMap } from './mode-map';
import { ModeTable } from './mode-table';
import { QuarterWave } from './quarter-wave';
import { RoomFields } from './room-fields';
import { RoomSummary } from './room-summary';
import { SeatResponse } from './seat-response';
import { ThirdOctave } from './third-octave';

type Indices = [number, number, number];

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

      {data ? <RoomSummary data={data} pending={modes.pending} /> : <p className="text-sm text-ink-soft">Computing the modes…</p>}

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
