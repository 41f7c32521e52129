import { FieldTable } from '@/components/docs/field-table';
import { OperationSection, operationTables } from '@/components/docs/operation-section';
import { RichText } from '@/components/docs/rich-text';
import { operationsByTag, RouteIndex, tagAnchor } from '@/components/docs/route-index';
import { fieldRows, linkedSchemas } from '@/components/docs/schema-fields';
import { SchemaSection } from '@/components/docs/schema-section';
import { ACCESS_AND_LIMITS_TEXT } from '@/lib/openapi/access-and-limits';
import { openApiDocument } from '@/lib/openapi/document';

export const metadata = { title: 'API' };

const DOCUMENT_PATH = '/api/v1/openapi.json';
const ERROR_EXAMPLE = {
  error: { code: 'invalid', message: 'paths.1.filter.order: Linkwitz–Riley order must be 2, 4 or 8', issues: [{ path: 'paths.1.filter.order', message: 'Linkwitz–Riley order must be 2, 4 or 8' }] },
};

/** The API page: everything on it is read from the OpenAPI document the app serves at /api/v1/openapi.json. */
export default function ApiDocsPage() {
  const doc = openApiDocument();
  const components = doc.components.schemas;
  const groups = operationsByTag(doc);
  const errorRows = fieldRows({ $ref: '#/components/schemas/ErrorBody' }, components);
  const tables = Object.values(doc.paths).flatMap((item) => Object.values(item).flatMap((op) => operationTables(op!, components).map((t) => t.rows)));
  const shared = linkedSchemas([...tables, errorRows], components);
  return (
    <div className="mx-auto max-w-5xl px-4 py-8">
      <h1 className="text-3xl font-semibold">Seamline API</h1>
      <p className="mt-2 text-ink-soft">
        JSON over HTTP under <code className="num">/api/v1/</code>. Every body is validated; SI units everywhere, with the unit in each field&apos;s name. The whole API is
        described as an OpenAPI 3.1 document at{' '}
        <a href={DOCUMENT_PATH} className="num text-mains underline">
          {DOCUMENT_PATH}
        </a>{' '}
        (this page is rendered from it): feed it to a client generator for typed calls.
      </p>
      <section id="access" className="mt-6 rounded-lg border border-line bg-white p-4">
        <h2 className="text-lg font-semibold">Access tokens and limits</h2>
        {ACCESS_AND_LIMITS_TEXT.map((p) => (
          <p key={p} className="mt-1 text-sm">
            <RichText text={p} />
          </p>
        ))}
      </section>
      <section id="errors" className="mt-6 rounded-lg border border-line bg-white p-4">
        <h2 className="text-lg font-semibold">Errors</h2>
        <p className="mt-1 text-sm">Every error has the same shape (ErrorBody); a 500 is a bug on our side.</p>
        <ul className="mt-1 text-sm">
          {Object.entries(doc.components.responses).map(([name, r]) => (
            <li key={name}>
              <span className="font-semibold">{name}</span>: {r.description}
            </li>
          ))}
        </ul>
        <FieldTable caption="ErrorBody fields" rows={errorRows} />
        <pre tabIndex={0} aria-label="An error answer" className="num mt-2 overflow-x-auto rounded bg-shade p-3 text-xs">
          {JSON.stringify(ERROR_EXAMPLE, null, 2)}
        </pre>
      </section>
      <RouteIndex groups={groups} />
      {groups.map((g) => (
        <div key={g.tag} id={tagAnchor(g.tag)} className="mt-10 scroll-mt-4">
          <h2 className="border-b border-line pb-1 text-2xl font-semibold">{g.tag}</h2>
          {g.description ? <p className="mt-1 text-ink-soft">{g.description}</p> : null}
          {g.operations.map((o) => {
            const op = doc.paths[o.path]?.[o.method as 'get'];
            return op ? <OperationSection key={o.id} method={o.method} path={o.path} op={op} components={components} /> : null;
          })}
        </div>
      ))}
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
    </div>
  );
}
