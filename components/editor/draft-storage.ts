import { systemDocumentDraftSchema, type SystemDocument } from '@/lib/validations/system';

/** Unsaved edits of a saved System, kept in this browser's localStorage under one key per System. */

export interface KeptDraft {
  name: string;
  doc: SystemDocument;
}

const draftKey = (id: string) => `seamline:draft:${id}`;

/** Keep the edits of System `id` (replacing any kept before). */
export function keepDraft(id: string, draft: KeptDraft): void {
  window.localStorage.setItem(draftKey(id), JSON.stringify(draft));
}

/** Forget the kept edits of System `id`. */
export function forgetDraft(id: string): void {
  window.localStorage.removeItem(draftKey(id));
}

/** The kept edits of System `id`, or null when there are none or they no longer parse as a System (a damaged draft is ignored). */
export function readDraft(id: string): KeptDraft | null {
  try {
    const kept = window.localStorage.getItem(draftKey(id));
    if (!kept) return null;
    const parsed = JSON.parse(kept) as { name: string; doc: unknown };
    const valid = systemDocumentDraftSchema.safeParse(parsed.doc);
    return valid.success ? { name: String(parsed.name).slice(0, 200), doc: valid.data } : null;
  } catch {
    return null;
  }
}
