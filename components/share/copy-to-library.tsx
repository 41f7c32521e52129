'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button, buttonClass } from '@/components/ui/button';
import { ApiError } from '@/lib/client/api';
import { systemsApi } from '@/lib/hooks/use-systems';

/** "Copy to my Library" on a shared page: pick a workspace where you are an editor; anonymous visitors are sent to sign in. */
export function CopyToLibrary({ token, workspaces, signedIn }: { token: string; workspaces: { id: string; name: string }[]; signedIn: boolean }) {
  const router = useRouter();
  const [workspaceId, setWorkspaceId] = useState(workspaces[0]?.id ?? '');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  if (!signedIn) {
    return (
      <Link href={`/sign-in?callbackUrl=${encodeURIComponent(`/s/${token}`)}`} className={buttonClass('secondary')}>
        Sign in to copy to your Library
      </Link>
    );
  }
  if (!workspaces.length) return <p className="text-sm text-ink-faint">You are a viewer in every workspace, so there is nowhere to copy this System.</p>;

  return (
    <form
      className="flex flex-wrap items-end gap-2"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        setError(null);
        try {
          const copy = await systemsApi.copyShared(token, workspaceId);
          router.push(`/systems/${copy.id}`);
        } catch (err) {
          setError(err instanceof ApiError ? err.message : 'That did not work; nothing was changed.');
          setBusy(false);
        }
      }}
    >
      {workspaces.length > 1 ? (
        <div className="flex flex-col gap-1">
          <label htmlFor="copy-workspace" className="text-xs font-medium text-ink-soft">
            Into workspace
          </label>
          <select id="copy-workspace" value={workspaceId} onChange={(e) => setWorkspaceId(e.target.value)} className="rounded-md border border-line bg-white px-2.5 py-2 text-sm">
            {workspaces.map((w) => (
              <option key={w.id} value={w.id}>
                {w.name}
              </option>
            ))}
          </select>
        </div>
      ) : null}
      <Button type="submit" disabled={busy}>
        {busy ? 'Copying…' : 'Copy to my Library'}
      </Button>
      {error ? (
        <p role="alert" className="w-full text-sm text-fail">
          {error}
        </p>
      ) : null}
    </form>
  );
}
