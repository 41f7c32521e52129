import { notFound } from 'next/navigation';
import { SystemEditor } from '@/components/editor/system-editor';
import { pageCaller } from '@/components/shell/require-caller';
import { getSystem } from '@/lib/data/systems';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';

export async function generateMetadata({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  return { title: `System ${id.slice(0, 8)}` };
}

export default async function SavedSystemPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await pageCaller(`/systems/${id}`);
  let system;
  try {
    system = await getSystem(caller, id);
  } catch (e) {
    if (e instanceof AppError && (e.status === 404 || e.status === 403)) notFound();
    throw e;
  }
  return (
    <SystemEditor
      key={system.id}
      signedIn
      saved={{
        id: system.id,
        name: system.name,
        revision: system.revision,
        role: system.role,
        workspaceName: system.workspaceName,
        updatedAt: system.updatedAt,
        lastEditorName: system.lastEditorName,
        document: system.document,
      }}
    />
  );
}
