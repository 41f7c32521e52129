'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button, buttonClass } from '@/components/ui/button';
import { useRequiredText } from '@/components/ui/required-text';
import { ApiError } from '@/lib/client/api';
import { systemsApi } from '@/lib/hooks/use-systems';
import { ShareDialog } from '@/components/share/share-dialog';
import { ConfirmDelete } from '@/components/ui/confirm-delete';
import { Modal } from '@/components/ui/modal';

interface Props {
  id: string;
  name: string;
  revision: number;
  canEdit: boolean;
  deleted: boolean;
}

/** Open, history, duplicate, rename and delete one System (or restore it from Recently deleted). */
export function SystemRowActions({ id, name, revision, canEdit, deleted }: Props) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [renaming, setRenaming] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [newName, setNewName] = useState(name);
  const [nameError, setNameError] = useState<string | undefined>();
  const renameCheck = useRequiredText({ id: `rename-${id}`, label: 'Name', value: newName, max: 200, serverError: nameError });

  async function run(fn: () => Promise<unknown>) {
    setBusy(true);
    setError(null);
    try {
      await fn();
      router.refresh();
      return true;
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'That did not work; nothing was changed.');
      return false;
    } finally {
      setBusy(false);
    }
  }

  if (deleted) {
    return (
      <div className="flex flex-wrap items-center justify-end gap-2">
        {canEdit ? (
          <Button variant="secondary" disabled={busy} onClick={() => void run(() => systemsApi.restore(id))} aria-label={`Restore ${name}`}>
            Restore
          </Button>
        ) : null}
        {error ? <p role="alert" className="w-full text-right text-sm text-fail">{error}</p> : null}
      </div>
    );
  }

  return (
    <div className="flex flex-wrap items-center justify-end gap-1.5">
      <Link href={`/library/${id}`} className={buttonClass('ghost', 'px-2.5 py-1.5')} aria-label={`History of ${name}`}>
        History
      </Link>
      <Link href={`/systems/${id}/sheet`} className={buttonClass('ghost', 'px-2.5 py-1.5')} aria-label={`Settings sheet of ${name}`}>
        Sheet
      </Link>
      {canEdit ? (
        <>
          <ShareDialog systemId={id} variant="ghost" />
          <Button variant="ghost" className="px-2.5 py-1.5" disabled={busy} onClick={() => void run(() => systemsApi.duplicate(id))} aria-label={`Duplicate ${name}`}>
            Duplicate
          </Button>
          <Button
            variant="ghost"
            className="px-2.5 py-1.5"
            onClick={() => {
              setNewName(name);
              setNameError(undefined);
              setRenaming(true);
            }}
            aria-label={`Rename ${name}`}
          >
            Rename
          </Button>
          <Button variant="ghost" className="px-2.5 py-1.5 text-fail" onClick={() => setConfirmDelete(true)} aria-label={`Delete ${name}`}>
            Delete
          </Button>
        </>
      ) : null}
      {error ? <p role="alert" className="w-full text-right text-sm text-fail">{error}</p> : null}

      <Modal open={renaming} onClose={() => setRenaming(false)} title="Rename System">
        <form
          className="flex flex-col gap-3"
          onSubmit={async (e) => {
            e.preventDefault();
            setNameError(undefined);
            setBusy(true);
            try {
              await systemsApi.rename(id, newName, revision);
              setRenaming(false);
              router.refresh();
            } catch (err) {
              setNameError(err instanceof ApiError ? (err.field('name') ?? err.message) : 'That did not work; nothing was changed.');
            } finally {
              setBusy(false);
            }
          }}
        >
          <label htmlFor={`rename-${id}`} className="text-sm font-medium">
            Name
          </label>
          <input
            id={`rename-${id}`}
            value={newName}
            onChange={(e) => setNewName(e.target.value)}
            maxLength={200}
            {...renameCheck.inputProps}
            className={`rounded-md border bg-white px-3 py-2 text-sm ${renameCheck.error ? 'border-fail' : 'border-line'}`}
          />
          {renameCheck.message}
          <p className="text-xs text-ink-faint">Renaming saves a new revision; the history keeps the old name.</p>
          <div className="flex justify-end gap-2">
            <Button variant="secondary" onClick={() => setRenaming(false)}>
              Cancel
            </Button>
            <Button type="submit" disabled={busy || !newName.trim()}>
              Rename
            </Button>
          </div>
        </form>
      </Modal>

      <ConfirmDelete
        open={confirmDelete}
        title="Delete this System?"
        onKeep={() => setConfirmDelete(false)}
        busy={busy}
        onDelete={async () => {
          if (await run(() => systemsApi.remove(id))) setConfirmDelete(false);
        }}
      >
        <span className="font-semibold">{name}</span> moves to Recently deleted, where anyone who can edit this workspace can restore it for 30 days. Its share links stop
        working while it is deleted.
      </ConfirmDelete>
    </div>
  );
}
