import type { z } from 'zod';

/**
 * One operation of the public API, described by the zod schemas its handler uses. The OpenAPI 3.1 document
 * (`/api/v1/openapi.json`) and the API page (`/docs/api`) are generated from these; nothing is written twice.
 * Field descriptions and units live on the schemas themselves (`.meta({ description, 'x-unit': 'Hz' })`).
 */
export type ApiMethod = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/**
 * Who may call it:
 * - `public`: anyone (compute routes, sign-up, password reset); a session or token is accepted and only counts for limits;
 * - `member`: a signed-in session or a personal access token (`Authorization: Bearer …`) of a workspace member;
 * - `session`: a browser session only (account and token management, accepting invitations);
 * - `admin`: a site administrator's session.
 */
export type ApiAccess = 'public' | 'member' | 'session' | 'admin';

export interface ApiExample {
  title: string;
  /** Path parameters filled in, e.g. { id: '6b0d…' }. */
  pathParams?: Record<string, string>;
  /** The query string, e.g. '?q=screening&sort=name'. */
  query?: string;
  /** The JSON body (or, for multipart routes, the form fields with the file's name). */
  body?: unknown;
  /** The status it answers with. */
  status: number;
  /** A short excerpt of the answer; tests check its keys exist in the real answer. */
  responseExcerpt?: unknown;
  /** Compute examples are executed against the running app by tests; Library examples are documented only. */
  executed?: boolean;
}

export interface ApiAnswer {
  status: number;
  description: string;
  /** The answer body's schema (JSON); absent for 204 and for downloads described by `contentType`. */
  schema?: z.ZodType;
  /** Default application/json. */
  contentType?: string;
}

export interface ApiOperation {
  /** Stable, unique: the OpenAPI operationId and the anchor on the API page (e.g. 'blend', 'systems-get'). */
  id: string;
  method: ApiMethod;
  /** OpenAPI style, e.g. '/api/v1/systems/{id}'. */
  path: string;
  /** Grouping on the page and the OpenAPI tag: 'Compute', 'Measured', 'Library', 'Lessons', 'Workspaces', 'Account'. */
  tag: string;
  summary: string;
  /** Longer notes: rules, limits, what is refused (rendered as paragraphs). */
  notes?: string[];
  access: ApiAccess;
  /** Path parameters (a z.object of strings). */
  pathParams?: z.ZodObject;
  /** Query parameters (the same schema `parseQuery` uses). */
  query?: z.ZodObject;
  /**
   * The request body (the same schema `parseJson` uses), its media type (default application/json) and size limit;
   * `optional` when the route also takes no body at all.
   */
  body?: { schema: z.ZodType; contentType?: 'application/json' | 'multipart/form-data'; limitBytes: number; optional?: boolean };
  /** Success answers (usually one). */
  answers: ApiAnswer[];
  /** Error statuses this operation can answer with (all share the one error shape). */
  errors: number[];
  examples: ApiExample[];
}
