'use client';

import { useState } from 'react';
import { Modal } from '@/components/ui/modal';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/client/api';
import { systemsApi, useShareLinks } from '@/lib/hooks/use-systems';

/**
 * The Share dialog: create read-only links to a saved System, copy them, revoke them.
 * A link shows the last saved revision to anyone who has it (no sign-in), until it is revoked.
 */
export function ShareDialog({ systemId, buttonLabel = 'Share', variant = 'secondary' }: { systemId: string; buttonLabel?: string; variant?: 'secondary' | 'ghost' }) {
  const [open, setOpen] = useState(false);
  const links = useShareLinks(open ? systemId : null);
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  const [copied, setCopied] = useState<string | null>(null);

  async function act(fn: () => Promise<unknown>, ok: string) {
    setBusy(true);
    setMessage(null);
    try {
      await fn();
      setMessage({ kind: 'ok', text: ok });
      await links.mutate();
    } catch (e) {
      setMessage({ kind: 'error', text: e instanceof ApiError ? e.message : 'That did not work; nothing was changed.' });
    } finally {
      setBusy(false);
    }
  }

  async function copy(url: string) {
    try {
      await navigator.clipboard.writeText(url);
      setCopied(url);
    } catch {
      setMessage({ kind: 'error', text: 'The browser did not allow copying; select the address and copy it by hand.' });
    }
  }

  const items = links.data?.items ?? [];
  return (
    <>
      <Button variant={variant} className={variant === 'ghost' ? 'px-2.5 py-1.5' : ''} onClick={() => setOpen(true)} data-testid="share-open">
        {buttonLabel}
      </Button>
      <Modal open={open} onClose={() => setOpen(false)} title="Share a read-only link" wide>
        <p className="text-sm text-ink-soft">
          Anyone with a link can see this System’s plots and Settings sheet as last saved, without signing in, and can copy it into their own Library. They cannot change
          it. Revoke a link to close it at once.
        </p>
        {message ? <Notice kind={message.kind}>{message.text}</Notice> : null}
        {links.error ? <Notice kind="error">{links.error.message}</Notice> : null}
        <div>
          <Button disabled={busy} onClick={() => void act(() => systemsApi.share(systemId), 'A new link was created.')} data-testid="share-create">
            Create link
          </Button>
        </div>
        {!links.data && !links.error ? <p role="status" className="text-sm">Loading links…</p> : null}
        {links.data && items.length === 0 ? <p className="text-sm text-ink-faint">No open links.</p> : null}
        {items.length ? (
          <ul className="flex flex-col gap-2" aria-label="Open links">
            {items.map((l) => (
              <li key={l.token} className="flex flex-col gap-2 rounded-md border border-line p-3" data-testid="share-link">
                <label className="sr-only" htmlFor={`link-${l.token}`}>
                  Link address
                </label>
                <input
                  id={`link-${l.token}`}
                  readOnly
                  value={l.url}
                  onFocus={(e) => e.currentTarget.select()}
                  className="num w-full rounded-md border border-line bg-shade px-2 py-1.5 text-xs"
                  data-testid="share-url"
                />
                <div className="flex flex-wrap items-center gap-2">
                  <span className="text-xs text-ink-faint">
                    Created {l.createdAt.slice(0, 10)}
                    {l.createdByName ? ` by ${l.createdByName}` : ''}
                  </span>
                  <div className="ml-auto flex gap-2">
                    <Button variant="secondary" className="px-2.5 py-1.5" onClick={() => void copy(l.url)}>
                      {copied === l.url ? 'Copied' : 'Copy'}
                    </Button>
                    <a href={l.url} target="_blank" rel="noreferrer" className="rounded-md px-2.5 py-1.5 text-sm font-medium hover:bg-wash">
                      Open
                    </a>
                    <Button variant="danger" className="px-2.5 py-1.5" disabled={busy} onClick={() => void act(() => systemsApi.revokeLink(l.token), 'The link was revoked; it now answers “not found”.')} data-testid="share-revoke">
                      Revoke
                    </Button>
                  </div>
                </div>
              </li>
            ))}
          </ul>
        ) : null}
      </Modal>
    </>
  );
}
