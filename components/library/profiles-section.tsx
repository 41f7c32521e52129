'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { ApiError } from '@/lib/client/api';
import { profilesApi, useProfiles, type ProfileItem } from '@/lib/hooks/use-profiles';
import type { ProfileFields } from '@/lib/validations/profile';
import { ConfirmDelete } from '@/components/ui/confirm-delete';
import { Modal } from '@/components/ui/modal';
import { EMPTY_PROFILE, ProfileForm } from './profile-form';

type Role = 'owner' | 'editor' | 'viewer';

function rolloffText(p: ProfileItem): string {
  const low = p.lowRolloff.kind === 'sealed' ? `sealed ${p.lowRolloff.cornerHz} Hz, Q ${p.lowRolloff.q}` : p.lowRolloff.kind === 'vented' ? `vented ${p.lowRolloff.cornerHz} Hz` : 'flat';
  const high = p.highRolloff.kind === 'lowpass' ? ` · upper ${p.highRolloff.cornerHz} Hz` : '';
  return low + high;
}

function fieldsOf(p: ProfileItem): ProfileFields {
  const { name, kind, lowRolloff, highRolloff, sensitivityDb, sensitivityReference, ratedPowerW, impedanceOhm, notes, voicingOptions } = p;
  return { name, kind, lowRolloff, highRolloff, sensitivityDb, sensitivityReference, ratedPowerW, impedanceOhm, notes, voicingOptions: voicingOptions ?? [] };
}

/** The Library's Speaker profiles: a table by workspace, with create, edit and delete for editors. */
export function ProfilesSection({ workspaces }: { workspaces: { id: string; name: string; role: Role }[] }) {
  const { data, error, mutate } = useProfiles();
  const [editing, setEditing] = useState<ProfileItem | 'new' | null>(null);
  const [deleting, setDeleting] = useState<ProfileItem | null>(null);
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  const roles = new Map(workspaces.map((w) => [w.id, w.role]));
  const writable = workspaces.filter((w) => w.role !== 'viewer');
  const canEdit = (p: ProfileItem) => roles.get(p.workspaceId) === 'owner' || roles.get(p.workspaceId) === 'editor';

  return (
    <section aria-labelledby="profiles-heading" className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-3">
        <h2 id="profiles-heading" className="text-lg font-semibold">
          Speaker profiles
        </h2>
        <p className="text-sm text-ink-faint">Reusable main-speaker and subwoofer descriptions; the editor copies one into a System when you pick it.</p>
        {writable.length ? (
          <Button className="ml-auto" onClick={() => setEditing('new')}>
            New profile
          </Button>
        ) : null}
      </div>
      {message ? <Notice kind={message.kind}>{message.text}</Notice> : null}
      {error ? <Notice kind="error">{error.message}</Notice> : null}
      {!data && !error ? <p role="status">Loading profiles…</p> : null}
      {data && data.items.length === 0 ? <div className="rounded-lg border border-dashed border-line bg-white p-6 text-sm text-ink-soft">No Speaker profiles yet.</div> : null}
      {data && data.items.length ? (
        <div className="relative overflow-x-auto rounded-lg border border-line bg-white">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">Speaker profiles in your workspaces</caption>
            <thead className="border-b border-line bg-shade text-xs uppercase tracking-wide text-ink-faint">
              <tr>
                <th scope="col" className="px-3 py-2">Name</th>
                <th scope="col" className="px-3 py-2">Kind</th>
                <th scope="col" className="hidden px-3 py-2 md:table-cell">Roll-off</th>
                <th scope="col" className="hidden px-3 py-2 sm:table-cell">Sensitivity · power · impedance</th>
                <th scope="col" className="hidden px-3 py-2 lg:table-cell">Workspace</th>
                <th scope="col" className="px-3 py-2 text-right"><span className="sr-only">Actions</span></th>
              </tr>
            </thead>
            <tbody>
              {data.items.map((p) => (
                <tr key={p.id} className="border-b border-line align-top last:border-0" data-testid="profile-row">
                  <td className="px-3 py-2.5">
                    <span className="font-medium">{p.name}</span>
                    {p.notes ? <span className="mt-0.5 block max-w-md text-xs text-ink-faint">{p.notes}</span> : null}
                    {p.voicingOptions?.length ? (
                      <span className="mt-0.5 block max-w-md text-xs text-ink-soft" data-testid="profile-switches">
                        Switches: {p.voicingOptions.map((o) => o.name).join(' · ')}
                      </span>
                    ) : null}
                  </td>
                  <td className="px-3 py-2.5">
                    <span className={`rounded px-1.5 py-0.5 text-xs font-medium text-white ${p.kind === 'main' ? 'bg-mains' : 'bg-sub'}`}>{p.kind === 'main' ? 'Main' : 'Sub'}</span>
                  </td>
                  <td className="num hidden px-3 py-2.5 md:table-cell">{rolloffText(p)}</td>
                  <td className="num hidden px-3 py-2.5 sm:table-cell">
                    {p.sensitivityDb} dB ({p.sensitivityReference === '1W' ? '1 W' : '2.83 V'}) · {p.ratedPowerW} W · {p.impedanceOhm} Ω
                  </td>
                  <td className="hidden px-3 py-2.5 lg:table-cell">{p.workspaceName}</td>
                  <td className="px-3 py-2 text-right">
                    {canEdit(p) ? (
                      <div className="flex justify-end gap-1.5">
                        <Button variant="ghost" className="px-2.5 py-1.5" onClick={() => setEditing(p)} aria-label={`Edit ${p.name}`}>
                          Edit
                        </Button>
                        <Button variant="ghost" className="px-2.5 py-1.5 text-fail" onClick={() => setDeleting(p)} aria-label={`Delete ${p.name}`}>
                          Delete
                        </Button>
                      </div>
                    ) : null}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : null}

      <Modal open={editing !== null} onClose={() => setEditing(null)} title={editing === 'new' ? 'New Speaker profile' : 'Edit Speaker profile'} wide>
        {editing !== null ? (
          <ProfileForm
            initial={editing === 'new' ? EMPTY_PROFILE : fieldsOf(editing)}
            workspaces={editing === 'new' ? writable : undefined}
            submitLabel={editing === 'new' ? 'Create profile' : 'Save profile'}
            onCancel={() => setEditing(null)}
            onSubmit={async (fields, workspaceId) => {
              const saved = editing === 'new' ? await profilesApi.create({ ...fields, workspaceId }) : await profilesApi.update(editing.id, fields);
              setEditing(null);
              setMessage({ kind: 'ok', text: `Saved “${saved.name}”.` });
              await mutate();
            }}
          />
        ) : null}
      </Modal>

      <ConfirmDelete
        open={deleting !== null}
        title="Delete this profile?"
        onKeep={() => setDeleting(null)}
        onDelete={async () => {
          if (!deleting) return;
          try {
            await profilesApi.remove(deleting.id);
            setMessage({ kind: 'ok', text: `Deleted “${deleting.name}”.` });
            await mutate();
          } catch (e) {
            setMessage({ kind: 'error', text: e instanceof ApiError ? e.message : 'That did not work; nothing was changed.' });
          }
          setDeleting(null);
        }}
      >
        <span className="font-semibold">{deleting?.name}</span> leaves the Library. Systems that use it keep their own copy, so none of them changes.
      </ConfirmDelete>
    </section>
  );
}
