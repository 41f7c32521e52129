import type { SystemDocument } from '@/lib/validations/system';

/** Which main channel a panel shows, chosen from the System's speakers (Blend and Timing). */
export function MainChannelSelect({ id, label, value, speakers, onChange, testId }: { id: string; label: string; value: string; speakers: SystemDocument['speakers']; onChange: (channel: string) => void; testId?: string }) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value)} className="rounded-md border border-line bg-white px-2 py-1.5 text-sm" data-testid={testId}>
        {speakers.map((s) => (
          <option key={s.id} value={s.channel}>
            {s.channel}
          </option>
        ))}
      </select>
    </div>
  );
}
