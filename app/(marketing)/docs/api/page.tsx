import { API_DOCS, type ApiField } from '@/lib/api-docs';

export const metadata = { title: 'API' };

function FieldTable({ fields, caption }: { fields: ApiField[]; caption: string }) {
  if (!fields.length) return null;
  return (
    <div className="mt-3 relative overflow-x-auto rounded-md border border-line bg-white">
      <table className="w-full text-left text-sm">
        <caption className="px-3 py-2 text-left text-xs font-semibold uppercase tracking-wide text-ink-faint">{caption}</caption>
        <thead className="border-y border-line bg-shade text-xs text-ink-faint">
          <tr>
            <th className="px-3 py-1.5">Field</th>
            <th className="px-3 py-1.5">Type</th>
            <th className="px-3 py-1.5">Unit</th>
            <th className="px-3 py-1.5">Description</th>
          </tr>
        </thead>
        <tbody>
          {fields.map((f) => (
            <tr key={f.name} className="border-b border-line last:border-0 align-top">
              <td className="num px-3 py-1.5 whitespace-nowrap">
                {f.name}
                {f.required ? <span className="ml-1 text-fail" title="required">*</span> : null}
              </td>
              <td className="num px-3 py-1.5 text-ink-soft">{f.type}</td>
              <td className="px-3 py-1.5 text-ink-soft">{f.unit ?? ''}</td>
              <td className="px-3 py-1.5">{f.description}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

const pretty = (v: unknown) => JSON.stringify(v, null, 2);

export default function ApiDocsPage() {
  return (
    <div className="mx-auto max-w-5xl px-4 py-8">
      <h1 className="text-3xl font-semibold">Seamline API</h1>
      <p className="mt-2 text-ink-soft">
        JSON over HTTP under <code className="num">/api/v1/</code>. Every body is validated; SI units everywhere, with the unit in each field&apos;s name. Compute routes work
        without signing in; Library routes need a session (the sign-in cookie). Bodies over 256 kB are refused.
      </p>
      <section className="mt-6 rounded-lg border border-line bg-white p-4">
        <h2 className="text-lg font-semibold">Errors</h2>
        <p className="mt-1 text-sm">
          Every error has the same shape, with the status 400 (invalid), 401 (sign in), 403 (your role does not allow it), 404 (not found, also for what you may not see), 409
          (revision conflict), 413 (too large), 415 (not JSON), 429 (too many attempts) or 503 (database unavailable; retry).
        </p>
        <pre tabIndex={0} className="num mt-2 overflow-x-auto rounded bg-shade p-3 text-xs">
          {pretty({ error: { code: 'invalid', message: 'paths.1.filter.order: Linkwitz–Riley order must be 2, 4 or 8', issues: [{ path: 'paths.1.filter.order', message: 'Linkwitz–Riley order must be 2, 4 or 8' }] } })}
        </pre>
      </section>
      <nav aria-label="Routes" className="mt-6">
        <ul className="flex flex-wrap gap-2 text-sm">
          {API_DOCS.map((r) => (
            <li key={r.id}>
              <a href={`#${r.id}`} className="num rounded border border-line bg-white px-2 py-1 wrap-anywhere hover:bg-wash">
                {r.method} {r.path}
              </a>
            </li>
          ))}
        </ul>
      </nav>
      {API_DOCS.map((r) => (
        <section key={r.id} id={r.id} className="mt-8 scroll-mt-4" data-testid="api-route">
          <h2 className="num text-xl font-semibold wrap-anywhere">
            <span className="mr-2 rounded bg-ink px-2 py-0.5 text-sm text-white">{r.method}</span>
            {r.path}
          </h2>
          <p className="mt-1">{r.summary}</p>
          <p className="mt-1 text-sm text-ink-faint">{r.auth === 'none' ? 'No sign-in needed.' : 'Needs a signed-in session.'}</p>
          {r.notes?.map((n) => (
            <p key={n} className="mt-1 text-sm text-ink-soft">
              {n}
            </p>
          ))}
          <FieldTable fields={r.fields} caption="Request fields" />
          <FieldTable fields={r.answer} caption="Answer fields" />
          {r.examples.map((ex) => (
            <div key={ex.title} className="mt-3 grid grid-cols-1 gap-3 md:grid-cols-2">
              <div>
                <h3 className="text-sm font-semibold">Example: {ex.title}</h3>
                <pre tabIndex={0} className="num mt-1 max-h-96 overflow-auto rounded border border-line bg-white p-3 text-xs">{pretty(ex.request)}</pre>
              </div>
              <div>
                <h3 className="text-sm font-semibold">Answer ({ex.status}), excerpt</h3>
                <pre tabIndex={0} className="num mt-1 max-h-96 overflow-auto rounded border border-line bg-white p-3 text-xs">{pretty(ex.responseExcerpt)}</pre>
              </div>
            </div>
          ))}
        </section>
      ))}
    </div>
  );
}
