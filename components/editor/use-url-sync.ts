'use client';

import { useEffect, useRef, useState } from 'react';
import { decodeDocument, encodeDocument, RESTORE_PARAM, RESUME_PARAM, takePendingSystem, URL_STATE_PARAM } from '@/lib/client/url-state';
import type { SystemDocument } from '@/lib/validations/system';
import { isPanelId, type PanelId } from './panel-tabs';

interface UrlSyncOptions {
  /** A saved System keeps only the panel in the URL; anonymous work keeps the whole document and its name. */
  saved: object | undefined;
  doc: SystemDocument;
  name: string;
  panel: PanelId;
  setDoc: (doc: SystemDocument) => void;
  setName: (name: string) => void;
  setPanel: (panel: PanelId) => void;
}

const NOT_IN_THIS_TAB =
  'The System you were editing before signing in was kept in the browser tab you started in, and it is not in this one; a fresh System was opened instead.';

/**
 * The editor's state in the page address: read once after hydration (the panel; for anonymous work also the
 * document and name, or the copy kept in this tab while signing in), then kept in step as they change.
 */
export function useUrlSync({ saved, doc, name, panel, setDoc, setName, setPanel }: UrlSyncOptions) {
  const [urlProblem, setUrlProblem] = useState<string | null>(null);
  /** The editor was opened again after signing in (or up) from "Sign in to save". */
  const [resumed, setResumed] = useState(false);
  const hydrated = useRef(false);

  // First render in the browser: take the document and panel from the URL (anonymous).
  useEffect(() => {
    const params = new URLSearchParams(window.location.search);
    const p = params.get('panel');
    /* eslint-disable react-hooks/set-state-in-effect -- reading the URL once after hydration */
    if (isPanelId(p)) setPanel(p);
    if (!saved) {
      const { doc: fromUrl, problem } = decodeDocument(params.get(URL_STATE_PARAM));
      const returning = params.get(RESUME_PARAM) === '1';
      const waiting = params.get(RESTORE_PARAM) === '1';
      // Back from signing in: the document is in the link, or (when it was too long for one) kept in this tab.
      const pending = returning || waiting ? takePendingSystem(window.sessionStorage) : null;
      const n = params.get('name');
      if (fromUrl) {
        setDoc(fromUrl);
        if (n) setName(n.slice(0, 200));
      } else if (pending) {
        // Also when the link arrived damaged (cut short on the way): the copy kept in this tab is the same System.
        setDoc(pending.doc);
        setName((n ?? pending.name).slice(0, 200));
        if (!isPanelId(p) && isPanelId(pending.panel)) setPanel(pending.panel);
      } else if (n) setName(n.slice(0, 200));
      setUrlProblem(pending && !fromUrl ? null : (problem ?? (waiting && !pending ? NOT_IN_THIS_TAB : null)));
      setResumed(returning);
    }
    /* eslint-enable react-hooks/set-state-in-effect */
    hydrated.current = true;
    // The setters are useState's (stable): the URL is read again only for another System.
  }, [saved, setDoc, setName, setPanel]);

  // Keep the URL in step: the panel always; the whole document for anonymous work.
  useEffect(() => {
    if (!hydrated.current) return;
    const t = setTimeout(() => {
      const url = new URL(window.location.href);
      url.searchParams.set('panel', panel);
      if (!saved) {
        url.searchParams.set(URL_STATE_PARAM, encodeDocument(doc));
        url.searchParams.set('name', name);
        url.searchParams.delete(RESUME_PARAM);
        url.searchParams.delete(RESTORE_PARAM);
      }
      window.history.replaceState(window.history.state, '', url.toString());
    }, 150);
    return () => clearTimeout(t);
  }, [doc, panel, name, saved]);

  /** A link to open this System as anonymous work in the editor, on the present panel. */
  const shareUrl = () => {
    const url = new URL('/systems/new', window.location.origin);
    url.searchParams.set(URL_STATE_PARAM, encodeDocument(doc));
    url.searchParams.set('name', name);
    url.searchParams.set('panel', panel);
    return url.toString();
  };

  return { urlProblem, resumed, shareUrl };
}
