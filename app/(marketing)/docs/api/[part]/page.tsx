import Link from 'next/link';
import { notFound } from 'next/navigation';
import { OperationSection, operationTables } from '@/components/docs/operation-section';
import { operationsByTag, PartNav, tagSlug } from '@/components/docs/route-index';
import { linkedSchemas } from '@/components/docs/schema-fields';
import { SchemaSection } from '@/components/docs/schema-section';
import { openApiDocument } from '@/lib/openapi/document';

type Props = { params: Promise<{ part: string }> };

/** One page per tag of the OpenAPI document, made at build time; any other part is a 404. */
export const dynamicParams = false;
export function generateStaticParams() {
  return operationsByTag(openApiDocument()).map((g) => ({ part: tagSlug(g.tag) }));
}

function groupOf(part: string) {
  const doc = openApiDocument();
  const groups = operationsByTag(doc);
  return { doc, groups, group: groups.find((g) => tagSlug(g.tag) === part) };
}

export async function generateMetadata({ params }: Props) {
  const { group } = groupOf((await params).part);
  return { title: group ? `API: ${group.tag}` : 'API' };
}

/**
 * One part of the API page: a tag's routes with their field tables and examples, then the shared schemas those tables
 * name (and the ones those name), so every link on the page lands on the page. Read from the OpenAPI document.
 */
export default async function ApiPartPage({ params }: Props) {
  const { doc, groups, group } = groupOf((await params).part);
  if (!group) notFound();
  const components = doc.components.schemas;
  const operations = group.operations.flatMap((o) => {
    const op = doc.paths[o.path]?.[o.method as 'get'];
    return op ? [{ ...o, op }] : [];
  });
  const shared = linkedSchemas(
    operations.flatMap((o) => operationTables(o.op, components).map((t) => t.rows)),
    components,
  );
  return (
    <div className="mx-auto max-w-5xl px-4 py-8">
      <p className="text-sm text-ink-soft">
        <Link prefetch={false} href="/docs/api" className="text-mains underline">
          Seamline API
        </Link>
      </p>
      <h1 className="text-3xl font-semibold">{group.tag}</h1>
      {group.description ? <p className="mt-2 text-ink-soft">{group.description}</p> : null}
      <PartNav groups={groups} current={group.tag} />
      <nav aria-label={`Routes: ${group.tag}`} className="mt-4">
        <ul className="space-y-1 text-sm">
          {operations.map((o) => (
            <li key={o.id}>
              <a href={`#${o.id}`} className="num wrap-anywhere hover:underline">
                <span className="font-semibold">{o.method.toUpperCase()}</span> {o.path}
              </a>
            </li>
          ))}
        </ul>
      </nav>
      {operations.map((o) => (
        <OperationSection key={o.id} method={o.method} path={o.path} op={o.op} components={components} />
      ))}
      {shared.length ? (
        <div id="schemas" className="mt-10">
          <h2 className="border-b border-line pb-1 text-2xl font-semibold">Shared schemas</h2>
          <p className="mt-1 text-ink-soft">
            Parts of several requests and answers, written out once; the tables above link here. A name ending in Output is the form the app sends back, with every default
            filled in.
          </p>
          {shared.map((name) => (
            <SchemaSection key={name} name={name} components={components} />
          ))}
        </div>
      ) : null}
    </div>
  );
}
