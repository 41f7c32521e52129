'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { ApiError, apiFetch } from '@/lib/client/api';
import type { AppLessonShareLink } from '@/lib/data/lessons';

/** The Lesson's student links: copy or revoke each, or create one; anyone with a link sees the Lesson read only. */
export function StudentLinks({ lessonId, links, setLinks }: { lessonId: string; links: AppLessonShareLink[] | null; setLinks: (l: AppLessonShareLink[]) => void }) {
  const [error, setError] = useState<string | null>(null);
  return (
    <section aria-labelledby="share-heading" className="mt-4 flex flex-col gap-2 rounded-md border border-line bg-white p-3">
      <h2 id="share-heading" className="text-sm font-semibold">
        Student links
      </h2>
      <p className="text-xs text-ink-faint">Anyone with a link sees the Lesson read only, without signing in. Revoke a link to close it.</p>
      {links?.length ? (
        <ul className="flex flex-col gap-2">
          {links.map((l) => (
            <li key={l.token} className="flex flex-col gap-1">
              <input readOnly value={l.url} aria-label="Student link" className="num w-full rounded border border-line px-2 py-1 text-xs" data-testid="student-link" onFocus={(e) => e.currentTarget.select()} />
              <span className="flex gap-2">
                <button type="button" className="text-xs underline" onClick={() => void navigator.clipboard?.writeText(l.url).catch(() => undefined)}>
                  Copy
                </button>
                <button
                  type="button"
                  className="text-xs text-fail underline"
                  onClick={async () => {
                    try {
                      await apiFetch(`/api/v1/lessons/${lessonId}/share-links?token=${encodeURIComponent(l.token)}`, { method: 'DELETE' });
                      setLinks(links.filter((x) => x.token !== l.token));
                    } catch (e) {
                      setError(e instanceof ApiError ? e.message : 'Revoking failed.');
                    }
                  }}
                >
                  Revoke
                </button>
              </span>
            </li>
          ))}
        </ul>
      ) : null}
      <Button
        variant="secondary"
        className="self-start"
        onClick={async () => {
          try {
            const link = await apiFetch<AppLessonShareLink>(`/api/v1/lessons/${lessonId}/share-links`, { method: 'POST' });
            setLinks([link, ...(links ?? [])]);
            setError(null);
          } catch (e) {
            setError(e instanceof ApiError ? e.message : 'Creating the link failed.');
          }
        }}
      >
        Create a student link
      </Button>
      {error ? <p role="alert" className="text-sm text-fail">{error}</p> : null}
    </section>
  );
}
