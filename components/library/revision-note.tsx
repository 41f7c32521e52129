'use client';

import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { ApiError } from '@/lib/client/api';
import { systemsApi } from '@/lib/hooks/use-systems';
import { REVISION_NOTE_MAX } from '@/lib/validations/library';

interface Props {
  systemId: string;
  revision: number;
  note: string | null;
  canEdit: boolean;
  /** After a note is saved (e.g. refresh the page's data). */
  onSaved: (note: string | null) => void;
}

/** A revision's note, with "Edit note" for editors: typed text stays in the field until it is saved or cancelled. */
export function RevisionNote({ systemId, revision, note, canEdit, onSaved }: Props) {
  const id = useId();
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(note ?? '');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const tooLong = text.trim().length > REVISION_NOTE_MAX;

  async function save() {
    setBusy(true);
    setError(null);
    try {
      const saved = await systemsApi.setRevisionNote(systemId, revision, text);
      setEditing(false);
      setText(saved.note ?? '');
      onSaved(saved.note);
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'The note was not saved; your text is still here.');
    } finally {
      setBusy(false);
    }
  }

  if (!editing) {
    return (
      <p className="flex flex-wrap items-center gap-x-2 text-sm">
        {note ? <span className="break-words text-ink-soft" data-testid="revision-note">“{note}”</span> : null}
        {canEdit ? (
          <button type="button" className="text-xs text-mains-dark underline hover:no-underline" onClick={() => { setText(note ?? ''); setEditing(true); }} aria-label={`${note ? 'Edit' : 'Add'} the note of revision ${revision}`}>
            {note ? 'Edit note' : 'Add a note'}
          </button>
        ) : null}
      </p>
    );
  }
  return (
    <form
      className="mt-1 flex flex-col gap-1"
      onSubmit={(e) => {
        e.preventDefault();
        if (!tooLong) void save();
      }}
    >
      <label htmlFor={`${id}-note`} className="text-xs font-medium text-ink-soft">
        Note of revision {revision} <span className="font-normal text-ink-faint">(optional; empty removes it)</span>
      </label>
      <div className="flex flex-wrap items-center gap-2">
        <input
          id={`${id}-note`}
          value={text}
          onChange={(e) => setText(e.target.value)}
          aria-invalid={tooLong || undefined}
          aria-describedby={`${id}-count`}
          placeholder="e.g. moved subs to the front corners"
          className="min-w-0 flex-1 basis-60 rounded-md border border-line bg-white px-2 py-1.5 text-sm aria-[invalid=true]:border-fail"
          data-testid="revision-note-input"
        />
        <Button type="submit" className="px-2.5 py-1.5" disabled={busy || tooLong}>
          {busy ? 'Saving…' : 'Save note'}
        </Button>
        <Button variant="ghost" className="px-2.5 py-1.5" disabled={busy} onClick={() => { setEditing(false); setError(null); }}>
          Cancel
        </Button>
      </div>
      <p id={`${id}-count`} className={`num text-xs ${tooLong ? 'text-fail' : 'text-ink-faint'}`}>
        {tooLong ? `The note is ${text.trim().length} characters; at most ${REVISION_NOTE_MAX}.` : `${text.trim().length} / ${REVISION_NOTE_MAX} characters`}
      </p>
      {error ? <p role="alert" className="text-xs text-fail">{error}</p> : null}
    </form>
  );
}
