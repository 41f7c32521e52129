import Link from 'next/link';
import { notFound } from 'next/navigation';
import { RevisionHistory } from '@/components/library/revision-history';
import { pageCaller } from '@/components/shell/require-caller';
import { ExportLink } from '@/components/transfer/export-link';
import { buttonClass } from '@/components/ui/button';
import { getSystem, listRevisions } from '@/lib/data/systems';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'History' };

/** The revision history of one System: who saved what and when; view and restore. */
export default async function SystemHistoryPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await pageCaller(`/library/${id}`);
  const orNotFound = (e: unknown): never => {
    if (e instanceof AppError && (e.status === 404 || e.status === 403)) notFound();
    throw e;
  };
  const [system, revisions] = await Promise.all([getSystem(caller, id).catch(orNotFound), listRevisions(caller, id).catch(orNotFound)]);
  return (
    <div className="mx-auto flex max-w-4xl flex-col gap-4">
      <nav aria-label="Breadcrumb" className="text-sm">
        <Link href="/library" className="text-mains underline-offset-2 hover:underline">
          Library
        </Link>{' '}
        <span className="text-ink-faint">/ History</span>
      </nav>
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="min-w-0 break-words text-2xl font-semibold">{system.name}</h1>
        <span className="num text-sm text-ink-faint">revision {system.revision}</span>
        <div className="ml-auto flex flex-wrap gap-2">
          <Link href={`/systems/${id}`} className={buttonClass('primary')}>
            Open in editor
          </Link>
          <Link href={`/systems/${id}/sheet`} className={buttonClass('secondary')}>
            Settings sheet
          </Link>
          {system.role !== 'viewer' ? (
            <ExportLink href={`/api/v1/systems/${id}/export/history`} label={`Export ${system.name} with history`}>
              Export with history
            </ExportLink>
          ) : null}
        </div>
      </div>
      <p className="text-sm text-ink-soft">
        Every save is kept. Restoring an old revision saves it again as a new revision, so nothing in this list is ever lost.
      </p>
      <RevisionHistory systemId={id} currentRevision={system.revision} canEdit={system.role !== 'viewer'} revisions={revisions} />
    </div>
  );
}
