import { BODY_LIMIT_BYTES } from '@/lib/http';
import { invitationAcceptedAnswerSchema, invitationPreviewAnswerSchema, resetRequestedAnswerSchema, signUpAnswerSchema, siteRoleAnswerSchema, userListAnswerSchema } from '@/lib/openapi/answers/auth';
import { okAnswerSchema } from '@/lib/openapi/answers/library-parts';
import { resetConfirmSchema, resetRequestSchema, signUpSchema } from '@/lib/validations/auth';
import { siteRoleUpdateSchema } from '@/lib/validations/site-role';
import type { ApiOperation } from '../types';
import { adminUserParams, EXAMPLE, invitationTokenParams } from './library-common';

/** Account routes: sign-up, password reset, invitations by their token, and the site administrator's accounts and site roles. */

const FORM_ERRORS = [400, 413, 415, 429, 503];
const RESET_TOKEN = 'Zm9yZ290dGVuX3Bhc3N3b3JkX2V4YW1wbGVfb25seQ';
const INVITE_TOKEN = 'aW52aXRhdGlvbl9leGFtcGxlX29ubHlfbm90X3JlYWw';

export const AUTH_OPERATIONS: ApiOperation[] = [
  {
    id: 'sign-up',
    method: 'POST',
    path: '/api/v1/auth/sign-up',
    tag: 'Account',
    summary: 'Creates an account and its personal workspace (the new person owns it). Then sign in.',
    notes: ['An address that already has an account is a 400 on email (sign in, or reset the password).'],
    access: 'public',
    body: { schema: signUpSchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [{ status: 201, description: 'The new account.', schema: signUpAnswerSchema }],
    errors: FORM_ERRORS,
    examples: [
      {
        title: 'Sign up',
        body: { name: 'Avery Quillfeather (invented)', email: 'avery@example.test', password: 'correct-horse-4812' },
        status: 201,
        responseExcerpt: { id: EXAMPLE.user, email: 'avery@example.test', name: 'Avery Quillfeather (invented)' },
      },
      {
        title: 'A password under 10 characters is refused by its path',
        body: { name: 'Avery Quillfeather (invented)', email: 'avery@example.test', password: 'short' },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'password', message: 'password must be at least 10 characters' }] } },
      },
    ],
  },
  {
    id: 'password-reset',
    method: 'POST',
    path: '/api/v1/auth/password-reset',
    tag: 'Account',
    summary: 'Sends a single-use reset link (valid one hour) to the address, if an account uses it; the answer is the same either way.',
    notes: ['Always 202 for a valid address: whether an account exists is not revealed. 503 when the mail cannot be sent.'],
    access: 'public',
    body: { schema: resetRequestSchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [{ status: 202, description: 'Accepted.', schema: resetRequestedAnswerSchema }],
    errors: FORM_ERRORS,
    examples: [
      { title: 'Ask for a reset link', body: { email: 'avery@example.test' }, status: 202, responseExcerpt: { ok: true, message: 'If an account uses that address, a reset link is on its way.' } },
    ],
  },
  {
    id: 'password-reset-confirm',
    method: 'POST',
    path: '/api/v1/auth/password-reset/confirm',
    tag: 'Account',
    summary: 'Sets a new password with the token of a reset link; the link works once.',
    notes: ['An unknown, used or expired token is a 400 on token, each with its own message (ask for a new link).'],
    access: 'public',
    body: { schema: resetConfirmSchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [{ status: 200, description: 'The password is changed.', schema: okAnswerSchema }],
    errors: FORM_ERRORS,
    examples: [
      { title: 'Choose a new password', body: { token: RESET_TOKEN, password: 'battery-staple-7731' }, status: 200, responseExcerpt: { ok: true } },
      {
        title: 'A link used twice',
        body: { token: RESET_TOKEN, password: 'battery-staple-7731' },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', message: 'This reset link has already been used. Ask for a new one.', issues: [{ path: 'token', message: 'already used' }] } },
      },
    ],
  },
  {
    id: 'invitations-preview',
    method: 'GET',
    path: '/api/v1/invitations/{token}',
    tag: 'Account',
    summary: 'What an invitation link offers: the workspace, the invited address and the role (no sign-in needed).',
    notes: ['An unknown token is 404; a used or expired one is a 400 on token.'],
    access: 'public',
    pathParams: invitationTokenParams,
    answers: [{ status: 200, description: 'The invitation.', schema: invitationPreviewAnswerSchema }],
    errors: [400, 404, 429, 503],
    examples: [{ title: 'Look at an invitation', pathParams: { token: INVITE_TOKEN }, status: 200, responseExcerpt: { workspaceName: 'Larkspur AV (invented)', email: 'guest.listener@example.test', role: 'viewer' } }],
  },
  {
    id: 'invitations-accept',
    method: 'POST',
    path: '/api/v1/invitations/{token}',
    tag: 'Account',
    summary: 'Accepts an invitation: the signed-in invitee becomes a member with the invited role (once).',
    notes: ['Needs a session of the invited address (another address is a 400 on token); an unknown token is 404, a used or expired one 400.'],
    access: 'session',
    pathParams: invitationTokenParams,
    answers: [{ status: 200, description: 'The membership.', schema: invitationAcceptedAnswerSchema }],
    errors: [400, 401, 403, 404, 429, 503],
    examples: [{ title: 'Accept', pathParams: { token: INVITE_TOKEN }, status: 200, responseExcerpt: { workspaceId: EXAMPLE.workspace, role: 'viewer' } }],
  },
  {
    id: 'admin-users',
    method: 'GET',
    path: '/api/v1/admin/users',
    tag: 'Account',
    summary: 'Every account, oldest first, with its site role and how many workspaces it belongs to (site administrators).',
    notes: ['Anyone else, and any access token, gets 404. A site administrator gets no access to workspace content by that role alone.'],
    access: 'admin',
    answers: [{ status: 200, description: 'The accounts.', schema: userListAnswerSchema }],
    errors: [401, 404, 429, 503],
    examples: [{ title: 'Accounts', status: 200, responseExcerpt: { items: [{ id: EXAMPLE.user, email: 'demo@seamline.test', siteRole: 'member', workspaceCount: 2 }] } }],
  },
  {
    id: 'admin-user-site-role',
    method: 'PATCH',
    path: '/api/v1/admin/users/{id}',
    tag: 'Account',
    summary: 'Sets an account’s site role: makes it a site admin, or a member again (site administrators, in a browser session).',
    notes: [
      'Anyone else, and any access token, gets 404. The site keeps at least one site admin: making the last one a member is a 409 that says so (the same rule stops the last admin deleting their account). Setting the role the account already has changes nothing.',
    ],
    access: 'admin',
    pathParams: adminUserParams,
    body: { schema: siteRoleUpdateSchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [{ status: 200, description: 'The account with its site role now.', schema: siteRoleAnswerSchema }],
    errors: [400, 401, 404, 409, 413, 415, 429, 503],
    examples: [{ title: 'Make an account a site admin', pathParams: { id: EXAMPLE.user }, body: { siteRole: 'admin' }, status: 200, responseExcerpt: { id: EXAMPLE.user, siteRole: 'admin' } }],
  },
];
