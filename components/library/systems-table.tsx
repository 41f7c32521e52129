import Link from 'next/link';
import { buttonClass } from '@/components/ui/button';
import type { AppSystemSummary } from '@/lib/data/systems';
import { daysLeft, formatWhen } from './format';
import { SystemRowActions } from './system-row-actions';

interface Props {
  view: 'systems' | 'deleted';
  items: (AppSystemSummary & { canEdit: boolean })[];
  total: number;
  page: number;
  pageSize: number;
  query: { q: string; tag: string; sort: string };
  tags: string[];
  canCreate: boolean;
}

const SORTS = [
  { value: '-updated', label: 'Last change, newest first' },
  { value: 'updated', label: 'Last change, oldest first' },
  { value: 'name', label: 'Name, A to Z' },
  { value: '-name', label: 'Name, Z to A' },
];

function href(view: string, query: Props['query'], page: number) {
  const p = new URLSearchParams();
  if (view === 'deleted') p.set('view', 'deleted');
  if (query.q) p.set('q', query.q);
  if (query.tag) p.set('tag', query.tag);
  if (query.sort && query.sort !== '-updated') p.set('sort', query.sort);
  if (page > 1) p.set('page', String(page));
  const s = p.toString();
  return `/library${s ? `?${s}` : ''}`;
}

/** The Library's table of Systems: a plain GET form for search, tag and sort, so it works before scripts load. */
export function SystemsTable({ view, items, total, page, pageSize, query, tags, canCreate }: Props) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const filtered = !!(query.q || query.tag);
  return (
    <section aria-label={view === 'deleted' ? 'Recently deleted Systems' : 'Systems'} className="flex flex-col gap-3">
      <form method="get" action="/library" role="search" className="flex flex-wrap items-end gap-3 rounded-lg border border-line bg-white p-3">
        {view === 'deleted' ? <input type="hidden" name="view" value="deleted" /> : null}
        <div className="flex min-w-[12rem] flex-1 flex-col gap-1">
          <label htmlFor="library-q" className="text-sm font-medium">
            Search by name
          </label>
          <input id="library-q" name="q" type="search" defaultValue={query.q} maxLength={100} className="rounded-md border border-line px-3 py-2 text-sm" placeholder="e.g. screening room" />
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="library-tag" className="text-sm font-medium">
            Tag
          </label>
          <select id="library-tag" name="tag" defaultValue={query.tag} className="rounded-md border border-line bg-white px-3 py-2 text-sm">
            <option value="">All tags</option>
            {tags.map((t) => (
              <option key={t} value={t}>
                {t}
              </option>
            ))}
          </select>
        </div>
        <div className="flex flex-col gap-1">
          <label htmlFor="library-sort" className="text-sm font-medium">
            Sort
          </label>
          <select id="library-sort" name="sort" defaultValue={query.sort} className="rounded-md border border-line bg-white px-3 py-2 text-sm">
            {SORTS.map((s) => (
              <option key={s.value} value={s.value}>
                {s.label}
              </option>
            ))}
          </select>
        </div>
        <button type="submit" className={buttonClass('secondary')}>
          Apply
        </button>
        {filtered ? (
          <Link href={href(view, { q: '', tag: '', sort: query.sort }, 1)} className={buttonClass('ghost')}>
            Clear
          </Link>
        ) : null}
      </form>

      <p className="text-sm text-ink-faint" role="status">
        {total} System{total === 1 ? '' : 's'}
        {filtered ? ' match' : view === 'deleted' ? ' deleted in the last 30 days' : ''}
        {pages > 1 ? ` · page ${page} of ${pages}` : ''}
      </p>

      {items.length === 0 ? (
        <div className="rounded-lg border border-dashed border-line bg-white p-6 text-sm text-ink-soft">
          {view === 'deleted' ? (
            'Nothing was deleted in the last 30 days.'
          ) : filtered ? (
            'No System matches. Try another name or tag.'
          ) : (
            <>
              No Systems yet.{' '}
              {canCreate ? (
                <Link href="/systems/new" className="font-medium text-mains underline">
                  Start one in the editor
                </Link>
              ) : null}{' '}
              and save it to the Library.
            </>
          )}
        </div>
      ) : (
        <div className="relative overflow-x-auto rounded-lg border border-line bg-white">
          <table className="w-full text-left text-sm">
            <caption className="sr-only">{view === 'deleted' ? 'Recently deleted Systems' : 'Systems in your workspaces'}</caption>
            <thead className="border-b border-line bg-shade text-xs uppercase tracking-wide text-ink-faint">
              <tr>
                <th scope="col" className="px-3 py-2">
                  Name
                </th>
                <th scope="col" className="hidden px-3 py-2 md:table-cell">
                  Workspace
                </th>
                <th scope="col" className="hidden px-3 py-2 lg:table-cell">
                  Owner
                </th>
                <th scope="col" className="hidden px-3 py-2 sm:table-cell">
                  {view === 'deleted' ? 'Deleted' : 'Last change'}
                </th>
                <th scope="col" className="px-3 py-2 text-right">
                  <span className="sr-only">Actions</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {items.map((s) => (
                <tr key={s.id} className="border-b border-line align-top last:border-0" data-testid="library-row">
                  <td className="px-3 py-2.5">
                    {view === 'deleted' ? (
                      <span className="font-medium">{s.name}</span>
                    ) : (
                      <Link href={`/systems/${s.id}`} className="font-medium text-mains underline-offset-2 hover:underline">
                        {s.name}
                      </Link>
                    )}
                    <span className="num ml-2 text-xs text-ink-faint">rev {s.revision}</span>
                    {s.tags.length ? (
                      <ul className="mt-1 flex flex-wrap gap-1" aria-label="Tags">
                        {s.tags.map((t) => (
                          <li key={t}>
                            <Link href={href(view, { q: query.q, tag: t, sort: query.sort }, 1)} className="rounded bg-wash px-1.5 py-0.5 text-xs text-ink-soft hover:bg-wash-strong">
                              {t}
                            </Link>
                          </li>
                        ))}
                      </ul>
                    ) : null}
                    <p className="mt-1 text-xs text-ink-faint sm:hidden">
                      {s.workspaceName} · {formatWhen(view === 'deleted' && s.deletedAt ? s.deletedAt : s.updatedAt)} · {s.lastEditorName}
                    </p>
                  </td>
                  <td className="hidden px-3 py-2.5 md:table-cell">{s.workspaceName}</td>
                  <td className="hidden px-3 py-2.5 lg:table-cell">{s.ownerName}</td>
                  <td className="hidden px-3 py-2.5 sm:table-cell">
                    {view === 'deleted' && s.deletedAt ? (
                      <>
                        <span className="num">{formatWhen(s.deletedAt)}</span>
                        <span className="block text-xs text-ink-faint">{daysLeft(s.deletedAt)} days left to restore</span>
                      </>
                    ) : (
                      <>
                        <span className="num">{formatWhen(s.updatedAt)}</span>
                        <span className="block text-xs text-ink-faint">by {s.lastEditorName}</span>
                      </>
                    )}
                  </td>
                  <td className="px-3 py-2">
                    <SystemRowActions id={s.id} name={s.name} revision={s.revision} canEdit={s.canEdit} deleted={view === 'deleted'} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}

      {pages > 1 ? (
        <nav aria-label="Pages" className="flex items-center justify-between gap-2">
          {page > 1 ? (
            <Link href={href(view, query, page - 1)} className={buttonClass('secondary')} rel="prev">
              ← Previous
            </Link>
          ) : (
            <span />
          )}
          <span className="num text-sm text-ink-faint">
            {page} / {pages}
          </span>
          {page < pages ? (
            <Link href={href(view, query, page + 1)} className={buttonClass('secondary')} rel="next">
              Next →
            </Link>
          ) : (
            <span />
          )}
        </nav>
      ) : null}
    </section>
  );
}
