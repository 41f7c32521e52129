'use client';

import { useSystem } from '@/components/system/system-context';
import { NumberField } from '@/components/ui/number-field';
import type { ApiError } from '@/lib/client/api';
import { applyRoomToDocument } from '@/lib/system-model/room-modes';
import type { SystemDocument } from '@/lib/validations/system';

/** Room length, width, height, RT60 and air temperature, with the API's messages beside the field at fault. */
export function RoomFields({ error, maxHz, onMaxHz }: { error?: ApiError; maxHz: number; onMaxHz: (hz: number) => void }) {
  const { doc, update, units, readOnly } = useSystem();
  // The room changes alone: seats, speakers and subs stay where they are, even beyond a wall that moved in (the panel says so).
  const set = (patch: Partial<SystemDocument['room']>) => update((d) => applyRoomToDocument(d, patch).doc);
  const room = doc.room;
  const e = (path: string) => error?.field(path) ?? error?.field(`room.${path}`);
  return (
    <div className="flex flex-col gap-2">
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-6">
        <NumberField label="Length (front to back)" testId="room-length" value={room.lengthM} onChange={(v) => set({ lengthM: v })} length units={units} unit="m" min={1.5} max={60} step={0.05} digits={units === 'metric' ? 2 : 1} error={e('lengthM')} disabled={readOnly} />
        <NumberField label="Width" testId="room-width" value={room.widthM} onChange={(v) => set({ widthM: v })} length units={units} unit="m" min={1.5} max={60} step={0.05} digits={units === 'metric' ? 2 : 1} error={e('widthM')} disabled={readOnly} />
        <NumberField label="Height" testId="room-height" value={room.heightM} onChange={(v) => set({ heightM: v })} length units={units} unit="m" min={1.8} max={20} step={0.05} digits={units === 'metric' ? 2 : 1} error={e('heightM')} disabled={readOnly} />
        <NumberField label="RT60" testId="room-rt60" value={room.rt60S} onChange={(v) => set({ rt60S: v })} unit="s" min={0.1} max={5} step={0.05} digits={2} error={e('rt60S')} disabled={readOnly} hint="Reverberation time" />
        <NumberField label="Air temperature" testId="room-temperature" value={room.temperatureC} onChange={(v) => set({ temperatureC: v })} unit="°C" min={-20} max={50} step={1} error={e('temperatureC')} disabled={readOnly} />
        <NumberField label="Modes up to" testId="modes-max-hz" value={maxHz} onChange={onMaxHz} unit="Hz" min={20} max={500} step={10} error={error?.field('maxHz')} hint="Table and counts" />
      </div>
    </div>
  );
}
