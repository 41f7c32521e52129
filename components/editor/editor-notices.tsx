import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import type { SystemDocument } from '@/lib/validations/system';
import type { SaveState } from './use-save-system';

type Validity = { success: true; data: SystemDocument } | { success: false; error: { issues: readonly { path: readonly PropertyKey[]; message: string }[] } };

interface EditorNoticesProps {
  /** What was wrong with the System in the page address, if anything. */
  urlProblem: string | null;
  /** Show "You are signed in…" after returning from "Sign in to save". */
  resumed: boolean;
  validity: Validity;
  saveState: SaveState;
  /** The revision just saved, for a saved System; null for anonymous work. */
  savedRevision: number | null;
  onSaveCopy: () => void;
  onReloadTheirs: () => void;
  /** Edits kept in this browser from earlier are on offer. */
  draftOffer: boolean;
  onRestoreDraft: () => void;
  onDiscardDraft: () => void;
}

/** The editor's messages, read out as they change: the URL's problem, validity, saving, a conflict, and kept edits. */
export function EditorNotices({ urlProblem, resumed, validity, saveState, savedRevision, onSaveCopy, onReloadTheirs, draftOffer, onRestoreDraft, onDiscardDraft }: EditorNoticesProps) {
  return (
    <div aria-live="polite" className="no-print flex flex-col gap-2">
      {urlProblem ? <Notice kind="warn">{urlProblem}</Notice> : null}
      {resumed ? (
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
      {saveState.kind === 'saved' ? <Notice kind="ok">Saved{savedRevision !== null ? ` as revision ${savedRevision}` : ''}.</Notice> : null}
      {saveState.kind === 'error' ? <Notice kind="error">{saveState.message}</Notice> : null}
      {saveState.kind === 'conflict' ? (
        <Notice kind="warn" title="Someone else saved this System first">
          <p>{saveState.message}</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <Button onClick={onSaveCopy}>Save my edits as a copy</Button>
            <Button variant="secondary" onClick={onReloadTheirs}>
              Reload their version (my edits stay in this browser)
            </Button>
          </div>
        </Notice>
      ) : null}
      {draftOffer ? (
        <Notice kind="info" title="You have unsaved edits of this System from earlier">
          <div className="mt-1 flex flex-wrap gap-2">
            <Button onClick={onRestoreDraft}>Restore my edits</Button>
            <Button variant="secondary" onClick={onDiscardDraft}>
              Discard them
            </Button>
          </div>
        </Notice>
      ) : null}
    </div>
  );
}
