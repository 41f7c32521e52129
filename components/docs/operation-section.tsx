import Link from 'next/link';
import { ACCESS_WORDS } from '@/lib/openapi/document-parts';
import type { OpenApiDocument, OpenApiOperation, OpenApiParameter } from '@/lib/openapi/document-types';
import { ExampleBlock } from './example-block';
import { FieldTable } from './field-table';
import { RichText } from './rich-text';
import { fieldRows, type FieldRow } from './schema-fields';

type Components = OpenApiDocument['components']['schemas'];

/** The field tables of an operation: its parameters, its body and each success answer. */
export function operationTables(op: OpenApiOperation, components: Components): { caption: string; rows: FieldRow[] }[] {
  const parameterRows = (where: OpenApiParameter['in']) =>
    (op.parameters ?? [])
      .filter((p) => p.in === where)
      .flatMap((p) => fieldRows({ type: 'object', properties: { [p.name]: { ...p.schema, description: p.description } }, required: p.required ? [p.name] : [] }, components));
  const tables = [
    { caption: 'Path parameters', rows: parameterRows('path') },
    { caption: 'Query parameters', rows: parameterRows('query') },
  ];
  for (const [type, media] of Object.entries(op.requestBody?.content ?? {})) {
    tables.push({ caption: `Request body (${type}${op.requestBody?.required ? '' : ', optional'})`, rows: fieldRows(media.schema, components) });
  }
  for (const [status, answer] of Object.entries(op.responses)) {
    if ('$ref' in answer || !answer.content) continue;
    for (const [type, media] of Object.entries(answer.content)) {
      tables.push({ caption: `Answer ${status} (${type})`, rows: fieldRows(media.schema, components) });
    }
  }
  return tables;
}

const METHOD_STYLE: Record<string, string> = { get: 'bg-mains-dark', post: 'bg-ink', put: 'bg-warn-strong', patch: 'bg-warn-strong', delete: 'bg-fail-dark' };

/** One operation of the API page, rendered from the OpenAPI document. */
export function OperationSection({ method, path, op, components }: { method: string; path: string; op: OpenApiOperation; components: Components }) {
  const errors = Object.entries(op.responses).filter(([, r]) => '$ref' in r);
  const successes = Object.entries(op.responses).filter(([, r]) => !('$ref' in r));
  return (
    <section id={op.operationId} className="mt-8 scroll-mt-4" data-testid="api-route">
      <h3 className="num text-lg font-semibold wrap-anywhere">
        <span className={`mr-2 rounded px-2 py-0.5 text-sm text-white ${METHOD_STYLE[method] ?? 'bg-ink'}`}>{method.toUpperCase()}</span>
        {path}
      </h3>
      <p className="mt-1">{op.summary}</p>
      <p className="mt-1 text-sm text-ink-soft">
        <span className="font-semibold">Who may call it:</span> {ACCESS_WORDS[op['x-access']]}
      </p>
      {op.description?.split('\n\n').map((n) => (
        <p key={n} className="mt-1 text-sm text-ink-soft">
          <RichText text={n} />
        </p>
      ))}
      {operationTables(op, components).map((t) => (
        <FieldTable key={t.caption} caption={t.caption} rows={t.rows} />
      ))}
      <p className="mt-2 text-sm text-ink-soft">
        <span className="font-semibold">Answers:</span> {successes.map(([status, r]) => `${status} ${'description' in r ? r.description : ''}`).join(' ')}{' '}
        {errors.length ? (
          <>
            <span className="font-semibold">Errors</span> (the <Link prefetch={false} href="/docs/api#errors" className="text-mains underline">one error shape</Link>): {errors.map(([status]) => status).join(', ')}.
          </>
        ) : null}
      </p>
      {op['x-examples'].map((ex) => (
        <ExampleBlock key={ex.title} method={method} path={path} example={ex} />
      ))}
    </section>
  );
}
