import { lindenStreetDocument } from '@/lib/demo/systems';
import { BODY_LIMIT_BYTES } from '@/lib/http';
import { systemAnswerSchema, systemExportAnswerSchema, systemListAnswerSchema } from '@/lib/openapi/answers/library';
import { deletedAnswerSchema } from '@/lib/openapi/answers/library-parts';
import { exportQuerySchema, systemCreateSchema, systemDuplicateSchema, systemListQuerySchema, systemRenameSchema, systemUpdateSchema } from '@/lib/validations/library';
import type { ApiOperation } from '../types';
import { ACCESS_NOTE, BODILESS_WRITE_ERRORS, EXAMPLE, QUERY_READ_ERRORS, READ_ERRORS, REVISION_NOTE, REVISION_WRITE_ERRORS, systemParams, WRITE_ERRORS } from './library-common';
import { REVISION_OPERATIONS } from './library-revisions';

/** The Library's Systems: list, create, read, save, rename, delete, restore, duplicate, export (and their revisions). */

const NAME = 'Linden Street den (invented)';
const system = (description: string, status = 200) => ({ status, description, schema: systemAnswerSchema });

const SYSTEM_OPERATIONS: ApiOperation[] = [
  {
    id: 'systems-list',
    method: 'GET',
    path: '/api/v1/systems',
    tag: 'Library',
    summary: 'The Systems of the caller’s workspaces, searched, filtered, sorted and paged.',
    notes: ['A workspaceId the caller does not belong to lists nothing.'],
    access: 'member',
    query: systemListQuerySchema,
    answers: [{ status: 200, description: 'One page of Systems (without their documents), the total and every tag.', schema: systemListAnswerSchema }],
    errors: QUERY_READ_ERRORS,
    examples: [{ title: 'Search by name, sorted by name', query: '?q=screening&sort=name&page=1', status: 200, responseExcerpt: { items: [], total: 0, page: 1, pageSize: 20, tags: [] } }],
  },
  {
    id: 'systems-create',
    method: 'POST',
    path: '/api/v1/systems',
    tag: 'Library',
    summary: 'Saves a new System (revision 1) in a workspace where the caller is an editor or owner.',
    notes: ['The document is validated field by field; every refusal names its path (document.room.lengthM).', ACCESS_NOTE],
    access: 'member',
    body: { schema: systemCreateSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [system('The new System, revision 1.', 201)],
    errors: WRITE_ERRORS,
    examples: [
      { title: 'Save the invented Linden Street den', body: { name: NAME, document: lindenStreetDocument() }, status: 201, responseExcerpt: { id: EXAMPLE.system, name: NAME, revision: 1 } },
      {
        title: 'A room too short is refused by its path',
        body: { name: NAME, document: { ...lindenStreetDocument(), room: { ...lindenStreetDocument().room, lengthM: 1 } } },
        status: 400,
        responseExcerpt: { error: { code: 'invalid', issues: [{ path: 'document.room.lengthM', message: 'lengthM must be at least 1.5' }] } },
      },
    ],
  },
  {
    id: 'systems-get',
    method: 'GET',
    path: '/api/v1/systems/{id}',
    tag: 'Library',
    summary: 'One System with its document and the caller’s role.',
    notes: [ACCESS_NOTE],
    access: 'member',
    pathParams: systemParams,
    answers: [system('The System.')],
    errors: READ_ERRORS,
    examples: [{ title: 'Read a System', pathParams: { id: EXAMPLE.system }, status: 200, responseExcerpt: { id: EXAMPLE.system, revision: 3, role: 'editor' } }],
  },
  {
    id: 'systems-save',
    method: 'PUT',
    path: '/api/v1/systems/{id}',
    tag: 'Library',
    summary: 'Saves a new revision, if and only if `revision` is still the current one.',
    notes: ['The System row and its revision row are written in one transaction; of two saves of the same revision exactly one succeeds.', REVISION_NOTE, ACCESS_NOTE],
    access: 'member',
    pathParams: systemParams,
    body: { schema: systemUpdateSchema, limitBytes: BODY_LIMIT_BYTES.standard },
    answers: [system('The System as saved, at its new revision.')],
    errors: REVISION_WRITE_ERRORS,
    examples: [
      { title: 'Save on top of revision 3', pathParams: { id: EXAMPLE.system }, body: { name: NAME, document: lindenStreetDocument(), revision: 3 }, status: 200, responseExcerpt: { revision: 4 } },
      {
        title: 'Someone saved first: 409, nothing changed',
        pathParams: { id: EXAMPLE.system },
        body: { name: NAME, document: lindenStreetDocument(), revision: 3 },
        status: 409,
        responseExcerpt: { error: { code: 'conflict', currentRevision: 4 } },
      },
    ],
  },
  {
    id: 'systems-rename',
    method: 'PATCH',
    path: '/api/v1/systems/{id}',
    tag: 'Library',
    summary: 'Renames a System (a new revision noted "renamed", with the same conflict rule as a save).',
    notes: [REVISION_NOTE, ACCESS_NOTE],
    access: 'member',
    pathParams: systemParams,
    body: { schema: systemRenameSchema, limitBytes: BODY_LIMIT_BYTES.form },
    answers: [system('The System, renamed, at its new revision.')],
    errors: REVISION_WRITE_ERRORS,
    examples: [{ title: 'Rename', pathParams: { id: EXAMPLE.system }, body: { name: 'Den, final', revision: 4 }, status: 200, responseExcerpt: { name: 'Den, final', revision: 5 } }],
  },
  {
    id: 'systems-delete',
    method: 'DELETE',
    path: '/api/v1/systems/{id}',
    tag: 'Library',
    summary: 'Moves a System to Recently deleted (restorable for 30 days); its share links answer 404 meanwhile.',
    notes: [ACCESS_NOTE],
    access: 'member',
    pathParams: systemParams,
    answers: [{ status: 200, description: 'Deleted.', schema: deletedAnswerSchema }],
    errors: BODILESS_WRITE_ERRORS,
    examples: [{ title: 'Delete', pathParams: { id: EXAMPLE.system }, status: 200, responseExcerpt: { id: EXAMPLE.system, deleted: true } }],
  },
  {
    id: 'systems-restore',
    method: 'POST',
    path: '/api/v1/systems/{id}/restore',
    tag: 'Library',
    summary: 'Brings a deleted System back with its whole history (404 after 30 days).',
    notes: [ACCESS_NOTE],
    access: 'member',
    pathParams: systemParams,
    answers: [system('The System, live again.')],
    errors: BODILESS_WRITE_ERRORS,
    examples: [{ title: 'Restore', pathParams: { id: EXAMPLE.system }, status: 200, responseExcerpt: { id: EXAMPLE.system, deletedAt: null } }],
  },
  {
    id: 'systems-duplicate',
    method: 'POST',
    path: '/api/v1/systems/{id}/duplicate',
    tag: 'Library',
    summary: 'Copies the current revision as a new System (revision 1, noted "copied from revision n").',
    notes: ['The body is optional: without one the copy is "<name> (copy)" in the same workspace.', ACCESS_NOTE],
    access: 'member',
    pathParams: systemParams,
    body: { schema: systemDuplicateSchema, limitBytes: BODY_LIMIT_BYTES.form, optional: true },
    answers: [system('The new System.', 201)],
    errors: WRITE_ERRORS,
    examples: [{ title: 'Duplicate', pathParams: { id: EXAMPLE.system }, body: { name: 'Den, variant B' }, status: 201, responseExcerpt: { name: 'Den, variant B', revision: 1 } }],
  },
  {
    id: 'systems-export',
    method: 'GET',
    path: '/api/v1/systems/{id}/export',
    tag: 'Library',
    summary: 'Downloads the System: ?format=json (name, revision and document) or ?format=csv (the Settings sheet, one row per channel and sub).',
    notes: [
      'Both are attachments named after the System and its revision (an ASCII name such as linden-street-den-invented-r4.json; the name itself stays verbatim inside the file).',
      'CSV columns: system, revision, kind, id, label, profile, distanceM, distanceSource, delayMs, trimDb, gainDb, polarity, crossoverHz, filter, slope, count.',
      ACCESS_NOTE,
    ],
    access: 'member',
    pathParams: systemParams,
    query: exportQuerySchema,
    // One answer a status: the JSON file is described; ?format=csv answers text/csv (its columns in the notes).
    answers: [{ status: 200, description: 'The JSON file (?format=json, the default); with ?format=csv the Settings sheet as text/csv, UTF-8.', schema: systemExportAnswerSchema }],
    errors: QUERY_READ_ERRORS,
    examples: [{ title: 'The JSON file', pathParams: { id: EXAMPLE.system }, query: '?format=json', status: 200, responseExcerpt: { name: NAME, revision: 4 } }],
  },
];

export const LIBRARY_OPERATIONS: ApiOperation[] = [...SYSTEM_OPERATIONS, ...REVISION_OPERATIONS];
