import Link from 'next/link';
import { pageCaller } from '@/components/shell/require-caller';
import { LibraryTabs } from '@/components/library/library-tabs';
import { ProfilesSection } from '@/components/library/profiles-section';
import { SystemsTable } from '@/components/library/systems-table';
import { buttonClass } from '@/components/ui/button';
import { listSystems, listTags } from '@/lib/data/systems';
import { listWorkspaces } from '@/lib/data/workspaces';
import { systemListQuerySchema } from '@/lib/validations/library';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Library' };

type Search = Record<string, string | string[] | undefined>;

export default async function LibraryPage({ searchParams }: { searchParams: Promise<Search> }) {
  const caller = await pageCaller('/library');
  const raw = await searchParams;
  const one = (k: string) => (typeof raw[k] === 'string' ? (raw[k] as string) : undefined);
  const view = one('view') === 'deleted' ? 'deleted' : one('view') === 'profiles' ? 'profiles' : 'systems';
  const workspaces = await listWorkspaces(caller);
  const writable = workspaces.filter((w) => w.role !== 'viewer').map((w) => ({ id: w.id, name: w.name }));

  if (view === 'profiles') {
    return (
      <div className="flex flex-col gap-4">
        <LibraryHeader />
        <LibraryTabs view={view} />
        <ProfilesSection workspaces={workspaces.map((w) => ({ id: w.id, name: w.name, role: w.role }))} />
      </div>
    );
  }

  // A bad parameter in the address falls back to the default rather than failing the page.
  const parsed = systemListQuerySchema.safeParse({ q: one('q') || undefined, tag: one('tag') || undefined, sort: one('sort') || undefined, page: one('page') || undefined, pageSize: 20, deleted: view === 'deleted' ? '1' : '0' });
  const query = parsed.success ? parsed.data : systemListQuerySchema.parse({ deleted: view === 'deleted' ? '1' : '0' });
  const [{ items, total, page, pageSize }, tags] = await Promise.all([listSystems(caller, query), listTags(caller)]);
  const roles = Object.fromEntries(workspaces.map((w) => [w.id, w.role]));

  return (
    <div className="flex flex-col gap-4">
      <LibraryHeader />
      <LibraryTabs view={view} />
      <SystemsTable
        view={view}
        items={items.map((s) => ({ ...s, canEdit: roles[s.workspaceId] === 'owner' || roles[s.workspaceId] === 'editor' }))}
        total={total}
        page={page}
        pageSize={pageSize}
        query={{ q: query.q ?? '', tag: query.tag ?? '', sort: query.sort }}
        tags={tags}
        canCreate={writable.length > 0}
      />
    </div>
  );
}

function LibraryHeader() {
  return (
    <div className="flex flex-wrap items-center gap-3">
      <h1 className="text-2xl font-semibold">Library</h1>
      <p className="text-sm text-ink-faint">Your workspaces&rsquo; Systems, their history, and Speaker profiles.</p>
      <Link href="/systems/new" className={buttonClass('primary', 'ml-auto')}>
        New System
      </Link>
    </div>
  );
}
