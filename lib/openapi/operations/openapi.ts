import { z } from 'zod';
import type { ApiOperation } from '../types';

/** GET /api/v1/openapi.json: the document itself (added by the generator to what `API_OPERATIONS` lists). */
export const OPENAPI_OPERATIONS: ApiOperation[] = [
  {
    id: 'openapi-document',
    method: 'GET',
    path: '/api/v1/openapi.json',
    tag: 'OpenAPI',
    summary: 'This description of the API as an OpenAPI 3.1 document, generated from the schemas the route handlers validate with.',
    notes: [
      'Every route, parameter, field (with its unit in x-unit), answer and error is in it; the API page is rendered from it. Feed it to a client generator (for TypeScript, openapi-typescript) to get typed calls.',
      'Cached for five minutes.',
    ],
    access: 'public',
    answers: [
      {
        status: 200,
        description: 'The OpenAPI 3.1.0 document.',
        schema: z.record(z.string(), z.unknown()).meta({ description: 'An OpenAPI 3.1.0 document (openapi, info, servers, tags, paths, components).' }),
      },
    ],
    errors: [401, 429, 503],
    examples: [{ title: 'The document', status: 200, responseExcerpt: { openapi: '3.1.0', info: { title: 'Seamline API' }, paths: {}, components: { schemas: {} } }, executed: true }],
  },
];
