'use client';

import Link from 'next/link';
import { useCallback, useMemo, useState } from 'react';
import dynamic from 'next/dynamic';
import { BlendPanel } from '@/components/blend/blend-panel';
import { OutsideRoomNotice } from '@/components/system/outside-room-notice';
import { SystemContext, type SystemEditorValue } from '@/components/system/system-context';
import { Button, buttonClass } from '@/components/ui/button';
import { useRequiredText } from '@/components/ui/required-text';
import { keepPendingSystem, signInToSaveHref } from '@/lib/client/url-state';
import { newSystemDocument } from '@/lib/demo/systems';
import { outsideForMlpGeometry, positionsOutsideRoom } from '@/lib/system-model/room-bounds';
import { systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';
import { EditorNotices } from './editor-notices';
import { PanelTabs, PANELS, type PanelId } from './panel-tabs';
import { SaveNoteField } from './save-note-field';
import { useDraft } from './use-draft';
import { useSaveSystem } from './use-save-system';
import { useUnits } from './use-units';
import { useUrlSync } from './use-url-sync';

// Blend is the first panel; the others load when their tab is first opened (a smaller first load).
const loadingPanel = () => (
  <p role="status" className="p-4 text-sm text-ink-soft">
    Loading the panel…
  </p>
);
const TimingPanel = dynamic(() => import('@/components/timing/timing-panel').then((m) => m.TimingPanel), { loading: loadingPanel });
const ModesPanel = dynamic(() => import('@/components/modes/modes-panel').then((m) => m.ModesPanel), { loading: loadingPanel });
const SeatBalancePanel = dynamic(() => import('@/components/seat-balance/seat-balance-panel').then((m) => m.SeatBalancePanel), { loading: loadingPanel });
const LayoutPanel = dynamic(() => import('@/components/layout/layout-panel').then((m) => m.LayoutPanel), { loading: loadingPanel });
const HeadroomPanel = dynamic(() => import('@/components/headroom/headroom-panel').then((m) => m.HeadroomPanel), { loading: loadingPanel });
const MeasuredPanel = dynamic(() => import('@/components/measured/measured-panel').then((m) => m.MeasuredPanel), { loading: loadingPanel });
const ProcessorFiltersPanel = dynamic(() => import('@/components/processor-filters/processor-filters-panel').then((m) => m.ProcessorFiltersPanel), { loading: loadingPanel });
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

/** The System editor: one document behind its panels; anonymous work lives in the URL. */
export function SystemEditor({ saved, signedIn }: Props) {
  const [doc, setDoc] = useState<SystemDocument>(() => saved?.document ?? newSystemDocument());
  const [name, setName] = useState(saved?.name ?? 'Untitled System');
  const nameCheck = useRequiredText({ id: 'system-name', label: 'System name', value: name, max: 200 });
  const [panel, setPanel] = useState<PanelId>('blend');
  const [copied, setCopied] = useState(false);
  const readOnly = saved?.role === 'viewer';
  const { units, setUnits } = useUnits();
  const { revision, dirty, saveState, save, saveNew, note, setNote, noteProblem } = useSaveSystem({ saved, doc, name, panel });
  const { urlProblem, resumed, shareUrl } = useUrlSync({ saved, doc, name, panel, setDoc, setName, setPanel });
  const draft = useDraft({
    saved,
    readOnly,
    dirty,
    doc,
    name,
    onRestore: (kept) => {
      setDoc(kept.doc);
      setName(kept.name);
    },
  });

  const update = useCallback((fn: (d: SystemDocument) => SystemDocument) => {
    if (readOnly) return;
    setDoc((d) => fn(d));
  }, [readOnly]);

  const value: SystemEditorValue = useMemo(() => ({ doc, update, units, setUnits, readOnly }), [doc, update, units, setUnits, readOnly]);
  const validity = useMemo(() => systemDocumentSchema.safeParse(doc), [doc]);
  const outside = useMemo(() => positionsOutsideRoom(doc), [doc]);
  // Blend, Timing and Headroom measure from the MLP to every speaker and sub: none is shown while one of those is outside.
  const blocking = panel === 'blend' || panel === 'timing' || panel === 'headroom' ? outsideForMlpGeometry(doc, outside) : [];
  const signInToSave = useMemo(() => (signedIn || saved ? null : signInToSaveHref({ doc, name, panel })), [signedIn, saved, doc, name, panel]);

  const ActivePanel = { blend: BlendPanel, timing: TimingPanel, modes: ModesPanel, 'seat-balance': SeatBalancePanel, layout: LayoutPanel, headroom: HeadroomPanel, measured: MeasuredPanel, 'processor-filters': ProcessorFiltersPanel }[panel];

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
              {...nameCheck.inputProps}
              className={`w-full max-w-xl rounded-md border bg-white px-3 py-2 text-lg font-semibold ${nameCheck.error ? 'border-fail' : 'border-line'}`}
            />
            {nameCheck.message}
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
          {signedIn && !readOnly ? <SaveNoteField note={note} onChange={setNote} problem={noteProblem} /> : null}
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

        <EditorNotices
          urlProblem={urlProblem}
          resumed={resumed && signedIn && !saved}
          validity={validity}
          saveState={saveState}
          savedRevision={saved ? revision : null}
          onSaveCopy={() => saveNew(`${name} (my copy)`)}
          onReloadTheirs={() => {
            draft.keep();
            window.location.reload();
          }}
          draftOffer={draft.draftOffer !== null}
          onRestoreDraft={draft.restore}
          onDiscardDraft={draft.discard}
        />

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
