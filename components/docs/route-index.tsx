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

const tagAnchor = (tag: string) => `tag-${tag.toLowerCase().replace(/[^a-z0-9]+/g, '-')}`;

/** The route list at the top of the API page, one group per tag. */
export function RouteIndex({ groups }: { groups: ReturnType<typeof operationsByTag> }) {
  return (
    <nav aria-label="Routes" className="mt-6 grid grid-cols-1 gap-4 md:grid-cols-2">
      {groups.map((g) => (
        <div key={g.tag} className="min-w-0">
          <h2 className="text-sm font-semibold uppercase tracking-wide text-ink-faint">
            <a href={`#${tagAnchor(g.tag)}`} className="hover:underline">
              {g.tag}
            </a>
          </h2>
          <ul className="mt-1 space-y-1 text-sm">
            {g.operations.map((o) => (
              <li key={o.id}>
                <a href={`#${o.id}`} className="num wrap-anywhere hover:underline">
                  <span className="font-semibold">{o.method.toUpperCase()}</span> {o.path}
                </a>
              </li>
            ))}
          </ul>
        </div>
      ))}
    </nav>
  );
}

export { tagAnchor };
