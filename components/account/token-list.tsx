'use client';

import { useState } from 'react';
import { formatWhen } from '@/components/library/format';
import { Button } from '@/components/ui/button';
import { Modal } from '@/components/ui/modal';
import { StatusPill, type PillTone } from '@/components/ui/status-pill';
import type { AccessTokenItem } from './use-access-tokens';

const STATUS: Record<AccessTokenItem['status'], { tone: PillTone; icon: string }> = {
  active: { tone: 'ok', icon: '✓' },
  expired: { tone: 'warn', icon: '⌛' },
  revoked: { tone: 'neutral', icon: '✕' },
};

const SCOPE_LABEL: Record<AccessTokenItem['scope'], string> = { read: 'read', write: 'read and write' };

/** Dates as the rest of the app shows them: the day for created and expiry, day and time (UTC) for the last use. */
const day = (iso: string) => iso.slice(0, 10);

function Detail({ term, children, testId, mono = false }: { term: string; children: string; testId?: string; mono?: boolean }) {
  return (
    <div className="flex min-w-0 flex-col">
      <dt className="text-xs uppercase tracking-wide text-ink-faint">{term}</dt>
      <dd data-testid={testId} className={`${mono ? 'num ' : ''}text-sm wrap-anywhere`}>
        {children}
      </dd>
    </div>
  );
}

/**
 * The user's tokens as cards (they stack on a phone, a row of details on a wide screen); active ones have Revoke with a
 * confirm step, revoked and expired ones are dimmed and say which.
 */
export function TokenList({ tokens, onRevoke }: { tokens: AccessTokenItem[]; onRevoke: (token: AccessTokenItem) => Promise<void> }) {
  const [pending, setPending] = useState<AccessTokenItem | null>(null);
  const [busy, setBusy] = useState(false);

  if (!tokens.length) return <p className="text-sm text-ink-soft">No tokens yet.</p>;

  async function revoke() {
    if (!pending) return;
    setBusy(true);
    try {
      await onRevoke(pending);
    } finally {
      setBusy(false);
      setPending(null);
    }
  }

  return (
    <>
      <ul className="flex flex-col gap-2" aria-label="Your access tokens">
        {tokens.map((t) => {
          const active = t.status === 'active';
          return (
            <li key={t.id} data-testid="token-row" data-status={t.status} className={`flex flex-col gap-2 rounded-lg border border-line p-3 ${active ? 'bg-white' : 'border-dashed bg-shade text-ink-soft'}`}>
              <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
                <h4 className="min-w-0 font-semibold wrap-anywhere">{t.name}</h4>
                <StatusPill tone={STATUS[t.status].tone} icon={STATUS[t.status].icon} testId="token-status">
                  {t.status}
                  {t.status === 'revoked' && t.revokedAt ? ` ${day(t.revokedAt)}` : ''}
                </StatusPill>
                <code className="num text-xs text-ink-faint" aria-label={`Begins with ${t.hint}`}>
                  {t.hint}
                </code>
                {active ? (
                  <Button variant="secondary" className="ml-auto py-1" aria-label={`Revoke ${t.name}`} onClick={() => setPending(t)}>
                    Revoke
                  </Button>
                ) : null}
              </div>
              <dl className="grid grid-cols-2 gap-x-4 gap-y-2 sm:grid-cols-5">
                <Detail term="Workspace">{t.workspaceName}</Detail>
                <Detail term="Access">{SCOPE_LABEL[t.scope]}</Detail>
                <Detail term="Created" mono>{day(t.createdAt)}</Detail>
                <Detail term="Last used" testId="token-last-used" mono>
                  {t.lastUsedAt ? formatWhen(t.lastUsedAt) : 'never'}
                </Detail>
                <Detail term={t.status === 'expired' ? 'Expired' : 'Expires'} mono>{t.expiresAt ? day(t.expiresAt) : 'never'}</Detail>
              </dl>
            </li>
          );
        })}
      </ul>
      <Modal open={pending !== null} onClose={() => (busy ? undefined : setPending(null))} title={`Revoke “${pending?.name ?? ''}”?`}>
        <p className="text-sm">Every program that uses this token is refused from its next call on. This cannot be undone: make a new token if one is needed again.</p>
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={() => setPending(null)}>
            Keep it
          </Button>
          <Button variant="danger" disabled={busy} onClick={() => void revoke()}>
            Revoke
          </Button>
        </div>
      </Modal>
    </>
  );
}
