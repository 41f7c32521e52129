'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button, buttonClass } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/client/api';
import { systemsApi, type RevisionItem } from '@/lib/hooks/use-systems';
import { formatWhen } from './format';
import { RevisionNote } from './revision-note';

interface Props {
  systemId: string;
  currentRevision: number;
  canEdit: boolean;
  revisions: RevisionItem[];
}

export function RevisionHistory({ systemId, currentRevision, canEdit, revisions }: Props) {
  const router = useRouter();
  const [busy, setBusy] = useState<number | null>(null);
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  // Notes saved here, shown at once (the page's list catches up on refresh).
  const [notes, setNotes] = useState<ReadonlyMap<number, string | null>>(new Map());

  async function restore(revision: number) {
    setBusy(revision);
    setMessage(null);
    try {
      const saved = await systemsApi.restoreRevision(systemId, revision, currentRevision);
      setMessage({ kind: 'ok', text: `Revision ${revision} restored as revision ${saved.revision}.` });
      router.refresh();
    } catch (e) {
      const conflict = e instanceof ApiError && e.status === 409;
      setMessage({ kind: 'error', text: conflict ? `Someone saved this System meanwhile. The list is now up to date; try again.` : e instanceof ApiError ? e.message : 'That did not work; nothing was changed.' });
      if (conflict) router.refresh();
    } finally {
      setBusy(null);
    }
  }

  return (
    <div className="flex flex-col gap-3">
      {message ? <Notice kind={message.kind}>{message.text}</Notice> : null}
      <ol className="flex flex-col overflow-hidden rounded-lg border border-line bg-white" aria-label="Revisions, newest first">
        {revisions.map((r) => (
          <li key={r.revision} className="flex flex-wrap items-center gap-x-4 gap-y-1 border-b border-line px-4 py-3 last:border-0" data-testid="revision-row">
            <span className="num w-14 font-semibold">#{r.revision}</span>
            <div className="min-w-0 flex-1">
              <p className="break-words font-medium">
                {r.name}
                {r.revision === currentRevision ? <span className="ml-2 rounded bg-mains px-1.5 py-0.5 text-xs font-medium text-white">current</span> : null}
              </p>
              <p className="text-xs text-ink-faint">
                <span className="num">{formatWhen(r.createdAt)}</span> · {r.authorName ?? 'a former member'}
              </p>
              <RevisionNote
                systemId={systemId}
                revision={r.revision}
                note={notes.has(r.revision) ? (notes.get(r.revision) ?? null) : r.note}
                canEdit={canEdit}
                onSaved={(note) => {
                  setNotes((m) => new Map(m).set(r.revision, note));
                  router.refresh();
                }}
              />
            </div>
            <div className="flex gap-1.5">
              <Link href={`/library/${systemId}/revisions/${r.revision}`} className={buttonClass('ghost', 'px-2.5 py-1.5')} aria-label={`View revision ${r.revision}`}>
                View
              </Link>
              {canEdit && r.revision !== currentRevision ? (
                <Button variant="secondary" className="px-2.5 py-1.5" disabled={busy !== null} onClick={() => void restore(r.revision)} aria-label={`Restore revision ${r.revision}`}>
                  {busy === r.revision ? 'Restoring…' : 'Restore'}
                </Button>
              ) : null}
            </div>
          </li>
        ))}
      </ol>
    </div>
  );
}
