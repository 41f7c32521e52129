import Ajv2020, { type ValidateFunction } from 'ajv/dist/2020';
import addFormats from 'ajv-formats';
import { beforeAll, describe, expect, it } from 'vitest';
import type { OpenApiDocument, OpenApiOperation, OpenApiResponse } from '@/lib/openapi/document-types';
import type { JsonSchema } from '@/lib/openapi/json-schema';
import { API_OPERATIONS } from '@/lib/openapi/operations';
import { OPENAPI_OPERATIONS } from '@/lib/openapi/operations/openapi';
import type { ApiExample, ApiOperation } from '@/lib/openapi/types';
import { Client } from '../helpers/http';

/**
 * The documented examples against the OpenAPI document the app serves (ajv, JSON Schema 2020-12): every example's body,
 * query and path parameters fit the operation's request schema (or, for a 400 about the schema, do not); every example
 * marked `executed` is sent to the running app, which must answer the documented status with a body that fits the
 * answer schema of that status (the error schema for errors) and holds every key of the documented excerpt.
 */
const DOC_ID = 'https://seamline.test/openapi.json';
const OPERATIONS: ApiOperation[] = [...API_OPERATIONS, ...OPENAPI_OPERATIONS];

let doc: OpenApiDocument;
let strictAjv: Ajv2020;
let coercingAjv: Ajv2020;

/** A deep copy with `#/components/schemas/X` pointing into the document added to ajv as `$defs`. */
function absolute(node: unknown): unknown {
  if (Array.isArray(node)) return node.map(absolute);
  if (!node || typeof node !== 'object') return node;
  return Object.fromEntries(
    Object.entries(node).map(([k, v]) => [k, k === '$ref' && typeof v === 'string' && v.startsWith('#/components/schemas/') ? `${DOC_ID}#/$defs/${v.slice(21)}` : absolute(v)]),
  );
}

/** Every `x-…` keyword the document's schemas use (ajv's strict mode wants each declared). */
function extensionKeywords(node: unknown, into = new Set<string>()): Set<string> {
  if (Array.isArray(node)) node.forEach((n) => extensionKeywords(n, into));
  else if (node && typeof node === 'object') {
    for (const [k, v] of Object.entries(node)) {
      if (k.startsWith('x-')) into.add(k);
      extensionKeywords(v, into);
    }
  }
  return into;
}

function makeAjv(coerceTypes: boolean): Ajv2020 {
  // Query and path parameters arrive as text: coerced as OpenAPI tools do. Bodies and answers are JSON: no coercion.
  const ajv = new Ajv2020({ allErrors: true, strict: true, strictTypes: false, strictTuples: false, coerceTypes });
  addFormats(ajv);
  ajv.addFormat('binary', true);
  ajv.addVocabulary([...extensionKeywords(doc.paths, extensionKeywords(doc.components.schemas))].filter((k) => k !== 'x-examples'));
  ajv.addSchema({ $id: DOC_ID, $defs: absolute(doc.components.schemas) as Record<string, JsonSchema> });
  return ajv;
}

const cache = new Map<string, ValidateFunction>();
function validator(ajv: Ajv2020, schema: JsonSchema, key: string): ValidateFunction {
  const k = `${ajv === coercingAjv ? 'c' : 's'} ${key}`;
  if (!cache.has(k)) cache.set(k, ajv.compile(absolute(schema) as JsonSchema));
  return cache.get(k)!;
}

const errorsOf = (v: ValidateFunction) => JSON.stringify(v.errors?.slice(0, 5) ?? [], null, 1);

function documented(op: ApiOperation): OpenApiOperation {
  const found = doc.paths[op.path]?.[op.method.toLowerCase() as 'get'];
  if (!found) throw new Error(`${op.method} ${op.path} is not in the served document`);
  return found;
}

/** The parameters of one kind as one object schema (each parameter a property). */
function parameterSchema(op: OpenApiOperation, where: 'path' | 'query'): JsonSchema {
  const params = (op.parameters ?? []).filter((p) => p.in === where);
  return { type: 'object', properties: Object.fromEntries(params.map((p) => [p.name, p.schema])), required: params.filter((p) => p.required).map((p) => p.name), additionalProperties: false };
}

/** The answer schema of a status: the success answer's, or the shared error response's. */
function answerSchema(op: OpenApiOperation, status: number): JsonSchema | undefined {
  const answer = op.responses[String(status)];
  if (!answer) return undefined;
  const response: OpenApiResponse | undefined = '$ref' in answer ? doc.components.responses[answer.$ref.replace('#/components/responses/', '')] : answer;
  return response?.content?.['application/json']?.schema;
}

/** Every key of `excerpt` must be present in `actual`, recursively (arrays: the first element's shape). */
function expectShape(actual: unknown, excerpt: unknown, path = ''): void {
  if (excerpt === null || typeof excerpt !== 'object') {
    expect(actual === undefined ? `missing ${path}` : typeof actual, path).toBe(typeof excerpt);
    return;
  }
  if (Array.isArray(excerpt)) {
    expect(Array.isArray(actual), `${path} should be an array`).toBe(true);
    if (excerpt.length && (actual as unknown[]).length) expectShape((actual as unknown[])[0], excerpt[0], `${path}[0]`);
    return;
  }
  expect(actual !== null && typeof actual === 'object', `${path} should be an object`).toBe(true);
  for (const [k, v] of Object.entries(excerpt)) expectShape((actual as Record<string, unknown>)[k], v, path ? `${path}.${k}` : k);
}

/** Does zod refuse the value for a reason JSON Schema can state (a type, range, key or value), not only a refinement? */
function refusedBySchemaRules(schema: { safeParse: (v: unknown) => { success: boolean; error?: { issues: { code: string }[] } } }, value: unknown): boolean {
  const parsed = schema.safeParse(value);
  return !parsed.success && (parsed.error?.issues ?? []).some((i) => i.code !== 'custom');
}

const queryObject = (query: string | undefined) => Object.fromEntries(new URLSearchParams(query ?? '').entries());
const fill = (path: string, params: Record<string, string> | undefined) => path.replace(/\{(\w+)\}/g, (whole, name: string) => params?.[name] ?? whole);
const isSuccess = (status: number) => status >= 200 && status < 300;

beforeAll(async () => {
  const res = await new Client().get('/api/v1/openapi.json');
  if (res.status !== 200) throw new Error(`GET /api/v1/openapi.json answered ${res.status}`);
  doc = res.body;
  strictAjv = makeAjv(false);
  coercingAjv = makeAjv(true);
});

describe('the documented examples fit the OpenAPI document, and the executed ones the live answers', () => {
  it('documents the two fixed compute contracts (blend and room modes) with executed examples', () => {
    for (const path of ['/api/v1/blend', '/api/v1/room-modes']) {
      const op = OPERATIONS.find((o) => o.method === 'POST' && o.path === path);
      expect(op?.examples.some((e) => e.status === 200 && e.executed), `POST ${path}`).toBe(true);
    }
  });

  for (const op of OPERATIONS) {
    for (const ex of op.examples) {
      const label = `${op.method} ${op.path} — ${ex.title} (${ex.status})`;
      const aboutRequest = ex.body !== undefined || ex.query !== undefined;
      if (aboutRequest) {
        it(`${label}: the request ${isSuccess(ex.status) || ex.status !== 400 ? 'fits' : 'is refused by'} the request schema`, () => checkRequest(op, ex));
      }
      if (ex.executed) it(`${label}: the app answers as documented`, () => runAgainstApp(op, ex));
    }
  }
});

function checkRequest(op: ApiOperation, ex: ApiExample): void {
  const served = documented(op);
  const parts: { name: string; value: unknown; json: JsonSchema | undefined; zod: Parameters<typeof refusedBySchemaRules>[0] | undefined; ajv: Ajv2020 }[] = [];
  if (ex.body !== undefined) {
    const [type, media] = Object.entries(served.requestBody?.content ?? {})[0] ?? [];
    parts.push({ name: `body (${type})`, value: ex.body, json: media?.schema, zod: op.body?.schema, ajv: type === 'application/json' ? strictAjv : coercingAjv });
  }
  if (ex.query !== undefined) parts.push({ name: 'query', value: queryObject(ex.query), json: parameterSchema(served, 'query'), zod: op.query, ajv: coercingAjv });
  if (ex.executed && ex.pathParams) parts.push({ name: 'path parameters', value: ex.pathParams, json: parameterSchema(served, 'path'), zod: op.pathParams, ajv: coercingAjv });
  for (const part of parts) {
    expect(part.json, `${part.name}: the document has no schema for it`).toBeDefined();
    const validate = validator(part.ajv, part.json!, `${op.id} ${part.name}`);
    const fits = validate(structuredClone(part.value));
    if (ex.status === 400 && part.zod && refusedBySchemaRules(part.zod, part.value)) {
      expect(fits, `${part.name}: a 400 about the schema must be refused by the document's schema too`).toBe(false);
    } else if (ex.status !== 400) {
      expect(fits, `${part.name}: ${errorsOf(validate)}`).toBe(true);
      if (part.zod) expect(part.zod.safeParse(part.value).success, `${part.name}: the handler's own schema refuses it`).toBe(true);
    }
  }
}

async function runAgainstApp(op: ApiOperation, ex: ApiExample): Promise<void> {
  const served = documented(op);
  const res = await new Client().request(op.method, `${fill(op.path, ex.pathParams)}${ex.query ?? ''}`, ex.body);
  expect(res.status, res.text.slice(0, 500)).toBe(ex.status);
  const schema = answerSchema(served, ex.status);
  if (ex.status !== 204) {
    expect(schema, `the document has no answer schema for ${ex.status}`).toBeDefined();
    expect(res.headers.get('content-type')).toMatch(/^application\/json/);
    const validate = validator(strictAjv, schema!, `${op.id} answer ${ex.status}`);
    expect(validate(res.body), `the live answer does not fit the documented schema: ${errorsOf(validate)}`).toBe(true);
  }
  if (ex.responseExcerpt !== undefined) expectShape(res.body, ex.responseExcerpt);
  const excerptError = (ex.responseExcerpt as { error?: { code?: string; issues?: { path: string }[] } } | undefined)?.error;
  if (excerptError?.code) expect(res.body.error.code).toBe(excerptError.code);
  if (excerptError?.issues?.[0]) expect(res.body.error.issues?.[0]?.path).toBe(excerptError.issues[0].path);
}
