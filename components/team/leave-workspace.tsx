'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Modal } from '@/components/ui/modal';
import { Notice } from '@/components/ui/notice';
import type { MemberItem, WorkspaceItem } from '@/lib/hooks/use-workspaces';

/**
 * "Leave this workspace" under the member list: a confirm step saying what leaving means; the only owner is told to
 * hand ownership over first (the server refuses it too, 409).
 */
export function LeaveWorkspace({ workspace, members, userId, onLeave }: { workspace: WorkspaceItem; members: MemberItem[]; userId: string; onLeave: () => Promise<void> }) {
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const others = members.filter((m) => m.userId !== userId);
  const onlyOwner = workspace.role === 'owner' && !others.some((m) => m.role === 'owner');

  async function leave() {
    setBusy(true);
    try {
      await onLeave();
    } finally {
      setBusy(false);
      setConfirming(false);
    }
  }

  return (
    <section aria-labelledby="leave-title" className="flex flex-col gap-2 rounded-lg border border-line bg-white p-4">
      <h2 id="leave-title" className="text-lg font-semibold">
        Leave this workspace
      </h2>
      {onlyOwner ? (
        <Notice kind="info" title="You are its only owner">
          {others.length
            ? 'A workspace always keeps an owner. Make another member an owner (the Role column above), then you can leave.'
            : 'Nobody else is in it, and a workspace always keeps an owner. Invite someone and make them an owner first; or, if you are leaving Seamline, delete your account on the Account page, which offers to delete this workspace.'}
        </Notice>
      ) : (
        <>
          <p className="text-sm text-ink-soft">You lose access to its Systems, Lessons and measurements at once. What you saved there stays with the workspace. To come back, an owner invites you again.</p>
          <div>
            <Button variant="secondary" onClick={() => setConfirming(true)}>
              Leave {workspace.name}…
            </Button>
          </div>
        </>
      )}
      <Modal open={confirming} onClose={() => (busy ? undefined : setConfirming(false))} title={`Leave “${workspace.name}”?`}>
        <p className="text-sm">
          You will no longer see anything in it, and your access tokens for it stop working. What you saved there stays for the others, under your name while you have an
          account.
        </p>
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={() => setConfirming(false)}>
            Stay
          </Button>
          <Button variant="danger" disabled={busy} onClick={() => void leave()}>
            Leave
          </Button>
        </div>
      </Modal>
    </section>
  );
}
