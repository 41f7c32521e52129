import { BODY_LIMIT_BYTES } from '@/lib/http';
import { revisionAnswerSchema, revisionDocumentAnswerSchema, revisionListAnswerSchema, systemAnswerSchema } from '@/lib/openapi/answers/library';
import { revisionNoteUpdateSchema, revisionRestoreSchema } from '@/lib/validations/library';
import type { ApiOperation } from '../types';
import { ACCESS_NOTE, EXAMPLE, READ_ERRORS, REVISION_NOTE, REVISION_WRITE_ERRORS, systemParams, systemRevisionParams, WRITE_ERRORS } from './library-common';

/** A System's revisions: the history, one revision, its note, and restoring it as a new revision. */

export const REVISION_OPERATIONS: ApiOperation[] = [
  {
    id: 'systems-revisions',
    method: 'GET',
    path: '/api/v1/systems/{id}/revisions',
    tag: 'Library',
    summary: 'Every saved revision, newest first: number, name, author, note and time.',
    notes: ['Notes: the one typed when saving (or set later), else "created", "renamed", "restored revision n", "copied from …".', ACCESS_NOTE],
    access: 'member',
    pathParams: systemParams,
    answers: [{ status: 200, description: 'The history.', schema: revisionListAnswerSchema }],
    errors: READ_ERRORS,
    examples: [
      {
        title: 'History',
        pathParams: { id: EXAMPLE.system },
        status: 200,
        responseExcerpt: { items: [{ revision: 2, name: 'Den', authorName: 'Demo Integrator', note: null, createdAt: EXAMPLE.time }] },
      },
    ],
  },
  {
    id: 'systems-revision-get',
    method: 'GET',
    path: '/api/v1/systems/{id}/revisions/{revision}',
    tag: 'Library',
    summary: 'One saved revision with its note and its document, as it was saved.',
    notes: [ACCESS_NOTE],
    access: 'member',
    pathParams: systemRevisionParams,
    answers: [{ status: 200, description: 'The revision.', schema: revisionDocumentAnswerSchema }],
    errors: READ_ERRORS,
    examples: [{ title: 'Revision 2', pathParams: { id: EXAMPLE.system, revision: '2' }, status: 200, responseExcerpt: { revision: 2, name: 'Den', note: null } }],
  },
  {
    id: 'systems-revision-note',
    method: 'PATCH',
    path: '/api/v1/systems/{id}/revisions/{revision}',
    tag: 'Library',
    summary: 'Changes a revision’s note after the fact. Only the note changes: no new revision is made and the document, name, author and time stay as saved.',
    notes: ['Editors and owners may change a note; viewers get 403.', ACCESS_NOTE],
    access: 'member',
    pathParams: systemRevisionParams,
    body: { schema: revisionNoteUpdateSchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [{ status: 200, description: 'The revision as the history lists it, with its new note (null when removed).', schema: revisionAnswerSchema }],
    errors: WRITE_ERRORS,
    examples: [
      {
        title: 'Note revision 4',
        pathParams: { id: EXAMPLE.system, revision: '4' },
        body: { note: 'moved subs to the front corners' },
        status: 200,
        responseExcerpt: { revision: 4, note: 'moved subs to the front corners' },
      },
      {
        title: 'A note over 200 characters is refused by its path',
        pathParams: { id: EXAMPLE.system, revision: '4' },
        body: { note: 'x'.repeat(201) },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'note', message: 'note must be at most 200 characters' }] } },
      },
    ],
  },
  {
    id: 'systems-revision-restore',
    method: 'POST',
    path: '/api/v1/systems/{id}/revisions/{revision}/restore',
    tag: 'Library',
    summary: 'Saves an old revision again as a new revision, noted "restored revision n" (history only grows).',
    notes: [REVISION_NOTE, ACCESS_NOTE],
    access: 'member',
    pathParams: systemRevisionParams,
    body: { schema: revisionRestoreSchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [{ status: 200, description: 'The System at its new revision.', schema: systemAnswerSchema }],
    errors: REVISION_WRITE_ERRORS,
    examples: [{ title: 'Restore revision 1 on top of revision 4', pathParams: { id: EXAMPLE.system, revision: '1' }, body: { revision: 4 }, status: 200, responseExcerpt: { revision: 5 } }],
  },
];
