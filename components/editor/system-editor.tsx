'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useCallback, useEffect, useMemo, useRef, useState, useSyncExternalStore } from 'react';
import dynamic from 'next/dynamic';
import { BlendPanel } from '@/components/blend/blend-panel';
import { Button, buttonClass } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import { decodeDocument, encodeDocument, keepPendingSystem, RESTORE_PARAM, RESUME_PARAM, signInToSaveHref, takePendingSystem, URL_STATE_PARAM } from '@/lib/client/url-state';
import { newSystemDocument } from '@/lib/demo/systems';
import { outsideForMlpGeometry, positionsOutsideRoom } from '@/lib/system-model/room-bounds';
import { systemDocumentDraftSchema, systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';
import { OutsideRoomNotice } from './outside-room-notice';
import { isPanelId, PanelTabs, PANELS, type PanelId } from './panel-tabs';

import { SystemContext, type SystemEditorValue, type UnitSystem } from './system-context';

// Blend is the first panel; the others load when their tab is first opened (a smaller first load).
const loadingPanel = () => (
  <p role="status" className="p-4 text-sm text-ink-soft">
    Loading the panel…
  </p>
);
const TimingPanel = dynamic(() => import('@/components/timing/timing-panel').then((m) => m.TimingPanel), { loading: loadingPanel });
const ModesPanel = dynamic(() => import('@/components/modes/modes-panel').then((m) => m.ModesPanel), { loading: loadingPanel });
const LayoutPanel = dynamic(() => import('@/components/layout/layout-panel').then((m) => m.LayoutPanel), { loading: loadingPanel });
const HeadroomPanel = dynamic(() => import('@/components/headroom/headroom-panel').then((m) => m.HeadroomPanel), { loading: loadingPanel });
const MeasuredPanel = dynamic(() => import('@/components/measured/measured-panel').then((m) => m.MeasuredPanel), { loading: loadingPanel });
const ShareDialog = dynamic(() => import('@/components/share/share-dialog').then((m) => m.ShareDialog));
const AddToLessonButton = dynamic(() => import('@/components/lessons/add-to-lesson-button').then((m) => m.AddToLessonButton));

export interface SavedSystemInfo {
  id: string;
  name: string;
  revision: number;
  role: 'owner' | 'editor' | 'viewer';
  workspaceName: string;
  updatedAt: string;
  lastEditorName: string;
}

interface Props {
  /** A saved System (from /systems/[id]); absent for the anonymous editor at /systems/new. */
  saved?: SavedSystemInfo & { document: SystemDocument };
  signedIn: boolean;
}

type SaveState = { kind: 'idle' } | { kind: 'saving' } | { kind: 'saved'; at: number } | { kind: 'conflict'; currentRevision: number | null; message: string } | { kind: 'error'; message: string };

const UNITS_KEY = 'seamline:units';
const draftKey = (id: string) => `seamline:draft:${id}`;

function subscribeUnits(cb: () => void) {
  window.addEventListener('storage', cb);
  window.addEventListener('seamline-units', cb);
  return () => {
    window.removeEventListener('storage', cb);
    window.removeEventListener('seamline-units', cb);
  };
}
const readUnits = (): UnitSystem => (window.localStorage.getItem(UNITS_KEY) === 'imperial' ? 'imperial' : 'metric');

/** The System editor: one document behind five panels; anonymous work lives in the URL. */
export function SystemEditor({ saved, signedIn }: Props) {
  const router = useRouter();
  const [doc, setDoc] = useState<SystemDocument>(() => saved?.document ?? newSystemDocument());
  const [name, setName] = useState(saved?.name ?? 'Untitled System');
  const [revision, setRevision] = useState(saved?.revision ?? 0);
  const [lastSaved, setLastSaved] = useState(() => (saved ? JSON.stringify({ n: saved.name, d: saved.document }) : ''));
  const [panel, setPanel] = useState<PanelId>('blend');
  const [saveState, setSaveState] = useState<SaveState>({ kind: 'idle' });
  const [urlProblem, setUrlProblem] = useState<string | null>(null);
  const [draftOffer, setDraftOffer] = useState<{ name: string; doc: SystemDocument } | null>(null);
  const [copied, setCopied] = useState(false);
  /** The editor was opened again after signing in (or up) from "Sign in to save". */
  const [resumed, setResumed] = useState(false);
  const hydrated = useRef(false);
  const units = useSyncExternalStore(subscribeUnits, readUnits, () => 'metric' as UnitSystem);
  const readOnly = saved?.role === 'viewer';
  const dirty = saved ? JSON.stringify({ n: name, d: doc }) !== lastSaved : false;

  // First render in the browser: take the document and panel from the URL (anonymous) or offer a kept draft.
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
      setUrlProblem(
        pending && !fromUrl
          ? null
          : (problem ?? (waiting && !pending ? 'The System you were editing before signing in was kept in the browser tab you started in, and it is not in this one; a fresh System was opened instead.' : null)),
      );
      setResumed(returning);
    } else {
      try {
        const kept = window.localStorage.getItem(draftKey(saved.id));
        if (kept) {
          const parsed = JSON.parse(kept) as { name: string; doc: unknown };
          const valid = systemDocumentDraftSchema.safeParse(parsed.doc);
          if (valid.success) setDraftOffer({ name: String(parsed.name).slice(0, 200), doc: valid.data });
        }
      } catch {
        // a damaged draft is ignored
      }
    }
    /* eslint-enable react-hooks/set-state-in-effect */
    hydrated.current = true;
  }, [saved]);

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

  // Unsaved edits of a saved System are kept in this browser until they are saved.
  useEffect(() => {
    if (!saved || readOnly) return;
    if (dirty) window.localStorage.setItem(draftKey(saved.id), JSON.stringify({ name, doc }));
    else window.localStorage.removeItem(draftKey(saved.id));
  }, [dirty, doc, name, saved, readOnly]);

  useEffect(() => {
    if (!dirty) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty]);

  const update = useCallback((fn: (d: SystemDocument) => SystemDocument) => {
    if (readOnly) return;
    setDoc((d) => fn(d));
  }, [readOnly]);

  const setUnits = useCallback((u: UnitSystem) => {
    window.localStorage.setItem(UNITS_KEY, u);
    window.dispatchEvent(new Event('seamline-units'));
  }, []);

  const value: SystemEditorValue = useMemo(() => ({ doc, update, units, setUnits, readOnly }), [doc, update, units, setUnits, readOnly]);
  const validity = useMemo(() => systemDocumentSchema.safeParse(doc), [doc]);
  const outside = useMemo(() => positionsOutsideRoom(doc), [doc]);
  // Blend, Timing and Headroom measure from the MLP to every speaker and sub: none is shown while one of those is outside.
  const blocking = panel === 'blend' || panel === 'timing' || panel === 'headroom' ? outsideForMlpGeometry(doc, outside) : [];
  const signInToSave = useMemo(() => (signedIn || saved ? null : signInToSaveHref({ doc, name, panel })), [signedIn, saved, doc, name, panel]);

  async function saveNew(asName: string) {
    setSaveState({ kind: 'saving' });
    try {
      const created = await apiFetch<{ id: string }>('/api/v1/systems', { method: 'POST', json: { name: asName, document: doc } });
      setSaveState({ kind: 'saved', at: Date.now() });
      router.push(`/systems/${created.id}?panel=${panel}`);
    } catch (e) {
      setSaveState({ kind: 'error', message: e instanceof ApiError ? e.message : 'Saving failed; your edits are still here.' });
    }
  }

  async function save() {
    if (!saved) return saveNew(name);
    setSaveState({ kind: 'saving' });
    try {
      const answer = await apiFetch<{ revision: number; name: string; document: SystemDocument }>(`/api/v1/systems/${saved.id}`, { method: 'PUT', json: { name, document: doc, revision } });
      setRevision(answer.revision);
      setLastSaved(JSON.stringify({ n: name, d: doc }));
      window.localStorage.removeItem(draftKey(saved.id));
      setSaveState({ kind: 'saved', at: Date.now() });
    } catch (e) {
      if (e instanceof ApiError && e.status === 409) {
        setSaveState({ kind: 'conflict', currentRevision: (e.body.currentRevision as number | null) ?? null, message: e.message });
      } else setSaveState({ kind: 'error', message: e instanceof ApiError ? e.message : 'Saving failed; your edits are still here.' });
    }
  }

  const shareUrl = () => {
    const url = new URL('/systems/new', window.location.origin);
    url.searchParams.set(URL_STATE_PARAM, encodeDocument(doc));
    url.searchParams.set('name', name);
    url.searchParams.set('panel', panel);
    return url.toString();
  };

  const ActivePanel = { blend: BlendPanel, timing: TimingPanel, modes: ModesPanel, layout: LayoutPanel, headroom: HeadroomPanel, measured: MeasuredPanel }[panel];

  return (
    <SystemContext.Provider value={value}>
      <div className="flex flex-col gap-4">
        <div className="no-print flex flex-wrap items-end gap-3">
          <div className="flex min-w-0 flex-1 basis-full flex-col gap-1 lg:basis-0">
            <label htmlFor="system-name" className="text-xs font-medium text-ink-soft">
              System name
            </label>
            <input
              id="system-name"
              value={name}
              readOnly={readOnly}
              maxLength={200}
              onChange={(e) => setName(e.target.value)}
              className="w-full max-w-xl rounded-md border border-line bg-white px-3 py-2 text-lg font-semibold"
            />
            <p className="text-xs text-ink-faint">
              {saved ? (
                <>
                  {saved.workspaceName} · revision <span className="num">{revision}</span> · {readOnly ? 'read only (viewer)' : dirty ? 'unsaved changes' : 'all changes saved'}
                </>
              ) : (
                'Not saved: this System lives in the page address. Bookmark or copy the link to keep it.'
              )}
            </p>
          </div>
          <div role="group" aria-label="Units" className="flex overflow-hidden rounded-md border border-line text-sm">
            {(['metric', 'imperial'] as const).map((u) => (
              <button key={u} type="button" aria-pressed={units === u} onClick={() => setUnits(u)} className={`px-3 py-2 ${units === u ? 'bg-ink text-white' : 'bg-white text-ink'}`}>
                {u === 'metric' ? 'Metric' : 'Feet'}
              </button>
            ))}
          </div>
          {!saved ? (
            <Button
              variant="secondary"
              onClick={async () => {
                await navigator.clipboard?.writeText(shareUrl()).catch(() => undefined);
                setCopied(true);
                setTimeout(() => setCopied(false), 2000);
              }}
            >
              {copied ? 'Link copied' : 'Copy link'}
            </Button>
          ) : null}
          {saved ? (
            <Link href={`/systems/${saved.id}/sheet`} className={buttonClass('secondary')}>
              Settings sheet
            </Link>
          ) : null}
          {saved && !readOnly ? <ShareDialog systemId={saved.id} /> : null}
          {signedIn ? <AddToLessonButton doc={doc} name={name} panel={panel} /> : null}
          {readOnly ? (
            <Link href={shareUrl()} className={buttonClass('secondary')}>
              Open a copy in the editor
            </Link>
          ) : signedIn ? (
            <Button onClick={save} disabled={saveState.kind === 'saving' || !validity.success || (saved && !dirty)} data-testid="save-button">
              {saveState.kind === 'saving' ? 'Saving…' : saved ? 'Save' : 'Save to Library'}
            </Button>
          ) : signInToSave ? (
            <Link href={signInToSave.href} prefetch={false} onClick={() => keepPendingSystem(window.sessionStorage, { doc, name, panel })} className={buttonClass('primary')} data-testid="sign-in-to-save">
              Sign in to save
            </Link>
          ) : null}
        </div>

        <div aria-live="polite" className="no-print flex flex-col gap-2">
          {urlProblem ? <Notice kind="warn">{urlProblem}</Notice> : null}
          {resumed && signedIn && !saved ? (
            <div data-testid="resume-notice">
              <Notice kind="info" title="You are signed in, and your System is as you left it">
                {validity.success ? 'Save to Library keeps it in your Library.' : 'Fix what is listed below, then Save to Library keeps it in your Library.'}
              </Notice>
            </div>
          ) : null}
          {!validity.success ? (
            <Notice kind="error" title="This System cannot be saved yet">
              {validity.error.issues.slice(0, 3).map((i) => (
                <span key={i.path.join('.')} className="block">
                  {i.path.join('.')}: {i.message}
                </span>
              ))}
            </Notice>
          ) : null}
          {saveState.kind === 'saved' ? <Notice kind="ok">Saved{saved ? ` as revision ${revision}` : ''}.</Notice> : null}
          {saveState.kind === 'error' ? <Notice kind="error">{saveState.message}</Notice> : null}
          {saveState.kind === 'conflict' ? (
            <Notice kind="warn" title="Someone else saved this System first">
              <p>{saveState.message}</p>
              <div className="mt-2 flex flex-wrap gap-2">
                <Button onClick={() => saveNew(`${name} (my copy)`)}>Save my edits as a copy</Button>
                <Button
                  variant="secondary"
                  onClick={() => {
                    if (saved) window.localStorage.setItem(draftKey(saved.id), JSON.stringify({ name, doc }));
                    window.location.reload();
                  }}
                >
                  Reload their version (my edits stay in this browser)
                </Button>
              </div>
            </Notice>
          ) : null}
          {draftOffer ? (
            <Notice kind="info" title="You have unsaved edits of this System from earlier">
              <div className="mt-1 flex flex-wrap gap-2">
                <Button
                  onClick={() => {
                    setDoc(draftOffer.doc);
                    setName(draftOffer.name);
                    setDraftOffer(null);
                  }}
                >
                  Restore my edits
                </Button>
                <Button
                  variant="secondary"
                  onClick={() => {
                    if (saved) window.localStorage.removeItem(draftKey(saved.id));
                    setDraftOffer(null);
                  }}
                >
                  Discard them
                </Button>
              </div>
            </Notice>
          ) : null}
        </div>

        <PanelTabs active={panel} onChange={setPanel} />
        <section role="tabpanel" id={`panel-${panel}`} aria-labelledby={`tab-${panel}`} className="min-h-[60vh]">
          <h2 className="sr-only">{PANELS.find((p) => p.id === panel)?.label}</h2>
          {blocking.length ? (
            <div className="py-4">
              <OutsideRoomNotice outside={blocking} title="Not computed: a position is outside the room" testId="panel-outside-room">
                <p className="mt-1">This page measures from the MLP to every speaker and sub. Move them inside on Layout, or make the room larger on Modes; changing the room never moves anything.</p>
                <div className="mt-2 flex flex-wrap gap-2">
                  <Button variant="secondary" onClick={() => setPanel('layout')}>
                    Open Layout
                  </Button>
                  <Button variant="secondary" onClick={() => setPanel('modes')}>
                    Open Modes
                  </Button>
                </div>
              </OutsideRoomNotice>
            </div>
          ) : (
            <ActivePanel />
          )}
        </section>
      </div>
    </SystemContext.Provider>
  );
}
