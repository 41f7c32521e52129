import type { JsonSchema } from '@/lib/openapi/json-schema';
import { FieldTable } from './field-table';
import { schemaAnchor } from './rich-text';
import { fieldRows } from './schema-fields';

/**
 * A shared schema (components.schemas) of the API page, linked from every table that names it. It is one of the page's
 * `api-route` sections, so the accessibility scan splits these long tables between its parts as it does the routes.
 */
export function SchemaSection({ name, components }: { name: string; components: Record<string, JsonSchema> }) {
  const schema = components[name] ?? {};
  return (
    <section id={schemaAnchor(name)} className="mt-6 scroll-mt-4" data-testid="api-route">
      <h3 className="num text-lg font-semibold wrap-anywhere">{name}</h3>
      {typeof schema.description === 'string' ? <p className="mt-1 text-sm">{schema.description}</p> : null}
      <FieldTable caption={`${name} fields`} rows={fieldRows({ $ref: `#/components/schemas/${name}` }, components)} />
    </section>
  );
}
