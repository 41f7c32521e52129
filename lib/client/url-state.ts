import { compressToEncodedURIComponent, decompressFromEncodedURIComponent } from 'lz-string';
import { systemDocumentDraftSchema, type SystemDocument } from '@/lib/validations/system';

/** The anonymous editor keeps its whole document in the URL (`?s=`), compressed with lz-string. */
export const URL_STATE_PARAM = 's';

export function encodeDocument(doc: SystemDocument): string {
  return compressToEncodedURIComponent(JSON.stringify(doc));
}

/**
 * The document in `encoded`, or null with the reason when it is missing, damaged or invalid. A document whose only
 * fault is a position outside its room is kept (read with the draft schema): the editor marks those positions.
 */
export function decodeDocument(encoded: string | null | undefined): { doc: SystemDocument | null; problem: string | null } {
  if (!encoded) return { doc: null, problem: null };
  let raw: unknown;
  try {
    const text = decompressFromEncodedURIComponent(encoded);
    if (!text) return { doc: null, problem: 'The link is damaged (it could not be unpacked); a fresh System was opened instead.' };
    raw = JSON.parse(text);
  } catch {
    return { doc: null, problem: 'The link is damaged (it is not a System); a fresh System was opened instead.' };
  }
  const parsed = systemDocumentDraftSchema.safeParse(raw);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    return { doc: null, problem: `The link holds a System that is not valid (${first ? `${first.path.join('.')}: ${first.message}` : 'unknown problem'}); a fresh System was opened instead.` };
  }
  return { doc: parsed.data, problem: null };
}

/** An anonymous System as the editor holds it: the document, its name and the open panel. */
export interface AnonymousState {
  doc: SystemDocument;
  name: string;
  panel: string;
}

/** `?resume=1`: the editor was reached again after signing in (or up); `?restore=1`: the document waits in sessionStorage. */
export const RESUME_PARAM = 'resume';
export const RESTORE_PARAM = 'restore';

/** This tab's anonymous System kept across signing in when it is too long for the sign-in link. */
export const PENDING_SYSTEM_KEY = 'seamline:pending-system';

/**
 * Longest callbackUrl (as sent, percent-encoded) that carries the document itself. The sign-in page's address holds it,
 * and the editor's address after signing in, and each may travel again as a Referer: kept well inside a server's
 * 16 kB of request headers.
 */
export const MAX_RETURN_URL_CHARS = 4000;

/** The anonymous editor's own address for `state` (`/systems/new?panel=…&s=…&name=…`), with `extra` parameters. */
export function editorPath(state: AnonymousState, extra: Record<string, string> = {}): string {
  const params = new URLSearchParams({ panel: state.panel, [URL_STATE_PARAM]: encodeDocument(state.doc), name: state.name, ...extra });
  return `/systems/new?${params.toString()}`;
}

/**
 * The "Sign in to save" link for an anonymous System: signing in (or up) comes back to the editor with the same document,
 * name and panel. Short documents travel in the link itself; a longer one is kept in this tab's sessionStorage
 * (`keepPendingSystem`, called when the link is followed) and the link carries only `restore=1`.
 */
export function signInToSaveHref(state: AnonymousState): { href: string; inLink: boolean } {
  const full = editorPath(state, { [RESUME_PARAM]: '1' });
  if (encodeURIComponent(full).length <= MAX_RETURN_URL_CHARS) return { href: `/sign-in?callbackUrl=${encodeURIComponent(full)}`, inLink: true };
  const short = `/systems/new?${new URLSearchParams({ panel: state.panel, [RESTORE_PARAM]: '1', [RESUME_PARAM]: '1' }).toString()}`;
  return { href: `/sign-in?callbackUrl=${encodeURIComponent(short)}`, inLink: false };
}

/** Keeps `state` in this tab's sessionStorage until the editor is opened again (see `takePendingSystem`). */
export function keepPendingSystem(storage: Pick<Storage, 'setItem'>, state: AnonymousState): boolean {
  try {
    storage.setItem(PENDING_SYSTEM_KEY, JSON.stringify({ name: state.name, panel: state.panel, doc: state.doc }));
    return true;
  } catch {
    return false; // storage full or refused: the link still carries the document when it fits
  }
}

/** The System kept by `keepPendingSystem` (and forgets it), or null when there is none or it is not a System. */
export function takePendingSystem(storage: Pick<Storage, 'getItem' | 'removeItem'>): { doc: SystemDocument; name: string; panel: string | null } | null {
  let text: string | null;
  try {
    text = storage.getItem(PENDING_SYSTEM_KEY);
    storage.removeItem(PENDING_SYSTEM_KEY);
  } catch {
    return null;
  }
  if (!text) return null;
  try {
    const raw = JSON.parse(text) as { name?: unknown; panel?: unknown; doc?: unknown };
    const parsed = systemDocumentDraftSchema.safeParse(raw.doc);
    if (!parsed.success) return null;
    return { doc: parsed.data, name: typeof raw.name === 'string' && raw.name.trim() ? raw.name.slice(0, 200) : 'Untitled System', panel: typeof raw.panel === 'string' ? raw.panel : null };
  } catch {
    return null;
  }
}
