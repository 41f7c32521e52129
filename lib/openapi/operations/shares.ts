import { BODY_LIMIT_BYTES } from '@/lib/http';
import { lessonShareLinkAnswerSchema, lessonShareLinkListAnswerSchema } from '@/lib/openapi/answers/lessons';
import { shareLinkAnswerSchema, shareLinkListAnswerSchema, systemAnswerSchema } from '@/lib/openapi/answers/library';
import { copySchema } from '@/lib/validations/library';
import { shareTokenQuerySchema } from '@/lib/validations/share-link';
import type { ApiOperation } from '../types';
import { BODILESS_WRITE_ERRORS, EXAMPLE, lessonParams, shareTokenParams, systemParams, WRITE_ERRORS } from './library-common';

/** Share links: read-only links to a System or a Lesson, made, listed and revoked by editors; a shared System copied. */

const EDITORS = 'Editors and owners only (viewers get 403): a token is as good as read access for whoever holds it.';
const TOKEN = EXAMPLE.shareToken;
const URL = `http://127.0.0.1:3000/s/${TOKEN}`;

export const SHARES_OPERATIONS: ApiOperation[] = [
  {
    id: 'share-links-create',
    method: 'POST',
    path: '/api/v1/systems/{id}/share-links',
    tag: 'Library',
    summary: 'Creates a read-only link to a System (256 random bits from the CSPRNG): its page shows the plots and the Settings sheet to anyone holding it.',
    notes: [EDITORS],
    access: 'member',
    pathParams: systemParams,
    answers: [{ status: 201, description: 'The new link.', schema: shareLinkAnswerSchema }],
    errors: BODILESS_WRITE_ERRORS,
    examples: [{ title: 'Create a link', pathParams: { id: EXAMPLE.system }, status: 201, responseExcerpt: { token: TOKEN, url: URL, revokedAt: null } }],
  },
  {
    id: 'share-links-list',
    method: 'GET',
    path: '/api/v1/systems/{id}/share-links',
    tag: 'Library',
    summary: 'The System’s open links, newest first.',
    notes: [EDITORS],
    access: 'member',
    pathParams: systemParams,
    answers: [{ status: 200, description: 'The open links.', schema: shareLinkListAnswerSchema }],
    errors: BODILESS_WRITE_ERRORS,
    examples: [{ title: 'Open links', pathParams: { id: EXAMPLE.system }, status: 200, responseExcerpt: { items: [{ token: TOKEN, createdByName: 'Demo Integrator' }] } }],
  },
  {
    id: 'share-links-revoke',
    method: 'DELETE',
    path: '/api/v1/share-links/{token}',
    tag: 'Library',
    summary: 'Revokes a System’s link; its page answers 404 from then on. Revoking twice is harmless (the first time stays).',
    notes: ['Editors and owners of the System’s workspace; an unknown token is 404.'],
    access: 'member',
    pathParams: shareTokenParams,
    answers: [{ status: 200, description: 'The link, revoked.', schema: shareLinkAnswerSchema }],
    errors: BODILESS_WRITE_ERRORS,
    examples: [{ title: 'Revoke', pathParams: { token: TOKEN }, status: 200, responseExcerpt: { token: TOKEN, revokedAt: EXAMPLE.time } }],
  },
  {
    id: 'shared-copy',
    method: 'POST',
    path: '/api/v1/shared/{token}/copy',
    tag: 'Library',
    summary: 'A signed-in visitor copies a shared System into a workspace where they are an editor (revision 1 of a new System).',
    notes: ['A revoked or unknown token, or a deleted System, is 404.'],
    access: 'member',
    pathParams: shareTokenParams,
    body: { schema: copySchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [{ status: 201, description: 'The copy, a new System in that workspace.', schema: systemAnswerSchema }],
    errors: WRITE_ERRORS,
    examples: [{ title: 'Copy into my workspace', pathParams: { token: TOKEN }, body: { workspaceId: EXAMPLE.workspace }, status: 201, responseExcerpt: { workspaceId: EXAMPLE.workspace, revision: 1 } }],
  },
  {
    id: 'lessons-share-create',
    method: 'POST',
    path: '/api/v1/lessons/{id}/share-links',
    tag: 'Lessons',
    summary: 'Creates a read-only student link to a Lesson: anyone holding it sees the Lesson without signing in (no workspace ids, no people).',
    notes: [EDITORS],
    access: 'member',
    pathParams: lessonParams,
    answers: [{ status: 201, description: 'The new link.', schema: lessonShareLinkAnswerSchema }],
    errors: BODILESS_WRITE_ERRORS,
    examples: [{ title: 'A student link', pathParams: { id: EXAMPLE.lesson }, status: 201, responseExcerpt: { token: TOKEN, url: URL, lessonId: EXAMPLE.lesson, revokedAt: null } }],
  },
  {
    id: 'lessons-share-list',
    method: 'GET',
    path: '/api/v1/lessons/{id}/share-links',
    tag: 'Lessons',
    summary: 'The Lesson’s open student links, newest first.',
    notes: [EDITORS],
    access: 'member',
    pathParams: lessonParams,
    answers: [{ status: 200, description: 'The open links.', schema: lessonShareLinkListAnswerSchema }],
    errors: BODILESS_WRITE_ERRORS,
    examples: [{ title: 'Open links', pathParams: { id: EXAMPLE.lesson }, status: 200, responseExcerpt: { items: [{ token: TOKEN, lessonId: EXAMPLE.lesson }] } }],
  },
  {
    id: 'lessons-share-revoke',
    method: 'DELETE',
    path: '/api/v1/lessons/{id}/share-links',
    tag: 'Lessons',
    summary: 'Revokes one of the Lesson’s student links (?token=): the student page answers "not found" from now on.',
    notes: [EDITORS, 'A token of another Lesson, or an unknown one, is 404.'],
    access: 'member',
    pathParams: lessonParams,
    query: shareTokenQuerySchema,
    answers: [{ status: 200, description: 'The link, revoked.', schema: lessonShareLinkAnswerSchema }],
    errors: [400, ...BODILESS_WRITE_ERRORS],
    examples: [{ title: 'Revoke a student link', pathParams: { id: EXAMPLE.lesson }, query: `?token=${TOKEN}`, status: 200, responseExcerpt: { token: TOKEN, revokedAt: EXAMPLE.time } }],
  },
];
