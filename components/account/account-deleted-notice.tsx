'use client';

import { useSearchParams } from 'next/navigation';
import { Notice } from '@/components/ui/notice';

/** On the home page after an account was deleted (`/?account=deleted`, where the Account page signs out to). */
export function AccountDeletedNotice() {
  const params = useSearchParams();
  if (params.get('account') !== 'deleted') return null;
  return (
    <div className="mb-6">
      <Notice kind="ok" title="Your account is deleted">
        You are signed out, and your sign-in, tokens and personal details are gone. What you saved in workspaces you shared stays with the people there.
      </Notice>
    </div>
  );
}
