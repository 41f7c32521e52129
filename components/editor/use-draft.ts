'use client';

import { useEffect, useState } from 'react';
import type { SystemDocument } from '@/lib/validations/system';
import { forgetDraft, keepDraft, readDraft, type KeptDraft } from './draft-storage';

interface DraftOptions {
  /** The saved System being edited; anonymous work has no draft (it lives in the URL). */
  saved: { id: string } | undefined;
  readOnly: boolean;
  /** The editor holds edits not saved yet. */
  dirty: boolean;
  doc: SystemDocument;
  name: string;
  /** Put restored edits back into the editor. */
  onRestore: (draft: KeptDraft) => void;
}

/**
 * Local unsaved work of a saved System: kept in this browser while the editor is dirty, offered back
 * when the System is opened again, and a warning before leaving the page with unsaved edits.
 */
export function useDraft({ saved, readOnly, dirty, doc, name, onRestore }: DraftOptions) {
  const [draftOffer, setDraftOffer] = useState<KeptDraft | null>(null);

  // First render in the browser: offer edits kept from earlier.
  useEffect(() => {
    if (!saved) return;
    const kept = readDraft(saved.id);
    // eslint-disable-next-line react-hooks/set-state-in-effect -- reading the browser's storage once after hydration
    if (kept) setDraftOffer(kept);
  }, [saved]);

  // Unsaved edits of a saved System are kept in this browser until they are saved.
  useEffect(() => {
    if (!saved || readOnly) return;
    if (dirty) keepDraft(saved.id, { name, doc });
    else forgetDraft(saved.id);
  }, [dirty, doc, name, saved, readOnly]);

  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  return {
    draftOffer,
    restore: () => {
      if (!draftOffer) return;
      onRestore(draftOffer);
      setDraftOffer(null);
    },
    discard: () => {
      if (saved) forgetDraft(saved.id);
      setDraftOffer(null);
    },
    /** Keep the present edits (e.g. before reloading someone else's newer version). */
    keep: () => {
      if (saved) keepDraft(saved.id, { name, doc });
    },
  };
}
