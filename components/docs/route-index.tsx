import Link from 'next/link';
import type { OpenApiDocument } from '@/lib/openapi/document-types';

interface IndexedOperation {
  method: string;
  path: string;
  id: string;
}

/** The operations of the document grouped by tag, in the document's tag order. */
export function operationsByTag(doc: OpenApiDocument): { tag: string; description?: string; operations: IndexedOperation[] }[] {
  return doc.tags.map((t) => ({
    tag: t.name,
    description: t.description,
    operations: Object.entries(doc.paths).flatMap(([path, item]) =>
      Object.entries(item)
        .filter(([, op]) => op?.tags.includes(t.name))
        .map(([method, op]) => ({ method, path, id: op!.operationId })),
    ),
  }));
}

/** The API page's part for a tag: /docs/api/<slug>, e.g. "Compute" → compute. */
export const tagSlug = (tag: string) => tag.toLowerCase().replace(/[^a-z0-9]+/g, '-');
export const partHref = (tag: string) => `/docs/api/${tagSlug(tag)}`;

/** The route list of the API page's overview, one group per tag, each route linked to its place in its tag's part. */
export function RouteIndex({ groups }: { groups: ReturnType<typeof operationsByTag> }) {
  return (
    <nav aria-label="Routes" className="mt-6 grid grid-cols-1 gap-4 md:grid-cols-2">
      {groups.map((g) => (
        <div key={g.tag} className="min-w-0">
          <h2 className="text-sm font-semibold uppercase tracking-wide text-ink-faint">
            <Link prefetch={false} href={partHref(g.tag)} className="hover:underline">
              {g.tag}
            </Link>
          </h2>
          <ul className="mt-1 space-y-1 text-sm">
            {g.operations.map((o) => (
              <li key={o.id}>
                <Link prefetch={false} href={`${partHref(g.tag)}#${o.id}`} className="num wrap-anywhere hover:underline">
                  <span className="font-semibold">{o.method.toUpperCase()}</span> {o.path}
                </Link>
              </li>
            ))}
          </ul>
        </div>
      ))}
    </nav>
  );
}


/** The parts of the API page, the present one marked: at the top of each part. */
export function PartNav({ groups, current }: { groups: ReturnType<typeof operationsByTag>; current: string }) {
  return (
    <nav aria-label="Parts of the API page" className="mt-4 flex flex-wrap gap-x-1 gap-y-1 text-sm">
      <Link prefetch={false} href="/docs/api" className="rounded-md px-2 py-1 text-mains underline">
        Overview
      </Link>
      {groups.map((g) =>
        g.tag === current ? (
          <span key={g.tag} aria-current="page" className="rounded-md bg-ink px-2 py-1 font-semibold text-white">
            {g.tag}
          </span>
        ) : (
          <Link prefetch={false} key={g.tag} href={partHref(g.tag)} className="rounded-md px-2 py-1 text-mains underline">
            {g.tag}
          </Link>
        ),
      )}
    </nav>
  );
}
