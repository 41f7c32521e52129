import { notFound } from 'next/navigation';
import { pageCaller } from '@/components/shell/require-caller';
import { SettingsSheet } from '@/components/sheet/settings-sheet';
import { SheetToolbar } from '@/components/sheet/sheet-toolbar';
import { Notice } from '@/components/ui/notice';
import { getRevision, getSystem } from '@/lib/data/systems';
import { AppError } from '@/lib/errors';
import { revisionParamSchema } from '@/lib/validations/library';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Revision' };

const orNotFound = (e: unknown): never => {
  if (e instanceof AppError && (e.status === 404 || e.status === 403)) notFound();
  throw e;
};

/** One old revision of a System, shown as its Settings sheet. */
export default async function RevisionPage({ params }: { params: Promise<{ id: string; revision: string }> }) {
  const { id, revision } = await params;
  const caller = await pageCaller(`/library/${id}/revisions/${revision}`);
  const n = revisionParamSchema.safeParse(revision);
  if (!n.success) notFound();
  const [system, old] = await Promise.all([getSystem(caller, id).catch(orNotFound), getRevision(caller, id, n.data).catch(orNotFound)]);
  return (
    <>
      <SheetToolbar backHref={`/library/${id}`} backLabel="History" />
      <div className="no-print mx-auto mb-4 max-w-[60rem]">
        <Notice kind={old.revision === system.revision ? 'info' : 'warn'}>
          {old.revision === system.revision ? 'This is the current revision.' : `You are looking at revision ${old.revision}; the System is now at revision ${system.revision}. Restore it from the history to make it current.`}
        </Notice>
      </div>
      <SettingsSheet name={old.name} revision={old.revision} revisionNote={old.note} savedAt={old.createdAt} workspaceName={system.workspaceName} document={old.document} />
    </>
  );
}
