import type { OpenApiResponse } from './document-types';
import type { ApiAccess } from './types';

/** The error answers every operation refers to by status (`#/components/responses/<name>`), all with the one error body. */
const ERRORS: Record<number, { name: string; description: string; retryAfter?: string }> = {
  400: { name: 'Invalid', description: 'The request is not valid: every problem is in error.issues, each with the field path.' },
  401: { name: 'Unauthorized', description: 'Sign in or send a personal access token (Authorization: Bearer …); also any route sent a token that is revoked, expired or unknown.' },
  403: { name: 'Forbidden', description: "The caller's role in the workspace (or the token's scope) does not allow this." },
  404: { name: 'NotFound', description: 'Not found; also what the caller may not see (outsiders learn nothing).' },
  409: { name: 'Conflict', description: 'Someone saved a newer revision since the caller read it; nothing was changed (error.currentRevision says which is stored).' },
  413: { name: 'TooLarge', description: 'The body is larger than this operation takes; nothing was read beyond the limit.' },
  415: { name: 'UnsupportedMediaType', description: "The body was not sent as this operation's media type." },
  429: { name: 'TooManyRequests', description: 'Too many requests: wait Retry-After seconds, then try again.', retryAfter: 'Seconds to wait before trying again.' },
  503: { name: 'Unavailable', description: 'The database is not answering; nothing was changed. Try again after Retry-After seconds.', retryAfter: 'Seconds to wait before trying again (5).' },
};

const errorName = (status: number) => ERRORS[status]?.name ?? `Error${status}`;

/** `components.responses` for the statuses the operations list. */
export function errorResponses(statuses: Iterable<number>, errorBodyRef: string): Record<string, OpenApiResponse> {
  const out: Record<string, OpenApiResponse> = {};
  for (const status of [...new Set(statuses)].sort((a, b) => a - b)) {
    const known = ERRORS[status];
    out[errorName(status)] = {
      description: known?.description ?? `Error ${status}.`,
      ...(known?.retryAfter ? { headers: { 'Retry-After': { description: known.retryAfter, schema: { type: 'integer', minimum: 1, 'x-unit': 's' } } } } : {}),
      content: { 'application/json': { schema: { $ref: errorBodyRef } } },
    };
  }
  return out;
}

export const errorResponseRef = (status: number) => ({ $ref: `#/components/responses/${errorName(status)}` });

export const SECURITY_SCHEMES: Record<string, Record<string, string>> = {
  bearerAuth: { type: 'http', scheme: 'bearer', description: 'A personal access token from the Account page: one workspace, read or read and write.' },
  sessionCookie: {
    type: 'apiKey',
    in: 'cookie',
    name: 'next-auth.session-token',
    description: 'The browser session set by signing in (named __Secure-next-auth.session-token over HTTPS).',
  },
};

/** Who may call an operation, as OpenAPI security requirements (`{}`: no credentials needed). */
export function securityFor(access: ApiAccess): Record<string, string[]>[] {
  if (access === 'public') return [{}, { bearerAuth: [] }, { sessionCookie: [] }];
  if (access === 'member') return [{ bearerAuth: [] }, { sessionCookie: [] }];
  return [{ sessionCookie: [] }];
}

/** How the API page says who may call an operation. */
export const ACCESS_WORDS: Record<ApiAccess, string> = {
  public: 'Anyone: no sign-in needed (a session or token may be sent: it counts for limits, and a token sent must be valid).',
  member: 'A workspace member: a signed-in session or a personal access token (Authorization: Bearer …) of the workspace.',
  session: 'A signed-in browser session only.',
  admin: "A site administrator's browser session.",
};

/** Tag descriptions; a tag not listed here is shown without one. */
export const TAG_DESCRIPTIONS: Record<string, string> = {
  Compute: 'Computations on the numbers of a System: no sign-in needed, nothing is stored.',
  Measured: 'Computations on measured curves (sent inline, or stored measurements by id with a session or token).',
  Library: 'Saved Systems, their revisions, exports and Share links.',
  Profiles: 'Speaker profiles of a workspace.',
  Measurements: 'Uploaded measurements of a workspace, grouped in Runs.',
  Lessons: 'Lessons and their Steps.',
  Workspaces: 'Workspaces, members and invitations.',
  Account: 'Signing up, passwords, invitations, access tokens and site administration.',
  OpenAPI: 'This description of the API.',
};
