import { notFound } from 'next/navigation';
import { pageCaller } from '@/components/shell/require-caller';
import { SettingsSheet } from '@/components/sheet/settings-sheet';
import { SheetToolbar } from '@/components/sheet/sheet-toolbar';
import { getRevisionNote, getSystem } from '@/lib/data/systems';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Settings sheet' };

export default async function SheetPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await pageCaller(`/systems/${id}/sheet`);
  const system = await getSystem(caller, id).catch((e: unknown) => {
    if (e instanceof AppError && (e.status === 404 || e.status === 403)) notFound();
    throw e;
  });
  // The note saved with the revision shown; a revision saved meanwhile (not found here) shows none.
  const revisionNote = await getRevisionNote(caller, id, system.revision).catch((e: unknown) => {
    if (e instanceof AppError && e.status === 404) return null;
    throw e;
  });
  return (
    <>
      <SheetToolbar downloadBase={`/api/v1/systems/${system.id}/export`} backHref={`/systems/${system.id}`} backLabel="Editor" />
      <SettingsSheet
        name={system.name}
        revision={system.revision}
        revisionNote={revisionNote}
        savedAt={system.updatedAt}
        savedBy={system.lastEditorName}
        workspaceName={system.workspaceName}
        document={system.document}
        printedAt={new Date().toISOString()}
      />
    </>
  );
}
