import { json, route } from '@/lib/http';
import { openApiDocument } from '@/lib/openapi/document';

/** GET /api/v1/openapi.json — the OpenAPI 3.1 description of the API, generated from the handlers' zod schemas. Public. */
export const GET = route(async () => json(openApiDocument(), 200, { 'Cache-Control': 'public, max-age=300' }));
