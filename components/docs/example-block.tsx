import type { ApiExample } from '@/lib/openapi/types';

const pretty = (v: unknown) => JSON.stringify(v, null, 2);

/** The request line of an example: method, path with its parameters filled in, and the query. */
function requestLine(method: string, path: string, example: ApiExample): string {
  const filled = path.replace(/\{(\w+)\}/g, (whole, name: string) => example.pathParams?.[name] ?? whole);
  return `${method.toUpperCase()} ${filled}${example.query ?? ''}`;
}

/** One documented example: the request and an excerpt of the answer (executed ones are run against the app by the tests). */
export function ExampleBlock({ method, path, example }: { method: string; path: string; example: ApiExample }) {
  return (
    <div className="mt-3 grid grid-cols-1 gap-3 md:grid-cols-2">
      <div className="min-w-0">
        <h4 className="text-sm font-semibold">Example: {example.title}</h4>
        <pre tabIndex={0} aria-label={`Request: ${example.title}`} className="num mt-1 max-h-96 overflow-auto rounded border border-line bg-white p-3 text-xs">
          {requestLine(method, path, example)}
          {example.body !== undefined ? `\n\n${pretty(example.body)}` : ''}
        </pre>
      </div>
      <div className="min-w-0">
        <h4 className="text-sm font-semibold">
          Answer ({example.status}){example.responseExcerpt !== undefined ? ', excerpt' : ''}
        </h4>
        <pre tabIndex={0} aria-label={`Answer: ${example.title}`} className="num mt-1 max-h-96 overflow-auto rounded border border-line bg-white p-3 text-xs">
          {example.responseExcerpt !== undefined ? pretty(example.responseExcerpt) : `${example.status}, no body`}
        </pre>
      </div>
    </div>
  );
}
