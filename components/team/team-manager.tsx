'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import { useInvitations, useMembers, useWorkspaces } from '@/lib/hooks/use-workspaces';
import { WorkspaceTransfer } from '@/components/transfer/workspace-transfer';
import { LeaveWorkspace } from './leave-workspace';

const ROLES = ['owner', 'editor', 'viewer'] as const;

export function TeamManager({ userId }: { userId: string }) {
  const workspaces = useWorkspaces();
  const [selected, setSelected] = useState<string | null>(null);
  const list = workspaces.data?.items ?? [];
  const current = list.find((w) => w.id === selected) ?? list.find((w) => !w.personal) ?? list[0] ?? null;
  const members = useMembers(current?.id ?? null);
  const invitations = useInvitations(current?.id ?? null);
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  const [inviteEmail, setInviteEmail] = useState('');
  const [inviteRole, setInviteRole] = useState<(typeof ROLES)[number]>('editor');
  const [inviteError, setInviteError] = useState<string | undefined>();
  const [newName, setNewName] = useState('');
  const isOwner = current?.role === 'owner';

  async function act(fn: () => Promise<unknown>, ok: string) {
    setMessage(null);
    try {
      await fn();
      setMessage({ kind: 'ok', text: ok });
      await Promise.all([workspaces.mutate(), members.mutate(), invitations.mutate()]);
    } catch (e) {
      setMessage({ kind: 'error', text: e instanceof ApiError ? e.message : 'That did not work.' });
    }
  }

  if (workspaces.error) return <Notice kind="error">{String(workspaces.error.message)}</Notice>;
  if (!workspaces.data) return <p role="status">Loading workspaces…</p>;

  return (
    <div className="grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[260px_minmax(0,1fr)]">
      <aside className="flex min-w-0 flex-col gap-2">
        <h2 className="text-sm font-semibold uppercase tracking-wide text-ink-faint">Workspaces</h2>
        <ul className="flex flex-col gap-1">
          {list.map((w) => (
            <li key={w.id}>
              <button
                type="button"
                aria-current={w.id === current?.id ? 'true' : undefined}
                onClick={() => setSelected(w.id)}
                className={`w-full rounded-md px-3 py-2 text-left text-sm wrap-anywhere ${w.id === current?.id ? 'bg-white font-semibold shadow-sm' : 'hover:bg-white'}`}
              >
                {w.name}
                <span className="block text-xs font-normal text-ink-faint">
                  {w.role} · {w.memberCount} member{w.memberCount === 1 ? '' : 's'}
                </span>
              </button>
            </li>
          ))}
        </ul>
        <form
          className="mt-3 flex flex-col gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void act(() => apiFetch('/api/v1/workspaces', { method: 'POST', json: { name: newName } }), `Workspace "${newName}" created.`).then(() => setNewName(''));
          }}
        >
          <label htmlFor="new-workspace" className="text-sm font-medium">
            New workspace
          </label>
          <input id="new-workspace" value={newName} onChange={(e) => setNewName(e.target.value)} className="rounded-md border border-line bg-white px-3 py-2 text-sm" placeholder="e.g. a class or a company" />
          <Button type="submit" variant="secondary" disabled={!newName.trim()}>
            Create
          </Button>
        </form>
      </aside>

      {current ? (
        <section className="flex min-w-0 flex-col gap-5">
          <div>
            <h1 className="text-2xl font-semibold">{current.name}</h1>
            <p className="text-sm text-ink-soft">Your role: {current.role}. Owners manage members; editors create and change Systems; viewers read.</p>
          </div>
          {message ? <Notice kind={message.kind}>{message.text}</Notice> : null}
          <div className="relative overflow-x-auto rounded-lg border border-line bg-white">
            <table className="w-full text-left text-sm">
              <caption className="sr-only">Members of {current.name}</caption>
              <thead className="border-b border-line bg-shade text-xs uppercase tracking-wide text-ink-faint">
                <tr>
                  <th className="px-3 py-2">Name</th>
                  <th className="px-3 py-2">E-mail</th>
                  <th className="px-3 py-2">Role</th>
                  <th className="px-3 py-2">
                    <span className="sr-only">Actions</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {!members.data ? (
                  <tr>
                    <td colSpan={4} className="px-3 py-2 text-sm text-ink-soft" role="status">
                      {members.error ? `The members could not be read: ${String(members.error.message)}` : 'Loading members…'}
                    </td>
                  </tr>
                ) : null}
                {(members.data?.items ?? []).map((m) => (
                  <tr key={m.userId} className="border-b border-line last:border-0">
                    <td className="px-3 py-2">{m.name}</td>
                    <td className="px-3 py-2">{m.email}</td>
                    <td className="px-3 py-2">
                      {isOwner ? (
                        <select
                          aria-label={`Role of ${m.name}`}
                          value={m.role}
                          onChange={(e) => void act(() => apiFetch(`/api/v1/workspaces/${current.id}/members/${m.userId}`, { method: 'PATCH', json: { role: e.target.value } }), `${m.name} is now ${e.target.value}.`)}
                          className="rounded-md border border-line bg-white px-2 py-1"
                        >
                          {ROLES.map((r) => (
                            <option key={r} value={r}>
                              {r}
                            </option>
                          ))}
                        </select>
                      ) : (
                        m.role
                      )}
                    </td>
                    <td className="px-3 py-2 text-right">
                      {m.userId === userId ? (
                        <span className="text-xs text-ink-faint">you</span>
                      ) : isOwner ? (
                        <Button variant="ghost" onClick={() => void act(() => apiFetch(`/api/v1/workspaces/${current.id}/members/${m.userId}`, { method: 'DELETE' }), `${m.name} was removed.`)}>
                          Remove
                        </Button>
                      ) : null}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>

          {isOwner ? (
            <form
              className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-white p-4"
              onSubmit={async (e) => {
                e.preventDefault();
                setInviteError(undefined);
                setMessage(null);
                try {
                  await apiFetch(`/api/v1/workspaces/${current.id}/invitations`, { method: 'POST', json: { email: inviteEmail, role: inviteRole } });
                  setMessage({ kind: 'ok', text: `Invitation sent to ${inviteEmail}.` });
                  setInviteEmail('');
                  await invitations.mutate();
                } catch (err) {
                  if (err instanceof ApiError) setInviteError(err.field('email') ?? err.message);
                  else setInviteError('Could not send the invitation.');
                }
              }}
            >
              <div className="flex min-w-64 flex-1 flex-col gap-1">
                <label htmlFor="invite-email" className="text-sm font-medium">
                  Invite by e-mail
                </label>
                <input id="invite-email" type="email" value={inviteEmail} onChange={(e) => setInviteEmail(e.target.value)} aria-invalid={inviteError ? true : undefined} aria-describedby={inviteError ? 'invite-error' : undefined} className="rounded-md border border-line bg-white px-3 py-2 text-sm" />
                {inviteError ? (
                  <p id="invite-error" role="alert" className="text-sm text-fail">
                    {inviteError}
                  </p>
                ) : null}
              </div>
              <div className="flex flex-col gap-1">
                <label htmlFor="invite-role" className="text-sm font-medium">
                  Role
                </label>
                <select id="invite-role" value={inviteRole} onChange={(e) => setInviteRole(e.target.value as (typeof ROLES)[number])} className="rounded-md border border-line bg-white px-3 py-2 text-sm">
                  {ROLES.map((r) => (
                    <option key={r} value={r}>
                      {r}
                    </option>
                  ))}
                </select>
              </div>
              <Button type="submit">Send invitation</Button>
            </form>
          ) : null}

          <div>
            <h2 className="text-lg font-semibold">Pending invitations</h2>
            {!invitations.data ? (
              <p className="mt-1 text-sm text-ink-soft" role="status">
                {invitations.error ? `The invitations could not be read: ${String(invitations.error.message)}` : 'Loading invitations…'}
              </p>
            ) : invitations.data.items.length === 0 ? (
              <p className="mt-1 text-sm text-ink-soft">None.</p>
            ) : (
              <ul className="mt-2 flex flex-col gap-2">
                {(invitations.data?.items ?? []).map((i) => (
                  <li key={i.id} className="flex flex-wrap items-center gap-3 rounded-md border border-line bg-white px-3 py-2 text-sm">
                    <span>{i.email}</span>
                    <span className="text-ink-faint">as {i.role}</span>
                    <span className="text-ink-faint">until {i.expiresAt.slice(0, 10)}</span>
                    {isOwner ? (
                      <Button variant="ghost" className="ml-auto" onClick={() => void act(() => apiFetch(`/api/v1/workspaces/${current.id}/invitations/${i.id}`, { method: 'DELETE' }), `Invitation to ${i.email} withdrawn.`)}>
                        Withdraw
                      </Button>
                    ) : null}
                  </li>
                ))}
              </ul>
            )}
          </div>

          <WorkspaceTransfer workspace={current} onImported={() => void workspaces.mutate()} onOpenWorkspace={setSelected} />

          {members.data ? (
            <LeaveWorkspace
              key={current.id}
              workspace={current}
              members={members.data.items}
              userId={userId}
              onLeave={() => act(() => apiFetch(`/api/v1/workspaces/${current.id}/members/${userId}`, { method: 'DELETE' }), `You left ${current.name}.`).then(() => setSelected(null))}
            />
          ) : null}
        </section>
      ) : null}
    </div>
  );
}
