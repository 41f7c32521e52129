import Link from 'next/link';
import { notFound } from 'next/navigation';
import { CopyToLibrary } from '@/components/share/copy-to-library';
import { SharedPanels } from '@/components/share/shared-panels';
import { SettingsSheet } from '@/components/sheet/settings-sheet';
import { SheetToolbar } from '@/components/sheet/sheet-toolbar';
import { Wordmark } from '@/components/ui/mark';
import { getSessionCaller } from '@/lib/auth';
import { SharedLesson } from '@/components/lessons/shared-lesson';
import { getLessonByShareToken, getSharedMeasurements, getSharedSystem } from '@/lib/data/share-links';
import { listWorkspaces } from '@/lib/data/workspaces';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Shared', robots: { index: false, follow: false } };

/** A share link's read-only page, open to anyone: every panel of a System (its own measurements included) and its Settings sheet, or a Lesson's Steps. */
export default async function SharedPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const system = await getSharedSystem(token);
  if (!system) {
    const lesson = await getLessonByShareToken(token);
    if (!lesson) notFound();
    return <SharedLesson lesson={lesson} />;
  }
  const [caller, measurements] = await Promise.all([getSessionCaller(), getSharedMeasurements(token)]);
  const writable = caller ? (await listWorkspaces(caller)).filter((w) => w.role !== 'viewer').map((w) => ({ id: w.id, name: w.name })) : [];

  return (
    <>
      <header className="no-print border-b border-line bg-white">
        <div className="mx-auto flex max-w-[1800px] flex-wrap items-center gap-3 px-4 py-2.5">
          <Link href="/" aria-label="Seamline home">
            <Wordmark size={26} />
          </Link>
          <span className="rounded bg-wash px-2 py-0.5 text-xs font-medium text-ink-soft">Shared · read-only</span>
          <div className="ml-auto flex items-center gap-2 text-sm">
            {caller ? (
              <Link href="/library" className="rounded-md px-2 py-1 hover:bg-wash">
                My Library
              </Link>
            ) : (
              <Link href={`/sign-in?callbackUrl=${encodeURIComponent(`/s/${token}`)}`} className="rounded-md px-2 py-1 hover:bg-wash">
                Sign in
              </Link>
            )}
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto flex max-w-[1800px] flex-col gap-6 px-4 py-5">
        <div className="no-print flex flex-wrap items-end gap-4">
          <div className="min-w-0 flex-1">
            <h1 className="break-words text-2xl font-semibold" data-testid="shared-name">
              {system.name}
            </h1>
            <p className="text-sm text-ink-faint">
              Revision {system.revision}, saved {system.updatedAt.slice(0, 10)} by {system.lastEditorName}. Shared read-only: nothing here can be changed.
            </p>
          </div>
          <CopyToLibrary token={token} workspaces={writable} signedIn={!!caller} />
        </div>
        <div className="no-print">
          <SharedPanels document={system.document} measurements={measurements ?? { items: [], omitted: 0 }} />
        </div>
        <section aria-label="Settings sheet" className="flex min-w-0 flex-col gap-2">
          <h2 className="no-print text-lg font-semibold">Settings sheet</h2>
          <SheetToolbar />
          {/* On a phone the sheet scrolls within its own box, not the page. */}
          <div className="min-w-0 relative overflow-x-auto print:overflow-visible">
            <SettingsSheet name={system.name} revision={system.revision} savedAt={system.updatedAt} savedBy={system.lastEditorName} document={system.document} printedAt={new Date().toISOString()} />
          </div>
        </section>
      </main>
    </>
  );
}
