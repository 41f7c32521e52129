import { Validator } from '@seriousme/openapi-schema-validator';
import { beforeAll, describe, expect, it } from 'vitest';
import type { OpenApiDocument, OpenApiOperation } from '@/lib/openapi/document-types';
import type { JsonSchema } from '@/lib/openapi/json-schema';
import { apiRouteFiles } from '../helpers/api-routes';
import { Client } from '../helpers/http';

/**
 * The OpenAPI document the running app serves (issue 18): a valid OpenAPI 3.1 document (checked by
 * @seriousme/openapi-schema-validator), with every route file under app/api/v1 in it and nothing else, every operation
 * answering with a schema, and every field of every request described.
 */
const METHODS = ['get', 'post', 'put', 'patch', 'delete'] as const;
const REF = '#/components/schemas/';

let doc: OpenApiDocument;
let served: { status: number; contentType: string | null; cacheControl: string | null };

const operations = () =>
  Object.entries(doc.paths).flatMap(([path, item]) => METHODS.flatMap((m) => (item[m] ? [{ key: `${m.toUpperCase()} ${path}`, op: item[m] as OpenApiOperation }] : [])));

/** Every `METHOD /api/v1/...` the route files export, in the document's path style (`[id]` → `{id}`). */
function routesServed(): string[] {
  return apiRouteFiles()
    .filter(({ route }) => route.startsWith('/api/v1/'))
    .flatMap(({ route, source }) =>
      [...source.matchAll(/export (?:const|async function) (GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => `${m[1]} ${route.replace(/\[([^\]]+)\]/g, '{$1}')}`),
    )
    .sort();
}

const resolve = (node: JsonSchema): JsonSchema => {
  const ref = typeof node.$ref === 'string' && node.$ref.startsWith(REF) ? node.$ref.slice(REF.length) : null;
  return ref ? { ...(doc.components.schemas[ref] ?? {}), ...node, $ref: undefined } : node;
};

/**
 * Every property of a request schema, with its dotted name and schema, following `$ref`s (each shared schema once) and
 * the forms of unions and array items.
 */
function requestFields(node: JsonSchema, name: string, out: { name: string; schema: JsonSchema }[], seen: Set<string>): void {
  const ref = typeof node.$ref === 'string' ? node.$ref : null;
  if (ref) {
    if (seen.has(ref)) return;
    seen.add(ref);
  }
  const n = resolve(node);
  for (const [key, value] of Object.entries((n.properties ?? {}) as Record<string, JsonSchema>)) {
    const field = name ? `${name}.${key}` : key;
    out.push({ name: field, schema: value });
    requestFields(value, field, out, seen);
  }
  for (const variant of [...((n.anyOf ?? []) as JsonSchema[]), ...((n.oneOf ?? []) as JsonSchema[])]) requestFields(variant, name, out, seen);
  if (n.items && typeof n.items === 'object') requestFields(n.items as JsonSchema, `${name}[]`, out, seen);
}

const described = (schema: JsonSchema) => typeof schema.description === 'string' && schema.description.length > 0 ? true : typeof resolve(schema).description === 'string';

beforeAll(async () => {
  const res = await new Client().get('/api/v1/openapi.json');
  served = { status: res.status, contentType: res.headers.get('content-type'), cacheControl: res.headers.get('cache-control') };
  doc = res.body;
});

describe('GET /api/v1/openapi.json', () => {
  it('answers 200 with JSON anyone may cache for a while, without sign-in', () => {
    expect(served.status).toBe(200);
    expect(served.contentType).toMatch(/^application\/json/);
    expect(served.cacheControl).toMatch(/public/);
  });

  it('is a valid OpenAPI 3.1 document (@seriousme/openapi-schema-validator)', async () => {
    const validator = new Validator();
    const result = await validator.validate(structuredClone(doc) as unknown as Record<string, unknown>);
    expect(result.errors ?? [], JSON.stringify(result.errors, null, 1)?.slice(0, 3000)).toEqual([]);
    expect(result.valid).toBe(true);
    expect(validator.version).toBe('3.1');
    expect(doc.info.title).toBe('Seamline API');
  });

  it('documents every method of every route file under app/api/v1, and no route that does not exist', () => {
    const documented = operations().map((o) => o.key).sort();
    const served = routesServed();
    expect(served.filter((r) => !documented.includes(r)), 'routes missing from the OpenAPI document').toEqual([]);
    expect(documented.filter((r) => !served.includes(r)), 'operations for routes that do not exist').toEqual([]);
  });

  it('gives every operation an answer with a schema (204 and file downloads aside) and its errors as shared responses', () => {
    for (const { key, op } of operations()) {
      const successes = Object.entries(op.responses).filter(([status]) => /^2\d\d$/.test(status));
      expect(successes.length, `${key} has no success answer`).toBeGreaterThan(0);
      for (const [status, answer] of successes) {
        if (status === '204' || '$ref' in answer) continue;
        const json = answer.content?.['application/json'];
        if (!json) {
          expect(Object.keys(answer.content ?? {}).length, `${key} ${status}: neither JSON nor a download`).toBeGreaterThan(0);
          continue;
        }
        expect(Object.keys(json.schema).length, `${key} ${status}: an empty answer schema`).toBeGreaterThan(0);
      }
      for (const [status, answer] of Object.entries(op.responses).filter(([s]) => !/^2\d\d$/.test(s))) {
        expect('$ref' in answer && typeof answer.$ref === 'string', `${key} ${status}: errors refer to a shared response`).toBe(true);
        const name = ('$ref' in answer ? answer.$ref : '').replace('#/components/responses/', '');
        expect(doc.components.responses[name], `${key} ${status}: ${name} is not in components.responses`).toBeDefined();
      }
    }
    const tooMany = doc.components.responses.TooManyRequests;
    expect(tooMany?.headers?.['Retry-After'], '429 documents Retry-After').toBeDefined();
  });

  it('describes every field of every request body and every parameter; no field is an empty schema', () => {
    const missing: string[] = [];
    const empty: string[] = [];
    for (const { key, op } of operations()) {
      for (const p of op.parameters ?? []) if (!p.description) missing.push(`${key} ${p.in} parameter ${p.name}`);
      for (const [type, media] of Object.entries(op.requestBody?.content ?? {})) {
        const fields: { name: string; schema: JsonSchema }[] = [];
        requestFields(media.schema, '', fields, new Set());
        for (const f of fields) {
          if (!described(f.schema)) missing.push(`${key} (${type}) ${f.name}`);
          if (Object.keys(f.schema).filter((k) => k !== 'description').length === 0) empty.push(`${key} ${f.name}`);
        }
      }
    }
    expect(missing, 'request fields without a description').toEqual([]);
    expect(empty, 'request fields whose schema says nothing (a transform zod cannot see through?)').toEqual([]);
  });

  it('gives every field with a unit in its name the unit (x-unit), in requests and answers', () => {
    const unitInName = /(Hz|Ms|Db|M|C|S|W|Ohm|Deg|Mps|M3)$/;
    const missing: string[] = [];
    const visit = (node: JsonSchema, where: string) => {
      for (const [key, value] of Object.entries((node.properties ?? {}) as Record<string, JsonSchema>)) {
        if (unitInName.test(key) && !value['x-unit'] && !resolve(value)['x-unit'] && !value.$ref) missing.push(`${where}.${key}`);
      }
    };
    const walk = (node: unknown, where: string): void => {
      if (Array.isArray(node)) node.forEach((n, i) => walk(n, `${where}[${i}]`));
      else if (node && typeof node === 'object') {
        visit(node as JsonSchema, where);
        for (const [k, v] of Object.entries(node)) if (k !== 'x-examples') walk(v, `${where}/${k}`);
      }
    };
    walk(doc.paths, 'paths');
    walk(doc.components.schemas, 'components');
    expect(missing).toEqual([]);
  });

  it('names the ways in: a bearer token or the session cookie, per operation as its access says', () => {
    expect(doc.components.securitySchemes.bearerAuth).toMatchObject({ type: 'http', scheme: 'bearer' });
    expect(doc.components.securitySchemes.sessionCookie).toMatchObject({ type: 'apiKey', in: 'cookie' });
    for (const { key, op } of operations()) {
      const schemes = op.security.map((s) => Object.keys(s).join('+') || 'none').sort();
      const expected = { public: ['bearerAuth', 'none', 'sessionCookie'], member: ['bearerAuth', 'sessionCookie'], session: ['sessionCookie'], admin: ['sessionCookie'] }[op['x-access']];
      expect(schemes, key).toEqual(expected);
    }
  });
});
