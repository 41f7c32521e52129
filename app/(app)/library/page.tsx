import Link from 'next/link';
import { pageCaller } from '@/components/shell/require-caller';
import { listSystems } from '@/lib/data/systems';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Library' };

export default async function LibraryPage() {
  const caller = await pageCaller('/library');
  const { items, total } = await listSystems(caller, { sort: '-updated', page: 1, pageSize: 50, deleted: '0' });
  return (
    <div>
      <div className="flex flex-wrap items-center gap-3">
        <h1 className="text-2xl font-semibold">Library</h1>
        <span className="text-sm text-ink-faint">{total} System{total === 1 ? '' : 's'}</span>
        <Link href="/systems/new" className="ml-auto rounded-md bg-mains px-3 py-2 text-sm font-medium text-white">
          New System
        </Link>
      </div>
      <div className="mt-4 overflow-x-auto rounded-lg border border-line bg-white">
        <table className="w-full text-left text-sm">
          <thead className="border-b border-line bg-[#FAF9F5] text-xs uppercase tracking-wide text-ink-faint">
            <tr>
              <th className="px-3 py-2">Name</th>
              <th className="px-3 py-2">Workspace</th>
              <th className="px-3 py-2">Tags</th>
              <th className="px-3 py-2">Last change</th>
            </tr>
          </thead>
          <tbody>
            {items.map((s) => (
              <tr key={s.id} className="border-b border-line last:border-0">
                <td className="px-3 py-2">
                  <Link href={`/systems/${s.id}`} className="font-medium text-mains underline">
                    {s.name}
                  </Link>
                </td>
                <td className="px-3 py-2">{s.workspaceName}</td>
                <td className="px-3 py-2">{s.tags.join(', ')}</td>
                <td className="num px-3 py-2">
                  {s.updatedAt.slice(0, 16).replace('T', ' ')} · {s.lastEditorName}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
