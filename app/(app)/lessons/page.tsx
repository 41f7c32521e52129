import Link from 'next/link';
import { NewLessonForm } from '@/components/lessons/new-lesson-form';
import { pageCaller } from '@/components/shell/require-caller';
import { listLessons } from '@/lib/data/lessons';
import { listWorkspaces } from '@/lib/data/workspaces';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Lessons' };

export default async function LessonsPage() {
  const caller = await pageCaller('/lessons');
  const [lessons, workspaces] = await Promise.all([listLessons(caller), listWorkspaces(caller)]);
  const writable = workspaces.filter((w) => w.role !== 'viewer').map((w) => ({ id: w.id, name: w.name }));
  return (
    <div className="mx-auto flex max-w-5xl flex-col gap-5">
      <div>
        <h1 className="text-2xl font-semibold tracking-tight">Lessons</h1>
        <p className="text-sm text-ink-soft">A Lesson is an ordered deck of System snapshots (Steps) with talking points, for a class on a projector.</p>
      </div>
      {writable.length ? <NewLessonForm workspaces={writable} /> : null}
      {lessons.length === 0 ? (
        <p className="text-ink-soft">No Lessons yet.</p>
      ) : (
        <ul className="flex flex-col divide-y divide-line rounded-lg border border-line bg-white" data-testid="lesson-list">
          {lessons.map((l) => (
            <li key={l.id} className="flex flex-wrap items-center gap-x-4 gap-y-1 px-4 py-3">
              <div className="min-w-0 flex-1">
                <Link href={`/lessons/${l.id}`} className="font-medium text-ink underline-offset-2 hover:underline">
                  {l.title}
                </Link>
                <p className="text-xs text-ink-faint">
                  {l.workspaceName} · <span className="num">{l.stepCount}</span> {l.stepCount === 1 ? 'Step' : 'Steps'} · changed {new Date(l.updatedAt).toISOString().slice(0, 10)} by {l.lastEditorName}
                  {l.role === 'viewer' ? ' · read only' : ''}
                </p>
              </div>
              {l.stepCount ? (
                <Link href={`/lessons/${l.id}/present`} className="rounded-md border border-line px-3 py-1.5 text-sm hover:bg-wash">
                  Present
                </Link>
              ) : null}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
