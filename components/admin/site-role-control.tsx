'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ApiError, apiFetch } from '@/lib/client/api';

interface Props {
  user: { id: string; name: string; siteRole: 'admin' | 'member' };
  /** The signed-in admin's own row: taking their own admin role away says so first. */
  isSelf: boolean;
}

/**
 * Makes an account a site admin, or a member again, after a confirm step (PATCH /api/v1/admin/users/{id}); the
 * server keeps the last admin and says so. The list is read again from the server afterwards.
 */
export function SiteRoleControl({ user, isSelf }: Props) {
  const router = useRouter();
  const [asking, setAsking] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const next = user.siteRole === 'admin' ? 'member' : 'admin';
  const label = next === 'admin' ? 'Make site admin' : 'Make member';
  const consequence =
    next === 'admin'
      ? `${user.name} will manage every account on this site (not what is in the workspaces).`
      : isSelf
        ? 'You will no longer manage accounts, and this page will close to you.'
        : `${user.name} will no longer manage accounts.`;

  async function change() {
    setBusy(true);
    setError(null);
    try {
      await apiFetch(`/api/v1/admin/users/${user.id}`, { method: 'PATCH', json: { siteRole: next } });
      setAsking(false);
      router.refresh();
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'The change failed; nothing was changed.');
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-col items-start gap-1">
      {asking ? (
        <div className="flex min-w-48 flex-col items-start gap-1" role="group" aria-label={`${label}: ${user.name}`}>
          <p className="text-xs">{consequence}</p>
          <div className="flex gap-2">
            <Button disabled={busy} onClick={() => void change()}>
              {busy ? 'Saving…' : label}
            </Button>
            <Button variant="secondary" disabled={busy} onClick={() => setAsking(false)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : (
        <Button variant="secondary" className="whitespace-nowrap" onClick={() => setAsking(true)} aria-label={`${label}: ${user.name}`}>
          {label}
        </Button>
      )}
      {error ? (
        <p role="alert" className="text-xs text-fail">
          {error}
        </p>
      ) : null}
    </div>
  );
}
