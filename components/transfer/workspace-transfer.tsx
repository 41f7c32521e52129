'use client';

import { useId, useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError, type ApiIssue } from '@/lib/client/api';
import type { TransferImportAnswer } from '@/lib/data/workspace-import';
import type { AppWorkspace } from '@/lib/data/workspaces';
import { IMPORT_LIMIT_BYTES } from '@/lib/validations/workspace-transfer';
import { ExportLink } from './export-link';
import { ImportRefusal, ImportResult } from './import-result';
import { uploadTransferFile } from './upload-transfer-file';

type Stage =
  | { kind: 'idle' }
  | { kind: 'busy'; progress: number }
  | { kind: 'done'; answer: TransferImportAnswer }
  | { kind: 'refused'; fileName: string; message: string; issues: ApiIssue[]; totalIssues: number }
  | { kind: 'failed'; message: string };

interface Props {
  workspace: Pick<AppWorkspace, 'id' | 'name' | 'role'>;
  /** Called after an import created something (the workspace list may have grown). */
  onImported: () => void;
  onOpenWorkspace: (id: string) => void;
}

/**
 * Taking a workspace out as one file (owners) and bringing a file in: a workspace file as a new workspace (anyone) or
 * into this one while it is empty (owners; the server refuses a workspace holding anything), or a System file into this
 * workspace (editors and owners).
 */
export function WorkspaceTransfer({ workspace, onImported, onOpenWorkspace }: Props) {
  const id = useId();
  const [file, setFile] = useState<File | null>(null);
  // A new key empties the file input after an import.
  const [inputKey, setInputKey] = useState(0);
  const [stage, setStage] = useState<Stage>({ kind: 'idle' });
  const canAddSystems = workspace.role !== 'viewer';
  const busy = stage.kind === 'busy';

  async function run(url: string) {
    if (!file) return;
    if (file.size > IMPORT_LIMIT_BYTES) {
      setStage({ kind: 'failed', message: `${file.name} is larger than ${IMPORT_LIMIT_BYTES / 1024 / 1024} MB; an import file may be at most that. Nothing was sent.` });
      return;
    }
    setStage({ kind: 'busy', progress: 0 });
    try {
      const answer = await uploadTransferFile(url, file, (progress) => setStage({ kind: 'busy', progress }));
      setStage({ kind: 'done', answer });
      setFile(null);
      setInputKey((k) => k + 1);
      onImported();
    } catch (e) {
      if (e instanceof ApiError && e.status === 400) setStage({ kind: 'refused', fileName: file.name, message: e.message, issues: e.issues, totalIssues: Number(e.body.totalIssues ?? e.issues.length) });
      else setStage({ kind: 'failed', message: e instanceof ApiError ? e.message : 'The import failed; nothing was changed.' });
    }
  }

  return (
    <section aria-labelledby={`${id}-title`} className="flex min-w-0 flex-col gap-4 rounded-lg border border-line bg-white p-4" data-testid="workspace-transfer">
      <div>
        <h2 id={`${id}-title`} className="text-lg font-semibold">
          Export and import
        </h2>
        <p className="text-sm text-ink-soft">Take a workspace out as one file and bring it back here or into another Seamline.</p>
      </div>

      {workspace.role === 'owner' ? (
        <div className="flex flex-col items-start gap-2">
          <ExportLink href={`/api/v1/workspaces/${workspace.id}/export`} label={`Export workspace ${workspace.name}`}>
            Export workspace
          </ExportLink>
          <p className="text-xs text-ink-faint">
            Every System with all its revisions and notes, the Lessons and their Steps, the Speaker profiles, the measurements, and the members’ e-mail addresses and roles. Never passwords,
            access tokens or Share links. A JSON file, or a zip when it is large.
          </p>
        </div>
      ) : null}

      <div className="flex min-w-0 flex-col gap-2">
        <label htmlFor={`${id}-file`} className="text-sm font-medium">
          Import a workspace file
        </label>
        <input
          key={inputKey}
          id={`${id}-file`}
          type="file"
          accept=".json,.zip,application/json,application/zip"
          disabled={busy}
          onChange={(e) => {
            setFile(e.target.files?.[0] ?? null);
            setStage({ kind: 'idle' });
          }}
          className="max-w-full text-sm file:mr-3 file:rounded-md file:border file:border-line file:bg-white file:px-3 file:py-1.5 file:text-sm"
          data-testid="transfer-file"
        />
        <p className="text-xs text-ink-faint">
          A whole-workspace file becomes a new workspace that you own, or fills this one if you own it and it holds nothing yet; its members are listed, not added. A file of one System
          (Export with history, in the Library) can be added to this workspace. At most 50 MB; the whole file is checked before anything is created.
        </p>
        <div className="flex flex-wrap gap-2">
          <Button disabled={!file || busy} onClick={() => void run('/api/v1/workspaces/import')}>
            Import as a new workspace
          </Button>
          {workspace.role === 'owner' ? (
            <Button variant="secondary" disabled={!file || busy} onClick={() => void run(`/api/v1/workspaces/import?workspaceId=${encodeURIComponent(workspace.id)}`)}>
              Import into {workspace.name}
            </Button>
          ) : null}
          {canAddSystems ? (
            <Button variant="secondary" disabled={!file || busy} onClick={() => void run(`/api/v1/workspaces/${workspace.id}/systems/import`)}>
              Add a System file to {workspace.name}
            </Button>
          ) : null}
        </div>
      </div>

      {stage.kind === 'busy' ? (
        <div className="flex items-center gap-2 text-sm" role="status">
          <label htmlFor={`${id}-progress`}>{stage.progress < 1 ? 'Uploading' : 'Checking and creating'}</label>
          <progress id={`${id}-progress`} max={1} value={stage.progress} className="h-2 flex-1 accent-mains" />
          <span className="num">{Math.round(stage.progress * 100)} %</span>
        </div>
      ) : null}
      {stage.kind === 'done' ? <ImportResult answer={stage.answer} onOpenWorkspace={onOpenWorkspace} /> : null}
      {stage.kind === 'refused' ? <ImportRefusal fileName={stage.fileName} message={stage.message} issues={stage.issues} totalIssues={stage.totalIssues} /> : null}
      {stage.kind === 'failed' ? <Notice kind="error">{stage.message}</Notice> : null}
    </section>
  );
}
