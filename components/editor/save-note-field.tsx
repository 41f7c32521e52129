'use client';

import { REVISION_NOTE_MAX } from '@/lib/validations/library';

/**
 * The optional note typed when saving ("moved subs to the front corners"), shown in the revision history and on the
 * Settings sheet. Nothing typed is cut off: a note over the limit is marked and the save says why it waits.
 */
export function SaveNoteField({ note, onChange, problem }: { note: string; onChange: (note: string) => void; problem: string | null }) {
  return (
    <div className="flex min-w-0 basis-full flex-col gap-1 sm:basis-64">
      <label htmlFor="save-note" className="text-xs font-medium text-ink-soft">
        Note for this save <span className="font-normal text-ink-faint">(optional)</span>
      </label>
      <input
        id="save-note"
        value={note}
        onChange={(e) => onChange(e.target.value)}
        placeholder="e.g. moved subs to the front corners"
        aria-invalid={problem ? true : undefined}
        aria-describedby={problem ? 'save-note-problem' : undefined}
        className="w-full rounded-md border border-line bg-white px-3 py-2 text-sm aria-[invalid=true]:border-fail"
        data-testid="save-note"
      />
      {problem ? (
        <p id="save-note-problem" className="text-xs text-fail">
          {problem}
        </p>
      ) : note.trim().length > REVISION_NOTE_MAX - 40 ? (
        <p className="num text-xs text-ink-faint">
          {note.trim().length} / {REVISION_NOTE_MAX} characters
        </p>
      ) : null}
    </div>
  );
}
