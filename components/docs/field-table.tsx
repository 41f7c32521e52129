import type { FieldRow } from './schema-fields';
import { schemaAnchor } from './rich-text';

/** A type with every shared schema it names linked to that schema's section. */
function TypeText({ row }: { row: FieldRow }) {
  if (!row.links.length) return <>{row.type}</>;
  const pattern = new RegExp(`\\b(${row.links.join('|')})\\b`);
  return (
    <>
      {row.type.split(pattern).map((part, i) =>
        row.links.includes(part) ? (
          <a key={i} href={`#${schemaAnchor(part)}`} className="text-mains underline">
            {part}
          </a>
        ) : (
          part
        ),
      )}
    </>
  );
}

/** One table of fields, read from a JSON Schema (`fieldRows`); it scrolls in its own box on a narrow screen. */
export function FieldTable({ rows, caption }: { rows: readonly FieldRow[]; caption: string }) {
  if (!rows.length) return null;
  return (
    <div className="relative mt-3 overflow-x-auto rounded-md border border-line bg-white" role="region" aria-label={caption} tabIndex={0}>
      <table className="w-full text-left text-sm [&_td]:px-3 [&_td]:py-1.5 [&_th]:px-3 [&_th]:py-1.5">
        <caption className="px-3 py-2 text-left text-xs font-semibold uppercase tracking-wide text-ink-faint">{caption}</caption>
        <thead className="border-y border-line bg-shade text-xs text-ink-faint">
          <tr>
            <th scope="col">
              Field
            </th>
            <th scope="col">
              Type
            </th>
            <th scope="col">
              Unit
            </th>
            <th scope="col">
              Description
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={`${r.name}-${i}`} className="border-b border-line align-top last:border-0">
              <td className="num whitespace-nowrap">
                {r.name}
                {r.required ? (
                  <span className="ml-1 text-fail" title="required">
                    *<span className="sr-only"> (required)</span>
                  </span>
                ) : null}
              </td>
              <td className="num min-w-32 text-ink-soft">
                <TypeText row={r} />
                {r.defaultValue !== undefined ? <span className="block text-xs text-ink-faint">default {r.defaultValue}</span> : null}
              </td>
              <td className="whitespace-nowrap text-ink-soft">{r.unit ?? ''}</td>
              <td className="min-w-64">{r.description ?? ''}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
