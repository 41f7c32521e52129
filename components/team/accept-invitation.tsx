'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';

export function AcceptInvitation({ token }: { token: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  return (
    <div className="mt-4 flex flex-col gap-3">
      {error ? <Notice kind="error">{error}</Notice> : null}
      <Button
        disabled={busy}
        onClick={async () => {
          setBusy(true);
          setError(null);
          try {
            await apiFetch(`/api/v1/invitations/${encodeURIComponent(token)}`, { method: 'POST' });
            router.push('/team');
            router.refresh();
          } catch (e) {
            setError(e instanceof ApiError ? e.message : 'Could not accept the invitation.');
            setBusy(false);
          }
        }}
      >
        Accept invitation
      </Button>
    </div>
  );
}
