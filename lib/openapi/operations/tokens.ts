import { BODY_LIMIT_BYTES } from '@/lib/http';
import { accessTokenAnswerSchema, accessTokenListAnswerSchema, createdAccessTokenAnswerSchema } from '@/lib/openapi/answers/tokens';
import { accessTokenCreateSchema, accessTokenIdSchema } from '@/lib/validations/access-token';
import type { ApiOperation } from '../types';
import { EXAMPLE } from './library-common';

/** Personal access tokens: made, listed and revoked from a browser session (the Account page), never with a token. */

const SESSION_ONLY = 'A browser session only: a request with an access token is answered 403 (a token never makes or revokes tokens).';
const token = {
  id: 'e1f2a3b4-c5d6-4e7f-8a9b-0c1d2e3f4a5b',
  name: 'Commissioning checklist (invented)',
  workspaceId: EXAMPLE.workspace,
  workspaceName: 'Larkspur AV (invented)',
  scope: 'read',
  hint: 'slp_Xk3q…',
  createdAt: EXAMPLE.time,
  expiresAt: '2027-03-01T12:00:00.000Z',
  lastUsedAt: null,
  revokedAt: null,
  status: 'active',
};

export const TOKENS_OPERATIONS: ApiOperation[] = [
  {
    id: 'tokens-list',
    method: 'GET',
    path: '/api/v1/tokens',
    tag: 'Account',
    summary: 'The caller’s personal access tokens (never their secrets), with created, last-used and expiry dates; revoked and expired ones for 30 days after they ended.',
    notes: [SESSION_ONLY],
    access: 'session',
    answers: [{ status: 200, description: 'The tokens.', schema: accessTokenListAnswerSchema }],
    errors: [401, 403, 429, 503],
    examples: [{ title: 'My tokens', status: 200, responseExcerpt: { items: [token] } }],
  },
  {
    id: 'tokens-create',
    method: 'POST',
    path: '/api/v1/tokens',
    tag: 'Account',
    summary: 'Makes a named token for one workspace, read or write, with an optional expiry; the answer holds its secret, shown this once.',
    notes: [
      SESSION_ONLY,
      'You must be a member of the workspace (else 404); a viewer can make read tokens only (400 on scope). A token acts with your role in that workspace capped by its scope — read: a viewer; write: at most an editor — and reaches no other workspace (404 there). If you leave the workspace or your role drops, the token follows at once.',
      'Keep the secret like a password; if it leaks, revoke the token and make another.',
    ],
    access: 'session',
    body: { schema: accessTokenCreateSchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [{ status: 201, description: 'The token and its secret.', schema: createdAccessTokenAnswerSchema }],
    errors: [400, 401, 403, 404, 413, 415, 429, 503],
    examples: [
      {
        title: 'A read token for a checklist program, valid 90 days',
        body: { name: 'Commissioning checklist (invented)', workspaceId: EXAMPLE.workspace, scope: 'read', expiresInDays: 90 },
        status: 201,
        responseExcerpt: { ...token, token: 'slp_Xk3qexampleonlynotarealtoken0000000000000' },
      },
      { title: 'A scope that does not exist', body: { name: 'Sheet', workspaceId: EXAMPLE.workspace, scope: 'admin' }, status: 400, responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'scope', message: "scope must be 'read' or 'write'" }] } } },
    ],
  },
  {
    id: 'tokens-revoke',
    method: 'DELETE',
    path: '/api/v1/tokens/{id}',
    tag: 'Account',
    summary: 'Revokes one of the caller’s tokens at once: its next request is 401.',
    notes: [SESSION_ONLY, 'Someone else’s token, or an id that is not a token: 404. Revoking again changes nothing.'],
    access: 'session',
    pathParams: accessTokenIdSchema,
    answers: [{ status: 200, description: 'The token, now revoked.', schema: accessTokenAnswerSchema }],
    errors: [401, 403, 404, 429, 503],
    examples: [{ title: 'Revoke a token', pathParams: { id: token.id }, status: 200, responseExcerpt: { ...token, status: 'revoked', revokedAt: EXAMPLE.time } }],
  },
];
