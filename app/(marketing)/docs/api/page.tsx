import Link from 'next/link';
import { FieldTable } from '@/components/docs/field-table';
import { RichText } from '@/components/docs/rich-text';
import { operationsByTag, partHref, RouteIndex } from '@/components/docs/route-index';
import { fieldRows } from '@/components/docs/schema-fields';
import { ACCESS_AND_LIMITS_TEXT } from '@/lib/openapi/access-and-limits';
import { openApiDocument } from '@/lib/openapi/document';

export const metadata = { title: 'API' };

const DOCUMENT_PATH = '/api/v1/openapi.json';
const ERROR_EXAMPLE = {
  error: { code: 'invalid', message: 'paths.1.filter.order: Linkwitz–Riley order must be 2, 4 or 8', issues: [{ path: 'paths.1.filter.order', message: 'Linkwitz–Riley order must be 2, 4 or 8' }] },
};

/**
 * The API page's overview: access, limits, the one error shape and every route, each linked to its tag's part
 * (/docs/api/<tag>, one page per tag, so no page carries every field table at once). Everything is read from the
 * OpenAPI document the app serves at /api/v1/openapi.json.
 */
export default function ApiDocsPage() {
  const doc = openApiDocument();
  const groups = operationsByTag(doc);
  const errorRows = fieldRows({ $ref: '#/components/schemas/ErrorBody' }, doc.components.schemas);
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
      <h2 className="mt-8 text-2xl font-semibold">Routes</h2>
      <p className="mt-1 text-ink-soft">
        One page per group, with every parameter, body and answer field, examples, and the shared schemas its tables name:{' '}
        {groups.map((g, i) => (
          <span key={g.tag}>
            {i ? ', ' : ''}
            <Link prefetch={false} href={partHref(g.tag)} className="text-mains underline">
              {g.tag}
            </Link>
          </span>
        ))}
        .
      </p>
      <RouteIndex groups={groups} />
    </div>
  );
}
