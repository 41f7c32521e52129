'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { DeleteAccountForm } from './delete-account-form';
import { useDeletionPlan } from './use-deletion-plan';

/**
 * The Account page's last section, "Delete your account": what it means in plain words; the plan (each workspace and
 * what happens to it) is read only once the person asks to go on, then the form.
 */
export function DeleteAccount() {
  const [open, setOpen] = useState(false);
  const plan = useDeletionPlan(open);

  return (
    <section aria-labelledby="delete-account-title" className="flex flex-col gap-4 border-t border-line pt-6">
      <h2 id="delete-account-title" className="text-lg font-semibold">
        Delete your account
      </h2>
      <div className="flex flex-col gap-2 text-sm text-ink-soft">
        <p>
          Deleting your account signs you out everywhere and removes your name, e-mail address, password and access tokens. Workspaces you share with others stay
          with them, and so does what you saved there: it is shown as by “a former member”.
        </p>
        <p>For each workspace you alone own, you choose: hand it to one of its members, or delete it with everything in it. You will see what each choice removes first.</p>
      </div>
      {!open ? (
        <div>
          <Button variant="secondary" onClick={() => setOpen(true)}>
            See what deleting my account would do
          </Button>
        </div>
      ) : plan.error ? (
        <Notice kind="error">{String(plan.error.message)}</Notice>
      ) : !plan.data ? (
        <p role="status">Reading your workspaces…</p>
      ) : plan.data.blockedReason ? (
        <Notice kind="warn" title="Your account cannot be deleted now">
          {plan.data.blockedReason}
        </Notice>
      ) : (
        // Keyed by the plan's content, so a plan read again after a refusal starts the decisions afresh.
        <DeleteAccountForm key={JSON.stringify(plan.data.workspaces.map((w) => [w.workspaceId, w.onlyOwner, w.otherMembers.length]))} plan={plan.data} onStale={() => void plan.mutate()} />
      )}
    </section>
  );
}
