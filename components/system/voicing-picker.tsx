'use client';

import { useId } from 'react';
import type { SpeakerProfile } from '@/lib/validations/system';
import { voicingRows, withoutVoicingChoice, withVoicingChoice } from './voicing-rows';

interface Props {
  profile: SpeakerProfile | undefined;
  choice: Readonly<Record<string, string>> | undefined;
  onChange: (choice: Record<string, string>) => void;
  disabled?: boolean;
  /** Prefix of each select's test id (`${testId}-${switchId}`). */
  testId: string;
}

/**
 * The positions of a speaker's or sub's back-panel switches (Voicing options of its profile), a select each. A choice the
 * profile no longer has stays in the document and is shown with what the speaker plays instead; only "Forget" removes it.
 */
export function VoicingPicker({ profile, choice, onChange, disabled, testId }: Props) {
  const id = useId();
  const { rows, orphans } = voicingRows(profile, choice);
  if (rows.length === 0 && orphans.length === 0) return null;
  return (
    <fieldset className="flex flex-col gap-2" data-testid={testId}>
      <legend className="text-xs font-medium text-ink-soft">Voicing (the speaker&apos;s own switches)</legend>
      {rows.map((row) => (
        <div key={row.switchId} className="flex flex-col gap-1">
          <label htmlFor={`${id}-${row.switchId}`} className="text-xs text-ink-soft">
            {row.name}
          </label>
          <select
            id={`${id}-${row.switchId}`}
            value={row.value}
            disabled={disabled}
            onChange={(e) => onChange(withVoicingChoice(choice, row.switchId, e.target.value))}
            className={`rounded-md border bg-white px-2 py-1.5 text-sm text-ink ${row.stale ? 'border-warn' : 'border-line'}`}
            aria-describedby={row.stale ? `${id}-${row.switchId}-stale` : undefined}
            data-testid={`${testId}-${row.switchId}`}
          >
            {row.options.map((o) => (
              <option key={o.id} value={o.id}>
                {o.name}
              </option>
            ))}
          </select>
          {row.stale ? (
            <p id={`${id}-${row.switchId}-stale`} className="text-xs text-warn-strong" data-testid="voicing-stale">
              {row.stale}.
            </p>
          ) : null}
        </div>
      ))}
      {rows.some((r) => r.boostDb > 0) ? (
        <p className="text-xs text-ink-soft" data-testid="voicing-boost-caution">
          A boost of up to +{Math.max(...rows.map((r) => r.boostDb)).toFixed(1)} dB costs amplifier and driver headroom: check Headroom, and keep levels safe for your hearing.
        </p>
      ) : null}
      {orphans.map((o) => (
        <p key={o.switchId} className="flex flex-wrap items-center gap-2 text-xs text-warn-strong" data-testid="voicing-stale">
          <span>
            A choice for the switch “{o.switchId}” (position “{o.positionId}”) names a switch this profile no longer has; nothing plays from it.
          </span>
          <button type="button" disabled={disabled} className="underline" onClick={() => onChange(withoutVoicingChoice(choice, o.switchId))}>
            Forget it
          </button>
        </p>
      ))}
    </fieldset>
  );
}
