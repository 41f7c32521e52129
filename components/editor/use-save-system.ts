'use client';

import { useRouter } from 'next/navigation';
import { useEffect, useRef, useState } from 'react';
import { ApiError, apiFetch } from '@/lib/client/api';
import { REVISION_NOTE_MAX } from '@/lib/validations/library';
import type { SystemDocument } from '@/lib/validations/system';
import { forgetDraft } from './draft-storage';

export type SaveState = { kind: 'idle' } | { kind: 'saving' } | { kind: 'saved'; at: number } | { kind: 'conflict'; currentRevision: number | null; message: string } | { kind: 'error'; message: string };

interface SaveOptions {
  /** The saved System being edited, or undefined for anonymous work (saved as a new System). */
  saved: { id: string; name: string; revision: number; document: SystemDocument } | undefined;
  doc: SystemDocument;
  name: string;
  /** The panel to open after saving anonymous work. */
  panel: string;
}

const SAVE_FAILED = 'Saving failed; your edits are still here.';
const savedForm = (name: string, doc: SystemDocument) => JSON.stringify({ n: name, d: doc });

/**
 * Saving: a saved System is written as a new revision naming the one it started from (a stale one is a 409, shown
 * as a conflict); anonymous work, or "Save my edits as a copy", becomes a new System in the Library.
 */
export function useSaveSystem({ saved, doc, name, panel }: SaveOptions) {
  const router = useRouter();
  const [revision, setRevision] = useState(saved?.revision ?? 0);
  const [lastSaved, setLastSaved] = useState(() => (saved ? savedForm(saved.name, saved.document) : ''));
  const [saveState, setSaveState] = useState<SaveState>({ kind: 'idle' });
  // The optional note of the next save ("moved subs to the front corners"); kept until a save succeeds.
  const [note, setNote] = useState('');
  const creating = useRef(false);
  // Arriving at the created System (or another) ends the create: a later "save as new" may create again.
  useEffect(() => {
    creating.current = false;
  }, [saved?.id]);
  const noteProblem = note.trim().length > REVISION_NOTE_MAX ? `The note is ${note.trim().length} characters; at most ${REVISION_NOTE_MAX}. Shorten it to save.` : null;
  const dirty = saved ? savedForm(name, doc) !== lastSaved : false;

  async function saveNew(asName: string) {
    if (noteProblem) return setSaveState({ kind: 'error', message: noteProblem });
    // One create per editor: a second click (or call) before the first answers must not make a second System.
    if (creating.current) return;
    creating.current = true;
    setSaveState({ kind: 'saving' });
    try {
      const created = await apiFetch<{ id: string }>('/api/v1/systems', { method: 'POST', json: { name: asName, document: doc, ...(note.trim() ? { note } : {}) } });
      setSaveState({ kind: 'saved', at: Date.now() });
      router.push(`/systems/${created.id}?panel=${panel}`);
    } catch (e) {
      creating.current = false;
      setSaveState({ kind: 'error', message: e instanceof ApiError ? e.message : SAVE_FAILED });
    }
  }

  async function save() {
    if (!saved) return saveNew(name);
    if (noteProblem) return setSaveState({ kind: 'error', message: noteProblem });
    setSaveState({ kind: 'saving' });
    try {
      const answer = await apiFetch<{ revision: number; name: string; document: SystemDocument }>(`/api/v1/systems/${saved.id}`, { method: 'PUT', json: { name, document: doc, revision, note } });
      setRevision(answer.revision);
      setNote('');
      setLastSaved(savedForm(name, doc));
      forgetDraft(saved.id);
      setSaveState({ kind: 'saved', at: Date.now() });
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) {
        setSaveState({ kind: 'conflict', currentRevision: (e.body.currentRevision as number | null) ?? null, message: e.message });
      } else setSaveState({ kind: 'error', message: e instanceof ApiError ? e.message : SAVE_FAILED });
    }
  }

  return { revision, dirty, saveState, save, saveNew, note, setNote, noteProblem };
}
