'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { useRequiredText } from '@/components/ui/required-text';
import { ApiError, apiFetch } from '@/lib/client/api';

/** Creates a Lesson in one of the caller's writable workspaces and opens it. */
export function NewLessonForm({ workspaces }: { workspaces: { id: string; name: string }[] }) {
  const router = useRouter();
  const [title, setTitle] = useState('');
  const [workspaceId, setWorkspaceId] = useState(workspaces[0]?.id ?? '');
  const [error, setError] = useState<string | null>(null);
  const titleCheck = useRequiredText({ id: 'new-lesson-title', label: 'New Lesson title', value: title, max: 200 });
  const [busy, setBusy] = useState(false);
  return (
    <form
      className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-white p-4"
      onSubmit={async (e) => {
        e.preventDefault();
        setBusy(true);
        try {
          const created = await apiFetch<{ id: string }>('/api/v1/lessons', { method: 'POST', json: { title, workspaceId: workspaceId || undefined } });
          router.push(`/lessons/${created.id}`);
        } catch (err) {
          setError(err instanceof ApiError ? (err.field('title') ?? err.message) : 'Creating the Lesson failed.');
          setBusy(false);
        }
      }}
    >
      <label className="flex min-w-[16rem] flex-1 flex-col gap-1 text-sm">
        <span className="font-medium">New Lesson title</span>
        <input value={title} onChange={(e) => setTitle(e.target.value)} maxLength={200} className={`rounded-md border px-3 py-2 ${titleCheck.error ? 'border-fail' : 'border-line'}`} {...titleCheck.inputProps} aria-invalid={titleCheck.error || error ? true : undefined} aria-describedby={titleCheck.error ? 'new-lesson-title-required' : error ? 'new-lesson-error' : undefined} />
        {titleCheck.message}
      </label>
      {workspaces.length > 1 ? (
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Workspace</span>
          <select value={workspaceId} onChange={(e) => setWorkspaceId(e.target.value)} className="rounded-md border border-line bg-white px-2.5 py-2">
            {workspaces.map((w) => (
              <option key={w.id} value={w.id}>
                {w.name}
              </option>
            ))}
          </select>
        </label>
      ) : null}
      <Button type="submit" disabled={busy || !title.trim()}>
        Create Lesson
      </Button>
      {error ? (
        <p id="new-lesson-error" role="alert" className="w-full text-sm text-fail">
          {error}
        </p>
      ) : null}
    </form>
  );
}
