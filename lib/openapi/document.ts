import type { z } from 'zod';
import { ACCESS_AND_LIMITS_TEXT } from './access-and-limits';
import { errorBodySchema } from './answers/error-body';
import { errorResponseRef, errorResponses, SECURITY_SCHEMES, securityFor, TAG_DESCRIPTIONS } from './document-parts';
import type { OpenApiDocument, OpenApiOperation, OpenApiParameter, OpenApiResponse } from './document-types';
import { convertSchemas, type JsonSchema } from './json-schema';
import { API_OPERATIONS } from './operations';
import { OPENAPI_OPERATIONS } from './operations/openapi';
import type { ApiOperation } from './types';

/**
 * The OpenAPI 3.1.0 document of the API (`GET /api/v1/openapi.json`, the API page /docs/api), built from the operations
 * (`lib/openapi/operations/*`) and the zod schemas their handlers use; see `json-schema.ts` for how schemas become JSON
 * Schema and how shared ones are named.
 */
const key = {
  body: (op: ApiOperation) => `${op.id} body`,
  path: (op: ApiOperation) => `${op.id} path`,
  query: (op: ApiOperation) => `${op.id} query`,
  answer: (op: ApiOperation, status: number) => `${op.id} ${status}`,
};
const ERROR_BODY_KEY = 'error body';

function requestEntries(ops: readonly ApiOperation[]): [string, z.ZodType][] {
  return ops.flatMap((op) => [
    ...(op.body ? [[key.body(op), op.body.schema] as [string, z.ZodType]] : []),
    ...(op.pathParams ? [[key.path(op), op.pathParams] as [string, z.ZodType]] : []),
    ...(op.query ? [[key.query(op), op.query] as [string, z.ZodType]] : []),
  ]);
}

function answerEntries(ops: readonly ApiOperation[]): [string, z.ZodType][] {
  const answers = ops.flatMap((op) => op.answers.flatMap((a) => (a.schema ? [[key.answer(op, a.status), a.schema] as [string, z.ZodType]] : [])));
  return [[ERROR_BODY_KEY, errorBodySchema], ...answers];
}

/** One parameter per property of a path or query object schema; the description moves up to the parameter. */
function parameters(objectSchema: JsonSchema | undefined, where: 'path' | 'query'): OpenApiParameter[] {
  if (!objectSchema) return [];
  const properties = (objectSchema.properties ?? {}) as Record<string, JsonSchema>;
  const required = new Set((objectSchema.required ?? []) as string[]);
  return Object.entries(properties).map(([name, schema]) => {
    const { description, ...rest } = schema;
    return { name, in: where, required: where === 'path' || required.has(name), ...(typeof description === 'string' ? { description } : {}), schema: rest };
  });
}

const kB = (bytes: number) => (bytes >= 1024 * 1024 ? `${bytes / (1024 * 1024)} MB` : `${Math.round(bytes / 1024)} kB`);

function operationObject(op: ApiOperation, schemas: Map<string, JsonSchema>): OpenApiOperation {
  const params = [...parameters(schemas.get(key.path(op)), 'path'), ...parameters(schemas.get(key.query(op)), 'query')];
  const responses: Record<string, OpenApiResponse | { $ref: string }> = {};
  for (const a of op.answers) {
    const schema = schemas.get(key.answer(op, a.status));
    const contentType = a.contentType ?? 'application/json';
    responses[String(a.status)] = {
      description: a.description,
      ...(schema ? { content: { [contentType]: { schema } } } : a.contentType ? { content: { [contentType]: { schema: { type: 'string' } } } } : {}),
    };
  }
  for (const status of op.errors) responses[String(status)] = errorResponseRef(status);
  const body = op.body;
  return {
    operationId: op.id,
    tags: [op.tag],
    summary: op.summary,
    ...(op.notes?.length ? { description: op.notes.join('\n\n') } : {}),
    security: securityFor(op.access),
    ...(params.length ? { parameters: params } : {}),
    ...(body
      ? {
          requestBody: {
            required: !body.optional,
            description: `${body.optional ? 'Optional. ' : ''}At most ${kB(body.limitBytes)} (413 beyond).`,
            content: { [body.contentType ?? 'application/json']: { schema: schemas.get(key.body(op)) ?? {} } },
            'x-max-bytes': body.limitBytes,
          },
        }
      : {}),
    responses,
    'x-access': op.access,
    'x-examples': op.examples,
  };
}

function buildDocument(ops: readonly ApiOperation[]): OpenApiDocument {
  const ids = new Set<string>();
  for (const op of ops) {
    if (ids.has(op.id)) throw new Error(`OpenAPI: two operations share the id '${op.id}'`);
    ids.add(op.id);
  }
  const converted = convertSchemas(requestEntries(ops), answerEntries(ops));
  const errorBodyRef = (converted.byKey.get(ERROR_BODY_KEY)?.$ref as string | undefined) ?? '#/components/schemas/ErrorBody';
  const paths: OpenApiDocument['paths'] = {};
  for (const op of ops) {
    const item = (paths[op.path] ??= {});
    const method = op.method.toLowerCase() as keyof (typeof paths)[string];
    if (item[method]) throw new Error(`OpenAPI: ${op.method} ${op.path} is described twice (${item[method]?.operationId}, ${op.id})`);
    item[method] = operationObject(op, converted.byKey);
  }
  const tags = [...new Set(ops.map((op) => op.tag))].map((name) => ({ name, ...(TAG_DESCRIPTIONS[name] ? { description: TAG_DESCRIPTIONS[name] } : {}) }));
  return {
    openapi: '3.1.0',
    info: {
      title: 'Seamline API',
      version: '1.0.0',
      description: [
        'JSON over HTTP under /api/v1/ for making main speakers and subwoofers play as one system. Every body is validated; SI units everywhere, with the unit in each field name and in x-unit. Errors share one shape (ErrorBody).',
        ...ACCESS_AND_LIMITS_TEXT,
      ].join('\n\n'),
    },
    servers: [{ url: '/', description: 'The Seamline app serving this document.' }],
    tags,
    paths,
    components: {
      schemas: converted.components,
      responses: errorResponses(
        ops.flatMap((op) => op.errors),
        errorBodyRef,
      ),
      securitySchemes: SECURITY_SCHEMES,
    },
  };
}

let cached: OpenApiDocument | null = null;

/** The document, built once per process. */
export function openApiDocument(): OpenApiDocument {
  cached ??= buildDocument([...API_OPERATIONS, ...OPENAPI_OPERATIONS]);
  return cached;
}
