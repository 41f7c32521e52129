import { notFound } from 'next/navigation';
import { pageCaller } from '@/components/shell/require-caller';
import { SettingsSheet } from '@/components/sheet/settings-sheet';
import { SheetToolbar } from '@/components/sheet/sheet-toolbar';
import { getSystem } from '@/lib/data/systems';
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
  return (
    <>
      <SheetToolbar downloadBase={`/api/v1/systems/${system.id}/export`} backHref={`/systems/${system.id}`} backLabel="Editor" />
      <SettingsSheet
        name={system.name}
        revision={system.revision}
        savedAt={system.updatedAt}
        savedBy={system.lastEditorName}
        workspaceName={system.workspaceName}
        document={system.document}
        printedAt={new Date().toISOString()}
      />
    </>
  );
}
