'use client';

import Link from 'next/link';
import { useState } from 'react';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import { useWorkspaces } from '@/lib/hooks/use-workspaces';
import { NewSecret } from './new-secret';
import { TokenForm } from './token-form';
import { TokenList } from './token-list';
import { useAccessTokens, type AccessTokenItem, type CreatedAccessToken } from './use-access-tokens';

/** The Account page's "Access tokens" section: what they are for, the form, the new secret once, and the list. */
export function AccessTokens() {
  const tokens = useAccessTokens();
  const workspaces = useWorkspaces();
  // The secret lives only here, until "Done" (or leaving the page) forgets it.
  const [created, setCreated] = useState<{ name: string; secret: string } | null>(null);
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);

  async function onCreated(token: CreatedAccessToken) {
    setMessage(null);
    setCreated({ name: token.name, secret: token.token });
    await tokens.mutate();
  }

  async function onRevoke(token: AccessTokenItem) {
    setMessage(null);
    try {
      await apiFetch(`/api/v1/tokens/${token.id}`, { method: 'DELETE' });
      setMessage({ kind: 'ok', text: `“${token.name}” is revoked: programs using it are refused from now on.` });
    } catch (e) {
      setMessage({ kind: 'error', text: e instanceof ApiError ? e.message : 'That did not work; the token still works.' });
    }
    await tokens.mutate();
  }

  return (
    <section aria-labelledby="tokens-title" className="flex flex-col gap-4">
      <h2 id="tokens-title" className="text-lg font-semibold">
        Access tokens
      </h2>
      <div className="flex flex-col gap-2 text-sm text-ink-soft">
        <p>
          An access token lets a program of your own use Seamline&apos;s API as you: a commissioning checklist that reads a System&apos;s settings, a spreadsheet that lists
          Systems, a processor-setup script that takes the delays and trims. It goes in the request&apos;s <code className="num text-ink">Authorization: Bearer …</code> header.
        </p>
        <p>
          Each token reaches one workspace, to read only or to read and write (never more than an editor may). It never manages members, invitations or tokens: those
          stay with you, signed in. Revoke a token as soon as its program no longer needs it. Every route is described on the{' '}
          <Link href="/docs/api" className="text-mains underline">
            API page
          </Link>
          .
        </p>
      </div>

      {workspaces.error ? <Notice kind="error">{String(workspaces.error.message)}</Notice> : workspaces.data ? <TokenForm workspaces={workspaces.data.items} onCreated={(t) => void onCreated(t)} /> : <p role="status">Loading workspaces…</p>}

      {created ? <NewSecret name={created.name} secret={created.secret} onDismiss={() => setCreated(null)} /> : null}

      <h3 className="text-base font-semibold">Your tokens</h3>
      <p className="text-sm text-ink-soft">Revoked and expired tokens stay in this list for 30 days after they end, then drop out of it; they never work again.</p>
      {message ? <Notice kind={message.kind}>{message.text}</Notice> : null}
      {tokens.error ? <Notice kind="error">{String(tokens.error.message)}</Notice> : tokens.data ? <TokenList tokens={tokens.data.items} onRevoke={onRevoke} /> : <p role="status">Loading tokens…</p>}
    </section>
  );
}
